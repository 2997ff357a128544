namespace GemIndex.Bench.Independent;

/// <summary>
/// Density of air-free water relative to its maximum (about 4 °C), by Tanaka et al. (2001), Metrologia 38, 301–309
/// (coefficients as given in DOMAIN.md §5); the simulator's own copy, so that a hydrostatic reading is simulated
/// independently of the engine's conversion.
/// </summary>
internal static class WaterDensity
{
    private const double A1 = -3.983035, A2 = 301.797, A3 = 522528.9, A4 = 69.34881, A5 = 999.974950;

    /// <summary>ρ(t) in kg/m³.</summary>
    public static double KilogramsPerCubicMetre(double celsius) =>
        A5 * (1 - (celsius + A1) * (celsius + A1) * (celsius + A2) / (A3 * (celsius + A4)));

    /// <summary>ρ(t)/ρ(4 °C), the factor that turns a weight ratio into an SG.</summary>
    public static double RelativeToFourDegrees(double celsius) => KilogramsPerCubicMetre(celsius) / KilogramsPerCubicMetre(4);
}
