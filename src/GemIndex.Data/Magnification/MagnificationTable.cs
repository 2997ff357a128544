using System.Text.Json;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Magnification;
using GemIndex.Data.Catalogue;

namespace GemIndex.Data.Magnification;

/// <summary>
/// reference-db/magnification.json: for named catalogue entries, the probability of holding each magnification
/// feature, with its source. Read once from the embedded file and attached to the shipped entries after the catalogue
/// loads, keyed by entry name (the SQLite schema does not hold it); every other entry keeps its origin's defaults. An
/// entry may give <c>"like": "other entry"</c> instead of its features (a heated stone keeps its natural sibling's
/// inclusions) and takes that entry's listed features; the other entry must list features of its own (no chains).
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
        var errors = new List<string>();
        var entries = new Dictionary<string, IReadOnlyDictionary<MagnificationFeature, double>>(StringComparer.Ordinal);
        try
        {
            using var doc = JsonDocument.Parse(json);
            var keys = doc.RootElement.TryGetProperty("references", out var refs) && refs.ValueKind == JsonValueKind.Array
                ? refs.EnumerateArray().Where(r => r.ValueKind == JsonValueKind.Object && r.TryGetProperty("key", out _))
                    .Select(r => r.GetProperty("key").GetString() ?? "").ToHashSet(StringComparer.Ordinal)
                : [];
            if (!doc.RootElement.TryGetProperty("entries", out var list) || list.ValueKind != JsonValueKind.Array)
                throw new CatalogueFormatException(["magnification.json: \"entries\" must be a list."]);
            int index = 0;
            var names = new HashSet<string>(StringComparer.Ordinal);
            var likes = new List<(string At, string Name, string Sibling)>();
            foreach (var entry in list.EnumerateArray())
            {
                string at = $"magnification.json: entries[{index++}]";
                if (entry.ValueKind != JsonValueKind.Object || !entry.TryGetProperty("name", out var nameElement) || nameElement.ValueKind != JsonValueKind.String)
                { errors.Add($"{at}: must be an object with a \"name\"."); continue; }
                string name = nameElement.GetString()!;
                at += $" ({name})";
                if (!entry.TryGetProperty("source", out var source) || source.ValueKind != JsonValueKind.String || !keys.Contains(source.GetString()!))
                    errors.Add($"{at}: \"source\" must be one of the file's reference keys.");
                if (entry.TryGetProperty("like", out var like))
                {
                    // A treated stone that keeps its natural sibling's inclusions takes the sibling's listed features.
                    if (like.ValueKind != JsonValueKind.String || entry.TryGetProperty("features", out _))
                        errors.Add($"{at}: \"like\" must be the name of another entry of the table, given instead of \"features\".");
                    else if (!names.Add(name)) errors.Add($"{at}: the entry is named twice.");
                    else likes.Add((at, name, like.GetString()!));
                    continue;
                }
                if (!entry.TryGetProperty("features", out var features) || features.ValueKind != JsonValueKind.Object)
                { errors.Add($"{at}: \"features\" must be an object of word: probability."); continue; }
                var probabilities = new Dictionary<MagnificationFeature, double>();
                foreach (var feature in features.EnumerateObject())
                {
                    if (MagnificationVocabulary.Find(feature.Name) is not { } known || feature.Name != MagnificationVocabulary.Of(known).Word)
                        errors.Add($"{at}: '{feature.Name}' is not a word of the magnification vocabulary.");
                    else if (feature.Value.ValueKind != JsonValueKind.Number || feature.Value.GetDouble() is < 0 or > 1)
                        errors.Add($"{at}: {feature.Name} must be a probability, 0–1.");
                    else probabilities[known] = feature.Value.GetDouble();
                }
                if (!names.Add(name) || !entries.TryAdd(name, probabilities)) errors.Add($"{at}: the entry is named twice.");
            }
            var own = new Dictionary<string, IReadOnlyDictionary<MagnificationFeature, double>>(entries, StringComparer.Ordinal);
            foreach ((string at, string name, string sibling) in likes)
            {
                if (own.TryGetValue(sibling, out var listed)) entries[name] = listed;
                else errors.Add($"{at}: \"like\" names '{sibling}', which is not an entry of the table with features of its own.");
            }
        }
        catch (JsonException e) { errors.Add($"magnification.json: not valid JSON: {e.Message}"); }
        if (errors.Count > 0) throw new CatalogueFormatException(errors);
        return new MagnificationTable(entries);
    }

    /// <summary>The names in the table that are not entries of the given catalogue.</summary>
    public IReadOnlyList<string> Unmatched(IEnumerable<Material> catalogue) => EntryNames.Unmatched(Entries.Keys, catalogue);

    /// <summary>The materials with their listed profiles attached (user entries and unlisted ones keep their origin's defaults).</summary>
    public IReadOnlyList<Material> Attach(IReadOnlyList<Material> materials) =>
        [.. materials.Select(m => !m.IsUserEntry && Entries.TryGetValue(m.Name, out var listed) ? m with { Magnification = new MagnificationProfile(m.Origin, listed) } : m)];
}
