using GemIndex.Core.Quantities;

namespace GemIndex.Core.Optics;

/// <summary>
/// The minimum-deviation method: a prism of apex angle A (two facets of a cut stone serve) deviates light
/// least, by Dmin, when it passes symmetrically; then n = sin((A + Dmin)/2) / sin(A/2)
/// (Hecht, <i>Optics</i>, ch. 5, from memory). The index is relative to the surrounding medium (air for bench work).
/// </summary>
public static class MinimumDeviation
{
    /// <summary>
    /// The index from apex angle A and minimum deviation D: n = sin((A + D)/2) / sin(A/2).
    /// First-order uncertainty (A and D independent, radians):
    /// ∂n/∂D = cos((A + D)/2) / (2 sin(A/2)); ∂n/∂A = −sin(D/2) / (2 sin²(A/2));
    /// σn² = (∂n/∂A σA)² + (∂n/∂D σD)².
    /// </summary>
    /// <exception cref="QuantityOutOfRangeException">
    /// A outside (0°, 180°); D outside 0° to Dmax(A) = 2 asin(min(1, 4 sin(A/2))) − A, the range giving a
    /// physical index 1–4; or the resulting uncertainty above the index's limit.
    /// </exception>
    public static RefractiveIndex IndexFrom(Angle apex, Angle minimumDeviation)
    {
        CheckApex(apex);
        double a = apex.Radians, d = minimumDeviation.Radians;
        double largest = LargestDeviation(a);
        QuantityOutOfRangeException.ThrowIfOutside("minimum deviation", minimumDeviation.Degrees, 0, largest * 180 / Math.PI, "°");
        double sinHalfA = Math.Sin(a / 2);
        double n = Math.Clamp(Math.Sin((a + d) / 2) / sinHalfA, RefractiveIndex.Minimum, RefractiveIndex.Maximum); // rounding only
        double byD = Math.Cos((a + d) / 2) / (2 * sinHalfA);
        double byA = -Math.Sin(d / 2) / (2 * sinHalfA * sinHalfA);
        return new RefractiveIndex(n, double.Hypot(byA * apex.StandardUncertaintyRadians, byD * minimumDeviation.StandardUncertaintyRadians));
    }

    /// <summary>
    /// The minimum deviation a prism of apex A and index n gives: D = 2 asin(n sin(A/2)) − A (the inverse of
    /// <see cref="IndexFrom"/>). Uncertainties are not propagated (a prediction for planning a measurement).
    /// </summary>
    /// <exception cref="QuantityOutOfRangeException">
    /// A outside (0°, 180°), or the prism too steep for this index (n sin(A/2) &gt; 1: no ray gets through).
    /// </exception>
    public static Angle DeviationFor(Angle apex, RefractiveIndex index)
    {
        CheckApex(apex);
        double a = apex.Radians;
        double steepest = 2 * Math.Asin(1 / index.Value) * 180 / Math.PI;
        QuantityOutOfRangeException.ThrowIfOutside("prism apex angle", apex.Degrees, 0, steepest, "°");
        return Angle.FromRadians(2 * Math.Asin(index.Value * Math.Sin(a / 2)) - a);
    }

    private static void CheckApex(Angle apex)
    {
        if (!(apex.Degrees > 0 && apex.Degrees < 180))
            throw new QuantityOutOfRangeException("prism apex angle", apex.Degrees, "above 0 and below 180 °", "°");
    }

    private static double LargestDeviation(double a) =>
        2 * Math.Asin(Math.Min(1, RefractiveIndex.Maximum * Math.Sin(a / 2))) - a;
}
