using GemIndex.Data.Batch;
using GemIndex.Data.Workbook;
using Microsoft.Data.Sqlite;

namespace GemIndex.Data.Tests.Workbook;

public class StoneWorkbookTests
{
    private static StoneSheet Quartz(string reference = "lot 7 / 1") => new()
    {
        Reference = reference, WeightCarats = 2.31, Dimensions = "9.1 x 7.0 x 5.2 mm", Shape = "oval", CuttingStyle = "mixed cut",
        Transparency = "transparent", Notes = "two-phase inclusion near girdle",
        Readings = new StoneReadings
        {
            Id = reference, Colour = "pale yellow", Sg = 2.65,
            Refractometer = new RefractometerReadings { Readings = [new EdgeReadingEntry(0, 1.544, 1.553), new EdgeReadingEntry(90, 1.544, 1.549)] },
        },
    };

    [Fact]
    public void A_created_stone_reads_back_intact_after_reopening_the_file()
    {
        using var dir = new TempDirectory();
        long id;
        using (var wb = StoneWorkbook.Open(dir.File("wb.db"), new SteppingClock(), WorkbookOpening.CreateIfMissing)) id = wb.Create(Quartz()).Id;
        using var again = StoneWorkbook.Open(dir.File("wb.db"), new SteppingClock(), WorkbookOpening.CreateIfMissing);
        StoneSheet s = again.Get(id)!;
        Assert.Equal("lot 7 / 1", s.Reference);
        Assert.Equal(2.31, s.WeightCarats);
        Assert.Equal("mixed cut", s.CuttingStyle);
        Assert.Equal("pale yellow", s.Readings.Colour);
        Assert.Equal(2.65, s.Readings.Sg);
        Assert.Equal(new EdgeReadingEntry(90, 1.544, 1.549), s.Readings.Refractometer!.Readings[1]);
    }

    [Theory]
    [InlineData("Opaque, waxy lustre", "opaque")]
    [InlineData("translucent", "translucent")]
    [InlineData("semi-translucent", null)]   // says nothing the advice can use
    public void A_stone_saved_with_its_transparency_only_described_reads_back_with_the_reading(string described, string? reading)
    {
        using var dir = new TempDirectory();
        using var wb = StoneWorkbook.Open(dir.File("wb.db"), new SteppingClock(), WorkbookOpening.CreateIfMissing);
        StoneSheet saved = wb.Create(Quartz() with { Transparency = described });   // as stones were saved before it was a reading
        using (var db = new SqliteConnection($"Data Source={dir.File("wb.db")};Pooling=False"))
        {
            db.Open();
            using var cmd = db.CreateCommand();
            cmd.CommandText = "SELECT readings FROM stone";
            Assert.DoesNotContain("transparency", (string)cmd.ExecuteScalar()!);   // the stored readings carry none
        }
        StoneSheet read = wb.Get(saved.Id)!;
        Assert.Equal(reading, read.Readings.Transparency);
        Assert.Equal(described, read.Transparency);
    }

    [Fact]
    public void The_default_path_follows_XDG_DATA_HOME_when_it_is_absolute() =>
        Assert.EndsWith(Path.Combine("gemindex", "workbook.db"), WorkbookLocation.Default());

    [Fact]
    public void Saving_records_each_changed_field_with_its_time_before_and_after()
    {
        using var dir = new TempDirectory();
        using var wb = StoneWorkbook.Open(dir.File("wb.db"), new SteppingClock(), WorkbookOpening.CreateIfMissing);
        StoneSheet s = wb.Create(Quartz());
        wb.Save(s, s with { Shape = "cushion", WeightCarats = 2.30 });
        IReadOnlyList<StoneEdit> history = wb.History(s.Id);
        Assert.Equal(["created", "shape", "weight_ct"], history.Select(e => e.Field));
        Assert.Equal(("oval", "cushion"), (history[1].Before, history[1].After));
        Assert.Equal(("2.31", "2.3"), (history[2].Before, history[2].After));
        Assert.True(history[1].At > history[0].At);
        Assert.Equal(history[1].At, wb.Get(s.Id)!.Modified);
    }

