using GemIndex.Core.Readings;

namespace GemIndex.Core.Identification;

/// <summary>
/// What the rotation series alone says of the stone's optic character: the posterior of an isotropic, a uniaxial
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

    /// <summary>The posterior for a series of readings.</summary>
    internal static OpticCharacterPosterior Of(SeriesObservation series)
    {
        var parts = IndicatrixPrior.BroadParts(series);
        double[] log = [.. parts.Select(p => SectionLikelihood.Evaluate(p.Prior, series, 0, 0).LogLikelihood)];
        double max = log.Max();
        double[] weight = [.. log.Select(l => double.IsNegativeInfinity(l) ? 0 : Math.Exp(l - max))];
        double total = weight.Sum();
        return new(weight[0] / total, weight[1] / total, weight[2] / total, weight[3] / total);
    }
}
