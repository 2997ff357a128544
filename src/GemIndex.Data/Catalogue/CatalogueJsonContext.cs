using System.Text.Json.Serialization;

namespace GemIndex.Data.Catalogue;

/// <summary>Strict reading of family files: numbers only and finite, unknown fields and duplicate keys refused (STACK.md §9).</summary>
[JsonSourceGenerationOptions(
    PropertyNamingPolicy = JsonKnownNamingPolicy.SnakeCaseLower,
    NumberHandling = JsonNumberHandling.Strict,
    UnmappedMemberHandling = JsonUnmappedMemberHandling.Disallow,
    AllowDuplicateProperties = false,
    RespectNullableAnnotations = true,
    RespectRequiredConstructorParameters = true,
    ReadCommentHandling = System.Text.Json.JsonCommentHandling.Disallow,
    AllowTrailingCommas = false,
    DefaultIgnoreCondition = JsonIgnoreCondition.WhenWritingNull,
    Converters = [typeof(FiniteDoubleConverter)])]
[JsonSerializable(typeof(FamilyDocument))]
[JsonSerializable(typeof(SharedReferencesDocument))]
internal sealed partial class CatalogueJsonContext : JsonSerializerContext;
