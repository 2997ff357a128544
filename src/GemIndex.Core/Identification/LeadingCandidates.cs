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

    /// <summary>Which candidates have their reasons written: the first <paramref name="count"/> of <see cref="Order(IReadOnlyList{string})"/>.</summary>
    public static bool[] Explained(IReadOnlyList<string> species, int count)
    {
        var explained = new bool[species.Count];
        foreach (int i in Order(species).Take(count)) explained[i] = true;
        return explained;
    }

    /// <summary>The same for a result's candidates.</summary>
    public static bool[] Explained(IReadOnlyList<RankedCandidate> candidates, int count) => Explained([.. candidates.Select(c => c.Material.Species)], count);
}
