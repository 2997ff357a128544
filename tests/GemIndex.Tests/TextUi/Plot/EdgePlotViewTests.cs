using System.Globalization;
using System.Text.RegularExpressions;
using GemIndex.Cli.TextUi.Plot;
using GemIndex.Data.Batch;
using GemIndex.Tests.TextUi.Main;
using Terminal.Gui.App;

namespace GemIndex.Tests.TextUi.Plot;

/// <summary>The edge plot drawn headless: every mark sits on the row whose index (read off the labels) is its reading.</summary>
[Collection(Headless.Collection)]
public sealed class EdgePlotViewTests
{
    // A quartz series (common practice: ω 1.544 constant, ε' moving up to 1.553) and a corundum one (ω 1.770, ε 1.762).
    public static TheoryData<string, int, int> Series => new()
    {
        { "0:1.544:1.553 45:1.544:1.551 90:1.544:1.548 135:1.544:1.551", 80, 24 },
        { "0:1.544:1.553 45:1.544:1.551 90:1.544:1.548 135:1.544:1.551", 120, 40 },
        { "0:1.762:1.770 45:1.765:1.770 90:1.768:1.770", 80, 24 },
        { "0:1.762:1.770 45:1.765:1.770 90:1.768:1.770", 100, 30 },
        { "0:1.620 45:1.620 90:1.620 135:1.620", 80, 24 },
    };

    [Theory]
    [MemberData(nameof(Series))]
    public void Each_edge_is_drawn_on_the_row_labelled_with_its_index(string steps, int columns, int rows)
    {
        List<EdgeReadingEntry> entries = [.. steps.Split(' ').Select(Step)];
        string[] lines = Draw(entries, columns, rows);
        (int row, double index)[] labels = [.. lines.Select((l, i) => (i, m: Regex.Match(l, @"(\d\.\d{3})[┤┼]")))
            .Where(p => p.m.Success).Select(p => (p.i, double.Parse(p.m.Groups[1].Value, CultureInfo.InvariantCulture)))];
        Assert.True(labels.Length >= 2, string.Join("\n", lines));
        double perRow = (labels[0].index - labels[^1].index) / (labels[^1].row - labels[0].row);
        double IndexAt(int row) => labels[0].index - (row - labels[0].row) * perRow;
        // The first step is at rotation 0°, drawn on the axis column: its marks replace the tick there.
        int axis = lines[labels[0].row].IndexOf(labels[0].index.ToString("0.000", CultureInfo.InvariantCulture), StringComparison.Ordinal) + 5;
        int lowRow = Array.FindIndex(lines, l => l.Length > axis && l[axis] == 'l');
        Assert.Equal(entries[0].Low, IndexAt(lowRow), 6);
        if (entries[0].High is { } high)
            Assert.Equal(high, IndexAt(Array.FindIndex(lines, l => l.Length > axis && l[axis] == 'h')), 6);
    }

    [Fact]
    public void Where_the_edges_meet_one_mark_stands_for_both()
    {
        // Quartz with its optic axis in the facet (from memory: ω 1.544, ε 1.553): the edges meet at 90°.
        string[] lines = Draw([Step("0:1.544:1.553"), Step("45:1.544:1.549"), Step("90:1.544:1.544"), Step("135:1.544:1.549")], 80, 24);
        Assert.Single(lines, l => l.Contains('x') && !l.Contains("x = both", StringComparison.Ordinal));
        Assert.Contains(lines, l => l.Contains("x = both", StringComparison.Ordinal));
    }

    [Fact]
    public void Every_label_is_a_round_multiple_of_its_spacing()
    {
        string[] lines = Draw([Step("0:1.762:1.770"), Step("90:1.768:1.770")], 80, 24);
        string[] labels = [.. lines.Select(l => Regex.Match(l, @"(\d\.\d{3})[┤┼]")).Where(m => m.Success).Select(m => m.Groups[1].Value)];
        Assert.NotEmpty(labels);
        Assert.All(labels, l => Assert.Matches(@"[02468]$", l));   // step 0.001, labels every other row: even thousandths
    }

    private static EdgeReadingEntry Step(string s)
    {
        string[] p = s.Split(':');
        double Number(string x) => double.Parse(x, CultureInfo.InvariantCulture);
        return new EdgeReadingEntry(Number(p[0]), Number(p[1]), p.Length > 2 ? Number(p[2]) : null);
    }

    private static string[] Draw(IReadOnlyList<EdgeReadingEntry> steps, int columns, int rows)
    {
        using IApplication app = Headless.Start(columns, rows);
        using var view = new EdgePlotView(new EdgePlotModel(steps));
        SessionToken token = app.Begin(view)!;
        app.LayoutAndDraw();
        string screen = app.Driver!.ToString()!;
        app.End(token);
        return screen.Split('\n');
    }
}
