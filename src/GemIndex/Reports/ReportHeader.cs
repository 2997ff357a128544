using System.Globalization;

namespace GemIndex.Cli.Reports;

/// <summary>
/// Who made a report, when, and with what: the date is passed in by the front end (never read from a clock in Core),
/// the examiner comes from an option, the program and catalogue versions from the build.
/// </summary>
internal sealed record ReportHeader(DateOnly Date, string? Examiner, string ProgramVersion, string CatalogueVersion)
{
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
