using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Quantities;

public class TemperatureTests
{
    [Fact]
    public void A_temperature_keeps_its_value_and_prints_its_unit()
    {
        Assert.Equal(21.5, Temperature.FromCelsius(21.5).Celsius);
        Assert.Equal("21.5 °C", Temperature.FromCelsius(21.5).ToString());
        Assert.Equal(0, default(Temperature).Celsius);
    }

    [Theory]
    [InlineData(-51, "temperature is -51 °C; allowed: -50 to 150 °C.")]
    [InlineData(151, "temperature is 151 °C; allowed: -50 to 150 °C.")]
    [InlineData(double.PositiveInfinity, "temperature is not a finite number; allowed: -50 to 150 °C.")]
    public void A_temperature_outside_the_range_is_refused(double celsius, string message)
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() => Temperature.FromCelsius(celsius));
        Assert.Equal(message, error.Message);
    }
}
