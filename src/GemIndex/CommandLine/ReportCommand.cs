using System.CommandLine;
using System.CommandLine.Parsing;
using System.Globalization;
using GemIndex.Cli.Reports;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Identification;
using GemIndex.Data.Batch;
using GemIndex.Data.Workbook;

namespace GemIndex.Cli.CommandLine;

/// <summary>
/// <c>report stone</c>: identifies one stone from a line of a batch file and writes its printable report
/// (Markdown, HTML or JSON) to a file or standard output. The catalogue comes from the function given to
/// <see cref="Create"/>, so tests pass materials built in code.
/// </summary>
internal static class ReportCommand
{
    public static readonly string[] Formats = ["markdown", "html", "json"];

    public static Command Create(Func<IReadOnlyList<Material>> materials)
    {
        var readings = new Option<FileInfo>("--readings") { Description = "Batch file of readings (JSON, one stone per line)", Required = true };
        readings.AcceptExistingOnly();
        var line = new Option<int>("--line")
        {
            Description = "Which line of the file (1 = the first; default 1)",
            DefaultValueFactory = _ => 1,
            CustomParser = LineNumber,
        };
        var format = new Option<string>("--format") { Description = "markdown, html or json", DefaultValueFactory = _ => "markdown" };
        format.AcceptOnlyFromAmong(Formats);
        var output = new Option<FileInfo?>("--output") { Description = "File to write (default: standard output)" };
        var stone = new Command("stone", "Identify one stone from a batch line and write its report") { readings, line, format, output };
        stone.SetAction(pr => CatalogueFailure.Guard(pr, (o, e) =>
            Stone(pr.GetRequiredValue(readings), pr.GetValue(line), pr.GetRequiredValue(format), pr.GetValue(output), materials, o, e)));
        return new Command("report", "Printable reports of identified stones") { stone };
    }

    private static int Stone(FileInfo file, int lineNumber, string format, FileInfo? output, Func<IReadOnlyList<Material>> materials,
        TextWriter o, TextWriter e)
    {
        string[] lines = File.ReadAllLines(file.FullName);
        if (lineNumber > lines.Length)
        {
            e.WriteLine($"gemindex: --line: {lineNumber} is beyond the end of {file.Name} ({lines.Length} lines); allowed: 1–{lines.Length}");
            return ExitCodes.BadInput;
        }
        StoneReadings stoneReadings;
        BenchSheet bench;
        try
        {
            stoneReadings = StoneReadingsJson.Parse(lines[lineNumber - 1]);
            bench = StoneReadingsConverter.ToBenchSheet(stoneReadings);
        }
        catch (BatchInputException x)
        {
            e.WriteLine($"gemindex: {file.Name} line {lineNumber}: {x.Message}");
            return ExitCodes.BadInput;
        }
        IReadOnlyList<Material> catalogue = materials();
        if (catalogue.Count == 0)
        {
            e.WriteLine("gemindex: the catalogue has no materials; build it with 'gemindex catalogue build'");
            return ExitCodes.BadFile;
        }
        IdentificationResult result = new Identifier(catalogue).Identify(bench);
        var report = StoneReport.Build(new StoneSheet { Reference = stoneReadings.Id, Readings = stoneReadings }, result);
        string text = format switch
        {
            "html" => HtmlReport.Write(report),
            "json" => JsonReport.Write(report),
            _ => MarkdownReport.Write(report),
        };
        if (output is null) o.Write(text);
        else
        {
            File.WriteAllText(output.FullName, text);
            o.WriteLine($"wrote {format} report of '{stoneReadings.Id}' to {output.FullName}");
        }
        return ExitCodes.Ok;
    }

    private static int LineNumber(ArgumentResult r)
    {
        string text = r.Tokens.Count == 1 ? r.Tokens[0].Value : "";
        if (!int.TryParse(text, NumberStyles.None, CultureInfo.InvariantCulture, out int n) || n < 1)
        {
            r.AddError($"--line: '{text}' is not a line number; allowed: a whole number from 1");
            return 1;
        }
        return n;
    }
}
