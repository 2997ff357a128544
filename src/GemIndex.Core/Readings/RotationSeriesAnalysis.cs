using System.Globalization;
using GemIndex.Core.Optics;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Core.Quantities;
using GemIndex.Core.Optics.Refractometer;

namespace GemIndex.Core.Readings;

/// <summary>
/// Turns a refractometer rotation series into optic character, principal indices, birefringence and sign
/// (the section model of the indicatrix: every section's semi-axes satisfy α ≤ low ≤ β ≤ high ≤ γ;
/// a uniaxial stone always shows ω as one edge; see docs/ranking.md).
/// <list type="bullet">
/// <item>One edge, constant: isotropic.</item>
/// <item>Two edges, one constant: uniaxial, the constant edge ω (sign from which edge moves); both constant: uniaxial
/// with the facet across the optic axis, sign undecided, both signs carried.</item>
/// <item>Both edges moving: biaxial, α = lowest low, γ = highest high, β = the highest low or the lowest high — the
/// series cannot tell which, so both hypotheses are carried with equal weight.</item>
/// <item>Steps covering less than half the half-turn (largest gap over 90°): character undetermined; only the bounds
/// low ∈ [α, β], high ∈ [β, γ] are used.</item>
/// </list>
/// An edge is "constant" when all its readings but at most one lie within 4σ of their median; a lone reading
/// outside that band is reported as a likely misreading and left out, unless every reading follows one smoothly moving
/// edge (within 2σ of the harmonic through them all: the edges of a uniaxial stone meeting at one step). Low edges above the high edges of other steps
/// (impossible for any orientation) are reported too.
/// </summary>
public static class RotationSeriesAnalysis
{
    /// <summary>Band (in reading standard deviations) within which an edge counts as constant.</summary>
    public const double ConstantBandSigmas = 4;

    /// <summary>Largest gap between steps (degrees) for which the optic character is decided.</summary>
    public const double MaximumGapForCharacter = 90;

    /// <summary>Analyses a rotation series.</summary>
    /// <param name="steps">The steps in any order; at least one.</param>
    /// <param name="readingPrecision">Standard uncertainty of one reading (0.0001–0.05).</param>
    /// <param name="calibrationOffset">Added to every reading (−0.05 to 0.05).</param>
    /// <exception cref="QuantityOutOfRangeException">No steps, or precision or offset out of range.</exception>
    public static RotationSeriesResult Analyse(IReadOnlyList<ShadowEdgeStep> steps, double readingPrecision, double calibrationOffset = 0)
    {
        var (s, sigma, band, gap) = Prepared(steps, readingPrecision, calibrationOffset);
        var misreadings = new List<string>();

        bool twoEdges = s.Any(x => x.High is { } h && h - x.Low > band);
        if (!twoEdges)
            return SingleEdge(s, sigma, band, gap, misreadings);

        var both = s.Where(x => x.High is not null).ToList();
        var lowOnly = LowEdgesOnly(s, both, band);
        if (gap > MaximumGapForCharacter || both.Count < 2)
            return Partial(both, lowOnly, LargestGapSpan(s.Select(x => x.RotationDegrees)), sigma, misreadings)
                with { HighHiddenAtDegrees = [.. lowOnly.Select(x => x.RotationDegrees)], HighestHighRead = both.Max(x => x.High!.Value) };

        var (lows, highs, lowEdge, highEdge) = Edges(both, lowOnly, sigma, band, gap, misreadings);
        bool lowConstant = Spread(lows) <= band;
        bool highConstant = Spread(highs) <= band;
        var result = lowConstant || highConstant
            ? Uniaxial(lows, highs, lowEdge, highEdge, lowConstant, highConstant, sigma, gap, misreadings)
            : Biaxial(lows, highs, lowEdge, highEdge, sigma, band, gap, misreadings);
        return result with { HighHiddenAtDegrees = [.. lowOnly.Select(x => x.RotationDegrees)], HighestHighRead = both.Max(x => x.High!.Value) };
    }

