using GemIndex.Core.Quantities;

namespace GemIndex.Core.Optics.Refractometer;

/// <summary>
/// The geometry of a hemicylinder critical-angle refractometer: light leaves the glass radially, so the angle
/// seen is the internal angle at the glass–stone interface, and the shadow edge sits at the critical angle,
/// sin θ = n_stone / n_glass (Snell's law at 90° refraction; Hecht, <i>Optics</i>, ch. 4, from memory).
/// </summary>
public static class Hemicylinder
{
    /// <summary>
    /// Index of a stone from its shadow-edge angle θ: n = n_glass · sin θ.
    /// First-order uncertainty: σn² = (sin θ · σ_glass)² + (n_glass · cos θ · σθ)², σθ in radians.
    /// </summary>
    /// <exception cref="QuantityOutOfRangeException">
    /// θ outside asin(1/n_glass) to 90° (the angles of indices 1 to n_glass), or the resulting uncertainty above the
    /// index's limit.
    /// </exception>
    public static RefractiveIndex IndexFromEdgeAngle(RefractiveIndex glass, Angle edge)
    {
        double lowest = Math.Asin(RefractiveIndex.Minimum / glass.Value) * 180 / Math.PI;
        QuantityOutOfRangeException.ThrowIfOutside("shadow-edge angle", edge.Degrees, lowest, 90, "°");
        double sin = Math.Sin(edge.Radians), cos = Math.Cos(edge.Radians);
        double n = Math.Max(RefractiveIndex.Minimum, glass.Value * sin); // rounding at the bottom only: angle checked above
        return new RefractiveIndex(n, double.Hypot(sin * glass.StandardUncertainty, glass.Value * cos * edge.StandardUncertaintyRadians));
    }

    /// <summary>
    /// The shadow-edge angle of a stone: θ = asin(n_stone / n_glass) (the inverse of <see cref="IndexFromEdgeAngle"/>).
    /// First-order uncertainty: σθ² = [(σ_stone / n_glass)² + (n_stone σ_glass / n_glass²)²] / cos² θ; where first order
    /// gives no bound (θ = 90°) it is reported as 90°.
    /// </summary>
    /// <exception cref="QuantityOutOfRangeException">The stone's index is above the glass's: no edge forms.</exception>
    public static Angle EdgeAngleFor(RefractiveIndex glass, RefractiveIndex stone)
    {
        QuantityOutOfRangeException.ThrowIfOutside("stone refractive index", stone.Value, RefractiveIndex.Minimum, glass.Value);
        double ratio = stone.Value / glass.Value;
        double theta = Math.Asin(ratio);
        double dRatio = double.Hypot(stone.StandardUncertainty / glass.Value, stone.Value * glass.StandardUncertainty / (glass.Value * glass.Value));
        double sigma = dRatio == 0 ? 0 : dRatio / Math.Cos(theta);
        return Angle.FromRadians(theta, double.IsFinite(sigma) && sigma < Math.PI / 2 ? sigma : Math.PI / 2);
    }
}
