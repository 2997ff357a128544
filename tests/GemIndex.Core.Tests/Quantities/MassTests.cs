using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Quantities;

public class MassTests
{
    [Fact]
    public void The_metric_carat_is_exactly_0_2_grams()
    {
        // Source: the metric carat of 200 mg, adopted by the CGPM in 1907 (DOMAIN.md §5 and §7). Exact by definition.
        Assert.Equal(0.2, Mass.GramsPerCarat);
        Assert.Equal(0.2, Mass.FromCarats(1).Grams);
        Assert.Equal(5, Mass.FromGrams(1).Carats);
        Assert.Equal(0.002, Mass.FromCarats(1, 0.01).StandardUncertaintyGrams, 1e-15);
        Assert.Equal(0.05, Mass.FromGrams(1, 0.01).StandardUncertaintyCarats, 1e-15);
    }

    [Fact]
    public void A_mass_prints_in_carats() => Assert.Equal("1.27 ct", Mass.FromCarats(1.27).ToString());

    private static readonly Arbitrary<double> Carats = Gen.Choose(0, 500_000_000).Select(i => i / 1000.0).ToArbitrary();

    [Property(MaxTest = 500)]
    public Property Carats_survive_a_round_trip_through_grams() =>
        // Relative 1e-15: one multiplication and one division by 0.2, each correctly rounded.
        Prop.ForAll(Carats, c =>
        {
            double back = Mass.FromGrams(Mass.FromCarats(c).Grams).Carats;
            return (Math.Abs(back - c) <= 1e-15 * c).Label($"{c} ct → {back} ct");
        });

    [Theory]
    [InlineData(-1, "mass is -1 g; allowed: 0 to 100000 g.")]
    [InlineData(100_001, "mass is 100001 g; allowed: 0 to 100000 g.")]
    [InlineData(double.NaN, "mass is not a finite number; allowed: 0 to 100000 g.")]
    public void A_mass_in_grams_outside_the_range_is_refused(double grams, string message)
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() => Mass.FromGrams(grams));
        Assert.Equal(message, error.Message);
    }

    [Theory]
    [InlineData(-0.5, "mass is -0.5 ct; allowed: 0 to 500000 ct.")]
    [InlineData(double.PositiveInfinity, "mass is not a finite number; allowed: 0 to 500000 ct.")]
    public void A_mass_in_carats_outside_the_range_is_refused_in_carats(double carats, string message)
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() => Mass.FromCarats(carats));
        Assert.Equal(message, error.Message);
    }

    [Fact]
    public void A_negative_uncertainty_is_refused()
    {
        var grams = Assert.Throws<QuantityOutOfRangeException>(() => Mass.FromGrams(1, -0.001));
        Assert.Equal("mass uncertainty is -0.001 g; allowed: 0 to 1000 g.", grams.Message);
        var carats = Assert.Throws<QuantityOutOfRangeException>(() => Mass.FromCarats(1, -0.01));
        Assert.Equal("mass uncertainty is -0.01 ct; allowed: 0 to 5000 ct.", carats.Message);
    }
}
