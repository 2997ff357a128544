using System.Text.Json.Serialization;

namespace GemIndex.Data.Catalogue;

/// <summary>A variety or origin under its species: who it is, how common among its species, and only what differs.</summary>
internal sealed record VarietyDocument : EntryFieldsDocument
{
    [JsonRequired, JsonPropertyOrder(-1)] public string Name { get; init; } = "";
    [JsonRequired, JsonPropertyOrder(-1)] public string Variety { get; init; } = "";
    [JsonRequired, JsonPropertyOrder(-1)] public string Origin { get; init; } = "";
    [JsonRequired, JsonPropertyOrder(-1)] public string Share { get; init; } = "";
}
