using System.CommandLine;
using System.CommandLine.Parsing;
using GemIndex.Core.Bench;
using GemIndex.Core.Quantities;

namespace GemIndex.Cli.CommandLine;

/// <summary>
/// Numeric options read culture-proof through <see cref="BenchNumber.TryParse"/> (a comma is refused, never a
/// thousands separator), then range-checked by a Core constructor or a stated bound; every failure is a parse
/// error naming the option and the value (STACK.md §3).
/// </summary>
internal static class NumberOption
{
    /// <summary>An optional number with no default: null when not given.</summary>
    public static Option<double?> Optional(string name, string description, Action<double> check) => new(name)
    {
        Description = description,
        CustomParser = r => Parse(r, name, check),
    };

    /// <summary>A number with a default.</summary>
    public static Option<double> WithDefault(string name, string description, double defaultValue, Action<double> check) => new(name)
    {
        Description = description,
        DefaultValueFactory = _ => defaultValue,
        CustomParser = r => Parse(r, name, check) ?? defaultValue,
    };

    /// <summary>A check that the value lies in (above, atMost]: for tolerances.</summary>
    public static Action<double> Within(string quantity, double above, double atMost) => v =>
    {
        if (!(v > above && v <= atMost))
            throw new QuantityOutOfRangeException(quantity, v, $"above {above.ToString(System.Globalization.CultureInfo.InvariantCulture)} " +
                $"up to {atMost.ToString(System.Globalization.CultureInfo.InvariantCulture)}");
    };

    private static double? Parse(ArgumentResult result, string name, Action<double> check)
    {
        string text = result.Tokens.Count == 1 ? result.Tokens[0].Value : "";
        if (!BenchNumber.TryParse(text, out double value, out string error))
        {
            // The value is echoed at most BenchText.MostShown characters, control characters made visible.
            string trimmed = text.Trim();
            result.AddError($"{name}: {(trimmed.Length > 0 ? error.Replace(trimmed, BenchText.Shown(trimmed), StringComparison.Ordinal) : error)}");
            return null;
        }
        try
        {
            check(value);
        }
        catch (QuantityOutOfRangeException e)
        {
            result.AddError($"{name}: {e.Message}");
            return null;
        }
        return value;
    }
}
