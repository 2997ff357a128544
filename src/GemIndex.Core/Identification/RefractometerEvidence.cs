using GemIndex.Core.Bench;
using System.Globalization;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Optics;
using GemIndex.Core.Optics.Dispersion;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Core.Quantities;
using GemIndex.Core.Readings;

namespace GemIndex.Core.Identification;

/// <summary>
/// The refractometer's evidence for one material: the rotation series' raw readings by the section model
/// (<see cref="SectionLikelihood"/>, hidden high edges censored inside it), a spot reading, and "over the limit" with no
/// edge at all as a censored reading. Readings in light other than 589.3 nm are
/// moved to 589.3 nm with the material's own dispersion (two-term Cauchy through n and nG − nB).
/// </summary>
internal static class RefractometerEvidence
{
    /// <summary>Dispersion assumed when the catalogue has none (a typical silicate), with half of the shift as extra σ.</summary>
    private const double AssumedDispersion = 0.015;

    /// <summary>Birefringence an aggregate can show as a faint second edge.</summary>
    private const double AggregateBirefringence = 0.006;

    /// <summary>
    /// P(a series with two sharp edges | a material met only as an aggregate): an aggregate gives one vague, averaged
    /// edge; two sharp edges need a single crystal, so only a misidentified form or a rare crystal explains them (a
    /// judgement; docs/ranking.md §1, form term).
    /// </summary>
    internal const double AggregateShowsTwoEdges = 0.02;

    /// <summary>
    /// P(a rotation series of single sharp edges read step by step | a material met only as an aggregate): an aggregate's
    /// shadow edge is vague and is usually taken once as a spot reading; a sharp edge followed round the stone is the
    /// behaviour of a polished facet on a single crystal or a glass, though a flat-polished aggregate now and then gives
    /// one (a judgement; docs/ranking.md §1, form term).
    /// </summary>
    internal const double AggregateShowsSharpSeries = 0.2;

    /// <summary>
    /// P(a rotation series of single sharp edges | a blinking aggregate, <see cref="BlinkSpan"/>): the grains of a strongly
    /// birefringent mineral make the shadow blink between the ends of its span as the stone or the eye moves, so a sharp
    /// edge held at one place round the stone is as foreign to it as two sharp edges (a judgement from common practice;
    /// docs/ranking.md §1, form term).
    /// </summary>
    internal const double BlinkingAggregateShowsSharpSeries = 0.02;

    /// <summary>
    /// An aggregate whose index span is wider than this is a strongly birefringent mineral in grains (calcite and aragonite
    /// in coral, pearl and shell; rhodochrosite, smithsonite, malachite, magnesite): on the spot its reading blinks between
    /// the two ends (a judgement from common practice; docs/ranking.md §2).
    /// </summary>
    internal const double BlinkSpan = 0.1;

    /// <summary>The share of spot readings taken at each end of a blinking aggregate's span (the rest fall between: a judgement).</summary>
    internal const double BlinkEndShare = 0.4;

    /// <summary>How wide each end of the span is taken to be (the grains' own index spread and the reading's: a judgement).</summary>
    internal const double BlinkEndWidth = 0.01;

    /// <summary>Where a spot reading may fall on a material: anywhere from its lowest to its highest index.</summary>
    private static PropertyRange SpotSpan(Material m) => new(m.Indices.Lowest.Minimum, m.Indices.Highest.Maximum);

    private static bool IsBlinkingAggregate(Material m, PropertyRange span) =>
        (m.Forms & MaterialForm.Aggregate) != 0 && (m.Forms & MaterialForm.Crystal) == 0 && span.Width > BlinkSpan;

    /// <summary>The two ends of a blinking aggregate's span at which its spot is read (<see cref="BlinkEndWidth"/> wide).</summary>
    private static (PropertyRange Low, PropertyRange High) BlinkEnds(PropertyRange span) =>
        (new PropertyRange(span.Minimum, span.Minimum + BlinkEndWidth), new PropertyRange(span.Maximum - BlinkEndWidth, span.Maximum));

    /// <summary>The cheap screen's width, in standard deviations of a reading with its offset and soft edges (DOMAIN.md §6b: 4σ).</summary>
    internal const double ScreenSigmas = 4;

    /// <summary>The series' fit takes the form term times this, at most 1 (judgement, docs/ranking.md §4).</summary>
    internal const double FormFitMultiplier = 2;

