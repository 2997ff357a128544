namespace GemIndex.Core.Identification;

/// <summary>
/// How one piece of evidence bears on one candidate: in plain words with the numbers, and as a weight of
/// evidence in bits (log₂ of the candidate's likelihood over that of "something not in the catalogue";
/// positive supports the candidate).
/// </summary>
/// <param name="Test">The test, as named in the batch format ("refractometer", "sg", "polariscope", …).</param>
/// <param name="Text">The evidence in words ("SG 3.99 ± 0.01 lies in 3.95–4.05").</param>
/// <param name="WeightBits">log₂(likelihood under the candidate / likelihood under "not in the catalogue").</param>
/// <param name="Agrees">False when the observation is unusual for the candidate (outside its range by more than 2σ, or an unexpected reaction).</param>
public sealed record EvidenceContribution(string Test, string Text, double WeightBits, bool Agrees)
{
    /// <summary>Below this weight (bits, either way) a test speaks neither for nor against the candidate: a likelihood ratio within 7 % of one.</summary>
    public const double NeutralBits = 0.1;
}
