using System.Globalization;
using System.Text;
using GemIndex.Data.Batch;

namespace GemIndex.Cli.Reports;

/// <summary>
/// Small inline SVG drawings for the HTML report: the shadow edges against rotation, and a reading against the leading
/// candidates' ranges. Plain shapes only (no scripts, no external assets), so the page prints as it shows; inline SVG in
/// HTML5 needs no namespace attribute.
/// </summary>
internal static class ReportPlots
{
    private const int Width = 480, Height = 200, Left = 56, Right = 12, Top = 12, Bottom = 32;

    /// <summary>The low (filled) and high (open) edges of each rotation step, rotation across, index up.</summary>
    public static string EdgePlot(IReadOnlyList<EdgeReadingEntry> steps)
    {
        double low = steps.Min(s => s.Low), high = steps.Max(s => s.High ?? s.Low);
        double pad = Math.Max(0.002, (high - low) * 0.1);
        double yMin = low - pad, yMax = high + pad;
        double X(double degrees) => Left + (Width - Left - Right) * (degrees % 180) / 180;
        double Y(double index) => Top + (Height - Top - Bottom) * (yMax - index) / (yMax - yMin);
        var svg = Open("Shadow edges against rotation");
        Axes(svg);
        foreach (double d in new[] { 0.0, 45, 90, 135, 180 })
        {
            double x = d == 180 ? Width - Right : X(d);
            svg.Append(TickLine(x, Height - Bottom, x, Height - Bottom + 4));
            svg.Append(Text(x, Height - Bottom + 16, F(d, "0") + "°", "middle"));
        }
        // Index labels on round values only, each with its tick and a faint grid line (a label at the axis' padded
        // ends had read as a reading: 1.5386 printed as 1.539 at 1.5386's height).
        (IReadOnlyList<double> ticks, double step) = PlotSteps.Ticks(yMin, yMax, 6);
        foreach (double index in ticks)
        {
            svg.Append(GridLine(Left, Y(index), Width - Right, Y(index)));
            svg.Append(TickLine(Left - 4, Y(index), Left, Y(index)));
            svg.Append(Text(Left - 6, Y(index) + 4, F(index, PlotSteps.Format(step)), "end"));
        }
        foreach (var s in steps)
        {
            svg.Append(Circle(X(s.RotationDeg), Y(s.Low), filled: true));
            if (s.High is { } h) svg.Append(Circle(X(s.RotationDeg), Y(h), filled: false));
        }
        svg.Append(Text(Left + 4, Top + 10, "● low edge   ○ high edge", "start"));
        return svg.Append("</svg>").ToString();
    }

