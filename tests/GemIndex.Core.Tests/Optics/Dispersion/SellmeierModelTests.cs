using GemIndex.Core.Optics.Dispersion;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Optics.Dispersion;

public class SellmeierModelTests
{
    [Fact]
    public void Fused_silica_has_nd_1_4585_per_Malitson_1965()
    {
        // Source: Malitson (1965), J. Opt. Soc. Am. 55, 1205; nd 1.4585 (DOMAIN.md §7).
        // Tolerance: printed to 4 decimals, so ±0.00005.
        Assert.Equal(1.4585, DispersionModels.FusedSilica.IndexAt(ReferenceWavelengths.SmallD), 0.00005);
    }

    [Fact]
    public void Sapphire_ordinary_ray_has_n_1_768_at_sodium_D()
    {
        // Source: Malitson & Dodge (1972), J. Opt. Soc. Am. 62, 1405, coefficients from memory; n(589.3) ≈ 1.768.
        // Tolerance: quoted to 3 decimals, so ±0.0005.
        Assert.Equal(1.768, DispersionModels.SapphireOrdinary.IndexAt(ReferenceWavelengths.D), 0.0005);
    }

    [Fact]
    public void Diamond_has_n_2_417_at_sodium_D()
    {
        // Source: Peter (1923), Z. Phys. 15, 358, coefficients from memory; n(589.3) ≈ 2.417.
        // Tolerance: quoted to 3 decimals, so ±0.0005.
        Assert.Equal(2.417, DispersionModels.Diamond.IndexAt(ReferenceWavelengths.D), 0.0005);
    }

    [Fact]
    public void Index_falls_as_wavelength_rises_in_the_visible()
    {
        SellmeierModel m = DispersionModels.FusedSilica;
        Assert.True(m.IndexAt(ReferenceWavelengths.G) > m.IndexAt(ReferenceWavelengths.F));
        Assert.True(m.IndexAt(ReferenceWavelengths.F) > m.IndexAt(ReferenceWavelengths.D));
        Assert.True(m.IndexAt(ReferenceWavelengths.D) > m.IndexAt(ReferenceWavelengths.B));
    }

    [Fact]
    public void A_three_term_fit_recovers_the_fused_silica_coefficients()
    {
        // Worked example: 12 exact points from Malitson's model over his measured range (0.25–3.5 µm), fitted from a
        // start 10% off every coefficient. Exact data, so the coefficients come back to LM's convergence tolerance;
        // 1e-6 relative allows for the weak conditioning of the infrared term.
        DispersionPoint[] points = Points(DispersionModels.FusedSilica, 0.25, 0.3, 0.35, 0.4, 0.5, 0.6, 0.7, 0.9, 1.2, 1.8, 2.5, 3.5);
        var start = new SellmeierModel(DispersionModels.FusedSilica.Terms
            .Select((t, i) => new SellmeierTerm(t.Strength * (i % 2 == 0 ? 1.1 : 0.9), t.ResonanceSquareMicrometres * (i % 2 == 0 ? 0.9 : 1.1))).ToArray());
        DispersionFit<SellmeierModel> fit = SellmeierModel.Fit(points, 3, start);
        for (int i = 0; i < 3; i++)
        {
            SellmeierTerm want = DispersionModels.FusedSilica.Terms[i], got = fit.Model.Terms[i];
            Assert.Equal(want.Strength, got.Strength, want.Strength * 1e-6);
            Assert.Equal(want.ResonanceSquareMicrometres, got.ResonanceSquareMicrometres, want.ResonanceSquareMicrometres * 1e-6);
        }
        Assert.True(fit.RootMeanSquareResidual < 1e-10, $"RMS {fit.RootMeanSquareResidual}");
    }

    [Fact]
    public void A_one_term_fit_from_the_default_start_recovers_its_model()
    {
        // Exact points from n² = 1 + 1.10 λ²/(λ² − 0.0100) at 7 visible lines (the STACK.md §5 scratch data).
        var truth = new SellmeierModel(new SellmeierTerm(1.10, 0.0100));
        DispersionFit<SellmeierModel> fit = SellmeierModel.Fit(Points(truth, 0.4047, 0.4358, 0.4861, 0.5461, 0.5893, 0.6563, 0.7065), 1);
        Assert.Equal(1.10, fit.Model.Terms[0].Strength, 1e-8);
        Assert.Equal(0.0100, fit.Model.Terms[0].ResonanceSquareMicrometres, 1e-9);
        Assert.All(fit.Residuals, r => Assert.True(Math.Abs(r) < 1e-12, $"residual {r}"));
    }

