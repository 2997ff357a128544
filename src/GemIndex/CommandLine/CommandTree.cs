using System.CommandLine;
using GemIndex.Data.Workbook;

namespace GemIndex.Cli.CommandLine;

/// <summary>The whole command line: one file per command group, assembled here.</summary>
internal static class CommandTree
{
    /// <summary>
    /// Parses and runs a command line. A refused value (an option's or argument's own check) exits
    /// <see cref="ExitCodes.BadInput"/> with one line per fault and no help page; a usage fault (an unknown word, a
    /// missing required option) exits <see cref="ExitCodes.Usage"/>. Messages never carry control characters.
    /// </summary>
    public static int Run(string[] args, InvocationConfiguration? configuration = null)
    {
        ParseResult parse = Build().Parse(args);
        if (parse.Errors.Count == 0 || parse.Action is System.CommandLine.Help.HelpAction)
            return configuration is null ? parse.Invoke() : parse.Invoke(configuration);
        TextWriter error = configuration?.Error ?? Console.Error;
        foreach (System.CommandLine.Parsing.ParseError fault in parse.Errors)
            error.WriteLine("gemindex: " + Printable(fault.Message));
        bool usage = parse.Errors.Any(e => e.SymbolResult is not (System.CommandLine.Parsing.OptionResult or System.CommandLine.Parsing.ArgumentResult));
        if (usage) error.WriteLine($"('{parse.CommandResult.Command.Name} --help' lists the options)");
        return usage ? ExitCodes.Usage : ExitCodes.BadInput;
    }

    /// <summary>The text with control characters shown as \uXXXX, so no escape sequence reaches the terminal.</summary>
    private static string Printable(string text) =>
        string.Concat(text.Select(c => char.IsControl(c) && c != '\n' ? $"\\u{(int)c:x4}" : c.ToString()));

    public static RootCommand Build()
    {
        var root = new RootCommand("gemindex: identify gem materials from bench readings (refractometer, SG, polariscope, spectroscope, UV, probes)");
        var workbook = new Option<string?>("--workbook") { Description = "The workbook file of your stones (default: your data folder, gemindex/workbook.db)" };
        var demo = new Option<bool>("--demo") { Description = "Add the invented demo stones to the workbook, then exit (open it with --workbook PATH)" };
        var createNew = new Option<bool>("--new") { Description = "Create the workbook if there is none at the path (otherwise you are asked; without a terminal, nothing is created)" };
        root.Options.Add(workbook);
        root.Options.Add(demo);
        root.Options.Add(createNew);
        root.SetAction(pr => TextUiCommand.Run(pr, pr.GetValue(workbook) ?? WorkbookLocation.Default(), pr.GetValue(demo), pr.GetValue(createNew)));
        root.Subcommands.Add(CatalogueCommand.Create());
        root.Subcommands.Add(IdentifyCommand.Create(CatalogueCommand.DirectoryOption()));
        root.Subcommands.Add(ReportCommand.Create(CatalogueCommand.DirectoryOption()));
        root.Subcommands.Add(Calc.CalcCommand.Create());
        return root;
    }
}
