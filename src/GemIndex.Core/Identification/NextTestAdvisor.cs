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

    /// <summary>
    /// Telling groups apart (the origins of one species), a test must also be expected to remove at least this share of
    /// the uncertainty about the group: otherwise its gain comes from telling one group's varieties from another's (a
    /// green zoisite among tanzanites), not from the question asked (a judgement; docs/ranking.md §5).
    /// </summary>
    public const double GroupEntropyShare = 0.1;

    /// <summary>Suggests the next test, or null when none would help.</summary>
    /// <param name="sheet">What has been done.</param>
    /// <param name="candidates">Materials with their posterior probabilities (need not sum to 1).</param>
    /// <param name="groupOf">
    /// When given, the test is chosen to tell these groups apart (the origins of one species) rather than the materials:
    /// its gain is I(group; outcome) = I(material; outcome) − Σ_g P(g)·I(material; outcome | g), since the material fixes
    /// its group. A test that only tells varieties of one origin apart gains nothing.
    /// </param>
    public static NextTestAdvice? Advise(BenchSheet sheet, IReadOnlyList<(Material Material, double Probability)> candidates,
        Func<Material, int>? groupOf = null)
    {
        if (candidates.Count < 2) return null;
        double total = candidates.Sum(c => c.Probability);
        var weighted = candidates.Select(c => (c.Material, P: c.Probability / total)).ToList();
        var tables = new OutcomeTables[weighted.Count];
        for (int i = 0; i < tables.Length; i++) tables[i] = OutcomeTables.Of(weighted[i].Material);
        var groups = groupOf is null ? null : Groups(weighted, tables, groupOf);
        double minimum = groups is null ? MinimumGainBits
            : Math.Max(MinimumGainBits, GroupEntropyShare * -groups.Sum(g => g.Share * Math.Log2(g.Share)));
        (string Test, double Gain)? best = null;
        // Never suggest weighing in water while a porous or fragile material is a serious candidate.
        bool immersionUnsafe = weighted.Any(c => c.P >= BenchWarnings.Relevant && c.Material.DoNotImmerse);
        foreach (int test in TestsNotDone(sheet, immersionUnsafe))
        {
            double gain = Between(groups, MutualInformation(weighted, tables, test), g => MutualInformation(g.Candidates, g.Tables, test));
            if (best is null || gain > best.Value.Gain + 1e-9) best = (Tests[test].Field, gain);
        }
        var look = Look(sheet, weighted, tables, groups);
        bool byGroup = groups is not null;
        if (look is { } l && l.Gain > (best?.Gain ?? 0) + 1e-9 && l.Gain >= minimum)
        {
            var (names, lines, alike) = Shown(weighted, byGroup, m => ExpectedLook(l.Features, m));
            return new NextTestAdvice
            {
                Test = BenchField.Magnification,
                GainBits = Math.Round(l.Gain, 3),
                Separates = names,
                Groups = alike,
                Expectations = lines,
                LookFor = [.. l.Features.Select(f => MagnificationVocabulary.Of(f).Name)],
                Lighting = [.. l.Features.Select(f => MagnificationVocabulary.Of(f).Lighting)],
                ByEye = l.Features.All(f => MagnificationVocabulary.Of(f).Group == GemIndex.Core.Magnification.FeatureGroup.Phenomenon),
            };
        }
        if (best is not { } chosen || chosen.Gain < minimum) return null;
        var (separates, expectations, alikeGroups) = Shown(weighted, byGroup, m => Expected(chosen.Test, m));
        return new NextTestAdvice { Test = chosen.Test, GainBits = Math.Round(chosen.Gain, 3), Separates = separates, Groups = alikeGroups, Expectations = expectations };
    }

    /// <summary>
    /// The candidates the advice names and what they would show: the leaders (<see cref="Leaders"/>), those that would
    /// show the same on one line ("ruby, heated ruby and star ruby: lines at 694.2 …"), so that the lines show what the
    /// test tells apart; when every leader would show the same, the likeliest other candidate that would not joins them,
    /// since the test's worth lies in telling them from it.
    /// </summary>
    private static (List<string> Names, List<string> Lines, List<IReadOnlyList<string>> Groups) Shown(List<(Material Material, double P)> weighted, bool byGroup, Func<Material, string> expected)
    {
        var leaders = Leaders(weighted, byGroup);
        var lines = new List<(string Outcome, List<string> Names)>();
        foreach (var (material, _) in leaders)
        {
            string outcome = expected(material);
            int at = lines.FindIndex(x => x.Outcome == outcome);
            if (at < 0) lines.Add((outcome, [material.Name]));
            else lines[at].Names.Add(material.Name);
        }
        if (lines.Count == 1)
        {
            var named = leaders.Select(c => c.Material).ToHashSet();
            foreach (var (material, _) in weighted.Where(c => !named.Contains(c.Material)).OrderByDescending(c => c.P))
            {
                string outcome = expected(material);
                if (outcome == lines[0].Outcome) continue;
                lines.Add((outcome, [material.Name]));
                break;
            }
        }
        return ([.. lines.SelectMany(x => x.Names)], [.. lines.Select(x => $"{BenchWarnings.Listed(x.Names)}: {x.Outcome}")], [.. lines.Select(x => (IReadOnlyList<string>)x.Names)]);
    }

    /// <summary>A candidate counts among the leaders the advice names when it holds at least this share (a judgement).</summary>
    private const double LeaderShare = 0.02;

    /// <summary>How many leaders the advice names.</summary>
    private const int LeaderCount = 5;

    /// <summary>
    /// The candidates the advice names with what they would show: when the test tells materials apart, the best entry of
    /// each leading species first (the test's worth lies between species, and five varieties of one species that would all
    /// show the same say nothing), then the next entries; when it tells a species' origins apart, the leading entries.
    /// </summary>
    private static List<(Material Material, double P)> Leaders(List<(Material Material, double P)> weighted, bool byGroup)
    {
        var serious = weighted.Where(c => c.P >= LeaderShare).ToList();
        if (byGroup) return [.. serious.Take(LeaderCount)];
        return [.. LeadingCandidates.Order([.. serious.Select(c => c.Material.Species)]).Take(LeaderCount).Select(i => serious[i])];
    }

    /// <summary>One group's candidates, renormalised within it, their outcome tables, and the group's share.</summary>
    private sealed record Group(double Share, List<(Material Material, double P)> Candidates, OutcomeTables[] Tables);

    /// <summary>The candidates split by group.</summary>
    private static List<Group> Groups(List<(Material Material, double P)> candidates, OutcomeTables[] tables, Func<Material, int> groupOf)
    {
        var result = new List<Group>();
        foreach (var members in Enumerable.Range(0, candidates.Count).GroupBy(i => groupOf(candidates[i].Material)))
        {
            double share = members.Sum(i => candidates[i].P);
            if (!(share > 0)) continue;
            result.Add(new Group(share, [.. members.Select(i => (candidates[i].Material, candidates[i].P / share))], [.. members.Select(i => tables[i])]));
        }
        return result;
    }

    /// <summary>
    /// The information a test gives about the groups: all of <paramref name="overall"/> without groups, otherwise less the
    /// information it gives within each group, weighted by the group's share (the chain rule of mutual information).
    /// </summary>
    private static double Between(List<Group>? groups, double overall, Func<Group, double> within)
    {
        if (groups is null) return overall;
        double inside = 0;
        foreach (var g in groups) if (g.Candidates.Count > 1) inside += g.Share * within(g);
        return Math.Max(0, overall - inside);
    }


    /// <summary>
    /// The most informative look under magnification among the features not yet looked for: the single feature with the
    /// largest gain, joined by a second when looking for both adds at least <see cref="MinimumGainBits"/> (features are
    /// independent given the material, as in the likelihood, so the pair's outcomes are the four seen/not-seen pairs).
    /// </summary>
    private static (MagnificationFeature[] Features, double Gain)? Look(BenchSheet sheet, List<(Material Material, double P)> candidates, OutcomeTables[] tables,
        List<Group>? groups)
    {
        double Information(int f, int g) => Between(groups, LookInformation(candidates, tables, f, g), x => LookInformation(x.Candidates, x.Tables, f, g));
        var done = sheet.Magnification is { } m ? m.Present.Concat(m.Absent).ToHashSet() : [];
        var open = new List<int>();
        for (int f = 0; f < MagnificationVocabulary.All.Count; f++)
            if (!done.Contains(MagnificationVocabulary.All[f].Feature) && (sheet.Transparency != StoneTransparency.Opaque || MagnificationVocabulary.All[f].SeenOnTheSurface)
                && !(sheet.Cut == StoneCut.Cabochon && MagnificationVocabulary.NeedFacets.Contains(MagnificationVocabulary.All[f].Feature)))
                open.Add(f);
        if (open.Count == 0) return null;
        // Of equal gains the first is kept (as MaxBy does).
        int first = open[0];
        double firstGain = Information(first, -1);
        for (int i = 1; i < open.Count; i++)
        {
            double gain = Information(open[i], -1);
            if (gain.CompareTo(firstGain) > 0) (first, firstGain) = (open[i], gain);
        }
        int second = -1;
        double secondGain = 0;
        foreach (int g in open)
        {
            if (g == first) continue;
            double gain = Information(first, g);
            if (second < 0 || gain.CompareTo(secondGain) > 0) (second, secondGain) = (g, gain);
        }
        var firstFeature = MagnificationVocabulary.All[first].Feature;
        // A single feature left to look for has no partner: it is the look.
        if (second < 0) return ([firstFeature], firstGain);
        return secondGain >= firstGain + MinimumGainBits
            ? ([firstFeature, MagnificationVocabulary.All[second].Feature], secondGain)
            : ([firstFeature], firstGain);
    }

    /// <summary>
    /// I(material; outcome) for looking for feature <paramref name="f"/> alone (<paramref name="g"/> &lt; 0: seen or not),
    /// or for f and g together (the four seen/not-seen pairs, f's answer first); features are independent given the material.
    /// </summary>
    private static double LookInformation(List<(Material Material, double P)> candidates, OutcomeTables[] tables, int f, int g)
    {
        int outcomes = g < 0 ? 2 : 4;
        Span<double> marginal = stackalloc double[4];
        Span<double> q = stackalloc double[4];
        marginal.Clear();
        for (int c = 0; c < candidates.Count; c++)
        {
            LookOutcomes(tables[c], f, g, q);
            double p = candidates[c].P;
            for (int o = 0; o < outcomes; o++) marginal[o] += p * q[o];
        }
        double information = 0;
        for (int c = 0; c < candidates.Count; c++)
        {
            LookOutcomes(tables[c], f, g, q);
            double p = candidates[c].P;
            for (int o = 0; o < outcomes; o++)
                if (q[o] > 0) information += p * q[o] * Math.Log2(q[o] / marginal[o]);
        }
        return Math.Max(0, information);
    }

    private static void LookOutcomes(OutcomeTables t, int f, int g, Span<double> q)
    {
        double a = t.Seen[f];
        if (g < 0) { q[0] = a; q[1] = 1 - a; return; }
        double b = t.Seen[g];
        q[0] = a * b;
        q[1] = a * (1 - b);
        q[2] = (1 - a) * b;
        q[3] = (1 - a) * (1 - b);
    }

    /// <summary>A look is said to be likely, possible or not expected at these chances of seeing it (docs/ranking.md §5).</summary>
    private const double LikelyLook = 0.5, PossibleLook = 0.1;

    private static string ExpectedLook(MagnificationFeature[] features, Material m) => string.Join(", ", features.Select(f =>
    {
        double p = MagnificationEvidence.ProbabilityOfSeeing(m.MagnificationProfile, f);
        string name = MagnificationVocabulary.Of(f).Name;
        return p >= LikelyLook ? $"{name} likely" : p >= PossibleLook ? $"{name} possible" : $"{name} not expected";
    }));

    /// <summary>The tests the advisor weighs, in the order it weighs them (of equal gains the first is kept).</summary>
    private static readonly (string Field, Func<Material, IEnumerable<(long, double)>> Outcomes)[] Tests =
    [
        (BenchField.Refractometer, Refractometer),
        (BenchField.Sg, SpecificGravity),
        (BenchField.Polariscope, Polariscope),
        (BenchField.Pleochroism, Pleochroism),
        (BenchField.Dispersion, Dispersion),
        (BenchField.ThermalProbe, m => Binary(EvidenceLikelihood.ThermalPositive(m))),
        (BenchField.Electrical, m => Binary(EvidenceLikelihood.ElectricalConductive(m))),
        (BenchField.UvLong, m => Fluorescence(m.UvLong)),
        (BenchField.UvShort, m => Fluorescence(m.UvShort)),
        (BenchField.Absorption, Absorption),
    ];

    /// <summary>Indices into <see cref="Tests"/> of the tests not on the sheet.</summary>
    private static IEnumerable<int> TestsNotDone(BenchSheet s, bool immersionUnsafe)
    {
        // An opaque stone lets no light through: the polariscope, the dichroscope and fire have nothing to show, whatever
        // the candidates would show in a clear piece. The hand spectroscope stays: it is read by reflected light too
        // (turquoise's band near 432 nm).
        bool lightPasses = s.Transparency != StoneTransparency.Opaque;
        if (s.Refractometer is null) yield return 0;
        if (s.SpecificGravity is null && s.HeavyLiquids.Count == 0 && !immersionUnsafe) yield return 1;
        if (s.Polariscope is null && lightPasses) yield return 2;
        if (s.Pleochroism is null && lightPasses) yield return 3;
        if (s.Dispersion is null && lightPasses) yield return 4;
        if (s.ThermalProbe is null) yield return 5;
        if (s.Electrical is null) yield return 6;
        if (s.UvLong is null) yield return 7;
        if (s.UvShort is null) yield return 8;
        if (s.AbsorptionLinesNanometres is null) yield return 9;
    }

    /// <summary>
    /// Σ_m Σ_o π(m) P(o|m) log₂(P(o|m)/P(o)) for one test, from the materials' outcome tables. P(o) is added up in the
    /// candidates' order in a pooled array indexed by the outcome's slot; the slots used are zeroed first.
    /// </summary>
    private static double MutualInformation(List<(Material Material, double P)> candidates, OutcomeTables[] tables, int test)
    {
        int size = 0;
        for (int c = 0; c < candidates.Count; c++) size = Math.Max(size, tables[c].SlotCount[test]);
        double[] marginal = System.Buffers.ArrayPool<double>.Shared.Rent(Math.Max(size, 1));
        try
        {
            for (int c = 0; c < candidates.Count; c++)
                foreach (int slot in tables[c].Slots[test]) marginal[slot] = 0;
            return MutualInformation(candidates, tables, test, marginal);
        }
        finally
        {
            System.Buffers.ArrayPool<double>.Shared.Return(marginal);
        }
    }

    private static double MutualInformation(List<(Material Material, double P)> candidates, OutcomeTables[] tables, int test, double[] marginal)
    {
        for (int c = 0; c < candidates.Count; c++)
        {
            double p = candidates[c].P;
            int[] slots = tables[c].Slots[test];
            double[] q = tables[c].Probabilities[test];
            for (int t = 0; t < slots.Length; t++) marginal[slots[t]] += p * q[t];
        }
        double information = 0;
        for (int c = 0; c < candidates.Count; c++)
        {
            double p = candidates[c].P;
            int[] slots = tables[c].Slots[test];
            double[] q = tables[c].Probabilities[test];
            for (int t = 0; t < slots.Length; t++)
                if (q[t] > 0) information += p * q[t] * Math.Log2(q[t] / marginal[slots[t]]);
        }
        return Math.Max(0, information);
    }

    /// <summary>
    /// A material's possible answers to each test, worked out once per material rather than once per stone: every test's
    /// outcomes as the outcome functions below give them, in their order, each outcome's key replaced by a slot number
    /// shared by all materials; and the chance of seeing each magnification feature.
    /// </summary>
    private sealed class OutcomeTables
    {
        private static readonly System.Runtime.CompilerServices.ConditionalWeakTable<Material, OutcomeTables> Known = new();
        private static readonly Dictionary<long, int>[] KeySlots = [.. Tests.Select(_ => new Dictionary<long, int>())];

        private OutcomeTables(Material m)
        {
            Slots = new int[Tests.Length][];
            Probabilities = new double[Tests.Length][];
            SlotCount = new int[Tests.Length];
            for (int test = 0; test < Tests.Length; test++)
            {
                var outcomes = Tests[test].Outcomes(m).ToList();
                Slots[test] = new int[outcomes.Count];
                Probabilities[test] = new double[outcomes.Count];
                var keys = KeySlots[test];
                lock (keys)
                    for (int t = 0; t < outcomes.Count; t++)
                    {
                        if (!keys.TryGetValue(outcomes[t].Item1, out int slot)) keys[outcomes[t].Item1] = slot = keys.Count;
                        Slots[test][t] = slot;
                        Probabilities[test][t] = outcomes[t].Item2;
                        SlotCount[test] = Math.Max(SlotCount[test], slot + 1);
                    }
            }
            Seen = [.. MagnificationVocabulary.All.Select(i => MagnificationEvidence.ProbabilityOfSeeing(m.MagnificationProfile, i.Feature))];
        }

        public static OutcomeTables Of(Material m) => Known.GetValue(m, material => new OutcomeTables(material));

        /// <summary>Per test, each outcome's slot.</summary>
        public int[][] Slots { get; }

        /// <summary>Per test, each outcome's probability.</summary>
        public double[][] Probabilities { get; }

        /// <summary>Per test, one more than the largest slot used.</summary>
        public int[] SlotCount { get; }

        /// <summary>P(seen | looked for) of each feature, in the vocabulary's order.</summary>
        public double[] Seen { get; }
    }

    private static IEnumerable<(long, double)> Binary(double pFirst) => [(0, pFirst), (1, 1 - pFirst)];

    /// <summary>σ of an SG reading in the advice's outcomes (judgement, docs/ranking.md §5).</summary>
    internal const double SpecificGravityOutcomeSigma = 0.01;

    /// <summary>Width of the advice's SG outcome bins (judgement, docs/ranking.md §5).</summary>
    internal const double SpecificGravityOutcomeBin = 0.03;

    /// <summary>σ of the lowest index against the liquid's limit in the advice's "over the limit" outcome (judgement, docs/ranking.md §5).</summary>
    internal const double OverLimitOutcomeSigma = 0.002;

    /// <summary>Above this chance of "over the limit" the advice takes the refractometer as always over it (judgement, docs/ranking.md §5).</summary>
    internal const double CertainlyOverLimit = 0.999;

    /// <summary>σ of an edge reading in the advice's refractometer outcomes (judgement, docs/ranking.md §5).</summary>
    internal const double RefractometerOutcomeSigma = 0.0015;

    /// <summary>Width of the advice's bins for the lowest index and the birefringence (judgement, docs/ranking.md §5).</summary>
    internal const double RefractometerOutcomeBin = 0.004;

    private static IEnumerable<(long, double)> SpecificGravity(Material m) =>
        Binned(m.SpecificGravity, SpecificGravityOutcomeSigma, SpecificGravityOutcomeBin, 0, m.SpecificGravityUsual);

    private static IEnumerable<(long, double)> Refractometer(Material m)
    {
        var lowest = m.Indices.Lowest;
        double over = RangeLikelihood.ProbabilityAbove(RefractometerObservation.DefaultLiquidLimit, lowest, OverLimitOutcomeSigma);
        if (over > CertainlyOverLimit) return [(-1, 1)];
        // Readable: the lowest index binned, times the birefringence binned (RefractometerOutcomeBin, RefractometerOutcomeSigma).
        var birefringence = RefractometerEvidence.BirefringenceRange(m);
        var indexBins = Binned(lowest, RefractometerOutcomeSigma, RefractometerOutcomeBin, 0).ToList();
        var birefringenceBins = Binned(birefringence, RefractometerOutcomeSigma, RefractometerOutcomeBin, 0).ToList();
        var result = new List<(long, double)> { (-1, over) };
        foreach (var (i, p) in indexBins)
            foreach (var (b, q) in birefringenceBins)
                result.Add((i * 1000 + b + 1, (1 - over) * p * q));
        return result;
    }

    /// <summary>Probability of each bin of width <paramref name="width"/> for a reading with noise σ of a value in the range.</summary>
    private static IEnumerable<(long, double)> Binned(PropertyRange range, double sigma, double width, long offset, PropertyRange? usual = null)
    {
        long first = (long)Math.Floor((range.Minimum - 3 * sigma) / width), last = (long)Math.Floor((range.Maximum + 3 * sigma) / width);
        for (long k = first; k <= last; k++)
        {
            double p = UsualPart.Mixed(range, usual, r => RangeLikelihood.ProbabilityAbove(k * width, r, sigma) - RangeLikelihood.ProbabilityAbove((k + 1) * width, r, sigma));
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

    private static IEnumerable<(long, double)> Dispersion(Material m) => EvidenceLikelihood.FireToJudge(m) is { } d
        ? EvidenceLikelihood.DispersionRow(EvidenceLikelihood.DispersionBand(d)).Select((p, o) => ((long)o, p))
        : Enumerable.Range(0, 5).Select(o => ((long)o, 0.2));

    private static IEnumerable<(long, double)> Fluorescence(IReadOnlyList<FluorescenceStrength> usual) => usual.Count == 0
        ? Enumerable.Range(0, 4).Select(o => ((long)o, 0.25))
        : Enumerable.Range(0, 4).Select(o => ((long)o, EvidenceLikelihood.FluorescenceProbability(usual, (FluorescenceStrength)o)));

    // Which listed lines are seen, each with its own detection probability from its strength (the likelihood's model).
    private static IEnumerable<(long, double)> Absorption(Material m) => AbsorptionLines.Outcomes(m.AbsorptionLines);

    /// <summary>What an opaque entry shows in the polariscope: dark throughout, which is easily written down wrongly.</summary>
    internal const string OpaqueInPolariscope = "stays dark throughout, opaque — no reaction to read (not 'singly refractive')";

    /// <summary>What an opaque entry shows in the dichroscope, or as fire: no light through it.</summary>
    internal const string OpaqueExpectation = "opaque — no light through it, nothing to read";

    private static string Expected(string test, Material m) => test switch
    {
        BenchField.Sg => $"SG {m.SpecificGravity.ToString("0.00")}" + (m.SpecificGravityUsual is { } usual ? $" (usually {usual.ToString("0.00")})" : ""),
        BenchField.Refractometer => m.Indices.Lowest.Minimum > RefractometerObservation.DefaultLiquidLimit
            ? "over the limit"
            : string.Join(", ", m.Indices.Named().Select(x => $"{x.Name} {x.Range.ToString("0.000")}")),
        // An opaque entry's outcome table is flat (the test cannot be taken), so it expects no reaction either.
        BenchField.Polariscope when m.IsOpaque => OpaqueInPolariscope,
        BenchField.Pleochroism or BenchField.Dispersion when m.IsOpaque => OpaqueExpectation,
        BenchField.Polariscope => string.Join(" or ", EvidenceLikelihood.UsualReactions(m).Select(EvidenceLikelihood.Word)),
        BenchField.Pleochroism => m.OpticCharacter is OpticCharacter.Uniaxial or OpticCharacter.Biaxial && m.Pleochroism != PleochroismStrength.None ? $"{EvidenceLikelihood.Word(m.Pleochroism)} pleochroism" : "no pleochroism",
        BenchField.Dispersion => m.Dispersion is { } d ? $"nG − nB {d.ToString("0.000", CultureInfo.InvariantCulture)} ({EvidenceLikelihood.Word(EvidenceLikelihood.DispersionBand(d))})" : "not known",
        BenchField.ThermalProbe => EvidenceLikelihood.Word(m.ThermalProbe),
        BenchField.Electrical => EvidenceLikelihood.Word(m.Electrical),
        BenchField.UvLong => m.UvLong.Count == 0 ? "not known" : string.Join(" or ", m.UvLong.Select(EvidenceLikelihood.Word)),
        BenchField.UvShort => m.UvShort.Count == 0 ? "not known" : string.Join(" or ", m.UvShort.Select(EvidenceLikelihood.Word)),
        BenchField.Absorption => m.AbsorptionLinesNanometres.Count == 0 ? "no diagnostic lines" : "lines at " + string.Join(", ", m.AbsorptionLinesNanometres.Order().Select(l => l.ToString("0.#", CultureInfo.InvariantCulture))) + " nm",   // along the spectrum, as the scale reads
        _ => "",
    };
}
