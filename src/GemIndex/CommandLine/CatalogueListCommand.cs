using System.CommandLine;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Gravity;
using GemIndex.Core.Optics;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Data.Catalogue;

namespace GemIndex.Cli.CommandLine;

/// <summary><c>catalogue list</c>: the entries, optionally only those matching an index, an SG or an optic character.</summary>
internal static class CatalogueListCommand
{
    public static Command Create(Option<DirectoryInfo?> directory)
    {
        var index = NumberOption.Optional("--index", "Only entries with a principal-index range within --tolerance of this refractive index",
            v => _ = new RefractiveIndex(v));
        var tolerance = NumberOption.WithDefault("--tolerance", "Refractive-index tolerance", 0.01,
            NumberOption.Within("refractive-index tolerance", 0, 0.5));
        var sg = NumberOption.Optional("--sg", "Only entries whose SG range is within --sg-tolerance of this specific gravity",
            v => _ = new SpecificGravity(v));
        var sgTolerance = NumberOption.WithDefault("--sg-tolerance", "Specific-gravity tolerance", 0.05,
            NumberOption.Within("specific-gravity tolerance", 0, 5));
        var character = new Option<string?>("--optic-character") { Description = "Only entries of this optic character" };
        ChoiceOption.Restrict(character, [.. CatalogueWords.All<OpticCharacter>()]);
        Option<bool> json = CatalogueCommand.JsonOption();
        var command = new Command("list", "List catalogue entries (shipped and your own) with their index and SG ranges")
        {
            index, tolerance, sg, sgTolerance, character, json,
        };
        command.SetAction(pr => CatalogueFailure.Guard(pr, (output, _) =>
        {
            IReadOnlyList<Material> all = MergedCatalogue.Load(CatalogueCommand.Locations(pr, directory));
            var filter = new CatalogueFilter(pr.GetValue(index), pr.GetValue(tolerance), pr.GetValue(sg), pr.GetValue(sgTolerance),
                pr.GetValue(character) is { } word && CatalogueWords.TryParse(word, out OpticCharacter c) ? c : null);
            Material[] shown = [.. all.Where(filter.Matches)];
            if (pr.GetValue(json)) CommandJson.Write(output, new CatalogueListJson(shown.Length, [.. shown.Select(CatalogueEntryDocument.From)]));
            else
            {
                if (shown.Length > 0) MaterialText.WriteTable(output, shown);
                output.WriteLine(all.Count == 0 ? "the catalogue is empty" : $"{shown.Length} of {all.Count} entries");
            }
            return ExitCodes.Ok;
        }));
        return command;
    }
}
