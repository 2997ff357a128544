using GemIndex.Core.Bench;
using System.Globalization;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Magnification;
using GemIndex.Core.Observations;
using GemIndex.Core.Optics.Indicatrix;

namespace GemIndex.Core.Identification;

/// <summary>
/// Picks the test not yet done whose outcome is expected to tell the leading candidates apart best: the mutual
/// information I(material; outcome) = Σ_m Σ_o π(m) P(o|m) log₂(P(o|m)/P(o)) over the current posterior π, which is
/// the expected drop in the posterior's entropy. Continuous readings are binned at about their precision. Weighing in
/// water is not suggested while a porous or fragile material is among the leading candidates.
/// </summary>
public static class NextTestAdvisor
{
    /// <summary>Below this expected gain no test is suggested.</summary>
    public const double MinimumGainBits = 0.05;

    /// <summary>Suggests the next test, or null when none would help.</summary>
    /// <param name="sheet">What has been done.</param>
    /// <param name="candidates">Materials with their posterior probabilities (need not sum to 1).</param>
    public static NextTestAdvice? Advise(BenchSheet sheet, IReadOnlyList<(Material Material, double Probability)> candidates)
    {
        if (candidates.Count < 2) return null;
        double total = candidates.Sum(c => c.Probability);
        var weighted = candidates.Select(c => (c.Material, P: c.Probability / total)).ToList();
        (string Test, double Gain)? best = null;
        // Never suggest weighing in water while a porous or fragile material is a serious candidate.
        bool immersionUnsafe = weighted.Any(c => c.P >= BenchWarnings.Relevant && c.Material.DoNotImmerse);
        foreach (var (test, outcomes) in TestsNotDone(sheet, immersionUnsafe))
        {
            double gain = MutualInformation(weighted, outcomes);
            if (best is null || gain > best.Value.Gain + 1e-9) best = (test, gain);
        }
        var look = Look(sheet, weighted);
        var leaders = weighted.Where(c => c.P >= 0.02).Take(5).ToList();
        if (look is { } l && l.Gain > (best?.Gain ?? 0) + 1e-9 && l.Gain >= MinimumGainBits)
            return new NextTestAdvice
            {
                Test = BenchField.Magnification,
                GainBits = Math.Round(l.Gain, 3),
                Separates = [.. leaders.Select(c => c.Material.Name)],
                Expectations = [.. leaders.Select(c => $"{c.Material.Name}: {ExpectedLook(l.Features, c.Material)}")],
                LookFor = [.. l.Features.Select(f => MagnificationVocabulary.Of(f).Name)],
                Lighting = [.. l.Features.Select(f => MagnificationVocabulary.Of(f).Lighting)],
            };
        if (best is not { } chosen || chosen.Gain < MinimumGainBits) return null;
        return new NextTestAdvice
        {
            Test = chosen.Test,
            GainBits = Math.Round(chosen.Gain, 3),
            Separates = [.. leaders.Select(c => c.Material.Name)],
            Expectations = [.. leaders.Select(c => $"{c.Material.Name}: {Expected(chosen.Test, c.Material)}")],
        };
    }

    /// <summary>
    /// The most informative look under magnification among the features not yet looked for: the single feature with the
    /// largest gain, joined by a second when looking for both adds at least <see cref="MinimumGainBits"/> (features are
    /// independent given the material, as in the likelihood, so the pair's outcomes are the four seen/not-seen pairs).
    /// </summary>
    private static (MagnificationFeature[] Features, double Gain)? Look(BenchSheet sheet, List<(Material Material, double P)> candidates)
    {
        var done = sheet.Magnification is { } m ? m.Present.Concat(m.Absent).ToHashSet() : [];
        var open = MagnificationVocabulary.All.Select(i => i.Feature).Where(f => !done.Contains(f)).ToList();
        if (open.Count == 0) return null;
        double Seen(Material material, MagnificationFeature f) => MagnificationEvidence.ProbabilityOfSeeing(material.MagnificationProfile, f);
        IEnumerable<(long, double)> One(Material material, MagnificationFeature f) => Binary(Seen(material, f));
        IEnumerable<(long, double)> Two(Material material, MagnificationFeature f, MagnificationFeature g)
        {
            double a = Seen(material, f), b = Seen(material, g);
            return [(0, a * b), (1, a * (1 - b)), (2, (1 - a) * b), (3, (1 - a) * (1 - b))];
        }
        var first = open.Select(f => (Feature: f, Gain: MutualInformation(candidates, x => One(x, f)))).MaxBy(x => x.Gain);
        var second = open.Where(f => f != first.Feature)
            .Select(g => (Feature: g, Gain: MutualInformation(candidates, x => Two(x, first.Feature, g)))).MaxBy(x => x.Gain);
        return second.Gain >= first.Gain + MinimumGainBits
            ? ([first.Feature, second.Feature], second.Gain)
            : ([first.Feature], first.Gain);
    }

