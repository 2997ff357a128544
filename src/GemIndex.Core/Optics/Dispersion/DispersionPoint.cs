using GemIndex.Core.Quantities;

namespace GemIndex.Core.Optics.Dispersion;

/// <summary>
/// One measured index at one wavelength, an input to a dispersion fit. <c>default</c> is not valid and is refused
/// by the fits.
/// </summary>
public readonly record struct DispersionPoint
{
    /// <summary>Creates a point.</summary>
    /// <exception cref="QuantityOutOfRangeException">Index outside 1–4, or the wavelength unset.</exception>
    public DispersionPoint(Wavelength wavelength, double index)
    {
        DispersionChecks.Wavelength(wavelength);
        QuantityOutOfRangeException.ThrowIfOutside("refractive index", index, RefractiveIndex.Minimum, RefractiveIndex.Maximum);
        Wavelength = wavelength;
        Index = index;
    }

    /// <summary>The wavelength.</summary>
    public Wavelength Wavelength { get; }

    /// <summary>The index measured there.</summary>
    public double Index { get; }
}
