using GemIndex.Core.Optics;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Quantities;

// Tests GemIndex.Core.Optics.Birefringence; kept here with the other quantity types by the task's brief.
public class BirefringenceTests
{
    [Fact]
    public void A_birefringence_keeps_its_value_and_prints_three_decimals()
    {
        Assert.Equal("0.009", new Birefringence(0.009).ToString());
        Assert.Equal("0.172 ± 0.002", new Birefringence(0.172, 0.002).ToString());
        Assert.Equal(0, default(Birefringence).Value);
    }

    [Theory]
    [InlineData(-0.001, "birefringence is -0.001; allowed: 0 to 3.")]
    [InlineData(3.5, "birefringence is 3.5; allowed: 0 to 3.")]
    [InlineData(double.NaN, "birefringence is not a finite number; allowed: 0 to 3.")]
    public void A_birefringence_outside_the_range_is_refused(double value, string message)
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() => new Birefringence(value));
        Assert.Equal(message, error.Message);
    }

    [Fact]
    public void An_uncertainty_outside_the_range_is_refused()
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() => new Birefringence(0.01, 0.6));
        Assert.Equal("birefringence uncertainty is 0.6; allowed: 0 to 0.5.", error.Message);
    }
}
