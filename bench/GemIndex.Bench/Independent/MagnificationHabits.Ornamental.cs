namespace GemIndex.Bench.Independent;

internal static partial class MagnificationHabits
{
    private const string OrnamentalAzurite = "globalgemology.com 'Azurite' (commonly found with matrix and inclusions such as calcite and malachite)";

    /// <summary>
    /// Magnification rows for the species of PropertyTable.Ornamental.cs: short rows, as for the other ornamental rivals
    /// (matrix, veins and mottling written as crystals or banding, the vocabulary having no word for them; judgement).
    /// </summary>
    private static MagnificationHabit[] OrnamentalRows() =>
    [
        new() { Species = "azurite", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("crystals", .4), H("colour_banding", .4)],
            Source = $"{OrnamentalAzurite}; malachite bands written as banding: judgement" },
        new() { Species = "azurite", Origin = "treated", Method = "waxed", Clean = .3,
            Features = [H("crystals", .4), H("colour_banding", .4)],
            Source = $"{OrnamentalAzurite}; gemdat.org azurite (may be coated with colourless wax); common practice: wax leaves nothing the vocabulary names" },
        new() { Species = "charoite", Origin = "natural", Method = "natural", Clean = .1,
            Features = [H("colour_banding", .6), H("crystals", .35)],
            Source = "johnjbradshaw.com 'Charoite' (fibrous appearance, swirls and spots of black, grey and white from aegirine-augite, feldspar, tinaksite); swirls written as banding: judgement" },
        new() { Species = "chrysocolla", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("colour_banding", .4), H("crystals", .3)],
            Source = "gemfame.com 'Chrysocolla' (considerable colour variation, quartz matrix, mixed with malachite or turquoise); shares: judgement" },
        new() { Species = "maw-sit-sit", Origin = "natural", Method = "natural", Clean = .1,
            Features = [H("colour_banding", .6), H("crystals", .3)],
            Source = "nationalgemlab.in 'Maw-sit-sit' (black splotches, swirls and veins; shiny chromite flecks; white natrolite streaks); shares: judgement" },
        new() { Species = "muscovite", Origin = "natural", Method = "natural", Clean = .4,
            Features = [H("crystals", .2), H("colour_banding", .2)],
            Source = "from memory (sparkling mica flakes, ruby or kyanite grains in fuchsite)" },
        new() { Species = "pectolite", Origin = "natural", Method = "natural", Clean = .2,
            Features = [H("crystals", .5), H("colour_banding", .4)],
            Source = "gemologyproject.com 'Pectolite' (Larimar: red dendritic hematite, calcite patches, natrolite sprays, native copper and chalcocite blebs, after Woodruff 1989); "
                + "gemstones.com gemopedia 'Larimar' (tiny spheres with blue centres and white rims); spheres written as banding: judgement" },
        new() { Species = "prehnite", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("needles_silk", .35), H("crystals", .2), H("colour_banding", .1)],
            Source = "from memory (dark epidote needles in Australian prehnite, crystals, zoning)" },
        new() { Species = "rhodochrosite", Origin = "natural", Method = "natural", Clean = .1,
            Features = [H("colour_banding", .8), H("crystals", .05)],
            Source = "gemfame.com rhodochrosite (Argentine masses banded with whitish calcite); langantiques.com (pink with bands of white, grey or brown); "
                + "The Journal of Gemmology 36(4) 2018 (prominent growth zoning); shares: judgement" },
        new() { Species = "rhodonite", Origin = "natural", Method = "natural", Clean = .15,
            Features = [H("colour_banding", .5), H("crystals", .35)],
            Source = "jiehonggem.com rhodonite (GIA Gem Reference Guide: black veins or spots of manganese oxide, the identifying characteristic); veins written as banding, spots as crystals: judgement" },
        new() { Species = "sepiolite", Origin = "natural", Method = "natural", Clean = .8,
            Features = [H("colour_banding", .3)],
            Source = "from memory (an opaque earthy mass shows little under the loupe)" },
        new() { Species = "serpentine", Origin = "natural", Method = "natural", Clean = .2,
            Features = [H("crystals", .5), H("colour_banding", .35)],
            Source = "gemstonebuzz.com serpentine (whitish cloudy patches, octahedral magnetite or chromite crystals); gemsociety.org serpentine (williamsite: dark chromite octahedra, "
                + "white brucite patches; banded ricolite); patches written as banding: judgement" },
        new() { Species = "sugilite", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("colour_banding", .4), H("crystals", .25)],
            Source = "gemselect.com 'Purple sugilite' (black matrix, reddish or yellowish blotches, often mixed with chalcedony); shares: judgement" },
        new() { Species = "talc", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("colour_banding", .5)],
            Source = "gemstones.com gemopedia 'Soapstone' (often veined or mottled; surface damage); veins written as banding: judgement" },
        new() { Species = "variscite", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("colour_banding", .45), H("crystals", .2)],
            Source = "issuhub.com 'Jewel' p. 104 (veining, black webbing in the matrix of Nevada variscite, swirls); webbing written as banding: judgement" },
        new() { Species = "hemimorphite", Origin = "natural", Method = "natural", Clean = .2,
            Features = [H("needles_silk", .35), H("fluid_inclusions", .3), H("crystals", .3), H("colour_banding", .3)],
            Source = "gia.edu G&G Summer 2020 Lab Notes 'Hemimorphite resembling Paraíba tourmaline' (parallel tubes, fluid inclusions, white granular flake-like inclusions); "
                + "wiki-des-bijoutiers.fr (often banded blue and white); tubes written as needles: judgement" },
        new() { Species = "sphalerite", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("colour_banding", .3), H("healed_fractures", .3), H("crystals", .1)],
            Source = "litnon.com sphalerite (may show colour zoning); fingerprints and crystals: from memory" },
    ];
}
