using GemIndex.Core.Catalogue;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Core.Readings;
using System.Runtime.Intrinsics;
using MathNet.Numerics;
using System.Runtime.CompilerServices;

namespace GemIndex.Core.Identification;

/// <summary>
/// The likelihood of a rotation series' raw edge readings under one material (DOMAIN.md §6b; docs/ranking.md §1):
/// p(readings | m) = ∫ p(shape) ∫ p(orientation) ∫ p(c) Π_steps p(step | edges + c) dc, where the edges of each step are
/// the semi-axes of the indicatrix section for that facet orientation and rotation, c is the common shift (the level of
/// the material's indices within their ranges, the per-stone offset, soft catalogue edges), integrated in closed form,
/// and each step is read with noise and rounding, two edges closer than the eye's resolution written as one, and a high
/// edge lost above the liquid's limit. The orientation and shape are integrated first on a fixed quasi-random set of
/// orientations and Gauss–Legendre shape nodes, then around the best points by Laplace's method
/// (<see cref="SectionRefinement"/>); the larger of the two is kept. No classification comes first: every material is
/// scored on the same readings.
/// </summary>
internal static class SectionLikelihood
{
    /// <summary>
    /// On the coarse set an edge can move by about a fifth of the birefringence between neighbouring orientations, so
    /// there each reading's noise is widened by σ_q = 0.2·B (a judgement; the refinement has no such widening;
    /// docs/ranking.md §1).
    /// </summary>
    public const double QuadratureSpread = 0.2;

    /// <summary>The per-stone offset (calibration, liquid film), σ_b = ½ σ: a judgement kept from the first model (docs/ranking.md §1).</summary>
    public const double OffsetShare = 0.5;

    /// <summary>
    /// Chance of writing two edges where the eye sees one, or one where it sees two, whatever their separation: a floor for
    /// misjudging the edge count (a judgement; docs/ranking.md §1).
    /// </summary>
    public const double EdgeCountMisread = 0.02;

    /// <summary>A one-edge step within the largest birefringence + this many σ + the margin of the limit may hide its high edge (judgement, docs/ranking.md §1).</summary>
    public const double HiddenEdgeReachSigmas = 8;

    /// <summary>The series' fit takes the edge-count factor over this, at most 1 (judgement, docs/ranking.md §4).</summary>
    public const double EdgeCountFullFit = 0.5;

    /// <summary>What the series says under one prior.</summary>
    /// <param name="LogLikelihood">ln p(readings | prior).</param>
    /// <param name="Tail">The best orientation's goodness of fit, 0–1 (χ² of the residuals and the level's distance outside its range).</param>
    internal readonly record struct Outcome(double LogLikelihood, double Tail);

    /// <summary>One orientation and shape with the shift integrated out.</summary>
    /// <param name="LogValue">ln ∫ p(c) Π p(step | edges + c) dc (the shape's weight not included).</param>
    /// <param name="Tail">Goodness of fit at this point.</param>
    /// <param name="Readings">How many readings entered (with <c>residuals</c>, how many were written there).</param>
    internal readonly record struct PointFit(double LogValue, double Tail, int Readings = 0);

