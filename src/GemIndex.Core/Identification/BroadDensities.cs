namespace GemIndex.Core.Identification;

/// <summary>
/// The likelihood of each observation under "something not in the catalogue", and the weight given to it
/// inside every candidate's likelihood (a robust mixture): a judgement, documented in docs/ranking.md.
/// The densities are flat over the span bench stones cover.
/// </summary>
public static class BroadDensities
{
    /// <summary>Refractive index: flat over 1.30–3.00.</summary>
    public const double Index = 1 / 1.7;

    /// <summary>Birefringence: flat over 0–0.30.</summary>
    public const double Birefringence = 1 / 0.3;

    /// <summary>Chance that an unknown stone is over the refractometer's limit, no edge read (a judgement, docs/ranking.md §3).</summary>
    public const double OverLimit = 0.2;

    /// <summary>Chance that an unknown stone with edges read has its highest edge over the limit (a judgement, docs/ranking.md §3).</summary>
    public const double OverLimitWithReadings = 0.3;

    /// <summary>Specific gravity: flat over 1–8.</summary>
    public const double SpecificGravity = 1 / 7.0;

    /// <summary>Dispersion nG − nB: flat over 0–0.3.</summary>
    public const double Dispersion = 1 / 0.3;

    /// <summary>
    /// Share of each continuous likelihood given to the broad density: covers misreadings and catalogue ranges
    /// narrower than nature, so that one bad reading cannot veto the right material.
    /// </summary>
    public const double MisreadingShare = 0.02;

    /// <summary>Prior probability that a stone is something the catalogue does not hold.</summary>
    public const double NotInCataloguePrior = 0.03;
}
