using GemIndex.Core.Optics;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Optics.Indicatrix;

using GemIndex.Core.Optics.Indicatrix;

public class RotationSeriesTests
{
    private static readonly Indicatrix Peridot = Indicatrix.Biaxial(new(1.654), new(1.672), new(1.690)); // invented, olivine-like

    [Fact]
    public void A_series_covers_0_to_below_180_degrees_in_equal_steps()
    {
        IReadOnlyList<IndicatrixSection> series = RotationSeries.Simulate(Peridot, new Direction(1, 2, 3), Angle.FromDegrees(10));
        Assert.Equal(18, series.Count);
        Assert.Equal(0, series[0].Rotation.Degrees);
        Assert.Equal(170, series[^1].Rotation.Degrees, 1e-12);
        Assert.Equal(Peridot.Section(new Direction(1, 2, 3), Angle.FromDegrees(50)), series[5]);
    }

    [Fact]
    public void A_step_that_does_not_divide_180_stops_below_180()
    {
        IReadOnlyList<IndicatrixSection> series = RotationSeries.Simulate(Peridot, Direction.AlongX, Angle.FromDegrees(7));
        Assert.Equal(26, series.Count); // 0, 7, …, 175
        Assert.Equal(175, series[^1].Rotation.Degrees, 1e-12);
    }

    [Fact]
    public void On_any_facet_the_lowest_low_edge_is_alpha_and_the_highest_high_edge_is_gamma()
    {
        // DOMAIN.md §3. A fine series (0.05°) finds the extremes to well within 1e-6: near an extreme the edge
        // varies quadratically, by at most (γ − α)·(0.025° in rad)² ≈ 7e-9.
        var random = new Random(7);
        for (int i = 0; i < 20; i++)
        {
            Direction facet = Direction.RandomUniform(random);
            IReadOnlyList<IndicatrixSection> series = RotationSeries.Simulate(Peridot, facet, Angle.FromDegrees(0.05));
            Assert.Equal(1.654, series.Min(s => s.Low.Value), 1e-6);
            Assert.Equal(1.690, series.Max(s => s.High.Value), 1e-6);
        }
    }

    [Fact]
    public void The_other_two_extremes_are_beta_and_the_radius_along_the_normal()
    {
        // DOMAIN.md §3: the highest low edge and the lowest high edge are β and r(N), in either order.
        Direction facet = new(0.4, 0.5, 0.77);
        IReadOnlyList<IndicatrixSection> series = RotationSeries.Simulate(Peridot, facet, Angle.FromDegrees(0.05));
        double[] inner = [series.Max(s => s.Low.Value), series.Min(s => s.High.Value)];
        double[] expected = [1.672, Peridot.RadiusAlong(facet).Value];
        Array.Sort(inner);
        Array.Sort(expected);
        Assert.Equal(expected[0], inner[0], 1e-6);
        Assert.Equal(expected[1], inner[1], 1e-6);
    }

    [Fact]
    public void Explicit_rotations_are_kept_in_the_order_given()
    {
        Angle[] rotations = [Angle.FromDegrees(90), Angle.FromDegrees(0), Angle.FromDegrees(45)];
        IReadOnlyList<IndicatrixSection> series = RotationSeries.Simulate(Peridot, Direction.AlongZ, rotations);
        Assert.Equal([90.0, 0.0, 45.0], series.Select(s => s.Rotation.Degrees));
    }

    [Theory]
    [InlineData(0)]
    [InlineData(-5)]
    [InlineData(0.001)]
    [InlineData(91)]
    public void A_step_outside_the_allowed_range_is_refused(double degrees)
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() => RotationSeries.Simulate(Peridot, Direction.AlongZ, Angle.FromDegrees(degrees)));
        Assert.Equal(FormattableString.Invariant($"rotation step is {degrees} °; allowed: 0.01 to 90 °."), error.Message);
    }

    [Fact]
    public void Missing_arguments_are_refused()
    {
        Assert.Throws<ArgumentNullException>(() => RotationSeries.Simulate(null!, Direction.AlongZ, Angle.FromDegrees(10)));
        Assert.Throws<ArgumentNullException>(() => RotationSeries.Simulate(Peridot, Direction.AlongZ, (IEnumerable<Angle>)null!));
    }
}
