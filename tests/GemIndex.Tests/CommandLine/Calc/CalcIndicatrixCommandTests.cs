using static GemIndex.Tests.CommandLine.Calc.CalcRun;

namespace GemIndex.Tests.CommandLine.Calc;

public class CalcIndicatrixCommandTests
{
    [Fact]
    public void Quartz_is_uniaxial_positive_with_birefringence_0_009()
    {
        // Quartz ω 1.544, ε 1.553, uniaxial + (DOMAIN.md §7, Handbook of Mineralogy from memory). 0.009 = ε − ω.
        var result = Json("indicatrix", "--omega", "1.544", "--epsilon", "1.553");
        Assert.Equal("uniaxial", result.GetProperty("character").GetString());
        Assert.Equal("positive", result.GetProperty("sign").GetString());
        Assert.Equal(0.009, result.Number("birefringence"), 1e-12);
        var (exit, output, _) = Text("indicatrix", "--omega", "1.544", "--epsilon", "1.553");
        Assert.Equal(0, exit);
        Assert.Contains("uniaxial: ω 1.5440, ε 1.5530 (no unit)", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Calcite_is_uniaxial_negative()
    {
        // Calcite ω 1.658, ε 1.486, uniaxial − (DOMAIN.md §7, Handbook of Mineralogy from memory).
        Assert.Equal("negative", Json("indicatrix", "--omega", "1.658", "--epsilon", "1.486").GetProperty("sign").GetString());
        // A uniaxial crystal's one optic axis: 2V = 0° as the trade says it, never "2Vz 180°".
        var (_, output, _) = Text("indicatrix", "--omega", "1.658", "--epsilon", "1.486");
        Assert.Contains("2V 0° (uniaxial: one optic axis)", output, StringComparison.Ordinal);
        Assert.DoesNotContain("180", output, StringComparison.Ordinal);
        Assert.Equal(0, Json("indicatrix", "--omega", "1.658", "--epsilon", "1.486").Number("optic_axial_angle_degrees"));
    }

    [Fact]
    public void Biaxial_2Vz_follows_the_optic_angle_formula()
    {
        // cos² Vz = α²(γ² − β²) / (β²(γ² − α²)) (DOMAIN.md §3), computed here for invented indices 1.619, 1.620, 1.627.
        double a = 1.619, b = 1.620, g = 1.627;
        double expected = 2 * Degrees(Math.Acos(Math.Sqrt(a * a * (g * g - b * b) / (b * b * (g * g - a * a)))));
        var result = Json("indicatrix", "--alpha", "1.619", "--beta", "1.620", "--gamma", "1.627");
        Assert.Equal(expected, result.Number("optic_axial_angle_degrees"), 1e-6);
        Assert.Equal("positive", result.GetProperty("sign").GetString()); // 2Vz < 90°
    }

    [Fact]
    public void A_rotation_series_stays_between_alpha_and_gamma()
    {
        var result = Json("indicatrix", "--alpha", "1.619", "--beta", "1.620", "--gamma", "1.627", "--facet", "1,1,1", "--step", "30");
        var rows = result.GetProperty("rotation").EnumerateArray().ToArray();
        Assert.NotEmpty(rows);
        Assert.All(rows, r =>
        {
            Assert.InRange(r.Number("low_index"), 1.619 - 1e-12, 1.627 + 1e-12);
            Assert.InRange(r.Number("high_index"), r.Number("low_index"), 1.627 + 1e-12);
        });
        var (exit, output, _) = Text("indicatrix", "--alpha", "1.619", "--beta", "1.620", "--gamma", "1.627", "--facet", "1,1,1", "--step", "30");
        Assert.Equal(0, exit);
        Assert.Contains("rotation    low index  high index  difference", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Indices_out_of_order_are_one_line_naming_the_options()
    {
        Assert.StartsWith("gemindex calc: --alpha, --beta, --gamma: ", OneErrorLine("indicatrix", "--alpha", "1.7", "--beta", "1.6", "--gamma", "1.8"), StringComparison.Ordinal);
    }

    [Fact]
    public void A_zero_facet_normal_names_the_facet_option()
    {
        Assert.StartsWith("gemindex calc: --facet: ", OneErrorLine("indicatrix", "--omega", "1.5", "--epsilon", "1.6", "--facet", "0,0,0"), StringComparison.Ordinal);
    }
}
