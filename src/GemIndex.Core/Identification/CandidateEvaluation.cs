namespace GemIndex.Core.Identification;

/// <summary>The evidence of one sheet weighed for one candidate material.</summary>
public sealed record CandidateEvaluation
{
    /// <summary>Natural log of the sheet's likelihood under the candidate.</summary>
    public required double LogLikelihood { get; init; }

    /// <summary>Natural log of the sheet's likelihood under "something not in the catalogue".</summary>
    public required double LogLikelihoodNotInCatalogue { get; init; }

    /// <summary>
    /// How plausible the evidence is for this candidate on its own terms, 0–1: Fisher's combination of the
    /// per-test tail probabilities (continuous readings: two-sided tail of the distance outside the range in σ;
    /// reactions: their probability over that of the candidate's most likely reaction).
    /// </summary>
    public required double Fit { get; init; }

    /// <summary>
    /// How many tests other than colour weigh ten to one or more against the candidate with a reading outside what it
    /// shows (<see cref="BenchWarnings.ContradictionBits"/>): counted without words.
    /// </summary>
    public int StronglyAgainst { get; init; }

    /// <summary>Each test's contribution in words (only when asked for).</summary>
    public IReadOnlyList<EvidenceContribution> Contributions { get; init; } = [];
}
