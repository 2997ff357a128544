using GemIndex.Core.Catalogue;
using GemIndex.Core.Identification;
using GemIndex.Core.Optics;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Core.Quantities;
using GemIndex.Core.Readings;
using Xunit.Abstractions;

namespace GemIndex.Core.Tests.Identification;

public class SectionLikelihoodTests(ITestOutputHelper output)
{
    private const double Sigma = 0.001, Limit = 1.79;

    private static Material Crystal(string name, OpticalIndices indices, PropertyRange? birefringence, OpticSign sign) => new()
    {
        Name = name, Species = name, Variety = name, Origin = OriginClass.Natural, CrystalSystem = CrystalSystem.Trigonal,
        Indices = indices, Birefringence = birefringence, Sign = sign, SpecificGravity = new(2, 4),
    };

    // Quartz ω 1.544, ε 1.553 (Handbook of Mineralogy, from memory), with ranges of ±0.001.
    private static readonly Material Quartz = Crystal("quartz", OpticalIndices.Uniaxial(new(1.543, 1.545), new(1.552, 1.554)), new(0.009, 0.009), OpticSign.Positive);

    // Peridot α 1.654, β 1.672, γ 1.690 (from memory), with ranges of ±0.002 and birefringence 0.035–0.037.
    private static readonly Material Peridot = Crystal("peridot", OpticalIndices.Biaxial(new(1.652, 1.656), new(1.670, 1.674), new(1.688, 1.692)), new(0.035, 0.037), OpticSign.Either);

    // Gem tourmaline: ω 1.635–1.675, ε 1.610–1.650, birefringence 0.018–0.040 (GIA Gem Reference Guide via the catalogue's
    // elbaite): a wide shape box, where the climb must find a birefringence far from its starting nodes.
    private static readonly Material Tourmaline = Crystal("tourmaline", OpticalIndices.Uniaxial(new(1.635, 1.675), new(1.610, 1.650)), new(0.018, 0.040), OpticSign.Negative);

    // Cordierite: α 1.527–1.560, β 1.532–1.574, γ 1.537–1.578 (gemfame.com, Iolite), birefringence 0.007–0.018 (goettgen.de, Iolit): a wide
    // biaxial box, both in birefringence and in β's place.
    private static readonly Material Cordierite = Crystal("cordierite", OpticalIndices.Biaxial(new(1.527, 1.560), new(1.532, 1.574), new(1.537, 1.578)), new(0.007, 0.018), OpticSign.Either);

    // An invented uniaxial + material whose ε lies above the liquid's limit 1.79 on some steps.
    private static readonly Material High = Crystal("high", OpticalIndices.Uniaxial(new(1.770, 1.772), new(1.796, 1.798)), new(0.026, 0.026), OpticSign.Positive);

    /// <summary>A series simulated with the section model from one orientation, rounded to 0.001, with edges hidden above the limit.</summary>
    private static IReadOnlyList<ShadowEdgeStep> Simulate(Indicatrix indicatrix, Direction normal, double startDegrees, int count)
    {
        var steps = new List<ShadowEdgeStep>();
        for (int k = 0; k < count; k++)
        {
            var section = indicatrix.Section(normal, Angle.FromDegrees(startDegrees + k * 180.0 / count));
            double low = Math.Round(section.Low.Value, 3), high = Math.Round(section.High.Value, 3);
            double? written = high - low < 0.0015 ? null : high > Limit - 0.003 ? null : high;
            steps.Add(new ShadowEdgeStep(k * 180.0 / count, written is null && high - low < 0.0015 ? Math.Round((section.Low.Value + section.High.Value) / 2, 3) : low, written));
        }
        return steps;
    }

