using GemIndex.Core.Quantities;

namespace GemIndex.Core.Optics.Refractometer;

/// <summary>
/// One reading of a calibration standard: its known index (for example a quartz facet's ω) and the raw scale
/// reading it gave. <c>default</c> is not valid (index 0) and is refused by <see cref="CalibrationFit"/>.
/// </summary>
public readonly record struct StandardReading
{
    /// <summary>Creates a standard reading.</summary>
    /// <param name="knownIndex">The standard's known index, 1–4.</param>
    /// <param name="rawReading">The raw scale reading, 1–4 (checked against the instrument's range by the fit).</param>
    /// <exception cref="QuantityOutOfRangeException">Either value outside 1–4.</exception>
    public StandardReading(double knownIndex, double rawReading)
    {
        QuantityOutOfRangeException.ThrowIfOutside("standard's known index", knownIndex, RefractiveIndex.Minimum, RefractiveIndex.Maximum);
        QuantityOutOfRangeException.ThrowIfOutside("standard's raw reading", rawReading, RefractiveIndex.Minimum, RefractiveIndex.Maximum);
        KnownIndex = knownIndex;
        RawReading = rawReading;
    }

    /// <summary>The standard's known index.</summary>
    public double KnownIndex { get; }

    /// <summary>The raw scale reading.</summary>
    public double RawReading { get; }

    /// <summary>known − read: the offset this one reading suggests.</summary>
    public double Difference => KnownIndex - RawReading;
}
