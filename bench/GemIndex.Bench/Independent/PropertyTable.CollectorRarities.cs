namespace GemIndex.Bench.Independent;

internal static partial class PropertyTable
{
    /// <summary>
    /// Rows of the catalogue family of the same name, compiled like the first rows (each names the pages read): rare
    /// collector stones, mostly colourless or weakly coloured, cut now and then from specimen material. Found with the
    /// public search tool (pages corpus) and read there, never taken from the catalogue. Hue weights, UV weights, origin
    /// shares and bench weights are judgements.
    /// </summary>
    private static SpeciesProperties[] CollectorRaritiesRows() =>
    [
        new()
        {
            Name = "dioptase", BenchWeight = 0.15,
            Indices = PrincipalValues.Uniaxial(new(1.644, 1.658), new(0.051, 0.053), positive: true, epsilon: new(1.697, 1.710)),
            SpecificGravity = new(3.25, 3.35), Pleochroism = PleochroismHabit.Weak, Dispersion = 0.030,
            UvLong = [new("inert", 1)], UvShort = [new("inert", 1)],
            Lines = [new(550, true)],
            Hues = [new("green", .85), new("blue", .15)],
            Citation = "gemfame.com 'Dioptase: gemstones information': ω 1.644–1.658, ε 1.697–1.709, uniaxial +, birefringence about 0.053, SG 3.28–3.35, only a broad band "
                + "centred near 550 nm with strong absorption of blue and violet, many specimens translucent at best; gemdictionary.blogspot.com dioptase: 1.644–1.697 (range "
                + "1.633–1.710), birefringence 0.053, SG 3.28–3.35, weak pleochroism, dispersion 0.036, inert in UV, emerald green to bluish green; gemologyproject.com Dioptase: "
                + "uniaxial +, 1.644–1.709, birefringence 0.053, dispersion 0.030, SG 3.28–3.35; gemmologue.ch dioptase: 1.655–1.708 (±0.012), birefringence 0.051–0.053, "
                + "SG 3.30 (±0.05), no fluorescence, band at 550; Wikipedia 'Dioptase' infobox (review.clateway.com and mineralru.com copies): nω 1.652–1.658, nε 1.704–1.710",
            Judgement = "ω as gemfame's range (the Wikipedia copies' narrower one inside it); ε 1.697–1.710 as the union; SG from gemmologue's tolerance (3.25) to 3.35; "
                + "dispersion 0.030 of the two values read (gemologyproject and gemology101.org agree; gemdictionary 0.036); the 550 nm band written strong (the only feature "
                + "named); hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "datolite", BenchWeight = 0.1,
            Indices = PrincipalValues.Biaxial(new(1.618, 1.626), new(0.044, 0.047), new(0.52, 0.73)),
            SpecificGravity = new(2.90, 3.00), Dispersion = 0.016,
            UvLong = [new("inert", 1)], UvShort = [new("inert", .6), new("weak", .3), new("moderate", .1)],
            Hues = [new("colourless", .55), new("green", .2), new("yellow", .15), new("pink", .05), new("grey", .05)],
            Citation = "gemfame.com 'Datolite: gemstones information': α 1.622–1.626, β 1.649–1.654, γ 1.666–1.670, biaxial −, birefringence 0.044–0.047, SG 2.96–3.00, "
                + "some specimens blue in SW, faceted stones colourless or pale; gemstones.com gemopedia Datolite: RI 1.626–1.670 (tolerance −0.004), birefringence 0.044–0.046, "
                + "biaxial −, dispersion 0.016, pleochroism unobservable, SG 2.900–3.000 (typical 2.950), colourless, grey, green, pink, red, white, yellow; nationalgemlab.in "
                + "datolite: RI 1.626–1.670, biaxial −, birefringence 0.044, density 2.96–3.00, blue in SW, X = Y = Z colourless; gemologiamllopis.com 'Identificación de una "
                + "datolita incolora': a laboratory stone read 1.618–1.651, SG 2.97, inert in LW and SW",
            Judgement = "α 1.618–1.626 as the union of the published range (with its tolerance) and the laboratory reading; β's place (0.52–0.73, negative) from gemfame's "
                + "α, β, γ; SW strengths (blue in some, inert in the laboratory stone), hue weights and bench weight: judgement; the opaque copper-bearing nodules cut "
                + "as cabochons left out (the row is the transparent crystal)",
        },
        new()
        {
            Name = "hambergite", BenchWeight = 0.1,
            Indices = PrincipalValues.Biaxial(new(1.553, 1.560), new(0.071, 0.074), new(0.4, 0.48)),
            SpecificGravity = new(2.347, 2.372), Dispersion = 0.017,
            Hues = [new("colourless", .8), new("yellow", .1), new("grey", .1)],
            Citation = "gemstones-guide.com Hambergite: biaxial +, lowest index 1.553–1.559, highest 1.625–1.631, birefringence fairly constant at 0.072 (table 0.071), "
                + "dispersion 0.017, SG 2.35, colourless; Wikipedia 'Hambergite' infobox (wikiland.org, polpedia.pl and jablog.org copies): nα 1.554–1.560, nβ 1.587–1.591, "
                + "nγ 1.628–1.631, δ 0.074, 2V 87°, SG 2.347–2.372, colourless to pale grey or pale yellow, no pleochroism; gem5.com hambergite: SG 2.35, RI 1.55–1.63, "
                + "double refraction 0.072",
            Judgement = "β's place (0.40–0.48, positive, near halfway as 2V 87° says) from the Wikipedia α, β, γ; pleochroism none (the infobox; gem5's 'distinct' "
                + "left out for a colourless stone); no UV strength read (chemie-schule.de says only 'fluorescent'); hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "clinozoisite", BenchWeight = 0.1, SgFollowsIndex = 1,
            Indices = PrincipalValues.Biaxial(new(1.670, 1.715), new(0.005, 0.015), new(0.2, 0.45)),
            SpecificGravity = new(3.21, 3.40), Pleochroism = PleochroismHabit.Moderate,
            UvLong = [new("inert", 1)], UvShort = [new("inert", 1)],
            Lines = [new(455, false)],
            Hues = [new("green", .5), new("yellow", .2), new("pink", .15), new("grey", .1), new("colourless", .05)],
            Citation = "gemfame.com 'Clinozoizite: gemstones information': α 1.670–1.715, β 1.675–1.725, γ 1.690–1.734, biaxial +, birefringence 0.005–0.015, "
                + "SG 3.21–3.38, pale green, pink or yellow, sometimes colourless, spectrum like epidote's, grey-green stones from Kenya; le-comptoir-geologique.com "
                + "clinozoisite: RI 1.706–1.735, birefringence 0.006–0.011, biaxial +, density 3.3–3.4, pleochroism visible, no fluorescence; gemstoneslist.com "
                + "clinozoisite: density 3.2–3.3, olive to yellow-green; studiopjj.blogspot.com 'Epidote' (epidote group: band at 455 nm or none by direction)",
            Judgement = "SG 3.21–3.40 as the union; β's place (0.2–0.45, positive) from the sign and the low ends of gemfame's ranges; pleochroism written moderate "
                + "('visible'); the 455 nm band written faint from 'like epidote'; SG rising with the index (iron, towards epidote) from memory; hue weights and "
                + "bench weight: judgement",
        },
        new()
        {
            Name = "sapphirine", BenchWeight = 0.1,
            Indices = PrincipalValues.Biaxial(new(1.701, 1.726), new(0.004, 0.007), new(0.45, 0.8)),
            SpecificGravity = new(3.40, 3.58), Pleochroism = PleochroismHabit.Strong, Dispersion = 0.019,
            UvLong = [new("inert", 1)], UvShort = [new("inert", 1)],
            Lines = [new(445, false), new(550, false)],
            Hues = [new("blue", .6), new("pink", .15), new("green", .1), new("grey", .1), new("red", .05)],
            Citation = "gemfame.com 'Sapphirine: gemstone information': α 1.701–1.726, β 1.703–1.728, γ 1.705–1.734, biaxial + or −, birefringence 0.006, SG 3.4–3.5, "
                + "strong pleochroism in blues, purplish pink Sri Lankan stone, orange-red from Tanzania; jtv.com gemopedia Sapphirine: RI 1.701–1.734, birefringence "
                + "0.004–0.007, biaxial + or −, dispersion 0.019, inert in LW and SW, strongly trichroic, SG 3.400–3.580, strong line at 445 nm and weaker 550 nm seen in "
                + "the dark ray, stones usually too dark for a spectrum; gemsociety.org sapphirine: SG 3.4–3.5, birefringence 0.006, luminescence none reported, pink "
                + "stone RI 1.701–1.707, SG 3.51, α 1.714–1.716, β 1.719–1.721, γ 1.720–1.723, biaxial −, pleochroism distinct; mints.uwc.ac.za sapphirine: most optically "
                + "negative, indices rising with iron, birefringence 0.005–0.012",
            Judgement = "birefringence from the gem pages (the petrographic 0.012 left out); β's place 0.45–0.8 (either sign, mostly negative: gemsociety's values give "
                + "about 0.75); both lines written faint (the page says stones are usually too dark to show them); hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "pollucite", BenchWeight = 0.1,
            Indices = PrincipalValues.Single(1.517, 1.525),
            SpecificGravity = new(2.85, 2.95), Dispersion = 0.012,
            UvLong = [new("inert", .5), new("weak", .4), new("moderate", .1)], UvShort = [new("inert", .5), new("weak", .35), new("moderate", .15)],
            Hues = [new("colourless", .75), new("grey", .1), new("pink", .1), new("blue", .05)],
            Citation = "gemfame.com 'Pollucite: gemstone information': cubic, SG 2.85–2.94, RI 1.518–1.525, orange to pink fluorescence may be seen in UV; gemstones-guide.com "
                + "Pollucite: single refractive, RI about 1.517–1.525, SG 2.90–2.94, orange to pink fluorescence, colourless or light grey; patrickvoillot.com pollucite: "
                + "RI 1.518–1.525, isotropic, density 2.85–2.95, dispersion 0.012, fluorescence variable, may be pinkish orange; nationalgemlab.in pollucite: RI 1.507–1.525, "
                + "density 2.68–3.03, SW cream white or blue-green, LW weak orange, dispersion 0.012, colourless, white, grey, pale pink, violet, blue",
            Judgement = "RI and SG as the three gem pages agree (nationalgemlab's mineral ranges 1.507 and 2.68–3.03 left out); gemstones-guide's 'birefringence 0.012' "
                + "read as a misplaced dispersion, no strain written; UV strengths, hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "lazulite", BenchWeight = 0.1, SgFollowsIndex = 1,
            Indices = PrincipalValues.Biaxial(new(1.604, 1.626), new(0.031, 0.036), new(0.6, 0.85)),
            SpecificGravity = new(3.10, 3.24), Pleochroism = PleochroismHabit.Strong,
            Hues = [new("blue", .9), new("green", .1)],
            Citation = "gemfame.com 'Lazulite: gemstone information': α 1.604–1.626, β 1.626–1.654, γ 1.637–1.663, biaxial −, birefringence 0.031–0.036, SG 3.122–3.240, "
                + "strongly pleochroic dark blue, light blue and colourless, fine blue stones from Brazil, green from Pakistan, series to scorzalite; gemdictionary.blogspot.com "
                + "lazulite: RI 1.61–1.64, birefringence 0.031, SG 3.10, mottled pale to dark blue, transparent stones pleochroic blue and colourless, often not transparent; "
                + "gemstonebuzz.com lazulite: the same RI and birefringence",
            Judgement = "SG 3.10–3.24 as the union; β's place (0.6–0.85, negative) from gemfame's ranges; SG rising with the index (iron, towards scorzalite) from memory; "
                + "no UV read; the row is the transparent crystal (translucent mottled cabochon material left out); hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "beryllonite", BenchWeight = 0.1,
            Indices = PrincipalValues.Biaxial(new(1.550, 1.555), new(0.009, 0.012), new(0.6, 0.75)),
            SpecificGravity = new(2.77, 2.84), Dispersion = 0.010,
            UvLong = [new("inert", 1)], UvShort = [new("inert", 1)],
            Hues = [new("colourless", .9), new("yellow", .1)],
            Citation = "gemfame.com 'Beryllonite: gemstone information': α 1.552, β 1.558, γ 1.561, biaxial −, birefringence 0.009, SG 2.77–2.84, dispersion 0.010, "
                + "almost always colourless, inert in UV, chatoyant specimens from Afghanistan; Smith, Gem-Stones ch. XXXV (clyx.com copy): biaxial −, least and greatest "
                + "indices 1.553 and 1.565, clear colourless stones from Stoneham, Maine; absoluteastronomy.com beryllonite: colourless to white or pale yellowish, SG 2.8, "
                + "nα 1.552, nβ 1.558, nγ 1.561",
            Judgement = "α ±0.002 about the single published values (1.552, 1.553); birefringence 0.009–0.012 as the two sources read; β's place from gemfame's values "
                + "(0.67); hue weights and bench weight: judgement",
        },
    ];
}
