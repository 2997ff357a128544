using System.CommandLine;
using GemIndex.Core.Catalogue;
using GemIndex.Data.Catalogue;

namespace GemIndex.Cli.CommandLine;

/// <summary>
/// <c>catalogue build --output PATH</c>: writes the shipped catalogue (or the family files of <c>--source</c>) to
/// a SQLite file, after the catalogue check; nothing is written if a file cannot be read or the check finds anything.
/// </summary>
internal static class CatalogueBuildCommand
{
    public static Command Create()
    {
        var output = new Option<FileInfo>("--output", "-o") { Description = "The SQLite file to write (replaced if it exists)", Required = true };
        var source = new Option<DirectoryInfo>("--source") { Description = "Build from the *.json family files in this folder instead of the embedded ones" };
        source.AcceptExistingOnly();
        Option<bool> json = CatalogueCommand.JsonOption();
        var command = new Command("build", "Build the catalogue's SQLite file from its JSON family files") { output, source, json };
        command.SetAction(pr => CatalogueFailure.Guard(pr, (stdout, error) =>
        {
            IReadOnlyList<FamilySource> sources = pr.GetValue(source) is { } dir ? FamilySource.FromDirectory(dir.FullName) : ShippedCatalogue.Sources;
            FamilyCatalogue families = FamilyFileReader.ReadCatalogue(sources);
            IReadOnlyList<Material> materials = families.Materials;
            if (materials.Count == 0)
            {
                error.WriteLine("gemindex: no catalogue entries to build: the family folder holds no entries");
                return ExitCodes.BadInput;
            }
            IReadOnlyList<CatalogueFinding> findings = families.Check();
            foreach (CatalogueFinding f in findings) error.WriteLine($"gemindex: {f}");
            if (findings.Count > 0)
            {
                error.WriteLine($"gemindex: nothing written: {findings.Count} finding(s)");
                return ExitCodes.BadInput;
            }
            string path = pr.GetRequiredValue(output).FullName, hash = ShippedCatalogue.HashOf(sources);
            CatalogueBuilder.Write(materials, path, "shipped", hash);
            if (pr.GetValue(json)) CommandJson.Write(stdout, new CatalogueBuildJson(path, materials.Count, hash));
            else stdout.WriteLine($"built {materials.Count} entries from {sources.Count} family files into {path}");
            return ExitCodes.Ok;
        }));
        return command;
    }
}
