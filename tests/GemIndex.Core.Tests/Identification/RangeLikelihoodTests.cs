using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Identification;

namespace GemIndex.Core.Tests.Identification;

public class RangeLikelihoodTests
{
    // Independent check: the convolution of a uniform range and a normal, integrated numerically (Simpson, 4000 panels).
    private static double Integrate(Func<double, double> f, double a, double b, int n = 4000)
    {
        double h = (b - a) / n, sum = f(a) + f(b);
        for (int i = 1; i < n; i++) sum += f(a + i * h) * (i % 2 == 1 ? 4 : 2);
        return sum * h / 3;
    }

    [Theory]
    [InlineData(1.760, 1.770, 0.001)]
    [InlineData(1.544, 1.544, 0.001)]
    [InlineData(2.60, 2.70, 0.02)]
    public void The_density_integrates_to_one(double a, double b, double sigma)
    {
        var range = new PropertyRange(a, b);
        double total = Integrate(x => RangeLikelihood.Density(x, range, sigma), a - 10 * sigma, b + 10 * sigma);
        Assert.Equal(1, total, 1e-6); // Simpson's error on this smooth integrand is far below 1e-6
    }

    [Fact]
    public void Inside_a_wide_range_the_density_is_one_over_its_width() =>
        // Φ(large) − Φ(−large) = 1: the uniform density 1/0.01.
        Assert.Equal(100, RangeLikelihood.Density(1.765, new PropertyRange(1.760, 1.770), 0.0001), 1e-6);

    [Theory]
    [InlineData(1.79, 1.76, 1.80, 0.003)]
    [InlineData(2.0, 2.40, 2.42, 0.003)]
    [InlineData(3.32, 3.50, 3.53, 0.01)]
    public void The_tail_above_a_bound_matches_numeric_integration(double bound, double a, double b, double sigma)
    {
        var range = new PropertyRange(a, b);
        double numeric = Integrate(x => RangeLikelihood.Density(x, range, sigma), bound, b + 12 * sigma);
        Assert.Equal(numeric, RangeLikelihood.ProbabilityAbove(bound, range, sigma), 1e-6);
    }

    private static readonly Arbitrary<(double, double, double, double)> Cases =
        (from a in Gen.Choose(1300, 3000) from w in Gen.Choose(0, 50) from s in Gen.Choose(1, 30) from x in Gen.Choose(-100, 100)
         select (a / 1000.0, (a + w) / 1000.0, s / 10000.0, (a + x) / 1000.0)).ToArbitrary();

    [Property(MaxTest = 300)]
    public Property Above_and_below_are_probabilities_summing_to_one() =>
        Prop.ForAll(Cases, c =>
        {
            var (a, b, s, x) = c;
            var r = new PropertyRange(a, b);
            double above = RangeLikelihood.ProbabilityAbove(x, r, s);
            return above >= 0 && above <= 1 && Math.Abs(above + RangeLikelihood.ProbabilityBelow(x, r, s) - 1) < 1e-12;
        });

    [Fact]
    public void Fisher_combination_of_one_tail_is_that_tail() =>
        // With k = 1, P(χ²₂ ≥ −2 ln p) = p exactly.
        Assert.Equal(0.03, EvidenceAccumulator.FisherCombination(-Math.Log(0.03), 1), 1e-12);

    [Fact]
    public void Fisher_combination_of_two_tails_matches_the_closed_form()
    {
        // k = 2: P = p1 p2 (1 − ln(p1 p2)), the known closed form for two tests.
        double p1 = 0.2, p2 = 0.5, product = p1 * p2;
        Assert.Equal(product * (1 - Math.Log(product)), EvidenceAccumulator.FisherCombination(-Math.Log(product), 2), 1e-12);
    }
}

public class NormalDistributionTests
{
    private static readonly Arbitrary<double> Z = Gen.Choose(-800000, 800000).Select(i => i / 100000.0).ToArbitrary();

    [Property(MaxTest = 1000)]
    public Property Phi_agrees_with_a_full_precision_normal_cdf_to_its_stated_error() =>
        // Abramowitz and Stegun 26.2.17 state |ε| < 7.5e-8; MathNet's Normal.CDF is the full-precision reference.
        Prop.ForAll(Z, z => Math.Abs(RangeLikelihood.Phi(z) - MathNet.Numerics.Distributions.Normal.CDF(0, 1, z)) < 7.5e-8);

    [Fact]
    public void Phi_of_1_96_is_0_975() =>
        // Standard normal table value: Φ(1.96) = 0.9750021 (any statistics table).
        Assert.Equal(0.9750021, RangeLikelihood.Phi(1.96), 1e-7);
}

public class TailTests
{
    [Theory]
    [InlineData(5.0)]
    [InlineData(6.5)]
    [InlineData(9.0)]
    [InlineData(20.0)]
    public void Far_tails_agree_with_erfc_to_a_fifth_of_a_percent(double z)
    {
        // Reference: the full-precision complementary error function, 2(1 − Φ(z)) = erfc(z/√2).
        double exact = MathNet.Numerics.SpecialFunctions.Erfc(z / Math.Sqrt(2));
        Assert.InRange(RangeLikelihood.TwoSidedTail(z) / exact, 0.998, 1.002);
    }

    [Fact]
    public void The_tail_at_1_96_sigma_is_five_percent() =>
        // Standard normal table: P(|Z| > 1.96) = 0.0500 (to 4 decimals).
        Assert.Equal(0.05, RangeLikelihood.TwoSidedTail(1.96), 0.00005);
}
