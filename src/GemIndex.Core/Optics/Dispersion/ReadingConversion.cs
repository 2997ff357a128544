using GemIndex.Core.Quantities;

namespace GemIndex.Core.Optics.Dispersion;

/// <summary>
/// Moves an index read in other light to the trade's convention, sodium D (589.3 nm), through a dispersion model of
/// the candidate material: n₅₈₉ = reading + model(589.3 nm) − model(λ). The model supplies only the shape of the
/// curve, so its own offset from the stone cancels.
/// </summary>
public static class ReadingConversion
{
    /// <summary>
    /// The reading converted to 589.3 nm. Uncertainty: the reading's, unchanged (the model is taken as exact; its own
    /// error in the difference is not known here).
    /// </summary>
    /// <param name="reading">The index read.</param>
    /// <param name="readAt">The wavelength it was read at.</param>
    /// <param name="model">A dispersion model of the material.</param>
    /// <exception cref="QuantityOutOfRangeException">
    /// The wavelength is unset or the model gives no index there, or the converted index is outside 1–4.
    /// </exception>
    public static RefractiveIndex ToSodiumD(RefractiveIndex reading, Wavelength readAt, IDispersionModel model)
    {
        ArgumentNullException.ThrowIfNull(model);
        double shift = model.IndexAt(ReferenceWavelengths.D) - model.IndexAt(readAt);
        QuantityOutOfRangeException.ThrowIfOutside("index converted to 589.3 nm", reading.Value + shift,
            RefractiveIndex.Minimum, RefractiveIndex.Maximum);
        return new RefractiveIndex(reading.Value + shift, reading.StandardUncertainty);
    }
}
