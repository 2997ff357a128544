namespace GemIndex.Tests.PublishedCases;

/// <summary>
/// Where the catalogue splits what a source names as one material, the catalogue species that count as the source's
/// name: spinel (with the zinc-rich gahnospinel and the iron-rich pleonaste). The readings are never touched; only the name is read more widely.
/// </summary>
public static class CatalogueSpeciesSplits
{
    private static readonly Dictionary<string, string[]> Splits = new(StringComparer.Ordinal)
    {
        ["spinel"] = ["spinel", "gahnospinel", "pleonaste"],
    };

    /// <summary>True when a ranked catalogue species stands for one of the species a source named.</summary>
    public static bool Names(IReadOnlyList<string> published, string ranked) =>
        published.Contains(ranked) || published.Any(p => Splits.TryGetValue(p, out var names) && names.Contains(ranked));
}
