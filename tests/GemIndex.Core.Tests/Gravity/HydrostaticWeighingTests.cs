using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using GemIndex.Core.Gravity;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Gravity;

public class HydrostaticWeighingTests
{
    private static readonly Temperature Four = Temperature.FromCelsius(4);
    private static readonly Temperature Twenty = Temperature.FromCelsius(20);

    [Fact]
    public void Specific_gravity_in_water_at_4_degrees_is_the_plain_ratio()
    {
        // Worked by hand: 5.12 / (5.12 − 3.84) = 5.12 / 1.28 = 4 exactly; at 4 °C the water factor is 1.
        SpecificGravity sg = HydrostaticWeighing.SpecificGravityOf(Mass.FromCarats(5.12), Mass.FromCarats(3.84), Four);
        Assert.Equal(4, sg.Value, 1e-12);
        Assert.Equal(0, sg.StandardUncertainty);
    }

    [Fact]
    public void Specific_gravity_in_warm_water_is_corrected_by_the_water_density()
    {
        // 4 × ρ(20 °C)/ρ(4 °C) = 4 × 0.99823175356 = 3.99292701423 (Python decimal, Tanaka 2001 formula).
        SpecificGravity sg = HydrostaticWeighing.SpecificGravityOf(Mass.FromCarats(5.12), Mass.FromCarats(3.84), Twenty);
        Assert.Equal(3.99292701423, sg.Value, 1e-10);
    }

    [Fact]
    public void Grams_and_carats_give_the_same_specific_gravity()
    {
        SpecificGravity inCarats = HydrostaticWeighing.SpecificGravityOf(Mass.FromCarats(5.12), Mass.FromCarats(3.84), Twenty);
        SpecificGravity inGrams = HydrostaticWeighing.SpecificGravityOf(Mass.FromGrams(1.024), Mass.FromGrams(0.768), Twenty);
        Assert.Equal(inCarats.Value, inGrams.Value, 1e-12);
    }

    [Fact]
    public void Balance_resolution_gives_a_first_order_uncertainty()
    {
        // By hand: σ per weighing = 0.01 ct/√12 = 0.0028868 ct; σ_SG = √(3.84² + 5.12²)·σ / 1.28² = 6.4σ/1.6384
        // = 3.90625σ = 0.0112764 (4 °C, factor 1). Tolerance 1e-9: only rounding separates the two calculations.
        SpecificGravity sg = HydrostaticWeighing.SpecificGravityOf(Mass.FromCarats(5.12), Mass.FromCarats(3.84), Four, Mass.FromCarats(0.01));
        Assert.Equal(4, sg.Value, 1e-12);
        Assert.Equal(3.90625 * 0.01 / Math.Sqrt(12), sg.StandardUncertainty, 1e-9);
    }

    [Fact]
    public void Each_weights_own_uncertainty_is_propagated()
    {
        // Only the weight in water uncertain (0.003 ct): σ_SG = W_air·σ / (W_air − W_water)² = 5.12 × 0.003 / 1.6384 = 0.009375.
        SpecificGravity sg = HydrostaticWeighing.SpecificGravityOf(Mass.FromCarats(5.12), Mass.FromCarats(3.84, 0.003), Four);
        Assert.Equal(0.009375, sg.StandardUncertainty, 1e-12);
    }

    [Fact]
    public void A_small_stone_gives_a_poorer_specific_gravity_than_a_large_one()
    {
        // DOMAIN.md §5: σ_SG ≈ SG²·δ/W_air, so a stone ten times lighter has a ten times larger σ.
        var resolution = Mass.FromCarats(0.01);
        SpecificGravity large = HydrostaticWeighing.SpecificGravityOf(Mass.FromCarats(5.12), Mass.FromCarats(3.84), Four, resolution);
        SpecificGravity small = HydrostaticWeighing.SpecificGravityOf(Mass.FromCarats(0.512), Mass.FromCarats(0.384), Four, resolution);
        Assert.Equal(10 * large.StandardUncertainty, small.StandardUncertainty, 1e-9);
    }

    [Fact]
    public void The_expected_weight_in_water_inverts_the_calculation()
    {
        // 5.12 × (1 − 1/4) = 3.84 ct at 4 °C.
        Mass inWater = HydrostaticWeighing.ExpectedWeightInWater(Mass.FromCarats(5.12), new SpecificGravity(4), Four);
        Assert.Equal(3.84, inWater.Carats, 1e-12);
    }

