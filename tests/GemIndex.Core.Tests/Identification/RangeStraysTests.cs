using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Identification;

namespace GemIndex.Core.Tests.Identification;

public class RangeStraysTests
{
    private static double Trapezoid(Func<double, double> f, double from, double to, int steps)
    {
        double h = (to - from) / steps, sum = (f(from) + f(to)) / 2;
        for (int i = 1; i < steps; i++) sum += f(from + i * h);
        return sum * h;
    }

    private static readonly Arbitrary<(double Low, double Width, double Sigma)> Ranges =
        (from low in Gen.Choose(1300, 2500)
         from width in Gen.Choose(0, 60)
         from sigma in Gen.Choose(1, 10)
         select (low / 1000.0, width / 1000.0, sigma / 1000.0)).ToArbitrary();

    [Property(MaxTest = 200)]
    public Property The_density_with_strays_is_a_probability_density() =>
        // A mixture of two densities integrates to 1; tolerance 1e-4 covers the trapezoid rule on a 10⁻⁵ grid and
        // Φ's 7.5·10⁻⁸ error (Abramowitz and Stegun 26.2.17) over the range.
        Prop.ForAll(Ranges, r =>
        {
            var range = new PropertyRange(r.Low, r.Low + r.Width);
            double mass = Trapezoid(x => RangeStraysDensity(x, range, r.Sigma), r.Low - 0.2, r.Low + r.Width + 0.2, 40_000);
            return (Math.Abs(mass - 1) < 1e-4).Label($"mass {mass}");
        });

    private static double RangeStraysDensity(double x, PropertyRange range, double sigma) =>
        RangeStrays.Density(x, range, sigma, RangeStrays.IndexScale);

    [Fact]
    public void A_reading_well_beyond_the_range_keeps_the_strays_share_instead_of_a_veto()
    {
        // 0.02 beyond an index range, σ 0.002: the soft edge alone is e^−50 of its peak; the strays give
        // Share · (Φ(upper) − Φ(lower)) / width with σ' = √(0.002² + 0.01²), worked out here by the same formula.
        var range = new PropertyRange(1.540, 1.550);
        double x = 1.570, wide = Math.Sqrt(0.002 * 0.002 + RangeStrays.IndexScale * RangeStrays.IndexScale);
        double expected = RangeStrays.Share * (RangeLikelihood.Phi((1.550 - x) / wide) - RangeLikelihood.Phi((1.540 - x) / wide)) / 0.010;
        Assert.Equal(expected, RangeStrays.Density(x, range, 0.002, RangeStrays.IndexScale), expected * 1e-6);
        Assert.True(RangeStrays.Density(x, range, 0.002, RangeStrays.IndexScale) > 1e3 * RangeLikelihood.Density(x, range, 0.002));
    }

    [Fact]
    public void Inside_the_range_the_fit_is_complete_and_outside_it_falls()
    {
        var range = new PropertyRange(3.50, 3.54);
        Assert.Equal(1, RangeStrays.Tail(3.52, range, 0.01, 0.09), 12);
        double near = RangeStrays.Tail(3.56, range, 0.01, 0.09), far = RangeStrays.Tail(3.80, range, 0.01, 0.09);
        Assert.True(near > far && far > 0, $"tails {near} and {far}");
    }
}
