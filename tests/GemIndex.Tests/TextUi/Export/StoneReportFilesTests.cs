using System.Text.Json;
using GemIndex.Cli.Reports;
using GemIndex.Cli.TextUi.Export;
using GemIndex.Data.Workbook;
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
    public void Exporting_again_never_replaces_a_file_without_the_users_word()
    {
        var sheet = ReportFixtures.Sheet(ReportFixtures.QuartzLine, "ring 1") with { Id = 4 };
        string workbook = Path.Combine(_folder, "bench.db");
        IReadOnlyList<string> first = StoneReportFiles.Write(workbook, sheet, ReportFixtures.Identify(sheet));
        string firstText = File.ReadAllText(first[0]);
        Assert.True(StoneReportFiles.Exists(workbook, sheet));
        var edited = sheet with { Notes = "second export" };
        IReadOnlyList<string> second = StoneReportFiles.Write(workbook, edited, ReportFixtures.Identify(edited));
        Assert.Equal(Path.Combine(_folder, "reports", "ring_1-s4-2.md"), second[0]);
        Assert.Equal(firstText, File.ReadAllText(first[0]));
        IReadOnlyList<string> replaced = StoneReportFiles.Write(workbook, edited, ReportFixtures.Identify(edited), replace: true);
        Assert.Equal(first, replaced);
        Assert.Contains("second export", File.ReadAllText(first[0]));
        Assert.Equal(6, Directory.GetFiles(Path.Combine(_folder, "reports")).Length);   // no temporary files left behind
    }

    [Theory]
    [InlineData("lot 7 2", "lot 7/2")]
    [InlineData("", "/")]
    [InlineData("/", "stone")]
    [InlineData("lot 7", "lot 7")]
    public void Stones_whose_references_map_to_one_name_get_their_own_files(string first, string second)
    {
        string workbook = Path.Combine(_folder, "bench.db");
        var a = ReportFixtures.Sheet(ReportFixtures.QuartzLine, first) with { Id = 1 };
        var b = ReportFixtures.Sheet(ReportFixtures.QuartzLine, second) with { Id = 2 };
        IReadOnlyList<string> pathsA = StoneReportFiles.Write(workbook, a, ReportFixtures.Identify(a));
        IReadOnlyList<string> pathsB = StoneReportFiles.Write(workbook, b, ReportFixtures.Identify(b));
        Assert.Empty(pathsA.Intersect(pathsB));
        Assert.Equal(6, Directory.GetFiles(Path.Combine(_folder, "reports")).Length);
    }

    [Theory]
    [InlineData(129, 130)]
    public void References_differing_after_the_name_length_limit_get_their_own_files(int lengthA, int lengthB)
    {
        string workbook = Path.Combine(_folder, "bench.db");
        var a = ReportFixtures.Sheet(ReportFixtures.QuartzLine, new string('x', lengthA)) with { Id = 10 };
        var b = ReportFixtures.Sheet(ReportFixtures.QuartzLine, new string('x', lengthB)) with { Id = 11 };
        Assert.NotEqual(StoneReportFiles.Write(workbook, a, ReportFixtures.Identify(a))[0], StoneReportFiles.Write(workbook, b, ReportFixtures.Identify(b))[0]);
    }

    [Fact]
    public void Empty_and_duplicate_references_are_warned_about()
    {
        var summaries = new[]
        {
            new StoneSummary(1, "Lot 7", "", null, DateTimeOffset.UnixEpoch),
            new StoneSummary(2, "lot 7 ", "", null, DateTimeOffset.UnixEpoch),
            new StoneSummary(3, "", "", null, DateTimeOffset.UnixEpoch),
        };
        var duplicate = new StoneSheet { Id = 2, Reference = "lot 7 " };
        Assert.Equal(["1 other stone has the reference 'lot 7': the report names differ only by the stone number (-s2)."],
            StoneReportFiles.ReferenceWarnings(duplicate, summaries));
        Assert.Contains("has no reference", Assert.Single(StoneReportFiles.ReferenceWarnings(new StoneSheet { Id = 3 }, summaries)));
        Assert.Empty(StoneReportFiles.ReferenceWarnings(new StoneSheet { Id = 9, Reference = "brooch" }, summaries));
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
