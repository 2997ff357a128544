using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using GemIndex.Core.Optics;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Optics;

public class BrewsterAngleTests
{
    private static readonly RefractiveIndex Air = new(1.0);

    [Fact]
    public void Glass_of_index_1_5_in_air_has_a_Brewster_angle_of_56_3_degrees()
    {
        // Source: Hecht, Optics, as cited in DOMAIN.md §7: θB = 56.3° for n 1.5 from air. Tolerance: printed to 0.1°, so ±0.05°.
        Assert.Equal(56.3, BrewsterAngle.Of(Air, new RefractiveIndex(1.5)).Degrees, 0.05);
    }

    [Fact]
    public void At_the_Brewster_angle_p_light_is_not_reflected()
    {
        var glass = new RefractiveIndex(1.5);
        Reflectance r = Fresnel.At(Air, glass, BrewsterAngle.Of(Air, glass));
        Assert.Equal(0, r.P, 1e-15);
        Assert.True(r.S > 0.1);
    }

    [Fact]
    public void Index_from_a_Brewster_angle_carries_the_angle_uncertainty()
    {
        // n₂ = tan 56.3099° = 1.5; σn = n₁ σθ / cos² θB = 0.1° · (π/180) / cos²(56.3099°) = 0.00174533/0.307692 = 0.0056723.
        RefractiveIndex n = BrewsterAngle.IndexFrom(Angle.FromDegrees(Math.Atan(1.5) * 180 / Math.PI, 0.1), Air);
        Assert.Equal(1.5, n.Value, 1e-12);
        Assert.Equal(0.0056723, n.StandardUncertainty, 0.0000001);
    }

    [Theory]
    [InlineData(40)]   // tan 40° < 1: a stone less dense than vacuum
    [InlineData(80)]   // tan 80° = 5.7: above the index bound 4
    public void An_unphysical_Brewster_angle_is_refused(double degrees) =>
        // In air the allowed angles are atan(1) = 45° to atan(4) = 75.9638°.
        OutOfRangeAssert.Throws(() => BrewsterAngle.IndexFrom(Angle.FromDegrees(degrees), Air), "Brewster angle", "45 to 75.9638 °");

    [Property]
    public Property Brewster_angle_and_index_are_inverse() =>
        Prop.ForAll(OpticsArbitraries.StoneAboveMedium, pair =>
        {
            double back = BrewsterAngle.IndexFrom(BrewsterAngle.Of(pair.Surrounding, pair.Stone), pair.Surrounding).Value;
            return (Math.Abs(back - pair.Stone.Value) < 1e-9).Label($"{pair}: back {back}");
        });
}
