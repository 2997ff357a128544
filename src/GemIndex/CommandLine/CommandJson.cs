using System.Text.Json;
using System.Text.Json.Serialization;

namespace GemIndex.Cli.CommandLine;

/// <summary>The shapes the catalogue commands write with <c>--json</c>, source-generated, snake_case.</summary>
[JsonSourceGenerationOptions(
    PropertyNamingPolicy = JsonKnownNamingPolicy.SnakeCaseLower,
    WriteIndented = true,
    DefaultIgnoreCondition = JsonIgnoreCondition.WhenWritingNull)]
[JsonSerializable(typeof(MaterialJson))]
[JsonSerializable(typeof(CatalogueListJson))]
[JsonSerializable(typeof(CatalogueCheckJson))]
[JsonSerializable(typeof(CatalogueImportJson))]
[JsonSerializable(typeof(CatalogueBuildJson))]
internal sealed partial class CommandJson : JsonSerializerContext
{
    public static void Write<T>(TextWriter output, T value) =>
        output.WriteLine(JsonSerializer.Serialize(value, (System.Text.Json.Serialization.Metadata.JsonTypeInfo<T>)Default.GetTypeInfo(typeof(T))!));
}

internal sealed record CatalogueListJson(int Count, MaterialJson[] Materials);

internal sealed record FindingJson(string Entry, string Field, string Problem);

internal sealed record CatalogueCheckJson(int Entries, FindingJson[] Findings);

internal sealed record ImportErrorJson(int Line, string Field, string Problem);

internal sealed record CatalogueImportJson(string File, string UserCatalogue, int Imported, ImportErrorJson[] Errors);

internal sealed record CatalogueBuildJson(string Output, int Entries, string SourceHash);
