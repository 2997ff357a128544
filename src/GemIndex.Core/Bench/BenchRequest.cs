namespace GemIndex.Core.Bench;

/// <summary>How much of an answer is wanted from <see cref="BenchIdentification.Identify"/>.</summary>
public sealed record BenchRequest
{
    /// <summary>Candidates to return, 1–<see cref="BenchDefaults.MostCandidates"/>.</summary>
    public int Candidates { get; init; } = BenchDefaults.Candidates;

    /// <summary>For how many leading candidates to write the reasons.</summary>
    public int ExplainTop { get; init; } = BenchDefaults.ExplainedCandidates;

    /// <summary>Whether to work out the next test.</summary>
    public bool AdviseNextTest { get; init; } = true;

    /// <summary>
    /// Whether to rank what could be read when some fields are bad (the text UI, which shows the errors at their
    /// fields); otherwise any error means no ranking (the command line and the batch refuse the stone).
    /// </summary>
    public bool RankDespiteErrors { get; init; }

    /// <summary>
    /// Whether a stone with nothing at all to rank by is refused (a single stone on the command line, where it is a
    /// usage slip); otherwise it is ranked on the catalogue's frequencies alone and a warning says so (a batch line).
    /// </summary>
    public bool RefuseEmpty { get; init; }
}
