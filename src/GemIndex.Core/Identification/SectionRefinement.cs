using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Core.Readings;
using System.Runtime.CompilerServices;

namespace GemIndex.Core.Identification;

/// <summary>
/// Laplace's method around the best points of the coarse set (docs/ranking.md §1): from each, Levenberg–Marquardt climbs the
/// log-integrand over the facet orientation (three angles; two for a uniaxial material, whose indicatrix is round about
/// its optic axis) and the shape (birefringence, β − α, where the catalogue lets them vary), and the integral over that
/// peak is exp(ℓ*) (2π)^(d/2) |−H|^(−1/2). Distinct peaks (different predicted series) are added; the same peak reached
/// twice counts once. Derivatives by central differences.
/// </summary>
internal static class SectionRefinement
{
    /// <summary>How many of the coarse set's best points are climbed from (a judgement between speed and finding every peak).</summary>
    public const int Starts = 4;

    /// <summary>Levenberg–Marquardt steps at most from each start.</summary>
    private const int Iterations = 10;

    /// <summary>
    /// The largest step of one climb: 0.15 rad for an orientation angle, 5 units (0.005 in index) for a shape parameter,
    /// so that a step cannot jump to another peak (numerical judgements, docs/ranking.md §1).
    /// </summary>
    private const double AngleStepCap = 0.15, ValueStepCap = 5.0;

    /// <summary>A start this far (in ln) below the best cannot add a peak that matters.</summary>
    private const double Negligible = 12;

    /// <summary>Shape parameters are moved in units of 0.001 so that all coordinates have similar curvature.</summary>
    private const double ShapeUnit = 0.001;

    /// <summary>Two climbs whose predicted series agree within this reached the same peak (judgement, docs/ranking.md §1).</summary>
    private const double SamePeakTolerance = 3e-4;

    /// <summary>A coarse point to climb from.</summary>
    internal readonly record struct Start(int Point, int Shape, double Value);

    /// <summary>Keeps the best <see cref="Starts"/> points (by value), in place.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static void Keep(Start[] best, Start candidate)
    {
        int worst = 0;
        for (int i = 0; i < best.Length; i++)
        {
            if (best[i].Value < best[worst].Value) worst = i;
        }
        if (candidate.Value > best[worst].Value) best[worst] = candidate;
    }

