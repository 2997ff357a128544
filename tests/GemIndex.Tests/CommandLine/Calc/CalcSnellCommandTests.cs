using static GemIndex.Tests.CommandLine.Calc.CalcRun;

namespace GemIndex.Tests.CommandLine.Calc;

public class CalcSnellCommandTests
{
    [Fact]
    public void Light_from_air_into_glass_bends_towards_the_normal_by_snells_law()
    {
        // Worked example of our own: sin θ2 = 1.000 · sin 30° / 1.5, computed here with Math.Asin.
        double expected = Degrees(Math.Asin(Math.Sin(Radians(30)) / 1.5));
        var result = Json("snell", "--n1", "1.0", "--n2", "1.5", "--incidence", "30");
        Assert.False(result.GetProperty("totally_reflected").GetBoolean());
        Assert.Equal(expected, result.Number("refraction_degrees"), 1e-9); // same formula, so only rounding differs
        var (exit, output, _) = Text("snell", "--n1", "1.0", "--n2", "1.5", "--incidence", "30");
        Assert.Equal(0, exit);
        Assert.Contains("refraction angle: 19.47°", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Light_inside_diamond_beyond_the_critical_angle_is_totally_reflected()
    {
        // Critical angle of diamond in air 24.4° (DOMAIN.md §7, computed from n 2.417), so 30° is beyond it.
        var (exit, output, _) = Text("snell", "--n1", "2.417", "--n2", "1", "--incidence", "30");
        Assert.Equal(0, exit);
        Assert.Contains("totally reflected (the critical angle is 24.44°)", output, StringComparison.Ordinal);
        Assert.False(Json("snell", "--n1", "2.417", "--n2", "1", "--incidence", "30").TryGetProperty("refraction_degrees", out _));
    }

    [Fact]
    public void A_comma_decimal_mark_is_a_usage_error_naming_the_option()
    {
        var (exit, _, error) = Text("snell", "--n1", "1,5", "--n2", "1", "--incidence", "10");
        Assert.Equal(BadInput, exit);
        Assert.Contains("--n1: '1,5' has a comma: use a dot as the decimal mark", error, StringComparison.Ordinal);
    }

    [Fact]
    public void An_index_below_1_is_one_line_naming_the_option_and_the_range()
    {
        string line = OneErrorLine("snell", "--n1", "0.9", "--n2", "1", "--incidence", "10");
        Assert.Equal("gemindex calc: --n1: refractive index is 0.9; allowed: 1 to 4.", line);
    }

    [Fact]
    public void An_incidence_beyond_90_degrees_names_the_incidence_option()
    {
        string line = OneErrorLine("snell", "--n1", "1", "--n2", "1.5", "--incidence", "95");
        Assert.StartsWith("gemindex calc: --incidence: ", line, StringComparison.Ordinal);
        Assert.Contains("95", line, StringComparison.Ordinal);
    }
}
