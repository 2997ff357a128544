namespace GemIndex.Core.Optics.Indicatrix;

/// <summary>
/// A fixed, quasi-random set of facet orientations over which a rotation series' likelihood is averaged
/// (DOMAIN.md §6b): facet normals N spread evenly by area over one octant of the sphere (the indicatrix is
/// symmetric under each axis' reflection, so one octant stands for all eight), a starting azimuth φ0 of the
/// direction of travel over [0°, 180°), and the sense of rotation (a reflection reverses it, so both senses are
/// kept). The points are the Halton sequence in bases 2, 3, 5 and 7 (Halton 1960, Numer. Math. 2, 84–90): the cosine
/// of N's polar angle (uniform, which is uniform by area: Archimedes' hat-box theorem), N's azimuth over 0°–90°,
/// φ0, and the sense. The same set is reused for every material, so likelihoods differ by the materials only.
/// Immutable and shared.
/// </summary>
internal static class FacetOrientationSet
{
    /// <summary>
    /// How many orientations: 128 (a judgement between speed and the quadrature's error; docs/ranking.md §1, where the
    /// error measured against brute-force Monte Carlo is given).
    /// </summary>
    public const int Count = 128;

    /// <summary>The orientations (normal, travel basis at φ0 = 0, starting azimuth, sense).</summary>
    public static readonly FacetOrientation[] Points = Build(Count);

    private static FacetOrientation[] Build(int count)
    {
        var points = new FacetOrientation[count];
        for (int i = 0; i < count; i++)
        {
            int index = i + 1; // the Halton sequence's first point (0, 0, …) sits on the octant's edge
            double z = Halton(index, 2), azimuth = Halton(index, 3) * Math.PI / 2;
            double start = Halton(index, 5) * Math.PI;
            int sense = Halton(index, 7) < 0.5 ? 1 : -1;
            double r = Math.Sqrt(1 - z * z);
            var normal = new Direction(r * Math.Cos(azimuth), r * Math.Sin(azimuth), z);
            var u = Indicatrix.ReferenceTravelDirection(normal);
            var v = Direction.Cross(normal, u);
            points[i] = new FacetOrientation(normal, u, v, Math.Cos(start), Math.Sin(start), sense);
        }
        return points;
    }

    /// <summary>The radical inverse of <paramref name="index"/> in <paramref name="radix"/>: the Halton sequence's coordinate.</summary>
    internal static double Halton(int index, int radix)
    {
        double result = 0, f = 1.0 / radix;
        for (int i = index; i > 0; i /= radix, f /= radix) result += f * (i % radix);
        return result;
    }
}