    private static readonly Arbitrary<(double AirCarats, double Sg, double Celsius)> Weighings =
        (from air in Gen.Choose(5, 500_000) // 0.05 ct to 5000 ct, in 0.01 ct
         from sg in Gen.Choose(1_050, 20_000) // SG 1.05 to 20: above the water factor (≤ 1), so the stone sinks
         from t in Gen.Choose(0, 400) // 0 °C to 40 °C, in 0.1 °C
         select (air / 100.0, sg / 1000.0, t / 10.0)).ToArbitrary();

    [Property(MaxTest = 500)]
    public Property Specific_gravity_survives_a_round_trip_through_the_weight_in_water() =>
        Prop.ForAll(Weighings, w =>
        {
            var temperature = Temperature.FromCelsius(w.Celsius);
            Mass air = Mass.FromCarats(w.AirCarats);
            Mass water = HydrostaticWeighing.ExpectedWeightInWater(air, new SpecificGravity(w.Sg), temperature);
            double back = HydrostaticWeighing.SpecificGravityOf(air, water, temperature).Value;
            // Relative 1e-10: SG 20 loses about log10(SG) digits in W_air − W_water; 1e-10 still leaves a margin.
            return (Math.Abs(back - w.Sg) <= 1e-10 * w.Sg).Label($"{w} → {water} → {back}");
        });

    [Fact]
    public void A_weight_in_water_not_below_the_weight_in_air_is_refused_naming_both()
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() =>
            HydrostaticWeighing.SpecificGravityOf(Mass.FromCarats(5.12), Mass.FromCarats(5.2), Twenty));
        Assert.Equal("weight in water is 5.2 ct; allowed: 0 to below the weight in air 5.12 ct.", error.Message);
        var equal = Assert.Throws<QuantityOutOfRangeException>(() =>
            HydrostaticWeighing.SpecificGravityOf(Mass.FromCarats(5.12), Mass.FromCarats(5.12), Twenty));
        Assert.Equal("weight in water is 5.12 ct; allowed: 0 to below the weight in air 5.12 ct.", equal.Message);
    }

    [Fact]
    public void A_zero_weight_in_air_is_refused()
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() =>
            HydrostaticWeighing.SpecificGravityOf(Mass.FromCarats(0), Mass.FromCarats(0), Twenty));
        Assert.Equal("weight in air is 0 ct; allowed: above 0 ct.", error.Message);
    }

    [Fact]
    public void Cold_or_hot_water_is_refused()
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() =>
            HydrostaticWeighing.SpecificGravityOf(Mass.FromCarats(5.12), Mass.FromCarats(3.84), Temperature.FromCelsius(45)));
        Assert.Equal("water temperature is 45 °C; allowed: 0 to 40 °C.", error.Message);
    }

    [Fact]
    public void A_zero_balance_resolution_is_refused()
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() =>
            HydrostaticWeighing.SpecificGravityOf(Mass.FromCarats(5.12), Mass.FromCarats(3.84), Twenty, Mass.FromCarats(0)));
        Assert.Equal("balance resolution is 0 ct; allowed: above 0 ct.", error.Message);
    }

    [Fact]
    public void Nearly_equal_weights_give_an_impossible_specific_gravity_that_is_refused()
    {
        // 5.12 / 0.0001 = 51200: above the 25 any gem material reaches.
        var error = Assert.Throws<QuantityOutOfRangeException>(() =>
            HydrostaticWeighing.SpecificGravityOf(Mass.FromCarats(5.12), Mass.FromCarats(5.1199), Four));
        Assert.Equal("specific gravity", error.Quantity);
        Assert.EndsWith("; allowed: 0.5 to 25.", error.Message);
    }

    [Fact]
    public void A_stone_lighter_than_water_has_no_weight_in_water()
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() =>
            HydrostaticWeighing.ExpectedWeightInWater(Mass.FromCarats(5), new SpecificGravity(0.9), Four));
        Assert.Equal("specific gravity is 0.9; allowed: above 1, the relative density of water at 4 °C (a lighter stone floats).", error.Message);
    }
}
