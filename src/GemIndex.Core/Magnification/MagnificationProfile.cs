using GemIndex.Core.Catalogue;

namespace GemIndex.Core.Magnification;

/// <summary>
/// How likely a material is to hold each magnification feature (present in the stone, whether or not it is seen):
/// the catalogue's published figures where it has them, otherwise a default by origin (docs/ranking.md,
/// "Magnification"; the defaults are judgements of common practice).
/// </summary>
public sealed class MagnificationProfile
{
    /// <summary>A feature that the material's kind of origin does not produce: a rare coincidence or a look-alike.</summary>
    public const double Foreign = 0.01;

    private readonly double[] _probabilities;

    /// <summary>Builds the profile of one material from its origin and its listed probabilities (0–1).</summary>
    /// <exception cref="ArgumentOutOfRangeException">A listed probability outside 0–1.</exception>
    public MagnificationProfile(OriginClass origin, IReadOnlyDictionary<MagnificationFeature, double>? listed = null)
    {
        _probabilities = new double[Enum.GetValues<MagnificationFeature>().Length];
        foreach (var feature in Enum.GetValues<MagnificationFeature>())
            _probabilities[(int)feature] = DefaultFor(origin, feature);
        foreach (var (feature, p) in listed ?? new Dictionary<MagnificationFeature, double>())
        {
            if (p is < 0 or > 1 || double.IsNaN(p))
                throw new ArgumentOutOfRangeException(nameof(listed), p, $"probability of {MagnificationVocabulary.Of(feature).Word} must be 0–1");
            _probabilities[(int)feature] = p;
        }
    }

    private static readonly MagnificationProfile[] Defaults = [.. Enum.GetValues<OriginClass>().Select(o => new MagnificationProfile(o))];

    /// <summary>The defaults of one origin, shared (a profile is immutable).</summary>
    public static MagnificationProfile ForOrigin(OriginClass origin) => Defaults[Array.IndexOf(Enum.GetValues<OriginClass>(), origin)];

    /// <summary>The probability that a stone of this material holds the feature.</summary>
    public double ProbabilityOf(MagnificationFeature feature) => _probabilities[(int)feature];

    private MagnificationProfile(double[] probabilities) => _probabilities = probabilities;

    /// <summary>The same profile with one feature's probability replaced (this one when it is already that).</summary>
    public MagnificationProfile With(MagnificationFeature feature, double probability)
    {
        if (_probabilities[(int)feature] == probability) return this;
        double[] copy = [.. _probabilities];
        copy[(int)feature] = probability;
        return new MagnificationProfile(copy);
    }

    /// <summary>
    /// Defaults by origin (common practice): natural stones usually show nature's inclusions and never melt or flux
    /// growth; synthetics of unstated method may show any growth signature; treated stones and cultured pearls keep
    /// nature's inclusions; imitations (glass, plastic) often hold gas bubbles; assembled stones show their join.
    /// </summary>
    private static double DefaultFor(OriginClass origin, MagnificationFeature feature)
    {
        var group = MagnificationVocabulary.Of(feature).Group;
        bool natureInclusion = feature is MagnificationFeature.CrystalInclusions or MagnificationFeature.HealedFractures
            or MagnificationFeature.MultiPhaseInclusions or MagnificationFeature.NeedlesAndSilk or MagnificationFeature.AngularGrowthZoning
            or MagnificationFeature.ColourBanding;
        return origin switch
        {
            OriginClass.Natural or OriginClass.Treated or OriginClass.Cultured when natureInclusion => feature switch
            {
                MagnificationFeature.CrystalInclusions => 0.4,
                MagnificationFeature.HealedFractures => 0.3,
                MagnificationFeature.MultiPhaseInclusions => 0.2,
                MagnificationFeature.AngularGrowthZoning => 0.2,
                MagnificationFeature.ColourBanding => 0.15,
                _ => 0.1,
            },
            // Swirl marks are a glass's flow, not a crystal's growth: no synthetic crystal holds them by default.
            OriginClass.Synthetic when (group == FeatureGroup.Growth && feature != MagnificationFeature.SwirlMarks) || feature is MagnificationFeature.RoundGasBubbles
                or MagnificationFeature.ElongatedGasBubbles or MagnificationFeature.FluxResidue or MagnificationFeature.MetalPlatelets
                or MagnificationFeature.NailHeadSpicules => 0.1,
            OriginClass.Synthetic when natureInclusion => 0.03,
            OriginClass.Imitation when feature is MagnificationFeature.RoundGasBubbles => 0.3,
            OriginClass.Imitation when feature is MagnificationFeature.ElongatedGasBubbles => 0.15,
            OriginClass.Imitation when feature is MagnificationFeature.SwirlMarks => 0.3,
            OriginClass.Composite when group == FeatureGroup.Composite => 0.6,
            OriginClass.Composite when natureInclusion => 0.2,
            // A stone the catalogue lacks: crystals of every birefringence, half of them plainly doubling (a judgement;
            // every catalogue entry takes its own from its birefringence, FacetDoubling).
            OriginClass.Natural when feature is MagnificationFeature.FacetDoubling => FacetDoubling.UnknownCrystal,
            _ => Foreign,
        };
    }
}
