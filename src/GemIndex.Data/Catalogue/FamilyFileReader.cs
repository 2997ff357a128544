using System.Text.Json;
using System.Text.RegularExpressions;
using GemIndex.Core.Catalogue;

namespace GemIndex.Data.Catalogue;

/// <summary>
/// Reads family files (format 2, reference-db/README.md) strictly: unknown fields, duplicate keys and non-finite
/// numbers refused, unknown reference keys and a key with two citations refused. Every problem becomes one line of a
/// <see cref="CatalogueFormatException"/> naming the file, the species, the variety and the field.
/// </summary>
public static class FamilyFileReader
{
    private static readonly HashSet<string> SourceFields = [.. CatalogueFields.Inheritable, "*"];

    /// <summary>All varieties of all files as materials, in file order; throws with every error of every file.</summary>
    /// <exception cref="CatalogueFormatException">Any file or entry cannot be read.</exception>
    public static IReadOnlyList<Material> ReadAll(IEnumerable<FamilySource> sources) => ReadCatalogue(sources).Materials;

    /// <summary>The varieties of one family file (with the shared references).</summary>
    /// <exception cref="CatalogueFormatException">The file or an entry cannot be read.</exception>
    public static IReadOnlyList<Material> Read(FamilySource source) => ReadCatalogue([source]).Materials;

    /// <summary>Every family file with the shared references of sources.json (the embedded one unless given).</summary>
    /// <param name="sources">The family files.</param>
    /// <param name="sharedReferences">The text of a sources.json; null for the one embedded in GemIndex.Data.</param>
    /// <exception cref="CatalogueFormatException">Any file, reference or entry cannot be read.</exception>
    public static FamilyCatalogue ReadCatalogue(IEnumerable<FamilySource> sources, string? sharedReferences = null)
    {
        var errors = new List<string>();
        var references = new Dictionary<string, (ValueSource Source, string File)>(StringComparer.Ordinal);
        SharedReferencesDocument? shared = Parse(new FamilySource("sources.json", sharedReferences ?? ShippedCatalogue.SharedReferences),
            CatalogueJsonContext.Default.SharedReferencesDocument, errors);
        AddReferences("sources.json", shared?.References ?? [], references, errors);
        var files = new List<(FamilySource Source, FamilyDocument Document)>();
        foreach (FamilySource source in sources)
        {
            if (Parse(source, CatalogueJsonContext.Default.FamilyDocument, errors) is not { } document) continue;
            string expected = Path.GetFileNameWithoutExtension(source.FileName);
            if (document.Family != expected)
                errors.Add($"{source.FileName}: field family: '{document.Family}' must match the file name '{expected}'");
            AddReferences(source.FileName, document.References ?? [], references, errors);
            files.Add((source, document));
        }
        var byKey = references.ToDictionary(r => r.Key, r => r.Value.Source, StringComparer.Ordinal);
        var materials = new List<Material>();
        var species = new Dictionary<string, Material>(StringComparer.Ordinal);
        var documents = new Dictionary<string, SpeciesDocument>(StringComparer.Ordinal);
        var declaredIn = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach ((FamilySource source, FamilyDocument document) in files)
        {
            foreach (SpeciesDocument s in document.Species)
            {
                string where = $"{source.FileName}: species '{s.Species}'";
                if (declaredIn.TryGetValue(s.Species, out string? first))
                    errors.Add($"{where}, field species: already declared in {first}; a species lives in exactly one file");
                else declaredIn[s.Species] = source.FileName;
                documents[s.Species] = s;
                ReadSpecies(s, document.Family, where, byKey, materials, species, errors);
            }
        }
        return errors.Count > 0 ? throw new CatalogueFormatException(errors) : new FamilyCatalogue(materials, species, documents, byKey);
    }

    private static void ReadSpecies(SpeciesDocument s, string family, string where, Dictionary<string, ValueSource> references,
        List<Material> materials, Dictionary<string, Material> species, List<string> errors)
    {
        if (s.Sources is null) errors.Add($"{where}, field sources: required: a map from field name (or \"*\") to a reference key");
        CheckSources(s.Sources, null, references, (field, problem) => errors.Add($"{where}, field {field}: {problem}"));
        if (s.Varieties.Length == 0) errors.Add($"{where}, field varieties: at least one variety is required (a species with one has one entry)");
        Func<string, ValueSource?> speciesSource = field => Resolve(s.Sources, field, references);
        var own = new EntryIdentity(s.Species, s.Species, s.Species, "natural", s.Frequency, s.CrystalSystem, s.OpticCharacter, s.Frequency, family);
        // The species' own fields are read as an entry of their own: a problem there is reported once, on the species,
        // and not again for each variety that inherits the field ("share" is the frequency here, reported as such).
        var speciesProblems = new HashSet<(string Field, string Problem)>();
        void SpeciesFail(string field, string problem)
        {
            if (field != "share" && speciesProblems.Add((field, problem))) errors.Add($"{where}, field {field}: {problem}");
        }
        if (EntryMapping.Flatten(own, null, speciesSource, s, speciesSource, SpeciesFail) is { } whole) species[s.Species] = whole;
        foreach (VarietyDocument v in s.Varieties)
        {
            string at = $"{where}, variety '{v.Name}'";
            HashSet<string> stated = [.. v.Stated()];
            void Fail(string field, string problem)
            {
                if (!speciesProblems.Contains((field, problem))) errors.Add($"{at}, field {field}: {problem}");
            }
            CheckSources(v.Sources, stated, references, Fail);
            var id = new EntryIdentity(v.Name, s.Species, v.Variety, v.Origin, v.Share, s.CrystalSystem, s.OpticCharacter, s.Frequency, family);
            if (EntryMapping.Flatten(id, s, speciesSource, v, field => Resolve(v.Sources, field, references), Fail) is { } m) materials.Add(m);
        }
    }

