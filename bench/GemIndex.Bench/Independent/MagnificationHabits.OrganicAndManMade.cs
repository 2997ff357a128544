namespace GemIndex.Bench.Independent;

internal static partial class MagnificationHabits
{
    // Pages read through the search tool (pages corpus) for this family, by short key.
    private const string OrganicIvoryStructure = "globalgemology.com ivory (Schreger pattern of intersecting lines in natural ivory); experts123.com 'Ivory, bone or an ivory substitute' "
        + "(ivory's V-shaped striations; bone's tiny round or oval dots, parallel striations and dark flecks of dirt in its pores)";
    private const string OrganicBoneCanals = "US Fish and Wildlife Service 'Ivory identification guide: natural ivory substitutes' (govdocs copy: Haversian canals seen with a 10x lens as pits "
        + "or scratch-like marks, darkened by organic matter)";
    private const string OrganicVegetableIvory = "cameo.mfa.org 'Vegetable ivory' (parallel torpedo-shaped cells; dye may show the grain or not penetrate deeply); en.wikipedia.org "
        + "'Vegetable ivory' (fine marbled grain; dyeing often brings out the grain)";
    private const string OrganicCopal = "issuhub.com (Jewel, p. 308: copal with trapped insects, pollen and seeds); foreveramber.au 'Amber imitations – copal' (sometimes contains inclusions); "
        + "jtv.com 'Copal vs. amber' part 1 (copal treated in an autoclave to produce sun spangles)";
    private const string OrganicHornyCoral = "wonderstarter.com 'Black coral' (concentric rings like a tree trunk's across the axis, brownish yellow translucent streaks); gemstonebuzz.com coral "
        + "(conchiolin corals show a concentric structure about the axis, golden coral a fine pimply look)";
    private const string OrganicGarnetDoublet = "stones-gems.blogspot.com 'Composites – garnet' (junction seen by the change of lustre, characteristic bubbles in the glass); gia.edu G&G "
        + "Fall 2023 'A red herring in a red garnet' (garnet crystals and needles in the crown mask gas bubbles in the glass); independent-jewellery-valuers.org (the join of a "
        + "garnet-topped doublet lies on the crown or pavilion facets, not at the girdle); Wade (1918) bitlit.ru p. 66 (garnet's keener lustre than the glass's)";

