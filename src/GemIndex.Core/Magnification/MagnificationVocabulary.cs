using static GemIndex.Core.Magnification.MagnificationSources;

namespace GemIndex.Core.Magnification;

/// <summary>
/// The magnification vocabulary: every feature with its word, what to look for, the lighting, its meaning and source,
/// and how visible it is when present (docs/ranking.md, "Magnification").
/// </summary>
public static class MagnificationVocabulary
{
    // Visibility judgements (common practice): how often a trained eye with a 10x loupe or a microscope finds the
    // feature when the stone has it. Subtle growth features need the right direction and often immersion.
    private const double Subtle = 0.5;
    private const double Plain = 0.75;
    private const double Obvious = 0.9;

    private static readonly MagnificationFeatureInfo[] Table =
    [
        new(MagnificationFeature.CurvedStriae, FeatureGroup.Growth, "curved_striae", "curved striae",
            "fine curved growth lines or curved colour bands, like the grooves of a record", "diffused light, or brightfield through the pavilion; immersion helps if allowed",
            "melt growth: flame-fusion or pulled synthetic; never in natural corundum or spinel", HughesKoivula2005, Subtle),
        new(MagnificationFeature.AngularGrowthZoning, FeatureGroup.Growth, "angular_zoning", "straight angular zoning",
            "straight growth or colour lines meeting at the angles of crystal faces", "diffused light; immersion helps if allowed",
            "growth in nature (or flux growth, which also follows crystal faces)", ChoudharyGolecha2007, Plain),
        new(MagnificationFeature.ChevronGrowth, FeatureGroup.Growth, "chevron_growth", "chevron or zigzag growth",
            "a zigzag, chevron or hound's-tooth pattern of growth lines", "diffused light or darkfield",
            "hydrothermal synthetic (emerald, ruby, quartz)", SunDeGhionno2014, Plain),
        new(MagnificationFeature.ColourBanding, FeatureGroup.Growth, "colour_banding", "colour banding",
            "straight parallel bands of stronger and weaker colour", "diffused light against white; immersion helps if allowed",
            "common in natural stones; curved bands belong to curved striae instead", CommonPractice, Plain),
        new(MagnificationFeature.MosaicColourPatches, FeatureGroup.Growth, "mosaic_patches", "mosaic colour patches",
            "play-of-colour in patches with a scaly, honeycomb or chicken-wire outline, seen from the side as columns", "reflected light from above; then across the stone",
            "made (synthetic) opal; natural play-of-colour is in irregular flashes without such cells", CommonPractice, Plain),
        new(MagnificationFeature.SwirlMarks, FeatureGroup.Growth, "swirl_marks", "swirl marks",
            "curved, wavy or swirling lines of flow (not in parallel sets), often with gas bubbles strung along them", "diffused light; immersion helps if allowed",
            "a glass, natural or man-made, or a moulded plastic: it flowed as it set; never in a crystal (curved striae of a melt-grown synthetic run in parallel arcs)", CommonPractice, Subtle),
        new(MagnificationFeature.RoundGasBubbles, FeatureGroup.Inclusion, "round_bubbles", "round gas bubbles",
            "perfectly round inclusions with a dark rim and a bright centre, alone or in clouds", "brightfield or darkfield",
            "melt growth or man-made glass: flame-fusion synthetic, glass, plastic; not in natural crystals", HughesKoivula2005, Obvious),
        new(MagnificationFeature.ElongatedGasBubbles, FeatureGroup.Inclusion, "elongated_bubbles", "elongated gas bubbles",
            "tear-drop, tube or worm-like bubbles, often lined up", "brightfield or darkfield",
            "flame-fusion synthetic, glass (drawn out as it flowed)", HughesKoivula2005, Plain),
        new(MagnificationFeature.FluxResidue, FeatureGroup.Inclusion, "flux_residue", "flux residue",
            "wispy veils, fingerprint-like networks or droplets of trapped flux, often whitish, yellowish or orange", "darkfield and fibre-optic light",
            "flux-grown synthetic (ruby, sapphire, emerald, spinel, alexandrite)", ChoudharyGolecha2007, Plain),
        new(MagnificationFeature.MetalPlatelets, FeatureGroup.Inclusion, "metal_platelets", "metal platelets",
            "bright reflective triangular or hexagonal flakes; in diamond, black metallic inclusions that a magnet may pull", "reflected light; fibre-optic",
            "flux-grown synthetic (platinum from the crucible); metal-solvent grown synthetic diamond", GiaLabNotes2019FluxSapphire, Plain),
        new(MagnificationFeature.NeedlesAndSilk, FeatureGroup.Inclusion, "needles_silk", "needles and silk",
            "fine needles, often in sets crossing at 60° or 120°, giving a silky sheen", "fibre-optic light from the side",
            "natural stone (rutile silk in corundum and garnet); heating may leave it broken up", GiaLabNotes2014BurmeseRubies, Plain),
        new(MagnificationFeature.CrystalInclusions, FeatureGroup.Inclusion, "crystals", "crystal inclusions",
            "small included crystals with straight edges, colourless or coloured", "darkfield",
            "natural stone as a rule; synthetics seldom hold crystals of other minerals", CommonPractice, Plain),
        new(MagnificationFeature.MultiPhaseInclusions, FeatureGroup.Inclusion, "fluid_inclusions", "fluid or multi-phase inclusions",
            "cavities with liquid and a gas bubble, sometimes a small crystal as well", "darkfield; tilt the stone to see the bubble move",
            "natural stone (the three-phase inclusions of Colombian emerald are the classic case); hydrothermal synthetics may hold two-phase ones", CommonPractice, Plain),
        new(MagnificationFeature.HealedFractures, FeatureGroup.Inclusion, "healed_fractures", "healed fractures",
            "fingerprint-like planes of tiny fluid drops where a crack healed", "darkfield",
            "natural stone as a rule; flux-healed cracks in synthetics look alike but hold flux", CommonPractice, Plain),
        new(MagnificationFeature.NailHeadSpicules, FeatureGroup.Inclusion, "nail_head_spicules", "nail-head spicules",
            "wedge or cone-shaped inclusions capped by a small crystal, like a nail", "darkfield",
            "rapid growth: typical of hydrothermal synthetic emerald and quartz, though also found in some natural stones", ChoudharyGolecha2007, Plain),
        new(MagnificationFeature.GrowthTubes, FeatureGroup.Inclusion, "growth_tubes", "growth tubes",
            "straight, even-sided channels, all parallel, hollow or holding fluid; dense ones like rain", "darkfield or fibre-optic light from the side",
            "natural beryl and tourmaline (now and then spodumene); rounded ends in no one direction: elongated gas bubbles instead", GemSocietyInclusions, Plain),
        new(MagnificationFeature.FilledFractureFlash, FeatureGroup.Treatment, "flash_effect", "flash effect in fractures",
            "blue or orange flashes along a fracture that change as the stone is rocked", "darkfield (orange) and brightfield (blue)",
            "fracture filled with glass, resin or oil (ruby, emerald, diamond)", GaajEmeraldFilling, Plain),
        new(MagnificationFeature.FlattenedBubblesInFiller, FeatureGroup.Treatment, "flattened_bubbles", "flattened bubbles in fractures",
            "flat gas bubbles or voids lying in the plane of a fracture", "darkfield; reflected light for the filled patches",
            "fracture filled with glass or resin", GiaLabNotes2014BurmeseRubies, Plain),
        new(MagnificationFeature.SurfaceColourConcentration, FeatureGroup.Treatment, "surface_colour", "colour at facet junctions",
            "colour concentrated along facet edges, the girdle or in surface-reaching cracks; a pale core", "immersion with diffused light",
            "surface colouring by diffusion, or a coating", GiaGemNews2015DiffusionStar, Plain),
        new(MagnificationFeature.DyeInFractures, FeatureGroup.Treatment, "dye_in_fractures", "dye in fractures",
            "colour gathered in cracks, pits and between grains, paler between them", "diffused light; a cotton bud with solvent may take colour (with the owner's consent)",
            "dyed stone (jade, quartzite, chalcedony, coral, pearl, howlite, magnesite)", CommonPractice, Plain),
        new(MagnificationFeature.CoatingWear, FeatureGroup.Treatment, "coating_wear", "worn coating",
            "abraded facet edges or patches where a thin surface layer is missing; an iridescent or uneven surface", "reflected light",
            "coated stone", CommonPractice, Plain),
        new(MagnificationFeature.JoinPlane, FeatureGroup.Composite, "join_plane", "join plane",
            "a flat plane where two pieces meet, often at or near the girdle", "reflected light along the girdle; immersion if not porous",
            "assembled stone: doublet or triplet", Wade1918, Obvious),
        new(MagnificationFeature.LustreChangeAtGirdle, FeatureGroup.Composite, "two_lustres", "different lustre above and below",
            "the crown reflects with another lustre than the pavilion", "reflected light, tilting the stone",
            "assembled stone: a harder top on a glass or other base", Wade1918, Plain),
        new(MagnificationFeature.CementLayerBubbles, FeatureGroup.Composite, "cement_bubbles", "bubbles in a cement layer",
            "flattened bubbles all in one plane, in a thin layer of cement", "darkfield, looking through the girdle",
            "assembled stone joined with cement", GiaMicroWorld2023Doublet, Plain),
        // Organic structure: what tells organic materials from look-alikes that index and SG do not part (ivory from
        // bone, a pearl from a coated shell bead) under a 10x loupe. Seen on the surface (the pigment spots through a
        // thin edge), so an opaque piece shows them too.
        new(MagnificationFeature.NacrePlatelets, FeatureGroup.OrganicStructure, "nacre_platelets", "nacre platelet edges",
            "fine wavy, serrated lines over the surface, like the contour lines of a map, where overlapping nacre layers end", "reflected light on the surface, 10x or more",
            "nacre: natural, cultured and dyed pearls and mother-of-pearl; coated glass, plastic or shell beads look smooth or granular", KunzStevenson1908, Plain),
        new(MagnificationFeature.SchregerLines, FeatureGroup.OrganicStructure, "schreger_lines", "Schreger lines",
            "crossing arcs, a chequered pattern of V shapes like engine turning, on a cross-section or an end", "reflected light on a cross-section or a polished end",
            "elephant and mammoth ivory; not bone, vegetable ivory or plastic (a moulded imitation copies straight lines at most)", EspinozaMann1999, Plain),
        new(MagnificationFeature.HaversianCanals, FeatureGroup.OrganicStructure, "haversian_canals", "Haversian canals",
            "small pits, dots or short scratch-like dashes, often darkened with dirt, on a polished surface", "reflected light, 10x",
            "bone; ivory and vegetable ivory have none", EspinozaMann1999, Plain),
        new(MagnificationFeature.PlantCells, FeatureGroup.OrganicStructure, "plant_cells", "plant cell grain",
            "a fine fibrous grain of tiny elongated cells, plainer where dye has gone in", "reflected light, 10x or more",
            "vegetable ivory (tagua and other palm nuts)", CameoVegetableIvory, Subtle),
        new(MagnificationFeature.CoralGrowth, FeatureGroup.OrganicStructure, "coral_growth", "coral growth lines",
            "fine parallel lines along a branch and concentric rings across it, like a tree's", "reflected light along the piece and on a drilled or broken end",
            "coral (red, pink, black, golden); plastic, glass and dyed stone imitations have none", CommonPractice, Plain),
        new(MagnificationFeature.PigmentSpots, FeatureGroup.OrganicStructure, "pigment_spots", "spots of pigment",
            "the mottling made of small round reddish-brown spots, closer together where the colour is deeper", "transmitted light through a thin edge, or diffused light",
            "tortoiseshell; plastic and dyed horn imitations show streaks or clouds of colour without spots", NewmanTortoiseshell, Plain),
        // Doubling: how often it is held follows the material's birefringence (FacetDoubling), not a table.
        new(MagnificationFeature.FacetDoubling, FeatureGroup.Optics, "doubling", "doubling of facet edges",
            "the back facet edges, or an inclusion, seen twice as two images side by side through the table", "diffused light through the table, turning the stone (along an optic axis there is none)",
            "strong double refraction (birefringence from about 0.01, plain from about 0.02): zircon, peridot, sphene, tourmaline, synthetic moissanite; never in singly refractive stones, glass or fine aggregates",
            CommonPractice, Obvious),
        // Phenomena: seen by eye with one light (a penlight) as the stone is turned; when a stone has one it is hard to miss
        // (Obvious), except a change of colour, which needs two lights (Plain). Meanings: facts of the trade.
        new(MagnificationFeature.Chatoyancy, FeatureGroup.Phenomenon, "chatoyancy", "cat's-eye (chatoyancy)",
            "one sharp band of light across a cabochon, gliding over it as the stone is turned", "one point light from above",
            "parallel fibres or needles: cat's-eye chrysoberyl, tiger's-eye, cat's-eye apatite, scapolite, kornerupine, now and then other species; fibre-optic glass imitates it",
            CommonPractice, Obvious),
        new(MagnificationFeature.Asterism, FeatureGroup.Phenomenon, "asterism", "star (asterism)",
            "a star of four or six rays (rarely twelve) gliding over a cabochon", "one point light from above",
            "needles in two or three directions: star corundum (natural and synthetic), star diopside, star garnet, rose quartz", CommonPractice, Obvious),
        new(MagnificationFeature.PlayOfColour, FeatureGroup.Phenomenon, "play_of_colour", "play of colour",
            "patches of spectral colour that change as the stone is turned", "light from above, turning the stone",
            "opal, natural or synthetic, and its imitations (the cell pattern of made opal is mosaic colour patches)", CommonPractice, Obvious),
        new(MagnificationFeature.ColourChange, FeatureGroup.Phenomenon, "colour_change", "colour change",
            "one colour in daylight and another in warm incandescent light", "daylight or a daylight lamp, then an incandescent lamp",
            "alexandrite (natural and synthetic), colour-change sapphire, garnet and diaspore, synthetic colour-change corundum", CommonPractice, Plain),
        new(MagnificationFeature.Adularescence, FeatureGroup.Phenomenon, "adularescence", "adularescence",
            "a soft bluish-white sheen floating just below the surface", "one light from above, turning the stone",
            "moonstone feldspar", CommonPractice, Obvious),
        new(MagnificationFeature.Labradorescence, FeatureGroup.Phenomenon, "labradorescence", "labradorescence",
            "broad flashes of blue, green or gold from within, seen in one direction", "light from above, turning the stone",
            "labradorite (and rainbow moonstone)", CommonPractice, Obvious),
        new(MagnificationFeature.Aventurescence, FeatureGroup.Phenomenon, "aventurescence", "aventurescence",
            "glittering spangles of small reflecting platelets", "light from above, turning the stone",
            "sunstone feldspar, aventurine quartz, aventurine (goldstone) glass", CommonPractice, Obvious),
    ];

