using System.Text.Json.Serialization;
using GemIndex.Core.Catalogue;
using GemIndex.Data.Catalogue;

namespace GemIndex.Data.MineralGroups;

/// <summary>
/// reference-db/mineral-groups.json: the mineral groups (tourmaline, garnet, feldspar, spinel) whose member
/// species the catalogue keeps apart; attached to every entry of a listed species after the catalogue loads, the user's
/// own included (the SQLite schema does not hold it). The answer names the group's species that stay open together,
/// never weighs the group as evidence.
/// </summary>
public sealed class MineralGroupTable
{
    private const string ResourceName = "GemIndex.Catalogue.mineral-groups.json";

    private static readonly Lazy<MineralGroupTable> EmbeddedTable = new(() => Read(ReferenceTableJson.Embedded(ResourceName)));

    private MineralGroupTable(IReadOnlyDictionary<string, string> bySpecies) => BySpecies = bySpecies;

    /// <summary>The embedded table, read once.</summary>
    /// <exception cref="CatalogueFormatException">The embedded file cannot be read (every fault named).</exception>
    public static MineralGroupTable Embedded => EmbeddedTable.Value;

    /// <summary>The group of each species listed.</summary>
    public IReadOnlyDictionary<string, string> BySpecies { get; }

    /// <summary>Reads the table's text; a group without a name, species or a known source, or a species listed twice, is an error naming it.</summary>
    /// <exception cref="CatalogueFormatException">The text has faults (all of them named).</exception>
    public static MineralGroupTable Read(string json)
    {
        var table = ReferenceTableJson.Parse<TableDocument>(json, "mineral-groups.json");
        if (table?.Groups is null) throw new CatalogueFormatException(["mineral-groups.json: \"groups\" must be a list."]);
        var keys = new HashSet<string>((table.References ?? []).Select(r => r.Key), StringComparer.Ordinal);
        var errors = new List<string>();
        var bySpecies = new Dictionary<string, string>(StringComparer.Ordinal);
        var names = new HashSet<string>(StringComparer.Ordinal);
        for (int i = 0; i < table.Groups.Length; i++)
        {
            var g = table.Groups[i];
            bool named = !string.IsNullOrWhiteSpace(g.Group);
            string at = $"mineral-groups.json: groups[{i}]{(named ? $" ({g.Group})" : "")}";
            if (!named) errors.Add($"{at}: \"group\" must name the group.");
            else if (!names.Add(g.Group!)) errors.Add($"{at}: the group is given twice.");
            if (g.Source is null || !keys.Contains(g.Source)) errors.Add($"{at}: \"source\" must be one of the file's reference keys.");
            if (g.Species is not { Length: >= 2 }) errors.Add($"{at}: \"species\" must list two or more species.");
            else if (named)
                foreach (string species in g.Species)
                    if (string.IsNullOrWhiteSpace(species) || !bySpecies.TryAdd(species, g.Group!))
                        errors.Add($"{at}: species '{species}' is blank or already in a group.");
        }
        if (errors.Count > 0) throw new CatalogueFormatException(errors);
        return new MineralGroupTable(bySpecies);
    }

    /// <summary>The species in the table that the given catalogue does not have.</summary>
    public IReadOnlyList<string> Unmatched(IEnumerable<Material> catalogue) =>
        EntryNames.Unmatched(BySpecies.Keys, [.. catalogue], m => m.Species);

    /// <summary>The materials with their species' group attached.</summary>
    public IReadOnlyList<Material> Attach(IReadOnlyList<Material> materials) =>
        [.. materials.Select(m => BySpecies.TryGetValue(m.Species, out string? group) ? m with { MineralGroup = group } : m)];

    private sealed record TableDocument(
        [property: JsonPropertyName("about")] string? About,
        [property: JsonPropertyName("references")] ReferenceDocument[]? References,
        [property: JsonPropertyName("groups")] GroupDocument[]? Groups);

    private sealed record ReferenceDocument([property: JsonPropertyName("key")] string Key, [property: JsonPropertyName("citation")] string? Citation);

    private sealed record GroupDocument(
        [property: JsonPropertyName("group")] string? Group, [property: JsonPropertyName("source")] string? Source,
        [property: JsonPropertyName("species")] string[]? Species);
}