    /// <summary>Scores the series; <paramref name="shift"/> moves readings to 589.3 nm (σ <paramref name="shiftSigma"/>).</summary>
    public static Outcome Evaluate(IndicatrixPrior prior, SeriesObservation series, double shift, double shiftSigma)
    {
        // The edge buffers come from the shared pool (every entry read is written first in this call).
        var pool = System.Buffers.ArrayPool<double>.Shared;
        int length = series.Count * prior.Shapes.Length * 2 * (prior.IsIsotropic ? 1 : Block);
        double[] buffer = pool.Rent(length);
        try
        {
            return Evaluate(prior, series, shift, shiftSigma, buffer);
        }
        finally
        {
            pool.Return(buffer);
        }
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static Outcome Evaluate(IndicatrixPrior prior, SeriesObservation series, double shift, double shiftSigma, double[] buffer)
    {
        var shapes = prior.Shapes;
        int count = shapes.Length;
        int orientations = prior.IsIsotropic ? 1 : FacetOrientationSet.Count;
        var edges = prior.IsIsotropic ? buffer : null;
        double offsetVariance = OffsetVariance(series, shiftSigma);
        var nearLimit = NearLimit(series, prior);
        // What does not change from orientation to orientation, once per shape.
        var noise = new NoiseTerms[count];
        Span<LevelSpread> spreads = stackalloc LevelSpread[count];
        Span<double> logCeilings = stackalloc double[count], logWeights = stackalloc double[count];
        for (int s = 0; s < count; s++)
        {
            noise[s] = NoiseTerms.For(series, nearLimit, series.NoiseVariance + Square(QuadratureSpread * shapes[s].Birefringence));
            spreads[s] = noise[s].Spread(offsetVariance, shapes[s].ExtraSigma);
            logCeilings[s] = LogCeiling(shapes[s], spreads[s].Sigma, prior.LevelDensity);
            logWeights[s] = Math.Log(shapes[s].Weight);
        }
        double[]? geometry = prior.IsIsotropic ? null : series.CoarseGeometry;
        int blockLength = GeometryLength(series.Count) * Block;
        var blockEdges = geometry is null ? null : buffer;
        var single = new LogSum();
        var oriented = new LogSum();
        var best = new SectionRefinement.Start[SectionRefinement.Starts];
        Array.Fill(best, new SectionRefinement.Start(0, 0, double.NegativeInfinity));
        double bestTail = 0, bestScore = double.NegativeInfinity;
        int bestPoint = 0, bestShape = 0;
        for (int j = 0; j < orientations; j++)
        {
            // The coarse orientations' edges are worked out a block at a time (the same arithmetic, lane by lane), then
            // weighed one orientation after another as before.
            int lane = j % Block;
            if (geometry is null) IsotropicEdges(shapes, series.Count, edges!);
            else if (lane == 0) BlockEdges(geometry.AsSpan(j / Block * blockLength, blockLength), shapes, series.Count, blockEdges!);
            for (int s = 0; s < count; s++)
            {
                bool isotropic = shapes[s].Group < 0;
                if (isotropic && j > 0) continue; // the same at every orientation
                double logWeight = logWeights[s];
                var at = geometry is null ? EdgeIndex.Interleaved(s, count) : new EdgeIndex(s * 2 * Block + lane, count * 2 * Block, Block);
                var fit = Integrate((blockEdges ?? edges)!, at, series, noise[s], spreads[s], shift, nearLimit, shapes[s], prior.LevelDensity,
                    withTail: false, floor: Math.Max(single.Max, oriented.Max) - 40 - logWeight, logCeiling: logCeilings[s]);
                double value = fit.LogValue + logWeight;
                if (isotropic) single.Include(value);
                else
                {
                    oriented.Include(value);
                    SectionRefinement.Keep(best, new SectionRefinement.Start(j, s, value));
                }
                if (value > bestScore) (bestScore, bestPoint, bestShape) = (value, j, s);
            }
        }
        if (double.IsFinite(bestScore)) bestTail = TailAt(prior, series, shift, nearLimit, noise[bestShape], spreads[bestShape], bestPoint, bestShape);
        double coarse = oriented.Log - Math.Log(orientations);
        double refinedTail = 0;
        double refined = prior.IsIsotropic ? double.NegativeInfinity
            : SectionRefinement.LogIntegral(prior, series, shift, offsetVariance, nearLimit, best, out refinedTail);
        if (refined > coarse) { coarse = refined; bestTail = Math.Max(bestTail, refinedTail); }
        return new Outcome(LogSum.Add(single.Log, coarse), bestTail);
    }

    /// <summary>The goodness of fit at one coarse point (worked out once, for the best point only: it costs an incomplete gamma function).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static double TailAt(IndicatrixPrior prior, SeriesObservation series, double shift, bool[]? nearLimit,
        in NoiseTerms noise, in LevelSpread spread, int point, int shape)
    {
        var edges = new double[series.Count * prior.Shapes.Length * 2];
        if (prior.IsIsotropic) IsotropicEdges(prior.Shapes, series.Count, edges);
        else SectionEdges(FacetOrientationSet.Points[point], prior.Shapes, series, edges);
        return Integrate(edges, EdgeIndex.Interleaved(shape, prior.Shapes.Length), series, noise, spread, shift, nearLimit, prior.Shapes[shape], prior.LevelDensity).Tail;
    }

