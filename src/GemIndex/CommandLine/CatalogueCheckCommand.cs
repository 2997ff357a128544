using System.CommandLine;
using System.Globalization;
using GemIndex.Core.Catalogue;
using GemIndex.Data.Catalogue;

namespace GemIndex.Cli.CommandLine;

/// <summary>
/// <c>catalogue check</c>: the catalogue check over the shipped family files (varieties against their species
/// included) and the user entries, and how many entries and values rest on published sources. An empty catalogue
/// fails too.
/// </summary>
internal static class CatalogueCheckCommand
{
    public static Command Create(Option<DirectoryInfo?> directory)
    {
        Option<bool> json = CatalogueCommand.JsonOption();
        var command = new Command("check", "Check every catalogue entry for consistency and count its sourced values (exit 3 and each finding on stderr if any)") { json };
        command.SetAction(pr => CatalogueFailure.Guard(pr, (output, error) =>
        {
            FamilyCatalogue shipped = ShippedCatalogue.Families;
            IReadOnlyList<Material> user = new UserCatalogue(CatalogueCommand.Locations(pr, directory).UserCataloguePath).Load();
            IReadOnlyList<Material> all = [.. shipped.Materials, .. user];
            IReadOnlyList<CatalogueFinding> findings = CatalogueCheck.Check(all, shipped.Species, shipped.Likes);
            SourcingSummary sourcing = SourcingSummary.Of(all);
            if (pr.GetValue(json))
                CommandJson.Write(output, new CatalogueCheckJson(all.Count, sourcing,
                    [.. findings.Select(f => new FindingJson(f.File, f.Entry, f.Field, f.Problem))]));
            if (all.Count == 0)
            {
                error.WriteLine("gemindex: the catalogue is empty: no family files were built into it and there are no user entries");
                return ExitCodes.BadInput;
            }
            foreach (CatalogueFinding f in findings) error.WriteLine($"gemindex: {f}");
            if (!pr.GetValue(json)) WriteSourcing(output, sourcing);
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

    private static void WriteSourcing(TextWriter output, SourcingSummary s)
    {
        output.WriteLine($"sourced entries: {s.SourcedEntries} of {s.Entries} ({(100 * s.SourcedEntryShare).ToString("0.0", CultureInfo.InvariantCulture)} %)" +
            " have every index, birefringence, SG and dispersion from a published work");
        output.WriteLine($"numeric values: {s.Values}: published {s.PublishedValues}, from memory {s.MemoryValues}, " +
            $"common practice {s.PracticeValues}, judgement {s.JudgementValues}, no source {s.UnsourcedValues}");
    }
}
