using System.Text.Json.Serialization;

namespace GemIndex.Data.Catalogue;

/// <summary>
/// A variety or origin under its species: who it is, how common among its species, which sibling it is like (if any),
/// and only what differs.
/// </summary>
internal sealed record VarietyDocument : EntryFieldsDocument
{
    [JsonRequired, JsonPropertyOrder(-1)] public string Name { get; init; } = "";
    [JsonRequired, JsonPropertyOrder(-1)] public string Variety { get; init; } = "";
    [JsonRequired, JsonPropertyOrder(-1)] public string Origin { get; init; } = "";
    [JsonRequired, JsonPropertyOrder(-1)] public string Share { get; init; } = "";

    /// <summary>
    /// The name of a sibling variety of the same species this one is like (a heated stone and its unheated variety):
    /// every field this variety does not state comes from the sibling (then from the species), with the sibling's source.
    /// </summary>
    [JsonPropertyOrder(-1)] public string? Like { get; init; }
}
