using GemIndex.Core.Optics;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Optics.Indicatrix;

using GemIndex.Core.Optics.Indicatrix;

public partial class IndicatrixTests
{
    private static RefractiveIndex N(double value, double uncertainty = 0) => new(value, uncertainty);

    [Fact]
    public void Quartz_is_uniaxial_positive_with_birefringence_0_009()
    {
        // Source: quartz ω 1.544, ε 1.553, uniaxial + (Handbook of Mineralogy, from memory; DOMAIN.md §7).
        // Tolerance 1e-12: the birefringence is one subtraction of the given values, exact to rounding.
        var quartz = Indicatrix.Uniaxial(N(1.544), N(1.553));
        Assert.Equal(OpticCharacter.Uniaxial, quartz.Character);
        Assert.Equal(OpticSign.Positive, quartz.Sign);
        Assert.Equal(0.009, quartz.Birefringence.Value, 1e-12);
        Assert.Equal(1.544, quartz.Alpha.Value);
        Assert.Equal(1.544, quartz.Beta.Value);
        Assert.Equal(1.553, quartz.Gamma.Value);
        Assert.Equal(0, quartz.OpticAxialAngle!.Value.Degrees);
    }

    [Fact]
    public void Calcite_is_uniaxial_negative_with_birefringence_0_172()
    {
        // Source: calcite ω 1.658, ε 1.486, uniaxial − (Handbook of Mineralogy, from memory; DOMAIN.md §7).
        var calcite = Indicatrix.Uniaxial(N(1.658), N(1.486));
        Assert.Equal(OpticSign.Negative, calcite.Sign);
        Assert.Equal(0.172, calcite.Birefringence.Value, 1e-12);
        Assert.Equal(1.486, calcite.Alpha.Value);
        Assert.Equal(1.658, calcite.Beta.Value);
        Assert.Equal(1.658, calcite.Gamma.Value);
        Assert.Equal(180, calcite.OpticAxialAngle!.Value.Degrees, 1e-12);
    }

    [Fact]
    public void An_isotropic_indicatrix_has_no_sign_no_birefringence_and_no_optic_axial_angle()
    {
        // Fluorite n 1.434 (Handbook of Mineralogy, from memory; DOMAIN.md §7).
        var fluorite = Indicatrix.Isotropic(N(1.434));
        Assert.Equal(OpticCharacter.Isotropic, fluorite.Character);
        Assert.Equal(OpticSign.None, fluorite.Sign);
        Assert.Equal(0, fluorite.Birefringence.Value);
        Assert.Null(fluorite.OpticAxialAngle);
    }

    [Fact]
    public void Birefringence_carries_the_uncertainties_of_the_extreme_indices_in_quadrature()
    {
        var stone = Indicatrix.Biaxial(N(1.5, 0.003), N(1.6, 0.001), N(1.7, 0.004));
        Assert.Equal(0.2, stone.Birefringence.Value, 1e-12);
        Assert.Equal(0.005, stone.Birefringence.StandardUncertainty, 1e-12); // √(3² + 4²) = 5
    }

    [Fact]
    public void Optic_axial_angle_is_90_degrees_when_inverse_square_beta_is_midway()
    {
        // Worked from the formula by hand: with 1/β² = (1/α² + 1/γ²)/2, β² = 2α²γ²/(α² + γ²) and
        // γ² − β² = γ²(γ² − α²)/(α² + γ²), so cos²Vz = α²(γ² − β²)/(β²(γ² − α²)) = ½ exactly and 2Vz = 90°.
        // (β midway in n or in n² does NOT give 90°: with β² midway, cos²Vz = α²/(α² + γ²) < ½.)
        // Tolerance 1e-9°: double rounding of a handful of operations near cos²Vz = ½, where acos is well conditioned.
        double alpha = 1.5, gamma = 1.7;
        double beta = 1 / Math.Sqrt((1 / (alpha * alpha) + 1 / (gamma * gamma)) / 2);
        var stone = Indicatrix.Biaxial(N(alpha), N(beta), N(gamma));
        Assert.Equal(90, stone.OpticAxialAngle!.Value.Degrees, 1e-9);
    }

    [Fact]
    public void Optic_axial_angle_of_a_worked_example_matches_an_independent_calculation()
    {
        // α 1.5, β 1.6, γ 1.7 (invented). Computed independently with Python's math module from the same
        // formula: 2Vz = 2·acos(√(α²(γ² − β²)/(β²(γ² − α²)))) = 95.37235397798695°. Checked a second way in
        // Optic_axes_found_by_the_formula_give_circular_sections. Tolerance 1e-9°: double rounding only.
        var stone = Indicatrix.Biaxial(N(1.5), N(1.6), N(1.7));
        Assert.Equal(95.37235397798695, stone.OpticAxialAngle!.Value.Degrees, 1e-9);
        Assert.Equal(OpticSign.Negative, stone.Sign);
    }

    [Fact]
    public void Sign_follows_the_optic_axial_angle_where_the_rule_of_thumb_disagrees()
    {
        // β 1.5995 lies between the 1/n² midpoint 1.59065 and the n midpoint 1.6 of α 1.5 and γ 1.7, so
        // γ − β (0.1005) > β − α (0.0995) says "+" while 2Vz is above 90° (95.0868°, Python, same formula): negative.
        var stone = Indicatrix.Biaxial(N(1.5), N(1.5995), N(1.7));
        Assert.Equal(95.08678655863362, stone.OpticAxialAngle!.Value.Degrees, 1e-9);
        Assert.Equal(OpticSign.Negative, stone.Sign);
    }

