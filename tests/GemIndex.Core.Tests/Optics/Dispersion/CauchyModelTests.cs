using GemIndex.Core.Optics;
using GemIndex.Core.Optics.Dispersion;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Optics.Dispersion;

public class CauchyModelTests
{
    private static readonly double[] VisibleLines = [0.4047, 0.4358, 0.4861, 0.5461, 0.5876, 0.6563, 0.7065];

    [Fact]
    public void A_three_term_fit_recovers_the_coefficients_of_its_model()
    {
        // Exact points from n = 1.45 + 0.0036/λ² + 0.00004/λ⁴ (our own choice, near fused silica); a linear least-squares
        // fit reproduces them to rounding (1e-10 allows the conditioning of the 1, λ⁻², λ⁻⁴ basis).
        var truth = new CauchyModel(1.45, 0.0036, 0.00004);
        DispersionFit<CauchyModel> fit = CauchyModel.Fit(SellmeierModelTests.Points(truth, VisibleLines), 3);
        Assert.Equal(1.45, fit.Model.A, 1e-10);
        Assert.Equal(0.0036, fit.Model.BSquareMicrometres, 1e-10);
        Assert.Equal(0.00004, fit.Model.CQuarticMicrometres, 1e-10);
        Assert.True(fit.RootMeanSquareResidual < 1e-12, $"RMS {fit.RootMeanSquareResidual}");
    }

    [Fact]
    public void A_three_term_fit_describes_fused_silica_across_the_visible()
    {
        // Points from Malitson's (1965) Sellmeier model at 7 visible lines. Cauchy is an approximation: its method
        // error over 400–710 nm is well under the refractometer's 0.001 (common practice); we require RMS < 1e-4.
        DispersionFit<CauchyModel> fit = CauchyModel.Fit(SellmeierModelTests.Points(DispersionModels.FusedSilica, VisibleLines), 3);
        Assert.True(fit.RootMeanSquareResidual < 1e-4, $"RMS {fit.RootMeanSquareResidual}");
        Assert.Equal(1.4585, fit.Model.IndexAt(ReferenceWavelengths.SmallD), 0.0001);
    }

    [Fact]
    public void The_two_term_curve_passes_through_the_catalogue_index_and_dispersion()
    {
        // Diamond: n_D 2.417, nG − nB 0.044 (DOMAIN.md §7, Peter 1923, from memory).
        CauchyModel m = CauchyModel.FromIndexAndDispersion(new RefractiveIndex(2.417), 0.044);
        Assert.Equal(2.417, m.IndexAt(ReferenceWavelengths.D), 1e-12);
        Assert.Equal(0.044, TradeDispersion.Of(m), 1e-12);
    }

    [Fact]
    public void The_two_term_curve_of_diamond_agrees_with_its_Sellmeier_model_in_green_light()
    {
        // Two independent descriptions of diamond at e (546.07 nm): the Cauchy curve through n_D and nG − nB, and
        // Peter's (1923) Sellmeier model (from memory). Tolerance 0.001: the refractometer's reading precision
        // (common practice), which is what the conversion must not spoil.
        CauchyModel cauchy = CauchyModel.FromIndexAndDispersion(new RefractiveIndex(2.417), 0.044);
        Assert.Equal(DispersionModels.Diamond.IndexAt(ReferenceWavelengths.E), cauchy.IndexAt(ReferenceWavelengths.E), 0.001);
    }

    [Fact]
    public void A_two_term_fit_through_indices_at_B_and_G_gives_their_difference_and_one_point_is_refused()
    {
        // Indices read at the B and G Fraunhofer lines (686.7 and 430.8 nm): the trade's dispersion is their difference
        // (nG − nB, DOMAIN.md §4), so the curve through the two must give it back to rounding. Corundum-like values from memory.
        DispersionPoint[] points = [new(Wavelength.FromNanometres(686.7), 1.757), new(Wavelength.FromNanometres(430.8), 1.775)];
        DispersionFit<CauchyModel> fit = CauchyModel.Fit(points, 2);
        Assert.Equal(0.018, TradeDispersion.Of(fit.Model), 1e-9);
        Assert.All(fit.Residuals, r => Assert.Equal(0, r, 1e-12));
        OutOfRangeAssert.Throws(() => CauchyModel.Fit(points[..1], 2), "number of points for a 2-parameter Cauchy fit", "2 or more");
    }

    [Fact]
    public void A_fit_with_a_repeated_wavelength_is_refused()
    {
        DispersionPoint[] points = [.. SellmeierModelTests.Points(DispersionModels.FusedSilica, 0.486, 0.589, 0.656),
            new DispersionPoint(Wavelength.FromNanometres(589), 1.4584)];
        var e = Assert.Throws<ArgumentException>(() => CauchyModel.Fit(points, 2));
        Assert.Contains("wavelength 589 nm is given 2 times", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_fit_with_an_unset_point_is_refused()
    {
        DispersionPoint[] points = [.. SellmeierModelTests.Points(DispersionModels.FusedSilica, 0.486, 0.589, 0.656), default];
        OutOfRangeAssert.Throws(() => CauchyModel.Fit(points, 2), "wavelength", "200 to 5000 nm");
    }

    [Theory]
    [InlineData(1)]
    [InlineData(4)]
    public void A_fit_with_other_than_two_or_three_terms_is_refused(int terms) =>
        OutOfRangeAssert.Throws(() => CauchyModel.Fit(SellmeierModelTests.Points(DispersionModels.FusedSilica, VisibleLines), terms),
            "number of Cauchy terms", "2 to 3");

    [Fact]
    public void A_negative_dispersion_is_refused() =>
        OutOfRangeAssert.Throws(() => CauchyModel.FromIndexAndDispersion(new RefractiveIndex(1.5), -0.01), "dispersion nG − nB", "0 to 0.5");

    [Fact]
    public void A_coefficient_A_below_1_is_refused() =>
        OutOfRangeAssert.Throws(() => new CauchyModel(0.9, 0.004), "Cauchy coefficient A", "1 to 4");
}
