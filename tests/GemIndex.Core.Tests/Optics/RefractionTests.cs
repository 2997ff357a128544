using GemIndex.Core.Optics;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Optics;

public class RefractionTests
{
    [Fact]
    public void A_refracted_ray_keeps_its_angle()
    {
        Refraction r = Refraction.Refracted(Angle.FromDegrees(20));
        Assert.False(r.IsTotallyReflected);
        Assert.True(r.TryGetAngle(out Angle angle));
        Assert.Equal(20, angle.Degrees, 1e-12);
    }

    [Theory]
    [InlineData(-0.1)]
    [InlineData(91)]
    public void A_refraction_angle_outside_0_to_90_degrees_is_refused(double degrees) =>
        OutOfRangeAssert.Throws(() => Refraction.Refracted(Angle.FromDegrees(degrees)), "refraction angle", "0 to 90 °");
}
