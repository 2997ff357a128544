using GemIndex.Cli.TextUi.Stones;
using GemIndex.Data.Workbook;

namespace GemIndex.Tests.TextUi.Stones;

public class StoneListModelTests
{
    private static readonly DateTimeOffset Noon = new(2026, 12, 3, 12, 0, 0, TimeSpan.Zero);

    [Fact]
    public void Each_line_shows_the_stones_answer_under_the_heading_and_fits_an_80_column_screen()
    {
        var stone = new StoneSummary(7, "ring, centre stone of the estate piece", "yellowish green", 1.234, Noon);
        var model = new StoneListModel(_ => [stone], id => id == 7 ? "chrysoberyl 97%" : "");
        string line = model.LineOf(stone);
        Assert.Equal(StoneListModel.Heading.IndexOf("Answer", StringComparison.Ordinal), line.IndexOf("chrysoberyl 97%", StringComparison.Ordinal));
        Assert.EndsWith("2026-12-03", line, StringComparison.Ordinal);
        Assert.Contains("1.23 ct", line, StringComparison.Ordinal);
        Assert.True(line.Length <= 78, $"{line.Length} columns: {line}");   // inside the dialog's frame at 80 columns
    }

    [Fact]
    public void A_stones_answer_is_worked_out_once_per_change_not_on_every_search()
    {
        var first = new StoneSummary(1, "a", "red", null, Noon);
        var changed = first with { Modified = Noon.AddMinutes(5) };
        var shown = first;
        int asked = 0;
        var model = new StoneListModel(_ => [shown], _ => { asked++; return "corundum 92%"; });
        model.LineOf(model.Shown[0]);
        model.Search("a");
        model.LineOf(model.Shown[0]);
        Assert.Equal(1, asked);
        shown = changed;
        model.Refresh();
        model.LineOf(model.Shown[0]);
        Assert.Equal(2, asked);
    }
}
