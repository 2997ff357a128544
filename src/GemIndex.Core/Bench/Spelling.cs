namespace GemIndex.Core.Bench;

/// <summary>Which known words a word the tool does not know was likely meant to be (a batch line's field, a magnification feature).</summary>
public static class Spelling
{
    /// <summary>Most letters changed, added or dropped for a name still to count as a misspelling (one for names of three letters or fewer).</summary>
    private const int MostEdits = 2;

    /// <summary>The shortest beginning of a name taken to stand for it ("uv" for "uv_long").</summary>
    private const int ShortestPart = 2;

    /// <summary>
    /// The known names a name was likely meant to be: the one that is the same but for case, else a beginning of one ("absorption" for
    /// "absorption_nm", "uv" for both lamps), or at most <see cref="MostEdits"/> letters apart ("color", "heavy_liquid").
    /// </summary>
    public static IReadOnlyList<string> Near(string name, IReadOnlyList<string> known)
    {
        string lower = name.Trim().ToLowerInvariant();
        if (lower.Length == 0) return [];
        if (known.Where(k => k.Equals(lower, StringComparison.OrdinalIgnoreCase)).ToList() is [var same]) return [same];
        if (CommandLineWords.TryGetValue(lower, out string? field) && known.Contains(field)) return [field];
        int most = lower.Length <= 3 ? 1 : MostEdits;
        return [.. known.Where(k => (lower.Length >= ShortestPart && k.StartsWith(lower, StringComparison.OrdinalIgnoreCase))
                                    || (k.Length >= ShortestPart + 1 && lower.StartsWith(k, StringComparison.OrdinalIgnoreCase))
                                    || Edits(lower, k.ToLowerInvariant()) <= most)];
    }

    /// <summary>
    /// The command line's names of a reading that the batch format names otherwise (--lines, --edge, --feature): a batch
    /// line written after the options uses them.
    /// </summary>
    private static readonly Dictionary<string, string> CommandLineWords = new(StringComparer.Ordinal)
    {
        ["lines"] = "absorption_nm", ["edge"] = "refractometer", ["edges"] = "refractometer",
        ["feature"] = "magnification", ["features"] = "magnification", ["no_feature"] = "magnification",
    };

    /// <summary>The Levenshtein distance: letters changed, added or dropped to turn one name into the other.</summary>
    public static int Edits(string a, string b)
    {
        var previous = new int[b.Length + 1];
        var current = new int[b.Length + 1];
        for (int j = 0; j <= b.Length; j++) previous[j] = j;
        for (int i = 1; i <= a.Length; i++)
        {
            current[0] = i;
            for (int j = 1; j <= b.Length; j++)
                current[j] = Math.Min(Math.Min(current[j - 1], previous[j]) + 1, previous[j - 1] + (a[i - 1] == b[j - 1] ? 0 : 1));
            (previous, current) = (current, previous);
        }
        return previous[b.Length];
    }
}
