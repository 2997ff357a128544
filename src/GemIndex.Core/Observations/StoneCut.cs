namespace GemIndex.Core.Observations;

/// <summary>
/// How the stone is cut, as far as it bears on what it can show: a star or a cat's-eye glides over a domed surface
/// and never shows on facets (common practice), so a faceted stone is no star or cat's-eye variety.
/// </summary>
public enum StoneCut
{
    /// <summary>Flat polished facets (brilliant, step, mixed cut…): shows no star and no cat's-eye.</summary>
    Faceted,

    /// <summary>A domed top: may show a star or a cat's-eye under one light from above.</summary>
    Cabochon,

    /// <summary>A bead, a carving, a rough or tumbled piece: says nothing on its own.</summary>
    Other,
}
