using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using GemIndex.Core.Optics;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Optics;

public class FresnelTests
{
    private static readonly RefractiveIndex Air = new(1.0);
    private static readonly RefractiveIndex Glass = new(1.5);

    [Fact]
    public void Glass_of_index_1_5_reflects_4_percent_at_normal_incidence()
    {
        // Source: Hecht, Optics, as cited in DOMAIN.md §7: R = 4.0% for n 1.5 at normal incidence. Tolerance: printed to 0.1%, so ±0.05%.
        Assert.Equal(0.040, Fresnel.AtNormalIncidence(Air, Glass), 0.0005);
        Reflectance r = Fresnel.At(Air, Glass, Angle.FromDegrees(0));
        Assert.Equal(0.040, r.S, 0.0005);
        Assert.Equal(0.040, r.P, 0.0005);
    }

    [Fact]
    public void Oblique_reflectance_matches_a_worked_example()
    {
        // Worked example of our own, air to 1.5 at 45°: cos θt = √(1 − (sin 45°/1.5)²) = 0.881917;
        // rs = (0.707107 − 1.322876)/(0.707107 + 1.322876) = −0.303337, Rs = 0.092013;
        // rp = (1.060660 − 0.881917)/(1.060660 + 0.881917) = 0.092013, Rp = 0.0084663 (= Rs², a known identity at 45°).
        // Tolerance: 6 printed significant digits.
        Reflectance r = Fresnel.At(Air, Glass, Angle.FromDegrees(45));
        Assert.Equal(0.092013, r.S, 0.000001);
        Assert.Equal(r.S * r.S, r.P, 1e-12);
        Assert.Equal((r.S + r.P) / 2, r.Unpolarised, 1e-15);
    }

    [Fact]
    public void Total_internal_reflection_reflects_everything()
    {
        Reflectance r = Fresnel.At(new RefractiveIndex(2.417), Air, Angle.FromDegrees(40));
        Assert.Equal(1.0, r.S);
        Assert.Equal(1.0, r.P);
        Assert.Equal(1.0, r.Unpolarised);
    }

    [Fact]
    public void Grazing_incidence_reflects_everything()
    {
        Reflectance r = Fresnel.At(Air, Glass, Angle.FromDegrees(90));
        Assert.Equal(1.0, r.S, 1e-12);
        Assert.Equal(1.0, r.P, 1e-12);
    }

    [Fact]
    public void Index_from_the_reflectance_of_glass_in_air_is_1_5()
    {
        // Inverse of the Hecht example: R = 0.04 exactly gives √R = 0.2, n = (1.2)/(0.8) = 1.5.
        RefractiveIndex n = Fresnel.IndexFromNormalReflectance(0.04, Air);
        Assert.Equal(1.5, n.Value, 1e-12);
    }

    [Fact]
    public void Reflectance_uncertainty_propagates_to_the_index()
    {
        // σn = m σR / (r (1 − r)²) = 1 · 0.001 / (0.2 · 0.64) = 0.0078125 for R = 0.04 ± 0.001 in air.
        RefractiveIndex n = Fresnel.IndexFromNormalReflectance(0.04, Air, 0.001);
        Assert.Equal(0.0078125, n.StandardUncertainty, 1e-12);
    }

    [Fact]
    public void The_reflectance_of_an_index_4_stone_is_accepted_at_the_top_of_the_range()
    {
        // Regression: FsCheck found (medium 1.737, stone 4.000) refused as "0.15564; allowed 0 to 0.15564" when the
        // range top was computed with other arithmetic than the reflectance itself.
        var medium = new RefractiveIndex(1.737);
        double r = Fresnel.AtNormalIncidence(medium, new RefractiveIndex(4.0));
        Assert.Equal(4.0, Fresnel.IndexFromNormalReflectance(r, medium).Value, 1e-9);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(-0.01)]
    [InlineData(double.NaN)]
    public void A_reflectance_not_above_zero_is_refused(double reflectance) =>
        OutOfRangeAssert.Throws(() => Fresnel.IndexFromNormalReflectance(reflectance, Air), "normal-incidence reflectance", "above 0");

    [Fact]
    public void A_reflectance_above_that_of_an_index_4_stone_is_refused() =>
        // In air the top is ((4 − 1)/(4 + 1))² = 0.36.
        OutOfRangeAssert.Throws(() => Fresnel.IndexFromNormalReflectance(0.5, Air), "normal-incidence reflectance", "0 to 0.36");

    [Fact]
    public void An_incidence_beyond_90_degrees_is_refused() =>
        OutOfRangeAssert.Throws(() => Fresnel.At(Air, Glass, Angle.FromDegrees(91)), "angle of incidence", "0 to 90 °");

    [Property]
    public Property Reflectances_are_fractions_and_p_never_exceeds_s() =>
        // For absorption-free media |rp| ≤ |rs| at every angle, external or internal:
        // rp/rs = −cos(θi + θt)/cos(θi − θt) and |cos(θi + θt)| ≤ cos(θi − θt) for angles in 0°–90°.
        Prop.ForAll(OpticsArbitraries.AnyRay, ray =>
        {
            Reflectance r = Fresnel.At(ray.From, ray.To, ray.Incidence);
            return (r.P >= 0 && r.S <= 1 && r.P <= r.S + 1e-15).Label($"{ray}: {r}");
        });

    [Property]
    public Property Reflectance_is_the_same_from_either_side() =>
        // Stokes reciprocity: the ray refracted back meets the same reflectance from the other side.
        Prop.ForAll(OpticsArbitraries.RefractedRay, ray =>
        {
            Reflectance forward = Fresnel.At(ray.From, ray.To, ray.Incidence);
            Angle refracted = Snell.Refract(ray.From, ray.To, ray.Incidence).RefractedAngle;
            Reflectance backward = Fresnel.At(ray.To, ray.From, refracted);
            return (Math.Abs(forward.S - backward.S) < 1e-9 && Math.Abs(forward.P - backward.P) < 1e-9).Label($"{ray}: {forward} vs {backward}");
        });

    [Property]
    public Property Normal_reflectance_inverts_to_the_stone_index() =>
        Prop.ForAll(OpticsArbitraries.StoneAboveMedium, pair =>
        {
            double r = Fresnel.AtNormalIncidence(pair.Surrounding, pair.Stone);
            double back = Fresnel.IndexFromNormalReflectance(r, pair.Surrounding).Value;
            return (Math.Abs(back - pair.Stone.Value) < 1e-9).Label($"{pair}: R {r} back {back}");
        });
}
