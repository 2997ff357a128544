using GemIndex.Data.Batch;
using GemIndex.Data.Workbook;
using Microsoft.Data.Sqlite;

namespace GemIndex.Data.Tests.Workbook;

/// <summary>Per-field saving with the optimistic check, and what opening refuses or creates.</summary>
public class StoneWorkbookEditTests
{
    private static StoneSheet Spinel(string reference = "lot 9 / 4") => new()
    {
        Reference = reference, WeightCarats = 1.12, Shape = "cushion", Notes = "",
        Readings = new StoneReadings { Id = reference, Colour = "red", Sg = 3.60 },
    };

    [Fact]
    public void A_field_changed_in_another_window_is_kept_and_returned_as_a_conflict_with_both_values()
    {
        using var dir = new TempDirectory();
        string path = dir.File("wb.db");
        using var first = StoneWorkbook.Open(path, new SteppingClock(), WorkbookOpening.CreateIfMissing);
        using var second = StoneWorkbook.Open(path, new SteppingClock());
        StoneSheet readByFirst = first.Create(Spinel());
        StoneSheet readBySecond = second.Get(readByFirst.Id)!;

        Assert.True(second.Save(readBySecond, readBySecond with { Notes = "feather near culet" }).IsClean);
        StoneSaveResult clash = first.Save(readByFirst, readByFirst with { Notes = "needle inclusions", Shape = "oval" });

        FieldConflict conflict = Assert.Single(clash.Conflicts);
        Assert.Equal(new FieldConflict("notes", "", "feather near culet", "needle inclusions"), conflict);
        Assert.Equal(["shape"], clash.Saved);                       // the other field went through
        Assert.Equal("feather near culet", clash.Stored.Notes);     // the other window's edit was not reverted
        Assert.Equal("oval", clash.Stored.Shape);
    }

    [Fact]
    public void A_conflict_is_reported_again_until_the_user_settles_it()
    {
        using var dir = new TempDirectory();
        string path = dir.File("wb.db");
        using var first = StoneWorkbook.Open(path, new SteppingClock(), WorkbookOpening.CreateIfMissing);
        using var second = StoneWorkbook.Open(path, new SteppingClock());
        StoneSheet s = first.Create(Spinel());
        second.Save(s, s with { Shape = "oval" });
        StoneSheet mine = s with { Shape = "pear" };
        StoneSaveResult once = first.Save(s, mine);
        StoneSaveResult again = first.Save(once.NextLastRead, mine with { Notes = "typed on" });   // the next keystroke
        Assert.Equal("shape", Assert.Single(again.Conflicts).Field);
        Assert.Equal("oval", second.Get(s.Id)!.Shape);
        // "keep mine": save against what is stored now.
        StoneSaveResult kept = first.Save(again.Stored, mine with { Notes = "typed on" });
        Assert.True(kept.IsClean);
        Assert.Equal("pear", second.Get(s.Id)!.Shape);
    }

    [Fact]
    public void A_field_changed_only_elsewhere_is_never_written_back_by_a_later_save()
    {
        using var dir = new TempDirectory();
        string path = dir.File("wb.db");
        using var first = StoneWorkbook.Open(path, new SteppingClock(), WorkbookOpening.CreateIfMissing);
        using var second = StoneWorkbook.Open(path, new SteppingClock());
        StoneSheet s = first.Create(Spinel());
        second.Save(s, s with { Notes = "from the other window" });
        StoneSaveResult unrelated = first.Save(s, s with { Shape = "oval" });   // clean, and the window still shows empty notes
        Assert.Equal("from the other window", unrelated.Stored.Notes);
        Assert.Equal("", unrelated.NextLastRead.Notes);
        StoneSaveResult later = first.Save(unrelated.NextLastRead, s with { Shape = "oval", Notes = "mine" });
        Assert.Equal("notes", Assert.Single(later.Conflicts).Field);
        Assert.Equal("from the other window", first.Get(s.Id)!.Notes);
    }

