using System.Text.Json.Serialization;

namespace GemIndex.Data.Catalogue;

/// <summary>A whole family file: <c>{ "family": "corundum", "references": [ … ], "species": [ … ] }</c>.</summary>
internal sealed record FamilyDocument
{
    [JsonRequired] public string Family { get; init; } = "";
    public ReferenceDocument[]? References { get; init; }
    [JsonRequired] public SpeciesDocument[] Species { get; init; } = [];
}