    [Fact]
    public void Keystrokes_to_one_field_in_quick_succession_make_one_history_entry()
    {
        using var dir = new TempDirectory();
        using var wb = StoneWorkbook.Open(dir.File("wb.db"), new SteppingClock(), WorkbookOpening.CreateIfMissing);   // one minute per reading: inside the window
        StoneSheet s = wb.Create(Quartz() with { Notes = "" });
        foreach (string typed in new[] { "c", "cl", "cle", "clean" }) s = wb.Save(s, s with { Notes = typed }).Stored;
        wb.Save(s, s with { Shape = "round" });
        IReadOnlyList<StoneEdit> history = wb.History(s.Id);
        Assert.Equal(["created", "notes", "shape"], history.Select(e => e.Field));
        Assert.Equal(("", "clean"), (history[1].Before, history[1].After));
    }

    [Fact]
    public void A_step_edited_and_another_removed_in_quick_succession_are_two_entries_with_their_own_times()
    {
        // Invented peridot-like steps (handbook values from memory). The refractometer's steps are one stored field: a
        // removal within the merge window had been folded into the earlier edit's entry and carried it to its time.
        using var dir = new TempDirectory();
        using var wb = StoneWorkbook.Open(dir.File("wb.db"), new SteppingClock(), WorkbookOpening.CreateIfMissing);
        EdgeReadingEntry[] steps = [new(0, 1.654, 1.690), new(30, 1.656, 1.689), new(60, 1.664, 1.681), new(90, 1.662, 1.684)];
        StoneSheet s = wb.Create(Quartz() with { Readings = Quartz().Readings with { Refractometer = new RefractometerReadings { Readings = steps } } });
        RefractometerReadings With(params EdgeReadingEntry[] e) => new() { Readings = e };
        s = wb.Save(s, s with { Readings = s.Readings with { Refractometer = With(steps[0], steps[1], new(60, 1.665, 1.681), steps[3]) } }).Stored;
        s = wb.Save(s, s with { Readings = s.Readings with { Refractometer = With(steps[0], steps[1], new(60, 1.665, 1.681)) } }).Stored;
        IReadOnlyList<StoneEdit> history = wb.History(s.Id);
        Assert.Equal(["created", "readings.refractometer", "readings.refractometer"], history.Select(e => e.Field));
        Assert.True(history[2].At > history[1].At);
        // Read as a spot instead (an entry), then the spot typed on keystroke by keystroke: one entry for the typing.
        RefractometerReadings Spot(double value) => new() { Method = "spot", Spot = value };
        s = wb.Save(s, s with { Readings = s.Readings with { Refractometer = Spot(1.5) } }).Stored;
        int entries = wb.History(s.Id).Count;
        foreach (double spot in new[] { 1.54, 1.545 }) s = wb.Save(s, s with { Readings = s.Readings with { Refractometer = Spot(spot) } }).Stored;
        Assert.Equal(entries + 1, wb.History(s.Id).Count);
    }

    [Fact]
    public void A_value_typed_over_and_put_back_within_the_window_leaves_no_entry()
    {
        // An SG of 3.85 typed over with 3.95 and put back (Ctrl+Z) had left "SG changed from '3.85' to '3.85'".
        using var dir = new TempDirectory();
        using var wb = StoneWorkbook.Open(dir.File("wb.db"), new SteppingClock(), WorkbookOpening.CreateIfMissing);
        StoneSheet s = wb.Create(Quartz() with { Notes = "garnet" });
        int before = wb.History(s.Id).Count;
        foreach (string typed in new[] { "garnet?", "garnet", "garnet, rhodolite" }) s = wb.Save(s, s with { Notes = typed }).Stored;
        Assert.Equal(before + 1, wb.History(s.Id).Count);
        Assert.Equal(("garnet", "garnet, rhodolite"), (wb.History(s.Id)[^1].Before, wb.History(s.Id)[^1].After));
        s = wb.Save(s, s with { Notes = "garnet" }).Stored;                 // back to where the entry began
        Assert.Equal(before, wb.History(s.Id).Count);
    }

