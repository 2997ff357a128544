namespace GemIndex.Bench.Independent;

internal static partial class MagnificationHabits
{
    // Pages read through the search tool (pages corpus) for the rows below, by short key.
    private const string CrystalRedFeldspar = "Susawee and Sutthirat (2014), Bulletin of Earth Sciences of Thailand 6(1) 51-66, 'Identification of natural and treated red feldspar' "
        + "(fdocuments.us copy: red layers from rim toward core only in treated stones, a glistering cloud along the red zone and mottled red and green colour only in natural ones; "
        + "hard to tell the two by internal features alone)";
    private const string CrystalRedLabradorite = "spec4gem.info 'Red labradorite (plagioclase) from Ethiopia' (copper platelets in a cloud, veils near the girdle)";
    private const string CrystalBenitoite = "Gems & Gemology Spring 2024 Micro-World 'Hairlike inclusions in benitoite' (whitish hairlike inclusions; actinolite-tremolite, diopside, "
        + "neptunite, albite and other mineral inclusions after Laurs et al. 1997); theredemerald.com benitoite (crossite fibres often, streaks of blue)";

    /// <summary>Magnification rows for the species of PropertyTable.Crystal.cs.</summary>
    private static MagnificationHabit[] CrystalRows() =>
    [
        new() { Species = "amblygonite", Origin = "natural", Method = "natural", Clean = .4,
            Features = [H("healed_fractures", .3), H("fluid_inclusions", .2), H("crystals", .1)],
            Source = "from memory (cleavage cracks and fingerprints)" },
        new() { Species = "andesine", Origin = "natural", Method = "natural", Clean = .4,
            Features = [H("metal_platelets", .3), H("colour_banding", .2), H("healed_fractures", .2), H("crystals", .1)],
            Source = $"{CrystalRedFeldspar}; {CrystalRedLabradorite}; the cloud written as metal platelets and the mottling as banding: judgement; shares: judgement" },
        new() { Species = "andesine", Origin = "treated", Method = "copper diffusion", Clean = .4,
            Features = [H("surface_colour", .25), H("colour_banding", .2), H("healed_fractures", .2), H("crystals", .1)],
            Source = $"{CrystalRedFeldspar}; the red rim written as surface colour: judgement; the natural feldspar's own crystals kept (the treatment starts from pale natural stones): "
                + "judgement; shares low as the paper finds the two hard to tell apart by inclusions: judgement" },
        new() { Species = "axinite", Origin = "natural", Method = "natural", Clean = .1,
            Features = [H("healed_fractures", .4), H("fluid_inclusions", .3), H("crystals", .2), H("colour_banding", .15)],
            Source = "mineralauctions.com axinite (axinite gems usually heavily included); which features: from memory" },
        new() { Species = "benitoite", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("needles_silk", .35), H("crystals", .2), H("colour_banding", .3), H("healed_fractures", .15)],
            Source = $"{CrystalBenitoite}; hairs and fibres written as needles and blue streaks as banding: judgement; shares: judgement" },
        new() { Species = "brazilianite", Origin = "natural", Method = "natural", Clean = .4,
            Features = [H("fluid_inclusions", .25), H("healed_fractures", .25), H("crystals", .1)],
            Source = "from memory" },
        new() { Species = "cassiterite", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("colour_banding", .35), H("healed_fractures", .25), H("crystals", .1)],
            Source = "gemstones-guide.com Cassiterite (no diagnostic inclusions); zoning and fractures: from memory" },
        new() { Species = "danburite", Origin = "natural", Method = "natural", Clean = .4,
            Features = [H("crystals", .3), H("fluid_inclusions", .3), H("needles_silk", .15)],
            Source = "gemdictionary.blogspot.com danburite (crystal inclusions, liquid tubes); multicolour.com danburite (extreme clarity); tubes written as needles, shares: judgement" },
        new() { Species = "diaspore", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("healed_fractures", .3), H("fluid_inclusions", .2), H("needles_silk", .1)],
            Source = "jewellermagazine.com 'Diaspore: colour and light' (rare cat's-eye from inclusions); the rest from memory" },
        new() { Species = "enstatite", Origin = "natural", Method = "natural", Clean = .2,
            Features = [H("healed_fractures", .35), H("crystals", .25), H("needles_silk", .2)],
            Source = "gemdictionary.blogspot.com enstatite (parting planes and cleavage cracks, liquid fingerprints, crystal inclusions); needles of the star and cat's-eye stones: from memory" },
        new() { Species = "epidote", Origin = "natural", Method = "natural", Clean = .2,
            Features = [H("healed_fractures", .3), H("fluid_inclusions", .2), H("crystals", .15), H("needles_silk", .1)],
            Source = "from memory" },
        new() { Species = "kornerupine", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("crystals", .35), H("needles_silk", .3), H("healed_fractures", .15)],
            Source = "gemstonebuzz.com kornerupine (crystalline inclusions of zircon and apatite, fine needles); shares: judgement" },
        new() { Species = "petalite", Origin = "natural", Method = "natural", Clean = .7,
            Features = [H("healed_fractures", .2), H("fluid_inclusions", .15)],
            Source = "nationalgemlab.in petalite (usually free of inclusions); gemfame.com petalite (conspicuously limpid); what the rest hold: from memory" },
        new() { Species = "taaffeite", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("crystals", .35), H("fluid_inclusions", .3), H("healed_fractures", .3)],
            Source = "gemdictionary.blogspot.com taaffeite (spinel and other crystals, two-phase inclusions, liquid fingerprints); gem5.com taaffeite (mineral inclusions, healed fractures, "
                + "fingerprints of negative crystals); shares: judgement" },
        new() { Species = "vesuvianite", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("crystals", .3), H("healed_fractures", .3)],
            Source = "gemdictionary.blogspot.com idocrase (crystalline and fingerprint inclusions); shares: judgement" },
    ];
}
