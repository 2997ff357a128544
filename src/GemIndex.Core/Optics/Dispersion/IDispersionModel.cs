using GemIndex.Core.Quantities;

namespace GemIndex.Core.Optics.Dispersion;

/// <summary>A material's refractive index as a function of wavelength.</summary>
public interface IDispersionModel
{
    /// <summary>The index at <paramref name="wavelength"/>.</summary>
    /// <exception cref="QuantityOutOfRangeException">
    /// The wavelength is unset, or one where the model gives no index from 1 to 4 (for example at or near one of its
    /// resonances).
    /// </exception>
    double IndexAt(Wavelength wavelength);
}
