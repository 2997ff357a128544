using GemIndex.Core.Bench;
using System.CommandLine;
using GemIndex.Data.Catalogue;

namespace GemIndex.Cli.CommandLine;

/// <summary>The <c>catalogue</c> group: list, show, check, import and build, sharing <c>--catalogue-dir</c>.</summary>
internal static class CatalogueCommand
{
    public static Command Create() => Create(DirectoryOption());

    /// <summary>The <c>--catalogue-dir</c> option (recursive, so the subcommands see it too).</summary>
    public static Option<DirectoryInfo?> DirectoryOption()
    {
        var option = new Option<DirectoryInfo?>("--catalogue-dir")
        {
            Description = "Folder for user-catalogue.db and the built shipped catalogue (cache/ inside it); " +
                "default: the user's data and cache folders",
            Recursive = true,
        };
        // A file where a folder is meant is refused up front, whichever subcommand would (or would not) use it.
        option.Validators.Add(r =>
        {
            string text = r.Tokens.Count == 1 ? r.Tokens[0].Value : "";
            if (text.Length == 0) r.AddError("--catalogue-dir: empty; give a folder, or leave the option out");
            else if (File.Exists(text)) r.AddError($"--catalogue-dir: '{BenchText.Shown(text)}' is a file, not a folder");
            // A mistyped folder had been created silently, with a catalogue built into it.
            else if (!Directory.Exists(text)) r.AddError($"--catalogue-dir: no folder '{BenchText.Shown(text)}'; create it first, or check the path");
        });
        return option;
    }

    private static Command Create(Option<DirectoryInfo?> directory) =>
        new Command("catalogue", "The reference catalogue of gem materials and your own entries")
        {
            directory,
            CatalogueListCommand.Create(directory),
            CatalogueShowCommand.Create(directory),
            CatalogueCheckCommand.Create(directory),
            CatalogueImportCommand.Create(directory),
            CatalogueBuildCommand.Create(), // reads no user data and no cache
        };

    /// <summary>Where the catalogue files are for this invocation.</summary>
    public static CatalogueLocations Locations(ParseResult parseResult, Option<DirectoryInfo?> directory) =>
        parseResult.GetValue(directory) is { } dir ? CatalogueLocations.Under(dir.FullName) : CatalogueLocations.FromEnvironment();

    public static Option<bool> JsonOption() => new("--json") { Description = "Write the result as JSON on standard output" };
}
