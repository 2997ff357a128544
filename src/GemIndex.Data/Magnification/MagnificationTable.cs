using System.Text.Json.Serialization;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Magnification;
using GemIndex.Data.Catalogue;

namespace GemIndex.Data.Magnification;

/// <summary>
/// reference-db/magnification.json: for named catalogue entries, the probability of holding each magnification
/// feature, with its source. Read once from the embedded file and attached to the shipped entries after the catalogue
/// loads, keyed by entry name (the SQLite schema does not hold it); every other entry keeps its origin's defaults. An
/// entry may give <c>"like": "other entry"</c> instead of its features (a heated stone keeps its natural sibling's
/// inclusions) and takes that entry's listed features; the other entry must list features of its own (no chains). A
/// feature read in another work than the entry's "source" names it in <c>"feature_sources": {"word": "key"}</c>.
/// Read strictly, as the other reference tables are: a field the table does not know is a fault, not ignored.
/// </summary>
public sealed class MagnificationTable
{
    private const string ResourceName = "GemIndex.Catalogue.magnification.json";

    private static readonly Lazy<MagnificationTable> EmbeddedTable = new(() => Read(ReferenceTableJson.Embedded(ResourceName)));

    private MagnificationTable(IReadOnlyDictionary<string, IReadOnlyDictionary<MagnificationFeature, double>> entries) => Entries = entries;

    /// <summary>The embedded table, read once.</summary>
    /// <exception cref="CatalogueFormatException">The embedded file cannot be read (every fault named).</exception>
    public static MagnificationTable Embedded => EmbeddedTable.Value;

    /// <summary>The listed probabilities by entry name (ordinal, as the catalogue names entries).</summary>
    public IReadOnlyDictionary<string, IReadOnlyDictionary<MagnificationFeature, double>> Entries { get; }

    /// <summary>Reads the table's text; an unknown word, a probability outside 0–1 or an unknown source is an error naming the entry.</summary>
    /// <exception cref="CatalogueFormatException">The text has faults (all of them named).</exception>
    public static MagnificationTable Read(string json)
    {
        var table = ReferenceTableJson.Parse<TableDocument>(json, "magnification.json");
        if (table?.Entries is null) throw new CatalogueFormatException(["magnification.json: \"entries\" must be a list."]);
        var keys = (table.References ?? []).Select(r => r.Key).ToHashSet(StringComparer.Ordinal);
        var errors = new List<string>();
        var entries = new Dictionary<string, IReadOnlyDictionary<MagnificationFeature, double>>(StringComparer.Ordinal);
        var names = new HashSet<string>(StringComparer.Ordinal);
        var likes = new List<(string At, string Name, string Sibling)>();
        for (int index = 0; index < table.Entries.Length; index++)
        {
            var entry = table.Entries[index];
            string at = $"magnification.json: entries[{index}]";
            if (entry is null || string.IsNullOrWhiteSpace(entry.Name)) { errors.Add($"{at}: must be an object with a \"name\"."); continue; }
            string name = entry.Name;
            at += $" ({name})";
            if (entry.Source is null || !keys.Contains(entry.Source)) errors.Add($"{at}: \"source\" must be one of the file's reference keys.");
            if (entry.Like is not null)
            {
                // A treated stone that keeps its natural sibling's inclusions takes the sibling's listed features.
                if (entry.Features is not null) errors.Add($"{at}: \"like\" must be the name of another entry of the table, given instead of \"features\".");
                else if (!names.Add(name)) errors.Add($"{at}: the entry is named twice.");
                else likes.Add((at, name, entry.Like));
                continue;
            }
            if (entry.Features is null) { errors.Add($"{at}: \"features\" must be an object of word: probability."); continue; }
            // A feature read in another work than the entry's others names its own source.
            foreach (var (word, key) in entry.FeatureSources ?? [])
            {
                if (!entry.Features.ContainsKey(word)) errors.Add($"{at}: \"feature_sources\" names '{word}', which is not one of the entry's features.");
                if (!keys.Contains(key)) errors.Add($"{at}: \"feature_sources\" of '{word}' must be one of the file's reference keys.");
            }
            var probabilities = new Dictionary<MagnificationFeature, double>();
            foreach (var (word, value) in entry.Features)
            {
                if (MagnificationVocabulary.Find(word) is not { } known || word != MagnificationVocabulary.Of(known).Word)
                    errors.Add($"{at}: '{word}' is not a word of the magnification vocabulary.");
                else if (value is < 0 or > 1 || double.IsNaN(value))
                    errors.Add($"{at}: {word} must be a probability, 0–1.");
                else probabilities[known] = value;
            }
            if (!names.Add(name) || !entries.TryAdd(name, probabilities)) errors.Add($"{at}: the entry is named twice.");
        }
        var own = new Dictionary<string, IReadOnlyDictionary<MagnificationFeature, double>>(entries, StringComparer.Ordinal);
        foreach ((string at, string name, string sibling) in likes)
        {
            if (own.TryGetValue(sibling, out var listed)) entries[name] = listed;
            else errors.Add($"{at}: \"like\" names '{sibling}', which is not an entry of the table with features of its own.");
        }
        if (errors.Count > 0) throw new CatalogueFormatException(errors);
        return new MagnificationTable(entries);
    }

    /// <summary>The names in the table that are not entries of the given catalogue.</summary>
    public IReadOnlyList<string> Unmatched(IEnumerable<Material> catalogue) => EntryNames.Unmatched(Entries.Keys, catalogue);

    /// <summary>The materials with their listed profiles attached (user entries and unlisted ones keep their origin's defaults).</summary>
    public IReadOnlyList<Material> Attach(IReadOnlyList<Material> materials) =>
        [.. materials.Select(m => !m.IsUserEntry && Entries.TryGetValue(m.Name, out var listed) ? m with { Magnification = new MagnificationProfile(m.Origin, listed) } : m)];

    private sealed record TableDocument(
        [property: JsonPropertyName("about")] string? About,
        [property: JsonPropertyName("references")] ReferenceDocument[]? References,
        [property: JsonPropertyName("entries")] EntryDocument?[]? Entries);

    private sealed record ReferenceDocument([property: JsonPropertyName("key")] string Key, [property: JsonPropertyName("citation")] string? Citation);

    /// <summary>One entry: its features with their probabilities, or the entry it is like; the note says why, for readers.</summary>
    private sealed record EntryDocument(
        [property: JsonPropertyName("name")] string? Name,
        [property: JsonPropertyName("features")] Dictionary<string, double>? Features,
        [property: JsonPropertyName("like")] string? Like,
        [property: JsonPropertyName("source")] string? Source,
        [property: JsonPropertyName("feature_sources")] Dictionary<string, string>? FeatureSources,
        [property: JsonPropertyName("note")] string? Note);
}
