namespace GemIndex.Bench.Independent;

internal static partial class PropertyTable
{
    /// <summary>
    /// Rows of this family, compiled like the first rows (each names the pages read): ornamental stones a bench meets
    /// mostly as massive cabochons, beads and carvings (read by spot, as the aggregate rows of the first rows are), and one
    /// collector crystal (sphalerite). Where a species also comes as rare faceted crystals the row is its massive form.
    /// </summary>
    private static SpeciesProperties[] OrnamentalRows() =>
    [
        new()
        {
            Name = "azurite", BenchWeight = 0.2, Form = StoneForm.Aggregate, Opaque = true,
            Indices = PrincipalValues.Biaxial(new(1.720, 1.740), new(0.106, 0.110), new(0.2, 0.3)),
            SpecificGravity = new(3.30, 3.90), Pleochroism = PleochroismHabit.Moderate,
            UvLong = [new("inert", 1)], UvShort = [new("inert", 1)],
            Hues = [new("blue", .9), new("purple", .1)],
            Origins = [new("natural", .9), new("treated", .1)],
            Citation = "globalgemology.com 'Azurite': opaque dark blue to violetish blue, RI 1.730–1.836 (±0.010), birefringence 0.106 by the birefringence blink technique, aggregate "
                + "(rare transparent material DR, biaxial +), fluorescence inert, SG 3.80 (+0.09, −0.50), matrix, calcite and malachite inclusions; gemdat.org azurite (Blue Chart 2010): "
                + "SG 3.70–3.90, biaxial +, birefringence 0.108–0.110, distinct pleochroism, may be coated with colourless wax; RI 1.730–1.838 (Gemmological Tables 2004); "
                + "sco.wikipedia.org 'Azurite': nα 1.730, nβ 1.758, nγ 1.838; studiopjj.blogspot.com 'Azurite': SG 3.7–3.9, botryoidal masses, usually with malachite",
            Judgement = "α ±0.010 about 1.730 (the tolerance read); β's place from the Wikipedia values; the spot read at either end of the span, the upper end over the limit; "
                + "SG as the union of the ranges read (the low end from the matrix-bearing stones of the −0.50 tolerance); the waxed share, hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "charoite", BenchWeight = 0.3, Form = StoneForm.Aggregate,
            Indices = PrincipalValues.Biaxial(new(1.545, 1.552), new(0.007, 0.009), new(0.3, 0.45)),
            SpecificGravity = new(2.54, 2.78),
            UvLong = [new("inert", .6), new("weak", .4)], UvShort = [new("inert", 1)],
            Hues = [new("purple", 1)],
            Citation = "johnjbradshaw.com 'Charoite': a rock of charoite, aegirine-augite, feldspar and tinaksite, semitranslucent to opaque purple with black, grey and white swirls, "
                + "RI 1.550–1.559 (±0.002), birefringence 0.009, aggregate, SG 2.68 (+0.10, −0.14), LW inert to weak patchy red, SW inert, spectrum not diagnostic; gemdat.org charoite "
                + "(Blue Chart 2010): SG 2.54–2.78, RI 1.545–1.560, birefringence 0.009, biaxial + (Gemmological Tables 2004); libretexts Gemology 16.26 'Charoite': RI 1.545–1.560, SG 2.66–2.68",
            Judgement = "α 1.545–1.552 from the two lower bounds read; the sign as Gemmological Tables (libretexts writes −; a spot reading cannot tell); translucent enough for the "
                + "polariscope (the sheet's AGG reaction), so not written opaque; UV strengths and bench weight: judgement",
        },
        new()
        {
            Name = "chrysocolla", BenchWeight = 0.3, Form = StoneForm.Aggregate, Opaque = true,
            Indices = PrincipalValues.Single(1.48, 1.52),
            SpecificGravity = new(1.93, 2.40),
            Hues = [new("blue", .55), new("green", .45)],
            Citation = "gemfame.com 'Chrysocolla': ornamental varieties cryptocrystalline, translucent to opaque blue to blue-green, SG 1.93–2.4, sources differ on RI but about 1.5 "
                + "on the refractometer in practice, often in a matrix of quartz (then the constants may be those of quartz), mixed with malachite or turquoise; anbar.asia "
                + "'How we can diagnose chrysocolla': SG about 2.0–2.4, mottled colour, mixed with malachite, azurite, turquoise",
            Judgement = "the spot range 1.48–1.52 is ±0.02 about the 'about 1.5' read (no page read gave a range); the quartz-impregnated stone is left out (it reads as chalcedony); "
                + "no UV or lines read; hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "maw-sit-sit", BenchWeight = 0.15, Form = StoneForm.Aggregate, Opaque = true,
            Indices = PrincipalValues.Single(1.52, 1.74),
            SpecificGravity = new(2.50, 3.50),
            UvLong = [new("inert", 1)], UvShort = [new("inert", 1)],
            Hues = [new("green", .95), new("black", .05)],
            Citation = "nationalgemlab.in 'Maw-sit-sit': a rock of kosmochlor (about 60 %), chromian jadeite (15 %), eckermannite and albite, always opaque, vivid to dark green with black "
                + "splotches, swirls and veins, chromite flecks and white natrolite, density 2.50–3.20, luminescence none, RI 1.52–1.74, most commonly around 1.52; gemselect.com "
                + "'About maw-sit-sit': RI 1.52–1.74 with composition, the lower end most common, SG 2.5–3.5; jewelryonetsyteam.blogspot.com 'Maw sit sit – huh?': SG 2.5–3.5, RI 1.52–1.74",
            Judgement = "the spot drawn evenly over 1.52–1.74 (the table cannot weight the common low end); SG as the union of the ranges read; hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "muscovite", BenchWeight = 0.15, Form = StoneForm.Aggregate,
            Indices = PrincipalValues.Biaxial(new(1.552, 1.578), new(0.036, 0.040), new(0.85, 0.95)),
            SpecificGravity = new(2.76, 3.00), Pleochroism = PleochroismHabit.Weak,
            Hues = [new("green", .7), new("grey", .1), new("brown", .1), new("yellow", .1)],
            Citation = "gemselect.com 'Muscovite and fuchsite': SG 2.76–3.00, RI 1.552–1.618, colourless or grey, brown, green, yellow, rarely violet or red, translucent to transparent; "
                + "the green chromian variety fuchsite used as an ornamental stone, sparkly when fine-grained; jtv.com gemopedia 'Muscovite': fuchsite birefringence 0.036, SG 2.78; "
                + "gemstones.comparenature.com muscovite: RI 1.552–1.618, pleochroism weak",
            Judgement = "the bench's muscovite taken as massive fuchsite (an aggregate read by spot); α 1.552–1.578 so that γ stays within the 1.618 read, birefringence 0.036–0.040 "
                + "about jtv's figure, β near γ and the negative sign from memory; no UV read; hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "pectolite", BenchWeight = 0.3, Form = StoneForm.Aggregate, Opaque = true,
            Indices = PrincipalValues.Biaxial(new(1.592, 1.610), new(0.028, 0.038), new(0.15, 0.3)),
            SpecificGravity = new(2.62, 2.90),
            UvLong = [new("inert", .4), new("weak", .3), new("moderate", .3)],
            UvShort = [new("inert", .3), new("weak", .25), new("moderate", .25), new("strong", .2)],
            Hues = [new("blue", .7), new("white", .15), new("green", .1), new("grey", .05)],
            Citation = "gemologyproject.com 'Pectolite' (rev. 5376): α 1.592–1.610, β 1.603–1.615, γ 1.630–1.645, biaxial +, SG 2.84–2.90, Larimar 2.62–2.87 (inclusions of other minerals); "
                + "gemfame.com pectolite: the same α, β, γ, birefringence 0.036, spot usually 1.60, SG 2.84–2.90; gemdat.org pectolite (Blue Chart 2010): RI 1.595–1.645, birefringence "
                + "0.028–0.038, SG 2.74–2.90; gemstones.com gemopedia 'Larimar': opaque, RI 1.590–1.630 (+0.017/−0.004), birefringence 0.029–0.038, biaxial +, aggregate, SWUV inert to "
                + "strong greenish yellow or orange, LWUV inert to moderate, SG 2.620–2.900 (typical 2.810), blue, grey, white; libretexts Gemology 16.47 'Larimar': aggregate, SG 2.62–2.87",
            Judgement = "the bench's pectolite taken as larimar (massive, read by spot); β's place from the published α, β, γ; UV strengths, hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "prehnite", BenchWeight = 0.3, Form = StoneForm.Aggregate,
            Indices = PrincipalValues.Biaxial(new(1.611, 1.632), new(0.021, 0.033), new(0.15, 0.35)),
            SpecificGravity = new(2.80, 2.95), Pleochroism = PleochroismHabit.Weak,
            UvLong = [new("inert", .6), new("weak", .4)], UvShort = [new("inert", .6), new("weak", .4)],
            Hues = [new("green", .75), new("yellow", .2), new("colourless", .05)],
            Citation = "gemfame.com prehnite: translucent green or yellow reniform or globular masses, crystals uncommon, α 1.611–1.632, β 1.615–1.642, γ 1.632–1.665, biaxial +, "
                + "birefringence 0.021–0.033, SG 2.802–2.95; mineralru.com prehnite (Wikipedia text): the same indices, SG 2.8–2.95, SW blue-white or peach, LW yellow; Smith, Gem-Stones "
                + "(bitlit.ru p. 95): least and greatest index 1.616 and 1.649, birefringence 0.033, SG 2.81–2.95; blog.bhoma.com prehnite: pleochroism weak, SG 2.80–2.95",
            Judgement = "the translucent masses taken as the bench's prehnite (an aggregate read by spot; the rare faceted crystal left out); β's place from the published α, β, γ; "
                + "UV strengths (the pages give colours only), hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "rhodochrosite", BenchWeight = 0.4, Form = StoneForm.Aggregate,
            Indices = PrincipalValues.Uniaxial(new(1.810, 1.817), new(0.201, 0.220), positive: false, epsilon: new(1.595, 1.600)),
            SpecificGravity = new(3.45, 3.70), Pleochroism = PleochroismHabit.Moderate,
            UvLong = [new("inert", .5), new("weak", .35), new("moderate", .15)], UvShort = [new("inert", .5), new("weak", .35), new("moderate", .15)],
            Lines = [new(410, true), new(551, false), new(450, false)],
            Hues = [new("pink", .7), new("red", .2), new("orange", .1)],
            Citation = "gemfame.com rhodochrosite: ω 1.810, ε 1.597, uniaxial −, birefringence 0.201–0.220, SG 3.70, bands at 551 and 410 nm (565, 535 faint), pink in both UV though "
                + "some specimens show little, banded Argentine masses with whitish calcite; mineralienzimmer.de Rhodochrosit: nω 1.814–1.816, nε 1.596–1.598, birefringence 0.218, "
                + "density 3.45–3.70; yourgemologist.com rhodochrosite: RI 1.597–1.817, birefringence 0.220, uniaxial −, SG about 3.60, mottled pink with white veins when massive; "
                + "langantiques.com (GIA Gem Reference Guide 1988): RI 1.597–1.817; The Journal of Gemmology 36(4) 2018 'Rhodochrosite gems' (fliphtml5 p. 67): Webster's SG 3.45–3.70, "
                + "dark band near 410 nm, weaker near 450 and 550 nm, transparent stones inert to LW and SW; theimage.com rhodochrosite: SG 3.25–3.70",
            Judgement = "the banded massive stone taken as the bench's rhodochrosite (an aggregate read by spot at either end: ε near 1.60, or ω over the limit); ω and ε about the values "
                + "read; the SG of massive material (3.45–3.70, Webster) rather than theimage's wider low end; UV strengths, which bands are strong, hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "rhodonite", BenchWeight = 0.4, Form = StoneForm.Aggregate, Opaque = true,
            Indices = PrincipalValues.Biaxial(new(1.711, 1.734), new(0.010, 0.014), new(0.3, 0.4)),
            SpecificGravity = new(3.30, 3.76), Pleochroism = PleochroismHabit.Weak,
            UvLong = [new("inert", 1)], UvShort = [new("inert", 1)],
            Lines = [new(545, true), new(503, true), new(455, false)],
            Hues = [new("pink", .75), new("red", .2), new("brown", .05)],
            Citation = "jiehonggem.com rhodonite (GIA Gem Reference Guide): usually translucent to opaque pink to brownish or purplish red with black veins of manganese oxide, usually massive, "
                + "AGG, RI 1.733–1.747 (+.010, −.013), spot usually 1.73 (may be 1.54 from quartz), birefringence 0.010–0.014, inert to UV, broad band about 545 nm and a line at 503 nm, "
                + "SG 3.50 (+.26, −.20); gemfame.com rhodonite: α 1.711–1.734, β 1.716–1.739, γ 1.724–1.748, biaxial +, birefringence 0.013, SG 3.57–3.76 for masses, band 548 nm, "
                + "strong line 503 nm, weak band 455 nm; nationalgemlab.in rhodonite: mostly massive and opaque, density 3.57–3.76, RI 1.711–1.751, luminescence none",
            Judgement = "the massive stone taken as the bench's rhodonite, opaque as a bench meets it; β's place from gemfame's values; SG as the union of the ranges read; the lines are "
                + "kept for the record but never written (the simulator reads no spectrum of an opaque stone); hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "sepiolite", BenchWeight = 0.1, Form = StoneForm.Aggregate, Opaque = true, Porous = true,
            Indices = PrincipalValues.Single(1.51, 1.53),
            SpecificGravity = new(1.50, 2.00),
            Hues = [new("white", .7), new("yellow", .2), new("grey", .1)],
            Citation = "gemstonebuzz.com 'Meerschaum / sepiolite': compact opaque earthy masses, white or grey with a yellowish or reddish tinge, RI 1.51–1.53, birefringence none, light and "
                + "porous enough to float on water, pipe bowls turn yellow with smoke; gem5.com meerschaum: SG 1.5, RI 1.51–1.53, porous, may float; gemfame.com sepiolite: SG 2, may float "
                + "on water from its porosity when dry; review.clateway.com 'Sepiolite' (Wikipedia text): nα 1.520, nβ 1.520, nγ 1.530, SG 2, dry porous masses float on water",
            Judgement = "porous and so not immersed (it floats; common practice); the spot range from the two gem pages; no UV read; hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "serpentine", BenchWeight = 0.5, Form = StoneForm.Aggregate,
            Indices = PrincipalValues.Single(1.53, 1.57),
            SpecificGravity = new(2.44, 2.62),
            UvLong = [new("inert", .75), new("weak", .25)],
            Lines = [new(492, false, "green"), new(464, false, "green")],
            Hues = [new("green", .8), new("yellow", .1), new("white", .05), new("brown", .05)],
            Citation = "gemstonebuzz.com serpentine: cryptocrystalline aggregates (bowenite translucent green, williamsite oily green), aggregate, RI 1.530–1.570 usually 1.560; tradeshop.com "
                + "serpentine: RI 1.53–1.57, SG 2.44–2.62, massive, never in crystals; gemsociety.org serpentine: SG 2.44–2.62 gem range (bowenite 2.58–2.62), williamsite may glow weak "
                + "whitish green in LW, bowenite bands at 492 and 464 nm, not diagnostic; gemfame.com serpentine: antigorite RI 1.560–1.571, lizardite 1.546–1.560",
            Judgement = "the aggregate's spot range 1.53–1.57 as read (the member minerals' birefringence is averaged out in a spot); UV strengths, the bands written weak, "
                + "hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "sugilite", BenchWeight = 0.2, Form = StoneForm.Aggregate, Opaque = true,
            Indices = PrincipalValues.Uniaxial(new(1.605, 1.611), new(0.003, 0.005), positive: false),
            SpecificGravity = new(2.69, 2.80),
            UvLong = [new("inert", 1)], UvShort = [new("inert", 1)],
            Lines = [new(419, true), new(411, false), new(437, false), new(445, false), new(550, false)],
            Hues = [new("purple", .95), new("pink", .05)],
            Citation = "johnjbradshaw.com 'Sugilite': semitransparent to opaque red-purple to blue-purple, RI 1.607–1.610 (+0.001, −0.002), quartz may alter it, birefringence usually "
                + "not detectable, uniaxial −, AGG, SG 2.74 (±0.05), inert, band 550 nm and lines 411, 419, 437, 445 nm; gemfame.com sugilite: compact masses, ω 1.595–1.611, ε 1.590–1.607, "
                + "uniaxial −, birefringence 0.003–0.005, SG near 2.74, strong band 419 nm, weak 411 nm and 570 nm; theimage.com sugilite: SG 2.75–2.80, RI 1.606–1.610; gemstonebuzz.com "
                + "sugilite: RI 1.606–1.610, birefringence 0.004, generally aggregate; gemselect.com 'Purple sugilite': SG 2.75–2.80, usually massive, black matrix",
            Judgement = "ω 1.605–1.611 from the GIA-style value and its tolerance; SG as the union of the ranges read; opaque as most sugilite a bench meets (the rare translucent stone "
                + "left out), so the lines are kept for the record but never written; hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "talc", BenchWeight = 0.2, Form = StoneForm.Aggregate, Opaque = true,
            Indices = PrincipalValues.Single(1.539, 1.550),
            SpecificGravity = new(2.20, 2.83),
            UvLong = [new("inert", .8), new("weak", .2)], UvShort = [new("inert", .7), new("weak", .3)],
            Hues = [new("green", .35), new("white", .25), new("grey", .15), new("brown", .15), new("yellow", .1)],
            Citation = "gemsociety.org talc: α 1.539–1.550, β 1.589–1.594, γ 1.589–1.600, biaxial −, shadow edge at 1.54, SG 2.20–2.83, usually no luminescence (some pinkish in LW); "
                + "gemfame.com 'Soapstone': the same α, β, γ, birefringence 0.039, in practice a single reading near 1.54 on massive material, SG 2.20–2.83; gemstones.com gemopedia "
                + "'Soapstone': opaque to semitranslucent, RI 1.540–1.590 (+0.010/−0.002), birefringence 0.046–0.050, aggregate, SWUV inert to yellow, pink or greenish, LWUV inert to weak, "
                + "SG 2.200–2.800 (typical 2.750); gemdat.org steatite (Gemmological Tables 2004): SG 2.20–2.80, opaque",
            Judgement = "the bench's talc taken as steatite (soapstone); the spot at α (the single reading near 1.54 that two pages name) rather than anywhere in the span; "
                + "UV strengths, hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "variscite", BenchWeight = 0.2, Form = StoneForm.Aggregate, Porous = true,
            Indices = PrincipalValues.Biaxial(new(1.550, 1.563), new(0.020, 0.031), new(0.7, 0.85)),
            SpecificGravity = new(2.20, 2.61),
            Lines = [new(688, true), new(650, false)],
            Hues = [new("green", .9), new("blue", .1)],
            Citation = "gemfame.com variscite: fine-grained translucent pale green to blue masses, α 1.550–1.563, β 1.565–1.588, γ 1.570–1.594, biaxial −, birefringence 0.031, SG 2.57–2.61; "
                + "tradeshop.com variscite: RI 1.56–1.59, SG 2.2–2.57, a turquoise substitute; tannerchaney.com variscite (International School of Gemology): RI 1.55–1.59, SG 2.4–2.6, "
                + "absorption at 688 nm with a weaker one at 650 nm; issuhub.com 'Jewel' (p. 104): fine-grained masses, SG 2.5–2.6, RI 1.55–1.59, variscite is porous",
            Judgement = "β's place from gemfame's values; SG as the union of the ranges read; porous and so not immersed (as turquoise; common practice); no UV read; "
                + "the 688 nm line written strong, hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "hemimorphite", BenchWeight = 0.15, Form = StoneForm.Aggregate,
            Indices = PrincipalValues.Biaxial(new(1.612, 1.616), new(0.020, 0.022), new(0.1, 0.2)),
            SpecificGravity = new(3.40, 3.50),
            UvLong = [new("inert", .8), new("weak", .2)], UvShort = [new("inert", .3), new("weak", .3), new("moderate", .4)],
            Hues = [new("blue", .75), new("white", .1), new("green", .05), new("colourless", .05), new("brown", .05)],
            Citation = "gemfame.com hemimorphite: more commonly in masses, translucent light blue cabochons, α 1.614, β 1.617, γ 1.636, biaxial +, birefringence 0.021, SG 3.4–3.5; "
                + "gia.edu G&G Summer 2020 Lab Notes 'Hemimorphite resembling Paraíba tourmaline': semitransparent blue cabochon, RI about 1.61–1.63, birefringence 0.02, SG 3.45, "
                + "medium blue in SW, inert in LW; wiki-des-bijoutiers.fr hémimorphite: density 3.4–3.5, RI 1.614–1.636, birefringence 0.022, weak luminescence, often banded blue and white; "
                + "gemstones.comparenature.com hemimorphite: RI 1.614–1.636, birefringence 0.022",
            Judgement = "the blue masses taken as the bench's hemimorphite (an aggregate read by spot; the rare faceted crystal left out); α ±0.002 about 1.614 and β's place from gemfame's "
                + "values; UV strengths from one stone and one 'weak': judgement; hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "sphalerite", BenchWeight = 0.15,
            Indices = PrincipalValues.Single(2.368, 2.430),
            SpecificGravity = new(3.90, 4.10), Dispersion = 0.156,
            UvLong = [new("inert", .6), new("moderate", .15), new("strong", .25)], UvShort = [new("inert", .6), new("moderate", .15), new("strong", .25)],
            Lines = [new(692, true, "orange"), new(665, true, "orange"), new(651, false, "orange")],
            Hues = [new("yellow", .35), new("orange", .3), new("brown", .15), new("green", .15), new("red", .05)],
            Citation = "gemfame.com sphalerite: cubic, colourless to yellow, red, green and brown, RI 2.37–2.43, dispersion 0.156, SG 3.9–4.1, some bright orange-red to red under both UV, "
                + "bands in the red in some crystals: strongest 665 nm, much weaker 651 nm, a fairly strong broad band near 692 nm; tradeshop.com sphalerite: RI 2.37–2.40, dispersion 0.156, "
                + "SG 3.9–4.1; libretexts Gemology 16.65 'Sphalerite': isotropic, RI 2.368–2.50 rising with iron, SG 3.95–4.10; gem-sphalerite.com 'Physical properties': RI 2.369, "
                + "SG 3.9–4.2, orange stones usually show lines at 690, 667 and 651 nm; litnon.com sphalerite: bright orange-red to red in LW and SW from many localities",
            Judgement = "always over the limit at a bench; the index range cut at 2.43 (the black iron-rich stones up to 2.50 are not cut as gems); the red bands written for orange stones "
                + "(the page that names a colour names orange); UV strengths, hue weights and bench weight: judgement",
        },
    ];
}
