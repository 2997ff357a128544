using GemIndex.Core.Catalogue;

namespace GemIndex.Core.Identification;

/// <summary>
/// Keeps the origin split under a species honest (docs/ranking.md §3, "Origin within a species"). A natural entry's ranges
/// are the union of many deposits' stones, a synthetic's or a treated one's often one producer's few: a reading inside both
/// is far denser under the narrow entry, though nothing in it is unusual for either, so the likelihood's densities would
/// call a typical emerald's readings "hydrothermal synthetic" at 89 %. So, unless the tests other than colour decide the
/// origin (the readings are atypical of every other origin's entries), the species' total is split among its origins by
/// each entry's prior times its likelihood with every range counted by its tail (<see
/// cref="CandidateEvaluation.LogRatioInRange"/>: inside a range alike however narrow), and the leading origin is held to at most <see cref="Cap"/> when a serious
/// alternative remains, the rest going to those alternatives by what the tests say of each. Within an origin the entries keep the
/// ratios of their posteriors. The species' total does not change.
/// </summary>
internal static class OriginBalance
{
    /// <summary>
    /// The most an origin may hold of its species when no test decided it: held below the 80 % at which an origin reads as
    /// a confident call (a judgement; docs/ranking.md §3, origin within a species).
    /// </summary>
    public const double Cap = 0.75;

    /// <summary>
    /// When the tests other than colour, with every origin equally likely and each weighed by its best entry (ranges by
    /// their tails), give the posterior's leading origin this much, they decide it (a judgement; docs/ranking.md §3).
    /// </summary>
    public const double Decided = 0.8;

    /// <summary>
    /// An origin whose catalogue share is below this fraction of the leading origin's is not a serious alternative (a
    /// natural moissanite beside the synthetic): it neither triggers the cap nor receives its mass (a judgement: one
    /// frequency class in four, very rare against very common).
    /// </summary>
    public const double SeriousShare = 1 / 16.0;

    /// <summary>
    /// Species below this total are left as the likelihood has them: no answer lists them (<see
    /// cref="LeadingCandidates.ListedShare"/>), and the ranges' tails cost each entry its fit.
    /// </summary>
    public const double Balanced = LeadingCandidates.ListedShare;

    /// <summary>Adjusts <paramref name="posterior"/> in place, species by species.</summary>
    /// <param name="materials">The catalogue.</param>
    /// <param name="species">The entries of each species whose entries differ in origin, in catalogue order (made once per catalogue).</param>
    /// <param name="posterior">Each entry's posterior (sums to 1 with "not in the catalogue").</param>
    /// <param name="logPrior">Each entry's log prior.</param>
    /// <param name="evaluated">Each entry's evaluation with its tails (worked out only for the species balanced).</param>
    public static void Apply(Material[] materials, int[][] species, double[] posterior, double[] logPrior, Func<int, CandidateEvaluation> evaluated)
    {
        foreach (int[] entries in species)
        {
            double total = entries.Sum(i => posterior[i]);
            if (total < Balanced) continue;
            var posteriorShare = Totals(entries, i => posterior[i], materials);
            var leading = posteriorShare.MaxBy(kv => kv.Value).Key;
            if (TestsAlone(entries, materials, i => evaluated(i).LogRatioInRangeWithoutColour).GetValueOrDefault(leading) >= Decided) continue;
            // Not decided: the origins by prior × typicality, the leader held to the cap while a serious alternative remains.
            var weight = Totals(entries, i => Math.Exp(logPrior[i] + evaluated(i).LogRatioInRange), materials);
            double weights = weight.Values.Sum();
            if (!(weights > 0)) continue;
            var share = weight.ToDictionary(kv => kv.Key, kv => kv.Value / weights);
            var first = share.MaxBy(kv => kv.Value).Key;
            var priorShare = Totals(entries, i => Math.Exp(logPrior[i]), materials);
            var serious = priorShare.Where(kv => kv.Key != first && kv.Value >= SeriousShare * priorShare[first]).Select(kv => kv.Key).ToList();
            double alternatives = serious.Sum(o => share[o]);
            if (share[first] > Cap && alternatives > 0)
            {
                // The share held back goes to the serious alternatives by what the tests say of each (its best entry), not by
                // the catalogue's frequency judgements again: of a purple quartz's, the synthetic amethyst takes more than
                // the more common heated citrine.
                var said = TestsAlone(entries, materials, i => evaluated(i).LogRatioInRange);
                double saying = serious.Sum(o => said.GetValueOrDefault(o));
                if (!(saying > 0)) continue;
                double give = share[first] - Cap;
                share[first] = Cap;
                foreach (var origin in serious) share[origin] += give * said.GetValueOrDefault(origin) / saying;
            }
            foreach (var (origin, part) in share)
            {
                int[] members = [.. entries.Where(i => materials[i].Origin == origin)];
                // Within the origin, by the entries' own posterior, or their prior where the posterior is nil.
                double own = members.Sum(i => posterior[i]);
                double prior = members.Sum(i => Math.Exp(logPrior[i]));
                foreach (int i in members) posterior[i] = part * total * (own > 1e-300 ? posterior[i] / own : Math.Exp(logPrior[i]) / prior);
            }
        }
    }

    private static Dictionary<OriginClass, double> Totals(int[] entries, Func<int, double> value, Material[] materials)
    {
        var totals = new Dictionary<OriginClass, double>();
        foreach (int i in entries) totals[materials[i].Origin] = totals.GetValueOrDefault(materials[i].Origin) + value(i);
        return totals;
    }

    /// <summary>
    /// P(origin | tests) with every origin equally likely a priori, each origin weighed by its best entry's <paramref
    /// name="logScore"/> (a profile over the entries). Weighing an origin's entries by their shares would let the variety
    /// shares decide the origin: a blue zoisite with tanzanite's 595 nm line is explained by the one heated entry, while
    /// unheated tanzanite is a small part of natural zoisite beside thulite and ruby in zoisite. A test decides an origin
    /// only when no entry of the other origins explains the readings as well.
    /// </summary>
    private static Dictionary<OriginClass, double> TestsAlone(int[] entries, Material[] materials, Func<int, double> logScore)
    {
        double top = entries.Max(logScore);
        var best = new Dictionary<OriginClass, double>();
        if (double.IsNegativeInfinity(top)) return best;
        foreach (int i in entries)
            best[materials[i].Origin] = Math.Max(best.GetValueOrDefault(materials[i].Origin), Math.Exp(logScore(i) - top));
        double sum = best.Values.Sum();
        return best.ToDictionary(kv => kv.Key, kv => sum > 0 ? kv.Value / sum : 0);
    }
}