    /// <summary>
    /// The steps that show only a low edge, well below every high edge read at the other steps (by more than the
    /// constant-edge band): there the high edge lay past the liquid, or went unread. Their low edge is still a reading of
    /// the low edge (it had been dropped with the step, so the lowest index and the highest low edge came out of the
    /// other steps alone). A single edge at the level of the high edges is where the two meet, and stays out.
    /// </summary>
    private static List<ShadowEdgeStep> LowEdgesOnly(List<ShadowEdgeStep> s, List<ShadowEdgeStep> both, double band)
    {
        double lowestHigh = both.Min(x => x.High!.Value);
        return [.. s.Where(x => x.High is null && OneEdgeIsTheLow(x.Low, lowestHigh, band))];
    }

    /// <summary>
    /// Whether a step read with one edge, among steps that read two, read its low edge (the high one unseen): its edge
    /// lies below every high edge read (<paramref name="lowestHighRead"/>) by more than <paramref name="band"/> (the
    /// constant-edge band, <see cref="ConstantBandSigmas"/> σ); otherwise the two edges meet there. The one rule for
    /// the analysis and the edge plot.
    /// </summary>
    public static bool OneEdgeIsTheLow(double edge, double lowestHighRead, double band) => edge < lowestHighRead - band;

    /// <summary>
    /// The readings of a two-edge series as each doubly refractive character would give them, whatever the constant-edge
    /// band says: uniaxial positive (the low edge as ω), uniaxial negative (the high edge as ω) and biaxial (β at either
    /// inner extreme). For weighing by what the readings say of the character (its posterior), never for ranking; null
    /// when the series cannot show which edge moves (one edge, one step with both edges, or a gap over 90°).
    /// </summary>
    /// <param name="steps">The steps in any order; at least one.</param>
    /// <param name="readingPrecision">Standard uncertainty of one reading (0.0001–0.05).</param>
    /// <param name="calibrationOffset">Added to every reading (−0.05 to 0.05).</param>
    /// <exception cref="QuantityOutOfRangeException">No steps, or precision or offset out of range.</exception>
    public static IReadOnlyList<SeriesInterpretation>? EveryCharacter(IReadOnlyList<ShadowEdgeStep> steps, double readingPrecision, double calibrationOffset = 0)
    {
        var (s, sigma, band, gap) = Prepared(steps, readingPrecision, calibrationOffset);
        var both = s.Where(x => x.High is not null).ToList();
        if (!s.Any(x => x.High is { } h && h - x.Low > band) || gap > MaximumGapForCharacter || both.Count < 2) return null;
        // The misreadings are the analysis' own to report; here only the readings left after them count.
        var unreported = new List<string>();
        var (lows, highs, lowEdge, highEdge) = Edges(both, LowEdgesOnly(s, both, band), sigma, band, gap, unreported);
        return
        [
            .. Uniaxial(lows, highs, lowEdge, highEdge, lowConstant: true, highConstant: false, sigma, gap, unreported).Interpretations,
            .. Uniaxial(lows, highs, lowEdge, highEdge, lowConstant: false, highConstant: true, sigma, gap, unreported).Interpretations,
            .. Biaxial(lows, highs, lowEdge, highEdge, sigma, band, gap, unreported).Interpretations,
        ];
    }

    /// <summary>
    /// The low edges of the steps that show both and of those whose high edge went unseen (<see cref="LowEdgesOnly"/>), the
    /// high edges of the steps that show both, a lone stray of each left out (and named), and each edge's extremes.
    /// </summary>
    private static (List<EdgeValue> Lows, List<EdgeValue> Highs, MovingEdge LowEdge, MovingEdge HighEdge) Edges(
        List<ShadowEdgeStep> both, List<ShadowEdgeStep> lowOnly, double sigma, double band, double gap, List<string> misreadings)
    {
        var lows = EdgeValues([.. both.Concat(lowOnly).OrderBy(x => x.RotationDegrees)], x => x.Low, band, "low", misreadings);
        var highs = EdgeValues(both, x => x.High!.Value, band, "high", misreadings);
        return (lows, highs, MovingEdge.Of(lows, sigma, gap), MovingEdge.Of(highs, sigma, gap));
    }

    /// <summary>
    /// The finest reading precision a series is analysed with, 0.0001: a tenth of the scale's last printed place; a σ
    /// below it would make every rounding a contradiction.
    /// </summary>
    public const double SmallestReadingPrecision = 0.0001;

