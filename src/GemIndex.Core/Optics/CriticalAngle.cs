using GemIndex.Core.Quantities;

namespace GemIndex.Core.Optics;

/// <summary>
/// The critical angle between a denser and a rarer medium: sin θc = n_rarer / n_denser (Snell's law with a
/// 90° refraction angle; Hecht, <i>Optics</i>, ch. 4, from memory). Past it, light from the denser side is totally reflected.
/// </summary>
public static class CriticalAngle
{
    /// <summary>
    /// The critical angle for light inside <paramref name="denser"/> meeting <paramref name="rarer"/>, or
    /// <c>null</c> when there is none (n_denser ≤ n_rarer: light always passes; a physical outcome, not an error).
    /// First-order uncertainty (independent indices):
    /// σθc² = [(σ_rarer / n_denser)² + (n_rarer σ_denser / n_denser²)²] / cos² θc.
    /// </summary>
    public static Angle? Between(RefractiveIndex denser, RefractiveIndex rarer) =>
        TryBetween(denser, rarer, out Angle angle) ? angle : null;

    /// <summary>As <see cref="Between"/>, in Try form: false when n_denser ≤ n_rarer.</summary>
    public static bool TryBetween(RefractiveIndex denser, RefractiveIndex rarer, out Angle angle)
    {
        angle = default;
        if (!(denser.Value > rarer.Value)) return false;
        double ratio = rarer.Value / denser.Value;
        double theta = Math.Asin(ratio);
        double dRatio = double.Hypot(rarer.StandardUncertainty / denser.Value,
            rarer.Value * denser.StandardUncertainty / (denser.Value * denser.Value));
        double sigma = dRatio / Math.Cos(theta);
        angle = Angle.FromRadians(theta, double.IsFinite(sigma) && sigma < Math.PI / 2 ? sigma : Math.PI / 2);
        return true;
    }
}
