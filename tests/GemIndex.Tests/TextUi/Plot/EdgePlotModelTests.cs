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
}
