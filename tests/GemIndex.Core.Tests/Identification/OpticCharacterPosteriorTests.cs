using GemIndex.Core.Observations;
using GemIndex.Core.Identification;
using GemIndex.Core.Optics;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Core.Quantities;
using GemIndex.Core.Readings;

namespace GemIndex.Core.Tests.Identification;

using IndicatrixModel = GemIndex.Core.Optics.Indicatrix.Indicatrix;

public class OpticCharacterPosteriorTests
{
    // Readings simulated from the indicatrix section model on random facets at 22.5° steps over the half turn, rounded to
    // 0.001 as a bench reading is, edges closer than 0.0015 written as one (DOMAIN.md §6b); the indices are handbook
    // values from memory: quartz ω 1.544, ε 1.553 (+); corundum ω 1.770, ε 1.762 (−); peridot α 1.654, β 1.672, γ 1.690;
    // spinel n 1.718.
    private static SeriesObservation Series(IndicatrixModel truth, Direction facet, double stepDegrees = 22.5, int steps = 8) =>
        new([.. RotationSeries.Simulate(truth, facet, Enumerable.Range(0, steps).Select(k => Angle.FromDegrees(k * stepDegrees))).Select(s =>
        {
            double low = Math.Round(s.Low.Value, 3), high = Math.Round(s.High.Value, 3);
            return high - low < 0.0015 ? new ShadowEdgeStep(s.Rotation.Degrees, Math.Round((low + high) / 2, 3))
                : new ShadowEdgeStep(s.Rotation.Degrees, low, high);
        })], 0.001, 0, 1.79);

    private static readonly IndicatrixModel Quartz = IndicatrixModel.Uniaxial(new RefractiveIndex(1.544), new RefractiveIndex(1.553));
    private static readonly IndicatrixModel Corundum = IndicatrixModel.Uniaxial(new RefractiveIndex(1.770), new RefractiveIndex(1.762));
    private static readonly IndicatrixModel Peridot = IndicatrixModel.Biaxial(new RefractiveIndex(1.654), new RefractiveIndex(1.672), new RefractiveIndex(1.690));
    private static readonly IndicatrixModel Spinel = IndicatrixModel.Isotropic(new RefractiveIndex(1.718));

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    public void A_full_series_of_each_character_is_read_as_that_character(int seed)
    {
        var facet = Direction.RandomUniform(new Random(seed));
        var quartz = OpticCharacterPosterior.Of(Series(Quartz, facet));
        Assert.True(quartz.Uniaxial > 0.5 && quartz.UniaxialPositive > quartz.UniaxialNegative, $"quartz {quartz}");
        var corundum = OpticCharacterPosterior.Of(Series(Corundum, facet));
        Assert.True(corundum.Uniaxial > 0.5 && corundum.UniaxialNegative > corundum.UniaxialPositive, $"corundum {corundum}");
        var peridot = OpticCharacterPosterior.Of(Series(Peridot, facet));
        Assert.True(peridot.Biaxial > 0.9, $"peridot {peridot}");
        var spinel = OpticCharacterPosterior.Of(Series(Spinel, facet));
        Assert.True(spinel.Isotropic > 0.9, $"spinel {spinel}");
        foreach (var p in new[] { quartz, corundum, peridot, spinel })
            Assert.Equal(1, p.Isotropic + p.Uniaxial + p.Biaxial, 12);
    }

