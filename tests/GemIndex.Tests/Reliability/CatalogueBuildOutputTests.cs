using GemIndex.Cli.CommandLine;
using GemIndex.Data.Catalogue;
using GemIndex.Tests.CommandLine;

namespace GemIndex.Tests.Reliability;

/// <summary><c>catalogue build -o PATH</c> writes only to files the tool owns (reliability issue, item 1).</summary>
[System.Runtime.Versioning.UnsupportedOSPlatform("windows")]
public sealed class CatalogueBuildOutputTests : IDisposable
{
    private readonly CommandRun _run = new();
    private readonly ReliabilityFolder _folder = new();

    public void Dispose()
    {
        _run.Dispose();
        _folder.Dispose();
    }

    private (int Exit, string Out, string Err) Build(params string[] extra) =>
        _run.Catalogue(["build", "--source", CommandRun.Fixture("families"), .. extra]);

    [Fact]
    public void A_workbook_given_as_the_output_is_refused_and_left_byte_identical()
    {
        string workbook = _folder.Workbook("stones.db");
        string hash = ReliabilityFolder.Hash(workbook);
        var (exit, _, error) = Build("-o", workbook);
        Assert.Equal(ExitCodes.BadFile, exit);
        Assert.Contains("is not a catalogue built by gemindex (add --force to replace it); nothing was written", error);
        Assert.Equal(hash, ReliabilityFolder.Hash(workbook));
        Assert.Equal(["stones.db"], Directory.GetFiles(_folder.Path).Select(Path.GetFileName));   // no temp file left
    }

    [Fact]
    public void A_catalogue_built_earlier_is_replaced_and_another_file_only_with_force()
    {
        string output = _folder.File("catalogue.db");
        Assert.Equal(ExitCodes.Ok, Build("-o", output).Exit);
        Assert.True(CatalogueOwnership.IsBuiltCatalogue(output));
        Assert.Equal(ExitCodes.Ok, Build("-o", output).Exit);       // ours: replaced without a word

        string notes = _folder.File("notes.txt");
        File.WriteAllText(notes, "tray 2: spinel, garnet\n");
        Assert.Equal(ExitCodes.BadFile, Build("-o", notes).Exit);
        Assert.Equal("tray 2: spinel, garnet\n", File.ReadAllText(notes));
        var (exit, _, error) = Build("-o", notes, "--force");
        Assert.True(exit == ExitCodes.Ok, error);
        Assert.True(CatalogueOwnership.IsBuiltCatalogue(notes));
    }

    [Fact]
    public void A_folder_a_link_or_a_device_is_never_written_even_with_force()
    {
        string folder = _folder.File("sub");
        Directory.CreateDirectory(folder);
        var (exit, _, error) = Build("-o", folder, "--force");
        Assert.Equal(ExitCodes.BadFile, exit);
        Assert.Contains("is a folder, not a regular file", error);

        string target = _folder.Workbook("elsewhere.db");
        string hash = ReliabilityFolder.Hash(target);
        string link = _folder.File("link.db");
        File.CreateSymbolicLink(link, target);
        (exit, _, error) = Build("-o", link, "--force");
        Assert.Equal(ExitCodes.BadFile, exit);
        Assert.Contains("is a symbolic link, not a regular file", error);
        Assert.Equal(hash, ReliabilityFolder.Hash(target));
        Assert.NotNull(new FileInfo(link).LinkTarget);

        (exit, _, error) = Build("-o", "/dev/null", "--force");
        Assert.Equal(ExitCodes.BadFile, exit);
        Assert.Contains("is a device, pipe or socket, not a regular file", error);
        Assert.Null(new FileInfo("/dev/null").LinkTarget);
        Assert.Equal(0, new FileInfo("/dev/null").Length);
    }
}