    // A sources map names fields a document can hold ("*" too), each a known reference; a variety's only fields it states.
    private static void CheckSources(Dictionary<string, string>? map, HashSet<string>? stated, Dictionary<string, ValueSource> references, Action<string, string> fail)
    {
        foreach ((string field, string key) in map ?? [])
        {
            if (!SourceFields.Contains(field))
                fail("sources", $"'{field}' is not a field that takes a source; use \"*\" or one of {string.Join(", ", CatalogueFields.Inheritable)}");
            else if (stated is not null && field != "*" && !stated.Contains(field))
                fail("sources", $"names '{field}', which this variety does not state (it inherits it with its species' source)");
            if (!references.ContainsKey(key))
                fail("sources", $"'{key}' (for {field}) is not a reference key of this file or of sources.json");
        }
    }

    private static ValueSource? Resolve(Dictionary<string, string>? map, string field, Dictionary<string, ValueSource> references) =>
        map is not null && (map.TryGetValue(field, out string? key) || map.TryGetValue("*", out key)) && references.TryGetValue(key, out ValueSource? s)
            ? s : null;

    private static void AddReferences(string file, ReferenceDocument[] documents, Dictionary<string, (ValueSource Source, string File)> references, List<string> errors)
    {
        for (int i = 0; i < documents.Length; i++)
        {
            ReferenceDocument r = documents[i];
            string where = $"{file}: reference {i} '{r.Key}'";
            if (string.IsNullOrWhiteSpace(r.Key)) errors.Add($"{where}, field key: the key is empty");
            if (string.IsNullOrWhiteSpace(r.Citation)) errors.Add($"{where}, field citation: the citation is empty");
            SourceKind kind = EntryMapping.Word<SourceKind>("kind", r.Kind, (field, problem) => errors.Add($"{where}, field {field}: {problem}"));
            var source = new ValueSource(r.Key, kind, r.Citation);
            if (references.TryGetValue(r.Key, out var earlier))
            {
                if (earlier.Source != source)
                    errors.Add($"{where}, field citation: the key is also declared in {earlier.File} with another kind or citation " +
                        $"('{earlier.Source.Citation}'); one key, one citation");
            }
            else references[r.Key] = (source, file);
        }
    }

    private static T? Parse<T>(FamilySource source, System.Text.Json.Serialization.Metadata.JsonTypeInfo<T> type, List<string> errors) where T : class
    {
        try
        {
            return JsonSerializer.Deserialize(source.Json, type) ?? throw new JsonException("the file holds null instead of an object");
        }
        catch (JsonException e)
        {
            string line = e.LineNumber is { } l ? $"line {l + 1}, " : "";
            errors.Add($"{source.FileName}: {line}{Describe(e.Path, source.Json)}: {e.Message.Split(" Path: ")[0]}");
            return null;
        }
    }

    // "$.species[3].varieties[1].sg" → "species 3 'beryl', variety 1 'emerald', field sg" (names when the text is
    // still well-formed JSON, as for an unknown field or a wrong type; indices alone otherwise).
    private static string Describe(string? path, string json)
    {
        if (path is null || path == "$") return "top level";
        Match m = Regex.Match(path, @"^\$\.(species|references)\[(\d+)\](?:\.varieties\[(\d+)\])?(?:\.(\w+))?");
        if (!m.Success) return $"at {path}";
        int first = int.Parse(m.Groups[2].Value, System.Globalization.CultureInfo.InvariantCulture);
        int? second = m.Groups[3].Success ? int.Parse(m.Groups[3].Value, System.Globalization.CultureInfo.InvariantCulture) : null;
        (string? outer, string? inner) = NamesAt(json, m.Groups[1].Value, first, second);
        string text = $"{(m.Groups[1].Value == "species" ? "species" : "reference")} {first}{Quoted(outer)}";
        if (second is { } j) text += $", variety {j}{Quoted(inner)}";
        return m.Groups[4].Success ? $"{text}, field {m.Groups[4].Value}" : text;
    }

    private static string Quoted(string? name) => name is null ? "" : $" '{name}'";

    private static (string? Outer, string? Inner) NamesAt(string json, string list, int first, int? second)
    {
        try
        {
            using JsonDocument doc = JsonDocument.Parse(json);
            if (!doc.RootElement.TryGetProperty(list, out JsonElement items) || items.ValueKind != JsonValueKind.Array || items.GetArrayLength() <= first)
                return (null, null);
            JsonElement outer = items[first];
            string? outerName = Text(outer, list == "species" ? "species" : "key");
            if (second is not { } j || !outer.TryGetProperty("varieties", out JsonElement varieties)
                || varieties.ValueKind != JsonValueKind.Array || varieties.GetArrayLength() <= j)
                return (outerName, null);
            return (outerName, Text(varieties[j], "name"));
        }
        catch (JsonException)
        {
            return (null, null);
        }
    }

    private static string? Text(JsonElement element, string property) =>
        element.ValueKind == JsonValueKind.Object && element.TryGetProperty(property, out JsonElement v) && v.ValueKind == JsonValueKind.String
            ? v.GetString() : null;
}