    /// <summary>The steps with the calibration applied, the reading's σ, the constant-edge band and the largest gap.</summary>
    private static (List<ShadowEdgeStep> Steps, double Sigma, double Band, double Gap) Prepared(IReadOnlyList<ShadowEdgeStep> steps, double readingPrecision, double calibrationOffset)
    {
        QuantityOutOfRangeException.ThrowIfOutside("number of rotation steps", steps.Count, 1, 1000);
        QuantityOutOfRangeException.ThrowIfOutside("reading precision", readingPrecision, SmallestReadingPrecision, RefractometerProfile.LargestReadingPrecision);
        QuantityOutOfRangeException.ThrowIfOutside("calibration offset", calibrationOffset, -0.05, 0.05);
        var s = steps.Select(x => new ShadowEdgeStep(x.RotationDegrees, x.Low + calibrationOffset, x.High + calibrationOffset)).ToList();
        return (s, readingPrecision, ConstantBandSigmas * readingPrecision, LargestGap(s.Select(x => x.RotationDegrees)));
    }

    private static RotationSeriesResult SingleEdge(List<ShadowEdgeStep> s, double sigma, double band, double gap, List<string> misreadings)
    {
        // Edges that coincide within the band count as one edge: their mean.
        var values = EdgeValues(s, x => x.High is { } h ? (x.Low + h) / 2 : x.Low, band, "single", misreadings);
        if (Spread(values) > band)
        {
            // One edge that moves: a doubly refractive stone read on one edge only, or misread.
            double lo = values.Min(v => v.Value), hi = values.Max(v => v.Value);
            return new RotationSeriesResult
            {
                Character = null,
                UndeterminedReason = $"only one shadow edge was recorded and it moves from {F(lo)} to {F(hi)}: a doubly refractive stone needs both edges",
                Interpretations = [new SeriesInterpretation
                {
                    Character = null, Lowest = Index(lo, Extreme(sigma)), Highest = Index(hi, Extreme(sigma)),
                    Birefringence = new Birefringence(hi - lo, sigma * Math.Sqrt(2)), SamplingShortfall = 1,
                    Description = $"one moving edge {F(lo)}–{F(hi)}: birefringence at least {Difference(hi, lo)}",
                }],
                Misreadings = misreadings,
                LargestGapDegrees = gap,
            };
        }
        double mean = values.Average(v => v.Value);
        var n = Index(mean, Mean(sigma, values.Count));
        return new RotationSeriesResult
        {
            Character = OpticCharacter.Isotropic,
            Interpretations = [new SeriesInterpretation
            {
                Character = OpticCharacter.Isotropic, Constant = n, Lowest = n, Highest = n,
                Birefringence = new Birefringence(0, sigma * Math.Sqrt(2)),
                Description = $"one constant edge: n {F(mean)} (singly refractive)",
            }],
            Misreadings = misreadings,
            LargestGapDegrees = gap,
        };
    }

    private static RotationSeriesResult Partial(List<ShadowEdgeStep> both, List<ShadowEdgeStep> lowOnly, (double Size, double From, double To) gapSpan,
        double sigma, List<string> misreadings)
    {
        double gap = gapSpan.Size;
        static string Degrees(double d) => d.ToString("0.#", CultureInfo.InvariantCulture) + "°";
        // The low edges of the steps whose high edge went unseen count too (LowEdgesOnly).
        double lo = both.Concat(lowOnly).Min(x => x.Low), hi = both.Max(x => x.High!.Value);
        return new RotationSeriesResult
        {
            Character = null,
            UndeterminedReason = both.Count < 2
                ? lowOnly.Count > 0 ? "only one step shows both edges, so the series alone cannot show which edge moves" : "a single rotation step cannot show which edge moves"
                : $"the steps leave {gap.ToString("0", CultureInfo.InvariantCulture)}° of the half turn unread, from {Degrees(gapSpan.From)} to {Degrees(gapSpan.To)}: read steps in that gap, leaving none over {MaximumGapForCharacter.ToString("0", CultureInfo.InvariantCulture)}°, to fix the optic character",
            Interpretations = [new SeriesInterpretation
            {
                Character = null, Lowest = Index(lo, Extreme(sigma)), Highest = Index(hi, Extreme(sigma)),
                Birefringence = new Birefringence(hi - lo, sigma * Math.Sqrt(2)), SamplingShortfall = 1,
                Description = $"two edges {F(lo)} and {F(hi)}: doubly refractive, birefringence at least {Difference(hi, lo)}",
            }],
            Misreadings = misreadings,
            LargestGapDegrees = gap,
        };
    }

