using System.Text.Json.Serialization;

namespace GemIndex.Data.Catalogue;

/// <summary>A species in a family file: the ranges that belong to the mineral or material, and its varieties.</summary>
internal sealed record SpeciesDocument : EntryFieldsDocument
{
    [JsonRequired, JsonPropertyOrder(-1)] public string Species { get; init; } = "";
    [JsonRequired, JsonPropertyOrder(-1)] public string CrystalSystem { get; init; } = "";
    [JsonRequired, JsonPropertyOrder(-1)] public string OpticCharacter { get; init; } = "";
    [JsonRequired] public string Frequency { get; init; } = "";
    [JsonRequired, JsonPropertyOrder(2)] public VarietyDocument[] Varieties { get; init; } = [];
}
