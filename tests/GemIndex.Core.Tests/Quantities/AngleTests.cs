using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Quantities;

public class AngleTests
{
    [Fact]
    public void Degrees_and_radians_convert_both_ways()
    {
        Assert.Equal(Math.PI, Angle.FromDegrees(180).Radians, 1e-15);
        Assert.Equal(90, Angle.FromRadians(Math.PI / 2).Degrees, 1e-12);
        Assert.Equal(1, Angle.FromDegrees(10, 1).StandardUncertaintyDegrees, 1e-12);
        Assert.Equal(Math.PI / 180, Angle.FromDegrees(10, 1).StandardUncertaintyRadians, 1e-15);
    }

    [Fact]
    public void Default_is_zero()
    {
        Assert.Equal(0, default(Angle).Radians);
        Assert.Equal(0, default(Angle).StandardUncertaintyRadians);
    }

    [Fact]
    public void An_angle_prints_in_degrees_with_its_uncertainty()
    {
        Assert.Equal("61.3°", Angle.FromDegrees(61.3).ToString());
        Assert.Equal("61.3° ± 0.05°", Angle.FromDegrees(61.3, 0.05).ToString());
    }

    [Theory]
    [InlineData(1e6, "angle is 17453.3 rad; allowed: -314.159 to 314.159 rad.")]
    [InlineData(double.NaN, "angle is not a finite number; allowed: -314.159 to 314.159 rad.")]
    [InlineData(double.NegativeInfinity, "angle is not a finite number; allowed: -314.159 to 314.159 rad.")]
    public void An_angle_beyond_fifty_turns_is_refused(double degrees, string message)
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() => Angle.FromDegrees(degrees));
        Assert.Equal(message, error.Message);
    }

    [Theory]
    [InlineData(-0.1, "angle uncertainty is -0.1 rad; allowed: 0 to 3.14159 rad.")]
    [InlineData(4, "angle uncertainty is 4 rad; allowed: 0 to 3.14159 rad.")]
    public void An_uncertainty_outside_half_a_turn_is_refused(double radians, string message)
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() => Angle.FromRadians(0, radians));
        Assert.Equal(message, error.Message);
    }
}
