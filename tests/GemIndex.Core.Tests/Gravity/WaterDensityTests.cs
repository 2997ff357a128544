using GemIndex.Core.Gravity;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Gravity;

public class WaterDensityTests
{
    [Fact]
    public void Water_density_at_20_degrees_matches_Tanaka_2001()
    {
        // Source: Tanaka et al. (2001), Metrologia 38, 301–309: ρ(20 °C) = 998.2067 kg/m³ (DOMAIN.md §5).
        // Tolerance: printed to 4 decimals, so ±0.00005 kg/m³ (half the last digit).
        Assert.Equal(998.2067, WaterDensity.At(Temperature.FromCelsius(20)).KilogramsPerCubicMetre, 0.00005);
    }

    [Fact]
    public void Water_density_at_4_degrees_matches_Tanaka_2001()
    {
        // Source: Tanaka et al. (2001), as quoted in DOMAIN.md §7: 999.9750 kg/m³ at 4 °C. The formula gives
        // 999.974948 (Python decimal), which is 999.97495 to 5 decimals and 999.9750 only when that is rounded
        // again (999.9749 if rounded once). Tolerance: one unit of the last printed digit, 0.0001, to allow that.
        Assert.Equal(999.9750, WaterDensity.At(Temperature.FromCelsius(4)).KilogramsPerCubicMetre, 0.0001);
    }

    [Fact]
    public void Water_density_at_25_degrees_matches_an_independent_evaluation_of_the_formula()
    {
        // Computed independently from the DOMAIN.md §5 constants with Python's decimal module at 30 significant
        // digits: 997.047021671824 kg/m³ (agrees with the commonly tabulated 997.047 at 25 °C, from memory).
        // Tolerance 1e-9 kg/m³: double rounding of a 1000-sized result is about 1e-13; 1e-9 leaves room.
        Assert.Equal(997.047021671824, WaterDensity.At(Temperature.FromCelsius(25)).KilogramsPerCubicMetre, 1e-9);
    }

    [Fact]
    public void Water_is_densest_near_4_degrees()
    {
        // The formula peaks at t = −a1 = 3.983035 °C, where ρ = a5 = 999.974950 kg/m³ exactly.
        double peak = WaterDensity.At(Temperature.FromCelsius(3.983035)).KilogramsPerCubicMetre;
        Assert.Equal(999.974950, peak, 1e-9);
        Assert.True(WaterDensity.At(Temperature.FromCelsius(2)).KilogramsPerCubicMetre < peak);
        Assert.True(WaterDensity.At(Temperature.FromCelsius(6)).KilogramsPerCubicMetre < peak);
    }

    [Fact]
    public void Relative_density_is_one_at_4_degrees_and_below_one_when_warm()
    {
        Assert.Equal(1, WaterDensity.At(Temperature.FromCelsius(4)).RelativeToFourDegrees);
        // 998.2067456 / 999.9749477 (both from the formula, Python decimal): 0.99823175356.
        Assert.Equal(0.99823175356, WaterDensity.At(Temperature.FromCelsius(20)).RelativeToFourDegrees, 1e-10);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(40)]
    public void The_ends_of_the_formula_range_are_accepted(double celsius) =>
        Assert.InRange(WaterDensity.At(Temperature.FromCelsius(celsius)).KilogramsPerCubicMetre, 992, 1000);

    [Theory]
    [InlineData(-0.5, "-0.5")]
    [InlineData(40.1, "40.1")]
    [InlineData(95, "95")]
    public void A_temperature_outside_the_formula_range_is_refused(double celsius, string shown)
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() => WaterDensity.At(Temperature.FromCelsius(celsius)));
        Assert.Equal($"water temperature is {shown} °C; allowed: 0 to 40 °C.", error.Message);
    }

    [Fact]
    public void Density_prints_with_its_unit_and_temperature() =>
        Assert.Equal("998.2067 kg/m³ at 20 °C", WaterDensity.At(Temperature.FromCelsius(20)).ToString());
}