    private static RotationSeriesResult Uniaxial(List<EdgeValue> lows, List<EdgeValue> highs, MovingEdge lowEdge, MovingEdge highEdge,
        bool lowConstant, bool highConstant, double sigma, double gap, List<string> misreadings)
    {
        var interpretations = new List<SeriesInterpretation>();
        double lowMean = lows.Average(v => v.Value), highMean = highs.Average(v => v.Value);
        double weight = lowConstant && highConstant ? 0.5 : 1;
        if (lowConstant)
        {
            // ω is the constant low edge; ε is the extreme of the moving (or, if both are constant, the other) edge.
            var epsilon = highConstant ? Index(highMean, Mean(sigma, highs.Count)) : highEdge.Maximum;
            var omega = Index(lowMean, Mean(sigma, lows.Count));
            interpretations.Add(new SeriesInterpretation
            {
                Character = OpticCharacter.Uniaxial, Weight = weight, Sign = OpticSign.Positive, Constant = omega, Lowest = omega, Highest = epsilon,
                Birefringence = new Birefringence(Math.Max(0, epsilon.Value - lowMean), double.Hypot(epsilon.StandardUncertainty, sigma / 2)),
                SamplingShortfall = highConstant ? 0 : highEdge.Shortfall,
                Description = $"uniaxial positive: ω {F(lowMean)} constant, ε {F(epsilon.Value)}, birefringence {Difference(epsilon.Value, lowMean)}",
            });
        }
        if (highConstant)
        {
            var epsilon = lowConstant ? Index(lowMean, Mean(sigma, lows.Count)) : lowEdge.Minimum;
            var omega = Index(highMean, Mean(sigma, highs.Count));
            interpretations.Add(new SeriesInterpretation
            {
                Character = OpticCharacter.Uniaxial, Weight = weight, Sign = OpticSign.Negative, Constant = omega, Highest = omega, Lowest = epsilon,
                Birefringence = new Birefringence(Math.Max(0, highMean - epsilon.Value), double.Hypot(epsilon.StandardUncertainty, sigma / 2)),
                SamplingShortfall = lowConstant ? 0 : lowEdge.Shortfall,
                Description = $"uniaxial negative: ω {F(highMean)} constant, ε {F(epsilon.Value)}, birefringence {Difference(highMean, epsilon.Value)}",
            });
        }
        return new RotationSeriesResult
        {
            Character = OpticCharacter.Uniaxial,
            Interpretations = interpretations,
            Misreadings = misreadings,
            LargestGapDegrees = gap,
        };
    }

    private static RotationSeriesResult Biaxial(List<EdgeValue> lows, List<EdgeValue> highs, MovingEdge lowEdge, MovingEdge highEdge,
        double sigma, double band, double gap, List<string> misreadings)
    {
        var alpha = lowEdge.Minimum;
        var gamma = highEdge.Maximum;
        double lowMax = lows.Max(v => v.Value), highMin = highs.Min(v => v.Value);
        if (lowMax > highMin + band)
        {
            // Every low edge lies at or below β and every high edge at or above it: no orientation gives this.
            var lowStep = lows.First(v => v.Value == lowMax);
            var highStep = highs.First(v => v.Value == highMin);
            misreadings.Add($"step at {D(lowStep.Rotation)}: low edge {F(lowMax)} lies above the high edge {F(highMin)} of the step at {D(highStep.Rotation)}; no orientation of any crystal gives that: re-read both steps");
        }
        var birefringence = new Birefringence(Math.Max(0, gamma.Value - alpha.Value), double.Hypot(alpha.StandardUncertainty, gamma.StandardUncertainty));
        double shortfall = Math.Max(lowEdge.Shortfall, highEdge.Shortfall);
        SeriesInterpretation With(RefractiveIndex beta, string which, double weight)
        {
            bool positive = gamma.Value - beta.Value > beta.Value - alpha.Value;
            return new()
            {
                Character = OpticCharacter.Biaxial, Weight = weight, Sign = positive ? OpticSign.Positive : OpticSign.Negative,
                Lowest = alpha, Highest = gamma, Beta = beta, Birefringence = birefringence, SamplingShortfall = shortfall,
                Description = $"biaxial {(positive ? "positive" : "negative")} {which}: α {F(alpha.Value)}, β {F(beta.Value)}, γ {F(gamma.Value)}, birefringence {Difference(gamma.Value, alpha.Value)}",
            };
        }
        return new RotationSeriesResult
        {
            Character = OpticCharacter.Biaxial,
            // β is an inner extreme, where the edges can turn sharply (near an optic axis): the readings themselves serve best.
            // Where the highest low edge and the lowest high edge read the same, the two readings of β are one.
            Interpretations = F(lowMax) == F(highMin)
                ? [With(Index(lowMax, Extreme(sigma)), "with β where the low and high edges meet", 1)]
                : [With(Index(lowMax, Extreme(sigma)), "if β is the highest low edge", 0.5), With(Index(highMin, Extreme(sigma)), "if β is the lowest high edge", 0.5)],
            Misreadings = misreadings,
            LargestGapDegrees = gap,
        };
    }

