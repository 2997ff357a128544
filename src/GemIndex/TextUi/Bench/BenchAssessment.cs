using GemIndex.Core.Gravity;
using GemIndex.Core.Identification;
using GemIndex.Data.Batch;

namespace GemIndex.Cli.TextUi.Bench;

/// <summary>What the form's current readings give: the errors per field, the readings that parse, and the identification.</summary>
internal sealed record BenchAssessment
{
    public required int Version { get; init; }

    /// <summary>Field key → reason; a key is a <see cref="BenchFields"/> name or a step's row key.</summary>
    public required IReadOnlyDictionary<string, string> Errors { get; init; }

    /// <summary>The readings that parsed (what is saved in the batch format).</summary>
    public required StoneReadings Readings { get; init; }

    public SpecificGravity? SpecificGravity { get; init; }

    /// <summary>Null when nothing has been read yet or the catalogue is missing.</summary>
    public IdentificationResult? Result { get; init; }

    /// <summary>Top candidates that must not go into water or heavy liquids (porous, soluble, ...).</summary>
    public IReadOnlyList<string> DoNotImmerse { get; init; } = [];
}
