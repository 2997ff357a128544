using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using GemIndex.Core.Optics;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Optics.Indicatrix;

using GemIndex.Core.Optics.Indicatrix;

public partial class IndicatrixTests
{
    // Sections are computed in double precision through about twenty operations from indices of order 2;
    // 1e-12 allows that rounding and is far below the 0.001 a refractometer resolves.
    private const double Rounding = 1e-12;

    private static readonly Indicatrix Quartz = Indicatrix.Uniaxial(N(1.544), N(1.553));
    private static readonly Indicatrix Calcite = Indicatrix.Uniaxial(N(1.658), N(1.486));

    [Theory]
    [InlineData(0)]
    [InlineData(30)]
    [InlineData(75)]
    [InlineData(90)]
    [InlineData(144)]
    public void A_facet_perpendicular_to_the_optic_axis_shows_omega_and_epsilon_at_every_rotation(double degrees)
    {
        // Physics: every section plane contains the normal N, here the optic axis z, whose radius is ε;
        // its other axis N × s lies in the xy plane, radius ω. So the edges are ω and ε whatever s is.
        IndicatrixSection section = Quartz.Section(Direction.AlongZ, Angle.FromDegrees(degrees));
        Assert.Equal(1.544, section.Low.Value, Rounding);
        Assert.Equal(1.553, section.High.Value, Rounding);

        IndicatrixSection negative = Calcite.Section(new Direction(0, 0, -1), Angle.FromDegrees(degrees));
        Assert.Equal(1.486, negative.Low.Value, Rounding);
        Assert.Equal(1.658, negative.High.Value, Rounding);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(20)]
    [InlineData(45)]
    [InlineData(90)]
    [InlineData(135)]
    public void A_facet_parallel_to_the_optic_axis_has_one_edge_at_omega_and_one_moving_to_epsilon(double degrees)
    {
        // Physics: N = x ⊥ optic axis; the reference direction is then the optic axis z, so travel s makes the
        // angle θ with it. The section spanned by x (radius ω) and N × s is diagonal in that basis; the
        // other axis N × s makes the angle θ with y, so its radius is 1/√(cos²θ/ω² + sin²θ/ε²):
        // ω when s runs along the optic axis (θ = 0°), ε when s is perpendicular to it (θ = 90°).
        double theta = degrees * Math.PI / 180;
        double moving = 1 / Math.Sqrt(Math.Pow(Math.Cos(theta) / 1.544, 2) + Math.Pow(Math.Sin(theta) / 1.553, 2));
        IndicatrixSection section = Quartz.Section(Direction.AlongX, Angle.FromDegrees(degrees));
        Assert.Equal(1.544, section.Low.Value, Rounding);
        Assert.Equal(moving, section.High.Value, Rounding);
    }

    [Fact]
    public void A_facet_parallel_to_the_optic_axis_reaches_epsilon_when_travel_is_across_the_axis()
    {
        IndicatrixSection across = Quartz.Section(Direction.AlongY, Angle.FromDegrees(90));
        IndicatrixSection along = Quartz.Section(Direction.AlongY, Angle.FromDegrees(0));
        Assert.Equal(1.553, across.High.Value, Rounding);
        Assert.Equal(1.544, along.High.Value, Rounding);
        Assert.Equal(1.544, along.Low.Value, Rounding);
    }

    [Fact]
    public void An_isotropic_stone_shows_one_edge()
    {
        var glass = Indicatrix.Isotropic(N(1.52));
        IndicatrixSection section = glass.Section(new Direction(0.3, -0.4, 0.8), Angle.FromDegrees(33));
        Assert.Equal(1.52, section.Low.Value, Rounding);
        Assert.Equal(1.52, section.High.Value, Rounding);
    }

    [Fact]
    public void Optic_axes_found_by_the_formula_give_circular_sections()
    {
        // Independent check of 2Vz: an optic axis is the wave normal whose section is a circle of radius β.
        // On the facet N = y the reference travel is z and s = cos θ·z + sin θ·x, so at θ = Vz travel runs
        // along an optic axis (in the XZ plane, Vz from Z) and both edges must equal β.
        var stone = Indicatrix.Biaxial(N(1.5), N(1.6), N(1.7));
        double vz = stone.OpticAxialAngle!.Value.Degrees / 2;
        IndicatrixSection onAxis = stone.Section(Direction.AlongY, Angle.FromDegrees(vz));
        Assert.Equal(1.6, onAxis.Low.Value, 1e-9);
        Assert.Equal(1.6, onAxis.High.Value, 1e-9);
        IndicatrixSection offAxis = stone.Section(Direction.AlongY, Angle.FromDegrees(vz + 5));
        Assert.True(offAxis.High.Value - offAxis.Low.Value > 1e-3);
    }

    [Fact]
    public void Travel_at_zero_rotation_is_the_reference_direction_and_turns_about_the_normal()
    {
        var normal = new Direction(1, 2, 2);
        Direction reference = Indicatrix.ReferenceTravelDirection(normal);
        IndicatrixSection start = Quartz.Section(normal, Angle.FromDegrees(0));
        IndicatrixSection quarter = Quartz.Section(normal, Angle.FromDegrees(90));
        Assert.Equal(0, reference.Dot(normal), Rounding);
        Assert.Equal(0, start.Travel.AngleTo(reference).Degrees, 1e-6);
        Assert.Equal(90, quarter.Travel.AngleTo(reference).Degrees, 1e-9);
        Assert.Equal(0, quarter.Travel.Dot(normal), Rounding);
    }

