using static GemIndex.Tests.CommandLine.Calc.CalcRun;

namespace GemIndex.Tests.CommandLine.Calc;

public class CalcCaratsCommandTests
{
    [Fact]
    public void One_carat_is_0_2_grams()
    {
        // Metric carat 0.2 g exactly (adopted by the CGPM in 1907, as quoted in DOMAIN.md §7).
        Assert.Equal(0.254, Json("carats", "--carats", "1.27").Number("grams"), 1e-12);
        Assert.Equal(5, Json("carats", "--grams", "1").Number("carats"), 1e-12);
        var (exit, output, _) = Text("carats", "--carats", "1.27");
        Assert.Equal(0, exit);
        Assert.Equal("1.27 ct = 0.254 g", output.Trim());
    }

    [Fact]
    public void A_negative_mass_names_the_option()
    {
        Assert.StartsWith("gemindex calc: --carats: mass is", OneErrorLine("carats", "--carats", "-1"), StringComparison.Ordinal);
    }

    [Fact]
    public void Both_units_at_once_are_refused()
    {
        Assert.Equal("gemindex calc: give exactly one of --carats or --grams", OneErrorLine("carats", "--carats", "1", "--grams", "1"));
    }
}
