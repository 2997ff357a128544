using GemIndex.Core.Identification;

namespace GemIndex.Cli.Reports;

/// <summary>One ranked candidate as a report shows it.</summary>
/// <param name="Rank">1 for the best.</param>
/// <param name="Name">The catalogue name.</param>
/// <param name="Species">Its species (or, for a man-made material, the trade's plain name).</param>
/// <param name="Origin">natural, synthetic, imitation, treated, composite or cultured.</param>
/// <param name="Confidence">Posterior probability, 0–1.</param>
/// <param name="Fit">How plausible the evidence is for this material on its own, 0–1.</param>
/// <param name="Reasons">Each test's contribution (filled for the explained candidates only: <see cref="LeadingCandidates"/>).</param>
internal sealed record ReportCandidate(int Rank, string Name, string Species, string Origin, double Confidence, double Fit, IReadOnlyList<EvidenceContribution> Reasons);
