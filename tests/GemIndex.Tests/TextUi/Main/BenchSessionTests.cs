using GemIndex.Cli.TextUi.Bench;
using GemIndex.Cli.TextUi.Main;
using GemIndex.Core.Identification;
using GemIndex.Data.Workbook;

namespace GemIndex.Tests.TextUi.Main;

public class BenchSessionTests
{
    private static string TempFile() => Path.Combine(Path.GetTempPath(), "gemindex-tests-" + Guid.NewGuid().ToString("N") + ".db");

    [Fact]
    public async Task Every_change_is_saved_and_survives_reopening_including_text_that_does_not_parse()
    {
        string path = TempFile();
        try
        {
            long id;
            using (var wb = StoneWorkbook.Open(path, TimeProvider.System, WorkbookOpening.CreateIfMissing))
            {
                var session = new BenchSession(wb, new BenchAssessor(new Identifier(TestMaterials.All)), a => a());
                session.Start();
                id = session.Form.StoneId;
                session.Form.SetText(BenchFields.Reference, "ring 3");
                session.Form.PutStep(0, new StepText("0", "1.544", "1.553"));
                session.Form.SetText(BenchFields.Sg, "2.65");
                session.Form.SetText(BenchFields.WaterC, "2x");
                await session.Changed();
                Assert.Equal("quartz", session.Results.Candidates[0].Material.Name);
                Assert.Null(session.SaveProblem);
                Assert.True(session.Flush(TestHost.SaveWait));
            }
            using (var wb = StoneWorkbook.Open(path, TimeProvider.System, WorkbookOpening.CreateIfMissing))
            {
                StoneSheet stored = wb.Get(id)!;
                Assert.Equal("ring 3", stored.Reference);
                Assert.Equal(2.65, stored.Readings.Sg);
                Assert.Equal(1.553, stored.Readings.Refractometer!.Readings[0].High);
                var session = new BenchSession(wb, new BenchAssessor(null), a => a());
                session.Start();
                Assert.Equal(id, session.Form.StoneId);
                Assert.Equal("2x", session.Form.Text(BenchFields.WaterC));
                Assert.True(session.Flush(TestHost.SaveWait)); // the background save Start began must end before the workbook closes
            }
        }
        finally
        {
            foreach (string f in new[] { path, path + "-wal", path + "-shm" }) File.Delete(f);
        }
    }

    [Fact]
    public async Task A_copy_keeps_the_stone_as_typed_refused_entries_and_places_included()
    {
        // A quartz (handbook values from memory) with an SG typed beside a weighing, which the reader refuses together,
        // and a weight in air typed to the thousandth: the copy had lost both weighings and read 1.23.
        string path = TempFile();
        try
        {
            using var wb = StoneWorkbook.Open(path, TimeProvider.System, WorkbookOpening.CreateIfMissing);
            var session = new BenchSession(wb, new BenchAssessor(new Identifier(TestMaterials.All)), a => a());
            session.Start();
            long id = session.Form.StoneId;
            session.Form.SetText(BenchFields.Reference, "Q-15");
            session.Form.SetText(BenchFields.Sg, "2.65");
            session.Form.SetText(BenchFields.AirCt, "3.300");
            session.Form.SetText(BenchFields.WaterCt, "2.054");
            await session.Changed();
            long copy = session.Duplicate(id);
            Assert.NotEqual(id, copy);
            session.Open(copy);
            Assert.Equal("Q-15 (copy)", session.Form.Text(BenchFields.Reference));
            Assert.Equal(("2.65", "3.300", "2.054"), (session.Form.Text(BenchFields.Sg), session.Form.Text(BenchFields.AirCt), session.Form.Text(BenchFields.WaterCt)));
            Assert.True(session.Flush(TestHost.SaveWait));
            Assert.Equal("Q-15", wb.Get(id)!.Reference);
        }
        finally
        {
            foreach (string f in new[] { path, path + "-wal", path + "-shm" }) File.Delete(f);
        }
    }

