using GemIndex.Core.Observations;
using GemIndex.Core.Readings;

namespace GemIndex.Core.Identification;

/// <summary>
/// What the rotation series (and the dichroscope, when read) says of the stone's optic character: the posterior of an isotropic, a uniaxial
/// (either sign) and a biaxial crystal under the "not in the catalogue" prior (each a quarter, the uniaxial quarter
/// halved by sign; level and birefringence flat), by the same section model that scores every material
/// (docs/ranking.md §1). A summary for the reader, never a gate: the ranking weighs the raw readings.
/// </summary>
/// <param name="Isotropic">P(isotropic or amorphous).</param>
/// <param name="UniaxialPositive">P(uniaxial, ε &gt; ω).</param>
/// <param name="UniaxialNegative">P(uniaxial, ε &lt; ω).</param>
/// <param name="Biaxial">P(biaxial); its sign needs β, which the series may leave at one of two values.</param>
public sealed record OpticCharacterPosterior(double Isotropic, double UniaxialPositive, double UniaxialNegative, double Biaxial)
{
    /// <summary>P(uniaxial), either sign.</summary>
    public double Uniaxial => UniaxialPositive + UniaxialNegative;

    /// <summary>True when the dichroscope's two or three colours entered beside the rotation series (the front ends say so).</summary>
    public bool TakesDichroscope { get; init; }

    /// <summary>What the posterior was worked out from, in words: "the readings alone" or "the refractometer and the dichroscope".</summary>
    public string From => TakesDichroscope ? "the refractometer and the dichroscope" : "the readings alone";

    /// <summary>
    /// P(a dichroscope reading | a character that cannot show it): three colours from a uniaxial or a singly refractive
    /// stone, two from a singly refractive one, only by a misread (a judgement; docs/ranking.md §1, "Optic character").
    /// </summary>
    public const double ImpossiblePleochroism = 0.03;

    /// <summary>
    /// The posterior for a series of readings, and the dichroscope when it was read: a singly refractive stone shows one
    /// colour, a uniaxial one at most two, only a biaxial one three (common practice), each other reading a misread.
    /// </summary>
    internal static OpticCharacterPosterior Of(SeriesObservation series, PleochroismObservation? pleochroism = null)
    {
        var parts = IndicatrixPrior.BroadParts(series);
        double[] log = [.. parts.Select(p => SectionLikelihood.Evaluate(p.Prior, series, 0, 0).LogLikelihood)];
        double max = log.Max();
        double[] weight = [.. log.Select(l => double.IsNegativeInfinity(l) ? 0 : Math.Exp(l - max))];
        // Parts: singly refractive, uniaxial positive, uniaxial negative, biaxial.
        if (pleochroism is PleochroismObservation.Dichroic or PleochroismObservation.Trichroic) weight[0] *= ImpossiblePleochroism;
        if (pleochroism is PleochroismObservation.Trichroic) { weight[1] *= ImpossiblePleochroism; weight[2] *= ImpossiblePleochroism; }
        double total = weight.Sum();
        return new(weight[0] / total, weight[1] / total, weight[2] / total, weight[3] / total)
        {
            TakesDichroscope = pleochroism is PleochroismObservation.Dichroic or PleochroismObservation.Trichroic,
        };
    }
}
