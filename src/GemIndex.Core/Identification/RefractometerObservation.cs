using GemIndex.Core.Optics;
using GemIndex.Core.Optics.Refractometer;
using GemIndex.Core.Quantities;
using GemIndex.Core.Readings;

namespace GemIndex.Core.Identification;

/// <summary>
/// What was read on the refractometer: a rotation series (facet method), a spot reading, or "over the limit"
/// (no stone edge below the contact liquid's index: a censored observation, n &gt; limit).
/// </summary>
public sealed record RefractometerObservation
{
    /// <summary>Standard uncertainty of one facet reading in sodium light (common practice: ±0.001 on a good facet).</summary>
    public const double DefaultFacetPrecision = 0.001;

    /// <summary>Standard uncertainty of a spot reading: "about ±0.01" taken as a 90 % bound (common practice), σ ≈ 0.006.</summary>
    public const double DefaultSpotPrecision = 0.006;

    /// <summary>The usual contact liquid's index (common practice: 1.78–1.81).</summary>
    public const double DefaultLiquidLimit = 1.79;

    /// <summary>Sodium D light, nm.</summary>
    public const double SodiumLightNanometres = 589.3;

    /// <summary>Creates an observation, checking every number (the instrument's through <see cref="RefractometerProfile"/>).</summary>
    /// <exception cref="QuantityOutOfRangeException">A value out of range, or nothing observed at all.</exception>
    public RefractometerObservation(RefractometerMethod method, IReadOnlyList<ShadowEdgeStep>? steps = null, double? spot = null,
        bool overLimit = false, double lightNanometres = SodiumLightNanometres, double liquidLimit = DefaultLiquidLimit,
        double? readingPrecision = null, double calibrationOffset = 0)
    {
        QuantityOutOfRangeException.ThrowIfOutside("light", lightNanometres, 380, 780, "nm");
        QuantityOutOfRangeException.ThrowIfOutside("liquid limit", liquidLimit, 1.5, 2.2);
        double precision = readingPrecision ?? (method == RefractometerMethod.Spot ? DefaultSpotPrecision : DefaultFacetPrecision);
        // Checked here with the series analysis' own range, so a refused precision is named at its field (a precision
        // of 1e-9 had passed to the analysis and ended the command with a stack trace).
        QuantityOutOfRangeException.ThrowIfOutside("reading precision", precision, Readings.RotationSeriesAnalysis.SmallestReadingPrecision,
            RefractometerProfile.LargestReadingPrecision);
        // The glass index does not enter an identification; the usual high-lead glass, or one just above a denser liquid.
        double glass = Math.Max(RefractometerProfile.Default.GlassIndex.Value, liquidLimit + 0.02);
        Profile = new RefractometerProfile(new RefractiveIndex(glass), new RefractiveIndex(liquidLimit),
            Wavelength.FromNanometres(lightNanometres), precision, calibrationOffset);
        if (spot is { } x) QuantityOutOfRangeException.ThrowIfOutside("spot reading", x, RefractometerProfile.ScaleBottom, liquidLimit);
        steps ??= [];
        foreach (var step in steps)
            if (step.High is { } h && h > liquidLimit + Bench.BenchDefaults.EdgeSlackAboveLiquid || step.Low > liquidLimit + Bench.BenchDefaults.EdgeSlackAboveLiquid)
                throw new QuantityOutOfRangeException("edge reading", Math.Max(step.Low, step.High ?? 0),
                    $"at most the liquid limit {liquidLimit:0.000} (no stone edge can be seen above it)");
        if (steps.Count == 0 && spot is null && !overLimit)
            throw new QuantityOutOfRangeException("refractometer readings", 0, "at least one reading, a spot reading, or over the limit");
        Method = method;
        Steps = steps;
        Spot = spot;
        // A precision given is the facet's when steps are read (the text UI keeps 0.001 as a saved setting): a spot read
        // beside them keeps the spot method's own.
        SpotPrecision = method == RefractometerMethod.Spot ? readingPrecision ?? DefaultSpotPrecision : DefaultSpotPrecision;
        OverLimit = overLimit;
    }

    /// <summary>Facet or spot.</summary>
    public RefractometerMethod Method { get; }

    /// <summary>The instrument as used: contact liquid, light, reading precision and calibration offset.</summary>
    public RefractometerProfile Profile { get; }

    /// <summary>The rotation series (facet method); may be empty.</summary>
    public IReadOnlyList<ShadowEdgeStep> Steps { get; }

    /// <summary>The spot reading, if one was taken.</summary>
    public double? Spot { get; }

    /// <summary>True when no stone edge was seen below the liquid's edge (or, with readings, the high edge was not).</summary>
    public bool OverLimit { get; }

    /// <summary>The light the readings were taken in, nm.</summary>
    public double LightNanometres => Profile.Wavelength.Nanometres;

    /// <summary>The contact liquid's index: nothing above it can be read.</summary>
    public double LiquidLimit => Profile.ContactLiquidIndex.Value;

    /// <summary>Standard uncertainty of one reading.</summary>
    public double ReadingPrecision => Profile.ReadingPrecision;

    /// <summary>
    /// Standard uncertainty of the spot reading: for the spot method the precision given, else its own
    /// (<see cref="DefaultSpotPrecision"/>); beside facet steps always its own, since a spot is read on a blurred edge by
    /// eye whatever else was read on the stone, and a precision given there is the facet's.
    /// </summary>
    public double SpotPrecision { get; }

    /// <summary>Added to every reading (from a calibration on a standard).</summary>
    public double CalibrationOffset => Profile.CalibrationOffset;
}
