using GemIndex.Core.Catalogue;
using GemIndex.Core.Identification;
using GemIndex.Core.Optics;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Core.Readings;
using GemIndex.Core.Gravity;
using GemIndex.Core.Observations;
using IndicatrixModel = GemIndex.Core.Optics.Indicatrix.Indicatrix;

namespace GemIndex.Bench.Accuracy;

/// <summary>
/// Generates bench sheets for catalogue materials with a documented noise model (README "Accuracy benchmark"):
/// true values drawn uniformly inside the material's ranges; facet readings from the indicatrix section of a random
/// facet orientation, every 15°, 30° or 45° over a half turn, with Gaussian reading noise σ 0.0007 rounded to 0.001;
/// cabochons (a quarter of stones, and all aggregates) read by the spot method, ±0.005 rounded to 0.01; edges above
/// the liquid (1.79) unseen (over the limit); SG ± 0.01 (not for porous stones); each other test done at random with
/// a 5 % chance of a wrong answer; one stone in 30 has one misread edge (off by 0.01).
/// </summary>
internal sealed class StoneSimulator(Random random)
{
    private const double LiquidLimit = 1.79;

    public BenchSheet Simulate(Material m, string id)
    {
        var truth = TrueIndicatrix(m);
        bool spot = m.OpticCharacter == OpticCharacter.Aggregate || random.NextDouble() < 0.25;
        return new BenchSheet
        {
            Id = id,
            Refractometer = Refractometer(truth, spot),
            SpecificGravity = m.DoNotImmerse || random.NextDouble() < 0.1 ? null
                : new SpecificGravity(Math.Round(Uniform(m.SpecificGravity) + Gauss(0.01), 2), 0.01),
            Polariscope = Chance(0.8) ? Slip(Pick(m.Polariscope.Count > 0 ? m.Polariscope : [PolariscopeReaction.SinglyRefractive])) : null,
            Pleochroism = Chance(0.4) ? Pleochroism(m) : null,
            Dispersion = m.Dispersion is { } d && Chance(0.3) ? DispersionObservation.ByEye(Slip(EvidenceLikelihood.DispersionBand(d))) : null,
            ThermalProbe = Chance(0.3) ? Slip(m.ThermalProbe) : null,
            Electrical = Chance(0.1) ? Slip(m.Electrical) : null,
            UvLong = m.UvLong.Count > 0 && Chance(0.4) ? Slip(Pick(m.UvLong)) : null,
            UvShort = m.UvShort.Count > 0 && Chance(0.2) ? Slip(Pick(m.UvShort)) : null,
            AbsorptionLinesNanometres = random.NextDouble() < 0.3 ? Lines(m) : null,
            Colour = m.Colours.Count > 0 && random.NextDouble() < 0.9 ? Pick(m.Colours) : null,
        };
    }

    /// <summary>
    /// True indices uniform in the material's ranges and consistent with its birefringence range (rejection sampling:
    /// a material's indices move together, so γ − α must also lie in its birefringence range).
    /// </summary>
    private IndicatrixModel TrueIndicatrix(Material m)
    {
        var ix = m.Indices;
        var bire = m.Birefringence;
        for (int attempt = 0; ; attempt++)
        {
            bool last = attempt >= 200; // ranges that barely agree: accept the last draw
            switch (m.OpticCharacter)
            {
                case OpticCharacter.Uniaxial:
                {
                    double omega = Uniform(ix.Omega!.Value), epsilon = Uniform(ix.Epsilon!.Value);
                    if (bire is { } b && !b.Contains(Math.Abs(epsilon - omega)) && !last) continue;
                    if (Math.Abs(epsilon - omega) < 1e-4) epsilon = omega + (m.Sign == OpticSign.Negative ? -1e-4 : 1e-4);
                    return IndicatrixModel.Uniaxial(new RefractiveIndex(omega), new RefractiveIndex(epsilon));
                }
                case OpticCharacter.Biaxial:
                {
                    double a = Uniform(ix.Alpha!.Value), g = Uniform(ix.Gamma!.Value);
                    if (bire is { } b && !b.Contains(g - a) && !last) continue;
                    var betaRange = ix.Beta!.Value;
                    double lo = Math.Max(betaRange.Minimum, a + 1e-4), hi = Math.Min(betaRange.Maximum, g - 1e-4);
                    if (lo > hi && !last) continue;
                    double beta = lo <= hi ? lo + random.NextDouble() * (hi - lo) : (a + g) / 2;
                    double[] s = [a, beta, g];
                    Array.Sort(s);
                    if (s[1] - s[0] < 1e-4) s[1] = s[0] + 1e-4;
                    if (s[2] - s[1] < 1e-4) s[2] = s[1] + 1e-4;
                    return IndicatrixModel.Biaxial(new RefractiveIndex(s[0]), new RefractiveIndex(s[1]), new RefractiveIndex(s[2]));
                }
                default:
                    return IndicatrixModel.Isotropic(new RefractiveIndex(Uniform(ix.Single!.Value)));
            }
        }
    }

