using System.CommandLine;
using GemIndex.Data.Workbook;

namespace GemIndex.Cli.CommandLine;

/// <summary>The whole command line: one file per command group, assembled here.</summary>
internal static class CommandTree
{
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
