using System.CommandLine;

namespace GemIndex.Cli.CommandLine;

/// <summary>The whole command line: one file per command group, assembled here.</summary>
internal static class CommandTree
{
    public static RootCommand Build()
    {
        var root = new RootCommand("gemindex: identify gem materials from bench readings (refractometer, SG, polariscope, spectroscope, UV, probes)");
        root.SetAction(pr =>
        {
            pr.InvocationConfiguration.Output.WriteLine("The text UI is not built yet; try 'gemindex --help'.");
            return ExitCodes.Ok;
        });
        root.Subcommands.Add(CatalogueCommand.Create());
        root.Subcommands.Add(IdentifyCommand.Create(CatalogueCommand.DirectoryOption()));
        root.Subcommands.Add(ReportCommand.Create(() => GemIndex.Data.Catalogue.MergedCatalogue.Load(GemIndex.Data.Catalogue.CatalogueLocations.FromEnvironment())));
        root.Subcommands.Add(Calc.CalcCommand.Create());
        return root;
    }
}
