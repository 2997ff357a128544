using GemIndex.Core.Catalogue;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Core.Readings;
using System.Runtime.CompilerServices;

namespace GemIndex.Core.Identification;

/// <summary>
/// Where a material's principal indices may lie, as the section model integrates over them (docs/ranking.md §1). The
/// indices are split into a level (n, ω or α) and a shape: the birefringence B and, for a biaxial material, β − α. The
/// prior is uniform over every combination that keeps each principal index within its catalogue range and B within its
/// own (so indices move together, as in a composition series), with soft edges. The level is integrated in closed form
/// (a common shift of all indices moves every edge by the same amount, to first order, together with the per-stone
/// offset); the shape by two-point Gauss–Legendre nodes, then refined continuously (<see cref="ShapeAt"/>). Built once per material.
/// </summary>
internal sealed class IndicatrixPrior
{
    /// <summary>
    /// Standard uncertainty of a catalogue bound: ranges are rounded to the third decimal and natural stones stray a little
    /// beyond them (a judgement; docs/ranking.md §1 "soft edges").
    /// </summary>
    public const double CatalogueBoundSigma = 0.002;

    /// <summary>One shape: principal values at the reference level, and the level's offsets from it.</summary>
    /// <param name="InverseSquareX">1/n_x² at the reference level (n_x = α, or ω).</param>
    /// <param name="InverseSquareY">1/n_y² (β, or ω).</param>
    /// <param name="InverseSquareZ">1/n_z² (γ, or ε).</param>
    /// <param name="LevelLow">Lowest offset of the level from the reference.</param>
    /// <param name="LevelHigh">Highest offset.</param>
    /// <param name="ExtraSigma">Extra spread of the level (a gap between inconsistent ranges).</param>
    /// <param name="Weight">Prior mass of the shape (a node's share), or the prior density at it (refinement).</param>
    /// <param name="Birefringence">γ − α of the shape.</param>
    /// <param name="Group">The family it belongs to (index into <see cref="Families"/>; −1 for a single index).</param>
    /// <param name="BetaAboveAlpha">β − α of a biaxial shape (0 otherwise).</param>
    internal readonly record struct Shape(double InverseSquareX, double InverseSquareY, double InverseSquareZ,
        double LevelLow, double LevelHigh, double ExtraSigma, double Weight, double Birefringence, int Group, double BetaAboveAlpha);

    /// <summary>
    /// Shapes of one kind that the refinement moves through continuously: uniaxial of one sign, or biaxial; the box B may
    /// take; the ranges (ω, ε | α, β, γ, or for the broad prior the level's window); the prior's share and normaliser.
    /// </summary>
    internal sealed record Family(bool Biaxial, int Sign, double BirefringenceLow, double BirefringenceHigh, double Share,
        PropertyRange[] Ranges, bool Broad)
    {
        /// <summary>∫ (level length + soft) over the box, for a catalogue family: the prior density's normaliser.</summary>
        public double Normaliser { get; init; } = 1;
    }

    private IndicatrixPrior(Shape[] shapes, Family[] families, double levelDensity, double lowest, double highest, double birefringence)
    {
        Shapes = shapes;
        Families = families;
        LevelDensity = levelDensity;
        LowestIndex = lowest;
        HighestIndex = highest;
        LargestBirefringence = birefringence;
    }

    /// <summary>The shapes at the Gauss–Legendre nodes (weights sum to 1 for a catalogue material).</summary>
    public Shape[] Shapes { get; }

    /// <summary>The families the refinement can move through.</summary>
    public Family[] Families { get; }

    /// <summary>A single index: every section is a circle, no orientation to integrate.</summary>
    public bool IsIsotropic => Families.Length == 0;

    /// <summary>The level's density within its interval; 0 means uniform over the shape's own interval (1/width).</summary>
    public double LevelDensity { get; }

    /// <summary>The lowest principal index the prior allows (for the cheap screen).</summary>
    public double LowestIndex { get; }

    /// <summary>The highest principal index the prior allows.</summary>
    public double HighestIndex { get; }

    /// <summary>The largest birefringence the prior allows.</summary>
    public double LargestBirefringence { get; }

    /// <summary>A box narrower than this (a reading's precision) is taken as a point: one node, no refinement along it.</summary>
    internal const double NarrowBox = 0.0005;

