using GemIndex.Core.Optics;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Quantities;

// Tests GemIndex.Core.Optics.RefractiveIndex; kept here with the other quantity types by the task's brief.
public class RefractiveIndexTests
{
    [Fact]
    public void An_index_keeps_its_value_and_uncertainty_and_prints_three_decimals()
    {
        var n = new RefractiveIndex(1.544, 0.001);
        Assert.Equal(1.544, n.Value);
        Assert.Equal(0.001, n.StandardUncertainty);
        Assert.Equal("1.544 ± 0.001", n.ToString());
        Assert.Equal("1.553", new RefractiveIndex(1.553).ToString());
    }

    [Fact]
    public void The_difference_of_two_indices_is_a_birefringence_in_either_order()
    {
        // Quartz ω 1.544, ε 1.553 (Handbook of Mineralogy, from memory): 0.009; σ = √(0.003² + 0.004²) = 0.005.
        Birefringence forward = new RefractiveIndex(1.553, 0.003) - new RefractiveIndex(1.544, 0.004);
        Birefringence backward = new RefractiveIndex(1.544, 0.004) - new RefractiveIndex(1.553, 0.003);
        Assert.Equal(0.009, forward.Value, 1e-12);
        Assert.Equal(0.005, forward.StandardUncertainty, 1e-12);
        Assert.Equal(forward, backward);
    }

    [Theory]
    [InlineData(0.99, "refractive index is 0.99; allowed: 1 to 4.")]
    [InlineData(4.01, "refractive index is 4.01; allowed: 1 to 4.")]
    [InlineData(double.NaN, "refractive index is not a finite number; allowed: 1 to 4.")]
    public void An_index_outside_the_range_is_refused(double value, string message)
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() => new RefractiveIndex(value));
        Assert.Equal(message, error.Message);
        Assert.Equal("refractive index", error.Quantity);
    }

    [Theory]
    [InlineData(-0.001, "refractive index uncertainty is -0.001; allowed: 0 to 0.5.")]
    [InlineData(0.6, "refractive index uncertainty is 0.6; allowed: 0 to 0.5.")]
    public void An_uncertainty_outside_the_range_is_refused(double uncertainty, string message)
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() => new RefractiveIndex(1.5, uncertainty));
        Assert.Equal(message, error.Message);
    }
}