    /// <summary>
    /// Brute-force Monte Carlo of the same model with none of the engine's shortcuts (no orientation set, no Laplace, no
    /// closed-form shift): facet normals uniform over the whole sphere and starting azimuths uniform, the shape (B, β − α)
    /// uniform over the prior's box and weighted by the prior's density there (the prior's definition is shared with the
    /// engine: this checks the integration, not the prior), the level uniform within its interval, the per-stone offset and
    /// the soft edges and the strays beyond the range drawn as normals, and each lone edge's probability summed over both readings (written as one, or the
    /// high edge hidden).
    /// </summary>
    private static (double Log, double StandardError) MonteCarlo(Material m, SeriesObservation series, int samples, int seed)
    {
        var random = new Random(seed);
        var prior = IndicatrixPrior.For(m, RefractometerEvidence.BirefringenceRange(m));
        double shiftSd = Math.Sqrt(SectionLikelihood.OffsetVariance(series, 0));
        var values = new double[samples];
        for (int n = 0; n < samples; n++)
        {
            var family = prior.Families[random.Next(prior.Families.Length)];
            double width = prior.Families.Length;
            double b = Draw(random, family.BirefringenceLow, family.BirefringenceHigh, ref width);
            double u = 0;
            if (family.Biaxial)
            {
                var (uLow, uHigh) = IndicatrixPrior.BetaBox(family, b);
                u = Draw(random, uLow, uHigh, ref width);
            }
            if (IndicatrixPrior.ShapeAt(family, Array.IndexOf(prior.Families, family), b, u) is not { } shape) { values[n] = double.NegativeInfinity; continue; }
            double centre = 1 / Math.Sqrt(shape.InverseSquareX);
            // A share of stones strays beyond the range by the stray scale (RangeStrays), drawn as the engine's mixture.
            double stray = random.NextDouble() < RangeStrays.Share ? Gaussian(random) * RangeStrays.IndexScale : 0;
            double level = centre + shape.LevelLow + random.NextDouble() * (shape.LevelHigh - shape.LevelLow) + stray + Gaussian(random) * Math.Sqrt(shiftSd * shiftSd + shape.ExtraSigma * shape.ExtraSigma);
            var indicatrix = family.Biaxial
                ? Indicatrix.Biaxial(new RefractiveIndex(level), new RefractiveIndex(level + u), new RefractiveIndex(level + b))
                : Indicatrix.Uniaxial(new RefractiveIndex(level), new RefractiveIndex(level + family.Sign * b));
            var normal = Direction.RandomUniform(random);
            double start = random.NextDouble() * 180;
            values[n] = Math.Log(shape.Weight * width) + BruteForceReadings.LogLikelihood(indicatrix, normal, start, series);
        }
        double max = values.Max();
        double mean = values.Average(v => Math.Exp(v - max));
        double variance = values.Sum(v => Math.Pow(Math.Exp(v - max) - mean, 2)) / (samples - 1);
        return (max + Math.Log(mean), Math.Sqrt(variance / samples) / mean);
    }

    /// <summary>Uniform on [low, high] (its width multiplied into the importance weight), or the point when the box is narrow.</summary>
    private static double Draw(Random random, double low, double high, ref double width)
    {
        if (high - low < IndicatrixPrior.NarrowBox) return (low + high) / 2;
        width *= high - low;
        return low + random.NextDouble() * (high - low);
    }

    private static double Gaussian(Random random) =>
        Math.Sqrt(-2 * Math.Log(1 - random.NextDouble())) * Math.Cos(2 * Math.PI * random.NextDouble());


    public static TheoryData<string, double, double, double, double> Stones => new()
    {
        { "quartz", 1.544, 1.553, 40, 20 },
        { "quartz", 1.544, 1.553, 75, 60 },
        { "peridot", 1.654, 1.690, 50, 10 },
        { "peridot", 1.654, 1.690, 20, 70 },
        { "high", 1.771, 1.797, 70, 30 },
        { "tourmaline", 1.629, 1.660, 70, 20 },
        { "tourmaline", 1.640, 1.675, 55, 50 },
        { "cordierite", 1.536, 1.551, 60, 30 },
    };

    [Theory]
    [MemberData(nameof(Stones))]
    public void The_quadrature_agrees_with_brute_force_Monte_Carlo(string name, double low, double high, double polarDegrees, double startDegrees)
    {
        var material = name switch { "quartz" => Quartz, "peridot" => Peridot, "tourmaline" => Tourmaline, "cordierite" => Cordierite, _ => High };
        var indicatrix = material.OpticCharacter == OpticCharacter.Uniaxial
            ? material.Sign == OpticSign.Negative
                ? Indicatrix.Uniaxial(new RefractiveIndex(high), new RefractiveIndex(low))
                : Indicatrix.Uniaxial(new RefractiveIndex(low), new RefractiveIndex(high))
            : Indicatrix.Biaxial(new RefractiveIndex(low), new RefractiveIndex(name == "cordierite" ? 1.541 : 1.672), new RefractiveIndex(high));
        var normal = Direction.FromSpherical(Angle.FromDegrees(polarDegrees), Angle.FromDegrees(35));
        var series = new SeriesObservation(Simulate(indicatrix, normal, startDegrees, 8), Sigma, 0, Limit);
        var prior = IndicatrixPrior.For(material, RefractometerEvidence.BirefringenceRange(material));
        double engine = SectionLikelihood.Evaluate(prior, series, 0, 0).LogLikelihood;
        var (brute, error) = MonteCarlo(material, series, name switch { "tourmaline" => 1_000_000, "cordierite" => 2_000_000, _ => 200_000 }, 11);
        output.WriteLine($"{name} {polarDegrees}/{startDegrees}: engine {engine:0.00}, Monte Carlo {brute:0.00} ± {error:0.00}");
        // Tolerance: one nat (a likelihood factor e, which moves even odds to at most 0.73 against one rival) for the
        // engine's documented approximations (Laplace's method at the peaks, the shift fitted before a hidden edge is
        // weighed), plus three standard errors of the Monte Carlo estimate itself.
        Assert.True(error < 0.7, $"Monte Carlo too noisy to judge: ±{error:0.00}");
        Assert.InRange(engine - brute, -1.0 - 3 * error, 1.0 + 3 * error);
    }
}
