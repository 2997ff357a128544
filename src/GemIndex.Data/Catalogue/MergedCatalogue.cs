using GemIndex.Core.Catalogue;
using GemIndex.Data.TradeRules;

namespace GemIndex.Data.Catalogue;

/// <summary>The catalogue a query sees: every shipped entry, then the user's own entries (IsUserEntry set).</summary>
public static class MergedCatalogue
{
    /// <summary>Loads both catalogues, building the shipped one into the cache folder first if needed; a user entry takes its species' trade rule.</summary>
    /// <exception cref="CatalogueFormatException">An embedded family file cannot be read.</exception>
    /// <exception cref="CatalogueStoreException">A catalogue file cannot be read.</exception>
    /// <exception cref="CatalogueSchemaVersionException">The user catalogue has another schema version.</exception>
    public static IReadOnlyList<Material> Load(CatalogueLocations locations) =>
        [.. ShippedCatalogue.Load(locations.CacheDirectory), .. TradeRuleTable.Embedded.Attach(new UserCatalogue(locations.UserCataloguePath).Load())];
}
