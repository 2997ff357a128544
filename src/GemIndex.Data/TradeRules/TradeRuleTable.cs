using System.Text.Json;
using System.Text.Json.Serialization;
using GemIndex.Core.Catalogue;
using GemIndex.Data.Catalogue;

namespace GemIndex.Data.TradeRules;

/// <summary>
/// reference-db/trade-rules.json: the trade rules (CITES listings, an open treaty) that restrict buying, selling or
/// shipping some organic materials, by catalogue entry name. Read once from the embedded file and attached to the
/// shipped entries after the catalogue loads, as the magnification table is (the SQLite schema does not hold it); the
/// answer shows each as a caution, never as evidence.
/// </summary>
public sealed class TradeRuleTable
{
    private const string ResourceName = "GemIndex.Catalogue.trade-rules.json";

    private static readonly Lazy<TradeRuleTable> EmbeddedTable = new(() =>
        Read(System.Text.Encoding.UTF8.GetString(CatalogueSchema.EmbeddedBytes(ResourceName))));

    private static readonly JsonSerializerOptions Options = new() { UnmappedMemberHandling = JsonUnmappedMemberHandling.Disallow };

    private TradeRuleTable(IReadOnlyDictionary<string, TradeRule> rules) => Rules = rules;

    /// <summary>The embedded table, read once.</summary>
    /// <exception cref="CatalogueFormatException">The embedded file cannot be read (every fault named).</exception>
    public static TradeRuleTable Embedded => EmbeddedTable.Value;

    /// <summary>The rule by entry name (ordinal, as the catalogue names entries).</summary>
    public IReadOnlyDictionary<string, TradeRule> Rules { get; }

    /// <summary>Reads the table's text; a missing rule, an unknown source or a name given twice is an error naming the entry.</summary>
    /// <exception cref="CatalogueFormatException">The text has faults (all of them named).</exception>
    public static TradeRuleTable Read(string json)
    {
        TableDocument? table;
        try { table = JsonSerializer.Deserialize<TableDocument>(json, Options); }
        catch (JsonException e) { throw new CatalogueFormatException([$"trade-rules.json: not valid: {e.Message}"]); }
        if (table?.Entries is null) throw new CatalogueFormatException(["trade-rules.json: \"entries\" must be a list."]);
        var citations = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (var r in table.References ?? []) citations.TryAdd(r.Key, r.Citation ?? r.Key);
        var errors = new List<string>();
        var rules = new Dictionary<string, TradeRule>(StringComparer.Ordinal);
        for (int i = 0; i < table.Entries.Length; i++)
        {
            var e = table.Entries[i];
            string at = $"trade-rules.json: entries[{i}]{(string.IsNullOrWhiteSpace(e.Name) ? "" : $" ({e.Name})")}";
            if (string.IsNullOrWhiteSpace(e.Name)) errors.Add($"{at}: \"name\" must name a catalogue entry.");
            else if (string.IsNullOrWhiteSpace(e.Rule)) errors.Add($"{at}: \"rule\" must say what restricts the trade.");
            else if (e.Source is null || !citations.ContainsKey(e.Source)) errors.Add($"{at}: \"source\" must be one of the file's reference keys.");
            else if (!rules.TryAdd(e.Name, new TradeRule(e.Rule.Trim(), citations[e.Source]))) errors.Add($"{at}: the entry is named twice.");
        }
        if (errors.Count > 0) throw new CatalogueFormatException(errors);
        return new TradeRuleTable(rules);
    }

    /// <summary>The names in the table that are not entries of the given catalogue.</summary>
    public IReadOnlyList<string> Unmatched(IEnumerable<Material> catalogue) => EntryNames.Unmatched(Rules.Keys, catalogue);

    /// <summary>The materials with their trade rules attached (user entries keep none).</summary>
    public IReadOnlyList<Material> Attach(IReadOnlyList<Material> materials) =>
        [.. materials.Select(m => !m.IsUserEntry && Rules.TryGetValue(m.Name, out TradeRule? rule) ? m with { TradeRule = rule } : m)];

    private sealed record TableDocument(
        [property: JsonPropertyName("about")] string? About,
        [property: JsonPropertyName("references")] ReferenceDocument[]? References,
        [property: JsonPropertyName("entries")] EntryDocument[]? Entries);

    private sealed record ReferenceDocument([property: JsonPropertyName("key")] string Key, [property: JsonPropertyName("citation")] string? Citation);

    private sealed record EntryDocument(
        [property: JsonPropertyName("name")] string? Name, [property: JsonPropertyName("rule")] string? Rule, [property: JsonPropertyName("source")] string? Source);
}