    /// <summary>ln of the sum of the Laplace integrals of the distinct peaks reached from <paramref name="starts"/>.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static double LogIntegral(IndicatrixPrior prior, SeriesObservation series, double shift, double offsetVariance, bool[]? nearLimit,
        Start[] starts, out double tail)
    {
        tail = 0;
        var peaks = new List<(int Group, double[] Edges)>();
        var buffers = new Peak.Buffers.Set();
        var total = new SectionLikelihood.LogSum();
        double top = starts.Max(s => s.Value);
        foreach (var start in starts.Where(s => s.Value > top - Negligible).OrderByDescending(s => s.Value))
        {
            var shape = prior.Shapes[start.Shape];
            if (shape.Group < 0) continue;
            var problem = new Peak(prior, series, shift, offsetVariance, nearLimit, shape, FacetOrientationSet.Points[start.Point]);
            if (!problem.Climb(e => peaks.Any(p => p.Group == shape.Group && Same(p.Edges, e)), buffers, out double logValue, out double peakTail, out double[] edges))
                continue;
            peaks.Add((shape.Group, edges));
            total.Include(logValue);
            tail = Math.Max(tail, peakTail);
        }
        return total.Log;
    }

    private static bool Same(double[] a, double[] b)
    {
        for (int i = 0; i < a.Length; i++) if (Math.Abs(a[i] - b[i]) > SamePeakTolerance) return false;
        return true;
    }

    /// <summary>One climb: the log-integrand as a function of the free coordinates, and Levenberg–Marquardt on it.</summary>
    private sealed class Peak
    {
        private readonly IndicatrixPrior _prior;
        private readonly SeriesObservation _series;
        private readonly double _shift, _offsetVariance;
        private readonly bool[]? _nearLimit;
        private readonly IndicatrixPrior.Family _family;
        private readonly int _group;
        private readonly bool _biaxial, _freeBirefringence, _freeBeta;
        private readonly FacetOrientation _origin;
        private readonly double[] _edges;
        private readonly double[] _x;
        private readonly double _scale;
        // The level's spread for the last shape's extra σ (the same for almost every shape of a family).
        private long _spreadExtra = -1;
        private SectionLikelihood.LevelSpread _spread;
        // The start's azimuth at the origin (biaxial): the climb moves it by δ.
        private readonly double _startAzimuth;
        // What the last point worked out shares with its neighbours, and the same for the climb's current point (its
        // anchor): the Jacobian and the curvature move one or two coordinates at a time, so many of their points have the
        // anchor's shape or the anchor's facet normal. Kept with the coordinates they were worked out from (compared bit for bit).
        private Polar _last, _anchorPolar;
        private ShapeAtPoint _lastShape, _anchorShape;

        private readonly record struct Polar(long First, long Second, Direction Normal, Direction Travel, Direction V, double LogDensity);

        private readonly record struct ShapeAtPoint(long B, long U, IndicatrixPrior.Shape? Shape, double LogWeight);

        private static readonly double LogPi = Math.Log(Math.PI);
        private static readonly Direction AlongY = Direction.AlongY;
        private readonly SectionLikelihood.NoiseTerms _noise;

        public Peak(IndicatrixPrior prior, SeriesObservation series, double shift, double offsetVariance, bool[]? nearLimit,
            IndicatrixPrior.Shape shape, FacetOrientation origin)
        {
            (_prior, _series, _shift, _offsetVariance, _nearLimit, _origin) = (prior, series, shift, offsetVariance, nearLimit, origin);
            _noise = SectionLikelihood.NoiseTerms.For(series, nearLimit, series.NoiseVariance);
            _group = shape.Group;
            _family = prior.Families[_group];
            _biaxial = _family.Biaxial;
            _freeBirefringence = _family.BirefringenceHigh - _family.BirefringenceLow >= IndicatrixPrior.NarrowBox;
            var (uLow, uHigh) = _biaxial ? IndicatrixPrior.BetaBox(_family, shape.Birefringence) : (0, 0);
            _freeBeta = _biaxial && uHigh - uLow >= IndicatrixPrior.NarrowBox;
            _edges = new double[2 * series.PaddedCount];
            _scale = 1 / Math.Sqrt(series.NoiseVariance);
            _startAzimuth = Math.Atan2(origin.SinStart, origin.CosStart);
            _last = _anchorPolar = new Polar(-1, -1, default, default, default, 0);
            _lastShape = _anchorShape = new ShapeAtPoint(-1, -1, null, 0);
            var x = new List<double>();
            if (_biaxial) x.AddRange([0, 0, 0]);
            else x.AddRange(UniaxialStart(origin));
            if (_freeBirefringence) x.Add(shape.Birefringence / ShapeUnit);
            if (_freeBeta) x.Add(shape.BetaAboveAlpha / ShapeUnit);
            _x = [.. x];
            _fixedBirefringence = shape.Birefringence;
            _fixedBeta = shape.BetaAboveAlpha;
        }

        private readonly double _fixedBirefringence, _fixedBeta;

        /// <summary>
        /// A uniaxial indicatrix is round about z, so only the polar angle θ of N and the start ψ0 measured from the
        /// optic axis' projection matter; with N = (sin θ, 0, cos θ), u = (cos θ, 0, −sin θ), v = N × u = (0, 1, 0).
        /// A start of the other sense is its mirror image in the y axis: ψ0 → −ψ0.
        /// </summary>
        private static double[] UniaxialStart(FacetOrientation o)
        {
            var n = o.Normal;
            double theta = Math.Acos(Math.Min(1, Math.Abs(n.Z)));
            double azimuth = Math.Atan2(n.Y, n.X);
            double s0x = o.CosStart * o.U.X + o.SinStart * o.V.X, s0y = o.CosStart * o.U.Y + o.SinStart * o.V.Y, s0z = o.CosStart * o.U.Z + o.SinStart * o.V.Z;
            // Rotate about z by −azimuth so that N lies in the xz plane.
            double rx = Math.Cos(azimuth) * s0x + Math.Sin(azimuth) * s0y, ry = -Math.Sin(azimuth) * s0x + Math.Cos(azimuth) * s0y;
            double e1 = rx * Math.Cos(theta) - s0z * Math.Sin(theta); // the octant's normals have z ≥ 0
            double psi = Math.Atan2(ry, e1);
            return [theta, o.Sense > 0 ? psi : -psi];
        }

        /// <summary>The log-integrand at <paramref name="x"/> (−∞ outside the prior's box), and the centred residuals in σ.</summary>
        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        private double Value(double[] x, bool final, out double tail, double[] residuals, out int count)
        {
            tail = 0;
            count = 0;
            int i = _biaxial ? 3 : 2;
            double b = _freeBirefringence ? x[i++] * ShapeUnit : _fixedBirefringence;
            double u = _freeBeta ? x[i] * ShapeUnit : _fixedBeta;
            long bBits = BitConverter.DoubleToInt64Bits(b), uBits = BitConverter.DoubleToInt64Bits(u);
            var at = bBits == _anchorShape.B && uBits == _anchorShape.U ? _anchorShape
                : bBits == _lastShape.B && uBits == _lastShape.U ? _lastShape
                : IndicatrixPrior.ShapeAt(_family, _group, b, u) is { } found
                    ? new ShapeAtPoint(bBits, uBits, found, Math.Log(found.Weight)) : new ShapeAtPoint(bBits, uBits, null, 0);
            _lastShape = at;
            if (at.Shape is not { } shape || !(shape.Weight > 0)) return double.NegativeInfinity;
            var (orientation, logDensity) = Orientation(x);
            SectionLikelihood.SectionEdges(orientation, shape, _series, _edges);
            long extraBits = BitConverter.DoubleToInt64Bits(shape.ExtraSigma);
            if (extraBits != _spreadExtra) (_spreadExtra, _spread) = (extraBits, _noise.Spread(_offsetVariance, shape.ExtraSigma));
            var fit = SectionLikelihood.Integrate(_edges, new SectionLikelihood.EdgeIndex(0, 1, _series.PaddedCount), _series, _noise,
                _spread, _shift, _nearLimit, shape, _prior.LevelDensity, withTail: final, residuals: residuals);
            tail = fit.Tail;
            count = fit.Readings;
            double scale = _scale;
            for (int k = 0; k < count; k++) residuals[k] *= scale;
            return fit.LogValue + at.LogWeight + logDensity;
        }

        /// <summary>The orientation at x and the log of its density (uniform over the octant, the start and the sense: 1/π²).</summary>
        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        private (FacetOrientation, double) Orientation(double[] x)
        {
            long first = BitConverter.DoubleToInt64Bits(x[0]), second = _biaxial ? BitConverter.DoubleToInt64Bits(x[1]) : 0;
            var polar = first == _anchorPolar.First && second == _anchorPolar.Second ? _anchorPolar
                : first == _last.First && second == _last.Second ? _last
                : NewPolar(x, first, second);
            _last = polar;
            if (!_biaxial)
            {
                double psi = x[1];
                return (new FacetOrientation(polar.Normal, polar.Travel, polar.V, Math.Cos(psi), Math.Sin(psi), 1), polar.LogDensity);
            }
            double start = _startAzimuth + x[2];
            return (new FacetOrientation(polar.Normal, polar.Travel, polar.V, Math.Cos(start), Math.Sin(start), _origin.Sense), polar.LogDensity);
        }

        /// <summary>The facet normal, the travel basis and the log density for the polar coordinates (θ; or a and c).</summary>
        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        private Polar NewPolar(double[] x, long first, long second)
        {
            if (!_biaxial)
            {
                double theta = x[0], sin = Math.Sin(theta), cos = Math.Cos(theta);
                var n = new Direction(sin, 0, cos);
                var u = new Direction(cos, 0, -sin);
                // Density of (θ, ψ0): sin θ over θ in [0°, 90°], times 1/π over ψ0.
                return new Polar(first, second, n, u, AlongY, Math.Log(Math.Abs(sin) + 1e-300) - LogPi);
            }
            double a = x[0], c = x[1];
            var o = _origin;
            var normal = new Direction(o.Normal.X + a * o.U.X + c * o.V.X, o.Normal.Y + a * o.U.Y + c * o.V.Y, o.Normal.Z + a * o.U.Z + c * o.V.Z);
            double along = o.U.Dot(normal);
            var travel = new Direction(o.U.X - along * normal.X, o.U.Y - along * normal.Y, o.U.Z - along * normal.Z);
            var v = Direction.Cross(normal, travel);
            // The tangent-plane chart N = (N0 + a·u + c·v)/|…| has area element (1 + a² + c²)^(−3/2) da dc.
            return new Polar(first, second, normal, travel, v, -2 * LogPi - 1.5 * Math.Log(1 + a * a + c * c));
        }

        /// <summary>The work arrays for climbs in d dimensions on series of up to m/2 steps (reused climb after climb).</summary>
        internal sealed class Buffers
        {
            /// <summary>One prior's buffers by dimension, shared by its climbs (which run one after another).</summary>
            internal sealed class Set
            {
                private readonly Buffers?[] _byDimension = new Buffers?[8];

                /// <summary>The buffers for d dimensions, with room for m residuals.</summary>
                public Buffers For(int d, int m)
                {
                    if (d >= _byDimension.Length) return new Buffers(d, m);
                    return _byDimension[d] is { } b && b.M >= m ? b : _byDimension[d] = new Buffers(d, m);
                }
            }

            private Buffers(int d, int m)
            {
                M = m;
                (X, Trial, Step, Gradient, Work, Moved) = (new double[d], new double[d], new double[d], new double[d], new double[d], new double[d]);
                (R, TrialResiduals, Column) = (new double[m], new double[m], new double[m]);
                (Jacobian, Curvature, Factor) = (new double[m * d], new double[d * d], new double[d * d]);
            }

            public int M { get; }
            public double[] X { get; }
            public double[] Trial { get; }
            public double[] Step { get; }
            public double[] Gradient { get; }
            public double[] Work { get; }
            public double[] Moved { get; }
            public double[] R { get; }
            public double[] TrialResiduals { get; }
            public double[] Column { get; }
            public double[] Jacobian { get; }
            public double[] Curvature { get; }
            public double[] Factor { get; }
        }

        /// <summary>Keeps what the last point worked out as the climb's current point's.</summary>
        private void Anchor() => (_anchorPolar, _anchorShape) = (_last, _lastShape);

        /// <summary>
        /// Levenberg–Marquardt on the residuals (Gauss–Newton with a damping that shrinks on success), then Laplace's
        /// method with the full curvature of the log-integrand at the peak (central differences).
        /// </summary>
        /// <remarks>
        /// A climb that ends on a peak already counted (<paramref name="known"/> on its predicted edges) stops there, before
        /// the curvature: that peak is counted once whatever its width.
        /// </remarks>
        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        public bool Climb(Func<double[], bool> known, Buffers.Set buffersByDimension, out double logIntegral, out double tail, out double[] edges)
        {
            logIntegral = double.NegativeInfinity;
            edges = [];
            int d = _x.Length, m = 2 * _series.Count;
            // Matrices are flat, row-major d×d (d ≤ 5), in the thread's buffers for this dimension: the climb runs for every
            // start of every material on every stone. Every entry is written in this climb before it is read.
            var buffers = buffersByDimension.For(d, m);
            double[] x = buffers.X, trial = buffers.Trial, step = buffers.Step, gradient = buffers.Gradient, work = buffers.Work;
            double[] r = buffers.R, trialResiduals = buffers.TrialResiduals, column = buffers.Column;
            double[] jacobian = buffers.Jacobian, curvature = buffers.Curvature, factor = buffers.Factor;
            Array.Copy(_x, x, d);
            double value = Value(x, false, out tail, r, out int count);
            Anchor();
            if (!double.IsFinite(value)) return false;
            double damping = 1e-3;
            for (int iteration = 0; iteration < Iterations; iteration++)
            {
                if (!Jacobian(x, r, count, jacobian, column)) return false;
                NormalEquations(jacobian, r, count, d, gradient, curvature);
                bool moved = false;
                for (int attempt = 0; attempt < 4 && !moved; attempt++)
                {
                    if (!Solve(curvature, gradient, damping, step, factor, work)) Array.Clear(step);
                    Limit(step);
                    for (int i = 0; i < d; i++) trial[i] = x[i] + step[i];
                    double v = Value(trial, false, out _, trialResiduals, out int trialCount);
                    if (v > value)
                    {
                        (x, trial) = (trial, x);
                        Anchor();
                        (value, count, moved) = (v, trialCount, true);
                        Array.Copy(trialResiduals, r, m);
                        damping = Math.Max(damping / 4, 1e-6);
                    }
                    else damping *= 8;
                }
                double largest = 0;
                for (int i = 0; i < d; i++) largest = Math.Max(largest, Math.Abs(step[i]));
                if (!moved || largest < 1e-4) break;
            }
            // The value, goodness of fit and predicted edges at the peak (r keeps the same residuals).
            value = Value(x, true, out tail, r, out _);
            Anchor();
            // The predicted edges, low then high (Same compares every one, in any order).
            edges = [.. _edges.AsSpan(0, _series.Count), .. _edges.AsSpan(_series.PaddedCount, _series.Count)];
            if (known(edges)) return false;
            // The peak's width from the full curvature of the log-integrand (level density, edge-count factors and the prior
            // included); the Gauss–Newton curvature stands in when that is not negative definite.
            FullCurvature(x, value, r, curvature, buffers.Moved);
            double logDeterminant = LogDeterminant(Bounded(curvature, x), d, factor);
            if (!double.IsFinite(logDeterminant))
            {
                // The curvature's neighbouring points wrote over r: the peak's residuals again before the Jacobian.
                Value(x, false, out _, r, out count);
                if (!Jacobian(x, r, count, jacobian, column)) return false;
                NormalEquations(jacobian, r, count, d, gradient, curvature);
                logDeterminant = LogDeterminant(Bounded(curvature, x), d, factor);
            }
            if (!double.IsFinite(logDeterminant)) return false;
            int shapeDimensions = (_freeBirefringence ? 1 : 0) + (_freeBeta ? 1 : 0);
            logIntegral = value + d / 2.0 * Math.Log(2 * Math.PI) - logDeterminant / 2 + shapeDimensions * Math.Log(ShapeUnit);
            return true;
        }

        /// <summary>
        /// Adds to each coordinate's curvature 2π/range², so that no direction is wider than its whole range: along a flat
        /// direction (a biaxial shape with β at α is round about an axis) the Gaussian would otherwise claim far more than
        /// the parameter's domain. The orientation angles' range is taken as π; the shape's, its box.
        /// </summary>
        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        private double[] Bounded(double[] curvature, double[] x)
        {
            int d = x.Length, angles = _biaxial ? 3 : 2;
            for (int i = 0; i < d; i++)
            {
                double range = i < angles ? Math.PI
                    : i == angles && _freeBirefringence ? (_family.BirefringenceHigh - _family.BirefringenceLow) / ShapeUnit
                    : BetaWidth(x) / ShapeUnit;
                curvature[i * d + i] += 2 * Math.PI / Math.Max(range * range, 1e-12);
            }
            return curvature;
        }

        private double BetaWidth(double[] x)
        {
            double b = _freeBirefringence ? x[3] * ShapeUnit : _fixedBirefringence;
            var (low, high) = IndicatrixPrior.BetaBox(_family, b);
            return high - low;
        }

        /// <summary>−∂²ℓ/∂x² by central differences of the log-integrand itself, into <paramref name="curvature"/>.</summary>
        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        private void FullCurvature(double[] x, double centre, double[] scratch, double[] curvature, double[] y)
        {
            int d = x.Length, angles = _biaxial ? 3 : 2;
            Span<double> h = stackalloc double[d];
            for (int i = 0; i < d; i++) h[i] = i < angles ? 0.004 : 0.05;
            for (int i = 0; i < d; i++)
            {
                curvature[i * d + i] = -(Moved(x, y, centre, scratch, i, h[i], i, 0) - 2 * centre + Moved(x, y, centre, scratch, i, -h[i], i, 0)) / (h[i] * h[i]);
                for (int j = 0; j < i; j++)
                    curvature[i * d + j] = curvature[j * d + i] =
                        -(Moved(x, y, centre, scratch, i, h[i], j, h[j]) - Moved(x, y, centre, scratch, i, h[i], j, -h[j])
                          - Moved(x, y, centre, scratch, i, -h[i], j, h[j]) + Moved(x, y, centre, scratch, i, -h[i], j, -h[j])) / (4 * h[i] * h[j]);
            }
        }

        /// <summary>The log-integrand at x moved by di along i and dj along j; outside the box, a steep wall.</summary>
        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        private double Moved(double[] x, double[] y, double centre, double[] scratch, int i, double di, int j, double dj)
        {
            Array.Copy(x, y, x.Length);
            y[i] += di;
            y[j] += dj;
            double v = Value(y, false, out _, scratch, out _);
            return double.IsFinite(v) ? v : centre - 1e3;
        }

        /// <summary>∂r/∂x by forward differences (row-major m×d); false when the readings' pairing changes under a small move (no smooth peak).</summary>
        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        private bool Jacobian(double[] x, double[] r, int count, double[] jacobian, double[] column)
        {
            int angles = _biaxial ? 3 : 2, d = x.Length;
            for (int i = 0; i < d; i++)
            {
                double h = i < angles ? 0.002 : 0.02;
                double keep = x[i];
                x[i] = keep + h;
                double v = Value(x, false, out _, column, out int n);
                if (!double.IsFinite(v) || n != count)
                {
                    x[i] = keep - h; // at the box's wall: step the other way
                    v = Value(x, false, out _, column, out n);
                    h = -h;
                }
                x[i] = keep;
                if (!double.IsFinite(v) || n != count) return false;
                for (int k = 0; k < count; k++) jacobian[k * d + i] = (column[k] - r[k]) / h;
            }
            return true;
        }

        /// <summary>The gradient −Jᵀr and the Gauss–Newton matrix JᵀJ, into the given buffers.</summary>
        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        private static void NormalEquations(double[] jacobian, double[] r, int count, int d, double[] gradient, double[] normal)
        {
            for (int i = 0; i < d; i++)
            {
                double g = 0;
                for (int k = 0; k < count; k++) g -= jacobian[k * d + i] * r[k];
                gradient[i] = g;
                for (int j = 0; j <= i; j++)
                {
                    double a = 0;
                    for (int k = 0; k < count; k++) a += jacobian[k * d + i] * jacobian[k * d + j];
                    normal[i * d + j] = normal[j * d + i] = a;
                }
            }
        }

        /// <summary>Solves (A + μ·diag(A)) Δ = g by Cholesky into <paramref name="step"/>; false when not positive definite.</summary>
        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        private static bool Solve(double[] normal, double[] gradient, double damping, double[] step, double[] factor, double[] work)
        {
            int d = gradient.Length;
            Span<double> a = stackalloc double[d * d];
            for (int i = 0; i < d; i++)
                for (int j = 0; j < d; j++) a[i * d + j] = normal[i * d + j] + (i == j ? damping * normal[i * d + i] + 1e-9 : 0);
            if (!Cholesky(a, d, factor)) return false;
            for (int i = 0; i < d; i++)
            {
                double s = gradient[i];
                for (int k = 0; k < i; k++) s -= factor[i * d + k] * work[k];
                work[i] = s / factor[i * d + i];
            }
            for (int i = d - 1; i >= 0; i--)
            {
                double s = work[i];
                for (int k = i + 1; k < d; k++) s -= factor[k * d + i] * step[k];
                step[i] = s / factor[i * d + i];
            }
            return true;
        }

        private void Limit(double[] step)
        {
            int angles = _biaxial ? 3 : 2;
            for (int i = 0; i < step.Length; i++)
            {
                double cap = i < angles ? AngleStepCap : ValueStepCap;
                step[i] = Math.Clamp(step[i], -cap, cap);
            }
        }

        /// <summary>The Cholesky factor L of a symmetric d×d matrix A = L Lᵀ into <paramref name="l"/>; false when A is not positive definite.</summary>
        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        private static bool Cholesky(ReadOnlySpan<double> a, int d, double[] l)
        {
            Array.Clear(l);
            for (int i = 0; i < d; i++)
                for (int j = 0; j <= i; j++)
                {
                    double s = a[i * d + j];
                    for (int k = 0; k < j; k++) s -= l[i * d + k] * l[j * d + k];
                    if (i == j)
                    {
                        if (!(s > 0)) return false;
                        l[i * d + i] = Math.Sqrt(s);
                    }
                    else l[i * d + j] = s / l[j * d + j];
                }
            return true;
        }

        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        private static double LogDeterminant(double[] a, int d, double[] l)
        {
            if (!Cholesky(a, d, l)) return double.NaN;
            double sum = 0;
            for (int i = 0; i < d; i++) sum += 2 * Math.Log(l[i * d + i]);
            return sum;
        }
    }
}
