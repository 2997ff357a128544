namespace GemIndex.Bench.Independent;

/// <summary>
/// The two shadow edges a critical-angle refractometer shows for light travelling along a facet in direction s: the
/// semi-axes of the central section of the indicatrix perpendicular to s, which contains the facet normal N
/// (DOMAIN.md §6b). With B = [N, N × s] and M = diag(nx⁻², ny⁻², nz⁻²), the edges are λ^(−1/2) for the eigenvalues λ
/// of BᵀMB. Written here from the geometry, not taken from the engine, so the simulator does not share its code.
/// </summary>
internal static class IndicatrixSection
{
    /// <summary>The (low, high) edges; nx, ny, nz are the semi-axes along x, y, z; normal and direction are unit and orthogonal.</summary>
    public static (double Low, double High) Edges(double nx, double ny, double nz, (double X, double Y, double Z) normal, (double X, double Y, double Z) direction)
    {
        var n = normal;
        var w = Cross(n, direction);
        double mx = 1 / (nx * nx), my = 1 / (ny * ny), mz = 1 / (nz * nz);
        double a = mx * n.X * n.X + my * n.Y * n.Y + mz * n.Z * n.Z;
        double b = mx * n.X * w.X + my * n.Y * w.Y + mz * n.Z * w.Z;
        double c = mx * w.X * w.X + my * w.Y * w.Y + mz * w.Z * w.Z;
        double mean = (a + c) / 2, radius = Math.Sqrt(Math.Max(0, (a - c) * (a - c) / 4 + b * b));
        double first = 1 / Math.Sqrt(mean + radius), second = 1 / Math.Sqrt(mean - radius);
        return (Math.Min(first, second), Math.Max(first, second));
    }

    public static (double X, double Y, double Z) Cross((double X, double Y, double Z) a, (double X, double Y, double Z) b) =>
        (a.Y * b.Z - a.Z * b.Y, a.Z * b.X - a.X * b.Z, a.X * b.Y - a.Y * b.X);

    public static (double X, double Y, double Z) Unit((double X, double Y, double Z) a)
    {
        double length = Math.Sqrt(a.X * a.X + a.Y * a.Y + a.Z * a.Z);
        return (a.X / length, a.Y / length, a.Z / length);
    }
}
