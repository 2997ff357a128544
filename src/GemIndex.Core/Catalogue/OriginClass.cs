namespace GemIndex.Core.Catalogue;

/// <summary>Where a material comes from, in the words the trade's nomenclature standards use.</summary>
public enum OriginClass
{
    /// <summary>Formed in nature.</summary>
    Natural,

    /// <summary>Made in a laboratory with a natural counterpart of the same composition and structure.</summary>
    Synthetic,

    /// <summary>Made to look like another material, with different properties (glass, plastic, cubic zirconia).</summary>
    Imitation,

    /// <summary>A natural material whose appearance was changed (dyed, filled, coated, stabilised).</summary>
    Treated,

    /// <summary>Made of two or more parts joined together (doublets, triplets).</summary>
    Composite,

    /// <summary>
    /// Grown by a living animal after a person started the growth: cultured pearls. The trade names them apart from
    /// natural pearls, and no bench test here tells the two apart (a laboratory's X-radiography does).
    /// </summary>
    Cultured,
}
