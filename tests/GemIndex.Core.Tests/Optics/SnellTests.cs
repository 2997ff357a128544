using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using GemIndex.Core.Optics;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Optics;

public class SnellTests
{
    private static readonly RefractiveIndex Air = new(1.0);
    private static readonly RefractiveIndex Glass = new(1.5);

    [Fact]
    public void Light_entering_glass_at_30_degrees_bends_towards_the_normal()
    {
        // Worked example of our own: sin θ₂ = 1.0 · sin 30° / 1.5 = 1/3, θ₂ = asin(1/3) = 19.4712°
        // (computed separately in Python). Tolerance: the 4 printed decimals.
        Refraction r = Snell.Refract(Air, Glass, Angle.FromDegrees(30));
        Assert.True(r.TryGetAngle(out Angle angle));
        Assert.Equal(19.4712, angle.Degrees, 0.00005);
    }

    [Fact]
    public void Light_beyond_the_critical_angle_is_totally_reflected()
    {
        // Diamond to air: the critical angle is 24.44° (asin(1/2.417)); 30° is past it.
        Refraction r = Snell.Refract(new RefractiveIndex(2.417), Air, Angle.FromDegrees(30));
        Assert.True(r.IsTotallyReflected);
        Assert.Equal(Refraction.TotallyReflected, r);
        Assert.False(r.TryGetAngle(out _));
    }

    [Fact]
    public void Light_just_inside_the_critical_angle_is_refracted()
    {
        Refraction r = Snell.Refract(new RefractiveIndex(2.417), Air, Angle.FromDegrees(24.4));
        Assert.False(r.IsTotallyReflected);
    }

    [Fact]
    public void Normal_incidence_is_not_deviated()
    {
        Refraction r = Snell.Refract(Air, new RefractiveIndex(2.417), Angle.FromDegrees(0));
        Assert.Equal(0, r.RefractedAngle.Degrees, 1e-12);
    }

    [Fact]
    public void Refraction_uncertainty_follows_the_first_order_formula()
    {
        // σθ₂ = n₁ cos θ₁ σθ₁ / (n₂ cos θ₂) for an angle-only uncertainty: 1 · cos 30° · 0.5° / (1.5 · cos 19.4712°)
        // = 0.30619°, computed separately. Tolerance: 5 printed decimals.
        Refraction r = Snell.Refract(Air, Glass, Angle.FromDegrees(30, 0.5));
        Assert.Equal(0.30619, r.RefractedAngle.StandardUncertaintyDegrees, 0.000005);
    }

    [Fact]
    public void Grazing_emergence_reports_the_whole_range_as_its_uncertainty()
    {
        // At the critical angle sin θ₂ = 1 and d asin/ds is unbounded: first order gives no bound, reported as 90°.
        var water = new RefractiveIndex(1.333, 0.001);
        Refraction r = Snell.Refract(water, Air, Angle.FromRadians(Math.Asin(1 / 1.333)));
        Assert.Equal(90, r.RefractedAngle.Degrees, 1e-6);
        Assert.Equal(90, r.RefractedAngle.StandardUncertaintyDegrees, 1e-12);
    }

    [Property]
    public Property Light_is_totally_reflected_exactly_past_the_critical_angle() =>
        Prop.ForAll(OpticsArbitraries.AnyRay, ray =>
        {
            Angle? critical = CriticalAngle.Between(ray.From, ray.To);
            bool reflected = Snell.Refract(ray.From, ray.To, ray.Incidence).IsTotallyReflected;
            bool past = critical is { } c && ray.Incidence.Radians > c.Radians + 1e-12;
            bool before = critical is not { } d || ray.Incidence.Radians < d.Radians - 1e-12;
            return ((past && reflected) || (before && !reflected) || (!past && !before)).Label($"{ray}: critical {critical}, reflected {reflected}");
        });

    [Fact]
    public void Incidence_for_a_refraction_angle_inverts_the_worked_example()
    {
        Angle incidence = Snell.IncidenceFor(Air, Glass, Angle.FromDegrees(19.4712206));
        Assert.Equal(30, incidence.Degrees, 0.00001);
    }

    [Theory]
    [InlineData(-1)]
    [InlineData(90.5)]
    public void An_incidence_outside_0_to_90_degrees_is_refused(double degrees) =>
        OutOfRangeAssert.Throws(() => Snell.Refract(Air, Glass, Angle.FromDegrees(degrees)), "angle of incidence", "0 to 90 °");

    [Fact]
    public void A_refraction_angle_no_incidence_can_produce_is_refused()
    {
        // From air into glass 1.5 the largest refraction angle is asin(1/1.5) = 41.81°.
        OutOfRangeAssert.Throws(() => Snell.IncidenceFor(Air, Glass, Angle.FromDegrees(45)), "refraction angle", "0 to 41.81");
    }

    [Property]
    public Property Refracting_then_inverting_returns_the_incidence() =>
        Prop.ForAll(OpticsArbitraries.RefractedRay, ray =>
        {
            Refraction r = Snell.Refract(ray.From, ray.To, ray.Incidence);
            if (!r.TryGetAngle(out Angle refracted)) return false.Label("generator gave a totally reflected ray");
            double back = Snell.IncidenceFor(ray.From, ray.To, refracted).Radians;
            // Tolerance: asin near 1 magnifies rounding; within 99.9% of the critical angle, 1e-9 rad is ample.
            return (Math.Abs(back - ray.Incidence.Radians) < 1e-9).Label($"{ray} back {back}");
        });
}
