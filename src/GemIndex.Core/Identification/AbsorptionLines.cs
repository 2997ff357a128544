using GemIndex.Core.Catalogue;

namespace GemIndex.Core.Identification;

/// <summary>
/// The likelihood of the lines seen in a hand spectroscope under a material's listed lines (docs/ranking.md §2): each
/// listed line is seen with a probability set by its strength, at its wavelength with the instrument's error; a seen
/// line no listed line explains is spurious (a Poisson rate of stray lines, anywhere in the visible). Seen lines are
/// paired with listed ones greedily, nearest first, within four standard deviations. Listed lines no farther apart than
/// the instrument's resolution are seen as one line (ruby's 694.2 / 692.8 nm doublet is written "694"): one seen line
/// stands for all of them, and those left unpaired beside a paired one are not counted as missed.
/// </summary>
internal static class AbsorptionLines
{
    /// <summary>A hand spectroscope's error on a line's position, about 2 nm (its resolution; common practice).</summary>
    public const double PositionSigmaNanometres = 2;

    /// <summary>Listed lines this close or closer read as one line in a hand spectroscope: its resolution, as <see cref="PositionSigmaNanometres"/>.</summary>
    public const double ResolutionNanometres = PositionSigmaNanometres;

    /// <summary>Mean number of stray lines a reading shows on a stone that has none listed (a judgement: faint bands, mis-seen Fraunhofer lines).</summary>
    public const double SpuriousLineRate = 0.1;

    /// <summary>"Not in the catalogue": lines anywhere in 400–700 nm, one a stone on average (a judgement).</summary>
    public const double BroadLineRate = 1;

    /// <summary>The visible span a line may be seen in, nm.</summary>
    private const double VisibleSpanNanometres = 300;

    /// <summary>P(a strong listed line is seen) (judgement, docs/ranking.md §2).</summary>
    public const double StrongLineDetection = 0.95;

    /// <summary>P(a moderate listed line is seen) (judgement, docs/ranking.md §2).</summary>
    public const double ModerateLineDetection = 0.7;

    /// <summary>P(a weak listed line is seen) (judgement, docs/ranking.md §2).</summary>
    public const double WeakLineDetection = 0.3;

    /// <summary>A seen line is paired with a listed one only within this many σ of it (judgement, docs/ranking.md §2).</summary>
    public const double PairingSigmas = 4;

    /// <summary>The advice's line outcomes name a line by its wavelength rounded to this many nm (judgement, docs/ranking.md §5).</summary>
    public const double OutcomeRoundingNanometres = 5;

    /// <summary>The advice weighs at most this many line groups of an entry (judgement, docs/ranking.md §5).</summary>
    public const int OutcomeGroupLimit = 10;

    /// <summary>P(a listed line is seen | its strength): strong 0.95, moderate 0.7, weak 0.3 (judgements; docs/ranking.md §2).</summary>
    public static double Detection(LineStrength strength) => strength switch
    {
        LineStrength.Strong => StrongLineDetection,
        LineStrength.Moderate => ModerateLineDetection,
        _ => WeakLineDetection,
    };

    /// <summary>
    /// ln p(seen lines | listed lines); counts the seen lines left unexplained and the strong lines missed. A group of
    /// listed lines within the instrument's resolution shows as one line, so it is missed as one line, with the detection
    /// of its strongest member (<see cref="GroupDetection"/>), once.
    /// </summary>
    public static double LogLikelihood(IReadOnlyList<AbsorptionLine> listed, IReadOnlyList<double> seen, out int unexplained, out int missedStrong) =>
        LogLikelihood(listed, Groups(listed), seen, SpuriousLineRate, out unexplained, out missedStrong);

    /// <summary>The same, with the listed lines' groups (<see cref="Groups"/>) worked out once per catalogue entry.</summary>
    internal static double LogLikelihood(IReadOnlyList<AbsorptionLine> listed, IReadOnlyList<int[]> groups, IReadOnlyList<double> seen,
        double rate, out int unexplained, out int missedStrong)
    {
        var matched = Pair(listed, seen);
        double log = -rate;
        missedStrong = 0;
        unexplained = seen.Count;
        for (int i = 0; i < listed.Count; i++)
        {
            if (matched[i] is not { } x) continue;
            unexplained--;
            double z = (x - listed[i].Nanometres) / PositionSigmaNanometres;
            log += -0.5 * z * z - Math.Log(PositionSigmaNanometres * Math.Sqrt(2 * Math.PI));
        }
        // Each group is one line to the instrument: seen (any member paired) or missed, once, by the same chance.
        foreach (int[] group in groups)
        {
            double seenChance = GroupDetection(listed, group);
            if (group.Any(i => matched[i] is not null)) { log += Math.Log(seenChance); continue; }
            log += Math.Log(1 - seenChance);
            if (group.Any(i => listed[i].Strength == LineStrength.Strong)) missedStrong++;
        }
        return log + unexplained * Math.Log(rate / VisibleSpanNanometres);
    }

