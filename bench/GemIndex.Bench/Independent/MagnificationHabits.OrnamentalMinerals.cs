namespace GemIndex.Bench.Independent;

internal static partial class MagnificationHabits
{
    private const string OrnamentalMineralsGaspeite = "nationalgemlab.in 'Gaspeite' (most show brown veins); geology.com 'Gaspeite' (often with brown matrix or mottling)";
    private const string OrnamentalMineralsHorn = "gems.minsoc.ru 'Horn' (coloured artificially red, brown or black); xmztd.com and wenxuebuluo8.cn rhinoceros-horn pages (Chinese: "
        + "parallel 'bamboo-thread' lines along a horn, twisted lines in buffalo horn)";

    /// <summary>
    /// Magnification rows for the species of PropertyTable.OrnamentalMinerals.cs: short rows, as for the other ornamental
    /// rivals (matrix, veins and fibres written with the nearest word of the vocabulary; judgement).
    /// </summary>
    private static MagnificationHabit[] OrnamentalMineralsRows() =>
    [
        new() { Species = "clinochlore", Origin = "natural", Method = "natural", Clean = .05,
            Features = [H("needles_silk", .7), H("colour_banding", .4)],
            Source = "gemselect.com 'About seraphinite' and mineralmuseum.eu 'The feathery gemstone seraphinite' (silvery feathery shimmer from mica inclusions, chatoyant fibres); "
                + "fibres written as silk, the feather pattern as banding: judgement" },
        new() { Species = "gaspeite", Origin = "natural", Method = "natural", Clean = .2,
            Features = [H("colour_banding", .6), H("crystals", .1)],
            Source = $"{OrnamentalMineralsGaspeite}; veins written as banding: judgement" },
        new() { Species = "gaspeite", Origin = "treated", Method = "resin coated", Clean = .2,
            Features = [H("colour_banding", .6), H("coating_wear", .2)],
            Source = $"{OrnamentalMineralsGaspeite}; katch.ne.jp 'Gaspeite' (resin coating usual); worn coating: from memory" },
        new() { Species = "pyrophyllite", Origin = "natural", Method = "natural", Clean = .5,
            Features = [H("colour_banding", .35), H("crystals", .1)],
            Source = "gems.minsoc.ru 'Pyrophyllite' (agalmatolite with admixtures of kaolinite, sericite, quartz, hematite or cinnabar); snazzdragon.com (iron-oxide staining); "
                + "mottling written as banding, shares: judgement" },
        new() { Species = "cuprite", Origin = "natural", Method = "natural", Clean = .6,
            Features = [H("crystals", .2), H("healed_fractures", .15)],
            Source = "issuhub.com (Jewel, p. 89: a flawless step cut; a slight metallic sheen and cloudy surface on an oval from reaction with light); the inclusions: from memory" },
        new() { Species = "cerussite", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("healed_fractures", .35), H("fluid_inclusions", .2), H("crystals", .15)],
            Source = "from memory (twinning planes, fractures from its brittleness and heat sensitivity, which gemfame.com and nationalgemlab.in name)" },
        new() { Species = "baryte", Origin = "natural", Method = "natural", Clean = .4,
            Features = [H("healed_fractures", .3), H("colour_banding", .2), H("fluid_inclusions", .15)],
            Source = "gemfame.com 'Barite' (brown stalagmitic barite banded concentrically; yellow Cumbrian material with clear areas); fractures and fluids: from memory" },
        new() { Species = "celestine", Origin = "natural", Method = "natural", Clean = .4,
            Features = [H("colour_banding", .3), H("healed_fractures", .25), H("fluid_inclusions", .15)],
            Source = "issuhub.com (Jewel, p. 121: a bicoloured crystal whose colour fades to clear; banded barian celestine); fractures and fluids: from memory" },
        new() { Species = "horn", Origin = "natural", Method = "natural", Clean = .2,
            Features = [H("colour_banding", .6)],
            Source = $"{OrnamentalMineralsHorn}; the fibrous lines written as banding: judgement" },
        new() { Species = "horn", Origin = "treated", Method = "dyed", Clean = .1,
            Features = [H("colour_banding", .5), H("surface_colour", .4)],
            Source = $"{OrnamentalMineralsHorn}; dye written as surface colour: from memory" },
    ];
}
