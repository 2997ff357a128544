using System.CommandLine;
using GemIndex.Cli.CommandLine;
using GemIndex.Tests.Reports;

namespace GemIndex.Tests.CommandLine;

public sealed class ReportCommandTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("gemindex-report-").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private (int Exit, string Out, string Err) Run(params string[] args)
    {
        var root = new RootCommand { ReportCommand.Create(() => ReportFixtures.Catalogue) };
        var o = new StringWriter();
        var e = new StringWriter();
        int exit = root.Parse(args).Invoke(new InvocationConfiguration { Output = o, Error = e });
        return (exit, o.ToString(), e.ToString());
    }

    private string Batch(params string[] lines)
    {
        string path = Path.Combine(_dir, "stones.jsonl");
        File.WriteAllText(path, string.Join("\n", lines) + "\n");
        return path;
    }

    [Theory]
    [InlineData("html", "<!DOCTYPE html>")]
    [InlineData("markdown", "# Stone report: lot 7 / 2")]
    [InlineData("json", "\"report_version\": 2")]
    public void Report_stone_writes_the_chosen_format_to_the_output_file(string format, string expected)
    {
        string output = Path.Combine(_dir, "report.out");
        var (exit, stdout, err) = Run("report", "stone", "--readings", Batch("""{"id":"first"}""", ReportFixtures.QuartzLine),
            "--line", "2", "--format", format, "--output", output);
        Assert.Equal("", err);
        Assert.Equal(ExitCodes.Ok, exit);
        Assert.Contains(output, stdout);
        string text = File.ReadAllText(output);
        Assert.Contains(expected, text);
        Assert.Contains("quartz", text);
    }

    [Fact]
    public void An_existing_output_file_is_replaced_only_with_force()
    {
        string output = Path.Combine(_dir, "kept.md");
        File.WriteAllText(output, "someone else's notes");
        string batch = Batch(ReportFixtures.QuartzLine);
        var (exit, _, err) = Run("report", "stone", "--readings", batch, "--output", output);
        Assert.NotEqual(ExitCodes.Ok, exit);
        Assert.Contains("--output", err);
        Assert.Contains("exists; add --force", err);
        Assert.Equal("someone else's notes", File.ReadAllText(output));
        var (forced, _, _) = Run("report", "stone", "--readings", batch, "--output", output, "--force");
        Assert.Equal(ExitCodes.Ok, forced);
        Assert.StartsWith("# Stone report", File.ReadAllText(output));
    }

    [Fact]
    public void Without_output_the_report_goes_to_standard_output()
    {
        var (exit, stdout, _) = Run("report", "stone", "--readings", Batch(ReportFixtures.QuartzLine));
        Assert.Equal(ExitCodes.Ok, exit);
        Assert.Contains("## Candidates", stdout);
    }

    [Fact]
    public void A_field_the_format_does_not_know_is_named_in_the_report_as_not_read()
    {
        string line = ReportFixtures.QuartzLine.TrimEnd().TrimEnd('}') + ",\"color\":\"colourless\"}";
        var (exit, stdout, _) = Run("report", "stone", "--readings", Batch(line));
        Assert.Equal(ExitCodes.Ok, exit);
        Assert.Contains("\"color\" was not read: the batch format has no such field; did you mean \"colour\"?", stdout);
    }

    [Fact]
    public void A_bad_line_is_reported_with_its_field_and_a_non_zero_exit()
    {
        string output = Path.Combine(_dir, "never.md");
        var (exit, _, err) = Run("report", "stone", "--readings",
            Batch("""{"id":"bad","refractometer":{"readings":[{"rotation_deg":0,"low":"1.54"}]}}"""), "--output", output);
        Assert.Equal(ExitCodes.BadInput, exit);
        Assert.Contains("line 1", err);
        Assert.Contains("refractometer.readings[0].low", err);
        Assert.False(File.Exists(output));
    }

    [Fact]
    public void An_out_of_range_value_names_its_field()
    {
        var (exit, _, err) = Run("report", "stone", "--readings", Batch("""{"id":"bad","sg":80}"""));
        Assert.Equal(ExitCodes.BadInput, exit);
        Assert.Contains("sg:", err);
        Assert.Contains("80", err);
    }

    [Fact]
    public void A_line_beyond_the_file_is_refused_with_the_allowed_range()
    {
        var (exit, _, err) = Run("report", "stone", "--readings", Batch(ReportFixtures.QuartzLine), "--line", "3");
        Assert.Equal(ExitCodes.BadInput, exit);
        Assert.Contains("--line: 3", err);
        Assert.Contains("1–1", err);
    }

    [Theory]
    [InlineData("--line", "0")]
    [InlineData("--line", "two")]
    [InlineData("--format", "pdf")]
    public void Bad_options_are_parse_errors(string option, string value)
    {
        var (exit, _, err) = Run("report", "stone", "--readings", Batch(ReportFixtures.QuartzLine), option, value);
        Assert.Equal(ExitCodes.Usage, exit);
        Assert.Contains(value, err);
    }

    [Theory]
    [InlineData("stone", "--readings", "")]
    [InlineData("stone", "--workbook", "")]
    [InlineData("workbook", "--workbook", "")]
    public void An_empty_path_is_an_error_naming_the_option_not_a_crash(string command, string option, string path)
    {
        string[] args = command == "stone" && option == "--workbook" ? ["report", command, option, path, "--stone", "x"] : ["report", command, option, path];
        var (exit, _, err) = Run(args);
        Assert.Equal(ExitCodes.BadInput, exit);
        Assert.Contains($"{option}: the path is empty", err);
    }

    [Fact]
    public void A_missing_file_or_a_folder_is_a_plain_message()
    {
        var (exit, _, err) = Run("report", "stone", "--readings", Path.Combine(_dir, "nowhere.jsonl"));
        Assert.Equal(ExitCodes.BadFile, exit);
        Assert.Contains("there is no file", err);
        var (folder, _, folderErr) = Run("report", "stone", "--readings", _dir);
        Assert.Equal(ExitCodes.BadFile, folder);
        Assert.Contains("is a folder, not a file", folderErr);
    }

    [Fact]
    public void A_reference_with_a_terminal_escape_sequence_is_escaped_in_the_Markdown_on_standard_output()
    {
        string line = ReportFixtures.QuartzLine.Replace("\"id\":\"", "\"id\":\"\\u001b[2J", StringComparison.Ordinal);
        var (exit, stdout, err) = Run("report", "stone", "--readings", Batch(line));
        Assert.True(exit == ExitCodes.Ok, err);
        Assert.DoesNotContain("\u001b", stdout);
        Assert.Contains("\\u001b\\[2J", stdout);
    }

    [Fact]
    public void A_workbook_stone_without_the_option_takes_the_examiner_kept_in_the_workbook()
    {
        string path = Path.Combine(_dir, "bench.db");
        using (var wb = GemIndex.Data.Workbook.StoneWorkbook.Open(path, TimeProvider.System, GemIndex.Data.Workbook.WorkbookOpening.CreateIfMissing))
        {
            wb.Create(ReportFixtures.Sheet(ReportFixtures.QuartzLine, "lot 7 / 2"));
            wb.SetSetting(GemIndex.Cli.TextUi.Bench.BenchFields.Examiner, "B. Example");
        }
        var (exit, stdout, err) = Run("report", "stone", "--workbook", path, "--stone", "lot 7 / 2");
        Assert.True(exit == 0, err);
        Assert.Contains("**Examiner:** B. Example", stdout);
        var (_, given, _) = Run("report", "stone", "--workbook", path, "--stone", "lot 7 / 2", "--examiner", "A. Example");
        Assert.Contains("**Examiner:** A. Example", given);   // the option wins over the workbook's setting
    }

    [Fact]
    public void A_workbook_stones_report_names_what_was_typed_in_the_text_UI_and_refused_which_it_leaves_out()
    {
        string path = Path.Combine(_dir, "draft.db");
        using (var wb = GemIndex.Data.Workbook.StoneWorkbook.Open(path, TimeProvider.System, GemIndex.Data.Workbook.WorkbookOpening.CreateIfMissing))
        {
            long id = wb.Create(ReportFixtures.Sheet(ReportFixtures.QuartzLine, "lot 7 / 3")).Id;
            // The form as typed: the SG field holds a word, which the reader refuses (the stone holds what the answer used).
            var form = new GemIndex.Cli.TextUi.Bench.BenchModel();
            form.SetText(GemIndex.Cli.TextUi.Bench.BenchFields.Sg, "2.6x");
            wb.SetSetting(GemIndex.Cli.TextUi.Main.BenchSession.DraftSetting(id), GemIndex.Cli.TextUi.Bench.BenchDraft.Write(form.Snapshot() with { StoneId = id }));
        }
        var (exit, stdout, err) = Run("report", "stone", "--workbook", path, "--stone", "lot 7 / 3");
        Assert.True(exit == 0, err);
        Assert.Contains("gemindex: stone 'lot 7 / 3': typed but refused, so not in this report: sg: '2.6x' is not a number", err);
        Assert.Contains("# Stone report: lot 7 / 3", stdout);
        // The workbook's CSV says it in the stone's row too (its last column), and on stderr.
        var (csvExit, csv, csvErr) = Run("report", "workbook", "--workbook", path);
        Assert.True(csvExit == 0, csvErr);
        string row = csv.Split('\n').Single(l => l.StartsWith("lot 7 / 3,", StringComparison.Ordinal)).TrimEnd('\r');
        Assert.Contains(",facet,sg: '2.6x' is not a number", row);
        Assert.Contains("typed but refused, so not in its row: sg: '2.6x'", csvErr);
    }

    [Fact]
    public void A_workbook_stone_with_no_usable_reading_has_no_answer_in_its_row()
    {
        // Its only entry refused (an SG word): ranked on the catalogue's frequencies alone, its row had named a species.
        string path = Path.Combine(_dir, "empty.db");
        using (var wb = GemIndex.Data.Workbook.StoneWorkbook.Open(path, TimeProvider.System, GemIndex.Data.Workbook.WorkbookOpening.CreateIfMissing))
        {
            long id = wb.Create(new GemIndex.Data.Workbook.StoneSheet { Reference = "lot 9 / 1" }).Id;
            var form = new GemIndex.Cli.TextUi.Bench.BenchModel();
            form.SetText(GemIndex.Cli.TextUi.Bench.BenchFields.Sg, "2.6x");
            wb.SetSetting(GemIndex.Cli.TextUi.Main.BenchSession.DraftSetting(id), GemIndex.Cli.TextUi.Bench.BenchDraft.Write(form.Snapshot() with { StoneId = id }));
        }
        var (exit, csv, err) = Run("report", "workbook", "--workbook", path);
        Assert.True(exit == 0, err);
        string[] lines = csv.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        string[] header = lines[0].TrimEnd('\r').Split(',');
        string[] row = lines.Single(l => l.StartsWith("lot 9 / 1,", StringComparison.Ordinal)).TrimEnd('\r').Split(',');
        Assert.Equal("", row[Array.IndexOf(header, "species")]);
        Assert.Equal("", row[Array.IndexOf(header, "best_candidate")]);
    }

    [Fact]
    public void The_header_carries_the_date_given_the_examiner_and_the_program_and_catalogue_versions()
    {
        var (exit, stdout, err) = Run("report", "stone", "--readings", Batch(ReportFixtures.QuartzLine), "--date", "2026-03-14", "--examiner", "A. Example");
        Assert.True(exit == ExitCodes.Ok, err);
        Assert.Contains("**Date:** 2026-03-14", stdout);
        Assert.Contains("**Examiner:** A. Example", stdout);
        Assert.Contains("**Program:** gemindex ", stdout);
        Assert.Contains("**Catalogue:** ", stdout);
        var (json, jsonOut, _) = Run("report", "stone", "--readings", Batch(ReportFixtures.QuartzLine), "--date", "2026-03-14", "--format", "json");
        Assert.Equal(ExitCodes.Ok, json);
        using var doc = System.Text.Json.JsonDocument.Parse(jsonOut);
        Assert.Equal("2026-03-14", doc.RootElement.GetProperty("header").GetProperty("date").GetString());
        Assert.Equal(System.Text.Json.JsonValueKind.Null, doc.RootElement.GetProperty("header").GetProperty("examiner").ValueKind);
    }

    [Theory]
    [InlineData("--date", "14/03/2026")]
    [InlineData("--date", "2026-02-30")]
    [InlineData("--examiner", " ")]
    public void A_bad_date_or_an_empty_examiner_is_an_error(string option, string value)
    {
        var (exit, _, err) = Run("report", "stone", "--readings", Batch(ReportFixtures.QuartzLine), option, value);
        Assert.Equal(ExitCodes.BadInput, exit);
        Assert.Contains(option, err);
    }
}
