namespace GemIndex.Bench.Accuracy;

/// <summary>
/// The engine's answer for one batch line, reduced to what the benchmark scores: the leading species and its
/// confidence, the first three species, the leading origin within the leading species and its share of that species,
/// and whether "nothing fits" was raised.
/// </summary>
internal sealed record EngineAnswer(
    string Species,
    double Confidence,
    IReadOnlyList<string> TopSpecies,
    string? Origin,
    double OriginShare,
    bool NothingFits);
