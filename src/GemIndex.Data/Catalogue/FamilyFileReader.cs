using System.Text.Json;
using System.Text.RegularExpressions;
using GemIndex.Core.Catalogue;

namespace GemIndex.Data.Catalogue;

/// <summary>
/// Reads family files (reference-db/README.md) strictly into Core materials. Every problem becomes one line of a
/// <see cref="CatalogueFormatException"/> naming the file, the entry (index and name) and the field.
/// </summary>
public static class FamilyFileReader
{
    /// <summary>All entries of all files, in file order; throws with every error of every file.</summary>
    /// <exception cref="CatalogueFormatException">Any file or entry cannot be read.</exception>
    public static IReadOnlyList<Material> ReadAll(IEnumerable<FamilySource> sources)
    {
        var materials = new List<Material>();
        var errors = new List<string>();
        foreach (FamilySource source in sources)
        {
            try { materials.AddRange(Read(source)); }
            catch (CatalogueFormatException e) { errors.AddRange(e.Errors); }
        }
        return errors.Count > 0 ? throw new CatalogueFormatException(errors) : materials;
    }

    /// <summary>The entries of one family file.</summary>
    /// <exception cref="CatalogueFormatException">The file or an entry cannot be read.</exception>
    public static IReadOnlyList<Material> Read(FamilySource source)
    {
        FamilyDocument document = Parse(source);
        string expectedFamily = Path.GetFileNameWithoutExtension(source.FileName);
        var errors = new List<string>();
        if (document.Family != expectedFamily)
            errors.Add($"{source.FileName}: field family: '{document.Family}' must match the file name '{expectedFamily}'");
        var materials = new List<Material>();
        for (int i = 0; i < document.Materials.Length; i++)
        {
            EntryDocument entry = document.Materials[i];
            string where = $"{source.FileName}: entry {i} '{entry.Name}'";
            Material? m = EntryMapping.ToMaterial(entry, document.Family, (field, problem) => errors.Add($"{where}, field {field}: {problem}"));
            if (m is not null) materials.Add(m);
        }
        return errors.Count > 0 ? throw new CatalogueFormatException(errors) : materials;
    }

    private static FamilyDocument Parse(FamilySource source)
    {
        try
        {
            return JsonSerializer.Deserialize(source.Json, CatalogueJsonContext.Default.FamilyDocument)
                ?? throw new JsonException("the file holds null instead of an object");
        }
        catch (JsonException e)
        {
            string line = e.LineNumber is { } l ? $"line {l + 1}, " : "";
            throw new CatalogueFormatException([$"{source.FileName}: {line}{Describe(e.Path)}: {e.Message.Split(" Path: ")[0]}"]);
        }
    }

    // "$.materials[3].sg" → "entry 3, field sg".
    private static string Describe(string? path)
    {
        if (path is null || path == "$") return "top level";
        Match m = Regex.Match(path, @"^\$\.materials\[(\d+)\](?:\.(\w+))?");
        if (!m.Success) return $"at {path}";
        return m.Groups[2].Success ? $"entry {m.Groups[1].Value}, field {m.Groups[2].Value}" : $"entry {m.Groups[1].Value}";
    }
}
