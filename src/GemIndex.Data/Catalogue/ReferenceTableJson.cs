using System.Text.Json;
using System.Text.Json.Serialization;

namespace GemIndex.Data.Catalogue;

/// <summary>
/// How the small reference tables beside the catalogue are read (trade rules, mineral groups, magnification): the
/// embedded text, and a strict parse (an unknown field is a fault, not ignored) with every fault named with its file.
/// </summary>
internal static class ReferenceTableJson
{
    private static readonly JsonSerializerOptions Strict = new() { UnmappedMemberHandling = JsonUnmappedMemberHandling.Disallow };

    /// <summary>The embedded file's text.</summary>
    public static string Embedded(string resourceName) => System.Text.Encoding.UTF8.GetString(CatalogueSchema.EmbeddedBytes(resourceName));

    /// <summary>The file's document, or null for a file holding null.</summary>
    /// <exception cref="CatalogueFormatException">Not valid JSON, or a field the document does not know.</exception>
    public static T? Parse<T>(string json, string file) where T : class
    {
        try { return JsonSerializer.Deserialize<T>(json, Strict); }
        catch (JsonException e) { throw new CatalogueFormatException([$"{file}: not valid: {e.Message}"]); }
    }
}
