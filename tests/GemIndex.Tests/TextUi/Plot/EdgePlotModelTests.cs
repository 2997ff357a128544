using GemIndex.Cli.TextUi.Plot;
using GemIndex.Data.Batch;

namespace GemIndex.Tests.TextUi.Plot;

public class EdgePlotModelTests
{
    // A corundum series (common practice: ω 1.770 constant, ε moving down to 1.762).
    private static readonly EdgePlotModel Corundum = new([new(0, 1.762, 1.770), new(45, 1.764, 1.770), new(90, 1.768, 1.770)]);

    [Theory]
    [InlineData(4)]
    [InlineData(9)]
    [InlineData(17)]
    [InlineData(30)]
    public void The_index_step_is_a_round_number_that_fits_the_rows(int rows)
    {
        double step = Corundum.IndexStep(rows);
        Assert.Contains(step, new[] { 0.0005, 0.001, 0.002, 0.005, 0.01, 0.02 });
        double bottom = Corundum.AlignedBottom(step);
        Assert.True(bottom <= Corundum.Bottom + 1e-9);
        Assert.True(bottom + step * (rows - 1) >= Corundum.Top - EdgePlotModel.Margin - 1e-9);   // the highest edge is on a row of the window
        Assert.Equal(0, Math.Round(bottom / step, 6) % 1);   // every label lands on a multiple of the step: even ticks
    }

    [Fact]
    public void A_high_edge_unseen_beside_steps_that_read_one_is_drawn_at_the_liquid_and_its_line_not_across()
    {
        // Invented readings: the high edge rises above a 1.79 liquid at 67.5–112.5°.
        var model = new EdgePlotModel([new(0, 1.757, 1.762), new(45, 1.757, 1.782), new(67.5, 1.757, null), new(90, 1.757, null),
            new(112.5, 1.757, null), new(135, 1.757, 1.785), new(157.5, 1.757, 1.768)], 1.79);
        Assert.Equal([67.5, 90, 112.5], model.HighUnseen);
        Assert.Equal(1.79, model.LiquidLimit);
        Assert.Equal([2, 2], model.HighRuns.Select(r => r.Count));   // 0–45° and 135–157.5°, not one line across
        Assert.True(model.Top >= 1.79);
        // One edge at every step (a singly refractive stone): nothing unseen, no liquid line.
        var single = new EdgePlotModel([new(0, 1.718, null), new(90, 1.718, null)], 1.79);
        Assert.Empty(single.HighUnseen);
        Assert.Null(single.LiquidLimit);
    }

    [Fact]
    public void A_single_edge_where_the_edges_meet_is_drawn_as_both_and_keeps_the_window_to_the_readings()
    {
        // A tourmaline-like series (ω 1.644, ε 1.624, handbook values from memory): at 90° the two edges meet and one edge is
        // read. It had been drawn as a high edge above a 1.79 liquid, the window stretched to 1.79 and the 0.020 spread
        // squashed into two rows.
        var model = new EdgePlotModel([new(0, 1.624, 1.644), new(30, 1.628, 1.644), new(60, 1.637, 1.644), new(90, 1.644, null),
            new(120, 1.637, 1.644), new(150, 1.628, 1.644)], 1.79);
        Assert.Empty(model.HighUnseen);
        Assert.Null(model.LiquidLimit);
        Assert.Contains((90.0, 1.644), model.Meeting);
        Assert.Equal([6], model.HighRuns.Select(r => r.Count));   // the high edge's line goes on through the meeting
        Assert.True(model.Top < 1.66, $"top {model.Top}");
        // A high edge unseen far below the liquid (1.85) was missed, not hidden: no liquid line, the window kept to the readings.
        var missed = new EdgePlotModel([new(0, 1.757, 1.762), new(45, 1.757, 1.782), new(90, 1.757, null), new(135, 1.757, 1.785)], 1.85);
        Assert.Equal([90.0], missed.HighUnseen);
        Assert.Null(missed.LiquidLimit);
    }
}
