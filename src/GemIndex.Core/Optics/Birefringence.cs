using System.Globalization;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Optics;

/// <summary>
/// Birefringence: the difference between the highest and lowest principal indices (γ − α, or |ε − ω|),
/// 0 to 3, with its standard uncertainty. <c>default</c> is 0 (an isotropic material).
/// </summary>
public readonly record struct Birefringence
{
    /// <summary>Creates a birefringence, checking both numbers.</summary>
    /// <exception cref="QuantityOutOfRangeException">Value outside 0–3 or uncertainty outside 0–0.5.</exception>
    public Birefringence(double value, double standardUncertainty = 0)
    {
        QuantityOutOfRangeException.ThrowIfOutside("birefringence", value, 0, 3);
        QuantityOutOfRangeException.ThrowIfOutside("birefringence uncertainty", standardUncertainty, 0, 0.5);
        Value = value;
        StandardUncertainty = standardUncertainty;
    }

    /// <summary>The birefringence.</summary>
    public double Value { get; }

    /// <summary>Standard uncertainty (k = 1).</summary>
    public double StandardUncertainty { get; }

    /// <summary>
    /// The birefringence a reader works out from two indices written to three decimals, as they are shown beside it
    /// (1.770 and 1.762 give 0.008, not the 0.007 of unrounded means 1.76975 and 1.76225): every line that shows both
    /// indices and the birefringence uses it, so the line adds up.
    /// </summary>
    public static double OfShownIndices(double highest, double lowest) =>
        Math.Max(0, Shown(highest) - Shown(lowest));

    private static double Shown(double index) => double.Parse(index.ToString("0.000", CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);

    /// <inheritdoc />
    public override string ToString() => StandardUncertainty == 0
        ? Value.ToString("0.000", CultureInfo.InvariantCulture)
        : $"{Value.ToString("0.000", CultureInfo.InvariantCulture)} ± {StandardUncertainty.ToString("0.000", CultureInfo.InvariantCulture)}";
}
