using static GemIndex.Tests.CommandLine.Calc.CalcRun;

namespace GemIndex.Tests.CommandLine.Calc;

public class CalcBrewsterCommandTests
{
    [Fact]
    public void Brewster_angle_of_index_1_5_in_air_is_56_3_degrees()
    {
        // θB 56.3° for n 1.5: Hecht, Optics, as quoted in DOMAIN.md §7. Printed to 0.1°, so ±0.05°.
        Assert.Equal(56.3, Json("brewster", "--index", "1.5").Number("brewster_angle_degrees"), 0.05);
    }

    [Fact]
    public void Index_from_a_brewster_angle_is_its_tangent_with_an_uncertainty()
    {
        // tan θB = n2 / n1 (DOMAIN.md §4), computed here; σ must be reported when the angle has one.
        var result = Json("brewster", "--angle", "60", "--angle-uncertainty", "0.1");
        Assert.Equal(Math.Tan(Radians(60)), result.Number("stone_index"), 1e-9);
        Assert.True(result.Number("stone_index_uncertainty") > 0);
    }

    [Fact]
    public void Neither_index_nor_angle_is_refused_with_one_line()
    {
        Assert.Equal("gemindex calc: give exactly one of --index (to get the angle) or --angle (to get the index)", OneErrorLine("brewster"));
    }
}
