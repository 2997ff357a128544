using GemIndex.Core.Identification;

namespace GemIndex.Core.Bench;

/// <summary>A stone read and ranked: the reading (sheet, errors) and the result, null when nothing was ranked.</summary>
public sealed record BenchOutcome(BenchReading Reading, IdentificationResult? Result);
