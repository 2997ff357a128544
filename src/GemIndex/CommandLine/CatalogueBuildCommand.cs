using GemIndex.Core.Bench;
using System.CommandLine;
using GemIndex.Cli.Identification;
using GemIndex.Core.Catalogue;
using GemIndex.Data.Catalogue;
using GemIndex.Data.Workbook;

namespace GemIndex.Cli.CommandLine;

/// <summary>
/// <c>catalogue build --output PATH</c>: writes the shipped catalogue (or the family files of <c>--source</c>) to
/// a SQLite file, after the catalogue check; nothing is written if a file cannot be read or the check finds anything.
/// It writes only where the tool owns the file: a path holding anything but a catalogue it built is refused unless
/// <c>--force</c>, and a folder, link, device, pipe or socket always; the file is written beside it and renamed over it.
/// </summary>
internal static class CatalogueBuildCommand
{
    public static Command Create()
    {
        var output = new Option<FileInfo>("--output", "-o") { Description = "The SQLite file to write (a catalogue built earlier is replaced; any other file only with --force)", Required = true };
        var force = new Option<bool>("--force") { Description = "Replace the output file even if it is not a catalogue built by gemindex" };
        var source = new Option<string?>("--source") { Description = "Build from the *.json family files in this folder instead of the embedded ones" };
        source.Validators.Add(r =>
        {
            string text = r.Tokens.Count == 1 ? r.Tokens[0].Value : "";
            if (text.Length == 0) r.AddError("--source: empty; give the folder of *.json family files");
            else if (File.Exists(text)) r.AddError($"--source: '{BenchText.Shown(text)}' is a file; give the folder that holds the *.json family files");
            else if (!Directory.Exists(text)) r.AddError($"--source: no folder '{BenchText.Shown(text)}'");
        });
        Option<bool> json = CatalogueCommand.JsonOption();
        var command = new Command("build", "Build the catalogue's SQLite file from its JSON family files") { output, source, force, json };
        command.SetAction(pr => CatalogueFailure.Guard(pr, (stdout, error) =>
        {
            string target = pr.GetRequiredValue(output).FullName;
            if (Refusal(target, pr.GetValue(force)) is { } refusal)
            {
                error.WriteLine($"gemindex: --output: {target}: {refusal}; nothing was written");
                return ExitCodes.BadFile;
            }
            IReadOnlyList<FamilySource> sources = pr.GetValue(source) is { } dir ? FamilySource.FromDirectory(Path.GetFullPath(dir)) : ShippedCatalogue.Sources;
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
            string path = target, hash = ShippedCatalogue.HashOf(sources);
            var progress = BatchProgress.ForConsole(error, materials.Count, "entries");
            CatalogueBuilder.Write(materials, path, "shipped", hash, progress is null ? null : done => progress.Report(done, done));
            progress?.Finish(materials.Count);
            if (pr.GetValue(json)) CommandJson.Write(stdout, new CatalogueBuildJson(path, materials.Count, hash));
            else stdout.WriteLine($"built {materials.Count} entries from {sources.Count} family files into {path}");
            return ExitCodes.Ok;
        }));
        return command;
    }

    /// <summary>Why the build must not write to <paramref name="path"/>, or null when it may.</summary>
    public static string? Refusal(string path, bool force) => FileKind.Of(path) switch
    {
        FileKind.Entry.Missing => Directory.Exists(Path.GetDirectoryName(path)) ? null : "its folder does not exist",
        FileKind.Entry.RegularFile => force || CatalogueOwnership.IsBuiltCatalogue(path)
            ? null : "the file exists and is not a catalogue built by gemindex (add --force to replace it)",
        FileKind.Entry kind => $"is {FileKind.Describe(kind)}, not a regular file; the build writes only regular files",
    };
}
