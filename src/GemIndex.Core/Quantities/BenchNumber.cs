using System.Globalization;

namespace GemIndex.Core.Quantities;

/// <summary>
/// The one place typed numbers are read: invariant culture, a dot as decimal mark, an optional exponent,
/// finite values only. A comma is refused with a message (never read as a thousands separator, which
/// would turn 1,544 into 1544).
/// </summary>
public static class BenchNumber
{
    /// <summary>Reads <paramref name="text"/> as a finite number, or gives the reason it is not one.</summary>
    /// <param name="text">What was typed.</param>
    /// <param name="value">The number, when the result is true.</param>
    /// <param name="error">Why the text is not a number, when the result is false.</param>
    public static bool TryParse(string? text, out double value, out string error)
    {
        value = 0;
        string t = (text ?? "").Trim();
        if (t.Length == 0) { error = "empty: type a number"; return false; }
        if (t.Contains(',')) { error = $"'{t}' has a comma: use a dot as the decimal mark (1.544)"; return false; }
        if (!double.TryParse(t, NumberStyles.Float, CultureInfo.InvariantCulture, out double v))
        { error = $"'{t}' is not a number"; return false; }
        if (!double.IsFinite(v)) { error = $"'{t}' is not a finite number"; return false; }
        value = v;
        error = "";
        return true;
    }
}
