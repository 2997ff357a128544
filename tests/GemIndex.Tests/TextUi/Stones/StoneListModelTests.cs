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
        Assert.Contains(StoneListModel.Pending, model.LineOf(stone), StringComparison.Ordinal);   // shown at once, worked out after
        model.Store(stone, model.Compute(stone.Id)!);
        string line = model.LineOf(stone);
        Assert.Equal(model.Heading.IndexOf("Answer", StringComparison.Ordinal), line.IndexOf("chrysoberyl 97%", StringComparison.Ordinal));
        Assert.EndsWith("2026-12-03", line, StringComparison.Ordinal);
        Assert.Contains("1.23 ct", line, StringComparison.Ordinal);
        Assert.True(line.Length <= 78, $"{line.Length} columns: {line}");   // inside the dialog's frame at 80 columns
    }

    [Theory]
    [InlineData(78, 20)]     // 80 columns inside the frame
    [InlineData(118, 40)]    // 120 columns: a long species name and its share fit; the colour column has ten more, the reference ten
    public void The_answer_column_takes_the_width_the_other_columns_leave(int width, int answerWidth)
    {
        var stone = new StoneSummary(7, "lot 9", "red", 1.2, Noon);
        var model = new StoneListModel(_ => [stone], _ => "pyrope-almandine garnet 88%") { Width = width };
        model.Store(stone, model.Compute(7)!);
        Assert.Equal(answerWidth, model.AnswerWidth);
        string line = model.LineOf(stone);
        Assert.Equal(model.Heading.IndexOf("Changed", StringComparison.Ordinal), line.IndexOf("2026-12-03", StringComparison.Ordinal));
        Assert.True(line.Length <= width, $"{line.Length}: {line}");
        Assert.Equal(answerWidth >= 27, line.Contains("pyrope-almandine garnet 88%", StringComparison.Ordinal));
    }

    [Fact]
    public void A_long_reference_is_whole_on_a_wide_screen()
    {
        // A copy of a stone is told from it only at the end of its reference ("estate lot A / 6 (copy)"), which was cut at any width.
        var stone = new StoneSummary(7, "estate lot A / 6 (copy)", "colourless", 1.2, Noon);
        var wide = new StoneListModel(_ => [stone], _ => "diamond >99%") { Width = 118 };
        wide.Store(stone, wide.Compute(7)!);
        Assert.StartsWith("estate lot A / 6 (copy) ", wide.LineOf(stone), StringComparison.Ordinal);
        Assert.Equal(wide.Heading.IndexOf("Colour", StringComparison.Ordinal), wide.LineOf(stone).IndexOf("colourless", StringComparison.Ordinal));
        var narrow = new StoneListModel(_ => [stone], _ => "diamond >99%") { Width = 78 };
        narrow.Store(stone, narrow.Compute(7)!);
        Assert.True(narrow.LineOf(stone).Length <= 78);
    }

    [Fact]
    public void A_long_colour_is_whole_on_a_wide_screen_and_cut_at_80_columns()
    {
        var stone = new StoneSummary(7, "lot 9", "yellowish green", 1.2, Noon);
        var wide = new StoneListModel(_ => [stone], _ => "forsterite >99%: peridot") { Width = 118 };
        wide.Store(stone, wide.Compute(7)!);
        Assert.Contains("yellowish green ", wide.LineOf(stone), StringComparison.Ordinal);
        Assert.Equal(wide.Heading.IndexOf("Weight", StringComparison.Ordinal) + "Weight".Length, wide.LineOf(stone).IndexOf(" ct", StringComparison.Ordinal) + " ct".Length);
        var narrow = new StoneListModel(_ => [stone], _ => "forsterite >99%: peridot") { Width = 78 };
        narrow.Store(stone, narrow.Compute(7)!);
        Assert.DoesNotContain("yellowish green", narrow.LineOf(stone), StringComparison.Ordinal);
        Assert.True(narrow.LineOf(stone).Length <= 78);
    }

    [Fact]
    public void A_stones_answer_is_kept_once_per_change_and_only_the_unknown_ones_are_asked_for()
    {
        var first = new StoneSummary(1, "a", "red", null, Noon);
        var other = new StoneSummary(2, "b", "blue", null, Noon);
        var shown = new List<StoneSummary> { first, other };
        var model = new StoneListModel(_ => [.. shown], _ => "corundum 92%");
        Assert.Equal([1L, 2L], model.Missing().Select(s => s.Id));
        model.Store(first, "corundum 92%");
        model.Search("a");
        Assert.Equal([2L], model.Missing().Select(s => s.Id));            // a search keeps what was worked out
        shown[0] = first with { Modified = Noon.AddMinutes(5) };           // the stone changed: its answer is asked for again
        model.Refresh();
        Assert.Equal([1L, 2L], model.Missing().Select(s => s.Id));
    }

    [Fact]
    public void A_search_finds_stones_by_their_answer_once_it_is_worked_out()
    {
        var red = new StoneSummary(1, "lot 4 / 1", "red", null, Noon);
        var blue = new StoneSummary(2, "lot 4 / 2", "blue", null, Noon);
        var all = new[] { red, blue };
        // The workbook's own search looks at the reference, colour and notes only.
        var model = new StoneListModel(q => [.. all.Where(s => q.Length == 0 || s.Colour.Contains(q) || s.Reference.Contains(q))],
            id => id == 1 ? "spinel 91%" : id == 2 ? "corundum 88%" : null);
        model.Search("SPINEL");
        Assert.Empty(model.Shown);
        Assert.True(model.AnswersPending);
        Assert.Equal([1L, 2L], model.Missing().Select(s => s.Id));         // a search asks for every stone's answer
        Assert.True(model.Store(red, model.Compute(1)));                    // the match appears as its answer comes
        Assert.Equal([1L], model.Shown.Select(s => s.Id));
        Assert.False(model.Store(blue, model.Compute(2)));
        Assert.False(model.AnswersPending);
        model.Search("blue");                                               // the workbook's matches stay
        Assert.Equal([2L], model.Shown.Select(s => s.Id));
        model.Search("");
        Assert.Equal([1L, 2L], model.Shown.Select(s => s.Id));
    }

    [Fact]
    public void An_answer_that_cannot_be_worked_out_yet_is_asked_again_and_ends_the_wait()
    {
        var stone = new StoneSummary(1, "a", "red", null, Noon);
        var model = new StoneListModel(_ => [stone], _ => null);            // no catalogue loaded
        model.Search("spinel");
        Assert.False(model.Store(stone, null));
        Assert.False(model.AnswersPending);                                 // the list says "no stone matches", not "being worked out"
        Assert.Equal([1L], model.Missing().Select(s => s.Id));              // asked again at the next fill
        Assert.DoesNotContain(StoneListModel.Pending, model.LineOf(stone), StringComparison.Ordinal);
    }

    [Fact]
    public void Without_an_answer_function_the_column_stays_empty_and_nothing_is_missing()
    {
        var stone = new StoneSummary(1, "a", "red", null, Noon);
        var model = new StoneListModel(_ => [stone]);
        Assert.Empty(model.Missing());
        Assert.DoesNotContain(StoneListModel.Pending, model.LineOf(stone), StringComparison.Ordinal);
    }

    [Fact]
    public void F4_orders_the_list_by_reference_with_lot_numbers_in_order_then_answer_then_weight_then_back_to_changed()
    {
        // Invented stones; the workbook lists them changed last first.
        StoneSummary[] all =
        [
            new(3, "lot 10", "blue", 1.2, Noon.AddMinutes(3)),
            new(2, "Lot 9", "red", null, Noon.AddMinutes(2)),
            new(1, "lot 2", "green", 3.05, Noon.AddMinutes(1)),
        ];
        var model = new StoneListModel(_ => all, id => id switch { 1 => "beryl 95%", 2 => "corundum 90%", _ => "spinel 88%" });
        Assert.Equal([3L, 2L, 1L], model.Shown.Select(s => s.Id));
        model.NextOrder();
        Assert.Equal((StoneOrder.Reference, "reference"), (model.Order, model.OrderWords));
        Assert.Equal(["lot 2", "Lot 9", "lot 10"], model.Shown.Select(s => s.Reference));
        model.NextOrder();
        Assert.Equal(StoneOrder.Answer, model.Order);
        Assert.Equal([3L, 2L, 1L], model.Shown.Select(s => s.Id));            // no answers yet: as they were
        Assert.True(model.Store(all[2], model.Compute(1)));                    // an answer come moves its stone up
        Assert.Equal(1L, model.Shown[0].Id);
        model.Store(all[0], model.Compute(3));
        Assert.True(model.Store(all[1], model.Compute(2)));
        Assert.Equal(["beryl 95%", "corundum 90%", "spinel 88%"], model.Shown.Select(s => model.Compute(s.Id)));
        model.NextOrder();
        Assert.Equal([1L, 3L, 2L], model.Shown.Select(s => s.Id));            // heaviest first, no weight last
        model.Search("lot 1");
        Assert.Equal(StoneOrder.Weight, model.Order);                          // a search keeps the order
        model.NextOrder();
        Assert.Equal((StoneOrder.Changed, "changed, latest first"), (model.Order, model.OrderWords));
    }
}