    [Fact]
    public async Task Opening_a_stone_keeps_the_precision_and_offset_it_was_read_with_and_a_new_stone_takes_the_day_s()
    {
        // A stone's indices depend on the offset it was read with: opening it must not rewrite them (a calibration set
        // on one stone had been written into every stone opened after it, and its indices moved by the offset).
        string path = TempFile();
        try
        {
            using var wb = StoneWorkbook.Open(path, TimeProvider.System, WorkbookOpening.CreateIfMissing);
            var session = new BenchSession(wb, new BenchAssessor(null), a => a());
            session.Start();
            long old = session.Form.StoneId;
            session.Form.PutStep(0, new StepText("0", "1.577", "1.583"));   // read with no offset
            await session.Changed();
            session.New();
            long today = session.Form.StoneId;
            session.Form.SetText(BenchFields.CalibrationOffset, "0.010");   // the refractometer checked today
            session.Form.PutStep(0, new StepText("0", "1.544", "1.553"));
            await session.Changed();
            Assert.True(session.Flush(TestHost.SaveWait));
            int edits = wb.History(old).Count;

            session.Open(old);
            Assert.Equal("", session.Form.Text(BenchFields.CalibrationOffset));
            Assert.True(session.Flush(TestHost.SaveWait));
            Assert.Null(wb.Get(old)!.Readings.Refractometer!.CalibrationOffset);
            Assert.Equal(edits, wb.History(old).Count);

            session.Open(today);
            Assert.Equal("0.010", session.Form.Text(BenchFields.CalibrationOffset));   // its own, as typed
            session.New();   // not yet read: the instrument of the day
            Assert.Equal("0.010", session.Form.Text(BenchFields.CalibrationOffset));
            Assert.True(session.Flush(TestHost.SaveWait));
        }
        finally
        {
            foreach (string f in new[] { path, path + "-wal", path + "-shm" }) File.Delete(f);
        }
    }

    [Fact]
    public async Task An_older_snapshot_never_overwrites_a_newer_save()
    {
        string path = TempFile();
        try
        {
            using var wb = StoneWorkbook.Open(path, TimeProvider.System, WorkbookOpening.CreateIfMissing);
            var session = new BenchSession(wb, new BenchAssessor(null), a => a());
            session.Start();
            session.Form.SetText(BenchFields.Notes, "first");
            await session.Changed();
            session.Form.SetText(BenchFields.Notes, "second");
            await session.Changed();
            await session.Changed();   // same version again: skipped
            Assert.True(session.Flush(TestHost.SaveWait));
            Assert.Equal("second", wb.Get(session.Form.StoneId)!.Notes);
        }
        finally
        {
            foreach (string f in new[] { path, path + "-wal", path + "-shm" }) File.Delete(f);
        }
    }

    [Fact]
    public async Task The_examiner_is_typed_once_kept_across_stones_and_kept_in_the_workbook()
    {
        string path = TempFile();
        try
        {
            using (var wb = StoneWorkbook.Open(path, TimeProvider.System, WorkbookOpening.CreateIfMissing))
            {
                var session = new BenchSession(wb, new BenchAssessor(null), a => a());
                session.Start();
                session.Form.SetText(BenchFields.Examiner, "A. Example");
                await session.Changed();
                session.New();                                       // another stone: the bench's examiner stays
                Assert.Equal("A. Example", session.Form.Text(BenchFields.Examiner));
                Assert.True(session.Flush(TestHost.SaveWait));
                Assert.Equal("A. Example", wb.Setting(BenchSession.ExaminerSetting));
            }
            using (var wb = StoneWorkbook.Open(path, TimeProvider.System, WorkbookOpening.CreateIfMissing))
            {
                var session = new BenchSession(wb, new BenchAssessor(null), a => a());
                session.Start();                                     // the program started again: the examiner is back
                Assert.Equal("A. Example", session.Form.Text(BenchFields.Examiner));
                session.Open(wb.List().Last().Id);                   // and stays whichever stone is opened
                Assert.Equal("A. Example", session.Form.Text(BenchFields.Examiner));
                Assert.True(session.Flush(TestHost.SaveWait));
            }
        }
        finally
        {
            foreach (string f in new[] { path, path + "-wal", path + "-shm" }) File.Delete(f);
        }
    }
}
