using System.Text.Json.Serialization;

namespace GemIndex.Data.Catalogue;

/// <summary>A reference a value may name: <c>{ "key": …, "kind": "published", "citation": … }</c>.</summary>
public sealed record ReferenceDocument
{
    [JsonRequired] public string Key { get; init; } = "";
    [JsonRequired] public string Kind { get; init; } = "";
    [JsonRequired] public string Citation { get; init; } = "";
}
