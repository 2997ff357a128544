namespace GemIndex.Core.Identification;

/// <summary>
/// The ranked candidates in the order that sets the rivals side by side: the best entry of each species first (in the
/// answer's order), then the next entries. Three varieties of one species share its ranges and its reasons, so the
/// reasons written out and the scales drawn take the candidates in this order.
/// </summary>
public static class LeadingCandidates
{
    /// <summary>Positions in the answer's list of candidates of these species, the best entry of each species first.</summary>
    public static int[] Order(IReadOnlyList<string> species)
    {
        var seen = new HashSet<string>(StringComparer.Ordinal);
        var firsts = new List<int>();
        var rest = new List<int>();
        for (int i = 0; i < species.Count; i++) (seen.Add(species[i]) ? firsts : rest).Add(i);
        return [.. firsts, .. rest];
    }

    /// <summary>The same for a result's candidates.</summary>
    public static int[] Order(IReadOnlyList<RankedCandidate> candidates) => Order([.. candidates.Select(c => c.Material.Species)]);

    /// <summary>
    /// Which candidates have their reasons written: the first <paramref name="count"/> of <see cref="Order(IReadOnlyList{string})"/>,
    /// those the answers list (<paramref name="listed"/>, when given) before the rest: reasons for an entry no front end
    /// shows are words nobody reads.
    /// </summary>
    public static bool[] Explained(IReadOnlyList<string> species, int count, IReadOnlyList<bool>? listed = null)
    {
        var explained = new bool[species.Count];
        int[] order = Order(species);
        IEnumerable<int> first = listed is null ? order : [.. order.Where(i => listed[i]), .. order.Where(i => !listed[i])];
        foreach (int i in first.Take(count)) explained[i] = true;
        return explained;
    }

    /// <summary>The same for a result's candidates, those the answers list (the leader and each holding <see cref="ListedShare"/>) first.</summary>
    public static bool[] Explained(IReadOnlyList<RankedCandidate> candidates, int count) =>
        Explained([.. candidates.Select(c => c.Material.Species)], count, [.. candidates.Select((c, i) => IsListed(i, c.Confidence))]);

    /// <summary>
    /// The words for the ranks a list leaves out between its first and its last row (entries below
    /// <see cref="ListedShare"/> that the species-first order puts before a listed one), or null when the ranks run on:
    /// "Rank 4 is not listed (below 0.05 %)." A rank missing without a word reads as a row lost.
    /// </summary>
    public static string? UnlistedNote(IReadOnlyList<int> listedRanks)
    {
        if (listedRanks.Count == 0) return null;
        var listed = listedRanks.ToHashSet();
        List<int> missing = [.. Enumerable.Range(1, listedRanks.Max()).Where(r => !listed.Contains(r))];
        if (missing.Count == 0) return null;
        string share = (ListedShare * 100).ToString("0.0#", System.Globalization.CultureInfo.InvariantCulture);
        return missing.Count == 1 ? $"Rank {missing[0]} is not listed (below {share} %)."
            : $"Ranks {BenchWarnings.Listed([.. missing.Select(r => r.ToString(System.Globalization.CultureInfo.InvariantCulture))])} are not listed (each below {share} %).";
    }

    /// <summary>Whether a candidate at this position with this share is listed when something fits.</summary>
    public static bool IsListed(int position, double confidence) => position == 0 || confidence >= ListedShare;

    /// <summary>
    /// Whether a list in the answer's order needs species headings: when it holds several species and the species-first
    /// order puts a larger share after a smaller one (a rival species after the leader's many varieties). A list already
    /// in order of share reads right without them.
    /// </summary>
    public static bool NeedsSpeciesHeadings(IReadOnlyList<RankedCandidate> candidates) =>
        candidates.Select(c => c.Material.Species).Distinct().Skip(1).Any()
        && candidates.Zip(candidates.Skip(1)).Any(p => p.Second.Confidence > p.First.Confidence && p.Second.Confidence >= VisibleShare);

    /// <summary>
    /// The least share an answer lists a candidate or a species at: what rounds to 0.1 % (a judgement: below it the line
    /// would print as "&lt;0.1 %", and a peridot's list would end with a heated ruby at 10⁻⁴⁰). docs/ranking.md §3,
    /// "Listed candidates".
    /// </summary>
    public const double ListedShare = 0.0005;

    /// <summary>
    /// Positions, in the answer's order, of the candidates every front end lists: the leader always, each other holding
    /// <see cref="ListedShare"/> or more; every one when nothing fits (the list is then only the least bad, and all of it
    /// is what the readings leave). The result document keeps every candidate.
    /// </summary>
    public static int[] Listed(IReadOnlyList<RankedCandidate> candidates, bool noGoodMatch) =>
        [.. Enumerable.Range(0, candidates.Count).Where(i => noGoodMatch || IsListed(i, candidates[i].Confidence))];

    /// <summary>The same for a result.</summary>
    public static int[] Listed(IdentificationResult result) => Listed(result.Candidates, result.NoGoodMatch);

    /// <summary>Whether an answer lists a species of this total: the leading species always, every one when nothing fits.</summary>
    public static bool SpeciesListed(int position, double total, bool noGoodMatch) => noGoodMatch || IsListed(position, total);

    /// <summary>Shares below this print as "&lt;1%": their order among themselves is not seen, so it needs no heading.</summary>
    public const double VisibleShare = 0.005;
}
