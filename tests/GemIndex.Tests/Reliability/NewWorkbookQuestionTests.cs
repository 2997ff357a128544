using GemIndex.Cli.CommandLine;
using GemIndex.Data.Workbook;

namespace GemIndex.Tests.Reliability;

/// <summary>A path with no workbook becomes one only on the user's word: "y" on a terminal, or --new.</summary>
[System.Runtime.Versioning.UnsupportedOSPlatform("windows")]
public sealed class NewWorkbookQuestionTests : IDisposable
{
    private readonly ReliabilityFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    private (StoneWorkbook? Workbook, int Exit, string Out, string Err) Open(string path, bool createNew, bool interactive, string answer)
    {
        var output = new StringWriter();
        var error = new StringWriter();
        StoneWorkbook? wb = TextUiCommand.Open(path, createNew, interactive, new StringReader(answer), output, error, out int exit);
        return (wb, exit, output.ToString(), error.ToString());
    }

    [Theory]
    [InlineData("n\n")]
    [InlineData("\n")]
    [InlineData("")]
    public void On_a_terminal_anything_but_yes_creates_nothing(string answer)
    {
        string path = Path.Combine(_folder.Path, "typo", "wb.db");
        var (wb, exit, asked, error) = Open(path, createNew: false, interactive: true, answer);
        Assert.Null(wb);
        Assert.Equal(ExitCodes.BadFile, exit);
        Assert.Contains("Create a new one there? [y/N]", asked);
        // The question starts a line of its own, so that a long path never wraps it apart at 80 columns.
        Assert.StartsWith("Create a new one there? [y/N]", asked.Split('\n').Last(l => l.Contains("[y/N]", StringComparison.Ordinal)).TrimStart('\r'));
        Assert.Contains("nothing created", error);
        Assert.False(Directory.Exists(Path.GetDirectoryName(path)));
    }

    [Fact]
    public void On_a_terminal_yes_creates_the_workbook_and_its_folder()
    {
        string path = Path.Combine(_folder.Path, "new shelf", "wb.db");
        var (wb, exit, _, _) = Open(path, createNew: false, interactive: true, "y\n");
        using (wb)
        {
            Assert.NotNull(wb);
            Assert.Equal(ExitCodes.Ok, exit);
            Assert.False(wb.IsReadOnly);
        }
        Assert.True(File.Exists(path));
    }

    [Fact]
    public void Without_a_terminal_only_new_creates_and_nothing_is_asked()
    {
        string path = _folder.File("wb.db");
        var (none, exit, asked, error) = Open(path, createNew: false, interactive: false, "y\n");
        Assert.Null(none);
        Assert.Equal(ExitCodes.BadFile, exit);
        Assert.Equal("", asked);
        Assert.Contains("add --new", error);
        var (wb, _, _, _) = Open(path, createNew: true, interactive: false, "");
        using (wb) Assert.NotNull(wb);
    }

    [Fact]
    public void What_is_at_a_path_is_told_apart_without_following_links()
    {
        string file = _folder.Workbook("wb.db");
        string link = _folder.File("link.db");
        File.CreateSymbolicLink(link, file);
        Assert.Equal(FileKind.Entry.RegularFile, FileKind.Of(file));
        Assert.Equal(FileKind.Entry.Link, FileKind.Of(link));
        Assert.Equal(FileKind.Entry.Folder, FileKind.Of(_folder.Path));
        Assert.Equal(FileKind.Entry.Missing, FileKind.Of(_folder.File("none")));
        Assert.Equal(FileKind.Entry.Special, FileKind.Of("/dev/null"));
    }
}
