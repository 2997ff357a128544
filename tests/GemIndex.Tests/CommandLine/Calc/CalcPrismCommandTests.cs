using static GemIndex.Tests.CommandLine.Calc.CalcRun;

namespace GemIndex.Tests.CommandLine.Calc;

public class CalcPrismCommandTests
{
    [Fact]
    public void Index_from_apex_and_minimum_deviation_follows_the_prism_formula()
    {
        // n = sin((A + Dmin)/2) / sin(A/2) (DOMAIN.md §4), computed here for A 60°, Dmin 37.18°.
        double expected = Math.Sin(Radians((60 + 37.18) / 2)) / Math.Sin(Radians(30));
        var result = Json("prism", "--apex", "60", "--deviation", "37.18");
        Assert.Equal(expected, result.Number("index"), 1e-9);
        Assert.Equal(0, result.Number("index_uncertainty"));
    }

    [Fact]
    public void Angle_uncertainties_give_an_index_uncertainty()
    {
        var (exit, output, _) = Text("prism", "--apex", "60", "--apex-uncertainty", "0.01", "--deviation", "37.18", "--deviation-uncertainty", "0.02");
        Assert.Equal(0, exit);
        Assert.Matches(@"refractive index 1\.5000 ± 0\.0\d{3} \(no unit\)", output);
        Assert.True(Json("prism", "--apex", "60", "--apex-uncertainty", "0.01", "--deviation", "37.18").Number("index_uncertainty") > 0);
    }

    [Fact]
    public void An_apex_beyond_its_range_names_the_apex_option()
    {
        Assert.StartsWith("gemindex calc: --apex", OneErrorLine("prism", "--apex", "200", "--deviation", "30"), StringComparison.Ordinal);
    }
}
