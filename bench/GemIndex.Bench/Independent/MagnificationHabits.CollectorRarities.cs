namespace GemIndex.Bench.Independent;

internal static partial class MagnificationHabits
{
    /// <summary>Magnification rows for the species of PropertyTable.CollectorRarities.cs.</summary>
    private static MagnificationHabit[] CollectorRaritiesRows() =>
    [
        new() { Species = "dioptase", Origin = "natural", Method = "natural", Clean = .1,
            Features = [H("healed_fractures", .6), H("crystals", .1), H("fluid_inclusions", .1)],
            Source = "gemdictionary.blogspot.com dioptase (three-directional cleavage cracks, doubling); gemstones.com gemopedia dioptase (noted for visible internal "
                + "cleavage planes); cleavage cracks written as fractures and shares: judgement; crystals and fluids: from memory" },
        new() { Species = "datolite", Origin = "natural", Method = "natural", Clean = .5,
            Features = [H("healed_fractures", .25), H("fluid_inclusions", .2), H("crystals", .1)],
            Source = "from memory" },
        new() { Species = "hambergite", Origin = "natural", Method = "natural", Clean = .4,
            Features = [H("healed_fractures", .3), H("fluid_inclusions", .25), H("needles_silk", .1)],
            Source = "from memory (cleavage cracks, fluid inclusions and growth tubes)" },
        new() { Species = "clinozoisite", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("healed_fractures", .3), H("fluid_inclusions", .2), H("crystals", .2), H("needles_silk", .1)],
            Source = "from memory" },
        new() { Species = "sapphirine", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("crystals", .35), H("healed_fractures", .2), H("fluid_inclusions", .1)],
            Source = "gemsociety.org and gemfame.com sapphirine (a Sri Lankan stone with included mica books); the rest and shares: from memory" },
        new() { Species = "pollucite", Origin = "natural", Method = "natural", Clean = .5,
            Features = [H("healed_fractures", .25), H("fluid_inclusions", .2), H("needles_silk", .1)],
            Source = "irocks.com pollucite specimen 8465 (a faceted stone 'very slightly included'); which features: from memory" },
        new() { Species = "lazulite", Origin = "natural", Method = "natural", Clean = .15,
            Features = [H("colour_banding", .5), H("healed_fractures", .3), H("crystals", .2)],
            Source = "gemdictionary.blogspot.com and gemstonebuzz.com lazulite (blue and white mottling under magnification); mottling written as banding: judgement; "
                + "fractures and crystals: from memory" },
        new() { Species = "beryllonite", Origin = "natural", Method = "natural", Clean = .4,
            Features = [H("healed_fractures", .3), H("fluid_inclusions", .2), H("needles_silk", .1)],
            Source = "gemfame.com beryllonite (chatoyant specimens reported: written as needles); nationalgemlab.in beryllonite (perfect cleavage); cleavage written as "
                + "fractures, fluids and shares: from memory" },
    ];
}