    /// <summary>
    /// What <see cref="Integrate"/> needs of a reading variance σ² on this series, worked out once rather than at every
    /// orientation: how many readings enter (fixed by the steps and the censored ones), √(2σ²) for the edge count, and the
    /// Gaussian's normaliser −½(n − 1) ln 2πσ² − ½ ln n.
    /// </summary>
    internal readonly record struct NoiseTerms(double Noise, int Readings, double SeparationSigma, double Normaliser)
    {
        public static NoiseTerms For(SeriesObservation series, bool[]? nearLimit, double noise)
        {
            int n = 0;
            for (int k = 0; k < series.Count; k++) n += nearLimit is not null && nearLimit[k] ? 1 : series.TwoEdges[k] ? 2 : 1;
            return new NoiseTerms(noise, n, Math.Sqrt(2 * noise), -0.5 * (n - 1) * Math.Log(2 * Math.PI * noise) - 0.5 * Math.Log(n));
        }

        /// <summary>The spread of the readings' mean about the level: √(σ²/n + offset variance + extra²).</summary>
        public LevelSpread Spread(double offsetVariance, double extraSigma) => new(Math.Sqrt(Noise / Readings + offsetVariance + Square(extraSigma)));
    }

    /// <summary>The spread of the readings' mean about the level, and the same widened by the strays' scale (RangeStrays).</summary>
    internal readonly record struct LevelSpread(double Sigma)
    {
        /// <summary>√(σ² + <see cref="RangeStrays.IndexScale"/>²).</summary>
        public double Wide { get; } = double.Hypot(Sigma, RangeStrays.IndexScale);
    }

    /// <summary>ln of the most the level's density can be: 1/max(width, spread·√(2π)), or the broad density.</summary>
    private static double LogCeiling(in IndicatrixPrior.Shape shape, double spread, double levelDensity) =>
        Math.Log(levelDensity > 0 ? levelDensity : 1 / Math.Max(shape.LevelHigh - shape.LevelLow, spread * 2.5066282746310002));

    /// <summary>Variance of the common shift besides the level: the per-stone offset, the soft catalogue edges, the light's correction.</summary>
    internal static double OffsetVariance(SeriesObservation series, double shiftSigma) =>
        Square(OffsetShare * series.ReadingPrecision) + Square(IndicatrixPrior.CatalogueBoundSigma) + Square(shiftSigma);

    private static void IsotropicEdges(IndicatrixPrior.Shape[] shapes, int steps, double[] edges)
    {
        for (int s = 0; s < shapes.Length; s++)
        {
            double n = 1 / Math.Sqrt(shapes[s].InverseSquareX);
            for (int k = 0; k < steps; k++) edges[(k * shapes.Length + s) * 2] = edges[(k * shapes.Length + s) * 2 + 1] = n;
        }
    }

    /// <summary>The two edges of every step and shape for one orientation: n = λ^(−1/2) for the eigenvalues λ of BᵀMB.</summary>
    internal static void SectionEdges(in FacetOrientation o, IndicatrixPrior.Shape[] shapes, SeriesObservation series, double[] edges)
    {
        int length = GeometryLength(series.Count);
        Span<double> geometry = length <= 256 ? stackalloc double[length] : new double[length];
        Geometry(o, series, geometry);
        SectionEdges(geometry, shapes, series.Count, edges);
    }