    /// <summary>σ of where the liquid's own edge hides a stone's edge, for "over the limit" with no series (judgement, docs/ranking.md §2).</summary>
    internal const double OverLimitSigma = 0.003;

    private readonly record struct Part(double Likelihood, double Broad, double Tail, string Text);

    public static void Add(MaterialProfile profile, AnalysedSheet sheet, EvidenceAccumulator acc)
    {
        if (sheet.Sheet.Refractometer is not { } r) return;
        var m = profile.Material;
        double shift = WavelengthShift(m, r.LightNanometres, out double shiftSigma);
        if (sheet.Observation is { } series) Series(profile, sheet, series, shift, shiftSigma, acc);
        if (r.Spot is { } spot) Spot(m, spot, r.SpotPrecision, shift, shiftSigma, acc);
        // With a series, an edge hidden above the liquid is censored within the section model itself.
        if (r.OverLimit && sheet.Observation is null) OverLimit(m, r, hasReadings: r.Spot is not null, acc);
    }

    /// <summary>n(589.3) − n(λ) for the material, by the two-term Cauchy model through its n and nG − nB.</summary>
    internal static double WavelengthShift(Material m, double lightNanometres, out double sigma)
    {
        sigma = 0;
        if (Math.Abs(lightNanometres - RefractometerObservation.SodiumLightNanometres) < 0.5) return 0;
        double dispersion = m.Dispersion ?? AssumedDispersion;
        var model = CauchyModel.FromIndexAndDispersion(new RefractiveIndex(m.Indices.Lowest.Centre), dispersion);
        double shift = model.IndexAt(ReferenceWavelengths.D) - model.IndexAt(Wavelength.FromNanometres(lightNanometres));
        if (m.Dispersion is null) sigma = Math.Abs(shift) / 2;
        return shift;
    }

    /// <summary>
    /// The rotation series by the section model: ln p(raw readings | m) against the same under "not in the catalogue"
    /// (<see cref="SectionLikelihood"/>), after a cheap screen that leaves out materials no orientation can fit: the lowest
    /// reading at least the lowest index − 4σ, the highest at most the highest index + 4σ, the widest step at most the
    /// birefringence + 4σ√2 (σ with the offset, the soft edges and the light's correction). A screened-out material gets
    /// no likelihood of its own; the robust mixture leaves it the misreading share of the broad one.
    /// </summary>
    private static void Series(MaterialProfile profile, AnalysedSheet sheet, SeriesObservation series, double shift, double shiftSigma, EvidenceAccumulator acc)
    {
        var m = profile.Material;
        var prior = profile.Prior;
        double broad = sheet.BroadSeriesLogLikelihood;
        SectionLikelihood.Outcome outcome = Screened(prior, series, shift, shiftSigma)
            ? new(double.NegativeInfinity, 0)
            : sheet.SeriesOutcome(prior, shift, shiftSigma);
        double form = FormFactor(m, series);
        acc.AddLog(BenchField.Refractometer, outcome.LogLikelihood + Math.Log(form), broad, outcome.Tail * Math.Min(1, FormFitMultiplier * form), robust: true);
        if (acc.Explaining)
            acc.Say(SeriesText(m, sheet, series, outcome, form));
    }

    /// <summary>
    /// The section model's work for this material on this sheet, when it has any: its prior and the light's shift (what
    /// <see cref="AnalysedSheet.SeriesOutcome"/> is keyed by); false when there is no series, or the screen leaves it out.
    /// </summary>
    internal static bool SeriesWork(MaterialProfile profile, AnalysedSheet sheet, out (IndicatrixPrior Prior, double Shift, double ShiftSigma) work)
    {
        work = default;
        if (sheet.Sheet.Refractometer is not { } r || sheet.Observation is not { } series) return false;
        double shift = WavelengthShift(profile.Material, r.LightNanometres, out double shiftSigma);
        if (Screened(profile.Prior, series, shift, shiftSigma)) return false;
        work = (profile.Prior, shift, shiftSigma);
        return true;
    }

