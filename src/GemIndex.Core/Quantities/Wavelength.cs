using System.Globalization;

namespace GemIndex.Core.Quantities;

/// <summary>
/// A vacuum wavelength of light, stored in nanometres, 200 nm to 5000 nm (ultraviolet to mid infrared,
/// wider than any bench instrument). <c>default</c> is not a valid wavelength and is rejected by calculations.
/// </summary>
public readonly record struct Wavelength
{
    /// <summary>Shortest wavelength accepted, nm.</summary>
    public const double MinimumNanometres = 200;

    /// <summary>Longest wavelength accepted, nm.</summary>
    public const double MaximumNanometres = 5000;

    private Wavelength(double nanometres)
    {
        QuantityOutOfRangeException.ThrowIfOutside("wavelength", nanometres, MinimumNanometres, MaximumNanometres, "nm");
        Nanometres = nanometres;
    }

    /// <summary>The wavelength in nanometres.</summary>
    public double Nanometres { get; }

    /// <summary>The wavelength in micrometres (the unit of Sellmeier and Cauchy coefficients).</summary>
    public double Micrometres => Nanometres / 1000.0;

    /// <summary>A wavelength from nanometres.</summary>
    public static Wavelength FromNanometres(double nanometres) => new(nanometres);

    /// <summary>A wavelength from micrometres.</summary>
    public static Wavelength FromMicrometres(double micrometres) => new(micrometres * 1000.0);

    /// <inheritdoc />
    public override string ToString() => Nanometres.ToString("0.##", CultureInfo.InvariantCulture) + " nm";
}
