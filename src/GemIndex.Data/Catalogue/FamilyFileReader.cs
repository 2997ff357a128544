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
        var likes = new Dictionary<string, CatalogueCheck.Likeness>(StringComparer.Ordinal);
        // Which species (and file) each variety name belongs to, so that a "like" naming another species' variety says so.
        var speciesOfVariety = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach ((FamilySource source, FamilyDocument document) in files)
            foreach (SpeciesDocument s in document.Species)
                foreach (VarietyDocument v in s.Varieties) speciesOfVariety.TryAdd(v.Name, $"species '{s.Species}' in {source.FileName}");
        foreach ((FamilySource source, FamilyDocument document) in files)
        {
            foreach (SpeciesDocument s in document.Species)
            {
                string where = $"{source.FileName}: species '{s.Species}'";
                if (declaredIn.TryGetValue(s.Species, out string? first))
                    errors.Add($"{where}, field species: already declared in {first}; a species lives in exactly one file");
                else declaredIn[s.Species] = source.FileName;
                documents[s.Species] = s;
                ReadSpecies(s, document.Family, where, byKey, speciesOfVariety, materials, species, likes, errors);
            }
        }
        return errors.Count > 0 ? throw new CatalogueFormatException(errors) : new FamilyCatalogue(materials, species, documents, byKey, likes);
    }

    // A variety read: its fields merged over what it inherits (for a variety like it) and its flattened material.
    private sealed record ReadVariety(EntryFieldsDocument Merged, Material Material);

    private static void ReadSpecies(SpeciesDocument s, string family, string where, Dictionary<string, ValueSource> references,
        Dictionary<string, string> speciesOfVariety, List<Material> materials, Dictionary<string, Material> species,
        Dictionary<string, CatalogueCheck.Likeness> likes, List<string> errors)
    {
        if (s.Sources is null) errors.Add($"{where}, field sources: required: a map from field name (or \"*\") to a reference key");
        CheckSources(s.Sources, null, "", references, (field, problem) => errors.Add($"{where}, field {field}: {problem}"));
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
        // Varieties by name, for "like" (a name used twice is the catalogue check's finding; the first is meant here).
        var byName = new Dictionary<string, VarietyDocument>(StringComparer.Ordinal);
        foreach (VarietyDocument v in s.Varieties) byName.TryAdd(v.Name, v);
        var read = new Dictionary<VarietyDocument, ReadVariety?>(ReferenceEqualityComparer.Instance);

        // A variety is read after the sibling it is like (chains allowed, cycles refused before any recursion), so a
        // variety like a sibling that cannot be read is not read either: the sibling's own errors say why.
        ReadVariety? Read(VarietyDocument v)
        {
            if (read.TryGetValue(v, out ReadVariety? done)) return done;
            string at = $"{where}, variety '{v.Name}'";
            void Fail(string field, string problem)
            {
                if (!speciesProblems.Contains((field, problem))) errors.Add($"{at}, field {field}: {problem}");
            }
            ReadVariety? sibling = null;
            if (v.Like is { } like)
            {
                if (LikeProblem(v, s.Species, byName, speciesOfVariety) is { } problem) Fail("like", problem);
                else sibling = Read(byName[like]);
                if (sibling is null) return read[v] = null;
            }
            HashSet<string> stated = [.. v.Stated()];
            CheckSources(v.Sources, stated, sibling is null ? "its species' source" : $"the source it has in '{v.Like}'", references, Fail);
            var id = new EntryIdentity(v.Name, s.Species, v.Variety, v.Origin, v.Share, s.CrystalSystem, s.OpticCharacter, s.Frequency, family);
            Func<string, ValueSource?> ownSource = field => Resolve(v.Sources, field, references);
            Material? m = sibling is null
                ? EntryMapping.Flatten(id, s, speciesSource, v, ownSource, Fail)
                : EntryMapping.Flatten(id, sibling.Merged, field => sibling.Material.Sources.GetValueOrDefault(field), v, ownSource, Fail,
                    sibling.Material.StatedFields);
            if (m is null) return read[v] = null;
            if (sibling is not null) likes[v.Name] = new CatalogueCheck.Likeness(sibling.Material, [.. stated]);
            return read[v] = new ReadVariety(v.Over(sibling?.Merged ?? s), m);
        }

        foreach (VarietyDocument v in s.Varieties)
            if (Read(v) is { } r) materials.Add(r.Material);
    }

    // What is wrong with a variety's "like", if anything: an unknown name, another species' variety, or a cycle (itself,
    // or a chain that comes back to it or runs into a cycle further on). A chain (a like b, b like c) is allowed.
    private static string? LikeProblem(VarietyDocument v, string species, Dictionary<string, VarietyDocument> byName,
        Dictionary<string, string> speciesOfVariety)
    {
        string like = v.Like!;
        if (!byName.ContainsKey(like))
            return speciesOfVariety.TryGetValue(like, out string? other)
                ? $"'{like}' is a variety of {other}, not of species '{species}'; a variety can be like only a sibling of its own species"
                : $"'{like}' is not the name of a variety of species '{species}' (names are compared exactly)";
        var chain = new List<string> { v.Name };
        VarietyDocument current = v;
        while (current.Like is { } next && byName.TryGetValue(next, out VarietyDocument? sibling))
        {
            bool back = next == v.Name, inner = !back && chain.Contains(next);
            chain.Add(next);
            if (back) return $"'{like}' leads back to this variety ({string.Join(" → ", chain)}); a chain of \"like\" must not form a cycle";
            if (inner) return $"'{like}' leads into a cycle ({string.Join(" → ", chain)}); a chain of \"like\" must not form a cycle";
            current = sibling;
        }
        return null;
    }

    // A sources map names fields a document can hold ("*" too), each a known reference; a variety's only fields it states.
    private static void CheckSources(Dictionary<string, string>? map, HashSet<string>? stated, string inheritedFrom,
        Dictionary<string, ValueSource> references, Action<string, string> fail)
    {
        foreach ((string field, string key) in map ?? [])
        {
            if (!SourceFields.Contains(field))
                fail("sources", $"'{field}' is not a field that takes a source; use \"*\" or one of {string.Join(", ", CatalogueFields.Inheritable)}");
            else if (stated is not null && field != "*" && !stated.Contains(field))
                fail("sources", $"names '{field}', which this variety does not state (it inherits it with {inheritedFrom})");
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
