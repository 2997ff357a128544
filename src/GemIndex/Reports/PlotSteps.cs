namespace GemIndex.Cli.Reports;

/// <summary>Round spacings for a plot's labels: 1, 2 or 5 times a power of ten, so every label is a round number.</summary>
internal static class PlotSteps
{
    /// <summary>The smallest spacing of 1, 2 or 5 × 10ⁿ that is at least <paramref name="needed"/> (which must be positive).</summary>
    public static double OneTwoFive(double needed)
    {
        ArgumentOutOfRangeException.ThrowIfNegativeOrZero(needed);
        for (double decade = Math.Pow(10, Math.Floor(Math.Log10(needed)) - 1); ; decade *= 10)
            foreach (double m in new[] { 1, 2, 5 })
                if (Math.Round(m * decade, 12) >= needed) return Math.Round(m * decade, 12);
    }

    /// <summary>
    /// The round values from <paramref name="low"/> to <paramref name="high"/> at a spacing that gives at most
    /// <paramref name="most"/> of them, with the spacing (for the labels' decimals).
    /// </summary>
    public static (IReadOnlyList<double> Values, double Step) Ticks(double low, double high, int most)
    {
        double step = OneTwoFive(Math.Max(high - low, 1e-9) / Math.Max(1, most - 1));
        var values = new List<double>();
        for (double k = Math.Ceiling(Math.Round(low / step, 9)); k * step <= high + step * 1e-9; k++) values.Add(Math.Round(k * step, 12));
        return (values, step);
    }

    /// <summary>A .NET number format with as many decimals as the spacing needs: 0.005 → "0.000", 0.5 → "0.0", 5 → "0".</summary>
    public static string Format(double step) =>
        "0" + (Math.Max(0, (int)Math.Ceiling(-Math.Log10(step) - 1e-9)) is var places and > 0 ? "." + new string('0', places) : "");
}
