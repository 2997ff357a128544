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
        ParseResult parse = Build(args).Parse(args);
        if (parse.Errors.Count == 0 || parse.Action is System.CommandLine.Help.HelpAction)
            return configuration is null ? parse.Invoke() : parse.Invoke(configuration);
        TextWriter error = configuration?.Error ?? Console.Error;
        foreach (System.CommandLine.Parsing.ParseError fault in parse.Errors)
            error.WriteLine("gemindex: " + Printable(fault.Message));
        // A value the user gave and a check refused is bad input; anything else (an unknown word, a missing option or
        // argument) is a usage fault.
        bool usage = parse.Errors.Any(e => e.SymbolResult is not (System.CommandLine.Parsing.OptionResult { Tokens.Count: > 0 }
            or System.CommandLine.Parsing.ArgumentResult { Tokens.Count: > 0 }));
        if (usage) error.WriteLine($"('{parse.CommandResult.Command.Name} --help' lists the options)");
        return usage ? ExitCodes.Usage : ExitCodes.BadInput;
    }

    /// <summary>The text with control characters shown as \uXXXX, so no escape sequence reaches the terminal.</summary>
    private static string Printable(string text) =>
        string.Concat(text.Select(c => char.IsControl(c) && c != '\n' ? $"\\u{(int)c:x4}" : c.ToString()));

    /// <summary>
    /// The command tree for these arguments: only the subcommand they name (or none, for the root's own options such as
    /// --version or --workbook), so a start loads the types of one command, not of all; the whole tree when they ask for
    /// help, name nothing known, or are absent (a typo then gets the library's suggestions).
    /// </summary>
    public static RootCommand Build(string[] args)
    {
        string? first = args.Length > 0 ? args[0] : null;
        bool help = args.Any(a => a is "--help" or "-h" or "-?" or "/?" or "/h");
        if (help || first is null) return Build();
        if (first.StartsWith('-')) return Build(subcommands: []);
        return Subcommands.TryGetValue(first, out var create) ? Build([create]) : Build();
    }

    private static readonly Dictionary<string, Func<Command>> Subcommands = new(StringComparer.Ordinal)
    {
        ["catalogue"] = CatalogueCommand.Create,
        ["identify"] = () => IdentifyCommand.Create(CatalogueCommand.DirectoryOption()),
        ["report"] = () => ReportCommand.Create(CatalogueCommand.DirectoryOption()),
        ["calc"] = Calc.CalcCommand.Create,
    };

    /// <summary>The whole command tree.</summary>
    public static RootCommand Build() => Build([.. Subcommands.Values]);

    private static RootCommand Build(IReadOnlyList<Func<Command>> subcommands)
    {
        var root = new RootCommand("gemindex: identify gem materials from bench readings (refractometer, SG, polariscope, dichroscope, spectroscope, UV, probes, loupe)");
        var workbook = new Option<string?>("--workbook") { Description = "The workbook file of your stones (default: your data folder, gemindex/workbook.db)" };
        var demo = new Option<bool>("--demo") { Description = "Add the invented demo stones to the workbook, then exit (open it with --workbook PATH)" };
        var createNew = new Option<bool>("--new") { Description = "Create the workbook if there is none at the path (otherwise you are asked; without a terminal, nothing is created)" };
        root.Options.Add(workbook);
        root.Options.Add(demo);
        root.Options.Add(createNew);
        root.SetAction(pr => TextUiCommand.Run(pr, pr.GetValue(workbook) ?? WorkbookLocation.Default(), pr.GetValue(demo), pr.GetValue(createNew)));
        foreach (var create in subcommands) root.Subcommands.Add(create());
        return root;
    }
}
