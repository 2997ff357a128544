using GemIndex.Core.Quantities;

namespace GemIndex.Core.Optics;

/// <summary>
/// The Brewster (polarising) angle, where p-polarised light is not reflected: tan θB = n₂ / n₁
/// (Hecht, <i>Optics</i>, ch. 4, from memory), and the index of a stone from a measured Brewster angle.
/// </summary>
public static class BrewsterAngle
{
    /// <summary>
    /// θB = atan(n_stone / n_surrounding). First-order uncertainty:
    /// σθB² = [(σ_stone / n₁)² + (n₂ σ_surrounding / n₁²)²] / (1 + (n₂/n₁)²)².
    /// </summary>
    public static Angle Of(RefractiveIndex surrounding, RefractiveIndex stone)
    {
        double ratio = stone.Value / surrounding.Value;
        double dRatio = double.Hypot(stone.StandardUncertainty / surrounding.Value,
            stone.Value * surrounding.StandardUncertainty / (surrounding.Value * surrounding.Value));
        return Angle.FromRadians(Math.Atan(ratio), dRatio / (1 + ratio * ratio));
    }

    /// <summary>
    /// The stone's index from its Brewster angle measured in a medium of index n₁: n₂ = n₁ tan θB.
    /// First-order uncertainty: σn₂² = (tan θB · σn₁)² + (n₁ σθ / cos² θB)², σθ in radians.
    /// </summary>
    /// <exception cref="QuantityOutOfRangeException">
    /// The angle is outside atan(1/n₁) to atan(4/n₁), the angles of stone indices 1 to 4; or the resulting
    /// uncertainty is above the index's limit.
    /// </exception>
    public static RefractiveIndex IndexFrom(Angle brewster, RefractiveIndex surrounding)
    {
        double n1 = surrounding.Value;
        QuantityOutOfRangeException.ThrowIfOutside("Brewster angle", brewster.Degrees,
            Math.Atan(RefractiveIndex.Minimum / n1) * 180 / Math.PI, Math.Atan(RefractiveIndex.Maximum / n1) * 180 / Math.PI, "°");
        double tan = Math.Tan(brewster.Radians);
        double n2 = Math.Clamp(n1 * tan, RefractiveIndex.Minimum, RefractiveIndex.Maximum); // rounding only: angle checked above
        double cos = Math.Cos(brewster.Radians);
        double sigma = double.Hypot(tan * surrounding.StandardUncertainty, n1 * brewster.StandardUncertaintyRadians / (cos * cos));
        return new RefractiveIndex(n2, sigma);
    }
}
