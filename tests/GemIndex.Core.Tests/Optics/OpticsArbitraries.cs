using FsCheck;
using FsCheck.Fluent;
using GemIndex.Core.Optics;
using GemIndex.Core.Optics.Refractometer;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Optics;

/// <summary>
/// Generators of physically valid optics inputs for the property tests: never raw doubles (which include NaN and
/// infinities). Each draws from a million evenly spaced values over its stated range.
/// </summary>
public static class OpticsArbitraries
{
    /// <summary>A value in [low, high], in a million even steps.</summary>
    public static Gen<double> Between(double low, double high) =>
        Gen.Choose(0, 1_000_000).Select(i => low + (high - low) * i / 1_000_000.0);

    /// <summary>Indices of media met at a bench: air (1.00) to above rutile (3.00).</summary>
    public static Gen<RefractiveIndex> Index => Between(1.0, 3.0).Select(v => new RefractiveIndex(v));

    /// <summary>
    /// Two media and an angle of incidence that refracts (no total reflection): up to 99.9% of the critical angle
    /// (or of 90° when there is none), keeping the back-calculation away from grazing emergence where asin is
    /// ill-conditioned.
    /// </summary>
    public static Arbitrary<(RefractiveIndex From, RefractiveIndex To, Angle Incidence)> RefractedRay =>
        (from source in Index
         from to in Index
         from share in Between(0, 0.999)
         let largest = source.Value > to.Value ? Math.Asin(to.Value / source.Value) : Math.PI / 2
         select (source, to, Angle.FromRadians(share * largest))).ToArbitrary();

    /// <summary>Two media and any angle of incidence, 0°–90° (total reflection included).</summary>
    public static Arbitrary<(RefractiveIndex From, RefractiveIndex To, Angle Incidence)> AnyRay =>
        (from source in Index
         from to in Index
         from degrees in Between(0, 90)
         select (source, to, Angle.FromDegrees(degrees))).ToArbitrary();

    /// <summary>
    /// A refractometer: glass 1.80–1.95, liquid 1.70 to 0.01 below the glass, precision 0.0005–0.01, offset ±0.01;
    /// with a stone index on its readable scale (1.30 to the liquid).
    /// </summary>
    public static Arbitrary<(RefractometerProfile Profile, RefractiveIndex Stone)> ProfileAndStone =>
        (from glass in Between(1.80, 1.95)
         from liquidShare in Between(0, 1)
         from precision in Between(0.0005, 0.01)
         from offset in Between(-0.01, 0.01)
         let liquid = 1.70 + liquidShare * (glass - 0.01 - 1.70)
         let profile = new RefractometerProfile(new RefractiveIndex(glass), new RefractiveIndex(liquid),
             Wavelength.FromNanometres(589.3), precision, offset)
         from stone in Between(RefractometerProfile.ScaleBottom, liquid)
         select (profile, new RefractiveIndex(stone))).ToArbitrary();

    /// <summary>A surrounding medium 1.00–1.80 (air to a contact liquid) and a stone 0.01 to 2.5 above it.</summary>
    public static Arbitrary<(RefractiveIndex Surrounding, RefractiveIndex Stone)> StoneAboveMedium =>
        (from medium in Between(1.0, 1.8)
         from step in Between(0.01, 2.5)
         select (new RefractiveIndex(medium), new RefractiveIndex(Math.Min(medium + step, 4.0)))).ToArbitrary();

    /// <summary>
    /// A prism: index 1.30–2.90 and an apex from 5° to 95% of the steepest the index lets light through, 2 asin(1/n).
    /// </summary>
    public static Arbitrary<(Angle Apex, RefractiveIndex Index)> Prism =>
        (from n in Between(1.30, 2.90)
         from share in Between(0, 1)
         let steepest = 2 * Math.Asin(1 / n) * 180 / Math.PI
         select (Angle.FromDegrees(5 + share * (0.95 * steepest - 5)), new RefractiveIndex(n))).ToArbitrary();

    /// <summary>
    /// A calibration offset (±0.01) and one to six standards (known 1.40–1.75) read exactly that much low, all on the
    /// default instrument's scale.
    /// </summary>
    public static Arbitrary<(double Offset, double[] Known)> ExactCalibration =>
        (from offset in Between(-0.01, 0.01)
         from count in Gen.Choose(1, 6)
         from known in Between(1.40, 1.75).ArrayOf(count)
         select (offset, known)).ToArbitrary();
}
