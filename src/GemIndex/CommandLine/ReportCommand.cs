using GemIndex.Data.Catalogue;
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

    public static Command Create(Func<IReadOnlyList<Material>> materials) => Create(_ => materials(), null);

    /// <summary>The report group with the catalogue chosen per invocation (<c>--catalogue-dir</c>, as for the other commands).</summary>
    public static Command Create(Option<DirectoryInfo?> catalogueDirectory) =>
        Create(pr => MergedCatalogue.Load(CatalogueCommand.Locations(pr, catalogueDirectory)), catalogueDirectory);

    private static Command Create(Func<ParseResult, IReadOnlyList<Material>> catalogue, Option<DirectoryInfo?>? catalogueDirectory)
    {
        var readings = new Option<FileInfo>("--readings") { Description = "Batch file of readings (JSON, one stone per line)" };
        readings.AcceptExistingOnly();
        var workbook = new Option<FileInfo>("--workbook") { Description = "A workbook file: report a stone of it (--stone) or, with 'report workbook', all of them" };
        workbook.AcceptExistingOnly();
        var reference = new Option<string?>("--stone") { Description = "With --workbook: the stone's reference" };
        var line = new Option<int>("--line")
        {
            Description = "Which line of the file (1 = the first; default 1)",
            DefaultValueFactory = _ => 1,
            CustomParser = LineNumber,
        };
        var format = new Option<string>("--format") { Description = "markdown, html or json", DefaultValueFactory = _ => "markdown" };
        format.AcceptOnlyFromAmong(Formats);
        var output = new Option<FileInfo?>("--output") { Description = "File to write (default: standard output)" };
        var stone = new Command("stone", "Identify one stone (a batch line, or a stone of a workbook) and write its report")
        {
            readings, line, workbook, reference, format, output,
        };
        stone.Validators.Add(r =>
        {
            bool fromFile = r.GetValue(readings) is not null, fromWorkbook = r.GetValue(workbook) is not null;
            if (fromFile == fromWorkbook) r.AddError("give either --readings FILE or --workbook FILE --stone REFERENCE");
            else if (fromWorkbook && string.IsNullOrWhiteSpace(r.GetValue(reference))) r.AddError("--workbook needs --stone REFERENCE");
        });
        stone.SetAction(pr => CatalogueFailure.Guard(pr, (o, e) => pr.GetValue(workbook) is { } book
            ? WorkbookStone(book, pr.GetValue(reference)!, pr.GetRequiredValue(format), pr.GetValue(output), () => catalogue(pr), o, e)
            : Stone(pr.GetValue(readings)!, pr.GetValue(line), pr.GetRequiredValue(format), pr.GetValue(output), () => catalogue(pr), o, e)));
        var wholeBook = new Option<FileInfo>("--workbook") { Description = "The workbook file", Required = true };
        wholeBook.AcceptExistingOnly();
        var csv = new Option<FileInfo?>("--output") { Description = "CSV file to write (default: standard output)" };
        var all = new Command("workbook", "Every stone of a workbook as CSV, one row each, with its best candidate") { wholeBook, csv };
        all.SetAction(pr => CatalogueFailure.Guard(pr, (o, e) => Workbook(pr.GetRequiredValue(wholeBook), pr.GetValue(csv), () => catalogue(pr), o, e)));
        var report = new Command("report", "Printable reports of identified stones, and the workbook as CSV") { stone, all };
        if (catalogueDirectory is not null) report.Options.Add(catalogueDirectory);
        return report;
    }

    private static int WorkbookStone(FileInfo book, string reference, string format, FileInfo? output, Func<IReadOnlyList<Material>> materials,
        TextWriter o, TextWriter e)
    {
        try
        {
            using var workbook = StoneWorkbook.Open(book.FullName, TimeProvider.System, WorkbookOpening.ReadOnly);
            var summary = workbook.List().FirstOrDefault(s => string.Equals(s.Reference, reference, StringComparison.OrdinalIgnoreCase));
            if (summary is null || workbook.Get(summary.Id) is not { } sheet)
            {
                e.WriteLine($"gemindex: --stone: no stone '{reference}' in {book.Name}");
                return ExitCodes.BadInput;
            }
            var bench = StoneReadingsConverter.ToBenchSheet(sheet.Readings);
            return Write(StoneReport.Build(sheet, new Identifier(materials()).Identify(bench)), sheet.Reference, format, output, o);
        }
        catch (WorkbookException x)
        {
            e.WriteLine($"gemindex: {x.Message}");
            return ExitCodes.BadFile;
        }
        catch (BatchInputException x)
        {
            e.WriteLine($"gemindex: stone '{reference}': {x.Message}");
            return ExitCodes.BadInput;
        }
    }

    private static int Workbook(FileInfo book, FileInfo? output, Func<IReadOnlyList<Material>> materials, TextWriter o, TextWriter e)
    {
        try
        {
            using var workbook = StoneWorkbook.Open(book.FullName, TimeProvider.System, WorkbookOpening.ReadOnly);
            var identifier = new Identifier(materials());
            var rows = new List<(StoneSheet, IdentificationResult?)>();
            foreach (var summary in workbook.List())
            {
                if (workbook.Get(summary.Id) is not { } sheet) continue;
                IdentificationResult? result = null;
                try { result = identifier.Identify(StoneReadingsConverter.ToBenchSheet(sheet.Readings), adviseNextTest: false); }
                catch (BatchInputException x) { e.WriteLine($"gemindex: stone '{sheet.Reference}': {x.Message} (row written without a result)"); }
                rows.Add((sheet, result));
            }
            using var writer = output is null ? null : new StreamWriter(output.FullName);
            WorkbookCsv.Write(writer ?? o, rows);
            if (output is not null) o.WriteLine($"wrote {rows.Count} stones to {output.FullName}");
            return ExitCodes.Ok;
        }
        catch (WorkbookException x)
        {
            e.WriteLine($"gemindex: {x.Message}");
            return ExitCodes.BadFile;
        }
    }

    private static int Write(StoneReport report, string reference, string format, FileInfo? output, TextWriter o)
    {
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
            o.WriteLine($"wrote {format} report of '{reference}' to {output.FullName}");
        }
        return ExitCodes.Ok;
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
        return Write(report, stoneReadings.Id, format, output, o);
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
