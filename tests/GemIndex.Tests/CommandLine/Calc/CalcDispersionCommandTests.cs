using System.Globalization;
using System.Text.Json;
using static GemIndex.Tests.CommandLine.Calc.CalcRun;

namespace GemIndex.Tests.CommandLine.Calc;

public class CalcDispersionCommandTests
{
    // Fused silica, Malitson (1965), J. Opt. Soc. Am. 55, 1205, coefficients as quoted in DOMAIN.md §7; λ in µm.
    private static double FusedSilica(double nanometres)
    {
        double[] b = [0.6961663, 0.4079426, 0.8974794], c = [0.0684043, 0.1162414, 9.896161];
        double l2 = nanometres * nanometres / 1e6;
        return Math.Sqrt(1 + Enumerable.Range(0, 3).Sum(i => b[i] * l2 / (l2 - c[i] * c[i])));
    }

    private static string[] Points(Func<double, double> index, params double[] nanometres) =>
        [.. nanometres.SelectMany(nm => new[] { "--point", string.Create(CultureInfo.InvariantCulture, $"{nm}:{index(nm):R}") })];

    [Fact]
    public void A_three_term_cauchy_fit_to_fused_silica_gives_its_index_and_trade_dispersion()
    {
        var result = Json(["dispersion", "--terms", "3", .. Points(FusedSilica, 430.8, 486.13, 546.07, 587.56, 656.27, 686.7)]);
        // Tolerance: the fit's own misfit. A 3-term Cauchy cannot follow the Sellmeier curve exactly; three times the
        // largest residual it reports bounds how far its nD may sit from the curve (twice that for a difference).
        double misfit = result.GetProperty("points").EnumerateArray().Max(p => Math.Abs(p.Number("residual")));
        Assert.True(misfit < 1e-4, $"misfit {misfit}");
        Assert.Equal(FusedSilica(589.3), result.Number("index_at_sodium_d"), 3 * misfit);
        Assert.Equal(FusedSilica(430.8) - FusedSilica(686.7), result.Number("g_minus_b"), 6 * misfit);
        Assert.Equal(3, result.GetProperty("coefficients").GetArrayLength());
    }

    [Fact]
    public void Abbe_number_of_an_exact_cauchy_curve_matches_its_definition()
    {
        // Worked example of our own: points on n = 1.5 + 0.004/λ² (λ in µm) are fitted exactly by 2 terms, so the
        // Abbe number must equal Vd = (nd − 1)/(nF − nC) at 587.56, 486.13, 656.27 nm (DOMAIN.md §4), computed here.
        static double Cauchy(double nm) => 1.5 + 0.004 / (nm * nm / 1e6);
        var result = Json(["dispersion", .. Points(Cauchy, 450, 500, 550, 600, 650, 700)]);
        double expected = (Cauchy(587.56) - 1) / (Cauchy(486.13) - Cauchy(656.27));
        Assert.Equal(expected, result.Number("abbe_number"), 1e-6 * expected);
        Assert.Equal(1.5, result.GetProperty("coefficients")[0].Number("value"), 1e-9);
    }

    [Fact]
    public void A_conversion_depends_on_the_dispersion_alone_and_asks_no_nD()
    {
        // Corundum-like nG − nB 0.018 (from memory): a reading of 1.7750 in blue light moves by the Cauchy curve's slope,
        // B·(1/λ² − 1/λD²) with B = 0.018 / (1/0.4308² − 1/0.6867²) µm², whatever the material's level. The option --nd had
        // been required and then not used.
        double b = 0.018 / (1 / (0.4308 * 0.4308) - 1 / (0.6867 * 0.6867));
        double expected = 1.7750 - b * (1 / (0.4861 * 0.4861) - 1 / (0.5893 * 0.5893));
        Assert.Equal(expected, Json("dispersion", "--reading", "1.7750", "--wavelength", "486.1", "--g-minus-b", "0.018").Number("converted_index"), 1e-4);
        var (exit, _, error) = Text("dispersion", "--reading", "1.7750", "--wavelength", "486.1", "--nd", "1.762", "--g-minus-b", "0.018");
        Assert.NotEqual(0, exit);
        Assert.Contains("'--nd'", error, StringComparison.Ordinal);
    }

