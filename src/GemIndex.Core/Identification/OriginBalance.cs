using GemIndex.Core.Catalogue;

namespace GemIndex.Core.Identification;

/// <summary>
/// Keeps the origin split under a species honest (docs/ranking.md §3, "Origin within a species"). The catalogue's shares of
/// natural, synthetic and treated stones are judgements of how often each reaches a bench; when the tests themselves do not
/// separate the origins, those shares alone would put one origin above 80 %, which no bench answer can support. So when the
/// tests alone (the origins taken as equally likely) leave the leading origin below <see cref="Decided"/>, its share of
/// the species is held to at most <see cref="Cap"/> and the rest goes to the origins the catalogue holds as serious
/// alternatives, in proportion to what the tests, colour included, say of them. The species' total does not change.
/// </summary>
internal static class OriginBalance
{
    /// <summary>
    /// The most an origin may hold of its species on the catalogue's shares alone: held below the 80 % at which an origin
    /// reads as a confident call, since no test decided it (a judgement; docs/ranking.md §3, origin within a species).
    /// </summary>
    public const double Cap = 0.75;

    /// <summary>When the tests alone, with every origin equally likely, give the leading origin this much, they decide it.</summary>
    public const double Decided = 0.8;

    /// <summary>
    /// An origin whose catalogue share is below this fraction of the leading origin's is not a serious alternative (a
    /// natural moissanite beside the synthetic): it neither triggers the cap nor receives its mass (a judgement: one
    /// frequency class in four, very rare against very common).
    /// </summary>
    public const double SeriousShare = 1 / 16.0;

    /// <summary>Adjusts <paramref name="posterior"/> in place, species by species.</summary>
    /// <param name="materials">The catalogue.</param>
    /// <param name="species">The entries of each species whose entries differ in origin, in catalogue order (made once per catalogue).</param>
    /// <param name="posterior">Each entry's posterior (sums to 1 with "not in the catalogue").</param>
    /// <param name="logLikelihood">
    /// Each entry's tempered log-likelihood ratio (prior excluded) without the colour test: a catalogue's colours by
    /// origin are the usual colours of the market, so colour alone never decides an origin.
    /// </param>
    /// <param name="logPrior">Each entry's log prior.</param>
    public static void Apply(Material[] materials, int[][] species, double[] posterior, double[] logLikelihood, double[] logPrior)
    {
        foreach (int[] entries in species)
        {
            double total = entries.Sum(i => posterior[i]);
            if (total < 1e-9) continue;
            var posteriorShare = Totals(entries, i => posterior[i], materials);
            var leading = posteriorShare.MaxBy(kv => kv.Value).Key;
            if (posteriorShare[leading] / total <= Cap) continue;
            var priorShare = Totals(entries, i => Math.Exp(logPrior[i]), materials);
            var serious = priorShare.Where(kv => kv.Key != leading && kv.Value >= SeriousShare * priorShare[leading]).Select(kv => kv.Key).ToList();
            if (serious.Count == 0) continue;
            var tests = TestsAlone(entries, materials, logLikelihood);
            if (tests.GetValueOrDefault(leading) >= Decided) continue;
            // Hold the leading origin to the cap; share the rest among the serious alternatives by what the tests say of
            // each, colour included: colour may not decide an origin, but among the alternatives a purple quartz's mass goes
            // to the synthetic amethyst rather than to heated citrine.
            double keep = Cap * total, give = posteriorShare[leading] - keep;
            var said = WithColour(entries, materials, posterior, logPrior);
            bool colourSays = serious.Sum(o => said.GetValueOrDefault(o)) > 0;
            double Weight(OriginClass o) => (colourSays ? said : tests).GetValueOrDefault(o);
            double weights = serious.Sum(Weight);
            if (!(weights > 0)) continue;
            foreach (int i in entries.Where(i => materials[i].Origin == leading)) posterior[i] *= keep / posteriorShare[leading];
            foreach (var origin in serious)
            {
                double add = give * Weight(origin) / weights;
                int[] members = [.. entries.Where(i => materials[i].Origin == origin)];
                // Within the origin, by the entries' own posterior, or their prior where the posterior is nil.
                double own = members.Sum(i => posterior[i]);
                double prior = members.Sum(i => Math.Exp(logPrior[i]));
                foreach (int i in members) posterior[i] += add * (own > 1e-300 ? posterior[i] / own : Math.Exp(logPrior[i]) / prior);
            }
        }
    }

    /// <summary>
    /// What all the tests, colour included, say of each origin: its best entry's posterior over its prior (proportional to
    /// the entry's likelihood, the prior's frequency judgement taken out).
    /// </summary>
    private static Dictionary<OriginClass, double> WithColour(int[] entries, Material[] materials, double[] posterior, double[] logPrior) =>
        BestByOrigin(entries, materials, i => Math.Log(posterior[i]) - logPrior[i]);

    /// <summary>Each origin's best entry by <paramref name="logScore"/>, as a ratio to the best of all (empty when none scores).</summary>
    private static Dictionary<OriginClass, double> BestByOrigin(int[] entries, Material[] materials, Func<int, double> logScore)
    {
        double top = entries.Max(logScore);
        var best = new Dictionary<OriginClass, double>();
        if (double.IsNegativeInfinity(top)) return best;
        foreach (int i in entries)
            best[materials[i].Origin] = Math.Max(best.GetValueOrDefault(materials[i].Origin), Math.Exp(logScore(i) - top));
        return best;
    }

    private static Dictionary<OriginClass, double> Totals(int[] entries, Func<int, double> value, Material[] materials)
    {
        var totals = new Dictionary<OriginClass, double>();
        foreach (int i in entries) totals[materials[i].Origin] = totals.GetValueOrDefault(materials[i].Origin) + value(i);
        return totals;
    }

    /// <summary>
    /// P(origin | tests) with every origin equally likely a priori, each origin weighed by its best entry (a profile over
    /// the entries). Weighing an origin's entries by their shares would let the variety shares decide the origin: a blue
    /// zoisite with tanzanite's 595 nm line is explained by the one heated entry, while unheated tanzanite is a small part
    /// of natural zoisite beside thulite and ruby in zoisite, so the mixture called it treated at 89 % though no test tells
    /// heated from unheated tanzanite. A test decides an origin only when no entry of the other origins explains the readings
    /// as well.
    /// </summary>
    private static Dictionary<OriginClass, double> TestsAlone(int[] entries, Material[] materials, double[] logLikelihood)
    {
        var evidence = BestByOrigin(entries, materials, i => logLikelihood[i]);
        double sum = evidence.Values.Sum();
        return evidence.ToDictionary(kv => kv.Key, kv => sum > 0 ? kv.Value / sum : 0);
    }
}
