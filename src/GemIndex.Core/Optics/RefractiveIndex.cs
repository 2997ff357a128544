using System.Globalization;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Optics;

/// <summary>
/// A refractive index (dimensionless) with its standard uncertainty (k = 1). Allowed: 1 (vacuum) to 4
/// (a sanity bound above any gem material); uncertainty 0 to 0.5. <c>default</c> is not a valid index
/// (0) and must not be used.
/// </summary>
public readonly record struct RefractiveIndex
{
    /// <summary>The lowest index accepted: vacuum.</summary>
    public const double Minimum = 1.0;

    /// <summary>The highest index accepted; above any gem material (rutile ~2.9, hematite ~3.2).</summary>
    public const double Maximum = 4.0;

    /// <summary>Creates an index, checking both numbers.</summary>
    /// <exception cref="QuantityOutOfRangeException">Index outside 1–4, or uncertainty outside 0–0.5.</exception>
    public RefractiveIndex(double value, double standardUncertainty = 0)
    {
        QuantityOutOfRangeException.ThrowIfOutside("refractive index", value, Minimum, Maximum);
        QuantityOutOfRangeException.ThrowIfOutside("refractive index uncertainty", standardUncertainty, 0, 0.5);
        Value = value;
        StandardUncertainty = standardUncertainty;
    }

    /// <summary>The index.</summary>
    public double Value { get; }

    /// <summary>Standard uncertainty (k = 1).</summary>
    public double StandardUncertainty { get; }

    /// <summary>
    /// The difference of two indices, as a birefringence: |high − low|, with
    /// σ = √(σ_high² + σ_low²) (independent readings).
    /// </summary>
    public static Birefringence operator -(RefractiveIndex high, RefractiveIndex low) =>
        new(Math.Abs(high.Value - low.Value), double.Hypot(high.StandardUncertainty, low.StandardUncertainty));

    /// <inheritdoc />
    public override string ToString() => StandardUncertainty == 0
        ? Value.ToString("0.000", CultureInfo.InvariantCulture)
        : $"{Value.ToString("0.000", CultureInfo.InvariantCulture)} ± {StandardUncertainty.ToString("0.000", CultureInfo.InvariantCulture)}";
}
