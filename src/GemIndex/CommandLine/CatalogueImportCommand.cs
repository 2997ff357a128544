using System.CommandLine;
using GemIndex.Data.Catalogue;

namespace GemIndex.Cli.CommandLine;

/// <summary><c>catalogue import FILE</c>: add the rows of a CSV file to the user catalogue, all or nothing.</summary>
internal static class CatalogueImportCommand
{
    public static Command Create(Option<DirectoryInfo?> directory)
    {
        var file = new Argument<FileInfo>("file") { Description = "CSV file of entries (columns: reference-db/README.md)" };
        file.AcceptExistingOnly();
        Option<bool> json = CatalogueCommand.JsonOption();
        var command = new Command("import", "Import your own entries from a CSV file into the user catalogue (nothing is imported if any row is bad)")
        {
            file, json,
        };
        command.SetAction(pr => CatalogueFailure.Guard(pr, (output, error) =>
        {
            FileInfo csv = pr.GetRequiredValue(file);
            CatalogueLocations locations = CatalogueCommand.Locations(pr, directory);
            var user = new UserCatalogue(locations.UserCataloguePath);
            CatalogueImportResult result;
            using (var reader = new StreamReader(csv.FullName))
                result = user.Import(reader, ShippedCatalogue.Families);
            if (pr.GetValue(json))
                CommandJson.Write(output, new CatalogueImportJson(csv.FullName, user.Path, result.Imported,
                    [.. result.Errors.Select(e => new ImportErrorJson(e.Line, e.Field, e.Problem))]));
            if (!result.Succeeded)
            {
                foreach (CatalogueImportError e in result.Errors) error.WriteLine($"gemindex: {csv.Name}: {e}");
                error.WriteLine($"gemindex: nothing imported: {result.Errors.Count} problem(s) in {csv.Name}");
                return ExitCodes.BadInput;
            }
            if (!pr.GetValue(json)) output.WriteLine($"imported {result.Imported} {(result.Imported == 1 ? "entry" : "entries")} into {user.Path}");
            if (result.Upgraded)
                error.WriteLine($"gemindex: {user.Path} was brought up to catalogue schema {CatalogueSchema.Version} (a usual SG part per entry); " +
                    $"GemIndex versions that read only schema {CatalogueSchema.PreviousVersion} no longer open it");
            return ExitCodes.Ok;
        }));
        return command;
    }
}