    /// <summary>True when no orientation of the material can give these readings (the cheap bounds of DOMAIN.md §6b).</summary>
    internal static bool Screened(IndicatrixPrior prior, SeriesObservation series, double shift, double shiftSigma)
    {
        double sigma = Math.Sqrt(series.NoiseVariance + SectionLikelihood.OffsetVariance(series, shiftSigma));
        double tolerance = ScreenSigmas * sigma;
        return series.LowestReading + shift < prior.LowestIndex - tolerance
               || series.HighestReading + shift > prior.HighestIndex + tolerance
               || series.LargestSeparation > prior.LargestBirefringence + ScreenSigmas * Math.Sqrt(2 * series.NoiseVariance);
    }

    /// <summary>
    /// The form term: a series with two sharp edges comes from a single crystal, so it is strong evidence against a material
    /// met only as an aggregate (<see cref="AggregateShowsTwoEdges"/>); a series of single sharp edges read at several
    /// steps is weaker evidence against it (<see cref="AggregateShowsSharpSeries"/>), unless its grains make the edge blink
    /// (<see cref="BlinkingAggregateShowsSharpSeries"/>); a spot reading fits both.
    /// </summary>
    internal static double FormFactor(Material m, SeriesObservation series)
    {
        bool aggregateOnly = (m.Forms & MaterialForm.Aggregate) != 0 && (m.Forms & MaterialForm.Crystal) == 0;
        if (!aggregateOnly) return 1;
        if (series.LargestSeparation > 0) return AggregateShowsTwoEdges;
        if (series.Low.Length <= 1) return 1;
        return IsBlinkingAggregate(m, SpotSpan(m))
            ? BlinkingAggregateShowsSharpSeries : AggregateShowsSharpSeries;
    }

    /// <summary>
    /// The series in words that hold under every reading of it: the one interpretation when the readings fix it and it
    /// is of the material's own optic character, otherwise the edges as read (a material's reason never takes one of two
    /// equally likely readings as its own, and a biaxial feldspar's reason does not read "uniaxial positive").
    /// </summary>
    private static string ReadingsText(Material m, AnalysedSheet sheet)
    {
        if (sheet.Series?.Interpretations is [var only] && (only.Character is null || only.Character == m.OpticCharacter)) return only.Description;
        var steps = sheet.Sheet.Refractometer?.Steps ?? [];
        if (steps.Count == 0) return "rotation series";
        string Range(double a, double b) => a == b ? a.ToString("0.000", CultureInfo.InvariantCulture) : $"{a.ToString("0.000", CultureInfo.InvariantCulture)}–{b.ToString("0.000", CultureInfo.InvariantCulture)}";
        var highs = steps.Where(x => x.High is not null).Select(x => x.High!.Value).ToList();
        string text = $"low edge {Range(steps.Min(x => x.Low), steps.Max(x => x.Low))}";
        string over = steps.Count == 1 ? " at one step" : $" over {steps.Count} steps";
        if (highs.Count == 0) return text + over;
        // A high edge seen at only some of the steps is said so ("at 2 of them": it was not seen at the others).
        return highs.Count < steps.Count
            ? $"{text}{over}, high edge {Range(highs.Min(), highs.Max())} at {highs.Count} of them"
            : $"{text}, high edge {Range(highs.Min(), highs.Max())}{over}";
    }

    private static string SeriesText(Material m, AnalysedSheet sheet, SeriesObservation series, SectionLikelihood.Outcome outcome, double form)
    {
        string expected = string.Join(", ", m.Indices.Named().Select(x => $"{x.Name} {x.Range.ToString("0.000")}"));
        string summary = ReadingsText(m, sheet);
        string verdict = double.IsNegativeInfinity(outcome.LogLikelihood) ? "no orientation of it can give these readings"
            : outcome.Tail >= EvidenceAccumulator.AgreesTail ? "an orientation of it gives these readings" : "its best orientation fits these readings poorly";
        return $"{summary}; {verdict} ({expected})" + (form >= 1 ? ""
            : series.LargestSeparation > 0 ? "; two sharp edges come from a single crystal, and it is met only as an aggregate"
            : form == BlinkingAggregateShowsSharpSeries ? "; a sharp edge held round the stone is not seen on this aggregate, whose grains make the edge blink"
            : "; a sharp edge followed round the stone is rarely seen on an aggregate, which gives a vague edge");
    }

