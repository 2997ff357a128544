using static GemIndex.Tests.CommandLine.Calc.CalcRun;

namespace GemIndex.Tests.CommandLine.Calc;

public class CalcSpecificGravityCommandTests
{
    [Fact]
    public void Water_density_at_20_degrees_matches_Tanaka_2001()
    {
        // Tanaka et al. (2001), Metrologia 38, 301–309, as quoted in DOMAIN.md §5/§7: 998.2067 kg/m³ at 20 °C.
        // Printed to 4 decimals, so ±0.00005 kg/m³.
        Assert.Equal(998.2067, Json("sg", "--water-celsius", "20").Number("water_density_kilograms_per_cubic_metre"), 0.00005);
        var (exit, output, _) = Text("sg");
        Assert.Equal(0, exit);
        Assert.Contains("water at 20 °C: density 998.2067 kg/m³", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Specific_gravity_in_water_at_4_degrees_is_weight_over_loss()
    {
        // Worked example of our own: at 4 °C the water factor is 1, so SG = 2.000 / (2.000 − 1.245), computed here.
        var result = Json("sg", "--in-air", "2.000", "--in-water", "1.245", "--water-celsius", "4");
        Assert.Equal(2.000 / (2.000 - 1.245), result.Number("specific_gravity"), 1e-9);
    }

    [Fact]
    public void Grams_and_carats_give_the_same_specific_gravity_and_a_resolution_gives_an_uncertainty()
    {
        double carats = Json("sg", "--in-air", "2.000", "--in-water", "1.245", "--resolution", "0.001").Number("specific_gravity");
        var grams = Json("sg", "--in-air", "0.4", "--in-water", "0.249", "--unit", "g", "--resolution", "0.0002");
        Assert.Equal(carats, grams.Number("specific_gravity"), 1e-9);
        Assert.True(grams.Number("specific_gravity_uncertainty") > 0);
        var (_, output, _) = Text("sg", "--in-air", "2.000", "--in-water", "1.245", "--resolution", "0.001");
        // σ about 0.008 from the balance's resolution: two decimals, the one way an SG is written (SpecificGravity.Text).
        Assert.Matches(@"specific gravity 2\.64 ± 0\.01 \(relative to water at 4 °C, no unit\)", output);
    }

    [Fact]
    public void Weight_in_water_above_weight_in_air_is_one_line_naming_both_options()
    {
        Assert.Equal("gemindex calc: --in-air, --in-water: weight in water is 1.2 ct; allowed: 0 to below the weight in air 1 ct.",
            OneErrorLine("sg", "--in-air", "1", "--in-water", "1.2"));
    }

    [Fact]
    public void Water_above_40_degrees_names_the_temperature_option()
    {
        Assert.Contains("--water-celsius: water temperature is 50 °C; allowed: 0 to 40 °C.", OneErrorLine("sg", "--water-celsius", "50"));
    }
}
