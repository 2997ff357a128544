using GemIndex.Core.Quantities;
using MathNet.Numerics;
using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.Optimization;

namespace GemIndex.Core.Optics.Dispersion;

/// <summary>
/// The Sellmeier dispersion equation n²(λ) = 1 + Σ Bᵢ λ² / (λ² − Cᵢ), λ in µm, with one to three terms
/// (the form used by Malitson 1965, J. Opt. Soc. Am. 55, 1205). Valid between the resonances it
/// models, i.e. for λ² well away from every Cᵢ.
/// </summary>
public sealed class SellmeierModel : IDispersionModel
{
    private readonly double[] _coefficients; // B₁, C₁, B₂, C₂, …: the layout the fit uses

    /// <summary>Creates a model from one to three terms.</summary>
    /// <exception cref="QuantityOutOfRangeException">Fewer than one or more than three terms.</exception>
    public SellmeierModel(params IReadOnlyList<SellmeierTerm> terms)
    {
        ArgumentNullException.ThrowIfNull(terms);
        QuantityOutOfRangeException.ThrowIfOutside("number of Sellmeier terms", terms.Count, 1, 3);
        Terms = Array.AsReadOnly(terms.ToArray());
        _coefficients = [.. Terms.SelectMany(t => new[] { t.Strength, t.ResonanceSquareMicrometres })];
    }

    /// <summary>The terms, in the order given.</summary>
    public IReadOnlyList<SellmeierTerm> Terms { get; }

    /// <summary>n = √(1 + Σ Bᵢ λ²/(λ² − Cᵢ)), λ in µm.</summary>
    /// <exception cref="QuantityOutOfRangeException">
    /// The wavelength is unset, or the model gives no index from 1 to 4 there (at or near a resonance).
    /// </exception>
    public double IndexAt(Wavelength wavelength)
    {
        DispersionChecks.Wavelength(wavelength);
        double squared = IndexSquared(_coefficients, wavelength.Micrometres);
        return DispersionChecks.ModelIndex(squared >= 0 ? Math.Sqrt(squared) : double.NaN, wavelength);
    }

    /// <summary>
    /// Least-squares fit of 1–3 terms by Levenberg–Marquardt (MathNet <c>LevenbergMarquardtMinimizer</c>, analytic
    /// Jacobian ∂n/∂Bᵢ = λ²/(λ² − Cᵢ)/(2n), ∂n/∂Cᵢ = Bᵢλ²/(λ² − Cᵢ)²/(2n)). Non-linear: the answer depends on the start;
    /// give <paramref name="start"/> near the expected coefficients (for example a catalogue model) for 2–3 terms.
    /// The default start is B 1, C 0.01 µm² for the first term, B 0.5, C 0.02 µm² for the second and B 1, C 100 µm²
    /// (an infrared resonance) for the third.
    /// </summary>
    /// <param name="points">Indices at distinct wavelengths; at least as many as the 2 × terms parameters (as many: the curve passes through each).</param>
    /// <param name="terms">1 to 3.</param>
    /// <param name="start">Optional starting coefficients with exactly <paramref name="terms"/> terms.</param>
    /// <exception cref="QuantityOutOfRangeException">
    /// Terms outside 1–3; a start with another number of terms; too few points; a default point; or fitted
    /// coefficients outside a term's ranges.
    /// </exception>
    /// <exception cref="ArgumentException">A wavelength appears twice.</exception>
    /// <exception cref="InvalidOperationException">The minimiser did not converge (its exit reason is named).</exception>
    public static DispersionFit<SellmeierModel> Fit(IReadOnlyList<DispersionPoint> points, int terms, SellmeierModel? start = null)
    {
        QuantityOutOfRangeException.ThrowIfOutside("number of Sellmeier terms", terms, 1, 3);
        if (start is not null)
            QuantityOutOfRangeException.ThrowIfOutside("number of terms in the Sellmeier start", start.Terms.Count, terms, terms);
        (double[] um, double[] n) = DispersionChecks.FitPoints(points, 2 * terms, "Sellmeier");
        double[] guess = start is null
            ? DefaultStart.Take(2 * terms).ToArray()
            : [.. start._coefficients]; // a copy: DenseOfArray wraps the array it is given
        IObjectiveModel objective = ObjectiveFunction.NonlinearModel(
            (p, l) => Math.Sqrt(IndexSquared(p.AsArray() ?? p.ToArray(), l)),
            (p, l) => Gradient(p, l),
            Vector<double>.Build.DenseOfArray(um), Vector<double>.Build.DenseOfArray(n));
        double[] q = Minimise(objective, guess, terms);
        var model = new SellmeierModel(Enumerable.Range(0, terms).Select(i => new SellmeierTerm(q[2 * i], q[2 * i + 1])).ToArray());
        return new DispersionFit<SellmeierModel>(model, points.Select(p => p.Index - model.IndexAt(p.Wavelength)).ToArray());
    }

    private static double[] Minimise(IObjectiveModel objective, double[] guess, int terms)
    {
        var minimiser = new LevenbergMarquardtMinimizer(functionTolerance: FunctionTolerance, maximumIterations: 1000);
        NonlinearMinimizationResult result;
        try
        {
            result = minimiser.FindMinimum(objective, Vector<double>.Build.DenseOfArray(guess));
        }
        catch (NonConvergenceException e) // MathNet throws this itself when the model is not finite at the start
        {
            throw NotConverged(terms, e.Message, e);
        }
        if (result.ReasonForExit is ExitCondition.ExceedIterations or ExitCondition.InvalidValues
            or ExitCondition.ManuallyStopped or ExitCondition.None)
            throw NotConverged(terms, result.ReasonForExit.ToString(), null);
        return result.MinimizingPoint.ToArray();
    }

    private static InvalidOperationException NotConverged(int terms, string reason, Exception? inner) =>
        new($"The {terms}-term Sellmeier fit did not converge ({reason}); try a start nearer the expected coefficients or fewer terms.", inner);

    // Stop when ½ Σ residual² falls below this: residuals near 1e-12, far under any measured index's precision.
    // MathNet's default (1e-15) stops exact data at residuals near 4e-8, leaving coefficients off in the 7th digit.
    private const double FunctionTolerance = 1e-24;

    private static readonly double[] DefaultStart = [1.0, 0.01, 0.5, 0.02, 1.0, 100.0];

    private static double IndexSquared(double[] p, double um)
    {
        double l2 = um * um, sum = 1;
        for (int i = 0; i < p.Length; i += 2) sum += p[i] * l2 / (l2 - p[i + 1]);
        return sum;
    }

    private static Vector<double> Gradient(Vector<double> p, double um)
    {
        double l2 = um * um;
        double twiceN = 2 * Math.Sqrt(IndexSquared(p.ToArray(), um));
        var g = Vector<double>.Build.Dense(p.Count);
        for (int i = 0; i < p.Count; i += 2)
        {
            double denominator = l2 - p[i + 1];
            g[i] = l2 / denominator / twiceN;
            g[i + 1] = p[i] * l2 / (denominator * denominator) / twiceN;
        }
        return g;
    }
}
