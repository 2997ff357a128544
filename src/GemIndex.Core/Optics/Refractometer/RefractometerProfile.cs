using GemIndex.Core.Quantities;

namespace GemIndex.Core.Optics.Refractometer;

/// <summary>
/// The settings of one critical-angle refractometer: its glass, its contact liquid, the light it is read in,
/// how precisely it is read, and its calibration offset. Immutable; change it with <see cref="WithCalibration"/>.
/// </summary>
public sealed record RefractometerProfile
{
    /// <summary>
    /// Bottom of the scale, 1.30: a design constant of ours (scales commonly start near 1.30; below it the
    /// edge angle is too shallow to read well), not a physical limit.
    /// </summary>
    public const double ScaleBottom = 1.30;

    /// <summary>Largest reading precision accepted (a standard uncertainty), 0.05.</summary>
    public const double LargestReadingPrecision = 0.05;

    /// <summary>Largest calibration offset accepted in either direction, 0.05: beyond it the instrument needs repair.</summary>
    public const double LargestCalibrationOffset = 0.05;

    /// <summary>
    /// Creates a profile, checking every value.
    /// </summary>
    /// <param name="glassIndex">Index of the hemicylinder glass, 1.5 to 4 (high-lead glass is 1.86–1.89, common practice).</param>
    /// <param name="contactLiquidIndex">Index of the contact liquid: above the scale bottom (1.30) and below the glass's.</param>
    /// <param name="wavelength">The light the instrument is read in.</param>
    /// <param name="readingPrecision">Standard uncertainty of one reading, above 0 and at most 0.05.</param>
    /// <param name="calibrationOffset">Offset added to raw readings, −0.05 to 0.05.</param>
    /// <param name="calibrationOffsetUncertainty">Standard uncertainty of the offset, 0 to 0.05.</param>
    /// <exception cref="QuantityOutOfRangeException">Any value outside its range.</exception>
    public RefractometerProfile(RefractiveIndex glassIndex, RefractiveIndex contactLiquidIndex, Wavelength wavelength,
        double readingPrecision, double calibrationOffset = 0, double calibrationOffsetUncertainty = 0)
    {
        QuantityOutOfRangeException.ThrowIfOutside("refractometer glass index", glassIndex.Value, 1.5, RefractiveIndex.Maximum);
        if (!(contactLiquidIndex.Value > ScaleBottom && contactLiquidIndex.Value < glassIndex.Value))
            throw new QuantityOutOfRangeException("contact liquid index", contactLiquidIndex.Value,
                $"above the scale bottom {ScaleBottom:0.00} and below the glass index {glassIndex.Value:0.000}");
        QuantityOutOfRangeException.ThrowIfOutside("wavelength", wavelength.Nanometres,
            Wavelength.MinimumNanometres, Wavelength.MaximumNanometres, "nm"); // rejects default(Wavelength)
        QuantityOutOfRangeException.ThrowIfNotAbove("reading precision", readingPrecision, 0);
        QuantityOutOfRangeException.ThrowIfOutside("reading precision", readingPrecision, 0, LargestReadingPrecision);
        QuantityOutOfRangeException.ThrowIfOutside("calibration offset", calibrationOffset, -LargestCalibrationOffset, LargestCalibrationOffset);
        QuantityOutOfRangeException.ThrowIfOutside("calibration offset uncertainty", calibrationOffsetUncertainty, 0, LargestCalibrationOffset);
        GlassIndex = glassIndex;
        ContactLiquidIndex = contactLiquidIndex;
        Wavelength = wavelength;
        ReadingPrecision = readingPrecision;
        CalibrationOffset = calibrationOffset;
        CalibrationOffsetUncertainty = calibrationOffsetUncertainty;
    }

    /// <summary>
    /// A typical instrument: glass 1.88 (high-lead glass, 1.86–1.89 common practice), contact liquid 1.79 (common
    /// practice), sodium light 589.3 nm, reading precision 0.001 (common practice: ±0.001 on a good facet), no offset.
    /// </summary>
    public static RefractometerProfile Default { get; } = new(
        new RefractiveIndex(1.88), new RefractiveIndex(1.79), Wavelength.FromNanometres(589.3), 0.001);

    /// <summary>Index of the hemicylinder glass.</summary>
    public RefractiveIndex GlassIndex { get; }

    /// <summary>Index of the contact liquid; it sets the upper limit of the readable range.</summary>
    public RefractiveIndex ContactLiquidIndex { get; }

    /// <summary>The light the instrument is read in.</summary>
    public Wavelength Wavelength { get; }

    /// <summary>Standard uncertainty of one reading.</summary>
    public double ReadingPrecision { get; }

    /// <summary>Offset added to each raw reading (known − read, from a calibration).</summary>
    public double CalibrationOffset { get; }

    /// <summary>Standard uncertainty of <see cref="CalibrationOffset"/>.</summary>
    public double CalibrationOffsetUncertainty { get; }

    /// <summary>Lowest index the scale shows: <see cref="ScaleBottom"/>.</summary>
    public double LowestReadable => ScaleBottom;

    /// <summary>Highest index that gives its own edge: min(n_liquid, n_glass) (the liquid, since it is below the glass).</summary>
    public double HighestReadable => Math.Min(ContactLiquidIndex.Value, GlassIndex.Value);

    /// <summary>True when a stone of this index shows no edge of its own, only the liquid's: above <see cref="HighestReadable"/>.</summary>
    public bool IsOverTheLimit(RefractiveIndex stone) => stone.Value > HighestReadable;

    /// <summary>Index from the shadow-edge angle on this instrument's glass (see <see cref="Hemicylinder.IndexFromEdgeAngle"/>).</summary>
    /// <exception cref="QuantityOutOfRangeException">The angle gives no index of 1 or more.</exception>
    public RefractiveIndex IndexFromEdgeAngle(Angle edge) => Hemicylinder.IndexFromEdgeAngle(GlassIndex, edge);

    /// <summary>Shadow-edge angle of a stone on this instrument's glass (see <see cref="Hemicylinder.EdgeAngleFor"/>).</summary>
    /// <exception cref="QuantityOutOfRangeException">The stone's index is above the glass's.</exception>
    public Angle EdgeAngleFor(RefractiveIndex stone) => Hemicylinder.EdgeAngleFor(GlassIndex, stone);

    /// <summary>
    /// A raw scale reading corrected by the calibration offset: n = raw + offset, with
    /// σ = √(precision² + σ_offset²) (independent).
    /// </summary>
    /// <exception cref="QuantityOutOfRangeException">The raw reading is outside the readable range.</exception>
    public RefractiveIndex Corrected(double rawReading)
    {
        QuantityOutOfRangeException.ThrowIfOutside("refractometer reading", rawReading, LowestReadable, HighestReadable);
        return new RefractiveIndex(rawReading + CalibrationOffset, double.Hypot(ReadingPrecision, CalibrationOffsetUncertainty));
    }

    /// <summary>This profile with the offset and its uncertainty from <paramref name="fit"/>.</summary>
    /// <exception cref="QuantityOutOfRangeException">The fitted offset or its uncertainty is beyond ±0.05.</exception>
    public RefractometerProfile WithCalibration(CalibrationFit fit) =>
        new(GlassIndex, ContactLiquidIndex, Wavelength, ReadingPrecision, fit.Offset, fit.StandardUncertainty);
}
