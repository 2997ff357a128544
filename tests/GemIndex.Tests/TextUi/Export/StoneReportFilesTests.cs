using System.Text.Json;
using GemIndex.Cli.Reports;
using GemIndex.Cli.TextUi.Export;
using GemIndex.Tests.Reports;

namespace GemIndex.Tests.TextUi.Export;

public sealed class StoneReportFilesTests : IDisposable
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "gemindex-export-" + Guid.NewGuid().ToString("N"));

    public void Dispose()
    {
        if (Directory.Exists(_folder)) Directory.Delete(_folder, recursive: true);
    }

    [Theory]
    [InlineData("lot 3/ 5:*?", "lot_3_5")]
    [InlineData("ring 12", "ring_12")]
    [InlineData("a\\b<c>d|e\"f", "a_b_c_d_e_f")]
    [InlineData("../../etc/passwd", "etc_passwd")]
    [InlineData("tab\there\nnewline", "tab_here_newline")]
    [InlineData("  ", StoneReportFiles.Unnamed)]
    [InlineData("?*:", StoneReportFiles.Unnamed)]
    [InlineData("CON", "_CON")]
    [InlineData("nul.txt", "_nul.txt")]
    [InlineData("grenat-7.2", "grenat-7.2")]
    [InlineData("émeraude 3", "émeraude_3")]
    public void References_become_safe_file_names(string reference, string expected) =>
        Assert.Equal(expected, StoneReportFiles.SafeName(reference));

    [Fact]
    public void A_long_reference_is_cut_to_the_limit()
    {
        string name = StoneReportFiles.SafeName(new string('x', 300));
        Assert.Equal(StoneReportFiles.MostNameLength, name.Length);
    }

    [Fact]
    public void A_safe_name_never_holds_a_character_invalid_in_a_file_name()
    {
        char[] invalid = [.. Path.GetInvalidFileNameChars(), '\\', ':', '*', '?', '"', '<', '>', '|'];
        for (int c = 0; c < 0x250; c++)
        {
            string name = StoneReportFiles.SafeName("a" + (char)c + "b");
            Assert.True(name.IndexOfAny(invalid) < 0, $"U+{c:X4} gave '{name}'");
        }
    }

    [Fact]
    public void The_three_reports_are_written_beside_the_workbook_and_name_the_stone()
    {
        const string reference = "lot 3/ 5:*?";
        var sheet = ReportFixtures.Sheet(ReportFixtures.QuartzLine, reference);
        IReadOnlyList<string> paths = StoneReportFiles.Write(Path.Combine(_folder, "bench.db"), sheet, ReportFixtures.Identify(sheet));

        string reports = Path.Combine(_folder, "reports");
        Assert.Equal([Path.Combine(reports, "lot_3_5.md"), Path.Combine(reports, "lot_3_5.html"), Path.Combine(reports, "lot_3_5.json")], paths);
        Assert.Equal(3, Directory.GetFiles(reports).Length);   // no temporary files left behind
        Assert.Contains(MarkdownReport.Escape(reference), File.ReadAllText(paths[0]));
        Assert.Contains(HtmlReport.E(reference), File.ReadAllText(paths[1]));
        Assert.Contains("quartz", File.ReadAllText(paths[1]));
        using JsonDocument json = JsonDocument.Parse(File.ReadAllText(paths[2]));
        Assert.Equal(reference, json.RootElement.GetProperty("stone").GetProperty("reference").GetString());
    }

    [Fact]
    public void Exporting_again_replaces_the_files()
    {
        var sheet = ReportFixtures.Sheet(ReportFixtures.QuartzLine, "ring 1");
        string workbook = Path.Combine(_folder, "bench.db");
        StoneReportFiles.Write(workbook, sheet, ReportFixtures.Identify(sheet));
        var renamed = sheet with { Notes = "second export" };
        IReadOnlyList<string> paths = StoneReportFiles.Write(workbook, renamed, ReportFixtures.Identify(renamed));
        Assert.Contains("second export", File.ReadAllText(paths[0]));
        Assert.Equal(3, Directory.GetFiles(Path.Combine(_folder, "reports")).Length);
    }

    [Fact]
    public void A_folder_that_cannot_be_made_is_an_error_naming_the_path()
    {
        Directory.CreateDirectory(_folder);
        File.WriteAllText(Path.Combine(_folder, "reports"), "a file where the folder should be");
        var sheet = ReportFixtures.Sheet(ReportFixtures.QuartzLine, "ring 2");
        var e = Assert.ThrowsAny<IOException>(() => StoneReportFiles.Write(Path.Combine(_folder, "bench.db"), sheet, ReportFixtures.Identify(sheet)));
        Assert.Contains("reports", e.Message);
    }
}
