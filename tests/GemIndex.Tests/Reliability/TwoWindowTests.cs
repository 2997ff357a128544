using GemIndex.Cli.TextUi.Bench;
using GemIndex.Cli.TextUi.Main;
using GemIndex.Data.Workbook;

namespace GemIndex.Tests.Reliability;

/// <summary>Two text UIs (their models, each with its own connection) on one workbook: neither reverts the other.</summary>
[System.Runtime.Versioning.UnsupportedOSPlatform("windows")]
public sealed class TwoWindowTests : IDisposable
{
    private readonly ReliabilityFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [Fact]
    public async Task Edits_to_one_field_in_two_windows_are_a_conflict_shown_with_both_values_and_the_first_is_kept()
    {
        string path = _folder.Workbook("wb.db", stones: 1);
        using var workbookA = StoneWorkbook.Open(path, TimeProvider.System);
        using var workbookB = StoneWorkbook.Open(path, TimeProvider.System);
        var windowA = new BenchSession(workbookA, new BenchAssessor(null), a => a());
        var windowB = new BenchSession(workbookB, new BenchAssessor(null), a => a());
        windowA.Start();
        windowB.Start();
        Assert.Equal(windowA.Form.StoneId, windowB.Form.StoneId);

        windowB.Form.SetText(BenchFields.Notes, "feather near the culet");
        await windowB.Changed();
        windowA.Form.SetText(BenchFields.Notes, "needles in three directions");
        windowA.Form.SetText(BenchFields.Shape, "pear");
        await windowA.Changed();


        FieldConflict conflict = Assert.Single(windowA.Conflicts);
        Assert.Equal(("notes", "feather near the culet", "needles in three directions"), (conflict.Field, conflict.Stored, conflict.Yours));
        Assert.Contains("changed in another window", windowA.SaveProblem);
        Assert.Contains("feather near the culet", windowA.SaveProblem);
        Assert.Null(windowB.SaveProblem);

        StoneSheet stored = workbookA.Get(windowA.Form.StoneId)!;
        Assert.Equal("feather near the culet", stored.Notes);   // B's edit was not reverted
        Assert.Equal("pear", stored.Shape);                      // A's other edit went in

        // A keeps typing elsewhere: the conflict stays until the user settles it, and B's value stays stored.
        windowA.Form.SetText(BenchFields.Dimensions, "8.1 x 6.0 x 4.2 mm");
        await windowA.Changed();
        Assert.Single(windowA.Conflicts);
        Assert.Equal("feather near the culet", workbookB.Get(windowA.Form.StoneId)!.Notes);
        Assert.True(windowA.Flush());
        Assert.True(windowB.Flush());
    }

    [Fact]
    public async Task A_conflict_stays_shown_when_an_earlier_saves_result_reaches_the_screen_after_it()
    {
        // The screen takes results in the order they are posted, not the order of the saves: here every result of window A
        // waits, and they are shown last first, so the opening save's "no problem" comes after the conflict.
        string path = _folder.Workbook("wb.db", stones: 1);
        using var workbookA = StoneWorkbook.Open(path, TimeProvider.System);
        using var workbookB = StoneWorkbook.Open(path, TimeProvider.System);
        var posted = new List<Action>();
        var windowA = new BenchSession(workbookA, new BenchAssessor(null), a => { lock (posted) posted.Add(a); });
        var windowB = new BenchSession(workbookB, new BenchAssessor(null), a => a());
        windowA.Start();
        windowB.Start();
        Assert.True(windowA.Flush());
        windowB.Form.SetText(BenchFields.Notes, "feather near the culet");
        await windowB.Changed();
        windowA.Form.SetText(BenchFields.Notes, "needles in three directions");
        await windowA.Changed();
        Assert.Equal(2, posted.Count);
        foreach (Action show in Enumerable.Reverse(posted)) show();
        Assert.Equal("notes", Assert.Single(windowA.Conflicts).Field);
        Assert.Contains("changed in another window", windowA.SaveProblem);
        Assert.True(windowB.Flush());
    }

    [Fact]
    public async Task Edits_to_different_fields_in_two_windows_are_both_kept()
    {
        string path = _folder.Workbook("wb.db", stones: 1);
        using var workbookA = StoneWorkbook.Open(path, TimeProvider.System);
        using var workbookB = StoneWorkbook.Open(path, TimeProvider.System);
        var windowA = new BenchSession(workbookA, new BenchAssessor(null), a => a());
        var windowB = new BenchSession(workbookB, new BenchAssessor(null), a => a());
        windowA.Start();
        windowB.Start();
        windowA.Form.SetText(BenchFields.Sg, "2.66");
        await windowA.Changed();
        windowB.Form.SetText(BenchFields.Notes, "two-phase inclusion");
        await windowB.Changed();
        Assert.Null(windowA.SaveProblem);
        Assert.Null(windowB.SaveProblem);
        StoneSheet stored = workbookA.Get(windowA.Form.StoneId)!;
        Assert.Equal(2.66, stored.Readings.Sg);
        Assert.Equal("two-phase inclusion", stored.Notes);
        Assert.True(windowA.Flush());
        Assert.True(windowB.Flush());
    }
}