    /// <summary>
    /// The edges of every step for one orientation and one shape (the refinement's case), <see cref="Block"/> steps at a
    /// time: lows at 0…, highs at <see cref="SeriesObservation.PaddedCount"/>…; the same arithmetic as the per-step
    /// <see cref="Geometry"/> and <see cref="SectionEdges(ReadOnlySpan{double}, IndicatrixPrior.Shape[], int, double[])"/>,
    /// so the same bits. Lanes past the last step hold whatever a zero rotation vector gives and are never read.
    /// </summary>
    internal static void SectionEdges(in FacetOrientation o, in IndicatrixPrior.Shape shape, SeriesObservation series, double[] edges)
    {
        var (nx, ny, nz) = (o.Normal.X, o.Normal.Y, o.Normal.Z);
        double p = nx * nx * shape.InverseSquareX + ny * ny * shape.InverseSquareY + nz * nz * shape.InverseSquareZ;
        double senseSin = o.Sense * o.SinStart, senseCos = o.Sense * o.CosStart;
        var half = Vector512.Create(0.5);
        var normal = Vector512.Create(p);
        int padded = series.PaddedCount;
        for (int k = 0; k < padded; k += Block)
        {
            var cos = Vector512.Create(series.PaddedCos.AsSpan(k, Block));
            var sin = Vector512.Create(series.PaddedSin.AsSpan(k, Block));
            var c = o.CosStart * cos - senseSin * sin;
            var s = o.SinStart * cos + senseCos * sin;
            var tx = c * o.V.X - s * o.U.X;
            var ty = c * o.V.Y - s * o.U.Y;
            var tz = c * o.V.Z - s * o.U.Z;
            var q = tx * tx * shape.InverseSquareX + ty * ty * shape.InverseSquareY + tz * tz * shape.InverseSquareZ;
            var r = nx * tx * shape.InverseSquareX + ny * ty * shape.InverseSquareY + nz * tz * shape.InverseSquareZ;
            Vector512<double> mean = (normal + q) * half, difference = (normal - q) * half;
            var spread = Vector512.Sqrt(difference * difference + r * r);
            (Vector512<double>.One / Vector512.Sqrt(mean + spread)).CopyTo(edges, k);
            (Vector512<double>.One / Vector512.Sqrt(mean - spread)).CopyTo(edges, padded + k);
        }
    }

    /// <summary>The length of one orientation's geometry (<see cref="Geometry"/>) for a series of this many steps.</summary>
    internal static int GeometryLength(int steps) => 3 + 6 * steps;

    /// <summary>How many coarse orientations are worked out together (<see cref="BlockEdges"/>; the coarse set is a multiple of it).</summary>
    private const int Block = 8;

    /// <summary>
    /// The geometry of every coarse orientation for the series (<see cref="Geometry"/>), in blocks of <see cref="Block"/>
    /// orientations, each quantity's values of the block side by side: it is the same for every material, so the series
    /// keeps it (<see cref="SeriesObservation.CoarseGeometry"/>).
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static double[] CoarseGeometry(SeriesObservation series)
    {
        int length = GeometryLength(series.Count);
        // Whole blocks; lanes past the set's end stay zero and are never read.
        var geometry = new double[(FacetOrientationSet.Count + Block - 1) / Block * Block * length];
        var one = new double[length];
        for (int j = 0; j < FacetOrientationSet.Count; j++)
        {
            Geometry(FacetOrientationSet.Points[j], series, one);
            int block = j / Block * Block * length, lane = j % Block;
            for (int q = 0; q < length; q++) geometry[block + q * Block + lane] = one[q];
        }
        return geometry;
    }

    /// <summary>
    /// What the edges take of one orientation and the steps' rotations: N's squared components, then for each step the
    /// squared components of t (in the facet, across the direction of travel) and N's products with them.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static void Geometry(in FacetOrientation o, SeriesObservation series, Span<double> geometry)
    {
        var (nx, ny, nz) = (o.Normal.X, o.Normal.Y, o.Normal.Z);
        geometry[0] = nx * nx;
        geometry[1] = ny * ny;
        geometry[2] = nz * nz;
        for (int k = 0; k < series.Count; k++)
        {
            double c = o.CosStart * series.Cos[k] - o.Sense * o.SinStart * series.Sin[k];
            double s = o.SinStart * series.Cos[k] + o.Sense * o.CosStart * series.Sin[k];
            double tx = c * o.V.X - s * o.U.X, ty = c * o.V.Y - s * o.U.Y, tz = c * o.V.Z - s * o.U.Z;
            var step = geometry.Slice(3 + 6 * k, 6);
            step[0] = tx * tx;
            step[1] = ty * ty;
            step[2] = tz * tz;
            step[3] = nx * tx;
            step[4] = ny * ty;
            step[5] = nz * tz;
        }
    }