    [Fact]
    public void Three_colours_in_the_dichroscope_leave_only_a_biaxial_crystal_and_two_rule_out_a_singly_refractive_one()
    {
        // Tanzanite-like edges (zoisite α 1.691, β 1.692, γ 1.700, handbook values from memory): β by α reads as a uniaxial
        // positive crystal on the refractometer alone; only a biaxial crystal shows three colours (common practice).
        var series = new SeriesObservation([new ShadowEdgeStep(0, 1.691, 1.693), new ShadowEdgeStep(45, 1.691, 1.697),
            new ShadowEdgeStep(90, 1.692, 1.700), new ShadowEdgeStep(135, 1.691, 1.696)], 0.001, 0, 1.79);
        var alone = OpticCharacterPosterior.Of(series);
        var trichroic = OpticCharacterPosterior.Of(series, PleochroismObservation.Trichroic);
        Assert.True(alone.Uniaxial > 0.4, $"{alone}");
        Assert.True(trichroic.Biaxial > 0.9, $"{trichroic}");
        // The factor is the misread's: the odds of uniaxial against biaxial fall by exactly that much.
        Assert.Equal(alone.Uniaxial / alone.Biaxial * OpticCharacterPosterior.ImpossiblePleochroism, trichroic.Uniaxial / trichroic.Biaxial, 9);
        var spinelLike = new SeriesObservation([new ShadowEdgeStep(0, 1.718), new ShadowEdgeStep(90, 1.718)], 0.001, 0, 1.79);
        Assert.True(OpticCharacterPosterior.Of(spinelLike, PleochroismObservation.Dichroic).Isotropic < OpticCharacterPosterior.Of(spinelLike).Isotropic);
        Assert.Equal(OpticCharacterPosterior.Of(series), OpticCharacterPosterior.Of(series, PleochroismObservation.None));
    }

    [Fact]
    public void One_step_leaves_the_character_open()
    {
        // A single step with two edges: any doubly refractive crystal could give it, so neither uniaxial nor biaxial is
        // settled (the old classification called it "undetermined"); singly refractive is ruled out.
        var p = OpticCharacterPosterior.Of(new SeriesObservation([new ShadowEdgeStep(0, 1.640, 1.656)], 0.001, 0, 1.79));
        Assert.True(p.Uniaxial is > 0.2 and < 0.8 && p.Biaxial is > 0.2 and < 0.8, $"{p}");
        Assert.True(p.Isotropic < 0.01, $"{p}");
    }

    public static TheoryData<string, int, int> Stones => new()
    {
        // Four steps of quartz leave a biaxial crystal with β near α in play; eight of peridot, a single step of corundum.
        { "quartz", 4, 3 },
        { "quartz", 8, 5 },
        { "corundum", 8, 7 },
        { "peridot", 8, 2 },
        { "corundum", 1, 9 },
    };

    [Theory]
    [MemberData(nameof(Stones))]
    public void The_posterior_agrees_with_brute_force_Monte_Carlo(string name, int steps, int seed)
    {
        var truth = name switch { "quartz" => Quartz, "corundum" => Corundum, _ => Peridot };
        var series = Series(truth, Direction.RandomUniform(new Random(seed)), 180.0 / steps, steps);
        var engine = OpticCharacterPosterior.Of(series);
        var brute = MonteCarlo(series, 400_000, seed);
        // Tolerance: the quadrature agrees with Monte Carlo within about 1.7 nats per evaluation (docs/ranking.md §1,
        // SectionLikelihoodTests), so each part's log-odds against the others may move by that much.
        foreach (var (e, b, what) in new[] { (engine.Uniaxial, brute.Uniaxial, "uniaxial"), (engine.Biaxial, brute.Biaxial, "biaxial") })
            if (b is > 0.01 and < 0.99)
                Assert.True(Math.Abs(LogOdds(e) - LogOdds(b)) < 1.7, $"{what}: engine {e:0.000}, Monte Carlo {b:0.000} ({engine} / {brute})");
            else
                Assert.True(Math.Abs(e - b) < 0.02, $"{what}: engine {e:0.000}, Monte Carlo {b:0.000}");
    }

    private static double LogOdds(double p) => Math.Log(p / (1 - p));