    /// <summary>Magnification rows for the species of PropertyTable.OrganicAndManMade.cs.</summary>
    private static MagnificationHabit[] OrganicAndManMadeRows() =>
    [
        new() { Species = "ivory", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("colour_banding", .6)],
            Source = $"{OrganicIvoryStructure}; the Schreger lines written as banding: judgement" },
        new() { Species = "ivory", Origin = "treated", Method = "stained or heated", Clean = .2,
            Features = [H("colour_banding", .5), H("dye_in_fractures", .4)],
            Source = $"{OrganicIvoryStructure}; gemdat.org ivory (dyed with tea or heated); stain gathered in cracks: from memory" },
        new() { Species = "bone", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("colour_banding", .5)],
            Source = $"{OrganicBoneCanals}; {OrganicIvoryStructure}; the striations written as banding (the vocabulary has no word for the canals): judgement" },
        new() { Species = "vegetable ivory", Origin = "natural", Method = "natural", Clean = .4,
            Features = [H("colour_banding", .4)],
            Source = $"{OrganicVegetableIvory}; the grain written as banding: judgement" },
        new() { Species = "vegetable ivory", Origin = "treated", Method = "dyed", Clean = .1,
            Features = [H("colour_banding", .6), H("surface_colour", .4)],
            Source = $"{OrganicVegetableIvory}; shallow dye written as surface colour: judgement" },
        new() { Species = "copal", Origin = "natural", Method = "natural", Clean = .5,
            Features = [H("crystals", .3), H("round_bubbles", .3)],
            Source = $"{OrganicCopal}; insects and plant matter written as crystals, the bubbles as in amber: judgement" },
        new() { Species = "copal", Origin = "treated", Method = "heated under pressure", Clean = .2,
            Features = [H("healed_fractures", .6), H("crystals", .2), H("round_bubbles", .2)],
            Source = $"{OrganicCopal}; sun spangles written as healed fractures (as for amber): judgement" },
        new() { Species = "horny coral", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("colour_banding", .6)],
            Source = $"{OrganicHornyCoral}; the concentric rings written as banding: judgement" },
        new() { Species = "strontium titanate", Origin = "synthetic", Method = "flame fusion", Clean = .7,
            Features = [H("round_bubbles", .6)],
            Source = "gemstonebuzz.com strontium titanate (generally clean, gas bubbles may be seen; flame fusion); cameo.mfa.org (residual polishing marks, not a word of the vocabulary)" },
        new() { Species = "lithium niobate", Origin = "synthetic", Method = "pulled", Clean = .8,
            Features = [H("round_bubbles", .4)],
            Source = "gemologiamllopis.com 'Niobato de litio' (Czochralski growth; doubled facet edges, not a word of the vocabulary); the bubbles: from memory" },
        new() { Species = "ferrite", Origin = "imitation", Method = "sintered", Clean = 1,
            Features = [],
            Source = "from memory: a sintered opaque ceramic, nothing of the vocabulary shows (gemstones.com 'Hematine' names no inclusions)" },
        new() { Species = "ceramic imitation of larimar", Origin = "imitation", Method = "sintered or bonded", Clean = .4,
            Features = [H("round_bubbles", .4), H("colour_banding", .4), H("crystals", .2)],
            Source = "gia.edu G&G Summer 2013 'Imitation larimar' (whitish gas bubbles and dark blue colour concentrations at 40x); juwelir.info 'Synthetic lazurite' "
                + "(pyrite particles added to the Gilson lapis imitation, without the crystal outlines of natural pyrite); gemstones-guide.com 'Synthetic turquoise' (no characteristic "
                + "inclusions; microspheres at high magnification, not a word of the vocabulary); colour concentrations written as banding, pyrite as crystals, the clean share and "
                + "feature shares: judgement" },
        new() { Species = "sintered imitation of lapis", Origin = "imitation", Method = "sintered or bonded", Clean = .4,
            Features = [H("round_bubbles", .4), H("colour_banding", .4), H("crystals", .2)],
            Source = "gia.edu G&G Summer 2013 'Imitation larimar' (whitish gas bubbles and dark blue colour concentrations at 40x); juwelir.info 'Synthetic lazurite' "
                + "(pyrite particles added to the Gilson lapis imitation, without the crystal outlines of natural pyrite); gemstones-guide.com 'Synthetic turquoise' (no characteristic "
                + "inclusions; microspheres at high magnification, not a word of the vocabulary); colour concentrations written as banding, pyrite as crystals, the clean share and "
                + "feature shares: judgement" },
        new() { Species = "bonded imitation of turquoise", Origin = "imitation", Method = "sintered or bonded", Clean = .4,
            Features = [H("round_bubbles", .4), H("colour_banding", .4), H("crystals", .2)],
            Source = "gia.edu G&G Summer 2013 'Imitation larimar' (whitish gas bubbles and dark blue colour concentrations at 40x); juwelir.info 'Synthetic lazurite' "
                + "(pyrite particles added to the Gilson lapis imitation, without the crystal outlines of natural pyrite); gemstones-guide.com 'Synthetic turquoise' (no characteristic "
                + "inclusions; microspheres at high magnification, not a word of the vocabulary); colour concentrations written as banding, pyrite as crystals, the clean share and "
                + "feature shares: judgement" },
        new() { Species = "marcasite", Origin = "natural", Method = "natural", Clean = .8,
            Features = [H("crystals", .1)],
            Source = "from memory" },
        new() { Species = "garnet-topped doublet", Origin = "composite", Method = "doublet", Clean = 0,
            Features = [H("join_plane", .8), H("two_lustres", .6), H("round_bubbles", .5), H("crystals", .3), H("needles_silk", .3)],
            Source = $"{OrganicGarnetDoublet}; {Doublets}; fused, so no cement bubbles: sallyspencer.co.uk (no glue is used)" },
    ];
}
