using GemIndex.Core.Catalogue;

namespace GemIndex.Data.Catalogue;

/// <summary>Names of catalogue entries (or species) as the side tables (magnification, trade rules) key them.</summary>
internal static class EntryNames
{
    /// <summary>The given names that are not entries of the catalogue, sorted (ordinal, as the catalogue names entries).</summary>
    public static IReadOnlyList<string> Unmatched(IEnumerable<string> names, IEnumerable<Material> catalogue) =>
        Unmatched(names, catalogue, m => m.Name);

    /// <summary>The given names that no catalogue entry carries as <paramref name="key"/> (its name, its species), sorted.</summary>
    public static IReadOnlyList<string> Unmatched(IEnumerable<string> names, IEnumerable<Material> catalogue, Func<Material, string> key)
    {
        var known = catalogue.Select(key).ToHashSet(StringComparer.Ordinal);
        return [.. names.Where(n => !known.Contains(n)).Order(StringComparer.Ordinal)];
    }
}
