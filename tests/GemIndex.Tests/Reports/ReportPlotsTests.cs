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
}
