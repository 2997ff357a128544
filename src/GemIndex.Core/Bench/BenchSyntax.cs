namespace GemIndex.Core.Bench;

/// <summary>
/// The one written form of the values that hold more than a number, for the command line, the text UI and the
/// workbook alike: a rotation step "ROTATION:LOW[/HIGH]" (0:1.544/1.553), heavy liquids "DENSITY RESULT" entries
/// separated by semicolons (3.32 floats; 2.89 sinks), absorption lines as numbers separated by spaces, commas or
/// semicolons (592 685 656), or "none" when looked for and none seen; magnification features as words separated the
/// same way (curved_striae round_bubbles).
/// </summary>
public static class BenchSyntax
{
    /// <summary>
    /// A field's text as a number is read from it: a reading in percent (<see cref="BenchField.Reflectance"/>) may carry
    /// its sign as a meter shows it ("17.2%", "17.2 %"); any other text as it is.
    /// </summary>
    public static string NumberText(string field, string text) =>
        field == BenchField.Reflectance && text.TrimEnd().EndsWith('%') ? text.TrimEnd()[..^1] : text;

    /// <summary>The word for "looked, saw none" in the absorption field.</summary>
    public const string NoLines = "none";

    /// <summary>A rotation step typed as "ROTATION:LOW[/HIGH]" split into its texts; null when the shape is wrong.</summary>
    public static EdgeStepText? Step(string text)
    {
        string[] parts = text.Split(':');
        if (parts.Length != 2) return null;
        string[] edges = parts[1].Split('/');
        if (edges.Length > 2) return null;
        return new EdgeStepText(parts[0].Trim(), edges[0].Trim(), edges.Length > 1 ? edges[1].Trim() : "");
    }

    /// <summary>
    /// Both edges typed into the low edge's box, "LOW/HIGH" as in a step or "LOW HIGH" as read off the scale; null
    /// when the text is not exactly two parts (one edge, or anything else, stays the low edge's text to be checked).
    /// </summary>
    public static (string Low, string High)? EdgePair(string text)
    {
        string[] parts = text.Split(['/', ' ', '\t'], StringSplitOptions.RemoveEmptyEntries);
        return parts.Length == 2 ? (parts[0], parts[1]) : null;
    }

    /// <summary>A step written back as "ROTATION:LOW[/HIGH]".</summary>
    public static string Step(EdgeStepText step) => step.High.Length > 0 ? $"{step.Rotation}:{step.Low}/{step.High}" : $"{step.Rotation}:{step.Low}";

    /// <summary>Heavy-liquid entries: each "DENSITY RESULT".</summary>
    public static IReadOnlyList<string> HeavyLiquidEntries(string text) =>
        text.Split(';', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);

    /// <summary>Heavy-liquid entries joined into one field's text.</summary>
    public static string HeavyLiquids(IEnumerable<string> entries) => string.Join("; ", entries);

    /// <summary>One heavy-liquid entry's density and result texts; null when it is not two words.</summary>
    public static (string Density, string Result)? HeavyLiquid(string entry)
    {
        string[] parts = entry.Split([' ', '\t'], StringSplitOptions.RemoveEmptyEntries);
        return parts.Length == 2 ? (parts[0], parts[1]) : null;
    }

    /// <summary>The absorption field's numbers (texts), or an empty list for "none".</summary>
    public static IReadOnlyList<string> Lines(string text) => text.Trim().Equals(NoLines, StringComparison.OrdinalIgnoreCase)
        ? []
        : text.Split([' ', ',', ';', '\t'], StringSplitOptions.RemoveEmptyEntries);

    /// <summary>The words of a magnification field, separated like absorption lines (spaces, commas or semicolons).</summary>
    public static IReadOnlyList<string> Features(string text) => text.Split([' ', ',', ';', '\t'], StringSplitOptions.RemoveEmptyEntries);

    /// <summary>Magnification words written as one field's text.</summary>
    public static string Features(IEnumerable<string> words) => string.Join(" ", words);

    /// <summary>Absorption lines written as one field's text ("none" when empty).</summary>
    public static string Lines(IEnumerable<string> lines) => string.Join(" ", lines) is { Length: > 0 } joined ? joined : NoLines;
}
