using System.Globalization;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Gravity;

/// <summary>
/// The density of air-free pure water at standard pressure, in kg/m³, from Tanaka et al. (2001),
/// Metrologia 38, 301–309. <c>default</c> is not a density (0 kg/m³) and must not be used.
/// </summary>
public readonly record struct WaterDensity
{
    /// <summary>Lowest water temperature accepted, °C: the low end of the formula's range.</summary>
    public const double MinimumCelsius = 0;

    /// <summary>Highest water temperature accepted, °C: the high end of the formula's range.</summary>
    public const double MaximumCelsius = 40;

    // Tanaka et al. (2001), Metrologia 38, 301–309, as given in DOMAIN.md §5.
    private const double A1 = -3.983035;  // °C
    private const double A2 = 301.797;    // °C
    private const double A3 = 522528.9;   // °C²
    private const double A4 = 69.34881;   // °C
    private const double A5 = 999.974950; // kg/m³

    private WaterDensity(Temperature temperature, double kilogramsPerCubicMetre)
    {
        Temperature = temperature;
        KilogramsPerCubicMetre = kilogramsPerCubicMetre;
    }

    /// <summary>The water temperature this density belongs to.</summary>
    public Temperature Temperature { get; }

    /// <summary>The density in kg/m³.</summary>
    public double KilogramsPerCubicMetre { get; }

    /// <summary>
    /// The density relative to water at 4 °C (ρ(t)/ρ(4 °C)): the factor that turns a hydrostatic ratio
    /// measured in water at t into a specific gravity.
    /// </summary>
    public double RelativeToFourDegrees => KilogramsPerCubicMetre / At(Temperature.FromCelsius(4)).KilogramsPerCubicMetre;

    /// <summary>
    /// ρ(t) = a5 [1 − (t + a1)²(t + a2) / (a3 (t + a4))] with a1 = −3.983035 °C, a2 = 301.797 °C,
    /// a3 = 522528.9 °C², a4 = 69.34881 °C, a5 = 999.974950 kg/m³ (Tanaka et al. 2001, Metrologia 38,
    /// 301–309): 998.2067 kg/m³ at 20 °C, 999.9750 at 4 °C. Valid 0 °C to 40 °C, the range the formula was
    /// fitted over. The temperature carries no uncertainty, so none is propagated (dρ/dt is about
    /// −0.21 kg/m³ per °C at 20 °C, i.e. 2·10⁻⁴ of the density per °C).
    /// </summary>
    /// <exception cref="QuantityOutOfRangeException">The temperature is outside 0 °C to 40 °C.</exception>
    public static WaterDensity At(Temperature temperature)
    {
        QuantityOutOfRangeException.ThrowIfOutside("water temperature", temperature.Celsius, MinimumCelsius, MaximumCelsius, "°C");
        double t = temperature.Celsius;
        double density = A5 * (1 - (t + A1) * (t + A1) * (t + A2) / (A3 * (t + A4)));
        return new WaterDensity(temperature, density);
    }

    /// <inheritdoc />
    public override string ToString() =>
        KilogramsPerCubicMetre.ToString("0.0000", CultureInfo.InvariantCulture) + " kg/m³ at " + Temperature;
}
