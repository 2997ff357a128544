using System.Runtime.CompilerServices;
using System.Text;
using System.Text.Json;
using GemIndex.Cli.Identification;
using GemIndex.Cli.Reports;
using GemIndex.Core.Bench;
using GemIndex.Core.Identification;
using GemIndex.Data.Batch;
using GemIndex.Tests.Reports;

namespace GemIndex.Tests.CommandLine;

/// <summary>
/// Approval tests: the --help texts and the JSON shapes are compared with the approved files in Approved/. A change
/// fails the test and writes NAME.received.txt beside the approved file; review it and rename it to approve.
/// The JSON files hold the shape (every path with its kind), so ranking changes do not disturb them; shape changes do.
/// </summary>
public class ApprovalTests
{
    public static TheoryData<string> HelpCommands() =>
    [
        "identify", "report stone", "report workbook", "calc", "calc sg", "calc snell", "calc refractometer", "calc dispersion",
    ];

    [Theory]
    [MemberData(nameof(HelpCommands))]
    public void Help_text_is_approved(string command)
    {
        var (exit, output, _) = CommandRun.Plain([.. command.Split(' '), "--help"]);
        Assert.Equal(0, exit);
        Approve("help-" + command.Replace(' ', '-'), output);
    }

    [Fact]
    public void The_result_document_shape_is_approved()
    {
        var readings = StoneReadingsJson.Read(ReportFixtures.QuartzLine).Readings;
        IdentificationResult result = BenchIdentification.Identify(new Identifier(ReportFixtures.Catalogue), readings, new BenchRequest()).Result!;
        Approve("result-document", Shape(ResultDocument.Line(result, explain: true)));
    }

    [Fact]
    public void The_error_document_shape_is_approved()
    {
        var read = StoneReadingsJson.Read("""{"id":"x","sg":50}""");
        Approve("error-document", Shape(ResultDocument.Error(3, "x", BenchReader.Read(read.Readings).Errors)));
    }

    [Fact]
    public void The_JSON_report_shape_is_approved()
    {
        var report = ReportFixtures.Report(ReportFixtures.QuartzLine) with { Header = new ReportHeader(new DateOnly(2026, 3, 14), "A. Example", "0.1.0", "0123456789ab") };
        Approve("json-report", Shape(JsonReport.Write(report)));
    }

    /// <summary>Every path of a JSON document with its kind, sorted and distinct: "$.species[].confidence: Number".</summary>
    private static string Shape(string json)
    {
        using var doc = JsonDocument.Parse(json);
        var paths = new SortedSet<string>(StringComparer.Ordinal);
        Walk(doc.RootElement, "$", paths);
        return string.Join("\n", paths) + "\n";
    }

    private static void Walk(JsonElement e, string path, SortedSet<string> paths)
    {
        paths.Add($"{path}: {(e.ValueKind is JsonValueKind.True or JsonValueKind.False ? "Boolean" : e.ValueKind.ToString())}");
        if (e.ValueKind == JsonValueKind.Object)
            // The origins are keyed by origin word: which ones appear depends on the catalogue, not on the shape.
            foreach (var p in e.EnumerateObject()) Walk(p.Value, path.EndsWith(".origins", StringComparison.Ordinal) ? $"{path}.<origin>" : $"{path}.{p.Name}", paths);
        else if (e.ValueKind == JsonValueKind.Array)
            foreach (var x in e.EnumerateArray()) Walk(x, path + "[]", paths);
    }

    /// <summary>
    /// The approved files' folder, found from the test's output folder upwards (a CI build maps source paths to "/_/",
    /// so the caller's file path cannot be used).
    /// </summary>
    private static string ApprovedFolder()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
            if (File.Exists(Path.Combine(dir.FullName, "GemIndex.sln")))
                return Path.Combine(dir.FullName, "tests", "GemIndex.Tests", "CommandLine", "Approved");
        throw new InvalidOperationException($"no GemIndex.sln above {AppContext.BaseDirectory}");
    }

    private static void Approve(string name, string received)
    {
        string folder = ApprovedFolder();
        string approved = Path.Combine(folder, name + ".approved.txt");
        string text = received.Replace("\r\n", "\n", StringComparison.Ordinal);
        string? expected = File.Exists(approved) ? File.ReadAllText(approved) : null;
        if (expected != text) File.WriteAllText(Path.Combine(folder, name + ".received.txt"), text, new UTF8Encoding(false));
        Assert.True(expected == text, $"{name}: output differs from {approved}; see {name}.received.txt");
    }
}