    [Fact]
    public void A_biaxial_stone_with_beta_near_alpha_is_positive_with_an_acute_angle()
    {
        var stone = Indicatrix.Biaxial(N(1.61), N(1.62), N(1.70));
        Assert.Equal(OpticSign.Positive, stone.Sign);
        Assert.InRange(stone.OpticAxialAngle!.Value.Degrees, 0, 90);
    }

    [Fact]
    public void Optic_axial_angle_uncertainty_matches_central_differences_of_the_angle_itself()
    {
        // Independent check of the analytic derivatives: central differences (h = 1e-6) of 2Vz computed by the
        // class, combined in quadrature. Also matches Python central differences with h = 0.001: 0.70175°.
        // Tolerance 1e-6°: the O(h²) truncation and rounding of the differences are far below it.
        const double sigma = 0.001, h = 1e-6;
        double Angle(double a, double b, double g) => Indicatrix.Biaxial(N(a), N(b), N(g)).OpticAxialAngle!.Value.Degrees;
        double dA = (Angle(1.5 + h, 1.6, 1.7) - Angle(1.5 - h, 1.6, 1.7)) / (2 * h);
        double dB = (Angle(1.5, 1.6 + h, 1.7) - Angle(1.5, 1.6 - h, 1.7)) / (2 * h);
        double dG = (Angle(1.5, 1.6, 1.7 + h) - Angle(1.5, 1.6, 1.7 - h)) / (2 * h);
        double expected = sigma * Math.Sqrt(dA * dA + dB * dB + dG * dG);

        var stone = Indicatrix.Biaxial(N(1.5, sigma), N(1.6, sigma), N(1.7, sigma));
        Assert.Equal(expected, stone.OpticAxialAngle!.Value.StandardUncertaintyDegrees, 1e-6);
        Assert.Equal(0.70175, stone.OpticAxialAngle!.Value.StandardUncertaintyDegrees, 1e-3);
    }

    [Fact]
    public void Optic_axial_angle_uncertainty_is_capped_at_an_undetermined_angle_when_first_order_fails()
    {
        // β only 1e-5 above α: 2Vz is about 1.2°, and σ = 0.01 on each index makes first order meaningless;
        // the reported value is then 180°/√12, the standard deviation of an angle anywhere in 0°–180°.
        var stone = Indicatrix.Biaxial(N(1.6, 0.01), N(1.60001, 0.01), N(1.7, 0.01));
        Assert.Equal(180 / Math.Sqrt(12), stone.OpticAxialAngle!.Value.StandardUncertaintyDegrees, 1e-9);
    }

    [Fact]
    public void Optic_axial_angle_has_no_uncertainty_when_the_indices_have_none()
    {
        var stone = Indicatrix.Biaxial(N(1.5), N(1.6), N(1.7));
        Assert.Equal(0, stone.OpticAxialAngle!.Value.StandardUncertaintyDegrees);
    }

    [Fact]
    public void Uniaxial_with_equal_indices_is_refused_naming_epsilon_and_omega()
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() => Indicatrix.Uniaxial(N(1.544), N(1.544)));
        Assert.Equal("extraordinary index ε is 1.544; allowed: any index other than ω 1.544 (equal indices make an isotropic indicatrix).", error.Message);
    }

    [Theory]
    [InlineData(1.6, 1.5, 1.7)] // β below α
    [InlineData(1.5, 1.5, 1.7)] // β equal to α
    public void Biaxial_with_beta_not_above_alpha_is_refused_naming_beta(double alpha, double beta, double gamma)
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() => Indicatrix.Biaxial(N(alpha), N(beta), N(gamma)));
        Assert.Equal("intermediate index β", error.Quantity);
        Assert.Equal(FormattableString.Invariant(
            $"intermediate index β is {beta}; allowed: above the lowest index α {alpha} (equal indices: use a uniaxial indicatrix)."), error.Message);
    }

    [Theory]
    [InlineData(1.5, 1.7, 1.6)] // γ below β
    [InlineData(1.5, 1.7, 1.7)] // γ equal to β
    public void Biaxial_with_gamma_not_above_beta_is_refused_naming_gamma(double alpha, double beta, double gamma)
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() => Indicatrix.Biaxial(N(alpha), N(beta), N(gamma)));
        Assert.Equal(FormattableString.Invariant(
            $"highest index γ is {gamma}; allowed: above the intermediate index β {beta} (equal indices: use a uniaxial indicatrix)."), error.Message);
    }

    [Fact]
    public void Radius_along_a_principal_axis_is_that_axis_index()
    {
        var stone = Indicatrix.Biaxial(N(1.5), N(1.6), N(1.7));
        Assert.Equal(1.5, stone.RadiusAlong(Direction.AlongX).Value, 1e-12);
        Assert.Equal(1.6, stone.RadiusAlong(Direction.AlongY).Value, 1e-12);
        Assert.Equal(1.7, stone.RadiusAlong(Direction.AlongZ).Value, 1e-12);
    }

    [Fact]
    public void Radius_along_the_default_direction_is_refused()
    {
        var stone = Indicatrix.Isotropic(N(1.5));
        var error = Assert.Throws<QuantityOutOfRangeException>(() => stone.RadiusAlong(default));
        Assert.Equal("direction length is 0; allowed: 1 (default(Direction) is not a direction).", error.Message);
    }
}
