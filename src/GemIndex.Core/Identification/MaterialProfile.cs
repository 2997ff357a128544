using GemIndex.Core.Catalogue;
using GemIndex.Core.Observations;

namespace GemIndex.Core.Identification;

/// <summary>
/// What the likelihood needs of a material that costs time to work out (its colours as hue words, its birefringence
/// range, the reaction tests' probabilities), computed once per catalogue rather than once per stone.
/// </summary>
public sealed class MaterialProfile
{
    /// <summary>Prepares the profile of one material.</summary>
    public MaterialProfile(Material material) : this(material, null, null) { }

    /// <summary>
    /// Prepares the profile, sharing <paramref name="prior"/> with entries of the same optical data; the hues its species
    /// shows (<see cref="SpeciesHueList"/>) are mixed into its colour test, its own when none are given.
    /// </summary>
    internal MaterialProfile(Material material, IndicatrixPrior? prior, IReadOnlyList<string>? speciesHues)
    {
        Material = material;
        ColourHues = HueList(material);
        Hues = ColourHues.ToHashSet();
        SpeciesHues = speciesHues is null || speciesHues.SequenceEqual(ColourHues) ? ColourHues : speciesHues;
        Birefringence = RefractometerEvidence.BirefringenceRange(material);
        Prior = prior ?? IndicatrixPrior.For(material, Birefringence);
        if (ColourHues.Count > 0) ColourFirstHue = ColourWords.EntryProbability([ColourHues[0]], ColourHues, SpeciesHues, material.NamedByColour);
        var usual = EvidenceLikelihood.UsualReactions(material);
        Polariscope = [.. Enumerable.Range(0, 4).Select(o => EvidenceLikelihood.PolariscopeProbability(usual, (PolariscopeReaction)o))];
        PolariscopeUsual = EvidenceLikelihood.PolariscopeProbability(usual, usual[0]);
        PleochroismLargest = EvidenceLikelihood.PleochroismRow(material.OpticCharacter, material.Pleochroism).Max();
        PleochroismLargestColourless = EvidenceLikelihood.PleochroismRow(material.OpticCharacter, PleochroismStrength.None).Max();
        UvLong = new FluorescenceTable(material.UvLong);
        UvShort = new FluorescenceTable(material.UvShort);
        LineGroups = AbsorptionLines.Groups(material.AbsorptionLines);
        UnexplainedLineRate = AbsorptionLines.UnexplainedLineRate(material, ColourHues);
        Magnification = material.MagnificationProfile;
    }

    /// <summary>Its magnification profile, with the doubling its birefringence gives, made once per catalogue (not per stone).</summary>
    internal Magnification.MagnificationProfile Magnification { get; }

    /// <summary>The rate of seen lines its listed lines do not explain (<see cref="AbsorptionLines.UnexplainedLineRate"/>).</summary>
    internal double UnexplainedLineRate { get; }

    /// <summary>Its listed absorption lines as the hand spectroscope shows them: groups within the resolution, each one line.</summary>
    internal IReadOnlyList<int[]> LineGroups { get; }

    /// <summary>Where its principal indices may lie, for the section model (shared among entries with the same optical data).</summary>
    internal IndicatrixPrior Prior { get; }

    /// <summary>The material.</summary>
    public Material Material { get; }

    /// <summary>Its usual colours as known hue words, most usual first.</summary>
    public IReadOnlyList<string> ColourHues { get; }

    /// <summary>The hues its species shows, most usual first: itself when it is its species' only entry.</summary>
    internal IReadOnlyList<string> SpeciesHues { get; }

    /// <summary>An entry's usual colours as the hues they name (<see cref="ColourWords.PrincipalHues"/>), most usual first.</summary>
    private static List<string> HueList(Material m) => [.. m.Colours.SelectMany(ColourWords.PrincipalHues).Distinct()];

    /// <summary>
    /// The hues a species' entries show, the hue listed by most entries first (ties by where they first appear, entries in
    /// catalogue order, each list most usual first).
    /// </summary>
    internal static IReadOnlyList<string> SpeciesHueList(IEnumerable<Material> entries)
    {
        var count = new Dictionary<string, int>();
        var first = new Dictionary<string, int>();
        foreach (var hue in entries.SelectMany(HueList))
        {
            first.TryAdd(hue, first.Count);
            count[hue] = count.GetValueOrDefault(hue) + 1;
        }
        return [.. count.Keys.OrderByDescending(h => count[h]).ThenBy(h => first[h])];
    }

    /// <summary>Its usual colours as normalised hue words.</summary>
    public IReadOnlySet<string> Hues { get; }

    /// <summary>Its birefringence range (derived from the index ranges where the catalogue gives none).</summary>
    public PropertyRange Birefringence { get; }

    /// <summary>P(its most usual hue is named | its colours): the colour test's best case (0 when it lists no known hue).</summary>
    internal double ColourFirstHue { get; }

    /// <summary>P(each polariscope reaction | the material), by <see cref="PolariscopeReaction"/>.</summary>
    internal double[] Polariscope { get; }

    /// <summary>P(its first usual reaction | the material): the polariscope's best case.</summary>
    internal double PolariscopeUsual { get; }

    /// <summary>The likeliest dichroscope answer's probability, for its pleochroism.</summary>
    internal double PleochroismLargest { get; }

    /// <summary>The same for a colourless stone of it (no pleochroism to see).</summary>
    internal double PleochroismLargestColourless { get; }

    /// <summary>Long-wave UV: P(each strength) and the best case.</summary>
    internal FluorescenceTable UvLong { get; }

    /// <summary>Short-wave UV: P(each strength) and the best case.</summary>
    internal FluorescenceTable UvShort { get; }

    /// <summary>P(each fluorescence strength | the usual strengths), and the largest of them at a usual strength.</summary>
    internal sealed class FluorescenceTable
    {
        public FluorescenceTable(IReadOnlyList<FluorescenceStrength> usual)
        {
            Probabilities = [.. Enumerable.Range(0, 4).Select(o => EvidenceLikelihood.FluorescenceProbability(usual, (FluorescenceStrength)o))];
            foreach (var u in usual) Usual = Math.Max(Usual, EvidenceLikelihood.FluorescenceProbability(usual, u));
        }

        /// <summary>By <see cref="FluorescenceStrength"/>.</summary>
        public double[] Probabilities { get; }

        /// <summary>The best case: the largest probability of a usual strength.</summary>
        public double Usual { get; }
    }
}
