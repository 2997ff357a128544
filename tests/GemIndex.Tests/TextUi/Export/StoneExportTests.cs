using System.Text.Json;
using GemIndex.Cli.Reports;
using GemIndex.Cli.TextUi.Bench;
using GemIndex.Cli.TextUi.Export;
using GemIndex.Core.Identification;

namespace GemIndex.Tests.TextUi.Export;

/// <summary>Ctrl+E's work without a screen: the header of every report names the workbook's examiner, and the confirmation says who.</summary>
public sealed class StoneExportTests : IDisposable
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "gemindex-export-" + Guid.NewGuid().ToString("N"));
    private static readonly DateOnly Day = new(2026, 3, 14);

    public void Dispose()
    {
        if (Directory.Exists(_folder)) Directory.Delete(_folder, recursive: true);
    }

    /// <summary>A quartz stone typed on the form (values from memory, common practice), with the examiner as given.</summary>
    private static (BenchSnapshot Form, BenchAssessment Assessment) Quartz(string examiner)
    {
        var form = new BenchModel();
        form.SetText(BenchFields.Reference, "ring 7");
        form.PutStep(0, new StepText("0", "1.544", "1.553"));
        form.SetText(BenchFields.Sg, "2.65");
        form.SetText(BenchFields.Examiner, examiner);
        BenchSnapshot snapshot = form.Snapshot();
        return (snapshot, new BenchAssessor(new Identifier(TestMaterials.All)).Assess(snapshot));
    }

    private (string Title, string Text) Export(string examiner)
    {
        var (form, assessment) = Quartz(examiner);
        return StoneExport.Write(Path.Combine(_folder, "bench.db"), form, assessment, hasCatalogue: true, () => [], Day);
    }

    private string[] Reports() => Directory.Exists(Path.Combine(_folder, "reports")) ? Directory.GetFiles(Path.Combine(_folder, "reports")) : [];

    [Fact]
    public void The_examiner_set_for_the_workbook_heads_every_report_and_the_confirmation_names_them()
    {
        var (title, text) = Export("  A. Example ");
        Assert.Equal("Reports written", title);
        Assert.Contains("Examiner: A. Example", text.Split('\n'));
        string md = File.ReadAllText(Reports().Single(p => p.EndsWith(".md", StringComparison.Ordinal)));
        Assert.Contains("**Examiner:** A. Example", md);
        Assert.Contains("**Date:** 2026-03-14", md);
        Assert.Contains("**Program:** gemindex ", md);
        Assert.Contains("A. Example", File.ReadAllText(Reports().Single(p => p.EndsWith(".html", StringComparison.Ordinal))));
        using JsonDocument json = JsonDocument.Parse(File.ReadAllText(Reports().Single(p => p.EndsWith(".json", StringComparison.Ordinal))));
        Assert.Equal("A. Example", json.RootElement.GetProperty("header").GetProperty("examiner").GetString());
        Assert.Equal(ReportHeader.Catalogue(), json.RootElement.GetProperty("header").GetProperty("catalogue").GetString());
    }

    [Fact]
    public void A_refused_entry_is_left_out_of_the_reports_as_of_the_answer_and_the_confirmation_says_so()
    {
        // "432 4b0" typed as lines: the answer leaves the field out, so the reports must not list the 432 that parses.
        var model = new BenchModel();
        model.SetText(BenchFields.Reference, "ring 7");
        model.PutStep(0, new StepText("0", "1.544", "1.553"));
        model.SetText(BenchFields.Sg, "2.65");
        model.SetText(BenchFields.Examiner, "A. Example");
        model.SetText(BenchFields.Absorption, "432 4b0");
        BenchSnapshot snapshot = model.Snapshot();
        BenchAssessment assessment = new BenchAssessor(new Identifier(TestMaterials.All)).Assess(snapshot);
        Assert.Single(assessment.Errors);
        Assert.Null(assessment.Readings.AbsorptionNm);
        var (title, text) = StoneExport.Write(Path.Combine(_folder, "bench.db"), snapshot, assessment, hasCatalogue: true, () => [], Day);
        Assert.Equal("Reports written", title);
        Assert.Contains(text.Split('\n'), l => l.StartsWith(StoneExport.RefusedPrefix, StringComparison.Ordinal) && l.Contains("4b0", StringComparison.Ordinal));
        string md = File.ReadAllText(Reports().Single(p => p.EndsWith(".md", StringComparison.Ordinal)));
        Assert.DoesNotContain("432", md);
    }

    [Fact]
    public void Without_an_examiner_the_report_says_not_recorded_and_the_confirmation_says_where_to_set_one()
    {
        var (title, text) = Export("");
        Assert.Equal("Reports written", title);
        Assert.Contains(StoneExport.NoExaminer, text.Split('\n'));
        Assert.Contains("F2 Stone", StoneExport.NoExaminer);
        Assert.Contains($"**Examiner:** {StoneReport.NotRecorded}", File.ReadAllText(Reports().Single(p => p.EndsWith(".md", StringComparison.Ordinal))));
    }

    [Fact]
    public void An_examiner_too_long_to_print_stops_the_export_and_says_why()
    {
        var (title, text) = Export(new string('x', ReportHeader.MostExaminerLength + 1));
        Assert.Equal("Nothing exported", title);
        Assert.Contains("The examiner (F2 Stone) is 81 characters long; allowed: up to 80 printable characters.", text);
        Assert.Empty(Reports());
    }

    [Fact]
    public void The_examiner_field_shows_why_a_name_cannot_be_printed()
    {
        var (_, assessment) = Quartz("A.\u0007Example");
        Assert.Equal("holds a control character; allowed: printable characters only.", assessment.Errors[BenchFields.Examiner]);
        Assert.False(Quartz("A. Example").Assessment.Errors.ContainsKey(BenchFields.Examiner));
    }
}
