using System.Text.Json;
using System.Text.Json.Serialization;

namespace GemIndex.Cli.CommandLine;

/// <summary>The shapes the catalogue commands write with <c>--json</c>, source-generated, snake_case.</summary>
[JsonSourceGenerationOptions(
    PropertyNamingPolicy = JsonKnownNamingPolicy.SnakeCaseLower,
    WriteIndented = true,
    DefaultIgnoreCondition = JsonIgnoreCondition.WhenWritingNull)]
[JsonSerializable(typeof(GemIndex.Data.Catalogue.CatalogueEntryDocument))]
[JsonSerializable(typeof(CatalogueListJson))]
[JsonSerializable(typeof(CatalogueCheckJson))]
[JsonSerializable(typeof(CatalogueImportJson))]
[JsonSerializable(typeof(CatalogueBuildJson))]
internal sealed partial class CommandJson : JsonSerializerContext
{
    public static void Write<T>(TextWriter output, T value) =>
        output.WriteLine(JsonSerializer.Serialize(value, (System.Text.Json.Serialization.Metadata.JsonTypeInfo<T>)Default.GetTypeInfo(typeof(T))!));
}
