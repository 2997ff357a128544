namespace GemIndex.Core.Identification;

/// <summary>
/// Compares the loose colour words of a bench sheet ("greenish blue", "colourless", "violet") with a material's
/// usual colours: by hue words, with synonyms folded and "-ish" modifiers counted as hues too.
/// </summary>
public static class ColourWords
{
    private static readonly Dictionary<string, string> Synonyms = new(StringComparer.OrdinalIgnoreCase)
    {
        ["colorless"] = "colourless", ["white"] = "colourless", ["clear"] = "colourless", ["water-clear"] = "colourless",
        ["gray"] = "grey", ["violet"] = "purple", ["lilac"] = "purple", ["lavender"] = "purple", ["mauve"] = "purple",
        ["gold"] = "yellow", ["golden"] = "yellow", ["lemon"] = "yellow", ["champagne"] = "yellow", ["honey"] = "yellow",
        ["rose"] = "pink", ["salmon"] = "pink", ["crimson"] = "red", ["scarlet"] = "red", ["teal"] = "blue",
        ["turquoise"] = "blue", ["cyan"] = "blue", ["aqua"] = "blue", ["olive"] = "green", ["emerald"] = "green",
        ["tan"] = "brown", ["cognac"] = "brown", ["amber"] = "orange", ["peach"] = "orange",
    };

    // "-ish" forms with the suffix cut: "bluish" → "blu", "reddish" → "redd".
    private static readonly Dictionary<string, string> Stems = new(StringComparer.Ordinal)
    {
        ["blu"] = "blue", ["redd"] = "red", ["purpl"] = "purple", ["orang"] = "orange", ["yello"] = "yellow", ["whit"] = "white",
    };

    // Neighbours on the bench's rough colour wheel; colourless, grey, black and white-ish shades sit together.
    private static readonly Dictionary<string, string[]> Neighbours = new(StringComparer.OrdinalIgnoreCase)
    {
        ["red"] = ["pink", "orange", "brown", "purple"], ["pink"] = ["red", "purple", "orange"],
        ["orange"] = ["red", "yellow", "brown", "pink"], ["yellow"] = ["orange", "green", "brown"],
        ["green"] = ["yellow", "blue"], ["blue"] = ["green", "purple"], ["purple"] = ["blue", "pink", "red"],
        ["brown"] = ["orange", "yellow", "red", "black"], ["colourless"] = ["grey"], ["grey"] = ["colourless", "black"],
        ["black"] = ["grey", "brown"],
    };

    /// <summary>True when the words describe a colourless stone.</summary>
    public static bool IsColourless(string colour) => Hues(colour).All(h => h == "colourless") && Hues(colour).Any();

    /// <summary>Compares a seen colour with a material's usual colours.</summary>
    public static ColourMatch Compare(string seen, IReadOnlyList<string> usual) =>
        Compare(Hues(seen).ToHashSet(), usual.SelectMany(Hues).ToHashSet());

    /// <summary>Compares hue words already normalised by <see cref="Hues"/>.</summary>
    public static ColourMatch Compare(IReadOnlySet<string> seenHues, IReadOnlySet<string> usualHues)
    {
        if (seenHues.Overlaps(usualHues)) return ColourMatch.Same;
        foreach (string hue in seenHues)
            if (Neighbours.TryGetValue(hue, out var near) && near.Any(usualHues.Contains)) return ColourMatch.Neighbour;
        return ColourMatch.Different;
    }

    /// <summary>The hue words in a colour description, normalised ("greenish blue" → green, blue).</summary>
    public static IEnumerable<string> Hues(string colour)
    {
        foreach (string raw in colour.ToLowerInvariant().Split([' ', '-', '/', ',', ';'], StringSplitOptions.RemoveEmptyEntries))
        {
            string word = raw.EndsWith("ish", StringComparison.Ordinal) ? raw[..^3] : raw;
            if (Stems.TryGetValue(word, out string? stem)) word = stem;
            yield return Synonyms.TryGetValue(word, out string? s) ? s : word;
        }
    }
}
