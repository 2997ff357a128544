using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using GemIndex.Core.Optics;
using GemIndex.Core.Optics.Refractometer;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Optics.Refractometer;

public class HemicylinderTests
{
    private static readonly RefractiveIndex Glass = new(1.88);

    [Fact]
    public void Quartz_omega_sits_at_the_angle_of_its_index()
    {
        // Quartz ω 1.544 (Handbook of Mineralogy, from memory) on glass 1.88 (common practice):
        // θ = asin(1.544/1.88) = 55.2128° (computed separately in Python). Tolerance: 4 printed decimals.
        Angle edge = Hemicylinder.EdgeAngleFor(Glass, new RefractiveIndex(1.544));
        Assert.Equal(55.2128, edge.Degrees, 0.00005);
        Assert.Equal(1.544, Hemicylinder.IndexFromEdgeAngle(Glass, edge).Value, 1e-12);
    }

    [Fact]
    public void Edge_angle_uncertainty_propagates_to_the_index()
    {
        // σn² = (sin θ σ_glass)² + (n_glass cos θ σθ)²; at θ 55.2128°, σ_glass 0.001, σθ 0.05°:
        // (0.821277 · 0.001)² + (1.88 · 0.570530 · 0.000872665)² → σn = 0.0012452 (computed separately in Python).
        RefractiveIndex n = Hemicylinder.IndexFromEdgeAngle(new RefractiveIndex(1.88, 0.001), Angle.FromDegrees(55.2128, 0.05));
        Assert.Equal(0.0012452, n.StandardUncertainty, 0.0000001);
    }

    [Fact]
    public void A_stone_above_the_glass_gives_no_edge() =>
        OutOfRangeAssert.Throws(() => Hemicylinder.EdgeAngleFor(Glass, new RefractiveIndex(2.417)), "stone refractive index", "1 to 1.88");

    [Fact]
    public void An_edge_angle_below_that_of_vacuum_is_refused() =>
        // asin(1/1.88) = 32.1349°.
        OutOfRangeAssert.Throws(() => Hemicylinder.IndexFromEdgeAngle(Glass, Angle.FromDegrees(20)), "shadow-edge angle", "32.1349 to 90 °");

    [Property]
    public Property Edge_angle_and_index_are_inverse() =>
        Prop.ForAll(OpticsArbitraries.ProfileAndStone, pair =>
        {
            Angle edge = pair.Profile.EdgeAngleFor(pair.Stone);
            double back = pair.Profile.IndexFromEdgeAngle(edge).Value;
            return (Math.Abs(back - pair.Stone.Value) < 1e-12).Label($"{pair.Stone} on {pair.Profile.GlassIndex}: back {back}");
        });
}