    [Fact]
    public void A_step_removed_and_put_back_in_quick_succession_leaves_two_entries()
    {
        // Invented peridot-like steps (handbook values from memory). The removal and its undo had merged into one entry
        // whose before and after were the same: the history then showed nothing of either.
        using var dir = new TempDirectory();
        using var wb = StoneWorkbook.Open(dir.File("wb.db"), new SteppingClock(), WorkbookOpening.CreateIfMissing);
        EdgeReadingEntry[] steps = [new(0, 1.654, 1.690), new(30, 1.656, 1.689), new(60, 1.664, 1.681)];
        StoneSheet s = wb.Create(Quartz() with { Readings = Quartz().Readings with { Refractometer = new RefractometerReadings { Readings = steps } } });
        s = wb.Save(s, s with { Readings = s.Readings with { Refractometer = new RefractometerReadings { Readings = [steps[0], steps[2]] } } }).Stored;
        s = wb.Save(s, s with { Readings = s.Readings with { Refractometer = new RefractometerReadings { Readings = steps } } }).Stored;
        IReadOnlyList<StoneEdit> history = wb.History(s.Id);
        Assert.Equal(["created", "readings.refractometer", "readings.refractometer"], history.Select(e => e.Field));
        Assert.Equal(history[1].Before, history[2].After);
    }

    [Fact]
    public void Saving_without_changes_adds_no_history()
    {
        using var dir = new TempDirectory();
        using var wb = StoneWorkbook.Open(dir.File("wb.db"), new SteppingClock(), WorkbookOpening.CreateIfMissing);
        StoneSheet s = wb.Create(Quartz());
        wb.Save(s, s);
        Assert.Single(wb.History(s.Id));
    }

    [Fact]
    public void Search_finds_stones_by_reference_colour_or_notes_in_any_case()
    {
        using var dir = new TempDirectory();
        using var wb = StoneWorkbook.Open(dir.File("wb.db"), new SteppingClock(), WorkbookOpening.CreateIfMissing);
        wb.Create(Quartz("lot 7 / 1"));
        wb.Create(Quartz("brooch centre") with { Notes = "chipped culet", Readings = new StoneReadings { Colour = "deep red" } });
        Assert.Equal(2, wb.List().Count);
        Assert.Equal(["brooch centre"], wb.List("RED").Select(s => s.Reference));
        Assert.Equal(["brooch centre"], wb.List("culet").Select(s => s.Reference));
        Assert.Equal(["lot 7 / 1"], wb.List("LOT 7").Select(s => s.Reference));
        Assert.Empty(wb.List("emerald"));
    }

    [Fact]
    public void Duplicate_copies_the_readings_under_a_new_reference_and_delete_removes_only_that_stone()
    {
        using var dir = new TempDirectory();
        using var wb = StoneWorkbook.Open(dir.File("wb.db"), new SteppingClock(), WorkbookOpening.CreateIfMissing);
        StoneSheet s = wb.Create(Quartz());
        StoneSheet copy = wb.Duplicate(s.Id);
        Assert.NotEqual(s.Id, copy.Id);
        Assert.Equal("lot 7 / 1 (copy)", copy.Reference);
        Assert.Equal(s.Readings.Refractometer!.Readings, copy.Readings.Refractometer!.Readings);
        Assert.True(wb.Delete(s.Id));
        Assert.Null(wb.Get(s.Id));
        Assert.Empty(wb.History(s.Id));
        Assert.NotNull(wb.Get(copy.Id));
        Assert.False(wb.Delete(s.Id));
    }