    private static readonly Dictionary<MagnificationFeature, MagnificationFeatureInfo> ByFeature = Table.ToDictionary(i => i.Feature);
    private static readonly Dictionary<string, MagnificationFeatureInfo> ByWord = Table.ToDictionary(i => i.Word, StringComparer.OrdinalIgnoreCase);

    /// <summary>Every feature, grouped as the bench looks for them (growth, inclusions, treatment, composite, organic structure, phenomena).</summary>
    public static IReadOnlyList<MagnificationFeatureInfo> All => Table;

    /// <summary>The phenomena only a domed surface shows (common practice): a faceted stone shows neither, as if looked for and not seen.</summary>
    public static IReadOnlyList<MagnificationFeature> DomedPhenomena { get; } = [MagnificationFeature.Asterism, MagnificationFeature.Chatoyancy];

    /// <summary>
    /// The looks that need facets (the back facets' edges seen doubled through the table): never advised for a cabochon,
    /// which has neither (common practice).
    /// </summary>
    public static IReadOnlyList<MagnificationFeature> NeedFacets { get; } = [MagnificationFeature.FacetDoubling];

    /// <summary>The words accepted, in table order.</summary>
    public static IReadOnlyList<string> Words => [.. Table.Select(i => i.Word)];

    /// <summary>The entry of one feature.</summary>
    public static MagnificationFeatureInfo Of(MagnificationFeature feature) => ByFeature[feature];

    /// <summary>The feature named by a word (case and spaces or hyphens for underscores ignored), or null.</summary>
    public static MagnificationFeature? Find(string word)
    {
        string key = word.Trim().Replace(' ', '_').Replace('-', '_');
        return ByWord.TryGetValue(key, out var info) ? info.Feature : null;
    }
}