    // Two-point Gauss–Legendre nodes and weights on [−1, 1] (Abramowitz and Stegun 1964, table 25.4): starting points for the
    // refinement, which then moves the shape continuously.
    private static readonly double[] Nodes2 = [-0.5773502691896258, 0.5773502691896258];
    private static readonly double[] Weights2 = [1, 1];

    /// <summary>The prior of a catalogue material; an aggregate-only material is read as one averaged index over its span.</summary>
    public static IndicatrixPrior For(Material m, PropertyRange birefringence)
    {
        var indices = m.Indices;
        double lowest = indices.Lowest.Minimum, highest = indices.Highest.Maximum;
        bool aggregateOnly = (m.Forms & MaterialForm.Aggregate) != 0 && (m.Forms & MaterialForm.Crystal) == 0;
        if (aggregateOnly || m.OpticCharacter is not (OpticCharacter.Uniaxial or OpticCharacter.Biaxial))
            return new([Isotropic(lowest, highest, 1)], [], 0, lowest, highest, 0);
        var families = new List<Family>();
        if (m.OpticCharacter == OpticCharacter.Uniaxial)
        {
            var omega = indices.Omega!.Value;
            var epsilon = indices.Epsilon!.Value;
            var sign = m.Sign is OpticSign.Positive or OpticSign.Negative or OpticSign.Either ? m.Sign
                : epsilon.Centre >= omega.Centre ? OpticSign.Positive : OpticSign.Negative;
            double share = sign == OpticSign.Either ? 0.5 : 1;
            foreach (int s in new[] { +1, -1 })
            {
                if (s > 0 ? sign == OpticSign.Negative : sign == OpticSign.Positive) continue;
                var allowed = s > 0
                    ? (epsilon.Minimum - omega.Maximum, epsilon.Maximum - omega.Minimum)
                    : (omega.Minimum - epsilon.Maximum, omega.Maximum - epsilon.Minimum);
                var (bLow, bHigh) = Intersect(allowed, (birefringence.Minimum, birefringence.Maximum));
                families.Add(new Family(false, s, Math.Max(0, bLow - CatalogueBoundSigma), bHigh + CatalogueBoundSigma, share, [omega, epsilon], false));
            }
        }
        else
        {
            PropertyRange alpha = indices.Alpha!.Value, beta = indices.Beta!.Value, gamma = indices.Gamma!.Value;
            var (bLow, bHigh) = Intersect((gamma.Minimum - alpha.Maximum, gamma.Maximum - alpha.Minimum), (birefringence.Minimum, birefringence.Maximum));
            families.Add(new Family(true, 0, Math.Max(0, bLow - CatalogueBoundSigma), bHigh + CatalogueBoundSigma, 1, [alpha, beta, gamma], false));
        }
        // Normalise each family: its nodes' raw masses approximate ∫ (level length + soft) over the box.
        var shapes = new List<Shape>();
        for (int g = 0; g < families.Count; g++)
        {
            families[g] = families[g] with { Normaliser = 1 };
            var nodes = Nodes(families, g).ToList();
            double total = nodes.Sum(n => n.Weight) / families[g].Share;
            families[g] = families[g] with { Normaliser = total };
            shapes.AddRange(nodes.Select(n => n with { Weight = n.Weight / total }));
        }
        return new([.. shapes], [.. families], 0, lowest, highest, families.Max(f => f.BirefringenceHigh));
    }

    /// <summary>The broad prior's birefringence box reaches this far below the readings' spread (judgement, docs/ranking.md §1).</summary>
    internal const double BroadBirefringenceBelowSpread = 0.002;

    /// <summary>The broad prior's birefringence box reaches this far above the readings' spread (judgement, docs/ranking.md §1).</summary>
    internal const double BroadBirefringenceAboveSpread = 0.006;

    /// <summary>A highest reading within this of the liquid's limit may have a high edge hidden above it (judgement, docs/ranking.md §1).</summary>
    internal const double BroadNearLimitReach = 0.03;

    /// <summary>Birefringence added to the broad box when the highest reading is near the liquid's limit (judgement, docs/ranking.md §1).</summary>
    internal const double BroadHiddenEdgeBirefringence = 0.02;

