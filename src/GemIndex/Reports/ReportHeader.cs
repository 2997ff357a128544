using System.Globalization;
using GemIndex.Data.Catalogue;

namespace GemIndex.Cli.Reports;

/// <summary>
/// Who made a report, when, and with what: the date is passed in by the front end (never read from a clock in Core),
/// the examiner comes from an option (the command line) or the workbook's setting (the text UI), the program and
/// catalogue versions from the build.
/// </summary>
internal sealed record ReportHeader(DateOnly Date, string? Examiner, string ProgramVersion, string CatalogueVersion)
{
    /// <summary>The longest examiner's name printed in a report header.</summary>
    public const int MostExaminerLength = 80;

    /// <summary>The workbook setting that keeps a workbook's examiner, for the text UI's exports and `report stone --workbook`.</summary>
    public const string ExaminerSetting = "report.examiner";

    /// <summary>The header of a report made today by <paramref name="examiner"/> (blank: not recorded) with this build's versions.</summary>
    public static ReportHeader For(DateOnly date, string? examiner) =>
        new(date, string.IsNullOrWhiteSpace(examiner) ? null : examiner.Trim(), Program(), Catalogue());

    /// <summary>Why a name cannot be printed as the examiner (too long, or a control character), or null when it can.</summary>
    public static string? ExaminerProblem(string examiner)
    {
        string name = examiner.Trim();
        if (name.Length > MostExaminerLength) return $"is {name.Length} characters long; allowed: up to {MostExaminerLength} printable characters.";
        return name.Any(char.IsControl) ? "holds a control character; allowed: printable characters only." : null;
    }

    /// <summary>The shipped catalogue's version: the first 12 characters of its content hash.</summary>
    public static string Catalogue() => ShippedCatalogue.ContentHash[..Math.Min(12, ShippedCatalogue.ContentHash.Length)];

    public IReadOnlyList<ReportField> Fields() =>
    [
        new("date", "Date", Date.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture)),
        new("examiner", "Examiner", string.IsNullOrWhiteSpace(Examiner) ? StoneReport.NotRecorded : Examiner.Trim()),
        new("program", "Program", "gemindex " + ProgramVersion),
        new("catalogue", "Catalogue", CatalogueVersion),
    ];

    /// <summary>This program's version (the informational version without the build's commit suffix).</summary>
    public static string Program() =>
        (typeof(ReportHeader).Assembly.GetCustomAttributes(typeof(System.Reflection.AssemblyInformationalVersionAttribute), false)
            .OfType<System.Reflection.AssemblyInformationalVersionAttribute>().FirstOrDefault()?.InformationalVersion ?? "unknown").Split('+')[0];
}
