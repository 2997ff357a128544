using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Optics.Indicatrix;

using GemIndex.Core.Optics.Indicatrix;

public class DirectionTests
{
    [Fact]
    public void A_direction_is_normalised_on_construction()
    {
        var d = new Direction(3, 0, 4);
        Assert.Equal(0.6, d.X, 1e-15);
        Assert.Equal(0, d.Y);
        Assert.Equal(0.8, d.Z, 1e-15);
    }

    [Fact]
    public void Very_small_and_very_large_vectors_still_give_unit_directions()
    {
        Assert.Equal(1, new Direction(1e-200, 0, 0).X);
        Assert.Equal(Math.Sqrt(0.5), new Direction(1e300, 1e300, 0).Y, 1e-15);
    }

    [Fact]
    public void The_zero_vector_is_refused_with_its_reason()
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() => new Direction(0, 0, 0));
        Assert.Equal("direction length is 0; allowed: above 0 (a zero vector has no direction).", error.Message);
    }

    [Theory]
    [InlineData(double.NaN, 0, 1, "direction x component")]
    [InlineData(0, double.PositiveInfinity, 1, "direction y component")]
    [InlineData(0, 1, double.NegativeInfinity, "direction z component")]
    public void A_component_that_is_not_finite_is_refused_naming_it(double x, double y, double z, string quantity)
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() => new Direction(x, y, z));
        Assert.Equal($"{quantity} is not a finite number; allowed: a finite number.", error.Message);
    }

    [Fact]
    public void Spherical_angles_give_the_expected_direction()
    {
        Direction d = Direction.FromSpherical(Angle.FromDegrees(90), Angle.FromDegrees(90));
        Assert.Equal(0, d.X, 1e-15);
        Assert.Equal(1, d.Y, 1e-15);
        Assert.Equal(0, d.Z, 1e-15);
    }

    [Fact]
    public void Angle_between_directions_is_accurate_when_nearly_parallel()
    {
        Direction a = Direction.AlongZ;
        Direction b = Direction.FromSpherical(Angle.FromDegrees(1e-6), Angle.FromDegrees(0));
        Assert.Equal(1e-6, a.AngleTo(b).Degrees, 1e-15);
        Assert.Equal(180, a.AngleTo(new Direction(0, 0, -1)).Degrees, 1e-12);
    }

    [Fact]
    public void Random_directions_from_the_same_seed_repeat()
    {
        Assert.Equal(Direction.RandomUniform(new Random(42)), Direction.RandomUniform(new Random(42)));
        Assert.Throws<ArgumentNullException>(() => Direction.RandomUniform(null!));
    }

    [Fact]
    public void Random_directions_are_uniform_on_the_sphere()
    {
        // Uniform on the sphere: each component has mean 0 and variance 1/3, and the mean of z² is 1/3.
        // With 100 000 draws, the standard error of a mean is √(1/3)/√n ≈ 0.0018 and that of mean z² is
        // √(4/45)/√n ≈ 0.00094: a tolerance of 0.01 is more than five standard errors. Fixed seed: repeatable.
        var random = new Random(20261202);
        const int draws = 100_000;
        double sumX = 0, sumY = 0, sumZ = 0, sumZ2 = 0, sumX2 = 0;
        for (int i = 0; i < draws; i++)
        {
            Direction d = Direction.RandomUniform(random);
            sumX += d.X; sumY += d.Y; sumZ += d.Z; sumZ2 += d.Z * d.Z; sumX2 += d.X * d.X;
        }
        Assert.Equal(0, sumX / draws, 0.01);
        Assert.Equal(0, sumY / draws, 0.01);
        Assert.Equal(0, sumZ / draws, 0.01);
        Assert.Equal(1.0 / 3, sumZ2 / draws, 0.01);
        Assert.Equal(1.0 / 3, sumX2 / draws, 0.01);
    }

    [Property]
    public Property Every_direction_has_unit_length() =>
        Prop.ForAll(IndicatrixGenerators.FacetNormal, d =>
            (Math.Abs(d.X * d.X + d.Y * d.Y + d.Z * d.Z - 1) < 1e-15).Label(d.ToString()));
}