    /// <summary>
    /// The edges of every step and shape for a block of coarse orientations, from the block's geometry: the same arithmetic
    /// as <see cref="SectionEdges(ReadOnlySpan{double}, IndicatrixPrior.Shape[], int, double[])"/> (IEEE products, sums,
    /// square roots and quotients, so the same bits), <see cref="Block"/> orientations at a time. Step k's edges of shape
    /// i for the block's orientation l are at ((k·shapes + i)·2 + 0 or 1)·Block + l.
    /// </summary>
    private static void BlockEdges(ReadOnlySpan<double> geometry, IndicatrixPrior.Shape[] shapes, int steps, double[] edges)
    {
        var nxx = Vector512.Create(geometry[..Block]);
        var nyy = Vector512.Create(geometry.Slice(Block, Block));
        var nzz = Vector512.Create(geometry.Slice(2 * Block, Block));
        var half = Vector512.Create(0.5);
        Span<Vector512<double>> normal = shapes.Length <= 16 ? stackalloc Vector512<double>[shapes.Length] : new Vector512<double>[shapes.Length];
        for (int i = 0; i < shapes.Length; i++)
            normal[i] = nxx * shapes[i].InverseSquareX + nyy * shapes[i].InverseSquareY + nzz * shapes[i].InverseSquareZ;
        for (int k = 0; k < steps; k++)
        {
            var step = geometry.Slice((3 + 6 * k) * Block, 6 * Block);
            var txx = Vector512.Create(step[..Block]);
            var tyy = Vector512.Create(step.Slice(Block, Block));
            var tzz = Vector512.Create(step.Slice(2 * Block, Block));
            var ntx = Vector512.Create(step.Slice(3 * Block, Block));
            var nty = Vector512.Create(step.Slice(4 * Block, Block));
            var ntz = Vector512.Create(step.Slice(5 * Block, Block));
            for (int i = 0; i < shapes.Length; i++)
            {
                ref readonly var shape = ref shapes[i];
                var p = normal[i];
                var q = txx * shape.InverseSquareX + tyy * shape.InverseSquareY + tzz * shape.InverseSquareZ;
                var r = ntx * shape.InverseSquareX + nty * shape.InverseSquareY + ntz * shape.InverseSquareZ;
                // x·½ is x/2 exactly.
                Vector512<double> mean = (p + q) * half, difference = (p - q) * half;
                var spread = Vector512.Sqrt(difference * difference + r * r);
                int at = (k * shapes.Length + i) * 2 * Block;
                (Vector512<double>.One / Vector512.Sqrt(mean + spread)).CopyTo(edges, at);
                (Vector512<double>.One / Vector512.Sqrt(mean - spread)).CopyTo(edges, at + Block);
            }
        }
    }

    /// <summary>The edges of every step and shape from one orientation's <see cref="Geometry"/>.</summary>
    private static void SectionEdges(ReadOnlySpan<double> geometry, IndicatrixPrior.Shape[] shapes, int steps, double[] edges)
    {
        double nxx = geometry[0], nyy = geometry[1], nzz = geometry[2];
        // N·M·N does not depend on the step.
        Span<double> normal = shapes.Length <= 64 ? stackalloc double[shapes.Length] : new double[shapes.Length];
        for (int i = 0; i < shapes.Length; i++)
            normal[i] = nxx * shapes[i].InverseSquareX + nyy * shapes[i].InverseSquareY + nzz * shapes[i].InverseSquareZ;
        for (int k = 0; k < steps; k++)
        {
            var step = geometry.Slice(3 + 6 * k, 6);
            double txx = step[0], tyy = step[1], tzz = step[2], ntx = step[3], nty = step[4], ntz = step[5];
            for (int i = 0; i < shapes.Length; i++)
            {
                ref readonly var shape = ref shapes[i];
                double p = normal[i];
                double q = txx * shape.InverseSquareX + tyy * shape.InverseSquareY + tzz * shape.InverseSquareZ;
                double r = ntx * shape.InverseSquareX + nty * shape.InverseSquareY + ntz * shape.InverseSquareZ;
                double mean = (p + q) / 2, half = (p - q) / 2;
                double spread = Math.Sqrt(half * half + r * r);
                int at = (k * shapes.Length + i) * 2;
                edges[at] = 1 / Math.Sqrt(mean + spread);
                edges[at + 1] = 1 / Math.Sqrt(mean - spread);
            }
        }
    }

