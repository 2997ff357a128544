namespace GemIndex.Core.Readings;

/// <summary>
/// A rotation series as the section model reads it (DOMAIN.md §6b; docs/ranking.md §1): each step's rotation, its
/// edges with the calibration offset applied, how many edges were written, and the reading model's constants for
/// this stone (noise with the rounding to the decimals written, the liquid's limit). Built once per stone and shared
/// by every material.
/// </summary>
internal sealed class SeriesObservation
{
    /// <summary>
    /// Edges closer than this are written as one (the eye's resolution on a refractometer scale, about 0.0015:
    /// DOMAIN.md §6b, common practice). A judgement; docs/ranking.md §1.
    /// </summary>
    public const double EdgeResolution = 0.0015;

    /// <summary>
    /// An edge within this margin below the liquid's limit is lost in the liquid's own edge (a judgement: about three
    /// readings' precision; docs/ranking.md §1).
    /// </summary>
    public const double LiquidEdgeMargin = 0.003;

    /// <summary>Builds the observation; the steps have been checked by <see cref="ShadowEdgeStep"/>.</summary>
    public SeriesObservation(IReadOnlyList<ShadowEdgeStep> steps, double readingPrecision, double calibrationOffset, double liquidLimit)
    {
        int k = steps.Count;
        Cos = new double[k];
        Sin = new double[k];
        Low = new double[k];
        High = new double[k];
        TwoEdges = new bool[k];
        // A facet reading is written to three decimals (common practice); a trailing zero is lost in a number, so fewer
        // decimals are never inferred, and a fourth decimal counts when written.
        int decimals = 3;
        for (int i = 0; i < k; i++)
        {
            var s = steps[i];
            double radians = s.RotationDegrees * Math.PI / 180;
            Cos[i] = Math.Cos(radians);
            Sin[i] = Math.Sin(radians);
            Low[i] = s.Low + calibrationOffset;
            TwoEdges[i] = s.High is not null;
            High[i] = (s.High ?? s.Low) + calibrationOffset;
            decimals = Math.Max(decimals, Math.Max(DecimalsWritten(s.Low), s.High is { } h ? DecimalsWritten(h) : 1));
            LowestReading = i == 0 ? Low[i] : Math.Min(LowestReading, Low[i]);
            HighestReading = i == 0 ? High[i] : Math.Max(HighestReading, High[i]);
            if (TwoEdges[i]) LargestSeparation = Math.Max(LargestSeparation, High[i] - Low[i]);
        }
        PaddedCount = (k + 7) / 8 * 8;
        PaddedCos = new double[PaddedCount];
        PaddedSin = new double[PaddedCount];
        Cos.CopyTo(PaddedCos, 0);
        Sin.CopyTo(PaddedSin, 0);
        RoundingStep = Math.Pow(10, -decimals);
        ReadingPrecision = readingPrecision;
        // Rounding to the decimals written adds a uniform error of width w: variance w²/12 (Sheppard's correction).
        NoiseVariance = readingPrecision * readingPrecision + RoundingStep * RoundingStep / 12;
        LiquidLimit = liquidLimit;
    }

    private double[]? _coarseGeometry;

    /// <summary>
    /// The geometry of the section model's coarse orientations for these steps (<c>SectionLikelihood.CoarseGeometry</c>),
    /// the same for every material, so worked out once, on first use.
    /// </summary>
    internal double[] CoarseGeometry => _coarseGeometry ??= Identification.SectionLikelihood.CoarseGeometry(this);

    /// <summary>The number of steps rounded up to a multiple of eight (the section model works on eight steps at a time).</summary>
    internal int PaddedCount { get; }

    /// <summary><see cref="Cos"/> followed by zeros up to <see cref="PaddedCount"/>.</summary>
    internal double[] PaddedCos { get; }

    /// <summary><see cref="Sin"/> followed by zeros up to <see cref="PaddedCount"/>.</summary>
    internal double[] PaddedSin { get; }

    /// <summary>cos φₖ of each step's rotation.</summary>
    public double[] Cos { get; }

    /// <summary>sin φₖ of each step's rotation.</summary>
    public double[] Sin { get; }

    /// <summary>The low (or only) edge, calibrated.</summary>
    public double[] Low { get; }

    /// <summary>The high edge, calibrated; equals <see cref="Low"/> at a step with one edge.</summary>
    public double[] High { get; }

    /// <summary>True at a step where two edges were written.</summary>
    public bool[] TwoEdges { get; }

    /// <summary>Number of steps.</summary>
    public int Count => Low.Length;

    /// <summary>The reading precision σ as entered.</summary>
    public double ReadingPrecision { get; }

    /// <summary>σ² + w²/12: the noise and the rounding to the last decimal written.</summary>
    public double NoiseVariance { get; }

    /// <summary>The last decimal written, as a step (0.001 for readings written to three decimals).</summary>
    public double RoundingStep { get; }

    /// <summary>The contact liquid's index: no edge is seen above <see cref="LiquidLimit"/> − <see cref="LiquidEdgeMargin"/>.</summary>
    public double LiquidLimit { get; }

    /// <summary>The lowest edge read.</summary>
    public double LowestReading { get; }

    /// <summary>The highest edge read.</summary>
    public double HighestReading { get; }

    /// <summary>The largest separation of two edges at one step (0 when no step has two).</summary>
    public double LargestSeparation { get; }

    /// <summary>How many decimals a reading was written with (1–4), read from the value itself.</summary>
    internal static int DecimalsWritten(double value)
    {
        for (int d = 1; d < 4; d++)
        {
            double scaled = value * Math.Pow(10, d);
            if (Math.Abs(scaled - Math.Round(scaled)) < 1e-6 * Math.Max(1, Math.Abs(scaled))) return d;
        }
        return 4;
    }
}
