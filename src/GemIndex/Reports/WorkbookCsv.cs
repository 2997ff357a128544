using System.Text;
using GemIndex.Core.Identification;
using GemIndex.Data.Workbook;

namespace GemIndex.Cli.Reports;

/// <summary>
/// A whole workbook as CSV (RFC 4180: comma-separated, CRLF line ends, a field quoted when it holds a comma, a
/// quote or a line break, quotes doubled), one row per stone after a header row. Numbers in the invariant culture,
/// units in the column names. A stone not identified (no result) has empty identification columns.
/// </summary>
internal static class WorkbookCsv
{
    public static readonly IReadOnlyList<string> Columns =
    [
        "reference", "weight_carats", "colour", "refractive_index_low", "refractive_index_high", "birefringence",
        "optic_character", "specific_gravity", "polariscope", "best_candidate", "confidence", "no_good_match",
    ];

    public static void Write(TextWriter output, IEnumerable<(StoneSheet Sheet, IdentificationResult? Result)> stones)
    {
        Row(output, Columns);
        foreach (var (sheet, result) in stones) Row(output, Cells(sheet, result));
    }

    private static List<string> Cells(StoneSheet sheet, IdentificationResult? result)
    {
        StoneReport? report = result is null ? null : StoneReport.Build(sheet, result);
        ReportInterpretation? best = report?.Interpretations.FirstOrDefault();
        double? spot = sheet.Readings.Refractometer?.Spot;
        RankedCandidate? top = result?.Candidates.FirstOrDefault();
        return
        [
            sheet.Reference,
            sheet.WeightCarats is { } ct ? ReportNumbers.Fixed(ct, "0.00#") : "",
            sheet.Readings.Colour ?? "",
            best is not null ? ReportNumbers.Index(best.Lowest) : spot is { } s ? ReportNumbers.Index(s) : "",
            best is not null ? ReportNumbers.Index(best.Highest) : "",
            best is not null ? ReportNumbers.Index(best.Birefringence) : "",
            report?.Character ?? "",
            report?.SpecificGravity is { } sg ? ReportNumbers.Gravity(sg.Value) : sheet.Readings.Sg is { } given ? ReportNumbers.Gravity(given) : "",
            sheet.Readings.Polariscope is { } p ? StoneReport.Word(p) : "",
            top?.Material.Name ?? "",
            top is not null ? ReportNumbers.Fixed(top.Confidence, "0.000") : "",
            result is null ? "" : result.NoGoodMatch ? "true" : "false",
        ];
    }

    private static void Row(TextWriter output, IReadOnlyList<string> cells)
    {
        output.Write(string.Join(",", cells.Select(Quote)));
        output.Write("\r\n");
    }

    /// <summary>A field as RFC 4180 wants it: quoted (with quotes doubled) when it holds a comma, quote, CR or LF.</summary>
    public static string Quote(string field) =>
        field.AsSpan().IndexOfAny(",\"\r\n") >= 0 ? "\"" + field.Replace("\"", "\"\"") + "\"" : field;
}
