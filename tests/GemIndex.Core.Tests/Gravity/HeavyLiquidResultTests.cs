using GemIndex.Core.Gravity;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Gravity;

public class HeavyLiquidResultTests
{
    [Fact]
    public void A_stone_that_floats_is_lighter_than_the_liquid()
    {
        var result = new HeavyLiquidResult(new SpecificGravity(3.32), HeavyLiquidOutcome.Floats);
        Assert.Equal(SpecificGravity.Minimum, result.LowestSpecificGravity);
        Assert.Equal(3.32, result.HighestSpecificGravity);
        Assert.True(result.Allows(new SpecificGravity(3.0)));
        Assert.False(result.Allows(new SpecificGravity(3.32)));
        Assert.False(result.Allows(new SpecificGravity(3.5)));
    }

    [Fact]
    public void A_stone_that_sinks_is_heavier_than_the_liquid()
    {
        var result = new HeavyLiquidResult(new SpecificGravity(2.65), HeavyLiquidOutcome.Sinks);
        Assert.Equal(2.65, result.LowestSpecificGravity);
        Assert.Equal(SpecificGravity.Maximum, result.HighestSpecificGravity);
        Assert.True(result.Allows(new SpecificGravity(4.0)));
        Assert.False(result.Allows(new SpecificGravity(2.6)));
    }

    [Fact]
    public void A_suspended_stone_matches_the_liquid_within_the_tolerance()
    {
        var result = new HeavyLiquidResult(new SpecificGravity(3.05), HeavyLiquidOutcome.Suspends);
        Assert.Equal(3.04, result.LowestSpecificGravity, 1e-12);
        Assert.Equal(3.06, result.HighestSpecificGravity, 1e-12);
        Assert.True(result.Allows(new SpecificGravity(3.055)));
        Assert.False(result.Allows(new SpecificGravity(3.07)));
    }

    [Fact]
    public void A_poorly_known_liquid_widens_the_suspended_interval()
    {
        var result = new HeavyLiquidResult(new SpecificGravity(3.05, 0.03), HeavyLiquidOutcome.Suspends);
        Assert.Equal(0.03, result.Tolerance);
        Assert.Equal(3.02, result.LowestSpecificGravity, 1e-12);
        Assert.Equal(3.08, result.HighestSpecificGravity, 1e-12);
    }

    [Fact]
    public void A_default_liquid_is_refused()
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() => new HeavyLiquidResult(default, HeavyLiquidOutcome.Sinks));
        Assert.Equal("heavy liquid density is 0; allowed: 1 to 4.3.", error.Message);
    }

    [Theory]
    // Heavy liquids for gem testing run from water (1.00) to Clerici solution (about 4.2; common practice):
    // a typed 9 or 30 is a slip, named as a liquid's density, not as the stone's SG.
    [InlineData(9.0)]
    [InlineData(0.9)]
    public void A_liquid_no_heavy_liquid_can_be_is_refused_as_a_liquid(double density)
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() => HeavyLiquidResult.Of(density, HeavyLiquidOutcome.Sinks));
        Assert.StartsWith("heavy liquid density is", error.Message);
        Assert.Equal(4.15, HeavyLiquidResult.Of(4.15, HeavyLiquidOutcome.Floats).Liquid.Value);
    }

    [Fact]
    public void An_undefined_outcome_is_refused()
    {
        var error = Assert.Throws<ArgumentOutOfRangeException>(() => new HeavyLiquidResult(new SpecificGravity(3.32), (HeavyLiquidOutcome)7));
        Assert.StartsWith("heavy liquid outcome must be floats, suspends or sinks.", error.Message);
    }

    [Fact]
    public void Several_results_together_bound_the_SG_or_say_they_contradict()
    {
        // Common practice: a stone that sinks in 2.89 and floats in 3.32 lies between them (a quartz would, at 2.65 it would not).
        Assert.Equal("between 2.89 and 3.32", HeavyLiquidResult.Together([HeavyLiquidResult.Of(3.32, HeavyLiquidOutcome.Floats), HeavyLiquidResult.Of(2.89, HeavyLiquidOutcome.Sinks)]));
        Assert.Equal("above 3.32", HeavyLiquidResult.Together([HeavyLiquidResult.Of(3.32, HeavyLiquidOutcome.Sinks), HeavyLiquidResult.Of(2.89, HeavyLiquidOutcome.Sinks)]));
        Assert.Equal("below 2.89", HeavyLiquidResult.Together([HeavyLiquidResult.Of(2.89, HeavyLiquidOutcome.Floats)]));
        Assert.Equal("about 3.05", HeavyLiquidResult.Together([HeavyLiquidResult.Of(3.05, HeavyLiquidOutcome.Suspends), HeavyLiquidResult.Of(2.89, HeavyLiquidOutcome.Sinks)]));
        Assert.Null(HeavyLiquidResult.Together([HeavyLiquidResult.Of(3.32, HeavyLiquidOutcome.Sinks), HeavyLiquidResult.Of(2.89, HeavyLiquidOutcome.Floats)]));
        Assert.Null(HeavyLiquidResult.Together([]));
    }
}
