using System.Text;
using GemIndex.Cli.Reports;
using GemIndex.Core.Identification;
using GemIndex.Data.Workbook;

namespace GemIndex.Cli.TextUi.Export;

/// <summary>
/// Writes one stone's report as Markdown, HTML and JSON into <c>reports/</c> beside the workbook file, each named after
/// the stone's reference made safe for a file name. A second export of the same stone replaces its files. No Terminal.Gui here.
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

    /// <summary>Writes the three reports and returns their full paths (Markdown, HTML, JSON).</summary>
    /// <exception cref="IOException">The folder or a file could not be written (the message names the path).</exception>
    /// <exception cref="UnauthorizedAccessException">No permission to write there.</exception>
    /// <exception cref="GemIndex.Data.Batch.BatchInputException">The sheet's readings do not convert.</exception>
    public static IReadOnlyList<string> Write(string workbookPath, StoneSheet sheet, IdentificationResult result)
    {
        StoneReport report = StoneReport.Build(sheet, result);
        string folder = FolderFor(workbookPath);
        Directory.CreateDirectory(folder);
        string stem = Path.Combine(folder, SafeName(sheet.Reference));
        (string Path, string Text)[] files =
        [
            (stem + ".md", MarkdownReport.Write(report)),
            (stem + ".html", HtmlReport.Write(report)),
            (stem + ".json", JsonReport.Write(report)),
        ];
        foreach ((string path, string text) in files)
        {
            string temporary = path + ".tmp";
            File.WriteAllText(temporary, text, new UTF8Encoding(false));   // whole file or nothing: never half a report
            File.Move(temporary, path, overwrite: true);
        }
        return [.. files.Select(f => f.Path)];
    }
}
