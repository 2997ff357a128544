using System.Globalization;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Catalogue;

/// <summary>
/// A closed range [Minimum, Maximum] of a catalogue property: where a material's true value may lie.
/// A single published value is a range of zero width. <c>default</c> is [0, 0].
/// </summary>
public readonly record struct PropertyRange
{
    /// <summary>Creates a range; both ends finite, Minimum ≤ Maximum.</summary>
    /// <param name="minimum">Lower end.</param>
    /// <param name="maximum">Upper end.</param>
    /// <param name="quantity">The property's name, for the error message.</param>
    /// <exception cref="QuantityOutOfRangeException">An end not finite, or maximum below minimum.</exception>
    public PropertyRange(double minimum, double maximum, string quantity = "range")
    {
        if (!double.IsFinite(minimum))
            throw new QuantityOutOfRangeException($"{quantity} lower end", minimum, "a finite number");
        if (!(maximum >= minimum) || !double.IsFinite(maximum))
            throw new QuantityOutOfRangeException($"{quantity} upper end", maximum,
                $"a finite number not below the lower end {minimum.ToString("G6", CultureInfo.InvariantCulture)}");
        Minimum = minimum;
        Maximum = maximum;
    }

    /// <summary>Lower end.</summary>
    public double Minimum { get; }

    /// <summary>Upper end.</summary>
    public double Maximum { get; }

    /// <summary>Maximum − Minimum.</summary>
    public double Width => Maximum - Minimum;

    /// <summary>The middle of the range.</summary>
    public double Centre => (Minimum + Maximum) / 2;

    /// <summary>A zero-width range at one value.</summary>
    public static PropertyRange At(double value, string quantity = "value") => new(value, value, quantity);

    /// <summary>True when Minimum ≤ value ≤ Maximum.</summary>
    public bool Contains(double value) => value >= Minimum && value <= Maximum;

    /// <summary>The range as text with <paramref name="format"/> applied to both ends ("1.544–1.553").</summary>
    public string ToString(string format) =>
        // A range narrower than the shown decimals reads as one number ("2.20", not "2.20–2.20").
        Minimum.ToString(format, CultureInfo.InvariantCulture) is var low && Maximum.ToString(format, CultureInfo.InvariantCulture) is var high && low != high
            ? $"{low}–{high}" : low;

    /// <inheritdoc />
    public override string ToString() => ToString("0.###");
}
