using GemIndex.Core.Catalogue;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Optics;

/// <summary>
/// The Gladstone–Dale relation: a material's index less one, over its density, is a constant of its composition, the
/// specific refractivity K = (n − 1)/ρ (cm³/g). A glass's index and density rise together with lead, barium or
/// lanthanum, so an index read on a glass bounds its density, and the two readings are not independent.
/// </summary>
public static class GladstoneDale
{
    /// <summary>
    /// The specific refractivity of man-made glass, 0.13 to 0.27: every glass family of the shipped catalogue lies within
    /// it, from highest-lead and fibre-optic glass (about 0.134) to lead-free high-index glass (about 0.269), whose
    /// indices and densities are published optical-glass data (reference-db glass.json); checked by
    /// <c>GlassRefractivityTests</c> against every family (docs/ranking.md §2, "Glass: index and SG together").
    /// </summary>
    public static readonly PropertyRange ManMadeGlass = new(0.13, 0.27, "specific refractivity");

    /// <summary>K = (n − 1)/ρ for an index and a density (g/cm³, numerically the SG).</summary>
    /// <exception cref="QuantityOutOfRangeException">An index below 1 or a density not above 0.</exception>
    public static double SpecificRefractivity(double index, double density)
    {
        QuantityOutOfRangeException.ThrowIfOutside("refractive index", index, 1, RefractiveIndex.Maximum);
        if (!(density > 0)) throw new QuantityOutOfRangeException("density", density, "above 0");
        return (index - 1) / density;
    }

    /// <summary>The densities (SG) a material of specific refractivity in <paramref name="refractivity"/> has at index <paramref name="index"/>.</summary>
    /// <exception cref="QuantityOutOfRangeException">An index not above 1, or a refractivity range not above 0.</exception>
    public static PropertyRange Density(double index, PropertyRange refractivity)
    {
        if (!(index > 1) || !double.IsFinite(index)) throw new QuantityOutOfRangeException("refractive index", index, "above 1");
        if (!(refractivity.Minimum > 0)) throw new QuantityOutOfRangeException("specific refractivity", refractivity.Minimum, "above 0");
        return new((index - 1) / refractivity.Maximum, (index - 1) / refractivity.Minimum, "specific gravity");
    }
}
