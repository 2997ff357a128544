using System.Text.Json.Serialization;

namespace GemIndex.Data.Catalogue;

/// <summary>A whole family file: <c>{ "family": "corundum", "materials": [ … ] }</c>.</summary>
internal sealed record FamilyDocument
{
    [JsonRequired] public string Family { get; init; } = "";
    [JsonRequired] public EntryDocument[] Materials { get; init; } = [];
}
