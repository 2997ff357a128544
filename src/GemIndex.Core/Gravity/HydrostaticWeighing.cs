using System.Globalization;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Gravity;

/// <summary>
/// Specific gravity by hydrostatic weighing: the stone is weighed in air (W_air) and suspended in water
/// (W_water) at temperature t (DOMAIN.md §5; Archimedes' principle).
/// </summary>
public static class HydrostaticWeighing
{
    /// <summary>
    /// SG = k · W_air / (W_air − W_water) with k = ρ_water(t)/ρ_water(4 °C) (<see cref="WaterDensity"/>,
    /// Tanaka et al. 2001). Air buoyancy is neglected (it shifts SG by at most about 1.2·10⁻³ of its value: air ~1.2 kg/m³ against water ~1000).
    /// Uncertainty, first order, with independent weighings: σ_SG = k·√((W_water·σ_air)² + (W_air·σ_water)²)
    /// / (W_air − W_water)², σ_air and σ_water being each <see cref="Mass"/>'s own standard uncertainty.
    /// The weights may be given in any unit of <see cref="Mass"/>; errors quote them in carats.
    /// </summary>
    /// <exception cref="QuantityOutOfRangeException">
    /// Weight in air not above 0; weight in water not below the weight in air; water temperature outside
    /// 0–40 °C; or a result outside what <see cref="SpecificGravity"/> accepts (SG 0.5–25, σ up to 5),
    /// as when the two weights are almost equal.
    /// </exception>
    public static SpecificGravity SpecificGravityOf(Mass weightInAir, Mass weightInWater, Temperature water)
    {
        ThrowIfNotWeighable(weightInAir, weightInWater);
        double k = WaterDensity.At(water).RelativeToFourDegrees;
        double air = weightInAir.Grams, inWater = weightInWater.Grams;
        double loss = air - inWater;
        double value = k * air / loss;
        double sigma = k * double.Hypot(inWater * weightInAir.StandardUncertaintyGrams, air * weightInWater.StandardUncertaintyGrams) / (loss * loss);
        return new SpecificGravity(value, sigma);
    }

    /// <summary>
    /// As <see cref="SpecificGravityOf(Mass, Mass, Temperature)"/>, for a balance that reads to
    /// <paramref name="balanceResolution"/> δ: rounding to δ adds a standard uncertainty δ/√12 to each
    /// weighing (a rectangular error distribution one step wide; JCGM 100:2008 (GUM), from memory), combined in
    /// quadrature with each weight's own uncertainty. Since σ_SG ≈ SG²·δ/(√12·W_air)·√(1 + (1 − 1/SG)²),
    /// small stones give poor SG.
    /// </summary>
    /// <exception cref="QuantityOutOfRangeException">
    /// The resolution is not above 0, or as for <see cref="SpecificGravityOf(Mass, Mass, Temperature)"/>.
    /// </exception>
    public static SpecificGravity SpecificGravityOf(Mass weightInAir, Mass weightInWater, Temperature water, Mass balanceResolution)
    {
        QuantityOutOfRangeException.ThrowIfNotAbove("balance resolution", balanceResolution.Carats, 0, "ct");
        double rounding = balanceResolution.Grams / Math.Sqrt(12);
        return SpecificGravityOf(WithRounding(weightInAir, rounding), WithRounding(weightInWater, rounding), water);
    }

    /// <summary>
    /// The inverse: the weight in water of a stone of <paramref name="specificGravity"/> weighing
    /// <paramref name="weightInAir"/>, W_water = W_air·(1 − k/SG) with k as above. Exact, no uncertainty.
    /// </summary>
    /// <exception cref="QuantityOutOfRangeException">
    /// Weight in air not above 0; water temperature outside 0–40 °C; or SG not above k (such a stone floats).
    /// </exception>
    public static Mass ExpectedWeightInWater(Mass weightInAir, SpecificGravity specificGravity, Temperature water)
    {
        QuantityOutOfRangeException.ThrowIfNotAbove("weight in air", weightInAir.Carats, 0, "ct");
        double k = WaterDensity.At(water).RelativeToFourDegrees;
        if (!(specificGravity.Value > k))
            throw new QuantityOutOfRangeException("specific gravity", specificGravity.Value,
                FormattableString.Invariant($"above {k:G6}, the relative density of water at {water} (a lighter stone floats)"));
        return Mass.FromGrams(weightInAir.Grams * (1 - k / specificGravity.Value));
    }

    private static void ThrowIfNotWeighable(Mass weightInAir, Mass weightInWater)
    {
        QuantityOutOfRangeException.ThrowIfNotAbove("weight in air", weightInAir.Carats, 0, "ct");
        if (!(weightInWater.Grams < weightInAir.Grams))
            throw new QuantityOutOfRangeException("weight in water", weightInWater.Carats,
                "0 to below the weight in air " + weightInAir.Carats.ToString("G6", CultureInfo.InvariantCulture) + " ct", "ct");
    }

    private static Mass WithRounding(Mass weight, double roundingGrams) =>
        Mass.FromGrams(weight.Grams, double.Hypot(weight.StandardUncertaintyGrams, roundingGrams));
}
