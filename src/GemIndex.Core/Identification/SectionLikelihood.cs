using GemIndex.Core.Catalogue;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Core.Readings;
using MathNet.Numerics;

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
        var shapes = prior.Shapes;
        int count = shapes.Length;
        int orientations = prior.IsIsotropic ? 1 : FacetOrientationSet.Count;
        var edges = new double[series.Count * count * 2];
        var noise = new double[count];
        double offsetVariance = OffsetVariance(series, shiftSigma);
        for (int s = 0; s < count; s++)
            noise[s] = series.NoiseVariance + Square(QuadratureSpread * shapes[s].Birefringence);
        var nearLimit = NearLimit(series, prior);
        var single = new LogSum();
        var oriented = new LogSum();
        var best = new SectionRefinement.Start[SectionRefinement.Starts];
        Array.Fill(best, new SectionRefinement.Start(0, 0, double.NegativeInfinity));
        double bestTail = 0, bestScore = double.NegativeInfinity;
        int bestPoint = 0, bestShape = 0;
        for (int j = 0; j < orientations; j++)
        {
            if (prior.IsIsotropic) IsotropicEdges(shapes, series.Count, edges);
            else SectionEdges(FacetOrientationSet.Points[j], shapes, series, edges);
            for (int s = 0; s < count; s++)
            {
                bool isotropic = shapes[s].Group < 0;
                if (isotropic && j > 0) continue; // the same at every orientation
                double logWeight = Math.Log(shapes[s].Weight);
                var fit = Integrate(edges, s, count, series, noise[s], offsetVariance, shift, nearLimit, shapes[s], prior.LevelDensity,
                    withTail: false, floor: Math.Max(single.Max, oriented.Max) - 40 - logWeight);
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
        if (double.IsFinite(bestScore)) bestTail = TailAt(prior, series, shift, offsetVariance, nearLimit, noise, bestPoint, bestShape);
        double coarse = oriented.Log - Math.Log(orientations);
        double refinedTail = 0;
        double refined = prior.IsIsotropic ? double.NegativeInfinity
            : SectionRefinement.LogIntegral(prior, series, shift, offsetVariance, nearLimit, best, out refinedTail);
        if (refined > coarse) { coarse = refined; bestTail = Math.Max(bestTail, refinedTail); }
        return new Outcome(LogSum.Add(single.Log, coarse), bestTail);
    }

    /// <summary>The goodness of fit at one coarse point (worked out once, for the best point only: it costs an incomplete gamma function).</summary>
    private static double TailAt(IndicatrixPrior prior, SeriesObservation series, double shift, double offsetVariance, bool[]? nearLimit,
        double[] noise, int point, int shape)
    {
        var edges = new double[series.Count * prior.Shapes.Length * 2];
        if (prior.IsIsotropic) IsotropicEdges(prior.Shapes, series.Count, edges);
        else SectionEdges(FacetOrientationSet.Points[point], prior.Shapes, series, edges);
        return Integrate(edges, shape, prior.Shapes.Length, series, noise[shape], offsetVariance, shift, nearLimit, prior.Shapes[shape], prior.LevelDensity).Tail;
    }

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
        var (nx, ny, nz) = (o.Normal.X, o.Normal.Y, o.Normal.Z);
        double nxx = nx * nx, nyy = ny * ny, nzz = nz * nz;
        for (int k = 0; k < series.Count; k++)
        {
            double c = o.CosStart * series.Cos[k] - o.Sense * o.SinStart * series.Sin[k];
            double s = o.SinStart * series.Cos[k] + o.Sense * o.CosStart * series.Sin[k];
            double tx = c * o.V.X - s * o.U.X, ty = c * o.V.Y - s * o.U.Y, tz = c * o.V.Z - s * o.U.Z;
            double txx = tx * tx, tyy = ty * ty, tzz = tz * tz, ntx = nx * tx, nty = ny * ty, ntz = nz * tz;
            for (int i = 0; i < shapes.Length; i++)
            {
                ref readonly var shape = ref shapes[i];
                double p = nxx * shape.InverseSquareX + nyy * shape.InverseSquareY + nzz * shape.InverseSquareZ;
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
    internal static bool[]? NearLimit(SeriesObservation series, IndicatrixPrior prior)
    {
        if (prior.IsIsotropic) return null;
        bool[]? near = null;
        double reach = prior.LargestBirefringence + 8 * Math.Sqrt(series.NoiseVariance) + SeriesObservation.LiquidEdgeMargin;
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
    internal static PointFit Integrate(double[] edges, int s, int count, SeriesObservation series, double noise, double offsetVariance,
        double shift, bool[]? nearLimit, in IndicatrixPrior.Shape shape, double levelDensity, bool withTail = true, double floor = double.NegativeInfinity, double[]? residuals = null)
    {
        int n = 0;
        double sum = 0, sum2 = 0, factor = 1, logFactor = 0;
        double separationSigma = Math.Sqrt(2 * noise);
        for (int k = 0; k < series.Count; k++)
        {
            if (nearLimit is not null && nearLimit[k]) continue;
            int at = (k * count + s) * 2;
            double low = edges[at], high = edges[at + 1];
            double seenAsTwo = SeenAsTwo(high - low, separationSigma);
            if (series.TwoEdges[k])
            {
                double a = series.Low[k] + shift - low, b = series.High[k] + shift - high;
                if (residuals is not null) { residuals[n] = a; residuals[n + 1] = b; }
                n += 2; sum += a + b; sum2 += a * a + b * b;
                factor *= seenAsTwo;
            }
            else
            {
                double a = series.Low[k] + shift - (low + high) / 2;
                if (residuals is not null) residuals[n] = a;
                n++; sum += a; sum2 += a * a;
                factor *= 1 - seenAsTwo;
            }
            if (factor < 1e-200) { logFactor += Math.Log(factor); factor = 1; }
        }
        if (nearLimit is not null)
            Censored(series, edges, s, count, noise, shift, nearLimit, separationSigma, residuals, ref n, ref sum, ref sum2, ref factor);
        logFactor += Math.Log(factor);
        double mean = sum / n;
        double squares = Math.Max(0, sum2 - sum * mean);
        double gaussian = -0.5 * (n - 1) * Math.Log(2 * Math.PI * noise) - 0.5 * Math.Log(n) - squares / (2 * noise);
        double spread = Math.Sqrt(noise / n + offsetVariance + Square(shape.ExtraSigma));
        // The level's density is at most 1/max(width, spread·√(2π)) (or the broad density): skip it when even that cannot matter.
        double ceiling = levelDensity > 0 ? levelDensity : 1 / Math.Max(shape.LevelHigh - shape.LevelLow, spread * 2.5066282746310002);
        if (gaussian + logFactor + Math.Log(ceiling) < floor) return new PointFit(double.NegativeInfinity, 0);
        double density = LevelDensity(mean, shape.LevelLow, shape.LevelHigh, spread, levelDensity);
        if (!(density > 0)) return new PointFit(double.NegativeInfinity, 0);
        if (residuals is not null) for (int i = 0; i < n; i++) residuals[i] -= mean; // centred: what the orientation and shape must explain
        if (!withTail) return new PointFit(gaussian + logFactor + Math.Log(density), 0, n);
        var level = new PropertyRange(shape.LevelLow, shape.LevelHigh);
        double levelTail = levelDensity > 0
            ? RangeLikelihood.TwoSidedTail(RangeLikelihood.StandardDeviationsOutside(mean, level, spread))
            : RangeStrays.Tail(mean, level, spread, RangeStrays.IndexScale);
        int freedom = Math.Max(1, n - 4); // three orientation angles and the level are fitted
        double tail = SpecialFunctions.GammaUpperRegularized(freedom / 2.0, squares / noise / 2) * levelTail
                      * Math.Min(1, Math.Exp(logFactor) / 0.5);
        return new PointFit(gaussian + logFactor + Math.Log(density), tail, n);
    }

    /// <summary>
    /// A one-edge step near the liquid's limit is either two edges written as one, or a low edge whose high edge is lost
    /// above the limit (censored: edge &gt; limit − margin). Both are weighed at the shift fitted from the other steps (a
    /// plug-in: the shift is pinned far more tightly than either branch varies) and the likelier one is kept.
    /// </summary>
    private static void Censored(SeriesObservation series, double[] edges, int s, int count, double noise, double shift, bool[] nearLimit,
        double separationSigma, double[]? residuals, ref int n, ref double sum, ref double sum2, ref double factor)
    {
        double fitted = n > 0 ? sum / n : Fallback(series, edges, s, count, shift, nearLimit);
        double sigma = Math.Sqrt(noise);
        double threshold = series.LiquidLimit - SeriesObservation.LiquidEdgeMargin;
        for (int k = 0; k < series.Count; k++)
        {
            if (!nearLimit[k]) continue;
            int at = (k * count + s) * 2;
            double low = edges[at], high = edges[at + 1];
            double merged = series.Low[k] + shift - (low + high) / 2, alone = series.Low[k] + shift - low;
            double pOne = 1 - SeenAsTwo(high - low, separationSigma);
            double pHiddenEdge = RangeLikelihood.Phi((high + fitted - shift - threshold) / sigma);
            bool hidden = pHiddenEdge * Math.Exp(-Square(alone - fitted) / (2 * noise)) > pOne * Math.Exp(-Square(merged - fitted) / (2 * noise));
            double a = hidden ? alone : merged;
            if (residuals is not null) residuals[n] = a;
            n++; sum += a; sum2 += a * a;
            factor *= Math.Max(hidden ? pHiddenEdge : pOne, 1e-300);
        }
    }

    private static double Fallback(SeriesObservation series, double[] edges, int s, int count, double shift, bool[] nearLimit)
    {
        double total = 0;
        int n = 0;
        for (int k = 0; k < series.Count; k++)
            if (nearLimit[k]) { total += series.Low[k] + shift - edges[(k * count + s) * 2]; n++; }
        return total / n;
    }

    /// <summary>The level's density at r̄: uniform on [low, high] (or the given density there) convolved with N(0, s²).</summary>
    private static double LevelDensity(double mean, double low, double high, double s, double density)
    {
        double width = high - low;
        if (density > 0) return density * (RangeLikelihood.Phi((high - mean) / s) - RangeLikelihood.Phi((low - mean) / s));
        // A catalogue level: its stones with soft edges, and the strays beyond its range (RangeStrays).
        return RangeStrays.Density(mean, new PropertyRange(low, high), s, RangeStrays.IndexScale);
    }

    /// <summary>P(two edges written | true separation): Φ((separation − resolution)/σ), with the misreading floor.</summary>
    internal static double SeenAsTwo(double separation, double sigma) =>
        EdgeCountMisread + (1 - 2 * EdgeCountMisread) * FastPhi((separation - SeriesObservation.EdgeResolution) / sigma);

    /// <summary>Φ by linear interpolation in a table at steps of 0.01 over ±6 (error below 10⁻⁵; enough beside the misreading floor).</summary>
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

        public void Include(double value)
        {
            if (double.IsNegativeInfinity(value)) return;
            if (value <= _max) { _sum += Math.Exp(value - _max); return; }
            _sum = _sum * Math.Exp(_max - value) + 1;
            _max = value;
        }

        /// <summary>ln(eᵃ + eᵇ).</summary>
        public static double Add(double a, double b)
        {
            if (double.IsNegativeInfinity(a)) return b;
            if (double.IsNegativeInfinity(b)) return a;
            double max = Math.Max(a, b);
            return max + Math.Log(Math.Exp(a - max) + Math.Exp(b - max));
        }
    }
}
