using System.Globalization;

namespace GemIndex.Core.Quantities;

/// <summary>
/// A temperature in degrees Celsius, −50 °C to 150 °C (any bench, with room to spare).
/// <c>default</c> is 0 °C.
/// </summary>
public readonly record struct Temperature
{
    private Temperature(double celsius)
    {
        QuantityOutOfRangeException.ThrowIfOutside("temperature", celsius, -50, 150, "°C");
        Celsius = celsius;
    }

    /// <summary>The temperature in degrees Celsius.</summary>
    public double Celsius { get; }

    /// <summary>A temperature from degrees Celsius.</summary>
    public static Temperature FromCelsius(double celsius) => new(celsius);

    /// <inheritdoc />
    public override string ToString() => Celsius.ToString("0.##", CultureInfo.InvariantCulture) + " °C";
}