    /// <summary>Steps with one edge close enough to the liquid's limit that the high edge may be hidden above it.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static bool[]? NearLimit(SeriesObservation series, IndicatrixPrior prior)
    {
        if (prior.IsIsotropic) return null;
        bool[]? near = null;
        double reach = prior.LargestBirefringence + HiddenEdgeReachSigmas * Math.Sqrt(series.NoiseVariance) + SeriesObservation.LiquidEdgeMargin;
        for (int k = 0; k < series.Count; k++)
            if (!series.TwoEdges[k] && series.Low[k] + reach > series.LiquidLimit)
                (near ??= new bool[series.Count])[k] = true;
        return near;
    }

    /// <summary>
    /// ∫ p(c) Π p(step | edges + c) dc for one orientation and shape. With Gaussian readings rᵢ = reading + shift − edge,
    /// ∫ Π N(rᵢ; c, σ²) p(c) dc = (2πσ²)^(−(n−1)/2) n^(−1/2) exp(−Σ(rᵢ − r̄)²/2σ²) · [p ∗ N(0, σ²/n)](r̄), p the level's
    /// uniform density (or the broad one) convolved with the offset's normal.
    /// </summary>
    /// <remarks>
    /// <paramref name="floor"/>: below it the point is left out (−∞); the test takes the level's density at its ceiling
    /// (<paramref name="logCeiling"/>, worked out here when not given). <paramref name="spread"/> is
    /// <see cref="NoiseTerms.Spread"/> for this shape.
    /// </remarks>
    internal static PointFit Integrate(double[] edges, EdgeIndex index, SeriesObservation series, in NoiseTerms terms, in LevelSpread spread,
        double shift, bool[]? nearLimit, in IndicatrixPrior.Shape shape, double levelDensity, bool withTail = true, double floor = double.NegativeInfinity,
        double logCeiling = double.NaN, double[]? residuals = null)
    {
        int steps = series.Count;
        Span<double> seen = steps <= 64 ? stackalloc double[steps] : new double[steps];
        EachSeenAsTwo(edges, index, steps, terms.SeparationSigma, seen);
        var sums = new Sums { Factor = 1 };
        for (int k = 0; k < steps; k++)
        {
            if (nearLimit is not null && nearLimit[k]) continue;
            int at = index.Start + k * index.Step;
            double low = edges[at], high = edges[at + index.Pair];
            double seenAsTwo = seen[k];
            if (series.TwoEdges[k])
            {
                double a = series.Low[k] + shift - low, b = series.High[k] + shift - high;
                if (residuals is not null) { residuals[sums.N] = a; residuals[sums.N + 1] = b; }
                sums.N += 2; sums.Sum += a + b; sums.Sum2 += a * a + b * b;
                sums.Factor *= seenAsTwo;
            }
            else
            {
                double a = series.Low[k] + shift - (low + high) / 2;
                if (residuals is not null) residuals[sums.N] = a;
                sums.N++; sums.Sum += a; sums.Sum2 += a * a;
                sums.Factor *= 1 - seenAsTwo;
            }
            if (sums.Factor < 1e-200) { sums.LogFactor += Math.Log(sums.Factor); sums.Factor = 1; }
        }
        if (nearLimit is not null)
            Censored(series, edges, index, terms.Noise, shift, nearLimit, seen, residuals, ref sums);
        return Finish(sums, terms, spread, shape, levelDensity, withTail, floor, logCeiling, residuals);
    }

    /// <summary>What the steps add up to at one orientation and shape: the readings' count, Σr, Σr², and the edge-count factor (rescaled into its log part).</summary>
    private struct Sums
    {
        public int N;
        public double Sum, Sum2, Factor, LogFactor;
    }

