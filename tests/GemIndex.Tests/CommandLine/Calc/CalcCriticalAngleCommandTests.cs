using static GemIndex.Tests.CommandLine.Calc.CalcRun;

namespace GemIndex.Tests.CommandLine.Calc;

public class CalcCriticalAngleCommandTests
{
    [Fact]
    public void Critical_angle_of_diamond_in_air_is_24_4_degrees()
    {
        // DOMAIN.md §7: diamond in air 24.4°, computed from n 2.417. Printed to 0.1°, so ±0.05°.
        Assert.Equal(24.4, Json("critical-angle", "--denser", "2.417").Number("critical_angle_degrees"), 0.05);
        var (exit, output, _) = Text("critical-angle", "--denser", "2.417");
        Assert.Equal(0, exit);
        Assert.Contains("critical angle from 2.4170 into 1.0000 (no unit): 24.44°", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Critical_angle_of_water_against_air_is_48_6_degrees()
    {
        // DOMAIN.md §7: water–air 48.6°, computed from n 1.333. Printed to 0.1°, so ±0.05°.
        Assert.Equal(48.6, Json("critical-angle", "--denser", "1.333", "--rarer", "1.000").Number("critical_angle_degrees"), 0.05);
    }

    [Fact]
    public void A_rarer_medium_given_as_the_denser_has_no_critical_angle()
    {
        var (exit, output, _) = Text("critical-angle", "--denser", "1.0", "--rarer", "1.5");
        Assert.Equal(0, exit);
        Assert.Contains("no critical angle", output, StringComparison.Ordinal);
        Assert.False(Json("critical-angle", "--denser", "1.0", "--rarer", "1.5").TryGetProperty("critical_angle_degrees", out _));
    }

    [Fact]
    public void An_index_above_4_names_the_option()
    {
        Assert.Equal("gemindex calc: --denser: refractive index is 4.5; allowed: 1 to 4.", OneErrorLine("critical-angle", "--denser", "4.5"));
    }
}
