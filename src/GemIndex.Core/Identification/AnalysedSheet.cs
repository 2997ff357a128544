using GemIndex.Core.Magnification;
using GemIndex.Core.Readings;

namespace GemIndex.Core.Identification;

/// <summary>A bench sheet with its material-independent analysis done once (the rotation series).</summary>
public sealed record AnalysedSheet
{
    /// <summary>Analyses the sheet.</summary>
    public AnalysedSheet(BenchSheet sheet)
    {
        Sheet = sheet;
        OpaqueStoneShows = EvidenceLikelihood.SaysNothingOfAnOpaqueStone(sheet);
        LiquidsBesideGravity = EvidenceLikelihood.LiquidBounds(sheet);
        if (!string.IsNullOrWhiteSpace(sheet.Colour))
        {
            var hues = ColourWords.PrincipalHues(sheet.Colour).ToHashSet();
            ColourHues = hues;
            ColourHueList = [.. hues];
            UnknownColourWords = ColourWords.UnknownWords(sheet.Colour);
            IsColourless = ColourWords.IsColourless(sheet.Colour);
        }
        if (sheet.Magnification is { IsEmpty: false } look) LogBroadLook = MagnificationEvidence.LogBroad(look);
        if (sheet.Refractometer is { } read && (read.Spot is not null || read.Steps.Count > 0))
            // One index for a stone read as singly refractive: the spot, or the mean of every edge (for a doubly refractive
            // stone a middle value, where an entry that needs one index fits badly anyway).
            SingleIndex = read.CalibrationOffset + (read.Spot ?? read.Steps.SelectMany(e => e.High is { } h ? new[] { e.Low, h } : [e.Low]).Average());
        if (sheet.Refractometer is { Steps.Count: > 0 } r)
        {
            Series = RotationSeriesAnalysis.ReadAgainst(RotationSeriesAnalysis.Analyse(r.Steps, r.ReadingPrecision, r.CalibrationOffset), r.LiquidLimit);
            Observation = new SeriesObservation(r.Steps, r.ReadingPrecision, r.CalibrationOffset, r.LiquidLimit);
            _broad = new Lazy<double>(() => SectionLikelihood.Evaluate(IndicatrixPrior.Broad(Observation), Observation, 0, 0).LogLikelihood);
            var observation = Observation;
            Character = new Lazy<OpticCharacterPosterior>(() => OpticCharacterPosterior.Of(observation, sheet.Pleochroism));
            var analysed = Series;
            var character = Character;
            SeriesShown = new Lazy<RotationSeriesResult>(() => SeriesAsRead.Weighed(analysed,
                RotationSeriesAnalysis.EveryCharacter(r.Steps, r.ReadingPrecision, r.CalibrationOffset)?
                    .Select(i => RotationSeriesAnalysis.ReadAgainst(i, r.LiquidLimit, analysed.HighHiddenBy(r.LiquidLimit))).ToList(),
                character.Value));
        }
    }

    /// <summary>What the series and the dichroscope say of the optic character, worked out only when a front end shows it.</summary>
    internal Lazy<OpticCharacterPosterior>? Character { get; }

    /// <summary>The series' readings weighted by <see cref="Character"/> (<see cref="SeriesAsRead"/>), worked out only when a front end shows them.</summary>
    internal Lazy<RotationSeriesResult>? SeriesShown { get; }

    private readonly Lazy<double>? _broad;
    // One stone is ranked on one thread, so a plain dictionary under an uncontended lock (cheaper per stone than a
    // concurrent one) keeps the sheet safe to share.
    private readonly Dictionary<(IndicatrixPrior, double, double), SectionLikelihood.Outcome> _outcomes = [];

    /// <summary>
    /// The index of the stone as one number (the spot, or the mean of the edges read, calibrated), for a material whose
    /// SG follows its index (<see cref="Catalogue.Material.SpecificRefractivity"/>); null without a reading below the limit.
    /// </summary>
    internal double? SingleIndex { get; }

    /// <summary>The series as the section model reads it, when there are readings.</summary>
    internal SeriesObservation? Observation { get; }

    /// <summary>ln p(series | not in the catalogue), worked out once per stone.</summary>
    internal double BroadSeriesLogLikelihood => _broad?.Value ?? 0;

    /// <summary>
    /// The section model's outcome for a prior with the readings moved by <paramref name="shift"/> (σ
    /// <paramref name="shiftSigma"/>) to 589.3 nm, worked out once per stone however many entries share it and however
    /// often an entry is weighed.
    /// </summary>
    internal SectionLikelihood.Outcome SeriesOutcome(IndicatrixPrior prior, double shift, double shiftSigma)
    {
        var key = (prior, shift, shiftSigma);
        lock (_outcomes)
            if (_outcomes.TryGetValue(key, out var known)) return known;
        var outcome = SectionLikelihood.Evaluate(prior, Observation!, shift, shiftSigma);
        lock (_outcomes) _outcomes[key] = outcome;
        return outcome;
    }

    /// <summary>ln P(what was seen under magnification | not in the catalogue), worked out once per stone.</summary>
    internal double LogBroadLook { get; }

    /// <summary>The sheet as entered.</summary>
    public BenchSheet Sheet { get; }

    /// <summary>The colour seen, as the normalised hues it names (<see cref="ColourWords.PrincipalHues"/>: a tint such as "bluish" left out); empty when no colour was given.</summary>
    public IReadOnlySet<string> ColourHues { get; } = new HashSet<string>();

    /// <summary>The same hues as a list, in the set's own order (the colour test reads them for every entry).</summary>
    internal IReadOnlyList<string> ColourHueList { get; } = [];

    /// <summary>Words of the colour given that name no known hue: they give no evidence, and a warning says so.</summary>
    public IReadOnlyList<string> UnknownColourWords { get; } = [];

    /// <summary>True when the colour given describes a colourless stone (which shows no pleochroism).</summary>
    public bool IsColourless { get; }

    /// <summary>The readings of a stone read opaque that any opaque stone shows, not weighed (worked out once per stone).</summary>
    internal (bool Polariscope, bool Pleochroism, bool Fire) OpaqueStoneShows { get; }

    /// <summary>
    /// Heavy liquids beside a weighed SG that none of them contradicts: the SG's reading and spread, the liquids' bounds and
    /// the share of the reading's spread inside them (the same for every entry, so worked out once); null otherwise.
    /// </summary>
    internal EvidenceLikelihood.GravityWithLiquids? LiquidsBesideGravity { get; }

    /// <summary>The rotation series' summary for display (character, sign, indices read from the readings; never a gate).</summary>
    public RotationSeriesResult? Series { get; }
}
