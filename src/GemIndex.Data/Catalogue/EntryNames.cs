using GemIndex.Core.Catalogue;

namespace GemIndex.Data.Catalogue;

/// <summary>Names of catalogue entries as the side tables (magnification, trade rules) key them.</summary>
internal static class EntryNames
{
    /// <summary>The given names that are not entries of the catalogue, sorted (ordinal, as the catalogue names entries).</summary>
    public static IReadOnlyList<string> Unmatched(IEnumerable<string> names, IEnumerable<Material> catalogue)
    {
        var known = catalogue.Select(m => m.Name).ToHashSet(StringComparer.Ordinal);
        return [.. names.Where(n => !known.Contains(n)).Order(StringComparer.Ordinal)];
    }
}
