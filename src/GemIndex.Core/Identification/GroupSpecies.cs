namespace GemIndex.Core.Identification;

/// <summary>
/// Species of one mineral group that the answer leaves open (elbaite, uvite and dravite of the tourmalines), likeliest
/// first, with the group's total over the whole catalogue.
/// </summary>
/// <param name="Group">The mineral group ("tourmaline").</param>
/// <param name="Total">The posterior total of every species of the group.</param>
/// <param name="Species">The species that each hold at least <see cref="BenchWarnings.VarietyShare"/> of the total.</param>
public sealed record GroupSpecies(string Group, double Total, IReadOnlyList<string> Species)
{
    /// <summary>The place of a species among <see cref="Species"/>, or −1: the advisor's key for telling them apart.</summary>
    public int IndexOf(string species)
    {
        for (int k = 0; k < Species.Count; k++)
            if (Species[k] == species) return k;
        return -1;
    }
}
