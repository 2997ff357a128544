using GemIndex.Cli.Reports;
using GemIndex.Cli.TextUi.Bench;
using GemIndex.Core.Quantities;
using GemIndex.Data.Batch;
using GemIndex.Data.Workbook;

namespace GemIndex.Cli.TextUi.Export;

/// <summary>
/// Ctrl+E: the open stone's reports written beside the workbook with a header (date, examiner, program and catalogue
/// versions), and the confirmation's words: where they went, who is named as the examiner, and any warning about the
/// reference. The examiner is the workbook's setting typed once on the stone page. No Terminal.Gui here.
/// </summary>
internal static class StoneExport
{
    /// <summary>The confirmation's line when no examiner is set, saying where to set it.</summary>
    public const string NoExaminer = "Examiner: not recorded (set it once at the foot of F2 Stone)";

    /// <summary>
    /// Writes the reports of the assessed form and returns the confirmation's title and text (or why nothing was
    /// written). <paramref name="date"/> is today's date, read by the caller.
    /// </summary>
    /// <param name="refusedInWords">The refused entries' reasons as the pages word them (null: the reasons as the reader gives them).</param>
    public static (string Title, string Text) Write(string workbookPath, BenchSnapshot snapshot, BenchAssessment assessment, bool hasCatalogue,
        Func<IEnumerable<StoneSummary>> workbookStones, DateOnly date, IReadOnlyList<string>? refusedInWords = null)
    {
        if (assessment.Result is not { } result)
            return ("Nothing exported", "No identification yet: enter readings first" + (hasCatalogue ? "." : " (the catalogue is still loading)."));
        string examiner = snapshot.Text(BenchFields.Examiner);
        if (ReportHeader.ExaminerProblem(examiner) is { } problem)
            return ("Nothing exported", $"The examiner (F2 Stone) {problem}");
        ReportHeader header = ReportHeader.For(date, examiner);
        try
        {
            StoneSheet sheet = BenchModel.ToStoneSheet(snapshot, assessment.Readings);
            IReadOnlyList<string> paths = StoneReportFiles.Write(workbookPath, sheet, result, header);   // never over an earlier file: a numbered name instead
            IReadOnlyList<string> warnings = StoneReportFiles.ReferenceWarnings(sheet, workbookStones());
            return ("Reports written", string.Join('\n', [.. paths, ExaminerLine(header), .. (refusedInWords ?? [.. assessment.Errors.Values]).Select(r => RefusedPrefix + r), .. warnings]));
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or BatchInputException or QuantityOutOfRangeException or WorkbookException)
        {
            return ("Export failed", $"The reports were not written to {StoneReportFiles.FolderFor(workbookPath)}:\n{e.Message}");
        }
    }

    /// <summary>The confirmation's words for entries refused on the form: the reports, like the answer, leave them out.</summary>
    public const string RefusedPrefix = "Left out of the reports, refused: ";

    /// <summary>"Examiner: A. Example" as printed in the header, or where to set it.</summary>
    public static string ExaminerLine(ReportHeader header) => header.Examiner is { } name ? $"Examiner: {name}" : NoExaminer;
}