    /// <summary>The closed-form integral over the common shift from the steps' sums (the second half of <see cref="Integrate"/>).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static PointFit Finish(in Sums sums, in NoiseTerms terms, in LevelSpread spread, in IndicatrixPrior.Shape shape, double levelDensity, bool withTail,
        double floor, double logCeiling, double[]? residuals)
    {
        int n = sums.N;
        double noise = terms.Noise;
        double logFactor = sums.LogFactor + Math.Log(sums.Factor);
        double mean = sums.Sum / n;
        double squares = Math.Max(0, sums.Sum2 - sums.Sum * mean);
        // n is terms.Readings: the steps and the censored ones fix it.
        double gaussian = terms.Normaliser - squares / (2 * noise);
        // The level's density is at most 1/max(width, spread·√(2π)) (or the broad density): skip it when even that cannot matter.
        if (floor > double.NegativeInfinity
            && gaussian + logFactor + (double.IsNaN(logCeiling) ? LogCeiling(shape, spread.Sigma, levelDensity) : logCeiling) < floor)
            return new PointFit(double.NegativeInfinity, 0);
        double density = LevelDensity(mean, shape.LevelLow, shape.LevelHigh, spread, levelDensity);
        if (!(density > 0)) return new PointFit(double.NegativeInfinity, 0);
        if (residuals is not null) for (int i = 0; i < n; i++) residuals[i] -= mean; // centred: what the orientation and shape must explain
        if (!withTail) return new PointFit(gaussian + logFactor + Math.Log(density), 0, n);
        var level = new PropertyRange(shape.LevelLow, shape.LevelHigh);
        double levelTail = levelDensity > 0
            ? RangeLikelihood.TwoSidedTail(RangeLikelihood.StandardDeviationsOutside(mean, level, spread.Sigma))
            : RangeStrays.Tail(mean, level, spread.Sigma, RangeStrays.IndexScale);
        int freedom = Math.Max(1, n - 4); // three orientation angles and the level are fitted
        double tail = SpecialFunctions.GammaUpperRegularized(freedom / 2.0, squares / noise / 2) * levelTail
                      * Math.Min(1, Math.Exp(logFactor) / EdgeCountFullFit);
        return new PointFit(gaussian + logFactor + Math.Log(density), tail, n);
    }

    /// <summary>
    /// A one-edge step near the liquid's limit is either two edges written as one, or a low edge whose high edge is lost
    /// above the limit (censored: edge &gt; limit − margin). Both are weighed at the shift fitted from the other steps (a
    /// plug-in: the shift is pinned far more tightly than either branch varies) and the likelier one is kept.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static void Censored(SeriesObservation series, double[] edges, EdgeIndex index, double noise, double shift, bool[] nearLimit,
        ReadOnlySpan<double> seen, double[]? residuals, ref Sums sums)
    {
        double fitted = sums.N > 0 ? sums.Sum / sums.N : Fallback(series, edges, index, shift, nearLimit);
        double sigma = Math.Sqrt(noise);
        double threshold = series.LiquidLimit - SeriesObservation.LiquidEdgeMargin;
        for (int k = 0; k < series.Count; k++)
        {
            if (!nearLimit[k]) continue;
            int at = index.Start + k * index.Step;
            double low = edges[at], high = edges[at + index.Pair];
            double merged = series.Low[k] + shift - (low + high) / 2, alone = series.Low[k] + shift - low;
            double pOne = 1 - seen[k];
            double pHiddenEdge = RangeLikelihood.Phi((high + fitted - shift - threshold) / sigma);
            bool hidden = pHiddenEdge * Math.Exp(-Square(alone - fitted) / (2 * noise)) > pOne * Math.Exp(-Square(merged - fitted) / (2 * noise));
            double a = hidden ? alone : merged;
            if (residuals is not null) residuals[sums.N] = a;
            sums.N++; sums.Sum += a; sums.Sum2 += a * a;
            sums.Factor *= Math.Max(hidden ? pHiddenEdge : pOne, 1e-300);
        }
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static double Fallback(SeriesObservation series, double[] edges, EdgeIndex index, double shift, bool[] nearLimit)
    {
        double total = 0;
        int n = 0;
        for (int k = 0; k < series.Count; k++)
            if (nearLimit[k]) { total += series.Low[k] + shift - edges[index.Start + k * index.Step]; n++; }
        return total / n;
    }

    /// <summary>
    /// Where one orientation and shape's edges lie in an edge buffer: step k's low edge at Start + k·Step, its high edge
    /// Pair after it.
    /// </summary>
    internal readonly record struct EdgeIndex(int Start, int Step, int Pair)
    {
        /// <summary>Shape s of <paramref name="count"/> in the layout <see cref="SectionEdges(in FacetOrientation, IndicatrixPrior.Shape[], SeriesObservation, double[])"/> writes.</summary>
        public static EdgeIndex Interleaved(int s, int count) => new(s * 2, count * 2, 1);
    }

    /// <summary>The level's density at r̄: uniform on [low, high] (or the given density there) convolved with N(0, s²).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static double LevelDensity(double mean, double low, double high, in LevelSpread spread, double density)
    {
        double s = spread.Sigma;
        if (density > 0) return density * (RangeLikelihood.Phi((high - mean) / s) - RangeLikelihood.Phi((low - mean) / s));
        // A catalogue level: its stones with soft edges, and the strays beyond its range (RangeStrays).
        return RangeStrays.Density(mean, new PropertyRange(low, high), s, RangeStrays.IndexScale, spread.Wide);
    }

    /// <summary>P(two edges written | true separation): Φ((separation − resolution)/σ), with the misreading floor.</summary>
    internal static double SeenAsTwo(double separation, double sigma) => SeenAsTwoAt((separation - SeriesObservation.EdgeResolution) / sigma);

    /// <summary><see cref="SeenAsTwo(double, double)"/> at z = (separation − resolution)/σ.</summary>
    private static double SeenAsTwoAt(double z) => EdgeCountMisread + (1 - 2 * EdgeCountMisread) * FastPhi(z);

    /// <summary>
    /// <see cref="SeenAsTwo(double, double)"/> of every step's edges; with the edges of consecutive steps side by side, the quotients are
    /// taken eight at a time (the same IEEE quotients).
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static void EachSeenAsTwo(double[] edges, EdgeIndex index, int steps, double sigma, Span<double> seen)
    {
        int k = 0;
        int padded = (steps + Block - 1) / Block * Block;
        if (index.Step == 1 && index.Start + index.Pair + padded <= edges.Length)
        {
            var resolution = Vector512.Create(SeriesObservation.EdgeResolution);
            var sigmas = Vector512.Create(sigma);
            for (; k < steps; k += Block)
            {
                var low = Vector512.Create(edges.AsSpan(index.Start + k, Block));
                var high = Vector512.Create(edges.AsSpan(index.Start + index.Pair + k, Block));
                var z = (high - low - resolution) / sigmas;
                for (int lane = 0; lane < Block && k + lane < steps; lane++) seen[k + lane] = SeenAsTwoAt(z[lane]);
            }
        }
        for (; k < steps; k++)
        {
            int at = index.Start + k * index.Step;
            seen[k] = SeenAsTwo(edges[at + index.Pair] - edges[at], sigma);
        }
    }

    /// <summary>Φ by linear interpolation in a table at steps of 0.01 over ±6 (error below 10⁻⁵; enough beside the misreading floor).</summary>
    [System.Runtime.CompilerServices.MethodImpl(System.Runtime.CompilerServices.MethodImplOptions.AggressiveInlining)]
    private static double FastPhi(double z)
    {
        if (z <= -6) return 0;
        if (z >= 6) return 1;
        double x = (z + 6) * 100;
        int i = (int)x;
        double f = x - i;
        return PhiTable[i] + f * (PhiTable[i + 1] - PhiTable[i]);
    }

    private static readonly double[] PhiTable = [.. Enumerable.Range(0, 1202).Select(i => RangeLikelihood.Phi(-6 + i * 0.01))];

    private static double Square(double x) => x * x;

    /// <summary>ln Σ exp(vᵢ), kept stably as the values come.</summary>
    internal sealed class LogSum
    {
        private double _max = double.NegativeInfinity, _sum;

        public double Log => _sum > 0 ? _max + Math.Log(_sum) : double.NegativeInfinity;

        /// <summary>The largest value included so far.</summary>
        public double Max => _max;

        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        public void Include(double value)
        {
            if (double.IsNegativeInfinity(value)) return;
            if (value <= _max) { _sum += Math.Exp(value - _max); return; }
            _sum = _sum * Math.Exp(_max - value) + 1;
            _max = value;
        }

        /// <summary>ln(eᵃ + eᵇ).</summary>
        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        public static double Add(double a, double b)
        {
            if (double.IsNegativeInfinity(a)) return b;
            if (double.IsNegativeInfinity(b)) return a;
            double max = Math.Max(a, b);
            return max + Math.Log(Math.Exp(a - max) + Math.Exp(b - max));
        }
    }
}
