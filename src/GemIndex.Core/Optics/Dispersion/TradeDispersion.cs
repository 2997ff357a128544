namespace GemIndex.Core.Optics.Dispersion;

/// <summary>
/// The dispersion the gem trade quotes: nG − nB, the index difference between Fraunhofer G (430.8 nm) and
/// B (686.7 nm) (DOMAIN.md §4; diamond ≈ 0.044).
/// </summary>
public static class TradeDispersion
{
    /// <summary>nG − nB of a dispersion model (negative only for a model with anomalous dispersion).</summary>
    /// <exception cref="GemIndex.Core.Quantities.QuantityOutOfRangeException">The model gives no index at G or B.</exception>
    public static double Of(IDispersionModel model)
    {
        ArgumentNullException.ThrowIfNull(model);
        return model.IndexAt(ReferenceWavelengths.G) - model.IndexAt(ReferenceWavelengths.B);
    }
}
