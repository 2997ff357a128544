using GemIndex.Core.Quantities;
using MathNet.Numerics;
using MathNet.Numerics.LinearRegression;

namespace GemIndex.Core.Optics.Dispersion;

/// <summary>
/// Cauchy's dispersion formula n(λ) = A + B/λ² + C/λ⁴, λ in µm (the form in DOMAIN.md §4), with C = 0 for the
/// two-term form. A fair description across the visible
/// for transparent materials away from absorption; not for extrapolation into the ultraviolet or infrared.
/// </summary>
public sealed record CauchyModel : IDispersionModel
{
    /// <summary>Creates a model from its coefficients.</summary>
    /// <param name="a">A (dimensionless), 1 to 4.</param>
    /// <param name="bSquareMicrometres">B in µm², −1 to 1.</param>
    /// <param name="cQuarticMicrometres">C in µm⁴, −1 to 1 (0 for the two-term form).</param>
    /// <exception cref="QuantityOutOfRangeException">A coefficient outside its range.</exception>
    public CauchyModel(double a, double bSquareMicrometres, double cQuarticMicrometres = 0)
    {
        QuantityOutOfRangeException.ThrowIfOutside("Cauchy coefficient A", a, 1, 4);
        QuantityOutOfRangeException.ThrowIfOutside("Cauchy coefficient B", bSquareMicrometres, -1, 1, "µm²");
        QuantityOutOfRangeException.ThrowIfOutside("Cauchy coefficient C", cQuarticMicrometres, -1, 1, "µm⁴");
        A = a;
        BSquareMicrometres = bSquareMicrometres;
        CQuarticMicrometres = cQuarticMicrometres;
    }

    /// <summary>A (dimensionless).</summary>
    public double A { get; }

    /// <summary>B in µm².</summary>
    public double BSquareMicrometres { get; }

    /// <summary>C in µm⁴ (0 for the two-term form).</summary>
    public double CQuarticMicrometres { get; }

    /// <summary>n = A + B/λ² + C/λ⁴, λ in µm.</summary>
    /// <exception cref="QuantityOutOfRangeException">The wavelength is unset, or the model gives no index from 1 to 4 there.</exception>
    public double IndexAt(Wavelength wavelength)
    {
        DispersionChecks.Wavelength(wavelength);
        double inverseSquare = 1 / (wavelength.Micrometres * wavelength.Micrometres);
        return DispersionChecks.ModelIndex(A + BSquareMicrometres * inverseSquare + CQuarticMicrometres * inverseSquare * inverseSquare, wavelength);
    }

    /// <summary>
    /// The two-term Cauchy curve through a catalogue's index at 589.3 nm (n_D) and its dispersion nG − nB
    /// (G 430.8 nm, B 686.7 nm): B = (nG − nB) / (1/λG² − 1/λB²), A = n_D − B/λD². Used to move a reading taken
    /// in other light to 589.3 nm when only these two catalogue values are known.
    /// </summary>
    /// <param name="indexAtSodiumD">n at 589.3 nm.</param>
    /// <param name="gMinusB">nG − nB, 0 to 0.5.</param>
    /// <exception cref="QuantityOutOfRangeException">nG − nB outside 0–0.5, or a coefficient outside its range.</exception>
    public static CauchyModel FromIndexAndDispersion(RefractiveIndex indexAtSodiumD, double gMinusB)
    {
        QuantityOutOfRangeException.ThrowIfOutside("dispersion nG − nB", gMinusB, 0, 0.5);
        double b = gMinusB / (InverseSquare(ReferenceWavelengths.G) - InverseSquare(ReferenceWavelengths.B));
        return new CauchyModel(indexAtSodiumD.Value - b * InverseSquare(ReferenceWavelengths.D), b);
    }

    /// <summary>
    /// Least-squares fit of the two- or three-term form, linear in A, B, C (MathNet <c>Fit.LinearCombination</c>
    /// with basis 1, 1/λ², 1/λ⁴, solved by QR).
    /// </summary>
    /// <param name="points">Indices at distinct wavelengths; at least as many points as terms (as many: the curve passes through each).</param>
    /// <param name="terms">2 (A, B) or 3 (A, B, C).</param>
    /// <exception cref="QuantityOutOfRangeException">
    /// Terms not 2 or 3; fewer points than terms; a default point; or fitted coefficients outside the model's ranges.
    /// </exception>
    /// <exception cref="ArgumentException">A wavelength appears twice.</exception>
    public static DispersionFit<CauchyModel> Fit(IReadOnlyList<DispersionPoint> points, int terms = 2)
    {
        QuantityOutOfRangeException.ThrowIfOutside("number of Cauchy terms", terms, 2, 3);
        (double[] um, double[] n) = DispersionChecks.FitPoints(points, terms, "Cauchy");
        Func<double, double>[] basis = terms == 2
            ? [_ => 1.0, l => 1 / (l * l)]
            : [_ => 1.0, l => 1 / (l * l), l => 1 / (l * l * l * l)];
        double[] p = MathNet.Numerics.Fit.LinearCombination(um, n, DirectRegressionMethod.QR, basis);
        var model = new CauchyModel(p[0], p[1], terms == 3 ? p[2] : 0);
        return new DispersionFit<CauchyModel>(model, points.Select(q => q.Index - model.IndexAt(q.Wavelength)).ToArray());
    }

    private static double InverseSquare(Wavelength w) => 1 / (w.Micrometres * w.Micrometres);
}
