using GemIndex.Core.Quantities;

namespace GemIndex.Core.Optics;

/// <summary>
/// Snell's law of refraction, n₁ sin θ₁ = n₂ sin θ₂ (Hecht, <i>Optics</i>, ch. 4, from memory), both ways.
/// Angles are measured from the interface normal, 0°–90°.
/// </summary>
public static class Snell
{
    /// <summary>
    /// The refraction angle for light going from medium <paramref name="from"/> into medium <paramref name="to"/>:
    /// sin θ₂ = n₁ sin θ₁ / n₂. When n₁ sin θ₁ / n₂ &gt; 1 the light is totally reflected
    /// (<see cref="Refraction.TotallyReflected"/>), a physical outcome.
    /// First-order uncertainty (inputs independent), with s = sin θ₂:
    /// σθ₂² = [(sin θ₁/n₂)² σn₁² + (s/n₂)² σn₂² + (n₁ cos θ₁/n₂)² σθ₁²] / cos² θ₂.
    /// At grazing emergence (cos θ₂ = 0) first order gives no bound, and the uncertainty is reported as
    /// 90° (the whole range), as it also is whenever the first-order value exceeds 90°.
    /// </summary>
    /// <param name="from">Index of the medium the light comes from.</param>
    /// <param name="to">Index of the medium the light enters.</param>
    /// <param name="incidence">Angle of incidence, 0°–90°.</param>
    /// <exception cref="QuantityOutOfRangeException">The incidence angle is outside 0°–90°.</exception>
    public static Refraction Refract(RefractiveIndex from, RefractiveIndex to, Angle incidence)
    {
        QuantityOutOfRangeException.ThrowIfOutside("angle of incidence", incidence.Degrees, 0, 90, "°");
        double s = from.Value * Math.Sin(incidence.Radians) / to.Value;
        if (s > 1) return Refraction.TotallyReflected;
        double theta = Math.Asin(s);
        double sigma = Spread(Math.Cos(theta),
            Math.Sin(incidence.Radians) / to.Value * from.StandardUncertainty,
            s / to.Value * to.StandardUncertainty,
            from.Value * Math.Cos(incidence.Radians) / to.Value * incidence.StandardUncertaintyRadians);
        return Refraction.Refracted(Angle.FromRadians(theta, sigma));
    }

    /// <summary>
    /// The angle of incidence in <paramref name="from"/> that gives the refraction angle <paramref name="refraction"/>
    /// in <paramref name="to"/>: sin θ₁ = n₂ sin θ₂ / n₁ (the inverse of <see cref="Refract"/>).
    /// First-order uncertainty: σθ₁² = [(s/n₁)² σn₁² + (sin θ₂/n₁)² σn₂² + (n₂ cos θ₂/n₁)² σθ₂²] / cos² θ₁,
    /// s = sin θ₁, reported as 90° where first order gives no bound (as in <see cref="Refract"/>).
    /// </summary>
    /// <param name="from">Index of the medium the light comes from.</param>
    /// <param name="to">Index of the medium the light enters.</param>
    /// <param name="refraction">The refraction angle in <paramref name="to"/>, 0° up to asin(n₁/n₂) (90° when n₂ ≤ n₁).</param>
    /// <exception cref="QuantityOutOfRangeException">
    /// The refraction angle is outside 0°–90°, or above asin(n₁/n₂), which no incidence can produce.
    /// </exception>
    public static Angle IncidenceFor(RefractiveIndex from, RefractiveIndex to, Angle refraction)
    {
        double largest = to.Value <= from.Value ? 90 : Math.Asin(from.Value / to.Value) * 180 / Math.PI;
        QuantityOutOfRangeException.ThrowIfOutside("refraction angle", refraction.Degrees, 0, largest, "°");
        double s = Math.Min(1, to.Value * Math.Sin(refraction.Radians) / from.Value); // rounding only: checked above
        double theta = Math.Asin(s);
        double sigma = Spread(Math.Cos(theta),
            s / from.Value * from.StandardUncertainty,
            Math.Sin(refraction.Radians) / from.Value * to.StandardUncertainty,
            to.Value * Math.Cos(refraction.Radians) / from.Value * refraction.StandardUncertaintyRadians);
        return Angle.FromRadians(theta, sigma);
    }

    // Root-sum-square of the sine's spread, divided by cos θ (d asin s = ds / cos θ); unbounded → 90°.
    private static double Spread(double cosTheta, double a, double b, double c)
    {
        double ds = Math.Sqrt(a * a + b * b + c * c);
        if (ds == 0) return 0;
        double sigma = ds / cosTheta;
        return double.IsFinite(sigma) && sigma < Math.PI / 2 ? sigma : Math.PI / 2;
    }
}
