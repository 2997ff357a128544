using GemIndex.Core.Quantities;

namespace GemIndex.Core.Optics.Refractometer;

/// <summary>
/// One shadow-edge observation on a refractometer: either a measured index, or "over the limit" — the stone showed
/// no edge of its own, only the contact liquid's, so all that is known is n &gt; limit (a censored observation,
/// evidence in its own right). <c>default</c> is not a valid reading (index 0).
/// </summary>
public readonly record struct EdgeReading
{
    private EdgeReading(RefractiveIndex index, bool overTheLimit)
    {
        Index = index;
        IsOverTheLimit = overTheLimit;
    }

    /// <summary>True when the stone is above the instrument's limit and <see cref="Index"/> is only a lower bound.</summary>
    public bool IsOverTheLimit { get; }

    /// <summary>The measured index with its uncertainty; when over the limit, the limit the true index lies above.</summary>
    public RefractiveIndex Index { get; }

    /// <summary>A measured index (already corrected for calibration).</summary>
    public static EdgeReading Measured(RefractiveIndex index) => new(index, false);

    /// <summary>A raw scale reading on <paramref name="profile"/>'s instrument, corrected by its calibration offset.</summary>
    /// <exception cref="QuantityOutOfRangeException">The raw reading is outside the instrument's readable range.</exception>
    public static EdgeReading FromRaw(double rawReading, RefractometerProfile profile)
    {
        ArgumentNullException.ThrowIfNull(profile);
        return new(profile.Corrected(rawReading), false);
    }

    /// <summary>
    /// No edge below the liquid's: n &gt; <see cref="RefractometerProfile.HighestReadable"/> of
    /// <paramref name="profile"/>, taken as exact (the liquid's index is a property of the instrument).
    /// </summary>
    public static EdgeReading OverTheLimit(RefractometerProfile profile)
    {
        ArgumentNullException.ThrowIfNull(profile);
        return new(new RefractiveIndex(profile.HighestReadable), true);
    }

    /// <inheritdoc />
    public override string ToString() => IsOverTheLimit ? $"over the limit (above {Index})" : Index.ToString();
}
