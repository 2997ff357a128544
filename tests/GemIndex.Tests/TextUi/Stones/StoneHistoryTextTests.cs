using GemIndex.Cli.TextUi.Stones;
using GemIndex.Data.Workbook;

namespace GemIndex.Tests.TextUi.Stones;

public class StoneHistoryTextTests
{
    [Fact]
    public void Each_edit_shows_its_time_field_and_values_with_long_values_shortened()
    {
        var at = new DateTimeOffset(2026, 3, 1, 9, 5, 0, TimeSpan.Zero);
        IReadOnlyList<string> lines = StoneHistoryText.Lines("lot 7", [new StoneEdit(at, "notes", "", "clean"), new StoneEdit(at, "readings", new string('x', 100), "{}")]);
        Assert.Equal("History of 'lot 7' (2 entries, times in UTC)", lines[0]);
        Assert.Equal("2026-03-01 09:05:00  notes: (empty) → 'clean'", lines[2]);
        Assert.Equal($"2026-03-01 09:05:00  readings: '{new string('x', 59)}…' → '{{}}'", lines[3]);
    }
}
