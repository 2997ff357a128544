using System.CommandLine;
using GemIndex.Core.Catalogue;
using GemIndex.Data.Catalogue;

namespace GemIndex.Cli.CommandLine;

/// <summary><c>catalogue check</c>: the catalogue check over the shipped and user entries; an empty catalogue fails too.</summary>
internal static class CatalogueCheckCommand
{
    public static Command Create(Option<DirectoryInfo?> directory)
    {
        Option<bool> json = CatalogueCommand.JsonOption();
        var command = new Command("check", "Check every catalogue entry for consistency (exit 3 and each finding on stderr if any)") { json };
        command.SetAction(pr => CatalogueFailure.Guard(pr, (output, error) =>
        {
            IReadOnlyList<Material> all = MergedCatalogue.Load(CatalogueCommand.Locations(pr, directory));
            IReadOnlyList<CatalogueFinding> findings = CatalogueCheck.Check(all);
            if (pr.GetValue(json))
                CommandJson.Write(output, new CatalogueCheckJson(all.Count, [.. findings.Select(f => new FindingJson(f.Entry, f.Field, f.Problem))]));
            if (all.Count == 0)
            {
                error.WriteLine("gemindex: the catalogue is empty: no family files were built into it and there are no user entries");
                return ExitCodes.BadInput;
            }
            foreach (CatalogueFinding f in findings) error.WriteLine($"gemindex: {f}");
            if (findings.Count > 0)
            {
                error.WriteLine($"gemindex: {findings.Count} finding(s) in {all.Count} entries");
                return ExitCodes.BadInput;
            }
            if (!pr.GetValue(json)) output.WriteLine($"{all.Count} entries checked, no findings");
            return ExitCodes.Ok;
        }));
        return command;
    }
}
