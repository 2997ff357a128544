namespace GemIndex.Core.Identification;

/// <summary>
/// Compares the loose colour words of a bench sheet ("greenish blue", "colourless", "violet") with a material's
/// usual colours: by hue words, with synonyms folded; an "-ish" or "-y" word only tints the hue it precedes (docs/ranking.md §2, colour).
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
        ["tan"] = "brown", ["cognac"] = "brown", ["amber"] = "orange", ["peach"] = "orange", ["orangy"] = "orange", ["pinky"] = "pink",
        ["cream"] = "yellow",   // a yellowish white, as pearls and ivory are described
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

    // Words that say how much colour, not which, and optical effects seen over the body colour (play of colour, sheen,
    // a star): no evidence either way.
    private static readonly HashSet<string> Modifiers = new(StringComparer.OrdinalIgnoreCase)
    {
        "light", "dark", "pale", "deep", "medium", "vivid", "bright", "intense", "very", "slightly", "faint", "strong", "rich",
        "play", "of", "colour", "color", "with", "and", "multicolour", "multicolor", "iridescent", "opalescent", "sheen",
        "schiller", "chatoyant", "star", "flash", "flashes", "fire",
        // Trade names of a shade before its hue ("sky blue", "royal blue", "apple green"): the hue word says the colour.
        "sky", "royal", "baby", "powder", "apple", "bottle", "grass", "forest", "sea",
        // How the colour lies or how near it comes ("green, mottled", "near colourless", "white, pinkish overtone").
        "mottled", "patchy", "banded", "zoned", "uneven", "even", "overtone", "tinge", "tint", "hint", "cast", "near", "nearly", "almost",
    };

    /// <summary>How the known hues are named to a user: the wheel, and the words read as colourless.</summary>
    public static string KnownHuesInWords => string.Join(", ", KnownHues) + " (white and clear read as colourless)";

    /// <summary>The hues the tool knows (the bench's rough colour wheel).</summary>
    public static IReadOnlyCollection<string> KnownHues => Neighbours.Keys;

    /// <summary>P(a hue | not in the catalogue): each of the known hues alike.</summary>
    public static double BroadProbability => 1.0 / Neighbours.Count;

    /// <summary>
    /// Share of a material's colour probability on its listed colours, the rest on their neighbours (bench colour words are
    /// loose) and a floor everywhere (a judgement; docs/ranking.md §2).
    /// </summary>
    public const double ListedShare = 0.85, NeighbourShare = 0.1;

    /// <summary>Each further listed colour is this much less usual than the one before (the list is most usual first; a judgement).</summary>
    public const double RankDecay = 0.6;

    /// <summary>
    /// Share of an entry's colour probability taken from its species' colours rather than its own list: varieties and
    /// origins are named by their usual colours, but the boundaries are loose (an orange common opal, a pink laboratory-grown
    /// beryl), so a hue the species shows is never as unlikely for one of its entries as a hue the species never shows (a
    /// judgement: about one stone in five of a named entry lies outside its usual colours; docs/ranking.md §2, colour).
    /// </summary>
    public const double SpeciesShare = 0.2;

    /// <summary>
    /// P(hue | entry) with the species' colours mixed in (<see cref="SpeciesShare"/>): the entry's own list and its
    /// species' list, each by <see cref="Probability(IReadOnlySet{string}, IReadOnlyList{string})"/>. An entry the trade
    /// names by its colour (<paramref name="namedByColour"/>: emerald, aquamarine, ruby) takes neither its species' colours
    /// nor its hues' neighbours: a green beryl called blue is by definition no emerald, so such a hue is a misdescription,
    /// at the floor every hue has (docs/ranking.md §2, colour).
    /// </summary>
    internal static double EntryProbability(IReadOnlyList<string> seen, IReadOnlyList<string> entry, IReadOnlyList<string> species, bool namedByColour = false) =>
        namedByColour ? Probability(seen, entry, withNeighbours: false)
        : ReferenceEquals(entry, species) ? Probability(seen, entry)
        : (1 - SpeciesShare) * Probability(seen, entry) + SpeciesShare * Probability(seen, species);

    /// <summary>
    /// P(hue | material) for a material whose colours are <paramref name="listed"/> (most usual first): the listed share
    /// split by rank (weights 1, 0.6, 0.36, …), the neighbour share split among the listed colours' neighbours, and the
    /// rest spread over every known hue. For a description with several hues ("greenish blue"), the likeliest of them.
    /// A material with no colours listed gives every hue alike.
    /// </summary>
    public static double Probability(IReadOnlySet<string> seen, IReadOnlyList<string> listed) => Probability([.. seen], listed);

    /// <summary><see cref="Probability(IReadOnlySet{string}, IReadOnlyList{string})"/> with the hues seen as a list, in the set's order.</summary>
    // Read only: a colour-named entry's neighbours, none (one list for every call on the ranking's hot path).
    private static readonly List<string> NoNeighbours = [];

    internal static double Probability(IReadOnlyList<string> seen, IReadOnlyList<string> listed, bool withNeighbours = true)
    {
        if (listed.Count == 0) return BroadProbability;
        var (total, listedNeighbours) = ListedParts.GetValue(listed, Parts);
        List<string> neighbours = withNeighbours ? listedNeighbours : NoNeighbours;
        double best = 0;
        for (int i = 0; i < seen.Count; i++)
        {
            string hue = seen[i];
            if (!Neighbours.ContainsKey(hue)) continue;
            int rank = IndexOf(listed, hue);
            double p = (1 - ListedShare - (neighbours.Count > 0 ? NeighbourShare : 0)) * BroadProbability
                       + (rank >= 0 ? ListedShare * RankWeight(rank) / total : 0)
                       + (neighbours.Contains(hue) ? NeighbourShare / neighbours.Count : 0);
            best = Math.Max(best, p);
        }
        return best;
    }

    /// <summary><see cref="RankDecay"/> to the power of the rank, from a table for the ranks lists have.</summary>
    private static double RankWeight(int rank) => rank < RankWeights.Length ? RankWeights[rank] : Math.Pow(RankDecay, rank);

    private static readonly double[] RankWeights = [.. Enumerable.Range(0, 16).Select(r => Math.Pow(RankDecay, r))];

    // The rank weights' total and the listed colours' neighbours depend on the list alone: worked out once per list (the
    // ranking asks for every entry on every stone).
    private static readonly System.Runtime.CompilerServices.ConditionalWeakTable<IReadOnlyList<string>, Tuple<double, List<string>>> ListedParts = new();

    private static Tuple<double, List<string>> Parts(IReadOnlyList<string> listed)
    {
        double total = 0;
        for (int i = 0; i < listed.Count; i++) total += Math.Pow(RankDecay, i);
        var neighbours = listed.SelectMany(h => Neighbours.TryGetValue(h, out var near) ? near : []).Where(h => !listed.Contains(h)).Distinct().ToList();
        return Tuple.Create(total, neighbours);
    }

    private static int IndexOf(IReadOnlyList<string> list, string value)
    {
        for (int i = 0; i < list.Count; i++) if (list[i] == value) return i;
        return -1;
    }

    /// <summary>The words of a colour description that name no hue the tool knows (modifiers such as "light" aside).</summary>
    public static IReadOnlyList<string> UnknownWords(string colour) =>
        [.. colour.ToLowerInvariant().Split([' ', '-', '/', ',', ';'], StringSplitOptions.RemoveEmptyEntries)
            .Where(w => !Modifiers.Contains(w) && !Hues(w).All(Neighbours.ContainsKey))];

    /// <summary>True when the words describe a colourless stone.</summary>
    public static bool IsColourless(string colour) => Hues(colour).All(h => h == "colourless") && Hues(colour).Any();

    /// <summary>
    /// The hues a colour description names as its colour, without the hues that only tint it: "bluish green" and "golden
    /// yellow" are a green and a yellow, "blue-green" is both, "pink with black veins" is pink and black. Each part (split
    /// at "and", "with", commas and slashes) gives the hues of its last word that names one; an "-ish" or "-y" word
    /// ("bluish", "orangy") only tints (common practice in colour description: the last hue is the colour, the modifier
    /// its tone), unless it is all the part has.
    /// </summary>
    public static IEnumerable<string> PrincipalHues(string colour)
    {
        var found = new List<string>();
        foreach (string part in colour.ToLowerInvariant().Split([",", "/", ";", " and ", " with "], StringSplitOptions.RemoveEmptyEntries))
        {
            var words = part.Split(' ', StringSplitOptions.RemoveEmptyEntries);
            List<string>? tint = null;
            bool named = false;
            for (int i = words.Length - 1; i >= 0 && !named; i--)
            {
                // A hyphenated word names each of its hues ("blue-green"), save an "-ish" half ("yellowish-green").
                var halves = words[i].Split('-', StringSplitOptions.RemoveEmptyEntries);
                var hues = halves.Where(h => !IsTint(h)).SelectMany(Hues).Where(KnownHues.Contains).ToList();
                if (hues.Count > 0) { found.AddRange(hues); named = true; }
                else tint ??= [.. halves.SelectMany(Hues).Where(KnownHues.Contains)];
            }
            if (!named && tint is { Count: > 0 }) found.AddRange(tint);
        }
        return found.Distinct();
    }

    // "bluish", "orangy": a word that tones a hue rather than naming the colour.
    private static bool IsTint(string word) => word.EndsWith("ish", StringComparison.Ordinal) || TintWords.Contains(word);

    private static readonly HashSet<string> TintWords = new(StringComparer.Ordinal) { "orangy", "pinky" };

    /// <summary>The hue words in a colour description, normalised ("greenish blue" → green, blue).</summary>
    public static IEnumerable<string> Hues(string colour)
    {
        foreach (string raw in colour.ToLowerInvariant().Split([' ', '-', '/', ',', ';'], StringSplitOptions.RemoveEmptyEntries))
        {
            if (Modifiers.Contains(raw)) continue;
            string word = raw.EndsWith("ish", StringComparison.Ordinal) ? raw[..^3] : raw;
            if (Stems.TryGetValue(word, out string? stem)) word = stem;
            yield return Synonyms.TryGetValue(word, out string? s) ? s : word;
        }
    }
}
