using GemIndex.Core.Optics;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Optics;

public class CriticalAngleTests
{
    private static readonly RefractiveIndex Air = new(1.0);

    [Fact]
    public void Diamond_in_air_has_a_critical_angle_of_24_4_degrees()
    {
        // Source: DOMAIN.md §7, computed from n 2.417: asin(1/2.417) = 24.44°. Tolerance: quoted to 0.1°, so ±0.05°.
        Angle? angle = CriticalAngle.Between(new RefractiveIndex(2.417), Air);
        Assert.NotNull(angle);
        Assert.Equal(24.4, angle.Value.Degrees, 0.05);
    }

    [Fact]
    public void Water_to_air_has_a_critical_angle_of_48_6_degrees()
    {
        // Source: DOMAIN.md §7, computed from n 1.333: asin(1/1.333) = 48.61°. Tolerance: quoted to 0.1°, so ±0.05°.
        Assert.True(CriticalAngle.TryBetween(new RefractiveIndex(1.333), Air, out Angle angle));
        Assert.Equal(48.6, angle.Degrees, 0.05);
    }

    [Theory]
    [InlineData(1.5, 1.5)]
    [InlineData(1.33, 1.5)]
    public void There_is_no_critical_angle_unless_the_first_medium_is_denser(double denser, double rarer)
    {
        Assert.Null(CriticalAngle.Between(new RefractiveIndex(denser), new RefractiveIndex(rarer)));
        Assert.False(CriticalAngle.TryBetween(new RefractiveIndex(denser), new RefractiveIndex(rarer), out _));
    }

    [Fact]
    public void Index_uncertainties_propagate_to_first_order()
    {
        // Worked example of our own: n_denser 2.417 ± 0.002, n_rarer 1 exact. dθ/dn_denser = −n_r/(n_d² cos θc)
        // = −1/(2.417² · 0.910397) = −0.188025 rad; σθ = 0.002 · 0.188025 = 3.76050e-4 rad = 0.021546°.
        // A central finite difference agrees (checked below). Tolerance: 5 printed significant digits.
        Angle angle = CriticalAngle.Between(new RefractiveIndex(2.417, 0.002), Air)!.Value;
        Assert.Equal(0.021546, angle.StandardUncertaintyDegrees, 0.0000005);
        double numeric = (Math.Asin(1 / 2.415) - Math.Asin(1 / 2.419)) / 2 * 180 / Math.PI;
        Assert.Equal(numeric, angle.StandardUncertaintyDegrees, 0.00001);
    }
}
