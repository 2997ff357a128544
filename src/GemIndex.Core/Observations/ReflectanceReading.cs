using GemIndex.Core.Optics;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Observations;

/// <summary>
/// A reflectance meter's reading on a polished facet: the share of light reflected at normal incidence in air, in
/// percent, and the index it gives by Fresnel's law (n = (1 + √R)/(1 − √R)): the way past the refractometer's limit, where
/// diamond (about 17.2 %), cubic zirconia (about 13.5 %) and synthetic moissanite (20.4–20.9 %) part.
/// </summary>
public readonly record struct ReflectanceReading
{
    /// <summary>The lowest reading taken, 1 %: an index near 1.22, below any stone's.</summary>
    public const double LowestPercent = 1;

    /// <summary>The highest reading taken, 30 %: an index near 3.4, above any stone's.</summary>
    public const double HighestPercent = 30;

    /// <summary>
    /// The standard uncertainty of a reading, 0.5 percentage points (a judgement, docs/ranking.md §2: a bench meter's
    /// reading on a well-polished facet repeats to about half a percent; a poor polish reads low): about ±0.03 in the index
    /// near diamond's, enough to part diamond, cubic zirconia and synthetic moissanite, not the garnets from each other.
    /// </summary>
    public const double PercentUncertainty = 0.5;

    /// <summary>A reading in percent.</summary>
    /// <exception cref="QuantityOutOfRangeException">A reading outside 1–30 %.</exception>
    public ReflectanceReading(double percent)
    {
        QuantityOutOfRangeException.ThrowIfOutside("reflectance", percent, LowestPercent, HighestPercent, "%");
        Percent = percent;
        Index = Fresnel.IndexFromNormalReflectance(percent / 100, new RefractiveIndex(1.0), PercentUncertainty / 100);
    }

    /// <summary>The reading, percent.</summary>
    public double Percent { get; }

    /// <summary>The index the reading gives, with its standard uncertainty.</summary>
    public RefractiveIndex Index { get; }
}