    [Fact]
    public void A_reading_at_589_3_nm_converts_to_itself()
    {
        var result = Json("dispersion", "--reading", "1.7700", "--wavelength", "589.3", "--g-minus-b", "0.018");
        Assert.Equal(1.77, result.Number("converted_index"), 1e-9);
    }

    [Fact]
    public void A_reading_in_blue_light_converts_to_a_lower_index_at_589_3_nm()
    {
        // Normal dispersion: n falls as wavelength rises (DOMAIN.md §4).
        var (exit, output, _) = Text("dispersion", "--reading", "1.7750", "--wavelength", "486.1", "--g-minus-b", "0.018");
        Assert.Equal(0, exit);
        Assert.Contains("1.7750 (no unit) at 486.1 nm →", output, StringComparison.Ordinal);
        var result = Json("dispersion", "--reading", "1.7750", "--wavelength", "486.1", "--g-minus-b", "0.018");
        Assert.True(result.Number("converted_index") < 1.775);
    }

    [Fact]
    public void Too_few_points_for_the_model_is_one_line_naming_the_options()
    {
        string line = OneErrorLine("dispersion", "--point", "500:1.5", "--point", "600:1.49", "--terms", "3");
        Assert.StartsWith("gemindex calc: --point, --terms: number of points for a 3-parameter Cauchy fit is 2", line, StringComparison.Ordinal);
        Assert.Contains("allowed: 3 or more", line, StringComparison.Ordinal);
    }

    [Fact]
    public void Indices_at_B_and_G_alone_give_the_dispersion_and_say_no_residual_checks_them()
    {
        // Two readings through B and G filters (corundum-like, from memory): nG − nB is their difference.
        var (exit, output, _) = Text("dispersion", "--point", "686.7:1.757", "--point", "430.8:1.775");
        Assert.Equal(0, exit);
        Assert.Contains("nG − nB (430.8 − 686.7 nm) 0.018", output, StringComparison.Ordinal);
        Assert.Contains("the curve passes through each point, so no residual checks the readings", output, StringComparison.Ordinal);
        Assert.DoesNotContain("rms residual", output, StringComparison.Ordinal);
        var result = Json("dispersion", "--point", "686.7:1.757", "--point", "430.8:1.775");
        Assert.Equal(0.018, result.Number("g_minus_b"), 1e-9);
    }

    [Fact]
    public void A_wavelength_given_twice_is_one_line_without_the_parameter_name()
    {
        string line = OneErrorLine("dispersion", "--point", "500:1.5", "--point", "500:1.5", "--point", "600:1.4");
        Assert.StartsWith("gemindex calc: --point, --terms: wavelength 500 nm is given 2 times", line, StringComparison.Ordinal);
        Assert.DoesNotContain("(Parameter", line, StringComparison.Ordinal);
    }

    [Fact]
    public void A_sellmeier_fit_that_does_not_converge_is_one_line()
    {
        // Invented zig-zag indices no 3-term Sellmeier curve can follow; the minimiser stops without converging.
        string line = OneErrorLine("dispersion", "--model", "sellmeier", "--terms", "3", "--point", "430:1.6", "--point", "450:1.4",
            "--point", "500:1.9", "--point", "550:1.2", "--point", "600:1.7", "--point", "650:1.3", "--point", "700:1.8", "--point", "750:1.5");
        Assert.StartsWith("gemindex calc: --point, --terms: ", line, StringComparison.Ordinal);
        Assert.Contains("did not converge", line, StringComparison.Ordinal);
    }

    [Fact]
    public void A_comma_inside_a_point_is_a_usage_error()
    {
        var (exit, _, error) = Text("dispersion", "--point", "500:1,5", "--point", "600:1.49", "--point", "700:1.48");
        Assert.Equal(BadInput, exit);
        Assert.Contains("--point: in '500:1,5', '1,5' has a comma", error, StringComparison.Ordinal);
    }
}
