using GemIndex.Cli.CommandLine;
using GemIndex.Data.Workbook;
using GemIndex.Tests.CommandLine;
using GemIndex.Tests.Reports;
using Xunit.Abstractions;

namespace GemIndex.Tests.Reliability;

/// <summary>
/// The damaged-file table of the reliability issue: each damaged workbook is refused in words, by the library, by
/// <c>report workbook</c> and by <c>--demo</c>, and is byte-identical afterwards; a read-only file or folder opens
/// for reading and reporting.
/// </summary>
[System.Runtime.Versioning.UnsupportedOSPlatform("windows")]
public sealed class DamagedWorkbookTests(ITestOutputHelper log) : IDisposable
{
    private readonly ReliabilityFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    public static TheoryData<string, string> Refused => new()
    {
        { "missing table", "table 'stone_edit' is missing" },
        { "missing column", "has no column 'readings'" },
        { "bad timestamp", "'yesterday' is not a time" },
        { "damaged page", "the workbook is damaged" },
        { "foreign application id", "not a GemIndex workbook" },
        { "no schema version", "no schema version" },
        { "not SQLite", "not a database file" },
        { "zero bytes", "the file is empty (0 bytes)" },
    };

    private string Damaged(string damage)
    {
        string path = _folder.Workbook("wb.db", stones: damage == "damaged page" ? 60 : 3);
        switch (damage)
        {
            case "missing table": ReliabilityFolder.Raw(path, "DROP TABLE stone_edit"); break;
            case "missing column": ReliabilityFolder.Raw(path, "ALTER TABLE stone DROP COLUMN readings"); break;
            case "bad timestamp": ReliabilityFolder.Raw(path, "UPDATE stone SET created = 'yesterday' WHERE id = 2"); break;
            case "foreign application id": ReliabilityFolder.Raw(path, "PRAGMA application_id = 1234"); break;
            case "no schema version": ReliabilityFolder.Raw(path, "PRAGMA user_version = 0"); break;
            case "not SQLite": File.WriteAllText(path, "tray 4: loupe, tweezers, cloth\n"); break;
            case "zero bytes": File.WriteAllBytes(path, []); break;
            case "damaged page":
                using (var stream = new FileStream(path, FileMode.Open, FileAccess.ReadWrite))
                {
                    Assert.True(stream.Length > 8 * 4096, "the workbook must span several pages for this case");
                    stream.Position = 3 * 4096 + 100;   // inside a table page, past its header: a bad sector's worth of noise
                    stream.Write(Enumerable.Repeat((byte)0xA5, 600).ToArray());
                }
                break;
            default: throw new ArgumentException(damage);
        }
        return path;
    }

    [Theory]
    [MemberData(nameof(Refused))]
    public void A_damaged_workbook_is_refused_in_words_everywhere_and_left_byte_identical(string damage, string words)
    {
        string path = Damaged(damage);
        string hash = ReliabilityFolder.Hash(path);

        var e = Assert.ThrowsAny<WorkbookException>(() => StoneWorkbook.Open(path, TimeProvider.System));
        Assert.Contains(words, e.Message);
        Assert.DoesNotContain("SQLite Error", e.Message);

        var (reportExit, _, reportError) = RunReport("report", "workbook", "--workbook", path);
        Assert.Equal(ExitCodes.BadFile, reportExit);
        Assert.Contains(words, reportError);

        var (demoExit, _, demoError) = CommandRun.Plain("--workbook", path, "--demo");
        Assert.Equal(ExitCodes.BadFile, demoExit);
        Assert.DoesNotContain("   at ", demoError);   // no stack trace

        Assert.Equal(hash, ReliabilityFolder.Hash(path));
        log.WriteLine($"{damage}: refused, exit {reportExit}: {reportError.Trim()}");
    }

    [Fact]
    public void A_read_only_file_opens_for_reading_and_reporting_and_is_left_byte_identical()
    {
        string path = _folder.Workbook("wb.db");
        File.SetUnixFileMode(path, UnixFileMode.UserRead | UnixFileMode.GroupRead);
        string hash = ReliabilityFolder.Hash(path);
        using (var wb = StoneWorkbook.Open(path, TimeProvider.System))
        {
            Assert.Equal("the file is read-only", wb.ReadOnlyReason);
            Assert.Equal(3, wb.List().Count);
            Assert.Contains("open for reading only", Assert.Throws<WorkbookException>(() => wb.SetSetting("examiner", "x")).Message);
        }
        var (exit, csv, error) = RunReport("report", "workbook", "--workbook", path);
        Assert.Equal("", error);
        Assert.Equal(ExitCodes.Ok, exit);
        Assert.Contains("lot 3 / 2", csv);
        Assert.Equal(hash, ReliabilityFolder.Hash(path));
        Assert.Equal(["wb.db"], Directory.GetFiles(_folder.Path).Select(Path.GetFileName));   // no -wal or -shm left by reading
    }

    [Fact]
    public void A_workbook_in_a_read_only_folder_opens_for_reading_and_reporting_and_is_left_byte_identical()
    {
        string folder = Path.Combine(_folder.Path, "shelf");
        Directory.CreateDirectory(folder);
        string path = Path.Combine(folder, "wb.db");
        File.Move(_folder.Workbook("made.db"), path);
        File.SetUnixFileMode(folder, UnixFileMode.UserRead | UnixFileMode.UserExecute);
        string hash = ReliabilityFolder.Hash(path);
        using (var wb = StoneWorkbook.Open(path, TimeProvider.System))
        {
            Assert.Equal("the folder is read-only", wb.ReadOnlyReason);
            Assert.Equal(3, wb.List().Count);
        }
        var (exit, csv, error) = RunReport("report", "workbook", "--workbook", path);
        Assert.Equal("", error);
        Assert.Equal(ExitCodes.Ok, exit);
        Assert.Contains("lot 3 / 3", csv);
        Assert.Equal(hash, ReliabilityFolder.Hash(path));
        Assert.Equal(["wb.db"], Directory.GetFiles(folder).Select(Path.GetFileName));
    }

    [Fact]
    public void A_mistyped_path_creates_nothing_without_a_terminal_and_says_how_to_create_it()
    {
        string path = Path.Combine(_folder.Path, "no-such-folder", "wb.db");
        var (exit, _, error) = CommandRun.Plain("--workbook", path, "--demo");
        Assert.Equal(ExitCodes.BadFile, exit);
        Assert.Contains("add --new", error);
        Assert.False(Directory.Exists(Path.GetDirectoryName(path)));
        var (created, output, _) = CommandRun.Plain("--workbook", path, "--demo", "--new");
        Assert.Equal(ExitCodes.Ok, created);
        Assert.Contains("invented demo stones", output);
    }

    [Fact]
    public void A_folder_given_as_the_workbook_says_so_in_words()
    {
        var (exit, _, error) = CommandRun.Plain("--workbook", _folder.Path, "--demo");
        Assert.Equal(ExitCodes.BadFile, exit);
        Assert.Contains("is a folder, not a workbook file", error);
    }

    private static (int Exit, string Out, string Err) RunReport(params string[] args)
    {
        var root = new System.CommandLine.RootCommand { ReportCommand.Create(() => ReportFixtures.Catalogue) };
        var o = new StringWriter();
        var e = new StringWriter();
        int exit = root.Parse(args).Invoke(new System.CommandLine.InvocationConfiguration { Output = o, Error = e });
        return (exit, o.ToString(), e.ToString());
    }
}
