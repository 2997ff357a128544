namespace GemIndex.Bench.Independent;

internal static partial class PropertyTable
{
    /// <summary>
    /// Rows of the catalogue family of the same name, compiled like the first rows (each names the pages read): three
    /// massive ornamental stones read by spot (seraphinite, gaspeite, agalmatolite), four soft collector crystals cut for
    /// their lustre or colour (cuprite, cerussite, baryte, celestine), and horn, an organic kept here with its family.
    /// </summary>
    private static SpeciesProperties[] OrnamentalMineralsRows() =>
    [
        new()
        {
            Name = "clinochlore", BenchWeight = 0.2, Form = StoneForm.Aggregate, Opaque = true,
            Indices = PrincipalValues.Biaxial(new(1.571, 1.588), new(0.005, 0.011), new(0.02, 0.15)),
            SpecificGravity = new(2.55, 3.02), Pleochroism = PleochroismHabit.Moderate,
            UvLong = [new("inert", 1)], UvShort = [new("inert", 1)],
            Hues = [new("green", .85), new("grey", .15)],
            Citation = "de.zxc.wiki 'Klinochlor' (German Wikipedia text): nα 1.571–1.588, nβ 1.571–1.589, nγ 1.576–1.599, birefringence 0.005–0.011, biaxial +, density 2.60–3.02, "
                + "visible pleochroism light yellow-green to light blue-green; gemselect.com 'About seraphinite' (Italian page): seraphinite a trade name for a form of clinochlore, dark green "
                + "with a silvery feathery shimmer from mica, density 2.55–2.75, RI 1.576–1.599; nationalgemlab.in 'Seraphinite': density 2.60–3.02, luminescence none, commonly foliated, "
                + "fibrous, massive; wikireact.com 'Serafinita' (Spanish Wikipedia text): RI 1.571–1.597, birefringence 0.005–0.011, SG 2.600–3.000, UV inert; "
                + "movingtogetherinvestment.com seraphinite product text: translucent to opaque, dark green to grey with silvery chatoyant fibres",
            Judgement = "the bench's clinochlore taken as seraphinite (a fibrous aggregate read by spot, opaque as the cabochons are met); β's place near α from the Wikipedia values; "
                + "SG as the union of the ranges read; the pleochroism kept for the record (never written of an opaque stone); one product page says seraphinite is sometimes polymer "
                + "impregnated, not written as a treated share (no bench page read for it); hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "gaspeite", BenchWeight = 0.15, Form = StoneForm.Aggregate, Opaque = true,
            Indices = PrincipalValues.Uniaxial(new(1.825, 1.835), new(0.215, 0.225), positive: false, epsilon: new(1.605, 1.615)),
            SpecificGravity = new(3.70, 3.91),
            UvLong = [new("inert", 1)], UvShort = [new("inert", 1)],
            Hues = [new("green", .85), new("yellow", .15)],
            Origins = [new("natural", .85), new("treated", .15)],
            OriginCitation = "katch.ne.jp 'Gaspeite' (Japanese page: alters easily and is soft, so resin coating is usual); nationalgemlab.in 'Gaspeite' says it is not known to be treated; "
                + "the treated share .15 between the two: judgement",
            Citation = "gemfame.com 'Gaspeite': (Ni,Mg)CO3 of the calcite group, translucent grass-green to olive- or yellowish green nodular concretions, SG near 3.7, ordinary and "
                + "extraordinary rays 1.83 and 1.61, uniaxial −, birefringence 0.220; nationalgemlab.in 'Gaspeite': commonly compact massive, density 3.71, non-fluorescent, translucent to opaque, "
                + "RI 1.610–1.830 uniaxial −, birefringence 0.220, apple green often with brown veins; geology.com 'Gaspeite': cryptocrystalline material usually opaque, SG 3.71 varying with "
                + "solid solution, RI 1.61 to 1.83 with strong birefringence blink, brown matrix or mottling; le-comptoir-geologique.com 'Gaspéite': density 3.71–3.91, IR 1.610–1.830, "
                + "birefringence 0.220, uniaxial −, no pleochroism, no fluorescence",
            Judgement = "ω, ε and the birefringence ±0.005 about the single values read; the compact masses taken as opaque (read by spot at either end: ε near 1.61, or ω over the limit); "
                + "SG as the union of the ranges read; hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "pyrophyllite", BenchWeight = 0.15, Form = StoneForm.Aggregate, Opaque = true,
            Indices = PrincipalValues.Single(1.575, 1.605),
            SpecificGravity = new(2.60, 2.90),
            Hues = [new("white", .25), new("green", .25), new("yellow", .2), new("grey", .15), new("brown", .1), new("red", .05)],
            Citation = "gemsociety.org 'Pyrophyllite': α 1.534–1.556, β 1.586–1.589, γ 1.596–1.601, biaxial −, vague shadow edge on the refractometer at about 1.6, South African "
                + "'wonderstone' RI about 1.58 and SG 2.72, indistinguishable by eye from soapstone, the Chinese carving material called agalmatolite; gemfame.com 'Pyrophyllite': compact "
                + "translucent or opaque aggregates, white or pale blue, yellow or green, SG 2.65–2.90, the same α, β, γ, birefringence 0.050; gems.minsoc.ru 'Pyrophyllite' (Bukanov, Russian "
                + "Gemstones Encyclopedia): density 2.6–2.9, agalmatolite a fine-flaked rock of pyrophyllite, brownish, bluish, white, pale yellow, apple-green, cherry-red with hematite; "
                + "cameo.mfa.org 'Agalmatolite': grey, green or yellow, SG 2.8–2.9; snazzdragon.com pyrophyllite: SG 2.65–2.85, white, grey or yellow, reddish-brown from iron staining",
            Judgement = "the bench's pyrophyllite taken as massive agalmatolite read by spot where the pages say it reads (1.575–1.605 about the 1.58 and 'about 1.6' read), as the talc row "
                + "reads soapstone at its single edge rather than anywhere in the span; opaque as the carvings are met; SG as the union of the ranges read; no UV read; hue weights and "
                + "bench weight: judgement",
        },
        new()
        {
            Name = "cuprite", BenchWeight = 0.05, Strained = 0.3,
            Indices = PrincipalValues.Single(2.84, 2.85),
            SpecificGravity = new(6.00, 6.14),
            Hues = [new("red", .9), new("brown", .1)],
            Citation = "gemsociety.org 'Cuprite': RI 2.848, SG 6–6.14, over the refractometer's limit like proustite, rutile and wulfenite, deep red, isometric with no birefringence or "
                + "pleochroism though some stones show them anomalously (polishing with diamond paste leaves strained surfaces); gemfame.com 'Cuprite': cubic, RI 2.84, SG 6.14, transparent "
                + "red crystals from Onganja, synthetic cuprite grown and faceted; issuhub.com (Jewel, p. 89): shades of red to nearly black, SG 6.1, RI 2.85, adamantine to submetallic lustre",
            Judgement = "always over the limit at a bench; anomalous double refraction in 30 % (from the polishing strain the page names; the share: judgement); natural only (the faceted "
                + "synthetic is named but no page says a bench meets it); no UV or lines read; hue weights and a low bench weight: judgement",
        },
        new()
        {
            Name = "cerussite", BenchWeight = 0.05,
            Indices = PrincipalValues.Biaxial(new(1.803, 1.805), new(0.272, 0.275), new(0.98, 0.995)),
            SpecificGravity = new(6.46, 6.57), Dispersion = 0.055,
            UvLong = [new("inert", .85), new("strong", .15)], UvShort = [new("inert", .2), new("weak", .5), new("moderate", .3)],
            Hues = [new("colourless", .85), new("grey", .1), new("white", .05)],
            Citation = "gemfame.com 'Cerussite': PbCO3, faceted stones almost invariably transparent and colourless (white or grey usual, black, blue and green known), SG 6.46–6.57, "
                + "RIs 1.804, 2.076 and 2.078, birefringence 0.274, biaxial −, usually a pale blue or green glow in SW, some from Utah bright orange in LW, dispersion 0.055; "
                + "gemstonebuzz.com 'Cerussite': RI 1.80–2.08, birefringence 0.274, colourless, white, grey, adamantine, told from diamond by its density; gemstones.comparenature.com "
                + "cerussite: RI 1.803–2.078, birefringence 0.273, dispersion 0.06, pleochroism absent (Schumann)",
            Judgement = "β's place from gemfame's values (β near γ: the negative sign); α ±0.001 about the values read; UV strengths from 'usually a pale glow' (SW) and the one "
                + "locality named for LW: judgement; hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "baryte", BenchWeight = 0.08,
            Indices = PrincipalValues.Biaxial(new(1.634, 1.637), new(0.011, 0.013), new(0.05, 0.2)),
            SpecificGravity = new(4.30, 4.60), Pleochroism = PleochroismHabit.Weak,
            UvLong = [new("inert", .6), new("weak", .4)], UvShort = [new("inert", .6), new("weak", .4)],
            Hues = [new("yellow", .3), new("colourless", .2), new("blue", .2), new("brown", .15), new("orange", .1), new("green", .05)],
            Citation = "gemologyproject.com 'Barite' (rev. 10820): nα 1.634–1.637, nβ 1.636–1.638, nγ 1.646–1.648, birefringence 0.012, biaxial +, SG 4.3–5, generally white or colourless; "
                + "gemfame.com 'Barite': SG 4.3–4.6, gemmy material near 4.47, RIs 1.636, 1.637, 1.648, birefringence 0.012, biaxial +, sometimes a faint blue or light green glow in UV, "
                + "white, yellow, green, red, blue or brown, blue Colorado, yellow Cumbrian, orange Namibian and yellow Nevada crystals; gem5.com 'Barite': SG 4.45, RI 1.63–1.65, "
                + "birefringence 0.012; opticalmineralogy.com 'Barite': indices 1.634–1.649, birefringence 0.012, SG about 4.50, coloured varieties weakly pleochroic",
            Judgement = "β's place from the published α, β, γ; SG from the gem pages (gemologyproject's upper 5 is left out: no gem page reads above 4.6); UV strengths from 'sometimes "
                + "a faint glow'; hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "celestine", BenchWeight = 0.08,
            Indices = PrincipalValues.Biaxial(new(1.618, 1.622), new(0.009, 0.012), new(0.25, 0.4)),
            SpecificGravity = new(3.95, 4.00), Pleochroism = PleochroismHabit.Weak,
            UvLong = [new("inert", .4), new("weak", .45), new("moderate", .15)], UvShort = [new("inert", .4), new("weak", .45), new("moderate", .15)],
            Hues = [new("blue", .5), new("colourless", .3), new("orange", .1), new("yellow", .05), new("green", .05)],
            Citation = "gemfame.com 'Celestine': SrSO4, faceted from colourless, yellowish or bluish green crystals, SG 3.97–4.00, RIs 1.619, 1.623, 1.631, biaxial +, birefringence 0.012, "
                + "gem material may read slightly higher, a whitish or bluish white glow in UV, blue Madagascan and orange Canadian stones; bitlit.ru King, 'Texas gemstones' (Celestite): "
                + "SG 3.95–3.98, RI 1.62–1.63, colourless and blue gem crystals; issuhub.com (Jewel, p. 121): colourless, red, green, blue, SG 4.0, RI 1.62–1.64; gem5.com 'Celestine': "
                + "SG 3.98, RI 1.62–1.63, double refraction 0.01; cardozapub.com celestite (translated text): RI 1.619–1.637, pleochroism weak, sometimes yellow or blue fluorescence",
            Judgement = "α 1.618–1.622 about gemfame's 1.619 and its 'slightly higher' gem material; birefringence between the 0.01 and 0.012 read; β's place from gemfame's values; "
                + "UV strengths from 'a whitish glow' and 'sometimes': judgement; hue weights and bench weight: judgement",
        },
        new()
        {
            // Organic: not immersed (the table's convention for organics, common practice), so its SG never reaches a bench line.
            Name = "horn", BenchWeight = 0.2, Form = StoneForm.Amorphous, Porous = true,
            Indices = PrincipalValues.Single(1.54, 1.57),
            SpecificGravity = new(1.30, 1.80),
            Hues = [new("brown", .55), new("black", .2), new("white", .15), new("yellow", .1)],
            Origins = [new("natural", .8), new("treated", .2)],
            OriginCitation = "gems.minsoc.ru 'Horn' (Bukanov): horn can be coloured artificially red, brown or black, and coloured horn imitates tortoiseshell, jet and agate; "
                + "the dyed share .2: judgement",
            Citation = "gems.minsoc.ru 'Horn' (Bukanov, Russian Gemstones Encyclopedia): bioorganic, amorphous, density 1.3–1.8, pitch lustre, thermoplastic, light to dark brown, used for "
                + "inexpensive adornments and carvings; sites.google.com 'History time capsules: Horn': keratin, amorphous, white to brown, greasy to resinous lustre, opaque to translucent; "
                + "gill.readingroo.ms copy of bwsmigel.info 'Less common organic gem materials': horn, tortoiseshell and claws share the keratin protein; ruigalopim.com 'Biogenic gem materials "
                + "and CITES': horn an organic gem material with tortoiseshell and black coral",
            Judgement = "no page read gave horn's index: 1.54–1.57 from memory (about 1.56), beside the 1.54–1.56 that gemfyi.com and jtv.com give tortoiseshell's keratin; SG as read, "
                + "never written (not immersed); amorphous as the pages say; no UV read; hue weights and bench weight: judgement",
        },
    ];
}
