using System.CommandLine;
using GemIndex.Core.Catalogue;
using GemIndex.Data.Catalogue;

namespace GemIndex.Cli.CommandLine;

/// <summary><c>catalogue show NAME</c>: every field of one entry (name matched ignoring case).</summary>
internal static class CatalogueShowCommand
{
    public static Command Create(Option<DirectoryInfo?> directory)
    {
        var name = new Argument<string>("name") { Description = "The entry's name (quote it if it has spaces)" };
        Option<bool> json = CatalogueCommand.JsonOption();
        var command = new Command("show", "Show every field of one catalogue entry") { name, json };
        command.SetAction(pr => CatalogueFailure.Guard(pr, (output, error) =>
        {
            string wanted = pr.GetRequiredValue(name);
            IReadOnlyList<Material> all = MergedCatalogue.Load(CatalogueCommand.Locations(pr, directory));
            Material? found = all.FirstOrDefault(m => string.Equals(m.Name, wanted, StringComparison.OrdinalIgnoreCase));
            if (found is null)
            {
                string[] near = [.. all.Where(m => m.Name.Contains(wanted, StringComparison.OrdinalIgnoreCase)).Select(m => m.Name).Take(5)];
                error.WriteLine($"gemindex: no entry named '{wanted}' among {all.Count} catalogue entries" +
                    (near.Length > 0 ? $"; did you mean: {string.Join(", ", near)}?" : "; try 'gemindex catalogue list'"));
                return ExitCodes.BadInput;
            }
            if (pr.GetValue(json)) CommandJson.Write(output, CatalogueEntryDocument.From(found));
            else MaterialText.WriteDetails(output, found);
            return ExitCodes.Ok;
        }));
        return command;
    }
}