    private static string ExpectedLook(MagnificationFeature[] features, Material m) => string.Join(", ", features.Select(f =>
    {
        double p = MagnificationEvidence.ProbabilityOfSeeing(m.MagnificationProfile, f);
        string name = MagnificationVocabulary.Of(f).Name;
        return p >= 0.5 ? $"{name} likely" : p >= 0.1 ? $"{name} possible" : $"{name} not expected";
    }));

    private static IEnumerable<(string, Func<Material, IEnumerable<(long, double)>>)> TestsNotDone(BenchSheet s, bool immersionUnsafe)
    {
        if (s.Refractometer is null) yield return (BenchField.Refractometer, Refractometer);
        if (s.SpecificGravity is null && s.HeavyLiquids.Count == 0 && !immersionUnsafe) yield return (BenchField.Sg, SpecificGravity);
        if (s.Polariscope is null) yield return (BenchField.Polariscope, Polariscope);
        if (s.Pleochroism is null) yield return (BenchField.Pleochroism, Pleochroism);
        if (s.Dispersion is null) yield return (BenchField.Dispersion, Dispersion);
        if (s.ThermalProbe is null) yield return (BenchField.ThermalProbe, m => Binary(EvidenceLikelihood.ThermalPositive(m)));
        if (s.Electrical is null) yield return (BenchField.Electrical, m => Binary(EvidenceLikelihood.ElectricalConductive(m)));
        if (s.UvLong is null) yield return (BenchField.UvLong, m => Fluorescence(m.UvLong));
        if (s.UvShort is null) yield return (BenchField.UvShort, m => Fluorescence(m.UvShort));
        if (s.AbsorptionLinesNanometres is null) yield return (BenchField.Absorption, Absorption);
    }

    private static double MutualInformation(List<(Material Material, double P)> candidates, Func<Material, IEnumerable<(long, double)>> outcomes)
    {
        var perMaterial = candidates.Select(c => (c.P, Outcomes: outcomes(c.Material).ToList())).ToList();
        var marginal = new Dictionary<long, double>();
        foreach (var (p, list) in perMaterial)
            foreach (var (o, q) in list)
                marginal[o] = marginal.GetValueOrDefault(o) + p * q;
        double information = 0;
        foreach (var (p, list) in perMaterial)
            foreach (var (o, q) in list)
                if (q > 0) information += p * q * Math.Log2(q / marginal[o]);
        return Math.Max(0, information);
    }

    private static IEnumerable<(long, double)> Binary(double pFirst) => [(0, pFirst), (1, 1 - pFirst)];

    private static IEnumerable<(long, double)> SpecificGravity(Material m) => Binned(m.SpecificGravity, 0.01, 0.03, 0);

    private static IEnumerable<(long, double)> Refractometer(Material m)
    {
        var lowest = m.Indices.Lowest;
        double over = RangeLikelihood.ProbabilityAbove(RefractometerObservation.DefaultLiquidLimit, lowest, 0.002);
        if (over > 0.999) return [(-1, 1)];
        // Readable: the lowest index binned at 0.004, times the birefringence binned at 0.004 (edges read at ±0.001).
        var birefringence = RefractometerEvidence.BirefringenceRange(m);
        var indexBins = Binned(lowest, 0.0015, 0.004, 0).ToList();
        var birefringenceBins = Binned(birefringence, 0.0015, 0.004, 0).ToList();
        var result = new List<(long, double)> { (-1, over) };
        foreach (var (i, p) in indexBins)
            foreach (var (b, q) in birefringenceBins)
                result.Add((i * 1000 + b + 1, (1 - over) * p * q));
        return result;
    }

