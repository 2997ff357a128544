using GemIndex.Core.Quantities;

namespace GemIndex.Core.Optics.Dispersion;

/// <summary>
/// The Abbe number Vd = (nd − 1)/(nF − nC), with d 587.56 nm, F 486.13 nm, C 656.27 nm (the ISO 7944 reference
/// wavelengths): high for weak dispersion (fused silica ≈ 67.8), low for strong.
/// </summary>
public static class AbbeNumber
{
    /// <summary>Vd from three indices.</summary>
    /// <exception cref="QuantityOutOfRangeException">An index outside 1–4, or nF not above nC (no normal dispersion to measure).</exception>
    public static double FromIndices(double indexD, double indexF, double indexC)
    {
        QuantityOutOfRangeException.ThrowIfOutside("index nd", indexD, RefractiveIndex.Minimum, RefractiveIndex.Maximum);
        QuantityOutOfRangeException.ThrowIfOutside("index nC", indexC, RefractiveIndex.Minimum, RefractiveIndex.Maximum);
        QuantityOutOfRangeException.ThrowIfOutside("index nF", indexF, RefractiveIndex.Minimum, RefractiveIndex.Maximum);
        if (!(indexF > indexC))
            throw new QuantityOutOfRangeException("index nF", indexF, FormattableString.Invariant($"above nC ({indexC:0.0000}) and at most 4 (an index that rises with wavelength is no normal dispersion)"));
        return (indexD - 1) / (indexF - indexC);
    }

    /// <summary>Vd of a dispersion model, from its indices at d, F and C.</summary>
    /// <exception cref="QuantityOutOfRangeException">The model gives nF ≤ nC, or no index at one of the lines.</exception>
    public static double Of(IDispersionModel model)
    {
        ArgumentNullException.ThrowIfNull(model);
        return FromIndices(model.IndexAt(ReferenceWavelengths.SmallD), model.IndexAt(ReferenceWavelengths.F), model.IndexAt(ReferenceWavelengths.C));
    }
}