    /// <summary>The broad prior's share for each kind of crystal: isotropic, uniaxial, biaxial (judgement, docs/ranking.md §1).</summary>
    internal const double BroadKindShare = 0.25;

    /// <summary>Each optic sign's half of the broad prior's uniaxial share (judgement, docs/ranking.md §1).</summary>
    internal const double BroadUniaxialSignShare = 0.5;

    /// <summary>
    /// "Something not in the catalogue" for this series: an isotropic, uniaxial (either sign) or biaxial crystal, each a
    /// quarter, its level flat over 1.30–3.00 and its birefringence flat over 0–0.30 (<see cref="BroadDensities"/>),
    /// integrated where the readings can be (the level within 0.01 of the readings, B near their spread).
    /// </summary>
    public static IndicatrixPrior Broad(SeriesObservation series)
    {
        const double window = 0.01; // beyond the readings by more than this, the likelihood is nil
        var level = new PropertyRange(series.LowestReading - window, series.HighestReading + window);
        double spread = series.HighestReading - series.LowestReading;
        double bLow = Math.Max(0, spread - BroadBirefringenceBelowSpread), bHigh = spread + BroadBirefringenceAboveSpread
            + (series.HighestReading > series.LiquidLimit - BroadNearLimitReach ? BroadHiddenEdgeBirefringence : 0);
        Family[] families =
        [
            new(false, +1, bLow, bHigh, BroadKindShare * BroadUniaxialSignShare, [level], true),
            new(false, -1, bLow, bHigh, BroadKindShare * BroadUniaxialSignShare, [level], true),
            new(true, 0, bLow, bHigh, BroadKindShare, [level], true),
        ];
        var shapes = new List<Shape> { Isotropic(level.Minimum, level.Maximum, BroadKindShare) };
        for (int g = 0; g < families.Length; g++) shapes.AddRange(Nodes(families, g));
        return new([.. shapes], families, BroadDensities.Index, level.Minimum, level.Maximum, bHigh);
    }

    /// <summary>
    /// The broad prior's parts, each keeping its own share of the prior: isotropic, uniaxial positive, uniaxial negative,
    /// biaxial. Their likelihoods, set against each other, are what the readings alone say of the optic character.
    /// </summary>
    internal static IReadOnlyList<(OpticCharacter Character, OpticSign Sign, IndicatrixPrior Prior)> BroadParts(SeriesObservation series)
    {
        var broad = Broad(series);
        IndicatrixPrior Only(int group) => new([.. broad.Shapes.Where(s => s.Group == group)], broad.Families, broad.LevelDensity,
            broad.LowestIndex, broad.HighestIndex, broad.LargestBirefringence);
        return [(OpticCharacter.Isotropic, OpticSign.None, Only(-1)), (OpticCharacter.Uniaxial, OpticSign.Positive, Only(0)),
            (OpticCharacter.Uniaxial, OpticSign.Negative, Only(1)), (OpticCharacter.Biaxial, OpticSign.None, Only(2))];
    }

    /// <summary>The family's shapes at Gauss–Legendre nodes, each weighted by its density times the node's share.</summary>
    private static IEnumerable<Shape> Nodes(IReadOnlyList<Family> families, int group)
    {
        var f = families[group];
        foreach (var (b, wb) in Legendre(f.BirefringenceLow, f.BirefringenceHigh))
        {
            if (!f.Biaxial)
            {
                if (ShapeAt(f, group, b, 0) is { } shape) yield return shape with { Weight = shape.Weight * wb };
                continue;
            }
            var (uLow, uHigh) = BetaBox(f, b);
            foreach (var (u, wu) in Legendre(uLow, uHigh))
                if (ShapeAt(f, group, b, u) is { } shape) yield return shape with { Weight = shape.Weight * wb * wu };
        }
    }

    /// <summary>The box β − α may take at birefringence B (0 to B, within the ranges of a catalogue material).</summary>
    internal static (double Low, double High) BetaBox(Family f, double b)
    {
        if (f.Broad) return (0, b);
        var (alpha, beta) = (f.Ranges[0], f.Ranges[1]);
        double low = Math.Max(0, beta.Minimum - alpha.Maximum), high = Math.Min(b, beta.Maximum - alpha.Minimum);
        if (low <= high) return (low, high);
        double u = Math.Clamp(beta.Centre - alpha.Centre, 0, b);
        return (u, u);
    }

