namespace GemIndex.Bench.Independent;

/// <summary>
/// The one explicit map from the property table's species to the catalogue's species names. The catalogue is being
/// reorganised: a name it no longer uses is reported by the benchmark, never guessed. A table species may map to
/// several catalogue species when the catalogue splits what the sources give as one (tourmaline by end member) and the
/// bench tests cannot tell them apart; a result naming any of them counts as that species.
/// </summary>
internal static class CatalogueSpeciesNames
{
    private static readonly Dictionary<string, string[]> Map = new(StringComparer.Ordinal)
    {
        ["tourmaline"] = ["elbaite", "dravite", "schorl", "uvite"],
        ["olivine"] = ["forsterite"],
        // The catalogue keeps chalcedony as a species of its own (its index and SG lie outside crystalline quartz).
        // Intermediate garnets are species of their own there; a stone of either end member named as the intermediate
        // it shades into counts as right, since the bench tests cannot draw that line.
        ["pyrope"] = ["pyrope", "pyrope-almandine"],
        ["almandine"] = ["almandine", "pyrope-almandine"],
        ["spessartine"] = ["spessartine", "pyrope-spessartine"],
        ["grossular"] = ["grossular", "grossular-andradite", "hydrogrossular"],
        ["andradite"] = ["andradite", "grossular-andradite"],
        ["coral"] = ["calcareous coral"],
        // The catalogue keeps its sintered and bonded imitations as one species; the table reads each material apart.
        ["ceramic imitation of larimar"] = ["ceramic"],
        ["sintered imitation of lapis"] = ["ceramic"],
        ["bonded imitation of turquoise"] = ["ceramic"],
    };

    /// <summary>The catalogue species a table species stands for (its own name unless mapped).</summary>
    public static IReadOnlyList<string> Of(string tableSpecies) =>
        Map.TryGetValue(tableSpecies, out var names) ? names : [tableSpecies];

    /// <summary>A key shared by every table species that maps to the same catalogue species (chalcedony and quartz).</summary>
    public static string GroupOf(string tableSpecies) => Of(tableSpecies)[0];
}
