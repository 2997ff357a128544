using System.Globalization;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Gravity;

/// <summary>
/// Specific gravity (relative density against water at 4 °C, dimensionless) with its standard
/// uncertainty. Allowed 0.5 to 25 (lighter than any cork-like organic, heavier than any gem metal or
/// oxide); uncertainty 0 to 5. <c>default</c> is not valid and must not be used.
/// </summary>
public readonly record struct SpecificGravity
{
    /// <summary>Lowest SG accepted.</summary>
    public const double Minimum = 0.5;

    /// <summary>Highest SG accepted.</summary>
    public const double Maximum = 25;

    /// <summary>Creates an SG, checking both numbers.</summary>
    /// <exception cref="QuantityOutOfRangeException">SG outside 0.5–25, or uncertainty outside 0–5.</exception>
    public SpecificGravity(double value, double standardUncertainty = 0)
    {
        QuantityOutOfRangeException.ThrowIfOutside("specific gravity", value, Minimum, Maximum);
        QuantityOutOfRangeException.ThrowIfOutside("specific gravity uncertainty", standardUncertainty, 0, 5);
        Value = value;
        StandardUncertainty = standardUncertainty;
    }

    /// <summary>The SG.</summary>
    public double Value { get; }

    /// <summary>Standard uncertainty (k = 1).</summary>
    public double StandardUncertainty { get; }

    /// <inheritdoc />
    public override string ToString() => Text(Value, StandardUncertainty);

    /// <summary>
    /// An SG with its uncertainty as the trade writes it, the one way every front end writes it: two decimals, or three
    /// when the uncertainty is under 0.005 (a careful hydrostatic weighing), so that it never reads "± 0.00"; an
    /// uncertainty that would still round to nothing (a large stone on a fine balance) reads "± &lt;0.001".
    /// </summary>
    public static string Text(double value, double standardUncertainty)
    {
        if (standardUncertainty == 0) return value.ToString("0.00", CultureInfo.InvariantCulture);
        string format = standardUncertainty < 0.005 ? "0.000" : "0.00";
        string spread = standardUncertainty < 0.0005 ? "<0.001" : standardUncertainty.ToString(format, CultureInfo.InvariantCulture);
        return $"{value.ToString(format, CultureInfo.InvariantCulture)} ± {spread}";
    }
}
