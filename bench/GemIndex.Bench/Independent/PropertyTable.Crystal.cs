namespace GemIndex.Bench.Independent;

internal static partial class PropertyTable
{
    /// <summary>
    /// Rows of this family, compiled like the first rows (each names the pages read): rare transparent collector crystals
    /// the catalogue holds and the bench meets now and then. Found with the public search tool (pages corpus) and read
    /// there, never taken from the catalogue. Hue weights, UV weights, origin shares and bench weights are judgements.
    /// </summary>
    private static SpeciesProperties[] CrystalRows() =>
    [
        new()
        {
            Name = "amblygonite", BenchWeight = 0.1,
            Indices = PrincipalValues.Biaxial(new(1.577, 1.611), new(0.020, 0.027), new(0.4, 0.8)),
            SpecificGravity = new(2.98, 3.11), Pleochroism = PleochroismHabit.Weak, Dispersion = 0.014,
            UvLong = [new("inert", .5), new("weak", .5)],
            Hues = [new("yellow", .6), new("colourless", .25), new("green", .1), new("blue", .05)],
            Citation = "Wikipedia 'Amblygonite' infobox (arc.ask3.ru and limsforum.com copies): biaxial, either sign, nα 1.577–1.591, nβ 1.592–1.605, nγ 1.596–1.613, "
                + "birefringence 0.020–0.027, SG 2.98–3.11, pleochroism weak to none, very weak green in LW; les-pierres-precieuses.fr amblygonite: Np 1.611, Nm 1.622, Ng 1.637, "
                + "birefringence 0.026, density 3–3.1, no pleochroism; hmn.gem.agency amblygonite: RI 1.578–1.646, birefringence 0.020–0.030, density 2.98–3.11, dispersion 0.014–0.015; "
                + "gemselect.com amblygonite: white, cream or pale yellow, also green, blue, grey, pink; facetable material rare (Brazil, Burma, USA)",
            Judgement = "α 1.577–1.611 as the union of the two sets of α, β, γ read; β's place 0.4–0.8 spanning both signs (0.79 and 0.64 from the Wikipedia ranges, 0.42 from "
                + "the French page); UV strengths, hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "andesine", BenchWeight = 0.3,
            Indices = PrincipalValues.Biaxial(new(1.543, 1.554), new(0.008, 0.010), new(0.45, 0.55)),
            SpecificGravity = new(2.66, 2.68), Pleochroism = PleochroismHabit.Weak,
            Hues = [new("red", .45), new("orange", .2), new("yellow", .2), new("green", .1), new("colourless", .05)],
            Origins = [new("natural", .25), new("treated", .75)],
            OriginCitation = "scribd.com Hughes et al. (2012) 'Andesine questions' abstract: large quantities of diffusion-treated andesine from Inner Mongolia entered the "
                + "world markets without disclosure from about 2000, natural red Tibetan andesine disputed; jckonline.com 'The andesine report': copper diffusion proven "
                + "possible, the red and green stones of the trade (other than natural yellows from Oregon and Mexico and Oregon's natural reds and greens) heat treated; "
                + "vdocument.in Abduriyim (2009, GIA News from Research): pale yellow Inner Mongolian andesine can be copper-diffused red, orangy red Tibetan andesine mined "
                + "since 2006; le-comptoir-geologique.com andesine: red to orange feldspars sold as natural andesine since the early 2000s, no authenticated source but one "
                + "disputed Tibetan site (treated .75 against natural .25: judgement from those words)",
            Citation = "Wikipedia 'Andesine' infobox (en.m.wikipedia copy): plagioclase with 30–50 % anorthite, biaxial (+/−), 2V 76–83°, nα 1.543–1.554, nβ 1.547–1.559, "
                + "nγ 1.552–1.562, birefringence 0.009, SG 2.66–2.68, indices and SG rising with calcium; vdocument.in Abduriyim (2009): Tibetan orangy red andesine "
                + "α 1.550–1.551, β 1.555–1.556, γ 1.560–1.561; gemdat.org labradorite (O'Donoghue, Gems): red plagioclase from the Congo weakly pleochroic, green distinctly",
            Judgement = "the birefringence ±0.001 about the published 0.009–0.010; β near halfway (2V near 90°, Abduriyim's β halfway), sign either way; SG not made to follow "
                + "the index though the Wikipedia text says both rise with calcium (the series is cut to andesine's own span); hue drawn apart from origin as for every row; "
                + "no UV read; hue weights and bench weight (sold in large numbers on shopping channels): judgement",
        },
        new()
        {
            Name = "axinite", BenchWeight = 0.15,
            Indices = PrincipalValues.Biaxial(new(1.674, 1.693), new(0.010, 0.012), new(0.55, 0.7)),
            SpecificGravity = new(3.26, 3.36), Pleochroism = PleochroismHabit.Strong, Dispersion = 0.019,
            UvShort = [new("inert", .85), new("weak", .15)],
            Lines = [new(512, true), new(494, true), new(466, true), new(444, true), new(415, false)],
            Hues = [new("brown", .65), new("purple", .2), new("yellow", .1), new("blue", .05)],
            Citation = "gemologyproject.com Axinite: biaxial − (or + when high in Mg), nα 1.674–1.693, nβ 1.680–1.701, nγ 1.684–1.706, birefringence 0.010–0.012, "
                + "dispersion 0.018–0.020, SG 3.27–3.29 (range 3.26–3.36), strong pleochroism, strong bands at 512, 494, 466 and sometimes 415 nm, strong lines at 523 and 444, "
                + "may show red-orange in SW; gemfame.com axinite: the same α, β, γ, biaxial −, SG 3.27–3.29, lines 532, 512, 492, 466, 444, 415 nm, luminescence not common "
                + "in gem material; Handbook of Precious Stones (wikisource p. 123): SG 3.29, clove brown to plum, strongly pleochroic",
            Judgement = "β's place from the published α, β, γ; the band at 415 nm written faint ('sometimes'); SW strengths, hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "benitoite", BenchWeight = 0.1,
            Indices = PrincipalValues.Uniaxial(new(1.756, 1.757), new(0.046, 0.047), positive: true, epsilon: new(1.802, 1.804)),
            SpecificGravity = new(3.64, 3.68), Pleochroism = PleochroismHabit.Strong, Dispersion = 0.044,
            UvLong = [new("inert", .8), new("weak", .2)], UvShort = [new("strong", .85), new("moderate", .15)],
            Hues = [new("blue", .8), new("colourless", .15), new("pink", .05)],
            Citation = "gemstones-guide.com Benitoite: uniaxial +, RI 1.757–1.804, birefringence 0.047, dispersion 0.044, SG 3.64, strong pleochroism; "
                + "cameo.mfa.org Benitoite: RI 1.756–1.757 and 1.802–1.804, birefringence 0.046, density 3.65–3.68, blue stones bright to chalky blue in SW, colourless ones red in LW; "
                + "gemologyproject.com Benitoite: uniaxial +, birefringence 0.047, dispersion 0.046, SG 3.65; yourgemologist.com benitoite: bright blue in SW, colourless, blue, rarely pink",
            Judgement = "UV strengths (LW red only in colourless stones: written weak in a share), hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "brazilianite", BenchWeight = 0.1,
            Indices = PrincipalValues.Biaxial(new(1.600, 1.604), new(0.019, 0.021), new(0.3, 0.4)),
            SpecificGravity = new(2.96, 3.01), Dispersion = 0.014,
            UvLong = [new("inert", 1)], UvShort = [new("inert", 1)],
            Hues = [new("yellow", .6), new("green", .35), new("colourless", .05)],
            Citation = "gemfame.com brazilianite: α 1.602, β 1.609, γ 1.621–1.623, biaxial +, birefringence 0.019–0.021, dispersion 0.014, SG usually 2.98, no recorded response to UV, "
                + "no useful spectrum, dichroism insignificant, yellow to yellowish green; gemstones.comparenature.com brazilianite (Gemmological Tables): RI 1.602–1.625, "
                + "birefringence 0.019–0.021, pleochroism very weak (Schumann); gem5.com brazilianite: SG 2.99, RI 1.60–1.62, birefringence 0.021",
            Judgement = "α ±0.002 and SG 2.96–3.01 about the single published values; β's place from gemfame's values; pleochroism left none (insignificant); "
                + "hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "cassiterite", BenchWeight = 0.1,
            Indices = PrincipalValues.Uniaxial(new(1.990, 1.997), new(0.096, 0.098), positive: true),
            SpecificGravity = new(6.87, 7.03), Pleochroism = PleochroismHabit.Weak, Dispersion = 0.071,
            UvLong = [new("inert", 1)], UvShort = [new("inert", 1)],
            Hues = [new("brown", .6), new("yellow", .2), new("red", .1), new("colourless", .05), new("black", .05)],
            Citation = "gemstones-guide.com Cassiterite: uniaxial +, RI 1.997–2.093, birefringence 0.096, dispersion 0.071, no fluorescence, SG about 6.87–7.03 in gem quality, "
                + "usually dark brown, yellow and colourless occasionally; gemstones.comparenature.com cassiterite: RI 1.990–2.105, birefringence 0.096–0.098, dichroic in yellow; "
                + "gemsociety.org cassiterite: SG 6.7–7.1, mostly black or brown; nationalgemlab.in cassiterite: density 6.98–7.01, no luminescence, not known to be treated",
            Judgement = "always over the limit at a bench (ω 1.990–1.997); hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "danburite", BenchWeight = 0.2,
            Indices = PrincipalValues.Biaxial(new(1.627, 1.633), new(0.006, 0.008), new(0.45, 0.55)),
            SpecificGravity = new(2.93, 3.03), Pleochroism = PleochroismHabit.Weak, Dispersion = 0.017,
            UvLong = [new("strong", .4), new("moderate", .4), new("weak", .2)], UvShort = [new("moderate", .4), new("weak", .4), new("inert", .2)],
            Lines = [new(580, false)],
            Hues = [new("colourless", .6), new("yellow", .25), new("pink", .1), new("brown", .05)],
            Citation = "gemfame.com danburite: α 1.627–1.633, β 1.630–1.636, γ 1.633–1.639, birefringence 0.006–0.008, SG 3.00, 2V near 90° (positive for blue light, negative "
                + "for red), sky-blue to blue-green in LW, some show the rare-earth line spectrum; gemdictionary.blogspot.com danburite: RI 1.630–1.636, birefringence 0.006, "
                + "SG 3.00, dispersion 0.017, pleochroism weak to none, sometimes a line at 580 nm; edelsteine.at danburite: SG 2.93–3.02, RI 1.627–1.639, LW blue to blue-green, "
                + "SW blue-violet; wipi.ai.kr danburite: SG 2.97–3.03",
            Judgement = "β near halfway (sign either way) from the published α, β, γ; SG as the union of the ranges read; UV strengths, the 580 nm line written faint, "
                + "hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "diaspore", BenchWeight = 0.2,
            Indices = PrincipalValues.Biaxial(new(1.682, 1.706), new(0.047, 0.050), new(0.35, 0.48)),
            SpecificGravity = new(3.30, 3.40), Pleochroism = PleochroismHabit.Strong,
            Lines = [new(471, false), new(463, false), new(454, false)],
            Hues = [new("green", .5), new("yellow", .2), new("brown", .15), new("pink", .1), new("colourless", .05)],
            Citation = "gemfame.com diaspore: α 1.682–1.706, β 1.705–1.725, γ 1.730–1.752, birefringence 0.048, biaxial +, SG 3.2–3.5, bands at 471, 463, 454 nm in some, "
                + "colour change greenish to pinkish brown, faceted stones from Mugla, Turkey; classicgems.net diaspore: RI 1.700–1.752, biaxial +, birefringence 0.047–0.050, "
                + "density 3.20–3.50, strong pleochroism; gemdat.org diaspore (Blue Chart 2010): SG 3.30–3.40, RI 1.702–1.750, biaxial +; zultanium.com: RI 1.682–1.752, "
                + "SG 3.30–3.39, no treatment the documented norm; jewellermagazine.com 'Diaspore: colour and light': greenish in daylight, pinkish brown to red in incandescent light, "
                + "strongly trichroic, also pink, yellowish, greenish brown, colourless",
            Judgement = "β's place (0.35–0.48, positive) from gemfame's values; SG from the Blue Chart range (the gem's); the bands written faint ('in some'); hue is the daylight "
                + "colour of colour-change stones; hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "enstatite", BenchWeight = 0.2, SgFollowsIndex = 1,
            Indices = PrincipalValues.Biaxial(new(1.649, 1.667), new(0.009, 0.011), new(0.3, 0.49)),
            SpecificGravity = new(3.20, 3.30), Pleochroism = PleochroismHabit.Moderate,
            Lines = [new(506, true)],
            Hues = [new("green", .5), new("brown", .3), new("black", .1), new("yellow", .05), new("colourless", .05)],
            Citation = "gemfame.com enstatite: α 1.649–1.667, β 1.653–1.671, γ 1.657–1.680, biaxial +, birefringence 0.010, SG 3.20–3.30, pink to green pleochroism, strong line "
                + "at 506 nm characteristic, colourless through yellow, green to brown; gemdictionary.blogspot.com enstatite: 1.663–1.673, birefringence 0.010, SG 3.20–3.30, "
                + "biaxial +, pleochroism moderate, properties higher with iron; Smith, Gem-Stones ch. XXXVI (bitlit.ru p. 91): 1.665 and 1.674, biaxial +; tradeshop.com enstatite: "
                + "usually 1.65–1.68, blackish green star cabochons from India and Sri Lanka plentiful",
            Judgement = "birefringence ±0.001 about the published 0.010; β's place from gemfame's values; SG rising with the index (iron) from gemdictionary's words; "
                + "the hypersthene end (higher index and SG) left out; hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "epidote", BenchWeight = 0.2, SgFollowsIndex = 1,
            Indices = PrincipalValues.Biaxial(new(1.715, 1.751), new(0.015, 0.049), new(0.5, 0.75)),
            SpecificGravity = new(3.38, 3.49), Pleochroism = PleochroismHabit.Strong, Dispersion = 0.019,
            UvLong = [new("inert", 1)], UvShort = [new("inert", 1)],
            Lines = [new(455, true), new(475, false)],
            Hues = [new("green", .6), new("brown", .2), new("yellow", .1), new("black", .1)],
            Citation = "gemfame.com epidote: α 1.715–1.751, β 1.725–1.784, γ 1.734–1.797, birefringence 0.015–0.049, negative, SG 3.38–3.49, band at 455 nm characteristic, "
                + "sometimes 475 nm, pistachio green; nationalgemlab.in epidote: RI 1.715–1.797, biaxial −, birefringence 0.019–0.046, dispersion 0.019, strong pleochroism, "
                + "density 3.38–3.49, luminescence none; gemstones-guide.com Epidote: RI 1.729–1.768, birefringence 0.019–0.045, dispersion 0.030, SG 3.25–3.50, wide variation "
                + "in composition and properties; rbmason.ca (Royal Ontario Museum): RI 1.715–1.797, birefringence 0.015–0.049",
            Judgement = "β's place (0.5–0.75, negative) from gemfame's values; SG rising with the index (iron for aluminium) from memory; dispersion 0.019 of the two values read; "
                + "hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "kornerupine", BenchWeight = 0.15,
            Indices = PrincipalValues.Biaxial(new(1.660, 1.682), new(0.013, 0.017), new(0.85, 0.95)),
            SpecificGravity = new(3.28, 3.35), Pleochroism = PleochroismHabit.Strong, Dispersion = 0.019,
            UvLong = [new("inert", .6), new("weak", .25), new("moderate", .15)], UvShort = [new("inert", .6), new("weak", .25), new("moderate", .15)],
            Lines = [new(503, false)],
            Hues = [new("green", .55), new("brown", .3), new("yellow", .1), new("blue", .05)],
            Citation = "gemfame.com kornerupine: α 1.660–1.671, β 1.673–1.683, γ 1.674–1.684, biaxial − (may be pseudo-uniaxial), birefringence 0.013–0.017, SG 3.28–3.35, "
                + "weak band at 503 nm, some vanadium-green stones yellow in UV; gemstones-guide.com Kornerupine: low index 1.661–1.682, high 1.674–1.699, birefringence 0.013 "
                + "rising to 0.017 with the indices, β only 0.001 below γ, dispersion 0.019, green and yellow to red-brown dichroism; gemstonebuzz.com kornerupine: RI 1.665–1.678, "
                + "SG 3.28–3.35, inert to yellow in LW and SW, line at 503 nm, strong pleochroism",
            Judgement = "α 1.660–1.682 as the union of the low readings; β near γ (0.85–0.95); UV strengths, hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "petalite", BenchWeight = 0.1,
            Indices = PrincipalValues.Biaxial(new(1.502, 1.507), new(0.012, 0.016), new(0.35, 0.49)),
            SpecificGravity = new(2.39, 2.43),
            UvLong = [new("inert", .85), new("weak", .15)], UvShort = [new("inert", .85), new("weak", .15)],
            Hues = [new("colourless", .8), new("pink", .1), new("yellow", .05), new("grey", .05)],
            Citation = "gemfame.com petalite: α 1.504–1.507, β 1.510–1.513, γ 1.516–1.523, biaxial +, birefringence 0.013, SG 2.3–2.5, some show orange fluorescence, colourless; "
                + "nationalgemlab.in petalite: RI 1.504–1.523, biaxial +, birefringence 0.012–0.014, density 2.412–2.422, no pleochroism; gemstones-guide.com Petalite: RI 1.502–1.518, "
                + "birefringence 0.016, SG 2.40, non-fluorescent in LW and SW; yourgemologist.com petalite: RI 1.502–1.518, birefringence 0.016, SG 2.40, colourless, pale yellow, pink",
            Judgement = "SG ±0.01 about the narrow published figures (2.40–2.42); birefringence 0.012–0.016 as the union; β's place from gemfame's values; UV strengths, "
                + "hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "taaffeite", BenchWeight = 0.1,
            Indices = PrincipalValues.Uniaxial(new(1.721, 1.726), new(0.004, 0.005), positive: false),
            SpecificGravity = new(3.60, 3.62), Pleochroism = PleochroismHabit.Weak, Dispersion = 0.019,
            UvLong = [new("inert", .7), new("weak", .3)], UvShort = [new("inert", .7), new("weak", .3)],
            Lines = [new(458, false)],
            Hues = [new("purple", .5), new("pink", .3), new("red", .1), new("blue", .05), new("colourless", .05)],
            Citation = "gemfame.com taaffeite: ω 1.721–1.726, ε 1.717–1.727, uniaxial −, birefringence 0.004–0.009, SG 3.605–3.613, mauve or lilac to red; gemstones-guide.com "
                + "Taaffeite: RI 1.719–1.723, birefringence 0.004, uniaxial −, dispersion 0.019, SG 3.61, inert to weak green in UV; gemdictionary.blogspot.com taaffeite: "
                + "RI 1.718–1.722, birefringence 0.004, SG 3.62 ± 0.03, weak pleochroism, inert; baike.wangchao.net.cn 塔菲石: RI 1.719–1.723 (±0.002), birefringence "
                + "0.004–0.005, SG 3.61 ± 0.01, uniaxial −, none to weak green fluorescence, weak band at 458 nm possible",
            Judgement = "the Wikipedia infobox copies read (ok-techbrokedad.xyz, defzone.net) give nω 1.722, nε 1.777 and δ 0.055, against every gem page read; the gem pages' "
                + "birefringence 0.004–0.005 is used (gemfame's 0.009 maximum left out); UV strengths, hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "vesuvianite", BenchWeight = 0.2,
            Indices = PrincipalValues.Uniaxial(new(1.700, 1.726), new(0.001, 0.006), positive: false),
            SpecificGravity = new(3.32, 3.47), Pleochroism = PleochroismHabit.Weak, Dispersion = 0.019,
            UvLong = [new("inert", 1)], UvShort = [new("inert", 1)],
            Lines = [new(461, true), new(528, false)],
            Hues = [new("green", .5), new("brown", .3), new("yellow", .15), new("blue", .05)],
            Citation = "Smith, Gem-Stones (bitlit.ru p. 93): idocrase uniaxial, negative, birefringence below 0.001 to 0.006, ordinary index 1.702–1.726, extraordinary 1.706–1.732, "
                + "SG 3.35–3.45, leaf-green and yellowish-brown; gemdictionary.blogspot.com idocrase: RI 1.713–1.718, birefringence 0.005, range 1.700–1.720, uniaxial + or −, "
                + "SG 3.32–3.47, weak pleochroism, dispersion 0.019, inert in UV, strong line at 461 nm, weaker at 528; gemfame.com vesuvianite: SG 3.32–3.47, birefringence very small, "
                + "band at 461 nm, green, yellow and brown most common; gemdat.org vesuvianite (Gemmological Tables 2004): RI 1.698–1.723, uniaxial −, birefringence 0.001–0.012",
            Judgement = "the sign is given either way in the pages read (and the figures printed beside 'negative' or 'positive' contradict the word in two of them): negative is "
                + "written, after Smith and the Gemmological Tables; ω 1.700–1.726 between the ranges read; californite (massive, with grossular) left out; "
                + "hue weights and bench weight: judgement",
        },
    ];
}