    /// <summary>
    /// The posterior by brute force: each part of the broad prior (singly refractive a quarter, uniaxial of each sign an
    /// eighth, biaxial a quarter; B flat over 0–0.30, so a part's mass in B's window is its share × window / 0.30; β flat
    /// between α and γ) sampled with a uniform facet normal, start and level within the readings' window, each reading's
    /// probability as the engine's reading model gives it (two edges, or one written for two, or a lone low edge whose
    /// high edge the liquid hides). The level's window and flat density are common to every part and cancel.
    /// </summary>
    private static OpticCharacterPosterior MonteCarlo(SeriesObservation series, int samples, int seed)
    {
        var random = new Random(seed);
        double levelLow = series.LowestReading - 0.01, levelHigh = series.HighestReading + 0.01;
        double spread = series.HighestReading - series.LowestReading;
        double bLow = Math.Max(0, spread - 0.002), bHigh = spread + 0.006 + (series.HighestReading > series.LiquidLimit - 0.03 ? 0.02 : 0);
        double Likelihood(double alpha, double beta, double gamma)
        {
            var indicatrix = gamma - alpha < 1e-9 ? IndicatrixModel.Isotropic(new RefractiveIndex(alpha))
                : beta - alpha < 1e-9 ? IndicatrixModel.Uniaxial(new RefractiveIndex(alpha), new RefractiveIndex(gamma))   // positive: ω = α = β, ε = γ
                : gamma - beta < 1e-9 ? IndicatrixModel.Uniaxial(new RefractiveIndex(gamma), new RefractiveIndex(alpha))   // negative: ω = β = γ, ε = α
                : IndicatrixModel.Biaxial(new RefractiveIndex(alpha), new RefractiveIndex(beta), new RefractiveIndex(gamma));
            var normal = Direction.RandomUniform(random);
            double start = random.NextDouble() * 180;
            return Math.Exp(BruteForceReadings.LogLikelihood(indicatrix, normal, start, series));
        }
        double Level() => levelLow + random.NextDouble() * (levelHigh - levelLow);
        double B() => bLow + random.NextDouble() * (bHigh - bLow);
        double window = (bHigh - bLow) * BroadDensities.Birefringence;
        double isotropic = 0, positive = 0, negative = 0, biaxial = 0;
        for (int n = 0; n < samples; n++)
        {
            double level = Level();
            isotropic += Likelihood(level, level, level);
            level = Level(); double b = B();
            positive += Likelihood(level, level, level + b);
            level = Level(); b = B();
            negative += Likelihood(level, level + b, level + b);
            level = Level(); b = B();
            biaxial += Likelihood(level, level + random.NextDouble() * b, level + b);
        }
        double[] part = [0.25 * isotropic, 0.125 * window * positive, 0.125 * window * negative, 0.25 * window * biaxial];
        double total = part.Sum();
        return new(part[0] / total, part[1] / total, part[2] / total, part[3] / total);
    }

    /// <summary>An invented entry: the readings shown depend on the readings alone, whatever the catalogue holds.</summary>
    private static readonly GemIndex.Core.Catalogue.Material Anything = new()
    {
        Name = "x", Species = "x", Variety = "x", Origin = GemIndex.Core.Catalogue.OriginClass.Natural, CrystalSystem = GemIndex.Core.Catalogue.CrystalSystem.Cubic,
        Indices = GemIndex.Core.Catalogue.OpticalIndices.SingleIndex(new(1.50, 1.51)), SpecificGravity = new(2.5, 2.6),
    };

