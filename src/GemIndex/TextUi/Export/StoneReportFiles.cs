using System.Text;
using GemIndex.Cli.Reports;
using GemIndex.Core.Identification;
using GemIndex.Data.Workbook;

namespace GemIndex.Cli.TextUi.Export;

/// <summary>
/// Writes one stone's report as Markdown, HTML and JSON into <c>reports/</c> beside the workbook file, each named after
/// the stone's reference made safe for a file name plus its id in the workbook ("lot_7_2-s12"), so two stones never
/// share a name whatever their references. An existing file is never replaced unless the caller says the user agreed:
/// otherwise the export takes the next numbered name ("lot_7_2-s12-2"). No Terminal.Gui here.
/// </summary>
internal static class StoneReportFiles
{
    /// <summary>The folder beside the workbook that holds the reports.</summary>
    public const string FolderName = "reports";

    /// <summary>Longest file name stem kept (well under the 255 bytes most file systems allow, with room for the extension).</summary>
    public const int MostNameLength = 80;

    /// <summary>The stem used when a reference has nothing usable in a file name.</summary>
    public const string Unnamed = "stone";

    private static readonly string[] DeviceNames =
        ["CON", "PRN", "AUX", "NUL", "COM1", "COM2", "COM3", "COM4", "COM5", "COM6", "COM7", "COM8", "COM9",
         "LPT1", "LPT2", "LPT3", "LPT4", "LPT5", "LPT6", "LPT7", "LPT8", "LPT9"];

    /// <summary>
    /// The reference as a file name stem that is valid on Linux, macOS and Windows alike: letters, digits, '-', '_' and '.'
    /// are kept, every other run of characters (spaces, slashes, ':', '*', '?', control characters, ...) becomes one '_',
    /// leading and trailing '_' and '.' are dropped, and the result is at most <see cref="MostNameLength"/> characters.
    /// </summary>
    public static string SafeName(string reference)
    {
        var sb = new StringBuilder(reference.Length);
        foreach (char c in reference.Normalize(NormalizationForm.FormC))
        {
            bool keep = char.IsAsciiLetterOrDigit(c) || c is '-' or '.' || (char.IsLetterOrDigit(c) && !char.IsControl(c));
            if (keep) sb.Append(c);
            else if (sb.Length == 0 || sb[^1] != '_') sb.Append('_');
        }
        string name = sb.ToString().Trim('_', '.');
        if (name.Length > MostNameLength) name = name[..MostNameLength].TrimEnd('_', '.');
        if (name.Length == 0) return Unnamed;
        string device = name.Split('.')[0];
        return DeviceNames.Contains(device, StringComparer.OrdinalIgnoreCase) ? "_" + name : name;
    }

    /// <summary>The reports folder beside <paramref name="workbookPath"/>.</summary>
    public static string FolderFor(string workbookPath) =>
        Path.Combine(Path.GetDirectoryName(Path.GetFullPath(workbookPath)) ?? ".", FolderName);

    /// <summary>The three file names of a stone's reports (Markdown, HTML, JSON) with the numbered suffix <paramref name="number"/> (1 = none).</summary>
    public static IReadOnlyList<string> PathsFor(string workbookPath, StoneSheet sheet, int number = 1)
    {
        string stem = SafeName(sheet.Reference) + (sheet.Id > 0 ? $"-s{sheet.Id}" : "") + (number > 1 ? $"-{number}" : "");
        string path = Path.Combine(FolderFor(workbookPath), stem);
        return [path + ".md", path + ".html", path + ".json"];
    }

    /// <summary>True when a report of this stone has been exported before under its first name (ask before replacing it).</summary>
    public static bool Exists(string workbookPath, StoneSheet sheet) => PathsFor(workbookPath, sheet).Any(File.Exists);

    /// <summary>
    /// Warnings to show with an export: an empty reference, or one that other stones of the workbook share (their
    /// reports differ by the stone id in the name, which the user should know before sending them on).
    /// </summary>
    public static IReadOnlyList<string> ReferenceWarnings(StoneSheet sheet, IEnumerable<StoneSummary> workbookStones)
    {
        if (string.IsNullOrWhiteSpace(sheet.Reference))
            return [$"This stone has no reference: its reports are named '{Path.GetFileName(PathsFor(".", sheet)[0])}'. Give it a reference to tell them apart."];
        int others = workbookStones.Count(s => s.Id != sheet.Id && string.Equals(s.Reference.Trim(), sheet.Reference.Trim(), StringComparison.OrdinalIgnoreCase));
        return others == 0 ? [] :
            [$"{others} other stone{(others == 1 ? " has" : "s have")} the reference '{sheet.Reference.Trim()}': the report names differ only by the stone number (-s{sheet.Id})."];
    }

    /// <summary>
    /// Writes the three reports, headed by <paramref name="header"/> (date, examiner, versions), and returns their full
    /// paths (Markdown, HTML, JSON). With <paramref name="replace"/>
    /// (the user agreed) a stone's earlier reports are replaced; without it, an existing name is never overwritten and
    /// the next free numbered name is used. Each file is written whole to a temporary file, then renamed.
    /// </summary>
    /// <exception cref="IOException">The folder or a file could not be written (the message names the path).</exception>
    /// <exception cref="UnauthorizedAccessException">No permission to write there.</exception>
    /// <exception cref="GemIndex.Data.Batch.BatchInputException">The sheet's readings do not convert.</exception>
    public static IReadOnlyList<string> Write(string workbookPath, StoneSheet sheet, IdentificationResult result, ReportHeader? header = null, bool replace = false)
    {
        StoneReport report = StoneReport.Build(sheet, result, header);
        string folder = FolderFor(workbookPath);
        if (FileKind.Of(folder) is not (FileKind.Entry.Folder or FileKind.Entry.Missing))
            throw new IOException($"{folder}: is {FileKind.Describe(FileKind.Of(folder))}, not a folder; the reports were not written");
        Directory.CreateDirectory(folder);
        string[] texts = [MarkdownReport.Write(report), HtmlReport.Write(report), JsonReport.Write(report)];
        for (int number = 1; ; number++)
        {
            IReadOnlyList<string> paths = PathsFor(workbookPath, sheet, number);
            if (!replace && paths.Any(p => FileKind.Of(p) != FileKind.Entry.Missing)) continue;
            if (paths.FirstOrDefault(p => FileKind.Of(p) is not (FileKind.Entry.Missing or FileKind.Entry.RegularFile)) is { } odd)
                throw new IOException($"{odd}: is {FileKind.Describe(FileKind.Of(odd))}, not a report file; the reports were not written");
            for (int i = 0; i < paths.Count; i++)
            {
                string temporary = $"{paths[i]}.{Guid.NewGuid():N}.tmp";
                try
                {
                    File.WriteAllText(temporary, texts[i], new UTF8Encoding(false));   // whole file or nothing: never half a report
                    File.Move(temporary, paths[i], overwrite: replace);               // without the user's word, never over a file
                }
                finally
                {
                    if (File.Exists(temporary)) File.Delete(temporary);
                }
            }
            return paths;
        }
    }
}
