using System.Text.RegularExpressions;
using System.Xml.Linq;
using GemIndex.Cli.Reports;

namespace GemIndex.Tests.Reports;

public class ReportPlotsTests
{
    private static IReadOnlyList<XElement> Figures(string html) =>
        [.. Regex.Matches(html, "<svg .*?</svg>", RegexOptions.Singleline).Select(m => XElement.Parse(m.Value))];

    [Fact]
    public void The_html_report_draws_the_edges_and_the_scales_as_well_formed_svg()
    {
        var report = ReportFixtures.Report(ReportFixtures.QuartzLine);
        var figures = Figures(HtmlReport.Write(report));
        XNamespace svg = "";   // inline SVG in HTML5 takes its namespace from the parser
        var steps = report.Readings.Refractometer!.Readings;
        var edges = figures[0];
        // One filled circle per low edge and one open circle per high edge read.
        Assert.Equal(steps.Count, edges.Descendants(svg + "circle").Count(c => (string?)c.Attribute("fill") == "#111"));
        Assert.Equal(steps.Count(s => s.High is not null), edges.Descendants(svg + "circle").Count(c => (string?)c.Attribute("fill") == "#fff"));
        Assert.Contains(figures, f => f.Attribute("aria-label")?.Value == "lowest index");
        Assert.Contains(figures, f => f.Attribute("aria-label")?.Value == "SG");
    }

    [Fact]
    public void A_higher_index_is_drawn_higher_on_the_edge_plot()
    {
        var plot = XElement.Parse(ReportPlots.EdgePlot([new(0, 1.544, 1.553), new(90, 1.544, 1.548)]));
        XNamespace svg = "";   // inline SVG in HTML5 takes its namespace from the parser
        var open = plot.Descendants(svg + "circle").Where(c => (string?)c.Attribute("fill") == "#fff")
            .Select(c => double.Parse(c.Attribute("cy")!.Value, System.Globalization.CultureInfo.InvariantCulture)).ToList();
        Assert.True(open[0] < open[1], "1.553 lies above 1.548 (SVG y grows downwards)");
    }

    [Fact]
    public void A_range_with_a_usual_part_draws_it_dark_over_its_light_rare_extremes_and_says_so()
    {
        // Natural opal's SG 1.25-2.25, usually 1.98-2.25 (reference-db opal.json, opal-sg-span), beside a flat range.
        XNamespace svg = "";
        static double Attr(XElement e, string name) => double.Parse(e.Attribute(name)!.Value, System.Globalization.CultureInfo.InvariantCulture);
        var plot = XElement.Parse(ReportPlots.Scale("SG", 2.10, 0.01, [("white opal", 1.25, 2.25), ("flat", 1.25, 2.25)], [(1.98, 2.25), null]));
        var bars = plot.Descendants(svg + "rect").Where(r => r.Attribute("height")?.Value == "10").ToList();
        Assert.Equal(3, bars.Count);   // the opal's whole range and its usual part, the flat range
        (XElement whole, XElement part, XElement flat) = (bars[0], bars[1], bars[2]);
        Assert.Equal("#eee", (string?)whole.Attribute("fill"));
        Assert.Equal("#bbb", (string?)part.Attribute("fill"));
        Assert.Equal("#bbb", (string?)flat.Attribute("fill"));
        Assert.Equal(Attr(whole, "x") + Attr(whole, "width"), Attr(part, "x") + Attr(part, "width"), 6);   // both end at 2.25
        Assert.True(Attr(part, "x") > Attr(whole, "x") + 0.6 * Attr(whole, "width"), "1.98 lies about three quarters along 1.25-2.25");
        Assert.Contains(plot.Descendants(svg + "text"), t => t.Value == ReportPlots.RareExtremesLegend);
        var plain = XElement.Parse(ReportPlots.Scale("SG", 2.10, 0.01, [("flat", 1.25, 2.25)]));
        Assert.DoesNotContain(plain.Descendants(svg + "text"), t => t.Value == ReportPlots.RareExtremesLegend);
    }

    [Fact]
    public void Names_and_labels_are_escaped_in_the_svg()
    {
        string text = ReportPlots.Scale("SG", 2.65, 0.01, [("<b>&\"glass", 2.4, 2.6)]);
        Assert.DoesNotContain("<b>", text);
        XElement.Parse(text);   // well-formed
    }

    [Fact]
    public void Axis_labels_are_round_values_each_drawn_at_its_own_height_or_place()
    {
        // A quartz-like series (handbook values from memory): labels at 1.542, 1.546, … had been the padded axis' quarters.
        XNamespace svg = "";
        static double Attr(XElement e, string name) => double.Parse(e.Attribute(name)!.Value, System.Globalization.CultureInfo.InvariantCulture);
        var plot = XElement.Parse(ReportPlots.EdgePlot([new(0, 1.544, 1.553), new(90, 1.544, 1.548)]));
        var labels = plot.Descendants(svg + "text").Where(t => (string?)t.Attribute("text-anchor") == "end").ToList();
        double[] values = [.. labels.Select(t => double.Parse(t.Value, System.Globalization.CultureInfo.InvariantCulture))];
        Assert.InRange(values.Length, 3, 6);
        double spacing = values[1] - values[0];
        Assert.Contains(Math.Round(spacing, 9), new[] { 0.001, 0.002, 0.005 });
        Assert.All(values, v => Assert.True(Math.Abs(v / spacing - Math.Round(v / spacing)) < 1e-6, $"{v} is a multiple of {spacing}"));
        Assert.All(labels.Select(t => t.Value), v => Assert.Equal(5, v.Length));     // 1.544: the refractometer's places
        // Equal steps in value are equal steps down the plot (the label's centre is 4 px below its value's height).
        double[] heights = [.. labels.Select(t => Attr(t, "y"))];
        double perStep = heights[0] - heights[1];
        Assert.True(perStep > 0, "a higher index is drawn higher");
        Assert.All(heights.Zip(heights.Skip(1)), h => Assert.Equal(perStep, h.First - h.Second, 6));
        // The scale: labels at round SG values, each at its place along the bars.
        var scale = XElement.Parse(ReportPlots.Scale("SG", 2.65, 0.01, [("quartz", 2.60, 2.70), ("beryl", 2.63, 2.92)]));
        var under = scale.Descendants(svg + "text").Where(t => (string?)t.Attribute("text-anchor") == "middle" && !t.Value.StartsWith("SG", StringComparison.Ordinal)).ToList();
        Assert.Equal(["2.6", "2.7", "2.8", "2.9"], under.Select(t => t.Value));   // 2.59 to 2.94 with the padding
    }

    [Theory]
    [InlineData(0.0013, 0.002)]
    [InlineData(0.002, 0.002)]
    [InlineData(0.0021, 0.005)]
    [InlineData(0.07, 0.1)]
    [InlineData(3.0, 5.0)]
    public void A_spacing_is_the_next_one_two_or_five_times_a_power_of_ten(double needed, double expected)
    {
        Assert.Equal(expected, PlotSteps.OneTwoFive(needed), 12);
        Assert.Equal(expected switch { 0.002 or 0.005 => "0.000", 0.1 => "0.0", _ => "0" }, PlotSteps.Format(expected));
    }
}
