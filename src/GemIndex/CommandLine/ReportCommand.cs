using GemIndex.Data.Catalogue;
using System.CommandLine;
using System.CommandLine.Parsing;
using System.Globalization;
using GemIndex.Cli.Identification;
using GemIndex.Cli.Reports;
using GemIndex.Core.Bench;
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

    /// <summary>What a report asks of the identification: the default candidates and their reasons.</summary>
    private static readonly BenchRequest Request = new();

    public static Command Create(Func<IReadOnlyList<Material>> materials) => Create(_ => materials(), null);

    /// <summary>The report group with the catalogue chosen per invocation (<c>--catalogue-dir</c>, as for the other commands).</summary>
    public static Command Create(Option<DirectoryInfo?> catalogueDirectory) =>
        Create(pr => MergedCatalogue.Load(CatalogueCommand.Locations(pr, catalogueDirectory)), catalogueDirectory);

    private static Command Create(Func<ParseResult, IReadOnlyList<Material>> catalogue, Option<DirectoryInfo?>? catalogueDirectory)
    {
        var readings = new Option<string?>("--readings") { Description = "Batch file of readings (JSON, one stone per line)" };
        var workbook = new Option<string?>("--workbook") { Description = "A workbook file: report a stone of it (--stone) or, with 'report workbook', all of them" };
        var reference = new Option<string?>("--stone") { Description = "With --workbook: the stone's reference" };
        var line = new Option<int>("--line")
        {
            Description = "Which line of the file (1 = the first; default 1)",
            DefaultValueFactory = _ => 1,
            CustomParser = LineNumber,
        };
        var format = new Option<string>("--format") { Description = "markdown, html or json", DefaultValueFactory = _ => "markdown" };
        ChoiceOption.Restrict(format, Formats);
        var output = new Option<FileInfo?>("--output") { Description = "File to write (default: standard output); an existing file only with --force" };
        var force = new Option<bool>("--force") { Description = "Replace the --output file if it exists" };
        NeverReplacedUnasked(output, force);
        var examiner = new Option<string?>("--examiner") { Description = "Who examined the stone, printed in the report's header" };
        var date = new Option<string?>("--date") { Description = "The report's date, YYYY-MM-DD (default: today)" };
        var stone = new Command("stone", "Identify one stone (a batch line, or a stone of a workbook) and write its report")
        {
            readings, line, workbook, reference, format, output, force, examiner, date,
        };
        stone.Validators.Add(r =>
        {
            bool fromFile = r.GetValue(readings) is not null, fromWorkbook = r.GetValue(workbook) is not null;
            if (fromFile == fromWorkbook) r.AddError("give either --readings FILE or --workbook FILE --stone REFERENCE");
            else if (fromWorkbook && string.IsNullOrWhiteSpace(r.GetValue(reference))) r.AddError("--workbook needs --stone REFERENCE");
        });
        stone.SetAction(pr => CatalogueFailure.Guard(pr, (o, e) =>
        {
            if (Header(pr.GetValue(date), pr.GetValue(examiner), e) is not { } header) return ExitCodes.BadInput;
            return pr.GetValue(workbook) is { } bookPath
                ? Existing("--workbook", bookPath, e, out int refused) is not { } book ? refused
                    : WorkbookStone(book, pr.GetValue(reference)!, pr.GetRequiredValue(format), pr.GetValue(output), header, () => catalogue(pr), o, e)
                : Existing("--readings", pr.GetValue(readings)!, e, out int refusedFile) is not { } file ? refusedFile
                    : Stone(file, pr.GetValue(line), pr.GetRequiredValue(format), pr.GetValue(output), header, () => catalogue(pr), o, e);
        }));
        var wholeBook = new Option<string>("--workbook") { Description = "The workbook file", Required = true };
        var csv = new Option<FileInfo?>("--output") { Description = "CSV file to write (default: standard output); an existing file only with --force" };
        var forceCsv = new Option<bool>("--force") { Description = "Replace the --output file if it exists" };
        NeverReplacedUnasked(csv, forceCsv);
        var all = new Command("workbook", "Every stone of a workbook as CSV, one row each, with its best candidate") { wholeBook, csv, forceCsv };
        all.SetAction(pr => CatalogueFailure.Guard(pr, (o, e) => Existing("--workbook", pr.GetRequiredValue(wholeBook), e, out int refused) is not { } book ? refused
            : Workbook(book, pr.GetValue(csv), () => catalogue(pr), o, e)));
        var report = new Command("report", "Printable reports of identified stones, and the workbook as CSV") { stone, all };
        if (catalogueDirectory is not null) report.Options.Add(catalogueDirectory);
        return report;
    }

    /// <summary>An existing output file is replaced only with the user's word (--force); a folder never.</summary>
    private static void NeverReplacedUnasked(Option<FileInfo?> output, Option<bool> force) => output.Validators.Add(r =>
    {
        if (r.Tokens.Count != 1) return;
        string path = r.Tokens[0].Value;
        if (Directory.Exists(path)) r.AddError($"--output: '{BenchText.Shown(path)}' is a folder; give a file name");
        else if (File.Exists(path) && r.GetResult(force) is not { Implicit: false })
            r.AddError($"--output: '{BenchText.Shown(path)}' exists; add --force to replace it, or give another name");
    });


    /// <summary>The report's header: the date given (or today, read here at the edge, never in Core), the examiner, the versions.</summary>
    private static ReportHeader? Header(string? date, string? examiner, TextWriter e)
    {
        DateOnly day = DateOnly.FromDateTime(TimeProvider.System.GetLocalNow().Date);
        if (date is not null && !DateOnly.TryParseExact(date.Trim(), "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out day))
        {
            e.WriteLine($"gemindex: --date: '{BenchText.Shown(date)}' is not a date; allowed: YYYY-MM-DD, e.g. 2026-03-14.");
            return null;
        }
        if (examiner is not null && examiner.Trim().Length == 0)
        {
            e.WriteLine("gemindex: --examiner: is empty; give a name, or leave the option out.");
            return null;
        }
        if (examiner is not null && (examiner.Length > ReportHeader.MostExaminerLength || examiner.Any(char.IsControl)))
        {
            e.WriteLine($"gemindex: --examiner: '{BenchText.Shown(examiner)}' is not a name; allowed: up to {ReportHeader.MostExaminerLength} printable characters.");
            return null;
        }
        return new ReportHeader(day, examiner, ReportHeader.Program(), ShippedCatalogue.ContentHash[..Math.Min(12, ShippedCatalogue.ContentHash.Length)]);
    }

    private static int WorkbookStone(FileInfo book, string reference, string format, FileInfo? output, ReportHeader header, Func<IReadOnlyList<Material>> materials,
        TextWriter o, TextWriter e)
    {
        try
        {
            using var workbook = StoneWorkbook.Open(book.FullName, TimeProvider.System, WorkbookOpening.ReadOnly);
            // Without --examiner, the examiner set once in the text UI for this workbook heads its reports too.
            if (header.Examiner is null && workbook.Setting(ReportHeader.ExaminerSetting) is { } kept && kept.Trim().Length > 0 && ReportHeader.ExaminerProblem(kept) is null)
                header = header with { Examiner = kept.Trim() };
            var summary = workbook.List().FirstOrDefault(s => string.Equals(s.Reference, reference, StringComparison.OrdinalIgnoreCase));
            if (summary is null || workbook.Get(summary.Id) is not { } sheet)
            {
                e.WriteLine($"gemindex: --stone: no stone '{reference}' in {book.Name}");
                return ExitCodes.BadInput;
            }
            BenchOutcome outcome = BenchIdentification.Identify(new Identifier(materials()), StoneReadingsConverter.ToReadings(sheet.Readings), Request);
            if (outcome.Result is not { } result)
            {
                foreach (var x in outcome.Reading.Errors) e.WriteLine($"gemindex: stone '{BenchText.Shown(reference)}': {x}");
                return ExitCodes.BadInput;
            }
            // What was typed in the text UI and refused is in no report (the stone holds what its answer used): said, so
            // that the report is not taken for everything read at the bench.
            foreach (var x in TextUi.Bench.BenchDraft.Refused(summary.Id, workbook.Setting(TextUi.Main.BenchSession.DraftSetting(summary.Id))))
                e.WriteLine($"gemindex: stone '{BenchText.Shown(reference)}': typed but refused, so not in this report: {x}");
            return Write(StoneReport.Build(sheet, result, header), sheet.Reference, format, output, o);
        }
        catch (WorkbookException x)
        {
            e.WriteLine($"gemindex: {x.Message}");
            return ExitCodes.BadFile;
        }
    }

    private static int Workbook(FileInfo book, FileInfo? output, Func<IReadOnlyList<Material>> materials, TextWriter o, TextWriter e)
    {
        try
        {
            using var workbook = StoneWorkbook.Open(book.FullName, TimeProvider.System, WorkbookOpening.ReadOnly);
            var identifier = new Identifier(materials());
            var rows = new List<(StoneSheet, IdentificationResult?)>();
            var refused = new Dictionary<long, IReadOnlyList<string>>();
            foreach (var summary in workbook.List())
            {
                if (workbook.Get(summary.Id) is not { } sheet) continue;
                // Typed at the bench and refused: only in the stone's draft, so said in its row (and on stderr, as for one stone).
                var notUsed = TextUi.Bench.BenchDraft.Refused(summary.Id, workbook.Setting(TextUi.Main.BenchSession.DraftSetting(summary.Id)));
                if (notUsed.Count > 0) refused[summary.Id] = [.. notUsed.Select(x => x.ToString())];
                foreach (var x in notUsed) e.WriteLine($"gemindex: stone '{BenchText.Shown(sheet.Reference)}': typed but refused, so not in its row: {x}");
                BenchOutcome outcome = BenchIdentification.Identify(identifier, StoneReadingsConverter.ToReadings(sheet.Readings), Request with { AdviseNextTest = false });
                foreach (var x in outcome.Reading.Errors)
                    e.WriteLine($"gemindex: stone '{BenchText.Shown(sheet.Reference)}': {x} (row written without a result)");
                // A stone with no usable reading has no answer in its row (the text UI shows none either): ranked on the
                // catalogue's frequencies alone, its row had named a species and an entry nobody identified.
                rows.Add((sheet, outcome.Reading.IsEmpty ? null : outcome.Result));
            }
            using var writer = output is null ? null : new StreamWriter(output.FullName);
            WorkbookCsv.Write(writer ?? o, rows, refused);
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

    private static int Stone(FileInfo file, int lineNumber, string format, FileInfo? output, ReportHeader header, Func<IReadOnlyList<Material>> materials,
        TextWriter o, TextWriter e)
    {
        string? text = null;
        bool tooLong = false;
        int count = 0;
        using (var input = new StreamReader(file.FullName))
        {
            var lines = new BatchLineReader(input);
            while (count < lineNumber && ((text = lines.Next(out tooLong)) is not null || tooLong)) count++;
        }
        if (count < lineNumber)
        {
            e.WriteLine($"gemindex: --line: {lineNumber} is beyond the end of {file.Name} ({count} lines); allowed: 1–{count}");
            return ExitCodes.BadInput;
        }
        if (tooLong || text is null)
        {
            e.WriteLine($"gemindex: {file.Name} line {lineNumber}: longer than {BatchLineReader.MostCharacters:N0} characters (1 MiB); not read");
            return ExitCodes.BadInput;
        }
        BatchLine read = StoneReadingsJson.Read(text);
        IReadOnlyList<Material> catalogue = materials();
        if (read.Errors.Count == 0 && catalogue.Count == 0)
        {
            e.WriteLine("gemindex: the catalogue has no materials; build it with 'gemindex catalogue build'");
            return ExitCodes.BadFile;
        }
        BenchOutcome? outcome = read.Errors.Count == 0 ? BenchIdentification.Identify(new Identifier(catalogue), read.Readings, Request) : null;
        if (outcome?.Result is not { } result)
        {
            foreach (var x in outcome?.Reading.Errors ?? read.AllErrors()) e.WriteLine($"gemindex: {BenchText.Shown(file.Name)} line {lineNumber}: {x}");
            return ExitCodes.BadInput;
        }
        StoneReadings stored = StoneReadingsConverter.FromReadings(read.Readings, lenient: false);
        var report = StoneReport.Build(new StoneSheet { Reference = stored.Id, Readings = stored }, BatchIdentification.WithUnread(result, read), header);
        return Write(report, stored.Id, format, output, o);
    }

    /// <summary>A path option's file, or null with a plain message and its exit code (an empty path is a bad value: 3; a folder or no such file: 4).</summary>
    private static FileInfo? Existing(string option, string path, TextWriter e, out int exit)
    {
        exit = path.Trim().Length == 0 ? ExitCodes.BadInput : ExitCodes.BadFile;
        string problem = path.Trim().Length == 0 ? "the path is empty; give a file"
            : Directory.Exists(path) ? $"{BenchText.Shown(path)} is a folder, not a file"
            : !File.Exists(path) ? $"there is no file {BenchText.Shown(path)}" : "";
        if (problem.Length == 0) return new FileInfo(path);
        e.WriteLine($"gemindex: {option}: {problem}.");
        return null;
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
