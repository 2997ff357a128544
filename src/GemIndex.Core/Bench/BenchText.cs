using System.Text;

namespace GemIndex.Core.Bench;

/// <summary>How a value given by a person is echoed back: shortened and with control characters made visible.</summary>
public static class BenchText
{
    /// <summary>At most this many characters of a bad value are echoed (a 100,000-character value is not repeated).</summary>
    public const int MostShown = 80;

    /// <summary>The value as shown in a message: control characters and lone surrogates as \uXXXX, cut to <see cref="MostShown"/> characters with "…".</summary>
    public static string Shown(string? value)
    {
        string text = value ?? "";
        var shown = new StringBuilder();
        for (int i = 0; i < text.Length; i++)
        {
            char c = text[i];
            bool paired = char.IsHighSurrogate(c) ? i + 1 < text.Length && char.IsLowSurrogate(text[i + 1])
                : char.IsLowSurrogate(c) && i > 0 && char.IsHighSurrogate(text[i - 1]);
            if (char.IsControl(c) || char.IsSurrogate(c) && !paired) shown.Append($"\\u{(int)c:x4}");
            else shown.Append(c);
            if (shown.Length > MostShown) return shown.ToString(0, MostShown - 1) + "…";
        }
        return shown.ToString();
    }

    /// <summary>Text safe for a terminal: every control character (escape sequences, bells, carriage returns) but the line break removed.</summary>
    public static string ForTerminal(string text)
    {
        var safe = new StringBuilder(text.Length);
        foreach (char c in text)
            if (c == '\n' || !char.IsControl(c)) safe.Append(c);
        return safe.ToString();
    }
}
