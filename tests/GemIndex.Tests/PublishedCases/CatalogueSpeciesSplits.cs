namespace GemIndex.Tests.PublishedCases;

/// <summary>
/// Where the catalogue splits what a source names as one material, the catalogue species that count as the source's
/// name: spinel (with the zinc-rich gahnospinel and the iron-rich pleonaste), and man-made glass (one species per glass
/// family, each with its own dispersion band). The readings are never touched; only the name is read more widely.
/// </summary>
public static class CatalogueSpeciesSplits
{
    private static readonly Dictionary<string, string[]> Splits = new(StringComparer.Ordinal)
    {
        ["spinel"] = ["spinel", "gahnospinel", "pleonaste"],
        ["glass"] = ["glass", "soda-lime glass", "silica glass", "borosilicate glass", "light lead glass", "lead flint glass",
            "dense lead glass", "extra-dense lead glass", "highest-lead glass", "barium glass", "lanthanum glass",
            "lead-free high-index glass", "dense lead-free glass", "fibre-optic glass"],
    };

    /// <summary>True when a ranked catalogue species stands for one of the species a source named.</summary>
    public static bool Names(IReadOnlyList<string> published, string ranked) =>
        published.Contains(ranked) || published.Any(p => Splits.TryGetValue(p, out var names) && names.Contains(ranked));
}