    [Fact]
    public void Settings_are_kept_between_openings()
    {
        using var dir = new TempDirectory();
        using (var wb = StoneWorkbook.Open(dir.File("wb.db"), new SteppingClock(), WorkbookOpening.CreateIfMissing)) wb.SetSetting("calibration_offset", "0.002");
        using var again = StoneWorkbook.Open(dir.File("wb.db"), new SteppingClock(), WorkbookOpening.CreateIfMissing);
        Assert.Equal("0.002", again.Setting("calibration_offset"));
        Assert.Null(again.Setting("light_nm"));
    }

    [Fact]
    public void A_text_file_is_refused_with_a_clear_message_and_left_untouched()
    {
        using var dir = new TempDirectory();
        string path = dir.File("notes.db");
        File.WriteAllText(path, "shopping list: loupe, tweezers, cloth\n");
        byte[] before = File.ReadAllBytes(path);
        var e = Assert.Throws<WorkbookException>(() => StoneWorkbook.Open(path, new SteppingClock(), WorkbookOpening.CreateIfMissing));
        Assert.Contains("notes.db", e.Message);
        Assert.Contains("not a database", e.Message);
        Assert.Equal(before, File.ReadAllBytes(path));
    }

    [Fact]
    public void Another_applications_sqlite_file_is_refused_and_left_untouched()
    {
        using var dir = new TempDirectory();
        string path = dir.File("other.db");
        using (var other = new SqliteConnection($"Data Source={path};Pooling=False"))
        {
            other.Open();
            using var cmd = other.CreateCommand();
            cmd.CommandText = "CREATE TABLE invoice(id INTEGER PRIMARY KEY, total REAL); INSERT INTO invoice(total) VALUES (12.5);";
            cmd.ExecuteNonQuery();
        }
        byte[] before = File.ReadAllBytes(path);
        var e = Assert.Throws<WorkbookException>(() => StoneWorkbook.Open(path, new SteppingClock(), WorkbookOpening.CreateIfMissing));
        Assert.Contains("not a GemIndex workbook", e.Message);
        Assert.Equal(before, File.ReadAllBytes(path));
    }

    [Fact]
    public void A_workbook_from_a_newer_schema_is_refused_and_left_untouched()
    {
        using var dir = new TempDirectory();
        string path = dir.File("newer.db");
        using (StoneWorkbook.Open(path, new SteppingClock(), WorkbookOpening.CreateIfMissing)) { }
        using (var raw = new SqliteConnection($"Data Source={path};Pooling=False"))
        {
            raw.Open();
            using var cmd = raw.CreateCommand();
            cmd.CommandText = $"PRAGMA user_version = {StoneWorkbook.SchemaVersion + 1}";
            cmd.ExecuteNonQuery();
        }
        byte[] before = File.ReadAllBytes(path);
        var e = Assert.Throws<WorkbookException>(() => StoneWorkbook.Open(path, new SteppingClock(), WorkbookOpening.CreateIfMissing));
        Assert.Contains("newer GemIndex", e.Message);
        Assert.Contains($"schema {StoneWorkbook.SchemaVersion + 1}", e.Message);
        Assert.Equal(before, File.ReadAllBytes(path));
    }

    [Fact]
    public void Each_save_is_on_disk_when_the_call_returns()
    {
        using var dir = new TempDirectory();
        string path = dir.File("wb.db");
        using var wb = StoneWorkbook.Open(path, new SteppingClock(), WorkbookOpening.CreateIfMissing);
        StoneSheet s = wb.Create(Quartz());
        wb.Save(s, s with { Notes = "typed just before the terminal closed" });
        // A second, independent connection sees the committed change while the first is still open.
        using var reader = new SqliteConnection($"Data Source={path};Pooling=False;Mode=ReadOnly");
        reader.Open();
        using var cmd = reader.CreateCommand();
        cmd.CommandText = "SELECT notes FROM stone WHERE id = " + s.Id;
        Assert.Equal("typed just before the terminal closed", cmd.ExecuteScalar());
    }
}
