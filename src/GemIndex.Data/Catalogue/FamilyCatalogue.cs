using GemIndex.Core.Catalogue;

namespace GemIndex.Data.Catalogue;

/// <summary>
/// What the family files hold once read: one flattened material per variety, each species' own values (for the
/// check of varieties against their species and for user rows that inherit a species), the varieties written "like" a
/// sibling, and every reference.
/// </summary>
public sealed class FamilyCatalogue
{
    internal FamilyCatalogue(IReadOnlyList<Material> materials, IReadOnlyDictionary<string, Material> species,
        IReadOnlyDictionary<string, SpeciesDocument> speciesDocuments, IReadOnlyDictionary<string, ValueSource> references,
        IReadOnlyDictionary<string, CatalogueCheck.Likeness> likes)
    {
        Likes = likes;
        Materials = materials;
        Species = species;
        SpeciesDocuments = speciesDocuments;
        References = references;
    }

    /// <summary>One material per variety, in file order.</summary>
    public IReadOnlyList<Material> Materials { get; }

    /// <summary>Each species' own values by species name: a material built from the species fields alone.</summary>
    public IReadOnlyDictionary<string, Material> Species { get; }

    /// <summary>Every reference by key: the shared ones of sources.json and those of the family files.</summary>
    public IReadOnlyDictionary<string, ValueSource> References { get; }

    /// <summary>
    /// The varieties written "like" a sibling variety, by entry name: the sibling's flattened entry and the fields the
    /// variety states itself, for the check against the sibling.
    /// </summary>
    public IReadOnlyDictionary<string, CatalogueCheck.Likeness> Likes { get; }

    internal IReadOnlyDictionary<string, SpeciesDocument> SpeciesDocuments { get; }

    /// <summary>The catalogue check over these materials, varieties against their species (or the sibling they are like) included.</summary>
    public IReadOnlyList<CatalogueFinding> Check() => CatalogueCheck.Check(Materials, Species, Likes);
}
