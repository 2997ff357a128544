using System.Globalization;

namespace GemIndex.Core.Quantities;

/// <summary>
/// A plane angle with its standard uncertainty, stored in radians. Any finite angle is allowed here;
/// each calculation checks the range it needs. <c>default</c> is 0 rad with no uncertainty.
/// </summary>
public readonly record struct Angle
{
    private Angle(double radians, double uncertaintyRadians)
    {
        QuantityOutOfRangeException.ThrowIfOutside("angle", radians, -100 * Math.PI, 100 * Math.PI, "rad");
        QuantityOutOfRangeException.ThrowIfOutside("angle uncertainty", uncertaintyRadians, 0, Math.PI, "rad");
        Radians = radians;
        StandardUncertaintyRadians = uncertaintyRadians;
    }

    /// <summary>The angle in radians.</summary>
    public double Radians { get; }

    /// <summary>Standard uncertainty (k = 1) in radians.</summary>
    public double StandardUncertaintyRadians { get; }

    /// <summary>The angle in degrees.</summary>
    public double Degrees => Radians * 180.0 / Math.PI;

    /// <summary>Standard uncertainty (k = 1) in degrees.</summary>
    public double StandardUncertaintyDegrees => StandardUncertaintyRadians * 180.0 / Math.PI;

    /// <summary>An angle from degrees, with an optional standard uncertainty in degrees.</summary>
    public static Angle FromDegrees(double degrees, double standardUncertaintyDegrees = 0) =>
        new(degrees * Math.PI / 180.0, standardUncertaintyDegrees * Math.PI / 180.0);

    /// <summary>An angle from radians, with an optional standard uncertainty in radians.</summary>
    public static Angle FromRadians(double radians, double standardUncertaintyRadians = 0) =>
        new(radians, standardUncertaintyRadians);

    /// <inheritdoc />
    public override string ToString() => StandardUncertaintyRadians == 0
        ? Degrees.ToString("0.###", CultureInfo.InvariantCulture) + "°"
        : $"{Degrees.ToString("0.###", CultureInfo.InvariantCulture)}° ± {StandardUncertaintyDegrees.ToString("0.###", CultureInfo.InvariantCulture)}°";
}
