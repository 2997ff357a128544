using GemIndex.Core.Quantities;

namespace GemIndex.Core.Optics.Dispersion;

/// <summary>
/// One term B λ²/(λ² − C) of a Sellmeier equation: a strength B (dimensionless) and a resonance C in µm²
/// (the square of the resonance wavelength). <c>default</c> is a term that contributes nothing.
/// </summary>
public readonly record struct SellmeierTerm
{
    /// <summary>Creates a term.</summary>
    /// <param name="strength">B, 0 to 100.</param>
    /// <param name="resonanceSquareMicrometres">C in µm², 0 to 10⁴ (resonances up to 100 µm).</param>
    /// <exception cref="QuantityOutOfRangeException">B or C outside its range.</exception>
    public SellmeierTerm(double strength, double resonanceSquareMicrometres)
    {
        QuantityOutOfRangeException.ThrowIfOutside("Sellmeier strength B", strength, 0, 100);
        QuantityOutOfRangeException.ThrowIfOutside("Sellmeier resonance C", resonanceSquareMicrometres, 0, 1e4, "µm²");
        Strength = strength;
        ResonanceSquareMicrometres = resonanceSquareMicrometres;
    }

    /// <summary>B (dimensionless).</summary>
    public double Strength { get; }

    /// <summary>C in µm².</summary>
    public double ResonanceSquareMicrometres { get; }
}