    /// <summary>
    /// The extremes of one edge over the half turn. With four or more rotation angles and no gap over 90°, the edge is fitted
    /// by least squares with n(φ) = a + b·cos 2φ + c·sin 2φ (exact for 1/n² of a uniaxial stone's moving edge, and close for
    /// small birefringence), and the extremes are a ± √(b² + c²): all readings count, so neither noise (the largest of k
    /// noisy readings overshoots) nor coarse steps (the true extreme falls between steps) bias them. When the fit is poor
    /// (residuals over 2σ, as near a biaxial stone's optic axis) the largest and smallest readings are used, with the
    /// sampling shortfall sin²(g/2) carried into the likelihood.
    /// </summary>
    internal readonly record struct MovingEdge(RefractiveIndex Minimum, RefractiveIndex Maximum, double Shortfall)
    {
        public static MovingEdge Of(List<EdgeValue> values, double sigma, double gap)
        {
            double min = values.Min(v => v.Value), max = values.Max(v => v.Value);
            var raw = new MovingEdge(Index(min, Extreme(sigma)), Index(max, Extreme(sigma)), Math.Pow(Math.Sin(gap * Math.PI / 360), 2));
            int distinct = values.Select(v => Math.Round(((v.Rotation % 180) + 180) % 180, 6)).Distinct().Count();
            if (distinct < 4) return raw;
            double[] x = [.. values.Select(v => v.Rotation * Math.PI / 90)];
            double[] y = [.. values.Select(v => v.Value)];
            double[] p = HarmonicFit(x, y);
            double rms = Math.Sqrt(x.Select((t, i) => Math.Pow(y[i] - (p[0] + p[1] * Math.Cos(t) + p[2] * Math.Sin(t)), 2)).Average());
            if (rms > 2 * sigma) return raw;
            double amplitude = double.Hypot(p[1], p[2]);
            double s = Math.Sqrt(3 * sigma * sigma / values.Count + sigma * sigma / 4);
            return new MovingEdge(Index(p[0] - amplitude, s), Index(p[0] + amplitude, s), 0);
        }

        /// <summary>
        /// Least squares y ≈ a + b·cos x + c·sin x through the 3×3 normal equations, solved by Cramer's rule (the same
        /// solution as MathNet's Fit.LinearCombination, which the tests compare against, without its allocations:
        /// this runs on every keystroke).
        /// </summary>
        internal static double[] HarmonicFit(double[] x, double[] y)
        {
            double n = x.Length, sc = 0, ss = 0, scc = 0, sss = 0, scs = 0, sy = 0, syc = 0, sys = 0;
            for (int i = 0; i < x.Length; i++)
            {
                double c = Math.Cos(x[i]), s = Math.Sin(x[i]);
                sc += c; ss += s; scc += c * c; sss += s * s; scs += c * s;
                sy += y[i]; syc += y[i] * c; sys += y[i] * s;
            }
            double Det(double a, double b, double c, double d, double e, double f, double g, double h, double k) =>
                a * (e * k - f * h) - b * (d * k - f * g) + c * (d * h - e * g);
            double det = Det(n, sc, ss, sc, scc, scs, ss, scs, sss);
            return
            [
                Det(sy, sc, ss, syc, scc, scs, sys, scs, sss) / det,
                Det(n, sy, ss, sc, syc, scs, ss, sys, sss) / det,
                Det(n, sc, sy, sc, scc, syc, ss, scs, sys) / det,
            ];
        }
    }

