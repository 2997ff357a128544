using GemIndex.Core.Bench;
using GemIndex.Core.Identification;
using System.Text;

namespace GemIndex.Cli.Reports;

/// <summary>A report as Markdown: headings, tables and lists; every user text escaped so it prints as typed.</summary>
internal static class MarkdownReport
{
    public static string Write(StoneReport report)
    {
        var md = new StringBuilder();
        md.Append("# Stone report: ").AppendLine(Escape(report.Reference)).AppendLine();
        if (report.Header is { } header) Fields(md, header.Fields());
        Section(md, "Stone");
        Fields(md, report.Description);
        Section(md, "Readings");
        if (report.Readings.Refractometer is { Readings.Count: > 0 } rf)
        {
            md.AppendLine("Rotation series (refractive indices of the shadow edges):").AppendLine();
            md.AppendLine("| Rotation | Low edge | High edge |").AppendLine("|---:|---:|---:|");
            foreach (var s in rf.Readings)
                md.AppendLine($"| {ReportNumbers.Degrees(s.RotationDeg)} | {ReportNumbers.Index(s.Low)} | {report.HighEdgeCell(s.High)} |");
            md.AppendLine();
        }
        if (report.ReadingFields.Count == 0 && report.Readings.Refractometer is null) md.AppendLine("No readings recorded.").AppendLine();
        Fields(md, report.ReadingFields);
        Section(md, "Derived properties");
        Fields(md, [.. ReportDerived.Fields(report)]);
        foreach (var i in report.Interpretations) md.Append("- ").AppendLine(Escape(ReportDerived.Line(i)));
        if (report.Interpretations.Count > 0) md.AppendLine();
        foreach (string m in report.Misreadings) md.Append("- Possible misreading: ").AppendLine(Escape(m));
        if (report.Misreadings.Count > 0) md.AppendLine();
        Section(md, "Answer by species");
        List(md, ReportDerived.SpeciesLines(report), "No species stands out.");
        Candidates(md, report);
        Section(md, "Next test");
        md.AppendLine(Escape(ReportDerived.NextTestLine(report))).AppendLine();
        foreach (string e in report.NextTest?.Expectations ?? []) md.Append("- ").AppendLine(Escape(e));
        if (report.NextTest is { Expectations.Count: > 0 }) md.AppendLine();
        Section(md, "Warnings");
        List(md, report.Warnings, "None.");
        Section(md, "Cautions");
        List(md, report.Cautions, "");
        return md.ToString();
    }

    private static void Candidates(StringBuilder md, StoneReport report)
    {
        Section(md, "Candidates");
        if (report.NoGoodMatch) md.Append("**").Append(Escape(StoneReport.NoGoodMatchStatement)).AppendLine("**").AppendLine();
        md.AppendLine("| Rank | Material | Species | Origin | Confidence | Fit with the entry |").AppendLine("|---:|---|---|---|---:|---:|");
        foreach (var c in report.Candidates)
            md.AppendLine($"| {c.Rank} | {Escape(c.Name)} | {Escape(report.SpeciesWithTotal(c.Species))} | {Escape(c.Origin)} | {ReportNumbers.Percent(c.Confidence)} | {ReportNumbers.Fixed(c.Fit, "0.00")} |");
        md.AppendLine().AppendLine(Escape(StoneReport.CandidateOrder)).AppendLine();
        if (LeadingCandidates.UnlistedNote([.. report.Candidates.Select(c => c.Rank)]) is { } unlisted) md.AppendLine(Escape(unlisted)).AppendLine();
        md.Append("Fit with the entry: ").Append(StoneReport.FitMeaning).AppendLine(".").AppendLine();
        md.Append("Not in the catalogue: ").AppendLine(ReportNumbers.Percent(report.NotInCatalogue)).AppendLine();
        foreach (var c in report.Candidates.Where(c => c.Reasons.Count > 0))
        {
            md.Append("Reasons for ").Append(Escape(c.Name)).AppendLine(":").AppendLine();
            foreach (var r in c.Reasons)
                md.AppendLine($"- {Escape(ReportDerived.ReasonLine(r))}");
            md.AppendLine();
        }
    }

    private static void Section(StringBuilder md, string title) => md.Append("## ").AppendLine(title).AppendLine();

    private static void Fields(StringBuilder md, IReadOnlyList<ReportField> fields)
    {
        foreach (var f in fields) md.Append("- **").Append(Escape(f.Label)).Append(":** ").AppendLine(Escape(f.Value));
        if (fields.Count > 0) md.AppendLine();
    }

    private static void List(StringBuilder md, IReadOnlyList<string> items, string whenEmpty)
    {
        if (items.Count == 0 && whenEmpty.Length > 0) md.AppendLine(whenEmpty);
        foreach (string item in items) md.Append("- ").AppendLine(Escape(item));
        md.AppendLine();
    }

    /// <summary>Backslash-escapes Markdown's punctuation, turns line breaks into spaces (text stays on its line or cell) and other control characters into visible \uXXXX.</summary>
    public static string Escape(string text)
    {
        var sb = new StringBuilder(text.Length);
        foreach (char ch in text)
        {
            if (ch is '\r' or '\n') sb.Append(' ');
            else if (char.IsControl(ch)) sb.Append($"\\u{(int)ch:x4}");   // an escape sequence is shown, never passed to a viewer
            // '>' opens a quotation only at the start of a line: a share such as ">99.9 %" within a line stays as written.
            else if ("\\`*_[]<|".Contains(ch) || ch == '>' && sb.Length == 0) sb.Append('\\').Append(ch);
            else sb.Append(ch);
        }
        return sb.ToString();
    }
}