    private RefractometerObservation Refractometer(IndicatrixModel truth, bool spot)
    {
        if (truth.Alpha.Value > LiquidLimit) return new RefractometerObservation(RefractometerMethod.Facet, overLimit: true);
        if (spot)
        {
            double averaged = truth.Alpha.Value + random.NextDouble() * (Math.Min(truth.Gamma.Value, LiquidLimit) - truth.Alpha.Value);
            double reading = Math.Round(averaged + Gauss(0.005), 2);
            return new RefractometerObservation(RefractometerMethod.Spot, spot: Math.Min(reading, LiquidLimit));
        }
        int step = random.Next(3) switch { 0 => 15, 1 => 30, _ => 45 };
        var normal = Direction.RandomUniform(random);
        var sections = RotationSeries.Simulate(truth, normal, Core.Quantities.Angle.FromDegrees(step));
        bool misread = random.NextDouble() < 1 / 30.0;
        int misreadStep = random.Next(sections.Count);
        bool overLimit = false;
        var steps = new List<ShadowEdgeStep>();
        foreach (var (section, i) in sections.Select((s, i) => (s, i)))
        {
            double low = Read(section.Low.Value), high = Read(section.High.Value);
            if (misread && i == misreadStep) low += random.NextDouble() < 0.5 ? -0.01 : 0.01;
            if (low > LiquidLimit) { overLimit = true; continue; }
            if (high > LiquidLimit) overLimit = true;
            bool single = truth.Character == OpticCharacter.Isotropic;
            steps.Add(new ShadowEdgeStep(section.Rotation.Degrees, Math.Min(low, high), single || high > LiquidLimit ? null : Math.Max(low, high)));
        }
        if (steps.Count == 0) return new RefractometerObservation(RefractometerMethod.Facet, overLimit: true);
        return new RefractometerObservation(RefractometerMethod.Facet, steps, overLimit: overLimit);
    }

    private double Read(double index) => Math.Round(index + Gauss(0.0007), 3);

    private PleochroismObservation Pleochroism(Material m)
    {
        bool colourless = m.Colours.All(c => c.Contains("colourless"));
        if (m.OpticCharacter is not (OpticCharacter.Uniaxial or OpticCharacter.Biaxial) || m.Pleochroism == PleochroismStrength.None || colourless)
            return random.NextDouble() < 0.95 ? PleochroismObservation.None : PleochroismObservation.Dichroic;
        double seen = m.Pleochroism switch { PleochroismStrength.Weak => 0.5, PleochroismStrength.Moderate => 0.8, _ => 0.95 };
        if (random.NextDouble() > seen) return PleochroismObservation.None;
        return m.OpticCharacter == OpticCharacter.Biaxial && random.NextDouble() < 0.5 ? PleochroismObservation.Trichroic : PleochroismObservation.Dichroic;
    }

    private List<double> Lines(Material m)
    {
        var seen = m.AbsorptionLinesNanometres.Where(_ => random.NextDouble() < 0.6).Select(l => Math.Round(l + Gauss(3))).ToList();
        if (random.NextDouble() < 0.05) seen.Add(Math.Round(420 + random.NextDouble() * 280));
        return seen;
    }

    // A wrong answer 5 % of the time: a skilled person still misreads now and then.
    private T Slip<T>(T value) where T : struct, Enum =>
        random.NextDouble() < 0.05 ? Pick(Enum.GetValues<T>()) : value;

    private bool Chance(double probability) => random.NextDouble() < probability;

    private T Pick<T>(IReadOnlyList<T> items) => items[random.Next(items.Count)];

    private double Uniform(PropertyRange r) => r.Minimum + random.NextDouble() * r.Width;

    private double Gauss(double sigma)
    {
        double u1 = 1 - random.NextDouble(), u2 = random.NextDouble();
        return sigma * Math.Sqrt(-2 * Math.Log(u1)) * Math.Cos(2 * Math.PI * u2);
    }
}
