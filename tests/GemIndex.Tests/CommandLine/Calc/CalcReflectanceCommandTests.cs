using static GemIndex.Tests.CommandLine.Calc.CalcRun;

namespace GemIndex.Tests.CommandLine.Calc;

public class CalcReflectanceCommandTests
{
    [Fact]
    public void A_reflectance_out_of_range_is_told_in_percent_as_typed()
    {
        var (exit, _, error) = Text("reflectance", "--reflectance-percent", "120");
        Assert.Equal(3, exit);
        Assert.Contains("--reflectance-percent: normal-incidence reflectance is 120 %; allowed: 0 to 36", error, StringComparison.Ordinal);
    }

    [Fact]
    public void Glass_of_index_1_5_reflects_4_percent_at_normal_incidence()
    {
        // R = 4.0 % for n 1.5 at normal incidence: Hecht, Optics, as quoted in DOMAIN.md §7. Printed to 0.1 %, so ±0.05 %.
        var result = Json("reflectance", "--n2", "1.5");
        Assert.Equal(4.0, result.Number("unpolarised_percent"), 0.05);
        Assert.Equal(result.Number("s_percent"), result.Number("p_percent"), 1e-12); // s and p coincide at normal incidence
        var (exit, output, _) = Text("reflectance", "--n2", "1.5");
        Assert.Equal(0, exit);
        Assert.Contains("unpolarised 4.000 %", output, StringComparison.Ordinal);
    }

    [Fact]
    public void The_index_from_a_normal_reflectance_inverts_the_forward_calculation()
    {
        double percent = Json("reflectance", "--n2", "2.417").Number("unpolarised_percent");
        Assert.Equal(2.417, Json("reflectance", "--reflectance-percent", Typed(percent)).Number("index_to"), 1e-9);
    }

    [Fact]
    public void A_reflectance_of_zero_is_one_line_naming_the_option()
    {
        string line = OneErrorLine("reflectance", "--reflectance-percent", "0");
        Assert.StartsWith("gemindex calc: --reflectance-percent: normal-incidence reflectance is 0 %", line, StringComparison.Ordinal);
    }

    [Fact]
    public void Giving_both_an_index_and_a_reflectance_is_refused()
    {
        Assert.Contains("give exactly one of --n2", OneErrorLine("reflectance", "--n2", "1.5", "--reflectance-percent", "4"), StringComparison.Ordinal);
    }
}
