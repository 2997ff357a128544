using System.Globalization;

namespace GemIndex.Core.Optics;

/// <summary>
/// Fractions of the incident power reflected at an interface, each 0–1: for light polarised perpendicular (s)
/// and parallel (p) to the plane of incidence, and for unpolarised light, the mean (Rs + Rp)/2.
/// Made only by <see cref="Fresnel"/>; <c>default</c> is no reflection.
/// </summary>
public readonly record struct Reflectance
{
    internal Reflectance(double s, double p)
    {
        S = s;
        P = p;
    }

    /// <summary>Reflectance for s-polarised light (electric field perpendicular to the plane of incidence).</summary>
    public double S { get; }

    /// <summary>Reflectance for p-polarised light (electric field in the plane of incidence).</summary>
    public double P { get; }

    /// <summary>Reflectance for unpolarised light: (Rs + Rp) / 2.</summary>
    public double Unpolarised => (S + P) / 2;

    /// <inheritdoc />
    public override string ToString() => string.Create(CultureInfo.InvariantCulture,
        $"Rs {S:0.0000}, Rp {P:0.0000}, unpolarised {Unpolarised:0.0000}");
}
