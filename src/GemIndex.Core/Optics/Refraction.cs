using GemIndex.Core.Quantities;

namespace GemIndex.Core.Optics;

/// <summary>
/// The outcome of light meeting an interface: either refracted at an angle (from the normal, 0°–90°),
/// or totally reflected (a physical outcome past the critical angle, not an error).
/// <c>default</c> is a ray refracted along the normal (0°) with no uncertainty.
/// </summary>
public readonly record struct Refraction
{
    private Refraction(bool totallyReflected, Angle angle)
    {
        IsTotallyReflected = totallyReflected;
        RefractedAngle = angle;
    }

    /// <summary>Light is totally reflected: nothing is transmitted.</summary>
    public static Refraction TotallyReflected { get; } = new(true, default);

    /// <summary>True when nothing is transmitted (total internal reflection).</summary>
    public bool IsTotallyReflected { get; }

    /// <summary>The refraction angle from the normal; 0° (meaningless) when totally reflected.</summary>
    public Angle RefractedAngle { get; }

    /// <summary>A refracted ray at <paramref name="angle"/> from the normal.</summary>
    /// <exception cref="QuantityOutOfRangeException">The angle is outside 0°–90°.</exception>
    public static Refraction Refracted(Angle angle)
    {
        QuantityOutOfRangeException.ThrowIfOutside("refraction angle", angle.Degrees, 0, 90, "°");
        return new Refraction(false, angle);
    }

    /// <summary>The refraction angle, or false when the light is totally reflected.</summary>
    public bool TryGetAngle(out Angle angle)
    {
        angle = RefractedAngle;
        return !IsTotallyReflected;
    }

    /// <inheritdoc />
    public override string ToString() => IsTotallyReflected ? "totally reflected" : $"refracted at {RefractedAngle}";
}