    [Fact]
    public void The_readings_shown_follow_the_characters_odds_not_the_constant_edge_band()
    {
        // Four steps whose high edge wanders by 0.004 (1.686–1.690, invented readings near peridot's handbook values,
        // from memory): the constant-edge band (4σ) calls that edge moving, and the series biaxial, by a rounding hair,
        // while the readings alone favour a uniaxial negative crystal (a lone high edge 4σ off costs less than a third
        // free index). The indices shown lead with that reading, each weighted by its character's posterior share.
        var steps = new List<ShadowEdgeStep> { new(0, 1.654, 1.690), new(45, 1.660, 1.688), new(90, 1.672, 1.690), new(135, 1.662, 1.686) };
        Assert.Equal(OpticCharacter.Biaxial, RotationSeriesAnalysis.Analyse(steps, 0.001).Character);
        var result = new Identifier([Anything]).Identify(new BenchSheet { Refractometer = new RefractometerObservation(RefractometerMethod.Facet, steps) });
        var odds = result.SeriesCharacter!;
        Assert.True(odds.UniaxialNegative > 0.5, $"{odds}");
        var shown = result.Series!;
        Assert.Equal(OpticCharacter.Uniaxial, shown.Character);
        Assert.Equal(OpticSign.Negative, shown.Interpretations[0].Sign);
        Assert.Equal(odds.UniaxialNegative, shown.Interpretations[0].Weight);
        Assert.Equal(1.6885, shown.Interpretations[0].Highest.Value, 9);   // ω, the high edges' mean
        Assert.All(shown.Interpretations, i => Assert.True(i.Weight >= BenchWarnings.Relevant));
        Assert.All(shown.Interpretations.Where(i => i.Character == OpticCharacter.Biaxial), i => Assert.Equal(odds.Biaxial / 2, i.Weight));
        Assert.Equal(shown.Interpretations.OrderByDescending(i => i.Weight), shown.Interpretations);

        // One constant edge: its one reading stands (singly refractive), weighted by the posterior's singly refractive share.
        var one = new Identifier([Anything]).Identify(new BenchSheet { Refractometer = new RefractometerObservation(RefractometerMethod.Facet, [new(0, 1.718), new(90, 1.718)]) });
        var single = Assert.Single(one.Series!.Interpretations);
        Assert.Equal(OpticCharacter.Isotropic, single.Character);
        Assert.Equal(one.SeriesCharacter!.Isotropic, single.Weight);
    }

    /// <summary>
    /// A corundum read at eight steps with its optic axis in the facet (common practice: the high edge ω 1.768 stays, the
    /// low edge runs from ε 1.761 at 0° to meet it at 90°; the intermediate readings follow 1/n² = cos²ψ/ω² + sin²ψ/ε²
    /// to the 0.001 read): a biaxial crystal fits it only with β at γ (2V near 0°), which these readings show alike.
    /// </summary>
    [Fact]
    public void A_textbook_uniaxial_series_is_read_uniaxial_when_its_biaxial_readings_have_2V_near_0()
    {
        var steps = new List<ShadowEdgeStep>
        {
            new(0, 1.761, 1.768), new(22.5, 1.762, 1.768), new(45, 1.7645, 1.768), new(67.5, 1.767, 1.768),
            new(90, 1.768, 1.768), new(112.5, 1.767, 1.768), new(135, 1.7645, 1.768), new(157.5, 1.762, 1.768),
        };
        var result = new Identifier([Anything]).Identify(new BenchSheet { Refractometer = new RefractometerObservation(RefractometerMethod.Facet, steps) });
        var shown = result.Series!;
        Assert.True(shown.BiaxialLooksUniaxial);
        Assert.Equal(OpticCharacter.Uniaxial, shown.Character);
        Assert.Equal(OpticSign.Negative, shown.Interpretations[0].Sign);
        Assert.All(shown.Interpretations.Where(i => i.Character == OpticCharacter.Biaxial), i => Assert.True(i.LooksUniaxial));
        // A quartz read at four steps leaves a biaxial reading with β well inside (1.548): no such claim.
        var quartz = new Identifier([Anything]).Identify(new BenchSheet { Refractometer = new RefractometerObservation(RefractometerMethod.Facet,
            [new(0, 1.544, 1.553), new(45, 1.544, 1.551), new(90, 1.544, 1.548), new(135, 1.544, 1.551)]) });
        Assert.Contains(quartz.Series!.Interpretations, i => i.Character == OpticCharacter.Biaxial && !i.LooksUniaxial);
        Assert.False(quartz.Series!.BiaxialLooksUniaxial);
    }
}