    /// <summary>
    /// The rate of lines seen on a coloured entry that lists none (docs/ranking.md §2, absorption lines): most such entries
    /// carry no spectrum in the catalogue at all, which does not say the material shows none, so a line seen there is
    /// likelier than a stray on an entry whose lines are listed. Fitted on the independent benchmark (0.3 against 0.1 and
    /// 0.6). A colourless entry has no chromophore to give a line: a line seen on it is a stray.
    /// </summary>
    public const double NoLinesListedRate = 0.3;

    /// <summary>The rate of seen lines no listed line explains, for an entry: <see cref="SpuriousLineRate"/>, or <see cref="NoLinesListedRate"/> for a coloured entry that lists none.</summary>
    internal static double UnexplainedLineRate(Material material, IReadOnlyList<string> hues) =>
        material.AbsorptionLines.Count == 0 && !(hues.Count > 0 && hues.All(h => h == "colourless")) ? NoLinesListedRate : SpuriousLineRate;

    /// <summary>
    /// P(a group of lines the instrument shows as one is seen): its strongest member's detection (a judgement; docs/ranking.md
    /// §2). Taking each member as its own chance made ruby's blue pair, two moderate lines 1.5 nm apart, seen nine times
    /// in ten, and a red corundum whose blue lines were not seen then ranked pink sapphire above ruby.
    /// </summary>
    public static double GroupDetection(IReadOnlyList<AbsorptionLine> listed, int[] group) => group.Max(i => Detection(listed[i].Strength));

    /// <summary>The listed lines seen as one with this one: every line linked to it by steps no longer than the resolution.</summary>
    private static int[] Group(IReadOnlyList<AbsorptionLine> listed, int line)
    {
        var members = new List<int> { line };
        for (int k = 0; k < members.Count; k++)
            for (int j = 0; j < listed.Count; j++)
                if (!members.Contains(j) && Math.Abs(listed[j].Nanometres - listed[members[k]].Nanometres) <= ResolutionNanometres)
                    members.Add(j);
        return [.. members];
    }

    /// <summary>The listed lines as the instrument shows them: groups of lines seen as one (each line in exactly one group).</summary>
    public static IReadOnlyList<int[]> Groups(IReadOnlyList<AbsorptionLine> listed)
    {
        var groups = new List<int[]>();
        var placed = new bool[listed.Count];
        for (int i = 0; i < listed.Count; i++)
        {
            if (placed[i]) continue;
            int[] group = Group(listed, i);
            foreach (int j in group) placed[j] = true;
            groups.Add(group);
        }
        return groups;
    }

    /// <summary>ln p(seen lines | not in the catalogue): Poisson count, uniform positions.</summary>
    public static double LogBroad(IReadOnlyList<double> seen) => -BroadLineRate + seen.Count * Math.Log(BroadLineRate / VisibleSpanNanometres);

    /// <summary>For each listed line, the seen line paired with it (nearest pairs first, within 4σ), or null.</summary>
    private static double?[] Pair(IReadOnlyList<AbsorptionLine> listed, IReadOnlyList<double> seen)
    {
        var result = new double?[listed.Count];
        var used = new bool[seen.Count];
        if (listed.Count == 0 || seen.Count == 0) return result;
        // The candidate pairs nearest first, equal distances in the order found (a stable insertion sort: few pairs).
        var pairs = new (double Distance, int Listed, int Seen)[listed.Count * seen.Count];
        int count = 0;
        for (int i = 0; i < listed.Count; i++)
            for (int j = 0; j < seen.Count; j++)
            {
                double distance = Math.Abs(listed[i].Nanometres - seen[j]);
                if (!(distance <= PairingSigmas * PositionSigmaNanometres)) continue;
                int at = count++;
                while (at > 0 && pairs[at - 1].Distance > distance) { pairs[at] = pairs[at - 1]; at--; }
                pairs[at] = (distance, i, j);
            }
        for (int p = 0; p < count; p++)
        {
            var (_, i, j) = pairs[p];
            if (result[i] is null && !used[j]) { result[i] = seen[j]; used[j] = true; }
        }
        return result;
    }

    /// <summary>
    /// The outcomes a look through the spectroscope can have for this material and their probabilities, for the next-test
    /// advice: which of the lines the instrument shows are seen (a group of lines within its resolution is one line, seen
    /// when any of them is; its wavelength, the group's first, rounded to 5 nm, so materials sharing a line share the outcome).
    /// </summary>
    public static IEnumerable<(long Outcome, double Probability)> Outcomes(IReadOnlyList<AbsorptionLine> listed)
    {
        var groups = Groups(listed);
        int n = Math.Min(groups.Count, OutcomeGroupLimit);
        double[] detection = [.. groups.Take(n).Select(g => GroupDetection(listed, g))];
        for (int mask = 0; mask < 1 << n; mask++)
        {
            double p = 1;
            long key = 17;
            for (int g = 0; g < n; g++)
            {
                bool seen = (mask & (1 << g)) != 0;
                p *= seen ? detection[g] : 1 - detection[g];
                if (seen) key = key * 131 + (long)Math.Round(listed[groups[g][0]].Nanometres / OutcomeRoundingNanometres);
            }
            yield return (key, p);
        }
    }
}
