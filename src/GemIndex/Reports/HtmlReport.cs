using GemIndex.Core.Bench;
using GemIndex.Core.Catalogue;
using System.Globalization;
using System.Net;
using System.Text;
using GemIndex.Core.Identification;

namespace GemIndex.Cli.Reports;

/// <summary>
/// A report as one self-contained printable HTML page: inline CSS with print styles, no scripts, no external
/// assets, and every piece of text HTML-encoded.
/// </summary>
internal static class HtmlReport
{
    private const string Style = """
        body { font-family: Georgia, "Times New Roman", serif; max-width: 48em; margin: 2em auto; padding: 0 1em; color: #111; line-height: 1.4; }
        h1 { font-size: 1.5em; border-bottom: 2px solid #111; padding-bottom: 0.2em; }
        h2 { font-size: 1.15em; margin-top: 1.4em; border-bottom: 1px solid #999; }
        table { border-collapse: collapse; margin: 0.5em 0; }
        th, td { border: 1px solid #999; padding: 0.2em 0.6em; text-align: left; vertical-align: top; }
        td.number { text-align: right; font-variant-numeric: tabular-nums; }
        dl { display: grid; grid-template-columns: max-content auto; gap: 0.1em 1em; }
        dt { font-weight: bold; }
        dd { margin: 0; }
        .no-match { border: 2px solid #111; padding: 0.5em; font-weight: bold; }
        .cautions { border: 1px solid #111; padding: 0.5em 1em; background: #f3f3f3; }
        @media print {
          body { margin: 0; max-width: none; font-size: 10.5pt; }
          h2 { break-after: avoid; }
          table, dl, .no-match, .cautions { break-inside: avoid; }
          .cautions { background: none; }
        }
        """;

    public static string Write(StoneReport report)
    {
        var h = new StringBuilder();
        h.AppendLine("<!DOCTYPE html>").AppendLine("<html lang=\"en\">").AppendLine("<head>").AppendLine("<meta charset=\"utf-8\">");
        h.Append("<title>Stone report: ").Append(E(report.Reference)).AppendLine("</title>");
        h.Append("<style>").Append(Style).AppendLine("</style>").AppendLine("</head>").AppendLine("<body>");
        h.Append("<h1>Stone report: ").Append(E(report.Reference)).AppendLine("</h1>");
        if (report.Header is { } header) Fields(h, header.Fields());
        Section(h, "Stone");
        Fields(h, report.Description);
        Section(h, "Readings");
        if (report.Readings.Refractometer is { Readings.Count: > 0 } rf)
        {
            h.AppendLine("<table><caption>Rotation series (refractive indices of the shadow edges)</caption>");
            h.AppendLine("<tr><th>Rotation</th><th>Low edge</th><th>High edge</th></tr>");
            foreach (var s in rf.Readings)
                h.AppendLine($"<tr>{Number(ReportNumbers.Degrees(s.RotationDeg))}{Number(ReportNumbers.Index(s.Low))}{Number(report.HighEdgeCell(s.High))}</tr>");
            h.AppendLine("</table>");
            h.Append("<figure>").Append(ReportPlots.EdgePlot(rf.Readings)).AppendLine("<figcaption>The shadow edges against rotation.</figcaption></figure>");
        }
        if (report.ReadingFields.Count == 0 && report.Readings.Refractometer is null) h.AppendLine("<p>No readings recorded.</p>");
        Fields(h, report.ReadingFields);
        Section(h, "Derived properties");
        Fields(h, [.. ReportDerived.Fields(report)]);
        Scales(h, report);
        List(h, [.. report.Interpretations.Select(ReportDerived.Line)], "");
        List(h, [.. report.Misreadings.Select(m => "Possible misreading: " + m)], "");
        Section(h, "Answer by species");
        List(h, ReportDerived.SpeciesLines(report), "No species stands out.");
        Candidates(h, report);
        Section(h, "Next test");
        h.Append("<p>").Append(E(ReportDerived.NextTestLine(report))).AppendLine("</p>");
        List(h, report.NextTest?.Expectations ?? [], "");
        Section(h, "Warnings");
        List(h, report.Warnings, "None.");
        h.AppendLine("<section class=\"cautions\">");
        Section(h, "Cautions");
        List(h, report.Cautions, "");
        h.AppendLine("</section>").AppendLine("</body>").AppendLine("</html>");
        return h.ToString();
    }

