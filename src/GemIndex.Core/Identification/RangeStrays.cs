using GemIndex.Core.Catalogue;
using System.Runtime.CompilerServices;

namespace GemIndex.Core.Identification;

/// <summary>
/// Stones beyond the catalogue's ranges (docs/ranking.md §3, "Strays"): a published range is the span of the stones its
/// authors measured, and handbooks disagree with each other by about as much, so a share of real stones lies beyond any one
/// range. A measurement's density is therefore a mixture: most stones by the range with its soft edges, the strays by the
/// same range widened by a stray scale. Without it a stone a little outside a narrow range is "nothing fits" and a wider
/// neighbour wins.
/// </summary>
public static class RangeStrays
{
    /// <summary>
    /// Share of stones beyond the catalogue's range (a judgement: about one stone in ten; independent property tables
    /// and the catalogue's sources differ by this much, docs/benchmark.md).
    /// </summary>
    public const double Share = 0.1;

    /// <summary>How far beyond its range a stray index lies, σ (a judgement: handbooks' index ranges differ by up to about 0.01).</summary>
    public const double IndexScale = 0.01;

    /// <summary>How far beyond its range a stray SG lies, as a share of the SG (a judgement: inclusions, porosity and composition move SG by a few per cent).</summary>
    public const double SpecificGravityShare = 0.025;

    /// <summary>Density of <paramref name="observed"/> under the range with soft edges σ, strays included.</summary>
    public static double Density(double observed, PropertyRange range, double sigma, double strayScale) =>
        Density(observed, range, sigma, strayScale, double.Hypot(sigma, strayScale));

    /// <summary><see cref="Density(double, PropertyRange, double, double)"/> with √(σ² + scale²) given (<paramref name="wideSigma"/>), for a caller that reuses it.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static double Density(double observed, PropertyRange range, double sigma, double strayScale, double wideSigma) =>
        (1 - Share) * RangeLikelihood.Density(observed, range, sigma)
        + Share * RangeLikelihood.Density(observed, range, wideSigma);

    /// <summary>Two-sided tail of the distance outside the range under the same mixture (the fit of §4).</summary>
    public static double Tail(double observed, PropertyRange range, double sigma, double strayScale) =>
        (1 - Share) * RangeLikelihood.TwoSidedTail(RangeLikelihood.StandardDeviationsOutside(observed, range, sigma))
        + Share * RangeLikelihood.TwoSidedTail(RangeLikelihood.StandardDeviationsOutside(observed, range, double.Hypot(sigma, strayScale)));
}
