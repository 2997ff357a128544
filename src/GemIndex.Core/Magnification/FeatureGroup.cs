namespace GemIndex.Core.Magnification;

/// <summary>The kinds of features a loupe or the eye shows, grouped as a bench user looks for them.</summary>
public enum FeatureGroup
{
    /// <summary>Growth features: striae, zoning, banding.</summary>
    Growth,

    /// <summary>Inclusions: bubbles, flux, crystals, fluids, needles.</summary>
    Inclusion,

    /// <summary>Signs of a treatment: fillers, surface colour, dye, coatings.</summary>
    Treatment,

    /// <summary>Signs of an assembled stone: joins, cement, two lustres.</summary>
    Composite,

    /// <summary>The structure of organic materials under a loupe: nacre, Schreger lines, bone canals, plant cells, coral growth, pigment spots.</summary>
    OrganicStructure,

    /// <summary>Optics seen through the stone under magnification: the doubling of facet edges and inclusions.</summary>
    Optics,

    /// <summary>Optical phenomena the eye sees: a cat's-eye or a star under one light, play of colour, a change of colour between two lights.</summary>
    Phenomenon,
}
