using System.Globalization;

namespace GemIndex.Core.Quantities;

/// <summary>
/// A value outside the range its quantity allows. The message is one invariant-culture sentence that
/// names the quantity, the value with its unit and the allowed range, so a front end can show it as is.
/// </summary>
public sealed class QuantityOutOfRangeException : ArgumentOutOfRangeException
{
    private readonly string _sentence;

    /// <summary>Creates the exception from its parts.</summary>
    /// <param name="quantity">What was given, in plain words ("refractive index").</param>
    /// <param name="value">The value given (may be NaN or infinite).</param>
    /// <param name="allowed">The allowed range in words, with units ("1 to 4").</param>
    /// <param name="unit">The unit printed after the value, or empty.</param>
    public QuantityOutOfRangeException(string quantity, double value, string allowed, string unit = "")
        : base(quantity)
    {
        Quantity = quantity;
        Value = value;
        Allowed = allowed;
        string shown = double.IsFinite(value) ? value.ToString("G6", CultureInfo.InvariantCulture) : "not a finite number";
        string withUnit = unit.Length == 0 || !double.IsFinite(value) ? shown : $"{shown} {unit}";
        _sentence = $"{quantity} is {withUnit}; allowed: {allowed}.";
    }

    /// <summary>The quantity's name in plain words.</summary>
    public string Quantity { get; }

    /// <summary>The rejected value.</summary>
    public double Value { get; }

    /// <summary>The allowed range in words.</summary>
    public string Allowed { get; }

    /// <inheritdoc />
    public override string Message => _sentence;

    /// <summary>Throws unless <paramref name="minimum"/> ≤ value ≤ <paramref name="maximum"/>; NaN always fails.</summary>
    public static void ThrowIfOutside(string quantity, double value, double minimum, double maximum, string unit = "")
    {
        if (!(value >= minimum && value <= maximum))
            throw new QuantityOutOfRangeException(quantity, value, RangeText(minimum, maximum, unit), unit);
    }

    /// <summary>Throws unless value is finite and strictly above <paramref name="exclusiveMinimum"/>.</summary>
    public static void ThrowIfNotAbove(string quantity, double value, double exclusiveMinimum, string unit = "")
    {
        if (!(value > exclusiveMinimum) || double.IsInfinity(value))
            throw new QuantityOutOfRangeException(quantity, value,
                $"above {Format(exclusiveMinimum)}{(unit.Length == 0 ? "" : " " + unit)}", unit);
    }

    /// <summary>Range in words, "1 to 4 mm".</summary>
    public static string RangeText(double minimum, double maximum, string unit = "") =>
        $"{Format(minimum)} to {Format(maximum)}{(unit.Length == 0 ? "" : " " + unit)}";

    private static string Format(double v) => v.ToString("G6", CultureInfo.InvariantCulture);
}