    internal readonly record struct EdgeValue(double Rotation, double Value);

    /// <summary>The edge's readings, less a lone reading far from an otherwise constant edge (reported as a misreading).</summary>
    private static List<EdgeValue> EdgeValues(List<ShadowEdgeStep> steps, Func<ShadowEdgeStep, double> edge, double band, string name, List<string> misreadings)
    {
        var values = steps.Select(x => new EdgeValue(x.RotationDegrees, edge(x))).ToList();
        if (values.Count < 4) return values;
        double median = Median(values.Select(v => v.Value));
        var outside = values.Where(v => Math.Abs(v.Value - median) > band).ToList();
        if (outside.Count != 1) return values;
        var odd = outside[0];
        var rest = values.Where(v => v != odd).ToList();
        if (Spread(rest) > band) return values; // a moving edge, not a constant one with a stray reading
        // An edge that moves smoothly and meets the other at one step (a uniaxial stone with its optic axis in the facet:
        // 1.553, 1.550, 1.544, 1.550) follows n(φ) = a + b·cos 2φ + c·sin 2φ through every reading; a stray does not.
        if (FollowsHarmonic(values, band / ConstantBandSigmas)) return values;
        misreadings.Add($"step at {D(odd.Rotation)}: {name} edge {F(odd.Value)} departs by {F(Math.Abs(odd.Value - median))} from an edge otherwise constant at {F(median)}; likely misread, left out");
        values.Remove(odd);
        return values;
    }

    private static double Spread(List<EdgeValue> values) => values.Max(v => v.Value) - values.Min(v => v.Value);

    /// <summary>Whether every reading lies within 2σ of the harmonic fitted through all of them (four or more rotations over the half turn).</summary>
    private static bool FollowsHarmonic(List<EdgeValue> values, double sigma)
    {
        if (values.Select(v => Math.Round(((v.Rotation % 180) + 180) % 180, 6)).Distinct().Count() < 4) return false;
        double[] x = [.. values.Select(v => v.Rotation * Math.PI / 90)];
        double[] p = MovingEdge.HarmonicFit(x, [.. values.Select(v => v.Value)]);
        return values.Select((v, i) => Math.Abs(v.Value - (p[0] + p[1] * Math.Cos(x[i]) + p[2] * Math.Sin(x[i])))).Max() <= 2 * sigma;
    }

    private static double Median(IEnumerable<double> values)
    {
        var sorted = values.Order().ToArray();
        int m = sorted.Length / 2;
        return sorted.Length % 2 == 1 ? sorted[m] : (sorted[m - 1] + sorted[m]) / 2;
    }

    /// <summary>Largest gap between rotation angles taken modulo 180° (the series repeats every half turn).</summary>
    internal static double LargestGap(IEnumerable<double> rotationsDegrees) => LargestGapSpan(rotationsDegrees).Size;

    /// <summary>The largest gap and the angles it lies between (modulo 180°; one wrapping round the half turn ends past 180°).</summary>
    internal static (double Size, double From, double To) LargestGapSpan(IEnumerable<double> rotationsDegrees)
    {
        var angles = rotationsDegrees.Select(a => ((a % 180) + 180) % 180).Distinct().Order().ToArray();
        if (angles.Length == 0) return (180, 0, 180);
        if (angles.Length < 2) return (180, angles[0], angles[0] + 180);
        var largest = (Size: 180 - angles[^1] + angles[0], From: angles[^1], To: angles[0] + 180);
        for (int i = 1; i < angles.Length; i++)
            if (angles[i] - angles[i - 1] > largest.Size) largest = (angles[i] - angles[i - 1], angles[i - 1], angles[i]);
        return largest;
    }

    // A mean of k readings keeps a share of the instrument's systematic error (calibration, liquid film):
    // taken as half a reading's σ, which does not average away.
    private static double Mean(double sigma, int count) => Math.Sqrt(sigma * sigma / count + sigma * sigma / 4);

    private static double Extreme(double sigma) => sigma * Math.Sqrt(1.25);

    private static RefractiveIndex Index(double value, double sigma) => new(value, sigma);