    /// <summary>
    /// The shape of family <paramref name="group"/> at birefringence <paramref name="b"/> and β − α <paramref name="u"/>,
    /// weighted by the prior density there (per unit B, and per unit β − α for a biaxial family); null outside the box.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static Shape? ShapeAt(Family f, int group, double b, double u)
    {
        if (b < f.BirefringenceLow - 1e-12 || b > f.BirefringenceHigh + 1e-12) return null;
        (double X, double Y, double Z) offsets = f.Biaxial ? (0, u, b) : f.Sign > 0 ? (0, 0, b) : (0, 0, -b);
        if (f.Broad)
        {
            var window = f.Ranges[0];
            double density = f.Share * BroadDensities.Birefringence * (f.Biaxial && b >= NarrowBox ? 1 / b : 1);
            if (f.Biaxial && (u < 0 || u > b)) return null;
            return Centred(window.Minimum, window.Maximum, 0, offsets, density, b, group, u);
        }
        var (low, high, gap) = f.Biaxial
            ? Level((f.Ranges[0].Minimum, f.Ranges[0].Maximum), (f.Ranges[1].Minimum - u, f.Ranges[1].Maximum - u), (f.Ranges[2].Minimum - b, f.Ranges[2].Maximum - b))
            : Level((f.Ranges[0].Minimum, f.Ranges[0].Maximum), (f.Ranges[1].Minimum - f.Sign * b, f.Ranges[1].Maximum - f.Sign * b));
        double mass = f.Share * (high - low + CatalogueBoundSigma) / f.Normaliser;
        if (f.Biaxial)
        {
            var (uLow, uHigh) = BetaBox(f, b);
            if (u < uLow - 1e-12 || u > uHigh + 1e-12) return null;
        }
        return Centred(low, high, gap / 2, offsets, mass, b, group, u);
    }

    private static Shape Isotropic(double low, double high, double weight)
    {
        double centre = (low + high) / 2, inverse = 1 / (centre * centre);
        return new Shape(inverse, inverse, inverse, low - centre, high - centre, 0, weight, 0, -1, 0);
    }

    /// <summary>A shape whose offsets (x, y, z from the level) are placed at the middle of the level interval.</summary>
    private static Shape Centred(double low, double high, double extraSigma, (double X, double Y, double Z) offsets, double weight, double b, int group, double u)
    {
        double centre = (low + high) / 2;
        return new Shape(Inverse(centre + offsets.X), Inverse(centre + offsets.Y), Inverse(centre + offsets.Z),
            low - centre, high - centre, extraSigma, weight, b, group, u);
    }

    private static double Inverse(double n) => 1 / (n * n);

    /// <summary>The intersection of two intervals; when they miss each other, the second (the birefringence range, which the catalogue states directly).</summary>
    private static (double Low, double High) Intersect((double Low, double High) a, (double Low, double High) b)
    {
        double low = Math.Max(a.Low, b.Low), high = Math.Min(a.High, b.High);
        return low <= high ? (low, high) : b;
    }

    /// <summary>The level's interval allowed by every range; when they miss, the middle of the gap and the gap's size.</summary>
    private static (double Low, double High, double Gap) Level((double Low, double High) a, (double Low, double High) b) =>
        Level(a, b, b);

    private static (double Low, double High, double Gap) Level((double Low, double High) a, (double Low, double High) b, (double Low, double High) c)
    {
        double low = Math.Max(a.Low, Math.Max(b.Low, c.Low)), high = Math.Min(a.High, Math.Min(b.High, c.High));
        if (low <= high) return (low, high, 0);
        double middle = (low + high) / 2;
        return (middle, middle, low - high);
    }

    /// <summary>Two Gauss–Legendre nodes on [a, b] with weights summing to b − a (one node of weight 1 when the interval is narrower than a reading's precision).</summary>
    private static IEnumerable<(double Node, double Weight)> Legendre(double a, double b)
    {
        if (b - a < NarrowBox)
        {
            yield return ((a + b) / 2, 1);
            yield break;
        }
        for (int i = 0; i < 2; i++) yield return ((a + b) / 2 + (b - a) / 2 * Nodes2[i], (b - a) / 2 * Weights2[i]);
    }
}