    [Fact]
    public void A_section_on_the_default_facet_normal_is_refused()
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() => Quartz.Section(default, Angle.FromDegrees(0)));
        Assert.Equal("facet normal length is 0; allowed: 1 (default(Direction) is not a direction).", error.Message);
    }

    [Property(MaxTest = 500)]
    public Property Every_section_index_lies_between_alpha_and_gamma() =>
        Prop.ForAll(IndicatrixGenerators.Any, IndicatrixGenerators.FacetNormal, IndicatrixGenerators.Rotation, (stone, normal, rotation) =>
        {
            IndicatrixSection s = stone.Section(normal, rotation);
            return (s.Low.Value >= stone.Alpha.Value - Rounding && s.High.Value <= stone.Gamma.Value + Rounding && s.Low.Value <= s.High.Value)
                .Label($"{stone.Alpha} {stone.Beta} {stone.Gamma} N={normal} {s}");
        });

    [Property(MaxTest = 500)]
    public Property The_low_edge_never_exceeds_beta_and_the_high_edge_is_never_below_it() =>
        Prop.ForAll(IndicatrixGenerators.Any, IndicatrixGenerators.FacetNormal, IndicatrixGenerators.Rotation, (stone, normal, rotation) =>
        {
            IndicatrixSection s = stone.Section(normal, rotation);
            return (s.Low.Value <= stone.Beta.Value + Rounding && s.High.Value >= stone.Beta.Value - Rounding)
                .Label($"{stone.Alpha} {stone.Beta} {stone.Gamma} N={normal} {s}");
        });

    [Property(MaxTest = 500)]
    public Property For_a_uniaxial_stone_one_edge_is_always_omega() =>
        Prop.ForAll(IndicatrixGenerators.Uniaxial, IndicatrixGenerators.FacetNormal, IndicatrixGenerators.Rotation, (stone, normal, rotation) =>
        {
            IndicatrixSection s = stone.Section(normal, rotation);
            double omega = stone.Beta.Value; // β of a uniaxial indicatrix is ω
            bool oneIsOmega = Math.Abs(s.Low.Value - omega) <= Rounding || Math.Abs(s.High.Value - omega) <= Rounding;
            return oneIsOmega.Label($"ω={omega} N={normal} {s}");
        });

    [Property(MaxTest = 300)]
    public Property The_radius_along_the_normal_lies_between_the_two_edges() =>
        // DOMAIN.md §3: every section contains N, so r(N) lies between the semi-axes of each section.
        Prop.ForAll(IndicatrixGenerators.Any, IndicatrixGenerators.FacetNormal, IndicatrixGenerators.Rotation, (stone, normal, rotation) =>
        {
            IndicatrixSection s = stone.Section(normal, rotation);
            double r = stone.RadiusAlong(normal).Value;
            return (s.Low.Value <= r + Rounding && r <= s.High.Value + Rounding).Label($"r(N)={r} {s}");
        });

    [Property(MaxTest = 300)]
    public Property Birefringence_is_never_negative_and_bounds_every_section() =>
        Prop.ForAll(IndicatrixGenerators.Any, IndicatrixGenerators.FacetNormal, IndicatrixGenerators.Rotation, (stone, normal, rotation) =>
        {
            IndicatrixSection s = stone.Section(normal, rotation);
            return (stone.Birefringence.Value >= 0 && s.High.Value - s.Low.Value <= stone.Birefringence.Value + Rounding)
                .Label($"{stone.Birefringence} {s}");
        });

    [Property(MaxTest = 300)]
    public Property Rotating_by_180_degrees_gives_the_same_section() =>
        Prop.ForAll(IndicatrixGenerators.Any, IndicatrixGenerators.FacetNormal, IndicatrixGenerators.Rotation, (stone, normal, rotation) =>
        {
            IndicatrixSection a = stone.Section(normal, rotation);
            IndicatrixSection b = stone.Section(normal, Angle.FromDegrees(rotation.Degrees + 180));
            return (Math.Abs(a.Low.Value - b.Low.Value) <= Rounding && Math.Abs(a.High.Value - b.High.Value) <= Rounding).Label($"{a} {b}");
        });

    [Property(MaxTest = 300)]
    public Property Optic_axes_from_the_optic_axial_angle_give_circular_sections_and_the_sign() =>
        // Independent of the 2Vz formula: travel along an optic axis (in the XZ plane, Vz from Z; facet N = y)
        // must see a circle of radius β. Tolerance 1e-9: acos near cos²Vz = 1 (2Vz near 0°) loses digits, and
        // the edge split grows only linearly with that angle error times the birefringence (≤ 0.6).
        Prop.ForAll(IndicatrixGenerators.Biaxial, stone =>
        {
            Angle twoVz = stone.OpticAxialAngle!.Value;
            IndicatrixSection s = stone.Section(Direction.AlongY, Angle.FromRadians(twoVz.Radians / 2));
            bool circular = Math.Abs(s.Low.Value - stone.Beta.Value) <= 1e-9 && Math.Abs(s.High.Value - stone.Beta.Value) <= 1e-9;
            bool signMatches = (stone.Sign == OpticSign.Positive) == (twoVz.Degrees < 90);
            return (circular && signMatches && twoVz.Degrees is > 0 and < 180).Label($"{stone.Alpha} {stone.Beta} {stone.Gamma} 2Vz={twoVz} {s}");
        });
}
