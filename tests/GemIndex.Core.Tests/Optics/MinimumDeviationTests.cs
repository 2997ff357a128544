using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using GemIndex.Core.Optics;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Optics;

public class MinimumDeviationTests
{
    [Fact]
    public void A_60_degree_prism_deviating_by_37_18_degrees_has_index_1_5()
    {
        // Worked example of our own: n = sin((60° + 37.1808°)/2) / sin 30° = 2 sin 48.5904° = 1.50000;
        // D was computed as 2 asin(1.5 sin 30°) − 60° = 37.1808° (computed separately in Python). Tolerance: the 4 decimals of D
        // move n by at most ∂n/∂D · 0.00005° = 1.1e-6.
        RefractiveIndex n = MinimumDeviation.IndexFrom(Angle.FromDegrees(60), Angle.FromDegrees(37.1808));
        Assert.Equal(1.5, n.Value, 0.000002);
    }

    [Fact]
    public void Angle_uncertainties_propagate_to_first_order()
    {
        // Compare with central finite differences of the same formula (independent check of the derivatives).
        double a = 60, d = 37.1808, sa = 0.01, sd = 0.02;
        static double N(double aDeg, double dDeg) =>
            Math.Sin((aDeg + dDeg) / 2 * Math.PI / 180) / Math.Sin(aDeg / 2 * Math.PI / 180);
        double byA = (N(a + 1e-4, d) - N(a - 1e-4, d)) / 2e-4 * sa;
        double byD = (N(a, d + 1e-4) - N(a, d - 1e-4)) / 2e-4 * sd;
        RefractiveIndex n = MinimumDeviation.IndexFrom(Angle.FromDegrees(a, sa), Angle.FromDegrees(d, sd));
        // Tolerance: finite-difference error (h² terms) is below 1e-9 here.
        Assert.Equal(Math.Sqrt(byA * byA + byD * byD), n.StandardUncertainty, 1e-9);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(180)]
    [InlineData(-10)]
    public void An_apex_outside_0_to_180_degrees_is_refused(double apex) =>
        OutOfRangeAssert.Throws(() => MinimumDeviation.IndexFrom(Angle.FromDegrees(apex), Angle.FromDegrees(10)),
            "prism apex angle", "above 0 and below 180 °");

    [Theory]
    [InlineData(-1)]
    [InlineData(130)]
    public void A_deviation_giving_no_physical_index_is_refused(double deviation) =>
        // For A = 60°: Dmax = 2 asin(min(1, 4 sin 30°)) − 60° = 120°.
        OutOfRangeAssert.Throws(() => MinimumDeviation.IndexFrom(Angle.FromDegrees(60), Angle.FromDegrees(deviation)),
            "minimum deviation", "0 to 120 °");

    [Fact]
    public void A_prism_too_steep_for_its_index_is_refused() =>
        // n 1.5: light gets through only below 2 asin(1/1.5) = 83.6206°.
        OutOfRangeAssert.Throws(() => MinimumDeviation.DeviationFor(Angle.FromDegrees(90), new RefractiveIndex(1.5)),
            "prism apex angle", "0 to 83.6206 °");

    [Property]
    public Property Deviation_and_index_are_inverse() =>
        Prop.ForAll(OpticsArbitraries.Prism, prism =>
        {
            Angle d = MinimumDeviation.DeviationFor(prism.Apex, prism.Index);
            double back = MinimumDeviation.IndexFrom(prism.Apex, d).Value;
            return (Math.Abs(back - prism.Index.Value) < 1e-9).Label($"{prism}: D {d} back {back}");
        });
}