    /// <summary>Probability of each bin of width <paramref name="width"/> for a reading with noise σ of a value in the range.</summary>
    private static IEnumerable<(long, double)> Binned(PropertyRange range, double sigma, double width, long offset)
    {
        long first = (long)Math.Floor((range.Minimum - 3 * sigma) / width), last = (long)Math.Floor((range.Maximum + 3 * sigma) / width);
        for (long k = first; k <= last; k++)
        {
            double p = RangeLikelihood.ProbabilityAbove(k * width, range, sigma) - RangeLikelihood.ProbabilityAbove((k + 1) * width, range, sigma);
            if (p > 1e-6) yield return (k + offset, p);
        }
    }

    // The outcome tables below are the likelihood's own (EvidenceLikelihood), so advice and ranking never disagree.
    private static IEnumerable<(long, double)> Polariscope(Material m)
    {
        if (m.IsOpaque) { for (int o = 0; o < 4; o++) yield return (o, 0.25); yield break; } // the test cannot be taken
        var usual = EvidenceLikelihood.UsualReactions(m);
        for (int o = 0; o < 4; o++) yield return (o, EvidenceLikelihood.PolariscopeProbability(usual, (PolariscopeReaction)o));
    }

    private static IEnumerable<(long, double)> Pleochroism(Material m) => m.IsOpaque
        ? Enumerable.Range(0, 3).Select(o => ((long)o, 1 / 3.0))
        : EvidenceLikelihood.PleochroismRow(m.OpticCharacter, m.Pleochroism).Select((p, o) => ((long)o, p));

    private static IEnumerable<(long, double)> Dispersion(Material m) => m.Dispersion is { } d
        ? EvidenceLikelihood.DispersionRow(EvidenceLikelihood.DispersionBand(d)).Select((p, o) => ((long)o, p))
        : Enumerable.Range(0, 5).Select(o => ((long)o, 0.2));

    private static IEnumerable<(long, double)> Fluorescence(IReadOnlyList<FluorescenceStrength> usual) => usual.Count == 0
        ? Enumerable.Range(0, 4).Select(o => ((long)o, 0.25))
        : Enumerable.Range(0, 4).Select(o => ((long)o, EvidenceLikelihood.FluorescenceProbability(usual, (FluorescenceStrength)o)));

    // Which listed lines are seen, each with its own detection probability from its strength (the likelihood's model).
    private static IEnumerable<(long, double)> Absorption(Material m) => AbsorptionLines.Outcomes(m.AbsorptionLines);

    private static string Expected(string test, Material m) => test switch
    {
        BenchField.Sg => $"SG {m.SpecificGravity.ToString("0.00")}",
        BenchField.Refractometer => m.Indices.Lowest.Minimum > RefractometerObservation.DefaultLiquidLimit
            ? "over the limit"
            : string.Join(", ", m.Indices.Named().Select(x => $"{x.Name} {x.Range.ToString("0.000")}")),
        BenchField.Polariscope => string.Join(" or ", EvidenceLikelihood.UsualReactions(m).Select(EvidenceLikelihood.Word)),
        BenchField.Pleochroism => m.OpticCharacter is OpticCharacter.Uniaxial or OpticCharacter.Biaxial ? $"{EvidenceLikelihood.Word(m.Pleochroism)} pleochroism" : "none",
        BenchField.Dispersion => m.Dispersion is { } d ? $"nG − nB {d.ToString("0.000", CultureInfo.InvariantCulture)} ({EvidenceLikelihood.Word(EvidenceLikelihood.DispersionBand(d))})" : "not known",
        BenchField.ThermalProbe => EvidenceLikelihood.Word(m.ThermalProbe),
        BenchField.Electrical => EvidenceLikelihood.Word(m.Electrical),
        BenchField.UvLong => m.UvLong.Count == 0 ? "not known" : string.Join(" or ", m.UvLong.Select(EvidenceLikelihood.Word)),
        BenchField.UvShort => m.UvShort.Count == 0 ? "not known" : string.Join(" or ", m.UvShort.Select(EvidenceLikelihood.Word)),
        BenchField.Absorption => m.AbsorptionLinesNanometres.Count == 0 ? "no diagnostic lines" : "lines at " + string.Join(", ", m.AbsorptionLinesNanometres.Select(l => l.ToString("0.#", CultureInfo.InvariantCulture))) + " nm",
        _ => "",
    };
}