    private static Part Index(string symbol, double observed, double sigma, PropertyRange range, double shift, double shiftSigma, bool words, bool fitting)
    {
        double x = observed + shift;
        double s = double.Hypot(sigma, shiftSigma);
        return new Part(RangeStrays.Density(x, range, s, RangeStrays.IndexScale), BroadDensities.Index,
            fitting ? RangeStrays.Tail(x, range, s, RangeStrays.IndexScale) : 1, !words ? "" :
            $"{symbol} {x.ToString("0.000", CultureInfo.InvariantCulture)} {EvidenceLikelihood.Where(x, range, s, "0.000")}");
    }

    /// <summary>The material's birefringence range; derived from its index ranges where the catalogue gives none.</summary>
    internal static PropertyRange BirefringenceRange(Material m)
    {
        if (m.Birefringence is { } b) return b;
        return m.OpticCharacter switch
        {
            OpticCharacter.Aggregate => new PropertyRange(0, AggregateBirefringence),
            OpticCharacter.Uniaxial or OpticCharacter.Biaxial => new PropertyRange(
                Math.Max(0, m.Indices.Highest.Minimum - m.Indices.Lowest.Maximum), m.Indices.Highest.Maximum - m.Indices.Lowest.Minimum),
            _ => new PropertyRange(0, 0),
        };
    }

    private static void Spot(Material m, double spot, double sigma, double shift, double shiftSigma, EvidenceAccumulator acc)
    {
        // A spot reading on a doubly refractive stone averages its edges: anywhere from the lowest to the highest index.
        var span = SpotSpan(m);
        var part = Index("spot reading", spot, sigma, span, shift, shiftSigma, acc.Explaining, acc.Fitting);
        if (IsBlinkingAggregate(m, span))
        {
            // A strongly birefringent aggregate (coral, pearl, shell, the carbonates) shows the birefringence blink: the
            // spot is read at one end or the other of the span far more often than between them.
            var (low, high) = BlinkEnds(span);
            var atLow = Index("spot reading", spot, sigma, low, shift, shiftSigma, false, acc.Fitting);
            var atHigh = Index("spot reading", spot, sigma, high, shift, shiftSigma, false, acc.Fitting);
            double density = BlinkEndShare * (atLow.Likelihood + atHigh.Likelihood) + (1 - 2 * BlinkEndShare) * part.Likelihood;
            part = part with { Likelihood = density, Tail = Math.Max(part.Tail, Math.Max(atLow.Tail, atHigh.Tail)) };
        }
        int group = (m.Forms & MaterialForm.Aggregate) != 0 ? EvidenceAccumulator.AggregateGroup : EvidenceAccumulator.Independent;
        acc.Add(BenchField.Refractometer, part.Likelihood, part.Broad, part.Tail, robust: true, group);
        if (acc.Explaining) acc.Say(part.Text);
    }

    private static void OverLimit(Material m, RefractometerObservation r, bool hasReadings, EvidenceAccumulator acc)
    {
        // Censored: with no edge at all the lowest index is above the liquid; with edges read, the highest one is.
        var range = hasReadings ? m.Indices.Highest : m.Indices.Lowest;
        double limit = r.LiquidLimit;
        const double sigma = OverLimitSigma;
        double p = RangeLikelihood.ProbabilityAbove(limit, range, sigma);
        var span = SpotSpan(m);
        bool blinking = !hasReadings && r.Method == RefractometerMethod.Spot && IsBlinkingAggregate(m, span);
        if (blinking)
        {
            // A blinking aggregate's spot is read at either end of its span, or between (the spot model above): with its
            // high end above the liquid, the shadow edge is lost whenever the reading falls there.
            var (low, high) = BlinkEnds(span);
            p = BlinkEndShare * (RangeLikelihood.ProbabilityAbove(limit, low, sigma) + RangeLikelihood.ProbabilityAbove(limit, high, sigma))
                + (1 - 2 * BlinkEndShare) * RangeLikelihood.ProbabilityAbove(limit, span, sigma);
        }
        double tail = acc.Fitting ? RangeLikelihood.TwoSidedTail(Math.Max(0, limit - (blinking ? span : range).Maximum) / sigma) : 1;
        acc.Add(BenchField.Refractometer, p, hasReadings ? BroadDensities.OverLimitWithReadings : BroadDensities.OverLimit, tail, robust: true);
        if (acc.Explaining)
            acc.Say($"over the limit (n > {limit.ToString("0.000", CultureInfo.InvariantCulture)}): {(hasReadings ? "highest" : "lowest")} index {range.ToString("0.000")} expected");
    }
}
