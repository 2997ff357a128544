using GemIndex.Core.Quantities;

namespace GemIndex.Core.Optics;

/// <summary>
/// Fresnel reflectance at a smooth interface between two absorption-free media (Hecht, <i>Optics</i>, ch. 4, from memory),
/// and the index of a stone estimated back from its normal-incidence reflectance.
/// </summary>
public static class Fresnel
{
    /// <summary>
    /// Reflectance for light in medium <paramref name="from"/> meeting medium <paramref name="to"/> at
    /// <paramref name="incidence"/> (0°–90°). With cos θt = √(1 − (n₁ sin θᵢ / n₂)²):
    /// rs = (n₁ cos θᵢ − n₂ cos θt)/(n₁ cos θᵢ + n₂ cos θt), rp = (n₂ cos θᵢ − n₁ cos θt)/(n₂ cos θᵢ + n₁ cos θt),
    /// Rs = rs², Rp = rp². Past the critical angle (total internal reflection) Rs = Rp = 1.
    /// Index uncertainties are not propagated (reflectance is a model value here).
    /// </summary>
    /// <exception cref="QuantityOutOfRangeException">The incidence angle is outside 0°–90°.</exception>
    public static Reflectance At(RefractiveIndex from, RefractiveIndex to, Angle incidence)
    {
        QuantityOutOfRangeException.ThrowIfOutside("angle of incidence", incidence.Degrees, 0, 90, "°");
        double n1 = from.Value, n2 = to.Value;
        double sinT = n1 * Math.Sin(incidence.Radians) / n2;
        if (sinT >= 1) return new Reflectance(1, 1);
        double cosI = Math.Cos(incidence.Radians);
        double cosT = Math.Sqrt(1 - sinT * sinT);
        double rs = (n1 * cosI - n2 * cosT) / (n1 * cosI + n2 * cosT);
        double rp = (n2 * cosI - n1 * cosT) / (n2 * cosI + n1 * cosT);
        return new Reflectance(rs * rs, rp * rp);
    }

    /// <summary>
    /// Normal-incidence reflectance R = ((n₁ − n₂)/(n₁ + n₂))² (Hecht, <i>Optics</i>, ch. 4, from memory), the same for all
    /// polarisations.
    /// </summary>
    public static double AtNormalIncidence(RefractiveIndex surrounding, RefractiveIndex stone) =>
        NormalReflectance(surrounding.Value, stone.Value);

    /// <summary>
    /// The index of a stone from its normal-incidence reflectance R in a surrounding medium of index m,
    /// taking the root above the medium: with r = √R, n = m (1 + r)/(1 − r).
    /// First-order uncertainty: σn² = (m σR / (r (1 − r)²))² + ((1 + r)/(1 − r) · σm)², σR a standard uncertainty
    /// of R; it grows without bound as R → 0, so a tiny reflectance with a real uncertainty is refused by the
    /// index's own uncertainty limit.
    /// </summary>
    /// <param name="reflectance">Measured reflectance, above 0 and at most that of an index-4 stone in the medium.</param>
    /// <param name="surrounding">Index of the surrounding medium (air 1.000).</param>
    /// <param name="reflectanceUncertainty">Standard uncertainty of the reflectance, 0–1.</param>
    /// <exception cref="QuantityOutOfRangeException">
    /// Reflectance not above 0 or above ((4 − m)/(4 + m))²; its uncertainty outside 0–1; or the resulting
    /// index uncertainty above the index's limit.
    /// </exception>
    public static RefractiveIndex IndexFromNormalReflectance(double reflectance, RefractiveIndex surrounding,
        double reflectanceUncertainty = 0)
    {
        double m = surrounding.Value;
        double highest = NormalReflectance(m, RefractiveIndex.Maximum); // same arithmetic as AtNormalIncidence, so its top value passes
        QuantityOutOfRangeException.ThrowIfNotAbove("normal-incidence reflectance", reflectance, 0);
        QuantityOutOfRangeException.ThrowIfOutside("normal-incidence reflectance", reflectance, 0, highest);
        QuantityOutOfRangeException.ThrowIfOutside("reflectance uncertainty", reflectanceUncertainty, 0, 1);
        double r = Math.Sqrt(reflectance);
        double n = Math.Min(RefractiveIndex.Maximum, m * (1 + r) / (1 - r)); // rounding at the top only: R checked above
        double sigma = double.Hypot(m * reflectanceUncertainty / (r * (1 - r) * (1 - r)),
            (1 + r) / (1 - r) * surrounding.StandardUncertainty);
        return new RefractiveIndex(n, sigma);
    }

    private static double NormalReflectance(double n1, double n2)
    {
        double r = (n1 - n2) / (n1 + n2);
        return r * r;
    }
}