    [Fact]
    public void Two_windows_editing_different_readings_of_one_stone_both_keep_their_edits()
    {
        using var dir = new TempDirectory();
        string path = dir.File("wb.db");
        using var first = StoneWorkbook.Open(path, new SteppingClock(), WorkbookOpening.CreateIfMissing);
        using var second = StoneWorkbook.Open(path, new SteppingClock());
        StoneSheet s = first.Create(Spinel());
        Assert.True(second.Save(s, s with { Readings = s.Readings with { Polariscope = "isotropic" } }).IsClean);
        Assert.True(first.Save(s, s with { Readings = s.Readings with { Sg = 3.61 } }).IsClean);
        StoneSheet stored = first.Get(s.Id)!;
        Assert.Equal("isotropic", stored.Readings.Polariscope);
        Assert.Equal(3.61, stored.Readings.Sg);
        Assert.Equal(["created", "readings.polariscope", "readings.sg"], first.History(s.Id).Select(e => e.Field));
        Assert.Equal(("3.6", "3.61"), (first.History(s.Id)[2].Before, first.History(s.Id)[2].After));
    }

    [Fact]
    public void A_stone_deleted_elsewhere_is_not_saved_and_says_so()
    {
        using var dir = new TempDirectory();
        using var wb = StoneWorkbook.Open(dir.File("wb.db"), new SteppingClock(), WorkbookOpening.CreateIfMissing);
        StoneSheet s = wb.Create(Spinel());
        wb.Delete(s.Id);
        var e = Assert.Throws<WorkbookException>(() => wb.Save(s, s with { Notes = "x" }));
        Assert.Contains("deleted elsewhere", e.Message);
    }

    [Fact]
    public void A_missing_path_is_not_created_unless_a_new_workbook_was_asked_for()
    {
        using var dir = new TempDirectory();
        string path = Path.Combine(dir.Path, "typo", "wb.db");
        var e = Assert.Throws<WorkbookMissingException>(() => StoneWorkbook.Open(path, new SteppingClock()));
        Assert.Contains("no workbook there", e.Message);
        Assert.False(Directory.Exists(Path.Combine(dir.Path, "typo")));
        using var created = StoneWorkbook.Open(path, new SteppingClock(), WorkbookOpening.CreateIfMissing);
        Assert.False(created.IsReadOnly);
        Assert.True(File.Exists(path));
    }

    [Fact]
    public void A_weight_stored_as_text_is_an_error_naming_the_stone_and_field_not_zero()
    {
        using var dir = new TempDirectory();
        string path = dir.File("wb.db");
        long id;
        using (var wb = StoneWorkbook.Open(path, new SteppingClock(), WorkbookOpening.CreateIfMissing)) id = wb.Create(Spinel()).Id;
        using (var raw = new SqliteConnection($"Data Source={path};Pooling=False"))
        {
            raw.Open();
            using var cmd = raw.CreateCommand();
            cmd.CommandText = "UPDATE stone SET weight_ct = 'two carats'";
            cmd.ExecuteNonQuery();
        }
        using var again = StoneWorkbook.Open(path, new SteppingClock());
        var e = Assert.Throws<WorkbookException>(() => again.Get(id));
        Assert.Contains("stone 'lot 9 / 4'", e.Message);
        Assert.Contains("weight_ct holds 'two carats', not a number", e.Message);
        Assert.Throws<WorkbookException>(() => again.List());
    }

    [Fact]
    public void A_read_only_workbook_reads_and_refuses_writes_in_words()
    {
        using var dir = new TempDirectory();
        string path = dir.File("wb.db");
        using (var wb = StoneWorkbook.Open(path, new SteppingClock(), WorkbookOpening.CreateIfMissing)) wb.Create(Spinel());
        using var reading = StoneWorkbook.Open(path, new SteppingClock(), WorkbookOpening.ReadOnly);
        Assert.True(reading.IsReadOnly);
        Assert.Single(reading.List());
        var e = Assert.Throws<WorkbookException>(() => reading.SetSetting("examiner", "A. N. Other"));
        Assert.Contains("open for reading only", e.Message);
    }

    [Theory]
    [InlineData(5, "another program is using the workbook")]
    [InlineData(8, "read-only")]
    [InlineData(11, "the workbook is damaged")]
    [InlineData(13, "the disk is full")]
    public void SQLite_result_codes_become_plain_words(int code, string words) =>
        Assert.Contains(words, SqliteProblem.Describe(new SqliteException("SQLite Error " + code, code)));
}
