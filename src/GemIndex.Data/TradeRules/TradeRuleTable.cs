using System.Text.Json.Serialization;
using GemIndex.Core.Catalogue;
using GemIndex.Data.Catalogue;

namespace GemIndex.Data.TradeRules;

/// <summary>
/// reference-db/trade-rules.json: the rules (CITES listings, and national rules for mammoth ivory) that restrict buying,
/// selling or shipping some organic materials. Each rule is written once and given to entries by name (shipped entries)
/// or by species (every natural or treated entry of the species, the user's own included); attached after the catalogue loads (the SQLite
/// schema does not hold it). The answer shows each as a caution, never as evidence.
/// </summary>
public sealed class TradeRuleTable
{
    private const string ResourceName = "GemIndex.Catalogue.trade-rules.json";

    private static readonly Lazy<TradeRuleTable> EmbeddedTable = new(() => Read(ReferenceTableJson.Embedded(ResourceName)));

    private TradeRuleTable(IReadOnlyDictionary<string, TradeRule> byName, IReadOnlyDictionary<string, TradeRule> bySpecies) =>
        (ByName, BySpecies) = (byName, bySpecies);

    /// <summary>The embedded table, read once.</summary>
    /// <exception cref="CatalogueFormatException">The embedded file cannot be read (every fault named).</exception>
    public static TradeRuleTable Embedded => EmbeddedTable.Value;

    /// <summary>The rule of each entry named (ordinal, as the catalogue names entries); shipped entries only.</summary>
    public IReadOnlyDictionary<string, TradeRule> ByName { get; }

    /// <summary>The rule of every entry of each species named, the user's own entries included.</summary>
    public IReadOnlyDictionary<string, TradeRule> BySpecies { get; }

    /// <summary>Reads the table's text; a rule without text or a known source, an entry naming an unknown rule, or a name given twice is an error naming it.</summary>
    /// <exception cref="CatalogueFormatException">The text has faults (all of them named).</exception>
    public static TradeRuleTable Read(string json)
    {
        var table = ReferenceTableJson.Parse<TableDocument>(json, "trade-rules.json");
        if (table?.Rules is null || table.Entries is null) throw new CatalogueFormatException(["trade-rules.json: \"rules\" and \"entries\" must be lists."]);
        var citations = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (var r in table.References ?? []) citations.TryAdd(r.Key, r.Citation ?? r.Key);
        var errors = new List<string>();
        var rules = new Dictionary<string, TradeRule>(StringComparer.Ordinal);
        for (int i = 0; i < table.Rules.Length; i++)
        {
            var r = table.Rules[i];
            string at = $"trade-rules.json: rules[{i}]{(string.IsNullOrWhiteSpace(r.Key) ? "" : $" ({r.Key})")}";
            if (string.IsNullOrWhiteSpace(r.Key)) errors.Add($"{at}: \"key\" must name the rule.");
            else if (string.IsNullOrWhiteSpace(r.Text)) errors.Add($"{at}: \"text\" must say what restricts the trade.");
            else if (r.Source is null || !citations.TryGetValue(r.Source, out string? citation)) errors.Add($"{at}: \"source\" must be one of the file's reference keys.");
            else if (!rules.TryAdd(r.Key, new TradeRule(r.Key, r.Text.Trim(), citation))) errors.Add($"{at}: the rule is given twice.");
        }
        var byName = new Dictionary<string, TradeRule>(StringComparer.Ordinal);
        var bySpecies = new Dictionary<string, TradeRule>(StringComparer.Ordinal);
        for (int i = 0; i < table.Entries.Length; i++)
        {
            var e = table.Entries[i];
            bool named = !string.IsNullOrWhiteSpace(e.Name), species = !string.IsNullOrWhiteSpace(e.Species);
            string at = $"trade-rules.json: entries[{i}]{(named ? $" ({e.Name})" : species ? $" (species {e.Species})" : "")}";
            if (named == species) errors.Add($"{at}: give either \"name\" (one entry) or \"species\" (all its entries).");
            else if (e.Rule is null || !rules.TryGetValue(e.Rule, out var rule)) errors.Add($"{at}: \"rule\" must be the key of one of the file's rules.");
            else if (!(named ? byName : bySpecies).TryAdd(named ? e.Name! : e.Species!, rule)) errors.Add($"{at}: named twice.");
        }
        if (errors.Count > 0) throw new CatalogueFormatException(errors);
        return new TradeRuleTable(byName, bySpecies);
    }

    /// <summary>The entry names and species in the table that the given catalogue does not have.</summary>
    public IReadOnlyList<string> Unmatched(IEnumerable<Material> catalogue)
    {
        var materials = catalogue.ToList();
        return [.. EntryNames.Unmatched(ByName.Keys, materials), .. EntryNames.Unmatched(BySpecies.Keys, materials, m => m.Species).Select(s => $"species {s}")];
    }

    /// <summary>
    /// The rule that applies to an entry: (shipped entries) its own by name, else (natural, treated or cultured entries) its
    /// species' rule; an imitation or a laboratory-grown entry filed under the species is not the protected animal.
    /// </summary>
    public TradeRule? For(Material material) =>
        !material.IsUserEntry && ByName.TryGetValue(material.Name, out var byName) ? byName
        : material.Origin is OriginClass.Natural or OriginClass.Treated or OriginClass.Cultured && BySpecies.TryGetValue(material.Species, out var bySpecies) ? bySpecies : null;

    /// <summary>The materials with their trade rules attached.</summary>
    public IReadOnlyList<Material> Attach(IReadOnlyList<Material> materials) =>
        [.. materials.Select(m => For(m) is { } rule ? m with { TradeRule = rule } : m)];

    private sealed record TableDocument(
        [property: JsonPropertyName("about")] string? About,
        [property: JsonPropertyName("references")] ReferenceDocument[]? References,
        [property: JsonPropertyName("rules")] RuleDocument[]? Rules,
        [property: JsonPropertyName("entries")] EntryDocument[]? Entries);

    private sealed record ReferenceDocument([property: JsonPropertyName("key")] string Key, [property: JsonPropertyName("citation")] string? Citation);

    private sealed record RuleDocument(
        [property: JsonPropertyName("key")] string? Key, [property: JsonPropertyName("text")] string? Text, [property: JsonPropertyName("source")] string? Source);

    private sealed record EntryDocument(
        [property: JsonPropertyName("name")] string? Name, [property: JsonPropertyName("species")] string? Species, [property: JsonPropertyName("rule")] string? Rule);
}
