using GemIndex.Data.Batch;

namespace GemIndex.Cli.TextUi.Plot;

/// <summary>The two shadow edges against rotation, and the index window that frames them (with a margin of one reading step).</summary>
internal sealed class EdgePlotModel(IReadOnlyList<EdgeReadingEntry> steps)
{
    /// <summary>Margin above and below the edges, in index units (a few thousandths: the reading precision of a bench refractometer).</summary>
    public const double Margin = 0.004;

    public IReadOnlyList<(double Rotation, double Index)> Low { get; } = [.. steps.OrderBy(s => s.RotationDeg).Select(s => (s.RotationDeg, s.Low))];

    public IReadOnlyList<(double Rotation, double Index)> High { get; } =
        [.. steps.Where(s => s.High is not null).OrderBy(s => s.RotationDeg).Select(s => (s.RotationDeg, s.High!.Value))];

    /// <summary>Steps whose two edges were read as one value (they meet there: one mark stands for both).</summary>
    public IReadOnlyList<(double Rotation, double Index)> Meeting { get; } =
        [.. steps.Where(s => s.High is { } h && Math.Abs(h - s.Low) < 0.0005).OrderBy(s => s.RotationDeg).Select(s => (s.RotationDeg, s.Low))];

    public bool IsEmpty => Low.Count == 0;

    public double Bottom => IsEmpty ? 1.5 : Low.Concat(High).Min(p => p.Index) - Margin;

    public double Top => IsEmpty ? 1.6 : Low.Concat(High).Max(p => p.Index) + Margin;

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
        for (double decade = 0.0001; ; decade *= 10)
            foreach (double m in new[] { 1, 2, 5 })
                if (m * decade >= needed && m * decade >= 0.0005) return Math.Round(m * decade, 6);
    }

    /// <summary>
    /// The bottom of the plot on a whole number of label spacings (two steps: the labels are on every other row), so
    /// that every label is a round number; at most two steps below <see cref="Bottom"/>, which <see cref="IndexStep"/> leaves room for.
    /// </summary>
    public double AlignedBottom(double step) => Math.Floor(Math.Round(Bottom / (2 * step), 6)) * 2 * step;
}
