using GemIndex.Core.Identification;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Core.Quantities;
using GemIndex.Core.Readings;

namespace GemIndex.Core.Tests.Identification;

/// <summary>
/// The engine's reading model written out plainly for the brute-force Monte Carlo checks (SectionLikelihoodTests,
/// OpticCharacterPosteriorTests): ln p(series | a crystal on one facet, at one start), each step's probability as two
/// edges, one written for two, or a lone low edge whose high edge the liquid hides.
/// </summary>
internal static class BruteForceReadings
{
    public static double LogLikelihood(Indicatrix indicatrix, Direction normal, double startDegrees, SeriesObservation series)
    {
        double sd = Math.Sqrt(series.NoiseVariance), log = 0;
        for (int k = 0; k < series.Count; k++)
        {
            var section = indicatrix.Section(normal, Angle.FromDegrees(startDegrees + Math.Atan2(series.Sin[k], series.Cos[k]) * 180 / Math.PI));
            double low = section.Low.Value, high = section.High.Value, two = SectionLikelihood.SeenAsTwo(high - low, Math.Sqrt(2 * series.NoiseVariance));
            double p = series.TwoEdges[k]
                ? two * Normal(series.Low[k] - low, sd) * Normal(series.High[k] - high, sd)
                : (1 - two) * Normal(series.Low[k] - (low + high) / 2, sd)
                  + RangeLikelihood.Phi((high - (series.LiquidLimit - SeriesObservation.LiquidEdgeMargin)) / sd) * Normal(series.Low[k] - low, sd);
            log += Math.Log(Math.Max(p, 1e-300));
        }
        return log;
    }

    public static double Normal(double x, double sd) => RangeLikelihood.PhiDensity(x / sd) / sd;
}
