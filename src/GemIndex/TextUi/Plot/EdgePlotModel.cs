using GemIndex.Core.Readings;
using GemIndex.Data.Batch;

namespace GemIndex.Cli.TextUi.Plot;

/// <summary>
/// The two shadow edges against rotation, and the index window that frames them (with a margin of one reading step);
/// with the contact liquid's limit when a high edge went unseen beside steps that read one (it rose above the liquid).
/// </summary>
internal sealed class EdgePlotModel(IReadOnlyList<EdgeReadingEntry> steps, double? liquidLimit = null)
{
    /// <summary>Margin above and below the edges, in index units (a few thousandths: the reading precision of a bench refractometer).</summary>
    public const double Margin = 0.004;

    public IReadOnlyList<(double Rotation, double Index)> Low { get; } = [.. steps.OrderBy(s => s.RotationDeg).Select(s => (s.RotationDeg, s.Low))];

    public IReadOnlyList<(double Rotation, double Index)> High { get; } =
        [.. steps.Where(s => s.High is not null).OrderBy(s => s.RotationDeg).Select(s => (s.RotationDeg, s.High!.Value))];

    /// <summary>
    /// Steps whose two edges were read as one value, or read with one edge at the level of the other steps' high edges
    /// (they meet there: one mark stands for both; a tourmaline's single edge where ω and ε' meet had been drawn as a high
    /// edge above the liquid).
    /// </summary>
    public IReadOnlyList<(double Rotation, double Index)> Meeting { get; } = Meetings(steps, LowestHigh(steps));

    public bool IsEmpty => Low.Count == 0;

    /// <summary>
    /// Steps with only their low edge while others read a high one (<see cref="RotationSeriesAnalysis.OneEdgeIsTheLow"/>):
    /// a high edge unseen there.
    /// </summary>
    public IReadOnlyList<double> HighUnseen { get; } = LowestHigh(steps) is { } lowestHigh
        ? [.. steps.Where(s => s.High is null && IsLowOnly(s, lowestHigh)).Select(s => s.RotationDeg).Order()] : [];

    /// <summary>
    /// The liquid's limit, shown (and the unseen high edges drawn at it) when the liquid hid them: the highest high edge
    /// read lies within <see cref="RotationSeriesResult.HiddenHighReach"/> of it; else null (far below it, an unseen high
    /// edge was missed, and the window kept to the readings).
    /// </summary>
    public double? LiquidLimit => HighUnseen.Count > 0 && (liquidLimit ?? Core.Bench.BenchDefaults.LiquidLimit) is var limit
        && High.Max(p => p.Index) >= limit - RotationSeriesResult.HiddenHighReach ? limit : null;

    private static List<(double Rotation, double Index)> Meetings(IReadOnlyList<EdgeReadingEntry> steps, double? lowestHigh) =>
        [.. steps.Where(s => s.High is { } h ? Math.Abs(h - s.Low) < 0.0005 : lowestHigh is { } lowest && !IsLowOnly(s, lowest))
            .OrderBy(s => s.RotationDeg).Select(s => (s.RotationDeg, s.Low))];

    private static double? LowestHigh(IReadOnlyList<EdgeReadingEntry> steps) =>
        steps.Any(s => s.High is not null) ? steps.Where(s => s.High is not null).Min(s => s.High!.Value) : null;

    /// <summary>A step of one edge read at the facet method's default precision: the low edge, or where the edges meet.</summary>
    private static bool IsLowOnly(EdgeReadingEntry s, double lowestHigh) =>
        RotationSeriesAnalysis.OneEdgeIsTheLow(s.Low, lowestHigh, RotationSeriesAnalysis.ConstantBandSigmas * Core.Bench.BenchDefaults.FacetPrecision);

    /// <summary>The high edge's runs of consecutive steps that read it: its line is not drawn across a step that did not.</summary>
    public IReadOnlyList<IReadOnlyList<(double Rotation, double Index)>> HighRuns { get; } = Runs(steps);

    private static List<IReadOnlyList<(double Rotation, double Index)>> Runs(IReadOnlyList<EdgeReadingEntry> steps)
    {
        var runs = new List<IReadOnlyList<(double Rotation, double Index)>>();
        var run = new List<(double Rotation, double Index)>();
        double? lowestHigh = LowestHigh(steps);
        foreach (var s in steps.OrderBy(s => s.RotationDeg))
        {
            if (s.High is { } h) { run.Add((s.RotationDeg, h)); continue; }
            // Where the two edges meet, the one edge is the high edge's too: its line goes on through it.
            if (lowestHigh is { } lowest && !IsLowOnly(s, lowest)) { run.Add((s.RotationDeg, s.Low)); continue; }
            if (run.Count > 0) runs.Add(run);
            run = [];
        }
        if (run.Count > 0) runs.Add(run);
        return runs;
    }

    private IEnumerable<double> Shown => Low.Concat(High).Select(p => p.Index).Concat(LiquidLimit is { } l ? [l] : []);

    public double Bottom => IsEmpty ? 1.5 : Shown.Min() - Margin;

    public double Top => IsEmpty ? 1.6 : Shown.Max() + Margin;

    /// <summary>Rotation shown: 0–180° unless readings go beyond.</summary>
    public double RightEdge => IsEmpty ? 180 : Math.Max(180, Low.Max(p => p.Rotation));

    public double LeftEdge => IsEmpty ? 0 : Math.Min(0, Low.Min(p => p.Rotation));

    /// <summary>
    /// The index per row: the smallest of 0.0005, 0.001, 0.002, 0.005, 0.01, … that fits the window in
    /// <paramref name="rows"/> rows from <see cref="Bottom"/> to the highest edge with two rows to spare (the bottom is
    /// moved down to a round label by up to two steps; the margin above the edges takes what is left), so that the
    /// labels (every other row) step evenly in round numbers.
    /// </summary>
    public double IndexStep(int rows)
    {
        double needed = (Top - Margin - Bottom) / Math.Max(1, rows - 2);
        return Math.Round(Reports.PlotSteps.OneTwoFive(Math.Max(needed, 0.0005)), 6);
    }

    /// <summary>
    /// The bottom of the plot on a whole number of label spacings (two steps: the labels are on every other row), so
    /// that every label is a round number; at most two steps below <see cref="Bottom"/>, which <see cref="IndexStep"/> leaves room for.
    /// </summary>
    public double AlignedBottom(double step) => Math.Floor(Math.Round(Bottom / (2 * step), 6)) * 2 * step;
}
