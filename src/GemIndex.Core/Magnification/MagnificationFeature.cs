namespace GemIndex.Core.Magnification;

/// <summary>
/// What a loupe or microscope shows inside or on a stone. Names are the trade's terms; the description, the lighting
/// that shows each one and what it means are in <see cref="MagnificationVocabulary"/>.
/// </summary>
public enum MagnificationFeature
{
    /// <summary>Curved growth lines or curved colour bands (melt growth: flame fusion, pulling).</summary>
    CurvedStriae,

    /// <summary>Straight, angular growth or colour zoning that follows crystal faces.</summary>
    AngularGrowthZoning,

    /// <summary>Chevron, zigzag or "hound's-tooth" growth (hydrothermal growth).</summary>
    ChevronGrowth,

    /// <summary>Straight colour banding in bands of different colour or depth.</summary>
    ColourBanding,

    /// <summary>A mosaic of play-of-colour patches with a scaly or "chicken-wire" outline (made opal).</summary>
    MosaicColourPatches,

    /// <summary>Round gas bubbles, singly or in clouds.</summary>
    RoundGasBubbles,

    /// <summary>Elongated, tear-drop or worm-like gas bubbles.</summary>
    ElongatedGasBubbles,

    /// <summary>Flux residues: wispy veils, "fingerprints" and networks of trapped flux.</summary>
    FluxResidue,

    /// <summary>Reflective metal platelets (triangular or hexagonal) from a crucible, or metallic inclusions from a metal solvent.</summary>
    MetalPlatelets,

    /// <summary>Fine needles or "silk", often in oriented sets.</summary>
    NeedlesAndSilk,

    /// <summary>Included crystals of other minerals (or of the host).</summary>
    CrystalInclusions,

    /// <summary>Fluid, two-phase or three-phase inclusions (liquid with a bubble, sometimes a crystal).</summary>
    MultiPhaseInclusions,

    /// <summary>Healed fractures ("fingerprints" of tiny fluid drops) as nature heals them.</summary>
    HealedFractures,

    /// <summary>Nail-head spicules: wedge-shaped two-phase inclusions capped by a crystal (rapid, disturbed growth).</summary>
    NailHeadSpicules,

    /// <summary>Coloured flashes (blue, orange) along fractures filled with glass, resin or oil: the flash effect.</summary>
    FilledFractureFlash,

    /// <summary>Flattened gas bubbles or voids trapped in the filler of a fracture.</summary>
    FlattenedBubblesInFiller,

    /// <summary>Colour concentrated at facet junctions, the girdle or surface-reaching fractures (surface colouring).</summary>
    SurfaceColourConcentration,

    /// <summary>Dye gathered in fractures and between grains.</summary>
    DyeInFractures,

    /// <summary>A coating's wear: abraded facet edges or patches where a surface layer is missing.</summary>
    CoatingWear,

    /// <summary>A join plane where two parts are fixed together.</summary>
    JoinPlane,

    /// <summary>A different lustre above and below the girdle (two materials).</summary>
    LustreChangeAtGirdle,

    /// <summary>Flattened bubbles in one plane: the cement layer of an assembled stone.</summary>
    CementLayerBubbles,

    /// <summary>The serrated edges of overlapping nacre layers on a pearl's or mother-of-pearl's surface.</summary>
    NacrePlatelets,

    /// <summary>Schreger lines: crossing arcs on a cross-section of elephant or mammoth ivory.</summary>
    SchregerLines,

    /// <summary>Haversian canals: the pits and short dashes of bone's vessels on a polished surface.</summary>
    HaversianCanals,

    /// <summary>The fibrous grain of a palm nut's thick-walled cells (vegetable ivory).</summary>
    PlantCells,

    /// <summary>Coral's growth: fine parallel lines along a branch, concentric rings across it.</summary>
    CoralGrowth,

    /// <summary>Tortoiseshell's mottling seen as small round spots of pigment.</summary>
    PigmentSpots,

    /// <summary>Doubling: the back facet edges or an inclusion seen twice through the stone (strong birefringence).</summary>
    FacetDoubling,

    /// <summary>Chatoyancy: one band of light across a cabochon (a cat's-eye).</summary>
    Chatoyancy,

    /// <summary>Asterism: a star of four, six or twelve rays of light on a cabochon.</summary>
    Asterism,

    /// <summary>Play of colour: patches of spectral colour that change as the stone moves (opal).</summary>
    PlayOfColour,

    /// <summary>A change of colour between daylight and incandescent light.</summary>
    ColourChange,

    /// <summary>Adularescence: a soft bluish-white sheen floating below the surface (moonstone).</summary>
    Adularescence,

    /// <summary>Labradorescence: broad flashes of colour from within, in one direction (labradorite).</summary>
    Labradorescence,

    /// <summary>Aventurescence: glittering spangles of platelets (sunstone, aventurine).</summary>
    Aventurescence,

    /// <summary>Growth tubes: straight hollow or fluid-filled channels parallel to the crystal's length (beryl, tourmaline).</summary>
    GrowthTubes,

    /// <summary>Swirl marks: curved, wavy flow lines of a glass (natural or man-made) or a moulded plastic.</summary>
    SwirlMarks,
}
