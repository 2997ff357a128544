using System.Text.Json.Serialization;
using GemIndex.Core.Catalogue;
using GemIndex.Data.Catalogue;

namespace GemIndex.Data.ColourVarieties;

/// <summary>
/// reference-db/colour-varieties.json: the varieties whose trade name is defined by their colour (emerald, aquamarine,
/// ruby, the sapphires, and the quartz, elbaite, chalcedony and jadeite varieties named by colour) and the catalogue
/// entries that carry those names; attached to the shipped
/// entries by name after the catalogue loads (the SQLite schema does not hold it). Such an entry's colour test takes neither
/// its species' other colours nor its hues' neighbours (docs/ranking.md §2, colour).
/// </summary>
public sealed class ColourVarietyTable
{
    private const string ResourceName = "GemIndex.Catalogue.colour-varieties.json";

    private static readonly Lazy<ColourVarietyTable> EmbeddedTable = new(() => Read(ReferenceTableJson.Embedded(ResourceName)));

    private ColourVarietyTable(IReadOnlyDictionary<string, string> byName) => ByName = byName;

    /// <summary>The embedded table, read once.</summary>
    /// <exception cref="CatalogueFormatException">The embedded file cannot be read (every fault named).</exception>
    public static ColourVarietyTable Embedded => EmbeddedTable.Value;

    /// <summary>The colour-named variety of each entry listed, by the entry's name (ordinal, as the catalogue names entries).</summary>
    public IReadOnlyDictionary<string, string> ByName { get; }

    /// <summary>Reads the table's text; a variety without a name, colour, entries or a known source, or an entry listed twice, is an error naming it.</summary>
    /// <exception cref="CatalogueFormatException">The text has faults (all of them named).</exception>
    public static ColourVarietyTable Read(string json)
    {
        var table = ReferenceTableJson.Parse<TableDocument>(json, "colour-varieties.json");
        if (table?.Varieties is null) throw new CatalogueFormatException(["colour-varieties.json: \"varieties\" must be a list."]);
        var keys = new HashSet<string>((table.References ?? []).Select(r => r.Key), StringComparer.Ordinal);
        var errors = new List<string>();
        var byName = new Dictionary<string, string>(StringComparer.Ordinal);
        for (int i = 0; i < table.Varieties.Length; i++)
        {
            var v = table.Varieties[i];
            bool named = !string.IsNullOrWhiteSpace(v.Variety);
            string at = $"colour-varieties.json: varieties[{i}]{(named ? $" ({v.Variety})" : "")}";
            if (!named) errors.Add($"{at}: \"variety\" must name the variety.");
            if (string.IsNullOrWhiteSpace(v.Colour)) errors.Add($"{at}: \"colour\" must say the colour that defines it.");
            if (v.Source is null || !keys.Contains(v.Source)) errors.Add($"{at}: \"source\" must be one of the file's reference keys.");
            if (v.Entries is not { Length: >= 1 }) errors.Add($"{at}: \"entries\" must list one or more catalogue entries.");
            else if (named)
                foreach (string entry in v.Entries)
                    if (string.IsNullOrWhiteSpace(entry) || !byName.TryAdd(entry, v.Variety!))
                        errors.Add($"{at}: entry '{entry}' is blank or already listed.");
        }
        if (errors.Count > 0) throw new CatalogueFormatException(errors);
        return new ColourVarietyTable(byName);
    }

    /// <summary>The entry names in the table that the given catalogue does not have.</summary>
    public IReadOnlyList<string> Unmatched(IEnumerable<Material> catalogue) => EntryNames.Unmatched(ByName.Keys, catalogue);

    /// <summary>The materials with <see cref="Material.NamedByColour"/> set on the shipped entries listed.</summary>
    public IReadOnlyList<Material> Attach(IReadOnlyList<Material> materials) =>
        [.. materials.Select(m => !m.IsUserEntry && ByName.ContainsKey(m.Name) ? m with { NamedByColour = true } : m)];

    private sealed record TableDocument(
        [property: JsonPropertyName("about")] string? About,
        [property: JsonPropertyName("references")] ReferenceDocument[]? References,
        [property: JsonPropertyName("varieties")] VarietyDocument[]? Varieties);

    private sealed record ReferenceDocument([property: JsonPropertyName("key")] string Key, [property: JsonPropertyName("citation")] string? Citation);

    private sealed record VarietyDocument(
        [property: JsonPropertyName("variety")] string? Variety, [property: JsonPropertyName("colour")] string? Colour,
        [property: JsonPropertyName("source")] string? Source, [property: JsonPropertyName("entries")] string[]? Entries);
}
