using static GemIndex.Tests.CommandLine.Calc.CalcRun;

namespace GemIndex.Tests.CommandLine.Calc;

public class CalcRefractometerCommandTests
{
    [Fact]
    public void Edge_angle_of_quartz_omega_on_a_1_88_glass_follows_the_critical_angle_condition()
    {
        // Quartz ω 1.544 (DOMAIN.md §7, Handbook of Mineralogy from memory); sin θ = 1.544 / 1.88 computed here.
        double expected = Degrees(Math.Asin(1.544 / 1.88));
        var result = Json("refractometer", "--index", "1.544");
        Assert.Equal(expected, result.Number("edge_angle_degrees"), 1e-9); // same formula: only rounding differs
        Assert.False(result.GetProperty("over_the_limit").GetBoolean());
        Assert.Equal(1.30, result.Number("lowest_readable_index"), 1e-12);
        Assert.Equal(1.79, result.Number("highest_readable_index"), 1e-12); // the contact liquid sets the top
    }

    [Fact]
    public void Edge_angle_gives_back_the_index_it_came_from()
    {
        double angle = Json("refractometer", "--index", "1.6281").Number("edge_angle_degrees");
        Assert.Equal(1.6281, Json("refractometer", "--edge-angle", Typed(angle)).Number("index"), 1e-9);
    }

    [Fact]
    public void Diamond_is_over_the_limit_of_a_1_79_liquid()
    {
        var (exit, output, _) = Text("refractometer", "--index", "2.417");
        Assert.Equal(0, exit);
        Assert.Contains("over the limit (above 1.7900)", output, StringComparison.Ordinal);
        Assert.True(Json("refractometer", "--index", "2.417").GetProperty("over_the_limit").GetBoolean());
    }

    [Fact]
    public void An_index_below_the_scale_is_not_readable()
    {
        // The default scale starts at 1.30: an index of 1.20 (below any gem but a few organics' spot readings) is off it.
        var (exit, output, _) = Text("refractometer", "--index", "1.2");
        Assert.Equal(0, exit);
        Assert.Contains("below the scale (it starts at 1.3000), not readable", output, StringComparison.Ordinal);
        Assert.DoesNotContain("edge angle 39.67°: readable", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Calibration_offset_is_known_minus_read_averaged_over_the_standards()
    {
        // Worked example of our own: (1.544 − 1.546) and (1.553 − 1.555) both give −0.002, so the offset is −0.002.
        var result = Json("refractometer", "--standard", "1.544:1.546", "--standard", "1.553:1.555");
        Assert.Equal(-0.002, result.Number("calibration_offset"), 1e-12);
        Assert.Equal(2, result.GetProperty("standards").GetArrayLength());
    }

    [Fact]
    public void A_liquid_above_the_glass_is_one_line_naming_both_options()
    {
        string line = OneErrorLine("refractometer", "--liquid", "1.95");
        Assert.StartsWith("gemindex calc: --glass, --liquid: contact liquid index is 1.95", line, StringComparison.Ordinal);
    }

    [Fact]
    public void A_standard_without_its_reading_is_a_usage_error_naming_the_option()
    {
        var (exit, _, error) = Text("refractometer", "--standard", "1.544");
        Assert.Equal(BadInput, exit);
        Assert.Contains("--standard: '1.544' should be 2 numbers joined by ':'", error, StringComparison.Ordinal);
    }
}
