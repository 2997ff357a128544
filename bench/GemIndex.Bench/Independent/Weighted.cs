namespace GemIndex.Bench.Independent;

/// <summary>An outcome with its relative weight (colour words, UV strengths, origins).</summary>
internal readonly record struct Weighted(string Word, double Weight);
