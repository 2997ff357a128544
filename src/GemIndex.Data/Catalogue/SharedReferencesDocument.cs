using System.Text.Json.Serialization;

namespace GemIndex.Data.Catalogue;

/// <summary>reference-db/sources.json: the references every family file may name ("memory", "practice").</summary>
internal sealed record SharedReferencesDocument
{
    [JsonRequired] public ReferenceDocument[] References { get; init; } = [];
}
