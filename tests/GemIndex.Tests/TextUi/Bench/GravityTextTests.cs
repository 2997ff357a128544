using GemIndex.Cli.TextUi.Bench;
using GemIndex.Core.Bench;

namespace GemIndex.Tests.TextUi.Bench;

public class GravityTextTests
{
    private static string Line(string air, string water)
    {
        var form = new BenchModel();
        form.SetText(BenchFields.AirCt, air);
        form.SetText(BenchFields.WaterCt, water);
        BenchSnapshot snapshot = form.Snapshot();
        var reading = BenchReader.Read(new BenchReadings().With(BenchField.AirCt, air).With(BenchField.WaterCt, water));
        return GravityText.Describe(snapshot, reading.Sheet.SpecificGravity);
    }

    [Fact]
    public void A_weighing_too_light_for_the_balance_says_so_and_a_usual_one_does_not()
    {
        // 0.004 ct in air, 0.002 in water: SG 2.0 uncertain by about ±2 at the balance's ±0.002 ct (BenchDefaults);
        // 3.000 and 2.000 ct: SG about 3.0 within a few hundredths (weights invented for the rule).
        Assert.EndsWith(GravityText.TooLight, Line("0.004", "0.002"));
        Assert.DoesNotContain(GravityText.TooLight, Line("3.000", "2.000"));
        Assert.Matches(@"^SG (2\.99|3\.00)\d* ± 0\.0\d+ from the weights$", Line("3.000", "2.000"));   // water at 20 °C: 2.99x
    }

    [Theory]
    [InlineData("3.32 sinks", "SG above 3.32 (heavy liquids)")]
    [InlineData("3.32 floats; 2.89 sinks", "SG between 2.89 and 3.32 (heavy liquids)")]
    [InlineData("3.05 suspends", "SG about 3.05 (heavy liquids)")]
    [InlineData("1.13 floats", "SG below 1.13 (float test)")]   // amber in saturated salt water: no heavy liquid
    [InlineData("3.32 sinks; 2.89 floats", "SG - (the heavy liquids contradict each other: check them; the answer weighs them as read)")]
    public void Heavy_liquids_alone_say_what_they_bound_on_the_SG_line(string liquids, string line)
    {
        var form = new BenchModel();
        form.SetText(BenchFields.HeavyLiquids, liquids);
        Assert.Equal(line, GravityText.Describe(form.Snapshot(), null));
    }
}
