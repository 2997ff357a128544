namespace GemIndex.Core.Optics.Dispersion;

/// <summary>
/// A fitted dispersion model with its residuals (measured − model, in the order of the points given) and their
/// root mean square.
/// </summary>
/// <typeparam name="TModel">The model fitted.</typeparam>
public sealed class DispersionFit<TModel> where TModel : IDispersionModel
{
    internal DispersionFit(TModel model, double[] residuals)
    {
        Model = model;
        Residuals = Array.AsReadOnly(residuals);
        RootMeanSquareResidual = Math.Sqrt(residuals.Sum(r => r * r) / residuals.Length);
    }

    /// <summary>The fitted model.</summary>
    public TModel Model { get; }

    /// <summary>measured − model at each point, in the order given.</summary>
    public IReadOnlyList<double> Residuals { get; }

    /// <summary>√(Σ residual² / N).</summary>
    public double RootMeanSquareResidual { get; }
}
