using GemIndex.Core.Catalogue;

namespace GemIndex.Core.Identification;

/// <summary>One candidate material with its posterior probability, fit and (for the leading ones) the reasons.</summary>
public sealed record RankedCandidate
{
    /// <summary>The catalogue entry.</summary>
    public required Material Material { get; init; }

    /// <summary>Posterior probability that the stone is this material (0–1).</summary>
    public required double Confidence { get; init; }

    /// <summary>How plausible the evidence is for this material on its own terms (0–1; see <see cref="CandidateEvaluation.Fit"/>).</summary>
    public required double Fit { get; init; }

    /// <summary>Each test's contribution in words (filled for the leading candidates).</summary>
    public IReadOnlyList<EvidenceContribution> Reasons { get; init; } = [];
}