    private static void Candidates(StringBuilder h, StoneReport report)
    {
        Section(h, "Candidates");
        if (report.NoGoodMatch) h.Append("<p class=\"no-match\">").Append(E(StoneReport.NoGoodMatchStatement)).AppendLine("</p>");
        h.AppendLine("<table>").AppendLine("<tr><th>Rank</th><th>Material</th><th>Species</th><th>Origin</th><th>Confidence</th><th>Fit with the entry</th></tr>");
        foreach (var c in report.Candidates)
            h.AppendLine($"<tr>{Number(c.Rank.ToString(CultureInfo.InvariantCulture))}<td>{E(c.Name)}</td><td>{E(report.SpeciesWithTotal(c.Species))}</td><td>{E(c.Origin)}</td>" +
                $"{Number(ReportNumbers.Percent(c.Confidence))}{Number(ReportNumbers.Fixed(c.Fit, "0.00"))}</tr>");
        h.AppendLine("</table>");
        h.Append("<p>").Append(E(StoneReport.CandidateOrder)).AppendLine("</p>");
        if (LeadingCandidates.UnlistedNote([.. report.Candidates.Select(c => c.Rank)]) is { } unlisted) h.Append("<p>").Append(E(unlisted)).AppendLine("</p>");
        h.Append("<p>Fit with the entry: ").Append(E(StoneReport.FitMeaning)).AppendLine(".</p>");
        h.Append("<p>Not in the catalogue: ").Append(E(ReportNumbers.Percent(report.NotInCatalogue))).AppendLine("</p>");
        foreach (var c in report.Candidates.Where(c => c.Reasons.Count > 0))
        {
            h.Append("<h3>Reasons for ").Append(E(c.Name)).AppendLine("</h3>");
            List(h, [.. c.Reasons.Select(ReportDerived.ReasonLine)], "");
        }
    }

    /// <summary>The lowest index and the SG as read, against the ranges of three leading candidates, the best entry of each species first.</summary>
    private static void Scales(StringBuilder h, StoneReport report)
    {
        // Only candidates the report lists (LeadingCandidates.Listed), as on the text UI's scales.
        List<Material> listed = [.. LeadingCandidates.Listed(report.Result).Select(i => report.Result.Candidates[i].Material)];
        var leading = LeadingCandidates.Order([.. listed.Select(m => m.Species)]).Take(ScaleCandidates).Select(i => listed[i]).ToList();
        if (leading.Count == 0) return;
        if (report.Readings.Refractometer is { Readings.Count: > 0 } rf)
        {
            double lowest = rf.Readings.Min(s => s.Low);
            double sigma = rf.Precision ?? BenchDefaults.FacetPrecision;
            h.Append("<figure>").Append(ReportPlots.Scale("lowest index", lowest, sigma,
                [.. leading.Select(m => (m.Name, m.Indices.Lowest.Minimum, m.Indices.Lowest.Maximum))])).AppendLine("</figure>");
        }
        if (report.SpecificGravity is { } sg)
            h.Append("<figure>").Append(ReportPlots.Scale("SG", sg.Value, sg.StandardUncertainty,
                [.. leading.Select(m => (m.Name, m.SpecificGravity.Minimum, m.SpecificGravity.Maximum))],
                [.. leading.Select(m => m.SpecificGravityUsual is { } u ? ((double, double)?)(u.Minimum, u.Maximum) : null)])).AppendLine("</figure>");
    }

    /// <summary>How many leading candidates the scales show.</summary>
    private const int ScaleCandidates = 3;

    private static void Section(StringBuilder h, string title) => h.Append("<h2>").Append(E(title)).AppendLine("</h2>");

    private static void Fields(StringBuilder h, IReadOnlyList<ReportField> fields)
    {
        if (fields.Count == 0) return;
        h.AppendLine("<dl>");
        foreach (var f in fields) h.Append("<dt>").Append(E(f.Label)).Append("</dt><dd>").Append(E(f.Value)).AppendLine("</dd>");
        h.AppendLine("</dl>");
    }

    private static void List(StringBuilder h, IReadOnlyList<string> items, string whenEmpty)
    {
        if (items.Count == 0)
        {
            if (whenEmpty.Length > 0) h.Append("<p>").Append(E(whenEmpty)).AppendLine("</p>");
            return;
        }
        h.AppendLine("<ul>");
        foreach (string item in items) h.Append("<li>").Append(E(item)).AppendLine("</li>");
        h.AppendLine("</ul>");
    }

    private static string Number(string text) => $"<td class=\"number\">{E(text)}</td>";

    /// <summary>HTML-encodes text: &lt; &gt; &amp; " and ' all become entities.</summary>
    public static string E(string text) => WebUtility.HtmlEncode(string.Concat(text.Select(ch => char.IsControl(ch) && ch is not ('\n' or '\t') ? $"\\u{(int)ch:x4}" : ch.ToString())));
}
