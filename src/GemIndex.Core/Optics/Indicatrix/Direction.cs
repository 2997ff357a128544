using System.Globalization;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Optics.Indicatrix;

/// <summary>
/// A direction in the crystal frame: a unit vector (x, y, z) in double precision, normalised on
/// construction. The frame is the one <see cref="Indicatrix"/> uses: its principal axes X (α), Y (β)
/// and Z (γ) lie along x, y and z, and a uniaxial optic axis lies along z.
/// <c>default</c> is the zero vector, which is not a direction: calculations reject it.
/// </summary>
public readonly record struct Direction
{
    /// <summary>
    /// A direction along the vector (<paramref name="x"/>, <paramref name="y"/>, <paramref name="z"/>),
    /// scaled to unit length.
    /// </summary>
    /// <exception cref="QuantityOutOfRangeException">A component is not finite, or the vector is zero.</exception>
    public Direction(double x, double y, double z)
    {
        ThrowIfNotFinite("direction x component", x);
        ThrowIfNotFinite("direction y component", y);
        ThrowIfNotFinite("direction z component", z);
        // Hypot avoids overflow and underflow of x² + y² + z² for very large or very small components.
        double length = double.Hypot(double.Hypot(x, y), z);
        if (!(length > 0))
            throw new QuantityOutOfRangeException("direction length", length, "above 0 (a zero vector has no direction)");
        X = x / length;
        Y = y / length;
        Z = z / length;
    }

    /// <summary>The x component (unit vector).</summary>
    public double X { get; }

    /// <summary>The y component (unit vector).</summary>
    public double Y { get; }

    /// <summary>The z component (unit vector).</summary>
    public double Z { get; }

    /// <summary>The crystal x axis, along the indicatrix axis X (index α).</summary>
    public static Direction AlongX => new(1, 0, 0);

    /// <summary>The crystal y axis, along the indicatrix axis Y (index β).</summary>
    public static Direction AlongY => new(0, 1, 0);

    /// <summary>The crystal z axis, along the indicatrix axis Z (index γ), and the optic axis of a uniaxial indicatrix.</summary>
    public static Direction AlongZ => new(0, 0, 1);

    /// <summary>
    /// A direction from spherical angles: polar angle θ from z, azimuth φ from x towards y;
    /// (sin θ cos φ, sin θ sin φ, cos θ). Uncertainties of the angles are not carried.
    /// </summary>
    public static Direction FromSpherical(Angle polar, Angle azimuth) =>
        new(Math.Sin(polar.Radians) * Math.Cos(azimuth.Radians),
            Math.Sin(polar.Radians) * Math.Sin(azimuth.Radians),
            Math.Cos(polar.Radians));

    /// <summary>
    /// A direction drawn uniformly over the unit sphere from <paramref name="random"/> (seed it for
    /// reproducible runs): z = 2u − 1 and φ = 2πv with u, v uniform on [0, 1) (Archimedes' hat-box
    /// theorem: equal heights of a sphere's zone have equal areas), x = √(1 − z²) cos φ, y = √(1 − z²) sin φ.
    /// </summary>
    /// <exception cref="ArgumentNullException"><paramref name="random"/> is null.</exception>
    public static Direction RandomUniform(Random random)
    {
        ArgumentNullException.ThrowIfNull(random);
        double z = 2 * random.NextDouble() - 1;
        double phi = 2 * Math.PI * random.NextDouble();
        double r = Math.Sqrt(1 - z * z);
        return new Direction(r * Math.Cos(phi), r * Math.Sin(phi), z);
    }

    /// <summary>The scalar product with <paramref name="other"/>: the cosine of the angle between them.</summary>
    public double Dot(Direction other) => X * other.X + Y * other.Y + Z * other.Z;

    /// <summary>
    /// The angle between this direction and <paramref name="other"/>, 0° to 180°, computed as
    /// atan2(|a × b|, a · b), which stays accurate for nearly parallel directions.
    /// </summary>
    public Angle AngleTo(Direction other)
    {
        (double cx, double cy, double cz) = CrossComponents(this, other);
        return Angle.FromRadians(Math.Atan2(double.Hypot(double.Hypot(cx, cy), cz), Dot(other)));
    }

    /// <inheritdoc />
    public override string ToString() => string.Create(CultureInfo.InvariantCulture, $"({X:0.####}, {Y:0.####}, {Z:0.####})");

    /// <summary>The unit vector along a × b; the caller makes sure a and b are not parallel.</summary>
    internal static Direction Cross(Direction a, Direction b)
    {
        (double x, double y, double z) = CrossComponents(a, b);
        return new Direction(x, y, z);
    }

    /// <summary>Rejects <c>default</c> (the zero vector), naming what the direction stands for.</summary>
    internal void ThrowIfDefault(string quantity)
    {
        if (X == 0 && Y == 0 && Z == 0)
            throw new QuantityOutOfRangeException(quantity + " length", 0, "1 (default(Direction) is not a direction)");
    }

    private static (double X, double Y, double Z) CrossComponents(Direction a, Direction b) =>
        (a.Y * b.Z - a.Z * b.Y, a.Z * b.X - a.X * b.Z, a.X * b.Y - a.Y * b.X);

    private static void ThrowIfNotFinite(string quantity, double value)
    {
        if (!double.IsFinite(value))
            throw new QuantityOutOfRangeException(quantity, value, "a finite number");
    }
}