    /// <summary>
    /// A reading (with its uncertainty) against candidates' ranges, one bar each. Where a range has a usual part
    /// (<paramref name="usual"/>, an SG range's <c>sg_usual</c>), the usual part is the dark bar and the rest, the range's
    /// rare extremes, a light one, as the ranking weighs them (docs/ranking.md §2).
    /// </summary>
    public static string Scale(string title, double reading, double uncertainty, IReadOnlyList<(string Name, double Minimum, double Maximum)> ranges,
        IReadOnlyList<(double Minimum, double Maximum)?>? usual = null)
    {
        double lo = Math.Min(reading - 3 * uncertainty, ranges.Min(r => r.Minimum)), hi = Math.Max(reading + 3 * uncertainty, ranges.Max(r => r.Maximum));
        double pad = Math.Max(1e-3, (hi - lo) * 0.08);
        lo -= pad; hi += pad;
        const int nameWidth = 170, row = 18, legendRow = 14;
        bool anyUsual = usual is not null && usual.Any(u => u is not null);
        int height = Top + row * ranges.Count + Bottom + (anyUsual ? legendRow : 0);
        double X(double v) => nameWidth + (Width - nameWidth - Right) * (v - lo) / (hi - lo);
        var svg = new StringBuilder($"<svg width=\"{Width}\" height=\"{height}\" viewBox=\"0 0 {Width} {height}\" role=\"img\" aria-label=\"{HtmlReport.E(title)}\">");
        // A scale of round values under the bars, each with its tick and a faint grid line behind the rows.
        (IReadOnlyList<double> ticks, double step) = PlotSteps.Ticks(lo, hi, 6);
        foreach (double v in ticks) svg.Append(GridLine(X(v), Top, X(v), Top + row * ranges.Count));
        for (int i = 0; i < ranges.Count; i++)
        {
            var r = ranges[i];
            double y = Top + row * i;
            svg.Append(Text(nameWidth - 6, y + 12, r.Name.Length > 26 ? r.Name[..25] + "…" : r.Name, "end"));
            (double Minimum, double Maximum)? part = usual is not null && i < usual.Count ? usual[i] : null;
            svg.Append($"<rect x=\"{F(X(r.Minimum))}\" y=\"{F(y + 4)}\" width=\"{F(Math.Max(2, X(r.Maximum) - X(r.Minimum)))}\" height=\"10\" fill=\"{(part is null ? "#bbb" : "#eee")}\" stroke=\"#444\"/>");
            if (part is { } u)
                svg.Append($"<rect x=\"{F(X(u.Minimum))}\" y=\"{F(y + 4)}\" width=\"{F(Math.Max(2, X(u.Maximum) - X(u.Minimum)))}\" height=\"10\" fill=\"#bbb\" stroke=\"#444\"/>");
        }
        double bottom = Top + row * ranges.Count;
        svg.Append($"<rect x=\"{F(X(reading - uncertainty))}\" y=\"{F(Top)}\" width=\"{F(Math.Max(1, X(reading + uncertainty) - X(reading - uncertainty)))}\" height=\"{F(bottom - Top)}\" fill=\"none\" stroke=\"#111\" stroke-dasharray=\"3 2\"/>");
        svg.Append($"<line x1=\"{F(X(reading))}\" y1=\"{F(Top)}\" x2=\"{F(X(reading))}\" y2=\"{F(bottom)}\" stroke=\"#111\" stroke-width=\"2\"/>");
        svg.Append(Text(X(reading), bottom + 14, $"{title}: {F(reading, "0.000")} ± {F(uncertainty, "0.000")}", "middle"));
        foreach (double v in ticks)
        {
            svg.Append(TickLine(X(v), bottom, X(v), bottom + 4));
            svg.Append(Text(X(v), bottom + 28, F(v, PlotSteps.Format(step)), "middle"));
        }
        if (anyUsual) svg.Append(Text(nameWidth, bottom + 28 + legendRow, RareExtremesLegend, "start"));
        return svg.Append("</svg>").ToString();
    }

    /// <summary>The scale's legend line when a range has a usual part.</summary>
    public const string RareExtremesLegend = "dark: where most stones lie; light: the range's rare extremes";

    private static StringBuilder Open(string title) =>
        new($"<svg width=\"{Width}\" height=\"{Height}\" viewBox=\"0 0 {Width} {Height}\" role=\"img\" aria-label=\"{HtmlReport.E(title)}\">");

    private static void Axes(StringBuilder svg) =>
        svg.Append($"<rect x=\"{Left}\" y=\"{Top}\" width=\"{Width - Left - Right}\" height=\"{Height - Top - Bottom}\" fill=\"none\" stroke=\"#444\"/>");

    private static string TickLine(double x1, double y1, double x2, double y2) =>
        $"<line x1=\"{F(x1)}\" y1=\"{F(y1)}\" x2=\"{F(x2)}\" y2=\"{F(y2)}\" stroke=\"#444\"/>";

    private static string GridLine(double x1, double y1, double x2, double y2) =>
        $"<line x1=\"{F(x1)}\" y1=\"{F(y1)}\" x2=\"{F(x2)}\" y2=\"{F(y2)}\" stroke=\"#ddd\" stroke-width=\"0.5\"/>";

    private static string Circle(double x, double y, bool filled) =>
        $"<circle cx=\"{F(x)}\" cy=\"{F(y)}\" r=\"3.5\" fill=\"{(filled ? "#111" : "#fff")}\" stroke=\"#111\"/>";

    private static string Text(double x, double y, string text, string anchor) =>
        $"<text x=\"{F(x)}\" y=\"{F(y)}\" font-size=\"11\" text-anchor=\"{anchor}\">{HtmlReport.E(text)}</text>";

    private static string F(double v, string format = "0.#") => v.ToString(format, CultureInfo.InvariantCulture);
}
