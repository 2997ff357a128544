using GemIndex.Core.Catalogue;

namespace GemIndex.Core.Identification;

/// <summary>
/// A published range that names where most stones lie ("SG 1.25–2.23, usually about 2.15"): the usual part carries most
/// of the chance and the rest of the range the rare extremes, so a reading among the extremes still fits the material but
/// weighs for it no more than they are met (docs/ranking.md §2).
/// </summary>
public static class UsualPart
{
    /// <summary>
    /// Share of stones in a range's rare extremes when a source names its usual part (a judgement: a handbook's extremes
    /// are a few stones in ten at most; docs/ranking.md §2).
    /// </summary>
    public const double RareShare = 0.1;

    /// <summary>
    /// Whether an SG reading lies among a range's rare extremes, as the reasons say it: inside the whole range and more
    /// than two standard uncertainties (the reading's with the SG floor, as the likelihood takes it) outside the usual
    /// part. The scales call the same readings "rare".
    /// </summary>
    public static bool AmongRareExtremes(double specificGravity, double standardUncertainty, PropertyRange whole, PropertyRange? usual) =>
        usual is { } u && whole.Contains(specificGravity)
        && RangeLikelihood.StandardDeviationsOutside(specificGravity, u, Math.Sqrt(standardUncertainty * standardUncertainty
            + EvidenceLikelihood.SpecificGravityFloor * EvidenceLikelihood.SpecificGravityFloor)) > WithinUncertaintySigmas;

    /// <summary>How far outside the usual part, in standard uncertainties, a reading must lie to be called rare (about 95 %).</summary>
    public const double WithinUncertaintySigmas = 2;

    /// <summary>
    /// <paramref name="chance"/> (a density or a probability of the reading, given a range) under the whole range, or,
    /// where <paramref name="usual"/> is given, mixed: the usual part with 1 − <see cref="RareShare"/>, the whole range with the rest.
    /// </summary>
    public static double Mixed(PropertyRange whole, PropertyRange? usual, Func<PropertyRange, double> chance) =>
        usual is { } u ? (1 - RareShare) * chance(u) + RareShare * chance(whole) : chance(whole);
}