    [Fact]
    public void A_fit_started_on_a_resonance_reports_that_it_did_not_converge()
    {
        // A start with C = 0.25 µm² puts a pole exactly on the 0.5 µm point: the model is infinite there and the
        // minimiser exits with InvalidValues, which must surface as an error, not as a model.
        DispersionPoint[] points = Points(DispersionModels.FusedSilica, 0.4, 0.5, 0.6, 0.7);
        var e = Assert.Throws<InvalidOperationException>(() => SellmeierModel.Fit(points, 1, new SellmeierModel(new SellmeierTerm(1.0, 0.25))));
        Assert.Contains("1-term Sellmeier fit did not converge", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_start_with_the_wrong_number_of_terms_is_refused() =>
        OutOfRangeAssert.Throws(() => SellmeierModel.Fit(Points(DispersionModels.FusedSilica, 0.4, 0.5, 0.6, 0.7, 0.8), 1, DispersionModels.Diamond),
            "number of terms in the Sellmeier start", "1 to 1");

    [Fact]
    public void A_model_cannot_be_changed_through_its_terms()
    {
        var terms = new[] { new SellmeierTerm(1.1, 0.01) };
        var model = new SellmeierModel(terms);
        terms[0] = new SellmeierTerm(2.0, 0.01);
        Assert.Equal(1.1, model.Terms[0].Strength);
        Assert.False(model.Terms is SellmeierTerm[]);
    }

    [Fact]
    public void A_fit_with_fewer_points_than_parameters_is_refused()
    {
        DispersionPoint[] points = Points(DispersionModels.FusedSilica, 0.4, 0.5, 0.6);
        OutOfRangeAssert.Throws(() => SellmeierModel.Fit(points, 2), "number of points for a 4-parameter Sellmeier fit", "4 or more");
    }

    [Fact]
    public void A_fit_with_a_repeated_wavelength_is_refused()
    {
        DispersionPoint[] points = [.. Points(DispersionModels.FusedSilica, 0.4, 0.5, 0.6), new DispersionPoint(Wavelength.FromNanometres(500), 1.46)];
        var e = Assert.Throws<ArgumentException>(() => SellmeierModel.Fit(points, 1));
        Assert.Contains("wavelength 500 nm is given 2 times", e.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(4)]
    public void A_fit_with_other_than_one_to_three_terms_is_refused(int terms) =>
        OutOfRangeAssert.Throws(() => SellmeierModel.Fit(Points(DispersionModels.FusedSilica, 0.4, 0.5, 0.6, 0.7, 0.8), terms),
            "number of Sellmeier terms", "1 to 3");

    [Fact]
    public void A_model_with_four_terms_is_refused() =>
        OutOfRangeAssert.Throws(() => new SellmeierModel(new(1, 0.01), new(1, 0.01), new(1, 0.01), new(1, 0.01)), "number of Sellmeier terms", "1 to 3");

    [Fact]
    public void A_negative_resonance_is_refused() =>
        OutOfRangeAssert.Throws(() => new SellmeierTerm(1, -0.01), "Sellmeier resonance C", "0 to 10000 µm²");

    [Theory]
    [InlineData(300)] // at the resonance: division by zero
    [InlineData(250)] // just below it: n² < 0
    public void An_index_at_or_near_a_resonance_is_refused(double nanometres)
    {
        var model = new SellmeierModel(new SellmeierTerm(1.0, 0.09));
        OutOfRangeAssert.Throws(() => model.IndexAt(Wavelength.FromNanometres(nanometres)), "wavelength", "gives an index from 1 to 4");
    }

    [Fact]
    public void An_unset_wavelength_is_refused() =>
        OutOfRangeAssert.Throws(() => DispersionModels.FusedSilica.IndexAt(default), "wavelength", "200 to 5000 nm");

    internal static DispersionPoint[] Points(IDispersionModel model, params double[] micrometres) =>
        micrometres.Select(l => new DispersionPoint(Wavelength.FromMicrometres(l), model.IndexAt(Wavelength.FromMicrometres(l)))).ToArray();
}
