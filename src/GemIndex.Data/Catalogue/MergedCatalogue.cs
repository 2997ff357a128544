using GemIndex.Core.Catalogue;

namespace GemIndex.Data.Catalogue;

/// <summary>The catalogue a query sees: every shipped entry, then the user's own entries (IsUserEntry set).</summary>
public static class MergedCatalogue
{
    /// <summary>
    /// Loads both catalogues, building the shipped one into the cache folder first if needed; a user entry takes its
    /// species' trade rule, mineral group and magnification profile (<see cref="WithSpeciesLooks"/>).
    /// </summary>
    /// <exception cref="CatalogueFormatException">An embedded family file cannot be read.</exception>
    /// <exception cref="CatalogueStoreException">A catalogue file cannot be read.</exception>
    /// <exception cref="CatalogueSchemaVersionException">The user catalogue has another schema version.</exception>
    public static IReadOnlyList<Material> Load(CatalogueLocations locations)
    {
        var shipped = ShippedCatalogue.Load(locations.CacheDirectory);
        var user = ShippedCatalogue.WithRulesAndGroups(new UserCatalogue(locations.UserCataloguePath).Load());
        return [.. shipped, .. WithSpeciesLooks(user, shipped)];
    }

    /// <summary>
    /// User entries with the magnification profile of the most common shipped entry of the same species and origin (the
    /// catalogue's first on a tie), or their origin's defaults where the catalogue has none: a user's own ivory then
    /// expects Schreger lines as the shipped ivory does, instead of counting them against itself.
    /// </summary>
    public static IReadOnlyList<Material> WithSpeciesLooks(IReadOnlyList<Material> user, IReadOnlyList<Material> shipped) =>
        [.. user.Select(u => u.Magnification is null
            && shipped.Where(s => s.Species == u.Species && s.Origin == u.Origin).MinBy(s => s.Frequency) is { Magnification: { } looks }
                ? u with { Magnification = looks } : u)];
}