    /// <summary>
    /// A series read against a contact liquid of index <paramref name="liquidLimit"/>: an interpretation whose fitted
    /// highest index (ε, γ: the extreme of the harmonic through the moving edge) lies above the liquid is marked and said
    /// as "above the liquid", its birefringence as the least the readings show. A high edge passing the liquid at some
    /// steps otherwise came out as "γ 1.796" beside a 1.79 liquid, as if read.
    /// </summary>
    public static RotationSeriesResult ReadAgainst(RotationSeriesResult series, double liquidLimit) =>
        series with { Interpretations = [.. series.Interpretations.Select(i => ReadAgainst(i, liquidLimit, series.HighHiddenBy(liquidLimit)))] };

    /// <summary>One interpretation as <see cref="ReadAgainst(RotationSeriesResult, double)"/> reads it.</summary>
    /// <param name="i">The interpretation.</param>
    /// <param name="liquidLimit">The contact liquid's index.</param>
    /// <param name="highHidden">
    /// The liquid hid the high edge at some steps (<see cref="RotationSeriesResult.HighHiddenBy"/>): the highest index
    /// is said as above the liquid whatever the steps that show it give (an epidote read on a 1.79 liquid had been given
    /// "γ 1.788, birefringence 0.032" from the two steps that showed a high edge, where the readings show at least 0.042).
    /// </param>
    public static SeriesInterpretation ReadAgainst(SeriesInterpretation i, double liquidLimit, bool highHidden = false)
    {
        // Two edges read where the steps leave the character open: the high one unseen at some steps lay past the liquid.
        if (i.Character is null && highHidden && i.Description.StartsWith("two edges", StringComparison.Ordinal))
            return i with
            {
                AboveLiquidLimit = liquidLimit,
                Description = $"two edges, {F(i.Lowest.Value)} and one above the liquid {F(liquidLimit)} at some steps: doubly refractive, birefringence at least {Difference(liquidLimit, i.Lowest.Value)}",
            };
        if (!(i.Highest.Value > liquidLimit || highHidden) || i.Character is not (OpticCharacter.Uniaxial or OpticCharacter.Biaxial)) return i;
        // A uniaxial stone whose constant edge is the high one (ω) shows it at every step or at none.
        if (!(i.Highest.Value > liquidLimit) && i.Character == OpticCharacter.Uniaxial && i.Sign == OpticSign.Negative) return i;
        string name = i.Character == OpticCharacter.Biaxial ? "γ" : "ε";
        string fitted = $"{name} {F(i.Highest.Value)}", birefringence = $"birefringence {Difference(i.Highest.Value, i.Lowest.Value)}";
        string about = i.Highest.Value > liquidLimit ? $" (about {F(i.Highest.Value)} by the fitted edge)" : "";
        string description = i.Description
            .Replace(fitted, $"{name} above the liquid {F(liquidLimit)}{about}", StringComparison.Ordinal)
            .Replace(birefringence, $"birefringence at least {Difference(liquidLimit, i.Lowest.Value)}", StringComparison.Ordinal);
        // A biaxial sign compares γ − β with β − α: with γ only known to lie above the liquid, it is positive whenever
        // 2β − α lies at or below the liquid, and open otherwise (negative only if γ < 2β − α).
        if (i.Character == OpticCharacter.Biaxial && i.Beta is { } beta && highHidden)
        {
            double turn = 2 * beta.Value - i.Lowest.Value;
            string signed = $"biaxial {(i.Sign == OpticSign.Positive ? "positive" : "negative")}";
            if (turn <= liquidLimit)
                return i with { AboveLiquidLimit = liquidLimit, Sign = OpticSign.Positive, Description = description.Replace(signed, "biaxial positive", StringComparison.Ordinal) };
            return i with
            {
                AboveLiquidLimit = liquidLimit, SignOpen = true,
                Description = description.Replace(signed, $"biaxial, sign open (negative only if γ < {F(turn)})", StringComparison.Ordinal),
            };
        }
        return i with { AboveLiquidLimit = liquidLimit, Description = description };
    }

    private static string F(double v) => v.ToString("0.000", CultureInfo.InvariantCulture);

    /// <summary>A birefringence in words: the difference of the two indices as shown beside it (<see cref="Birefringence.OfShownIndices"/>).</summary>
    private static string Difference(double high, double low) => F(Birefringence.OfShownIndices(high, low));

    private static string D(double degrees) => degrees.ToString("0.#", CultureInfo.InvariantCulture) + "°";
}
