using GemIndex.Core.Gravity;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Gravity;

public class SpecificGravityTests
{
    [Fact]
    public void A_specific_gravity_keeps_its_value_and_uncertainty()
    {
        var sg = new SpecificGravity(3.52, 0.01);
        Assert.Equal(3.52, sg.Value);
        Assert.Equal(0.01, sg.StandardUncertainty);
        Assert.Equal("3.52 ± 0.01", sg.ToString());
        Assert.Equal("2.65", new SpecificGravity(2.65).ToString());
    }

    [Fact]
    public void A_careful_weighing_shows_a_third_decimal_rather_than_plus_or_minus_nothing()
    {
        // An invented weighing (a display check, no reference value): 5.210 ct in air and 3.312 ct in water, each ± 0.002 ct: the uncorrected ratio 2.745, σ about 0.0034 (first-order
        // propagation; the water's density at 20 °C would give 2.740).
        Assert.Equal("2.745 ± 0.003", new SpecificGravity(2.745, 0.0034).ToString());
        Assert.Equal("2.75 ± 0.01", new SpecificGravity(2.745, 0.01).ToString());
        Assert.Equal("2.745 ± 0.005", SpecificGravity.Text(2.7449, 0.0049)); // under 0.005: still three decimals
        // A 100 ct stone on a 0.001 ct balance: σ about 0.0002, which three decimals would write as nothing.
        Assert.Equal("2.648 ± <0.001", SpecificGravity.Text(2.6481, 0.0002));
    }

    [Theory]
    [InlineData(0.4, "specific gravity is 0.4; allowed: 0.5 to 25.")]
    [InlineData(25.5, "specific gravity is 25.5; allowed: 0.5 to 25.")]
    [InlineData(double.NaN, "specific gravity is not a finite number; allowed: 0.5 to 25.")]
    [InlineData(double.PositiveInfinity, "specific gravity is not a finite number; allowed: 0.5 to 25.")]
    public void A_value_outside_the_range_is_refused(double value, string message)
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() => new SpecificGravity(value));
        Assert.Equal(message, error.Message);
    }

    [Theory]
    [InlineData(-0.01, "specific gravity uncertainty is -0.01; allowed: 0 to 5.")]
    [InlineData(6, "specific gravity uncertainty is 6; allowed: 0 to 5.")]
    public void An_uncertainty_outside_the_range_is_refused(double uncertainty, string message)
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() => new SpecificGravity(3, uncertainty));
        Assert.Equal(message, error.Message);
    }
}
