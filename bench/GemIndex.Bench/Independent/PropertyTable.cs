namespace GemIndex.Bench.Independent;

/// <summary>
/// The independent property table: species values compiled from published pages read for this benchmark (each row
/// names its sources), never from the catalogue or the engine. Where a source gives nα, nβ, nγ ranges they are turned
/// into the lowest index, the birefringence and β's place between α and γ (<see cref="PrincipalValues"/>); where a
/// source gives "1.762–1.770 (+.009, −.005)" the tolerance widens the range. A value not read in any source is marked
/// "from memory" in its row; for stones above the refractometer's limit only "over the limit" is ever used of it.
/// Hue weights, UV weights, origin shares and bench weights are judgements (docs/benchmark.md, "Judgements").
/// </summary>
internal static partial class PropertyTable
{
    /// <summary>Every row: the first rows here, then the families kept in files of their own (PropertyTable.*.cs).</summary>
    public static IReadOnlyList<SpeciesProperties> Species { get; } = [.. FirstRows(), .. CrystalRows(), .. OrnamentalRows(), .. OrganicAndManMadeRows(), .. CollectorRaritiesRows(), .. OrnamentalMineralsRows()];

    private static SpeciesProperties[] FirstRows() =>
    [
        new()
        {
            Name = "corundum", BenchWeight = 3,
            Indices = PrincipalValues.Uniaxial(new(1.765, 1.779), new(0.008, 0.010), positive: false),
            SpecificGravity = new(3.97, 4.05), Pleochroism = PleochroismHabit.Moderate, Dispersion = 0.018,
            Lines =
            [
                new(694, true, "red"), new(692, true, "red"),
                new(450, true, "blue", NaturalOnly: true), new(460, false, "blue", NaturalOnly: true), new(470, false, "blue", NaturalOnly: true),
                new(450, false, "yellow", NaturalOnly: true),
            ],
            Hues = [new("blue", .35), new("red", .25), new("pink", .12), new("yellow", .1), new("colourless", .06), new("purple", .05), new("orange", .04), new("green", .03)],
            Origins = [new("natural", .15), new("synthetic", .3), new("treated", .52), new("composite", .03)],
            OriginCitation = "gemsociety.org 'Corundum treatments': almost all rubies and sapphires receive heat treatment; aussiesapphire.com 'Heat treatment': "
                + "buyers should assume all sapphire has been heated (treated .52 against unheated natural .15; synthetic and composite shares: judgement)",
            Citation = "gemologyproject.com/wiki Corundum (rev. 4643): uniaxial −, RI 1.762–1.770 (+.009, −.005), birefringence 0.008–0.010, dispersion 0.018, pleochroism weak to moderate; "
                + "Handbook of Precious Stones (wikisource p. 80): SG 3.97–4.05; lotusgemology.com 'Gem testing with the spectroscope': blue sapphire iron lines 450, 460, 470 nm (natural); "
                + "clouddl.cn UV-vis article: natural yellow sapphire 450 nm, heated lacks it; gemologiamllopis.com certificate 24-1821: ruby doublet 694/692 nm",
        },
        new()
        {
            Name = "beryl", BenchWeight = 2.5, SgFollowsIndex = 1,
            Indices = PrincipalValues.Uniaxial(new(1.568, 1.602), new(0.004, 0.008), positive: false),
            SpecificGravity = new(2.63, 2.92), Pleochroism = PleochroismHabit.Moderate, Dispersion = 0.014,
            Lines = [new(683, true, "green"), new(680, true, "green"), new(637, false, "green")],
            Hues = [new("green", .4), new("blue", .35), new("yellow", .1), new("pink", .08), new("colourless", .05), new("red", .02)],
            Origins = [new("natural", .45), new("synthetic", .15), new("treated", .4)],
            OriginCitation = "igindia.techway.online 'Emerald': most emeralds are oiled to fill surface-reaching cracks; gemsociety.org 'Just ask Jeff' (aquamarine): "
                + "most aquamarine starts bluish green and is heated to blue (treated .4 against untreated natural .45: judgement from those words)",
            Citation = "Wikipedia 'Beryl' infobox (wiki.av1.space copy; cites Handbook of Mineralogy, mindat): uniaxial −, indices 1.564–1.602 (the larger list taken as ω), birefringence 0.004–0.007, SG 2.63–2.92; "
                + "cadby.co.uk Emerald: birefringence 0.005–0.008, dispersion 0.014, emerald lines 683, 680, 637 nm",
            Judgement = "SG rising with the indices (alkali-rich beryl): judgement, not read in a source here; hue, origin weights: judgement",
        },
        new()
        {
            Name = "chrysoberyl", BenchWeight = 1,
            Indices = PrincipalValues.Biaxial(new(1.742, 1.750), new(0.008, 0.011), new(0.1, 0.35)),
            SpecificGravity = new(3.71, 3.75), Pleochroism = PleochroismHabit.Moderate, Dispersion = 0.015,
            Lines = [new(444, true, "yellow", NaturalOnly: true), new(444, true, "green", NaturalOnly: true)],
            Hues = [new("yellow", .4), new("green", .4), new("brown", .2)],
            Origins = [new("natural", .85), new("synthetic", .15)],
            Citation = "gemstones-guide.com 'Physical & Optical Properties of Chrysoberyl': RI 1.746–1.755 each ±0.004, birefringence 0.008–0.009, biaxial +, SG 3.71–3.75, dispersion 0.015; "
                + "rocksandgems.info chrysoberyl: birefringence 0.011; aggemologist.blogspot.com 'Chrysoberyl' (2021): yellow-green and brown chrysoberyl show a broad "
                + "band centred at 444 nm, which general absorption hides in very brown stones; Gao et al. (2023), Crystals 13, 1580, abstract: Fe-related 440 nm peak in canary yellow chrysoberyl",
            Judgement = "β near α (fraction 0.1–0.35) from the sign and the typical readings; the 444 nm band strong in yellow and green stones, none written for brown ones, and natural stones only (laboratory-grown chrysoberyl need not hold iron); hue, origin weights: judgement",
        },
        new()
        {
            Name = "spinel", BenchWeight = 1.5, Strained = 0.1,
            Indices = PrincipalValues.Single(1.710, 1.735),
            SpecificGravity = new(3.57, 3.70),
            UvLong = [new("inert", .4), new("weak", .3), new("strong", .3)],
            Lines = [new(458, true, "blue", NaturalOnly: true), new(478, false, "blue", NaturalOnly: true)],
            Hues = [new("red", .3), new("pink", .2), new("blue", .2), new("purple", .15), new("orange", .05), new("black", .05), new("colourless", .05)],
            Origins = [new("natural", .7), new("synthetic", .3)],
            Citation = "awesomegems.com spinel: RI 1.718 (+.017, −.008), SG 3.60 (+.10, −.03); amezin.com spinel: red stones strong red fluorescence, blue weak; "
                + "gemlab.co.uk 'Green, blue and violet Spinel': iron lines 458 (strong), 478 (weaker)",
            Judgement = "strain (anomalous double refraction) in 10 %, UV shares, hue and origin weights: judgement",
        },
        new()
        {
            Name = "topaz", BenchWeight = 2, SgFollowsIndex = -1,
            Indices = PrincipalValues.Biaxial(new(1.606, 1.629), new(0.008, 0.010), new(0.2, 0.4)),
            SpecificGravity = new(3.49, 3.57), Pleochroism = PleochroismHabit.Moderate, Dispersion = 0.014,
            UvLong = [new("inert", .5), new("weak", .5)], UvShort = [new("inert", .5), new("weak", .5)],
            Hues = [new("blue", .35), new("colourless", .3), new("yellow", .15), new("orange", .1), new("pink", .1)],
            Origins = [new("natural", .6), new("treated", .4)],
            Citation = "Wikipedia 'Topaz' infobox (sco/si copies): biaxial +, nα 1.606–1.629, nβ 1.609–1.631, nγ 1.616–1.638, SG 3.49–3.57, LW cream, SW golden yellow; "
                + "gemologyproject.com Topaz (rev. 6435): birefringence 0.008–0.010, fluorine lowers the index and raises SG, pleochroism distinct to strong, dispersion 0.014",
            Judgement = "UV strengths (the sources give colours only) and hue, origin weights: judgement",
        },
        new()
        {
            Name = "tourmaline", BenchWeight = 2, SgFollowsIndex = 1,
            Indices = PrincipalValues.Uniaxial(new(1.635, 1.675), new(0.014, 0.040), positive: false, epsilon: new(1.610, 1.650)),
            SpecificGravity = new(3.00, 3.26), Pleochroism = PleochroismHabit.Strong, Dispersion = 0.017,
            UvLong = [new("inert", .7), new("weak", .3)], UvShort = [new("inert", .7), new("weak", .3)],
            Lines = [new(498, true, "green"), new(498, true, "blue"), new(458, false, "pink"), new(451, false, "pink"), new(458, false, "red"), new(451, false, "red")],
            Hues = [new("green", .35), new("pink", .25), new("blue", .1), new("red", .1), new("brown", .08), new("black", .07), new("yellow", .05)],
            Citation = "Wikipedia 'Tourmaline' infobox (si copy; cites GIA Gem Reference Guide 1995): uniaxial −, nω 1.635–1.675, nε 1.610–1.650, birefringence 0.018–0.040, SG 3.06 (+.20, −.06), "
                + "dispersion 0.017, pink stones inert to very weak in LW and SW, 498 nm band in blue and green, 458 and 451 nm in red and pink; "
                + "gemologyproject.com Indicolite: birefringence 0.014–0.022",
            Judgement = "SG rising with the indices and birefringence (dark iron-rich stones): judgement; hue weights: judgement",
        },
        new()
        {
            Name = "zircon", BenchWeight = 1, SgFollowsIndex = 1,
            Indices = PrincipalValues.Uniaxial(new(1.810, 1.940), new(0.0, 0.062), positive: true),
            SpecificGravity = new(3.93, 4.80), Pleochroism = PleochroismHabit.Weak,
            Hues = [new("blue", .3), new("colourless", .2), new("brown", .2), new("yellow", .1), new("green", .1), new("red", .05), new("orange", .05)],
            Origins = [new("natural", .5), new("treated", .5)],
            Citation = "indygem.com Zircon: ω 1.92–1.94, ε 1.97–2.01, SG 4.6–4.8 (high type); gemselect.com 'green zircon': low and metamict zircon SG 3.93–4.73, RI 1.810–2.024, "
                + "metamictization lowers index and SG together; cigem.ca: birefringence to 0.059, dwindling to zero in metamict stones",
            Judgement = "the whole species lies above the refractometer's limit: only 'over the limit', SG and colour reach the engine; heat-treated share: judgement",
        },
        new()
        {
            Name = "olivine", BenchWeight = 1.2, SgFollowsIndex = 1,
            Indices = PrincipalValues.Biaxial(new(1.650, 1.670), new(0.035, 0.038), new(0.4, 0.6)),
            SpecificGravity = new(3.27, 3.48), Pleochroism = PleochroismHabit.Weak, Dispersion = 0.020,
            UvLong = [new("inert", 1)], UvShort = [new("inert", 1)],
            Hues = [new("green", .85), new("yellow", .1), new("brown", .05)],
            Citation = "aglthai.com peridot: RI 1.654–1.690 (±0.020), birefringence 0.035–0.038, SG 3.34 (+.14, −.07), biaxial + or − (β near halfway), UV generally inert, dispersion 0.020; "
                + "gemstones-guide.com 'Variations in Property': green peridot 1.654/1.690, SG 3.20–3.37, brown 1.665/1.705, SG near 3.48 (index and SG rise together)",
        },
        new()
        {
            Name = "quartz", BenchWeight = 3,
            Indices = PrincipalValues.Uniaxial(new(1.542, 1.546), new(0.008, 0.010), positive: true),
            SpecificGravity = new(2.64, 2.69), Pleochroism = PleochroismHabit.Weak, Dispersion = 0.013,
            Hues = [new("purple", .35), new("yellow", .2), new("colourless", .2), new("brown", .1), new("pink", .1), new("green", .05)],
            Origins = [new("natural", .75), new("synthetic", .15), new("treated", .1)],
            Citation = "Handbook of Precious Stones (wikisource p. 116): ω 1.5442, ε 1.5533, SG 2.642–2.662; gemstones-guide.com 'Variations in Property': RI 1.544–1.553 within ±0.002; "
                + "jiehonggem.com rock crystal (GIA Gem Reference Guide): uniaxial +, SG 2.66 (+.03, −.02), birefringence 0.009",
        },
        new()
        {
            Name = "chalcedony", BenchWeight = 2, Form = StoneForm.Aggregate,
            Indices = PrincipalValues.Single(1.535, 1.539),
            SpecificGravity = new(2.55, 2.65),
            UvLong = [new("inert", .9), new("weak", .1)], UvShort = [new("inert", .9), new("weak", .1)],
            Hues = [new("grey", .2), new("blue", .15), new("orange", .2), new("green", .15), new("black", .1), new("colourless", .1), new("brown", .1)],
            Origins = [new("natural", .6), new("treated", .4)],
            Citation = "gemstones-guide.com 'Physical & Optical Properties of Chalcedony': RI 1.535–1.539, SG 2.55–2.65 (normal 2.60), aggregate (stays light in the polariscope), generally inert to UV; "
                + "jiehonggem.com blue agate (GIA Gem Reference Guide): spot 1.53 or 1.54, SG 2.60 (+.10, −.05)",
            Judgement = "dyed share and hue weights: judgement",
        },
        new()
        {
            Name = "pyrope", BenchWeight = 1.2, SgFollowsIndex = 1, Strained = 0.05,
            Indices = PrincipalValues.Single(1.730, 1.760),
            SpecificGravity = new(3.65, 3.87),
            Lines = [new(505, true), new(527, true), new(575, true)],
            Hues = [new("red", .7), new("purple", .2), new("brown", .1)],
            Citation = "amezin.com garnet: pyrope RI 1.730–1.760, SG 3.65–3.80; gemstone.pk pyrope-almandine: pyrope SG 3.65–3.87, index rising with density towards almandine; "
                + "gemdictionary.blogspot.com 'intermediate species': pyrope-almandine bands 505, 527, 575 nm",
        },
        new()
        {
            Name = "almandine", BenchWeight = 1.5, SgFollowsIndex = 1, Strained = 0.05,
            Indices = PrincipalValues.Single(1.760, 1.830),
            SpecificGravity = new(3.90, 4.20),
            Lines = [new(505, true), new(527, true), new(575, true)],
            Hues = [new("red", .7), new("purple", .2), new("brown", .1)],
            Citation = "gemstone.pk pyrope-almandine: almandine RI 1.76–1.83, SG 3.95–4.20; Smith, Gem-Stones (bitlit.ru p. 76): SG 3.90 (transparent) to 4.20, characteristic absorption spectrum; "
                + "gemdictionary.blogspot.com: bands 505, 527, 575 nm",
        },
        new()
        {
            Name = "spessartine", BenchWeight = 0.6, SgFollowsIndex = 1,
            Indices = PrincipalValues.Single(1.790, 1.815),
            SpecificGravity = new(4.12, 4.20),
            Lines = [new(432, false), new(412, false)],
            Hues = [new("orange", .7), new("red", .2), new("brown", .1)],
            Citation = "amezin.com garnet: spessartite RI 1.795–1.815, SG 4.12–4.20; oagems.com spessartite: RI 1.790–1.810, SG 4.12–4.20; gemdictionary.blogspot.com: manganese lines 432, 412 nm",
        },
        new()
        {
            Name = "grossular", BenchWeight = 0.8, SgFollowsIndex = 1,
            Indices = PrincipalValues.Single(1.730, 1.760),
            SpecificGravity = new(3.60, 3.70),
            Hues = [new("orange", .35), new("green", .35), new("yellow", .15), new("brown", .1), new("colourless", .05)],
            Citation = "libretexts Gemology 16.8.3 Grossular (from gemologyproject.com): RI 1.738–1.745, hessonite and green grossular 1.73–1.76, SG 3.60–3.70, isotropic",
        },
        new()
        {
            Name = "andradite", BenchWeight = 0.3,
            Indices = PrincipalValues.Single(1.882, 1.889),
            SpecificGravity = new(3.81, 3.86), Dispersion = 0.057,
            Hues = [new("green", .6), new("yellow", .25), new("brown", .1), new("black", .05)],
            Citation = "legendartbeads.com andradite: SG 3.81–3.86, RI 1.882–1.889; cadby.co.uk Garnet: andradite dispersion 0.057",
        },
        new()
        {
            Name = "diamond", BenchWeight = 2, ThermalPositive = true, Strained = 0.3,
            Indices = PrincipalValues.Single(2.417, 2.417),
            SpecificGravity = new(3.51, 3.53), Dispersion = 0.044,
            Hues = [new("colourless", .8), new("yellow", .15), new("brown", .05)],
            Origins = [new("natural", .8), new("synthetic", .15), new("treated", .05)],
            Citation = "Wikipedia 'Diamond simulant' table (WikiTableQuestions copy): diamond 2.417, dispersion 0.044, thermal conductivity excellent; gemsociety.org diamond look-alike chart: SG 3.51–3.53",
            Judgement = "strain in 30 %, hue and origin weights: judgement",
        },
        new()
        {
            Name = "cubic zirconia", BenchWeight = 1.5,
            Indices = PrincipalValues.Single(2.15, 2.18),
            SpecificGravity = new(5.60, 6.00), Dispersion = 0.060,
            Hues = [new("colourless", .8), new("pink", .05), new("blue", .05), new("yellow", .05), new("green", .05)],
            Origins = [new("synthetic", 1)],
            Citation = "wejeweler.com cubic zirconia: RI 2.15–2.18, SG 5.6–6.0, dispersion 0.058–0.066; gemsociety.org look-alike chart: SG 5.34–6.00, none birefringent",
        },
        new()
        {
            Name = "moissanite", BenchWeight = 0.8, ThermalPositive = true, Conductive = true,
            Indices = PrincipalValues.Uniaxial(new(2.60, 2.65), new(0.043, 0.043), positive: true),
            SpecificGravity = new(3.17, 3.20),
            Hues = [new("colourless", .9), new("green", .05), new("yellow", .05)],
            Origins = [new("synthetic", 1)],
            Citation = "gemsociety.org look-alike chart: SG 3.17–3.20, birefringence 0.043; brainscape.com simulant cards: moissanite is an electrical conductor; "
                + "index 2.60–2.65 from memory (only 'over the limit' is used); heat probe positive: common practice",
        },
        new()
        {
            Name = "yttrium aluminium garnet", BenchWeight = 0.3,
            Indices = PrincipalValues.Single(1.83, 1.83),
            SpecificGravity = new(4.50, 4.60),
            Hues = [new("colourless", .7), new("green", .2), new("blue", .1)],
            Origins = [new("synthetic", 1)],
            Citation = "gemsociety.org look-alike chart: SG 4.50–4.60, not birefringent; index 1.83 from memory (only 'over the limit' is used)",
        },
        new()
        {
            Name = "gadolinium gallium garnet", BenchWeight = 0.2,
            Indices = PrincipalValues.Single(1.97, 1.97),
            SpecificGravity = new(6.95, 7.09),
            Hues = [new("colourless", .9), new("brown", .1)],
            Origins = [new("synthetic", 1)],
            Citation = "gemsociety.org look-alike chart: SG 6.95–7.09, not birefringent; index 1.97 from memory (only 'over the limit' is used)",
        },
        new()
        {
            Name = "rutile", BenchWeight = 0.15,
            Indices = PrincipalValues.Uniaxial(new(2.61, 2.62), new(0.287, 0.287), positive: true),
            SpecificGravity = new(4.20, 5.60),
            Hues = [new("yellow", .5), new("colourless", .2), new("red", .2), new("brown", .1)],
            Origins = [new("synthetic", .8), new("natural", .2)],
            Citation = "gemsociety.org look-alike chart: SG 4.20–5.60, birefringence 0.287; cigem.ca: rutile 287 (×1000); index 2.61 from memory (only 'over the limit' is used)",
        },
        new()
        {
            Name = "spodumene", BenchWeight = 0.6,
            Indices = PrincipalValues.Biaxial(new(1.648, 1.661), new(0.014, 0.018), new(0.3, 0.45)),
            SpecificGravity = new(3.15, 3.21), Pleochroism = PleochroismHabit.Strong, Dispersion = 0.017,
            Lines = [new(686, false, "green"), new(690.5, false, "green"), new(437.5, false), new(433, false)],
            Hues = [new("pink", .5), new("purple", .2), new("green", .15), new("yellow", .1), new("colourless", .05)],
            Citation = "Wikipedia 'Spodumene' infobox (mineralru.com copy): biaxial +, nα 1.648–1.661, nβ 1.655–1.670, nγ 1.662–1.679, birefringence 0.014–0.018; "
                + "funwing.com spodumene: SG 3.17–3.19, RI 1.660–1.675, lines 686, 690.5, 437.5, 433 nm; gemstones-guide.com Spodumene: SG 3.18, dispersion 0.017",
        },
        new()
        {
            Name = "zoisite", BenchWeight = 0.8,
            Indices = PrincipalValues.Biaxial(new(1.692, 1.700), new(0.006, 0.018), new(0.05, 0.3)),
            SpecificGravity = new(3.25, 3.38), Pleochroism = PleochroismHabit.Strong,
            Lines = [new(595, true), new(528, false), new(455, false)],
            Hues = [new("purple", .5), new("blue", .4), new("green", .05), new("pink", .05)],
            Origins = [new("natural", .3), new("treated", .7)],
            Citation = "gemfame.com zoisite: tanzanite α 1.692, β 1.693, γ 1.700, biaxial +, birefringence 0.009, SG 3.35, band 595 nm with fainter 528 and 455, blue produced by heating; "
                + "Wikipedia 'Zoisite' (findatwiki copy; cites Handbook of Mineralogy): nα 1.696–1.700, nγ 1.702–1.718, birefringence 0.006–0.018; 24carat.co.uk: SG 3.25–3.37",
        },
        new()
        {
            Name = "cordierite", BenchWeight = 0.6,
            Indices = PrincipalValues.Biaxial(new(1.530, 1.542), new(0.008, 0.012), new(0.55, 0.8)),
            SpecificGravity = new(2.58, 2.66), Pleochroism = PleochroismHabit.Strong,
            Hues = [new("blue", .6), new("purple", .35), new("grey", .05)],
            Citation = "theimage.com cordierite: RI 1.53–1.55, birefringence 0.008–0.012, SG 2.58–2.66, strongly dichroic or trichroic; biaxial − from memory",
        },
        new()
        {
            Name = "orthoclase", BenchWeight = 1,
            Indices = PrincipalValues.Biaxial(new(1.514, 1.524), new(0.005, 0.008), new(0.6, 0.9)),
            SpecificGravity = new(2.55, 2.61),
            UvLong = [new("inert", .6), new("weak", .4)], UvShort = [new("inert", .6), new("weak", .4)],
            Hues = [new("colourless", .5), new("yellow", .3), new("grey", .1), new("brown", .1)],
            Citation = "jtv.com 'Moonstone-Orthoclase': RI 1.518–1.526 (±0.010), birefringence 0.005–0.008, biaxial −, SG 2.55–2.61, LW and SW inert to weak; langantiques.com feldspar: orthoclase 1.518–1.526",
        },
        new()
        {
            Name = "microcline", BenchWeight = 0.5,
            Indices = PrincipalValues.Biaxial(new(1.522, 1.525), new(0.007, 0.008), new(0.6, 0.9)),
            SpecificGravity = new(2.54, 2.58),
            Hues = [new("green", .8), new("blue", .2)],
            Citation = "langantiques.com feldspar (GIA Gem Reference Guide 1988; Schumann): microcline 1.522–1.530; studiopjj.blogspot.com indicator stones: amazonite SG 2.56; birefringence and sign from memory",
        },
        new()
        {
            Name = "oligoclase", BenchWeight = 0.3,
            Indices = PrincipalValues.Biaxial(new(1.537, 1.540), new(0.007, 0.010), new(0.4, 0.6)),
            SpecificGravity = new(2.62, 2.65),
            Hues = [new("orange", .6), new("colourless", .2), new("brown", .2)],
            Citation = "langantiques.com feldspar: oligoclase 1.537–1.547; gemstones.comparenature.com sunstone (Gemstones of the World): SG 2.62–2.65; birefringence from memory",
        },
        new()
        {
            Name = "labradorite", BenchWeight = 0.5,
            Indices = PrincipalValues.Biaxial(new(1.559, 1.561), new(0.007, 0.009), new(0.4, 0.6)),
            SpecificGravity = new(2.68, 2.72),
            Hues = [new("grey", .6), new("black", .2), new("orange", .1), new("yellow", .1)],
            Citation = "langantiques.com feldspar: labradorite 1.559 [printed 1.599]–1.568; SG 2.68–2.72 and birefringence from memory",
        },
        new()
        {
            Name = "jadeite", BenchWeight = 1, Form = StoneForm.Aggregate,
            Indices = PrincipalValues.Single(1.654, 1.680),
            SpecificGravity = new(3.30, 3.38),
            Hues = [new("green", .6), new("colourless", .2), new("purple", .1), new("black", .05), new("yellow", .05)],
            Origins = [new("natural", .7), new("treated", .3)],
            Citation = "jbjewelryco.com jadeite and nephrite: jadeite RI 1.666–1.680 (±0.008), SG 3.34; hudec.ca jade: jadeite 1.654–1.667, SG 3.30–3.36; eurojade.fr: usually one line near 1.66",
        },
        new()
        {
            Name = "nephrite", BenchWeight = 0.8, Form = StoneForm.Aggregate,
            Indices = PrincipalValues.Single(1.600, 1.632),
            SpecificGravity = new(2.90, 3.02),
            Hues = [new("green", .7), new("colourless", .15), new("black", .1), new("brown", .05)],
            Citation = "jbjewelryco.com: nephrite RI 1.606–1.632 (+.009, −.006), SG 2.95; hudec.ca jade: nephrite 1.600–1.627, SG 2.90–3.02",
        },
        new()
        {
            Name = "opal", BenchWeight = 1, Form = StoneForm.Amorphous, Porous = true, Strained = 0.1,
            Indices = PrincipalValues.Single(1.42, 1.47),
            SpecificGravity = new(1.98, 2.20),
            Hues = [new("colourless", .45), new("orange", .2), new("blue", .1), new("black", .1), new("yellow", .1), new("brown", .05)],
            Origins = [new("natural", .75), new("synthetic", .1), new("treated", .05), new("composite", .1)],
            Citation = "ora.it.com 'specific gravity of an opal': SG 1.98–2.20 (average 2.15), RI 1.42–1.47; vecstone.jp opal: RI 1.44–1.46, SG 1.9–2.3",
        },
        new()
        {
            Name = "apatite", BenchWeight = 0.4,
            Indices = PrincipalValues.Uniaxial(new(1.632, 1.649), new(0.002, 0.006), positive: false),
            SpecificGravity = new(3.15, 3.23), Pleochroism = PleochroismHabit.Weak, Dispersion = 0.013,
            Hues = [new("blue", .3), new("green", .3), new("yellow", .3), new("purple", .1)],
            Citation = "gemologyproject.com Template:Apatite: uniaxial −, RI 1.63–1.64, birefringence 0.003, SG 3.2, dispersion 0.013; theimage.com apatite: SG 3.16–3.23, RI 1.628–1.649; "
                + "sglapidary.com: SG 3.15–3.22, birefringence 0.004; gemstones.comparenature.com (Gemmological Tables): birefringence 0.002–0.008",
        },
        new()
        {
            Name = "andalusite", BenchWeight = 0.3,
            Indices = PrincipalValues.Biaxial(new(1.629, 1.640), new(0.006, 0.010), new(0.6, 0.9)),
            SpecificGravity = new(3.12, 3.18), Pleochroism = PleochroismHabit.Strong,
            Hues = [new("green", .5), new("brown", .4), new("pink", .1)],
            Citation = "theimage.com andalusite: RI 1.63–1.648, birefringence 0.006, SG 3.12–3.18, strong pleochroism; uid-ramanlab.com library: RI 1.63–1.64, birefringence 0.010, SG 3.13–3.16; sign from memory",
        },
        new()
        {
            Name = "kyanite", BenchWeight = 0.3,
            Indices = PrincipalValues.Biaxial(new(1.710, 1.718), new(0.012, 0.018), new(0.5, 0.7)),
            SpecificGravity = new(3.53, 3.68), Pleochroism = PleochroismHabit.Strong,
            Lines = [new(701, false)],
            Hues = [new("blue", .8), new("green", .15), new("colourless", .05)],
            Citation = "gemfame.com kyanite: nα 1.710–1.718, nβ 1.719–1.724, nγ 1.724–1.734, biaxial −, birefringence 0.017, SG 3.53–3.65, line 701 nm in some; wikigempedia.com: SG 3.53–3.68",
        },
        new()
        {
            Name = "sillimanite", BenchWeight = 0.2,
            Indices = PrincipalValues.Biaxial(new(1.653, 1.661), new(0.014, 0.021), new(0.05, 0.3)),
            SpecificGravity = new(3.20, 3.26), Pleochroism = PleochroismHabit.Strong,
            Hues = [new("colourless", .3), new("blue", .3), new("green", .2), new("grey", .1), new("brown", .1)],
            Citation = "gemdat.org sillimanite (Blue Chart Gem Identification 2010): RI 1.653–1.685, biaxial +, birefringence 0.014–0.021, SG 3.20–3.26, strong trichroism",
        },
        new()
        {
            Name = "diopside", BenchWeight = 0.5, SgFollowsIndex = 1,
            Indices = PrincipalValues.Biaxial(new(1.664, 1.680), new(0.024, 0.032), new(0.25, 0.35)),
            SpecificGravity = new(3.22, 3.38), Pleochroism = PleochroismHabit.Weak, Dispersion = 0.018,
            Lines = [new(505, true, "green"), new(493, false, "green"), new(446, false, "green")],
            Hues = [new("green", .85), new("brown", .1), new("black", .05)],
            Citation = "gemfame.com diopside: α 1.664, β 1.672, γ 1.694, biaxial +, SG 3.22–3.38 rising with iron, pale green lines 505, 493, 446 nm; gemsociety.org diopside: birefringence 0.024–0.032, dispersion 0.017–0.020",
        },
        new()
        {
            Name = "titanite", BenchWeight = 0.3,
            Indices = PrincipalValues.Biaxial(new(1.843, 1.950), new(0.100, 0.160), new(0.1, 0.3)),
            SpecificGravity = new(3.45, 3.60), Pleochroism = PleochroismHabit.Strong, Dispersion = 0.051,
            Hues = [new("yellow", .4), new("green", .4), new("brown", .15), new("orange", .05)],
            Citation = "Wikipedia 'Titanite' (simple.wikipedia; cites Handbook of Mineralogy): nα 1.843–1.950, nγ 1.943–2.110, birefringence 0.100–0.160, biaxial +, SG 3.48–3.60; gemfame.com sphene: SG 3.45–3.55, dispersion 0.051",
        },
        new()
        {
            Name = "fluorite", BenchWeight = 0.5,
            Indices = PrincipalValues.Single(1.432, 1.435),
            SpecificGravity = new(3.00, 3.25), Dispersion = 0.007,
            UvLong = [new("strong", .5), new("moderate", .3), new("weak", .2)],
            Hues = [new("purple", .35), new("green", .3), new("blue", .15), new("yellow", .1), new("colourless", .1)],
            Citation = "theimage.com fluorite: RI 1.434, SG 3.0–3.25, dispersion 0.007, strong fluorescence; ashantijewels.com (gemsociety text): N 1.432–1.434, SG 3.180; mints.uwc.ac.za: 1.433–1.435",
        },
        new()
        {
            Name = "amber", BenchWeight = 1, Form = StoneForm.Amorphous, Porous = true, Strained = 0.5,
            Indices = PrincipalValues.Single(1.539, 1.545),
            SpecificGravity = new(1.05, 1.10),
            UvLong = [new("moderate", .5), new("strong", .3), new("weak", .2)], UvShort = [new("weak", .7), new("inert", .3)],
            Hues = [new("yellow", .4), new("orange", .35), new("brown", .2), new("red", .05)],
            Citation = "finegemcutting.com amber: RI about 1.54, SG 1.05–1.096, stress patterns in the polariscope; taylorfrancis.com (Read, Gemmology): RI 1.54, SG 1.05–1.10, LW bluish white, SW greenish; "
                + "uid-ramanlab.com: RI 1.54–1.55",
        },
        new()
        {
            Name = "coral", BenchWeight = 0.6, Form = StoneForm.Aggregate, Porous = true, Opaque = true,
            Indices = PrincipalValues.Single(1.486, 1.486),
            SpecificGravity = new(2.60, 2.70),
            Hues = [new("red", .5), new("pink", .35), new("colourless", .1), new("black", .05)],
            Origins = [new("natural", .85), new("treated", .15)],
            Citation = "orchid.ganoksin.com 'Coral vs glass': natural coral SG 2.60–2.70; blog.bhoma.com coral: RI 1.486, SG 2.60–2.70",
        },
        new()
        {
            Name = "glass", BenchWeight = 2, SgFollowsIndex = 1, Form = StoneForm.Amorphous, Strained = 0.3,
            Indices = PrincipalValues.Single(1.48, 1.70),
            SpecificGravity = new(2.30, 4.50),
            Hues = [new("blue", .2), new("green", .2), new("colourless", .2), new("red", .15), new("yellow", .1), new("purple", .1), new("orange", .05)],
            Origins = [new("imitation", 1)],
            Citation = "Wikipedia 'Diamond simulant' table: glass ~1.6, SG 2.4–4.2; orchid.ganoksin.com: glass SG 2.30–4.50",
            Judgement = "index range 1.48–1.70 around the published ~1.6 and SG rising with index (lead glass): judgement",
        },
        new()
        {
            Name = "phenakite", BenchWeight = 0.15,
            Indices = PrincipalValues.Uniaxial(new(1.650, 1.656), new(0.015, 0.019), positive: true),
            SpecificGravity = new(2.92, 2.97), Dispersion = 0.015,
            Hues = [new("colourless", .8), new("yellow", .1), new("pink", .1)],
            Citation = "gemologyproject.com Template:Phenakite: uniaxial +, RI 1.651–1.670, birefringence 0.016, SG 2.92–2.97, dispersion 0.015",
        },
        new()
        {
            Name = "euclase", BenchWeight = 0.1,
            Indices = PrincipalValues.Biaxial(new(1.649, 1.653), new(0.018, 0.020), new(0.1, 0.3)),
            SpecificGravity = new(3.05, 3.10),
            Hues = [new("green", .5), new("blue", .4), new("colourless", .1)],
            Citation = "Smith, Gem-Stones ch. XXXV (clyx.com): biaxial +, least and greatest index 1.651 and 1.670, SG 3.07",
            Judgement = "ranges of ±0.002 and ±0.03 around Smith's single values, β's place: judgement",
        },
        // Catalogue species added as rivals (docs/benchmark.md, "The property table"): imitations, organics, opaque
        // aggregates and a few rare crystals the bench meets. "white" is written for opaque white stones, as a bench does.
        new()
        {
            Name = "plastic", BenchWeight = 0.8, Form = StoneForm.Amorphous, Strained = 0.6,
            Indices = PrincipalValues.Single(1.46, 1.70),
            SpecificGravity = new(1.05, 1.55),
            Hues = [new("yellow", .2), new("orange", .15), new("white", .15), new("red", .1), new("black", .1), new("blue", .1), new("green", .1), new("colourless", .1)],
            Origins = [new("imitation", 1)],
            Citation = "astrogyangranth.com 'plastic' (article AGG0000161, a GIA-style data sheet): amorphous, singly refractive with strong anomalous double refraction and strain colours common, "
                + "RI usually 1.460–1.700, no birefringence, SG usually 1.05–1.55, imitates amber, coral, jet, ivory, pearl and opal; gia.edu Gems & Gemology Spring 2018 Lab Notes "
                + "'New plastic imitation opal from Kyocera': hydrostatic SG 1.35, RI 1.49",
            Judgement = "anomalous double refraction in 60 % (the sheet's 'common'), hue weights (mostly organic imitations), bench weight: judgement",
        },
        new()
        {
            Name = "natural glass", BenchWeight = 0.4, Form = StoneForm.Amorphous, Strained = 0.1, SgFollowsIndex = 1,
            Indices = PrincipalValues.Single(1.46, 1.54),
            SpecificGravity = new(2.20, 2.60),
            Hues = [new("black", .45), new("green", .2), new("brown", .15), new("grey", .1), new("yellow", .05), new("red", .05)],
            Citation = "tradeshop.com 'Tektite (Moldavite)': RI 1.46–1.54, SG 2.2–2.9; jiehonggem.com 'Natural glass – obsidian' (GIA Gem Reference Guide): RI 1.49 (+.020, −.010), SG 2.40 (+.10, −.07); "
                + "langantiques.com moldavite: RI 1.48–1.50; gemstones-guide.com 'Natural glass': obsidian SG 2.34–2.46; Smith, Gem-Stones (1919; oldandsold.com 'Obsidian, moldavite'): obsidian about 1.50, "
                + "moldavite 1.51 and SG 2.50, single refraction; gemsociety.org 'Natural glass': RI 1.46–1.69 and SG 2.20–3.00 over every type, UV not diagnostic",
            Judgement = "SG cut at 2.60 (obsidian and moldavite, the types a bench meets; the rare high types of the wider ranges left out), strain in 10 %, hue weights: judgement; "
                + "SG rising with the index: the pairs read rise together (obsidian 1.49 / 2.40, moldavite 1.51 / 2.50), as a glass's index follows its density (the "
                + "Gladstone–Dale relation); drawn apart, a silica-rich index came with an obsidian's weight, a pair no page gives",
        },
        new()
        {
            Name = "lazurite", BenchWeight = 0.6, Form = StoneForm.Aggregate, Opaque = true,
            Indices = PrincipalValues.Single(1.50, 1.55),
            SpecificGravity = new(2.50, 3.00),
            UvLong = [new("inert", .6), new("weak", .25), new("moderate", .15)], UvShort = [new("inert", .5), new("weak", .3), new("moderate", .2)],
            Hues = [new("blue", .95), new("purple", .05)],
            Origins = [new("natural", .8), new("treated", .2)],
            Citation = "gemstones-guide.com 'Physical & optical properties of lapis lazuli': granular aggregate, RI 1.50, SG 2.50–3.0 (normal 2.75, higher with pyrite), opaque, generally inert "
                + "(calcite patches pink in LW), weak to moderate green in SW, no spectrum; gillabs.com lapis lazuli: SG 2.70–2.90, RI 1.500–1.550; theimage.com lapis: SG 2.39–2.92, RI 1.5, some porosity",
            Judgement = "the index range 1.50–1.55 from the widest source, UV strengths, the dyed or waxed share and bench weight: judgement",
        },
        new()
        {
            Name = "sodalite", BenchWeight = 0.4, Form = StoneForm.Aggregate, Opaque = true,
            Indices = PrincipalValues.Single(1.478, 1.488),
            SpecificGravity = new(2.13, 2.40),
            UvLong = [new("strong", .3), new("moderate", .35), new("weak", .2), new("inert", .15)], UvShort = [new("moderate", .3), new("weak", .4), new("inert", .3)],
            Hues = [new("blue", .9), new("purple", .05), new("grey", .05)],
            Citation = "gemdat.org sodalite (Blue Chart Gem Identification 2010): RI 1.478–1.488, SG 2.15–2.40, isotropic; gemfame.com sodalite: RI 1.483–1.487, SG 2.27–2.33, massive; "
                + "tannerchaney.com sodalite (International School of Gemology): RI 1.48, SG 2.13–2.29, opaque, strong orange in long-wave UV; nationalgemlab.in: bright red-orange in SW and LW",
            Judgement = "the SG range as the union of those read, UV strengths (patchy in massive stones) and bench weight: judgement",
        },
        new()
        {
            Name = "calcite", BenchWeight = 0.4, Form = StoneForm.Aggregate,
            Indices = PrincipalValues.Uniaxial(new(1.656, 1.660), new(0.170, 0.174), positive: false),
            SpecificGravity = new(2.67, 2.73),
            Hues = [new("white", .45), new("grey", .1), new("pink", .1), new("green", .1), new("yellow", .1), new("brown", .1), new("black", .05)],
            Origins = [new("natural", .8), new("treated", .2)],
            Citation = "Smith, Gem-Stones (bitlit.ru p. 99): marble is massive calcite, ε 1.486, ω 1.658, difference 0.172, SG 2.71, effervesces with acid; gemfame.com calcite: RI 1.486–1.660, uniaxial −, "
                + "SG 2.7102; gemstones.comparenature.com calcite: RI 1.486–1.658, birefringence 0.154–0.174, SG 2.67–2.73",
            Judgement = "ω ±0.002 about Smith's 1.658, birefringence 0.170–0.174, the spot read at either end of the span (IndependentStoneSimulator.BlinkSpan), the dyed share and hue weights: judgement",
        },
        new()
        {
            Name = "malachite", BenchWeight = 0.4, Form = StoneForm.Aggregate, Opaque = true,
            Indices = PrincipalValues.Biaxial(new(1.655, 1.660), new(0.250, 0.254), new(0.8, 0.9)),
            SpecificGravity = new(3.60, 4.05),
            Hues = [new("green", 1)],
            Origins = [new("natural", .9), new("treated", .1)],
            Citation = "gemologyproject.com Malachite (after Thomas, Gemstones 2008): biaxial −, RI 1.655–1.909, birefringence 0.254, SG 3.60–4.05, translucent to opaque; "
                + "gemstonebuzz.com malachite: RI 1.660–1.910, birefringence 0.250, biaxial −, spot 1.85 (beyond a 1.78–1.81 contact liquid: written over the limit here), banding; "
                + "gemdat.org malachite: wax or resin to hide cracks (Nassau 1984)",
            Judgement = "β near γ (fraction 0.8–0.9) from memory; the spot read at either end of the span, the upper end over the limit; the waxed share and bench weight: judgement",
        },
        new()
        {
            Name = "turquoise", BenchWeight = 0.8, Form = StoneForm.Aggregate, Opaque = true, Porous = true,
            Indices = PrincipalValues.Single(1.60, 1.62),
            SpecificGravity = new(2.40, 2.90),
            UvLong = [new("inert", .6), new("weak", .4)], UvShort = [new("inert", 1)],
            Lines = [new(432, false), new(420, false), new(460, false)],
            Hues = [new("blue", .6), new("green", .4)],
            Origins = [new("natural", .45), new("treated", .55)],
            Citation = "gemstones-guide.com 'Physical & optical properties of turquoise': cryptocrystalline aggregate, RI 1.61–1.65 but one reading usually about 1.60, SG 2.61–2.84, "
                + "none to weak greenish yellow in LW, inert in SW; jiehonggem.com turquoise (GIA Gem Reference Guide): spot usually 1.61, SG 2.76 (+.14, −.36), bands 420 and 432 nm, weak 460 nm, "
                + "plastic or wax impregnation common; tradeshop.com turquoise: RI 1.62, SG 2.6–2.9; fireballtim.com (Wikipedia text): single reading 1.61 or 1.62",
            Judgement = "the spot range 1.60–1.62 from the three published spot values; porous (not immersed: common practice); the treated share and bench weight: judgement; "
                + "the lines are kept for the record but never written (the simulator reads no spectrum of an opaque stone)",
        },
        new()
        {
            Name = "pearl", BenchWeight = 0.8, Form = StoneForm.Aggregate, Opaque = true, Porous = true,
            Indices = PrincipalValues.Biaxial(new(1.52, 1.53), new(0.14, 0.16), new(0.95, 0.98)),
            SpecificGravity = new(2.60, 2.85),
            UvLong = [new("weak", .4), new("moderate", .4), new("inert", .2)],
            Hues = [new("white", .6), new("black", .15), new("yellow", .1), new("pink", .1), new("grey", .05)],
            Origins = [new("cultured", .8), new("natural", .05), new("treated", .15)],
            Citation = "sco.wikipedia.org 'Pairl' infobox (cites Schumann, Gemstones of the World; Lazzarelli, Blue Chart): RI 1.52–1.66, black pearl 1.53–1.69, birefringence 0.156, SG 2.60–2.85, "
                + "white pearls light blue to light yellow in UV, black pink to orange-red; blog.bhoma.com pearl: RI 1.530–1.685, SG 2.6–2.78; mgc-labs.ru pearl: aragonite and conchiolin, SG 2.60–2.85",
            Judgement = "cultured pearls most pearls at a bench, natural ones few (shares: judgement; the nacre alike, so every property drawn alike); β's place from aragonite (gemsociety.org aragonite: α 1.530, β 1.681, γ 1.685); the spot read at either end; "
                + "not immersed (common practice for pearls at a general bench); UV strengths, dyed or irradiated share, hue weights: judgement",
        },
        new()
        {
            Name = "shell", BenchWeight = 0.4, Form = StoneForm.Aggregate, Opaque = true,
            Indices = PrincipalValues.Biaxial(new(1.529, 1.531), new(0.154, 0.156), new(0.95, 0.98)),
            SpecificGravity = new(2.70, 2.89),
            UvLong = [new("inert", .3), new("weak", .4), new("moderate", .3)],
            Hues = [new("white", .5), new("pink", .15), new("orange", .1), new("grey", .1), new("black", .05), new("green", .05), new("blue", .05)],
            Origins = [new("natural", .85), new("treated", .15)],
            Citation = "jtv.com gemopedia 'Shell pearl' (species shell): RI 1.530–1.685, aggregate, SG 2.700–2.890, fluorescence variable; globalgemology.com 'Abalone shell' (mother of pearl): "
                + "RI 1.530–1.685, birefringence 0.155 by the birefringence blink technique, aggregate, SG 2.86 (+0.03, −0.16); gem5.com shell: mother-of-pearl is layered aragonite",
            Judgement = "β's place from aragonite; the spot read at either end; UV strengths, dyed share, hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "howlite", BenchWeight = 0.5, Form = StoneForm.Aggregate, Opaque = true,
            Indices = PrincipalValues.Biaxial(new(1.583, 1.586), new(0.019, 0.022), new(0.55, 0.65)),
            SpecificGravity = new(2.45, 2.59),
            UvLong = [new("inert", .5), new("weak", .3), new("moderate", .2)], UvShort = [new("inert", .5), new("weak", .5)],
            Hues = [new("white", .45), new("blue", .45), new("green", .05), new("red", .05)],
            Origins = [new("natural", .4), new("treated", .6)],
            Citation = "gemfame.com howlite: α 1.583–1.586, β 1.596–1.598, γ 1.605, biaxial −, birefringence 0.022, about 1.59 in practice, SG 2.53–2.59, deep orange in LW (some), brownish yellow in SW; "
                + "jiehonggem.com howlite (GIA Gem Reference Guide): aggregate, RI 1.586–1.605 (+.003), spot usually 1.59, birefringence 0.019, inert to moderate orange LW, SG 2.58 (−.13), "
                + "commonly dyed blue to imitate turquoise or lapis; patrickvoillot.com howlite: SG 2.45–2.59, porous enough to dye",
            Judgement = "β's place from gemfame's values, the dyed share (hue drawn apart from origin, as for every row), UV strengths and bench weight: judgement",
        },
        new()
        {
            Name = "albite", BenchWeight = 0.2,
            Indices = PrincipalValues.Biaxial(new(1.527, 1.533), new(0.008, 0.011), new(0.2, 0.4)),
            SpecificGravity = new(2.60, 2.65), Dispersion = 0.012,
            UvLong = [new("inert", .7), new("weak", .3)], UvShort = [new("inert", .7), new("weak", .3)],
            Hues = [new("colourless", .6), new("white", .1), new("grey", .1), new("blue", .1), new("yellow", .1)],
            Citation = "gemdat.org albite (Blue Chart Gem Identification 2010): RI 1.525–1.542, biaxial +, birefringence 0.008–0.011, SG 2.60–2.65, LW green, SW white or green (O'Donoghue); "
                + "gemfame.com albite: α 1.528–1.533, β 1.532–1.537, γ 1.538–1.542, SG 2.61–2.63; gemsociety.org albite: α 1.527, β 1.531, γ 1.538, dispersion 0.012, usually no luminescence",
            Judgement = "β's place (fraction 0.2–0.4) from the two sets of α, β, γ; UV strengths, hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "gypsum", BenchWeight = 0.2, Form = StoneForm.Aggregate,
            Indices = PrincipalValues.Biaxial(new(1.520, 1.521), new(0.009, 0.010), new(0.2, 0.3)),
            SpecificGravity = new(2.25, 2.35),
            UvLong = [new("inert", .6), new("weak", .4)], UvShort = [new("inert", .6), new("weak", .4)],
            Hues = [new("white", .6), new("pink", .1), new("yellow", .1), new("brown", .1), new("grey", .1)],
            Origins = [new("natural", .7), new("treated", .3)],
            Citation = "jtv.com 'Alabaster': RI 1.52–1.529, birefringence 0.009–0.01, biaxial +, SG 2.25–2.35, inert to weak brownish to greenish white in LW and SW, often dyed; "
                + "nevada-outback-gems.com gypsum: α 1.521, β 1.523, γ 1.530, density 2.3; gemsociety.org gypsum: SG 2.32 (2.30–2.33), birefringence 0.010, dyeing and bleaching common",
            Judgement = "alabaster and satin spar as an aggregate; UV strengths, the dyed share, hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "aragonite", BenchWeight = 0.2, Form = StoneForm.Aggregate,
            Indices = PrincipalValues.Biaxial(new(1.529, 1.535), new(0.150, 0.156), new(0.95, 0.98)),
            SpecificGravity = new(2.93, 2.96),
            UvLong = [new("weak", .4), new("moderate", .3), new("inert", .3)], UvShort = [new("weak", .5), new("inert", .5)],
            Hues = [new("white", .4), new("yellow", .15), new("brown", .15), new("blue", .1), new("green", .1), new("grey", .1)],
            Citation = "gemsociety.org aragonite: α 1.530, β 1.681, γ 1.685, biaxial −, birefringence 0.155, SG usually 2.93–2.95, massive, fibrous or coralloidal as well as crystals; "
                + "gemdat.org aragonite (Blue Chart): RI 1.525–1.686, birefringence 0.155, SG 2.93–2.96; gemfame.com aragonite: 1.530–1.540 and 1.680–1.690, birefringence 0.150; "
                + "nationalgemlab.in aragonite: LW pale rose, yellow, white or bluish, SW yellowish",
            Judgement = "the massive banded stone taken as the bench's aragonite (an aggregate read by spot at either end); UV strengths, hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "staurolite", BenchWeight = 0.1,
            Indices = PrincipalValues.Biaxial(new(1.736, 1.747), new(0.011, 0.015), new(0.4, 0.49)),
            SpecificGravity = new(3.68, 3.83), Pleochroism = PleochroismHabit.Moderate,
            Lines = [new(632, false), new(610, false), new(531.5, false)],
            Hues = [new("brown", .8), new("red", .1), new("black", .1)],
            Citation = "gemfame.com staurolite: α 1.736–1.747, β 1.742–1.753, γ 1.748–1.761, biaxial +, birefringence 0.011–0.015, SG 3.68–3.83, distinct pleochroism, "
                + "bands at 632 and 610 nm in zinc-rich stones and sometimes 531.5 nm",
            Judgement = "β's place below one half (the sign) from the published α, β, γ; line strengths and hue weights: judgement",
        },
        new()
        {
            Name = "sinhalite", BenchWeight = 0.15,
            Indices = PrincipalValues.Biaxial(new(1.665, 1.676), new(0.035, 0.042), new(0.75, 0.85)),
            SpecificGravity = new(3.46, 3.50), Pleochroism = PleochroismHabit.Moderate, Dispersion = 0.018,
            UvLong = [new("inert", 1)], UvShort = [new("inert", 1)],
            Lines = [new(493, true), new(475, true), new(463, true), new(452, true), new(435, false)],
            Hues = [new("brown", .5), new("yellow", .4), new("green", .1)],
            Citation = "gemfame.com sinhalite: α 1.667–1.676, β 1.697–1.704, γ 1.705–1.712, biaxial −, birefringence 0.035–0.037, SG 3.475–3.50, bands 493, 475, 463, 452, 435 nm (463 absent in peridot); "
                + "gemdat.org sinhalite (Blue Chart): RI 1.665–1.712, birefringence 0.036–0.042, SG 3.46–3.50, dispersion 0.018 (Schumann); cameo.mfa.org: inert, moderate pleochroism; "
                + "nationalgemlab.in: pleochroism weak; funwing.com: distinct",
            Judgement = "β's place from gemfame's values; which bands are strong (the sources name them only) and hue weights: judgement",
        },
        new()
        {
            Name = "dumortierite", BenchWeight = 0.15, Form = StoneForm.Aggregate, Opaque = true,
            Indices = PrincipalValues.Biaxial(new(1.669, 1.686), new(0.011, 0.037), new(0.9, 0.98)),
            SpecificGravity = new(3.21, 3.41),
            UvShort = [new("weak", .4), new("moderate", .3), new("inert", .3)],
            Hues = [new("blue", .7), new("purple", .2), new("brown", .05), new("pink", .05)],
            Citation = "gemfame.com dumortierite: ornamental material massive blue or violet, SG 3.21–3.41, a blurred shadow edge at about 1.68; Sri Lankan crystal 1.686, 1.722, 1.723, biaxial −, "
                + "birefringence 0.037; gemstonebuzz.com dumortierite: RI 1.686–1.723, biaxial −, SG 3.26–3.41, commonly opaque, blue to bluish white in SW, most gem material is dumortierite in quartz; "
                + "gemstones.comparenature.com dumortierite: RI 1.669–1.723, birefringence 0.011–0.037",
            Judgement = "the row is massive dumortierite (the quartz rock it colours reads as quartz and is left out); α 1.669–1.686 from the two lower bounds read; β's place from the Sri Lankan "
                + "crystal; UV strengths, hue weights and bench weight: judgement",
        },
        // Second pass of catalogue rivals (docs/benchmark.md, "The property table"): the species the engine's misses on
        // separable stones named most often when the table had no row for them.
        new()
        {
            Name = "jet", BenchWeight = 0.4, Form = StoneForm.Amorphous, Opaque = true, Porous = true,
            Indices = PrincipalValues.Single(1.64, 1.68),
            SpecificGravity = new(1.19, 1.40),
            UvLong = [new("inert", 1)], UvShort = [new("inert", 1)],
            Hues = [new("black", .9), new("brown", .1)],
            Citation = "tradeshop.com jet: fossilised wood (lignite), black, RI 1.66, amorphous, SG 1.19–1.35; review.clateway.com 'Jet (gemstone)' (Wikipedia text): isotropic, RI 1.640–1.680, "
                + "SG 1.3–1.4, black, occasionally brown, no UV fluorescence; gemdictionary.blogspot.com and gemstonebuzz.com jet: isotropic, RI about 1.66, SG 1.20–1.30, inert in UV, "
                + "low SG with high RI the key separation from its imitations",
            Judgement = "SG as the union of the ranges read; organic and so not immersed (the table's convention for organics, common practice); hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "bytownite", BenchWeight = 0.15,
            Indices = PrincipalValues.Biaxial(new(1.563, 1.572), new(0.008, 0.011), new(0.5, 0.6)),
            SpecificGravity = new(2.74, 2.76), Dispersion = 0.012,
            Hues = [new("yellow", .6), new("colourless", .25), new("grey", .1), new("green", .05)],
            Citation = "the-uncensored-wiki.com 'Bytownite' (Wikipedia text): nα 1.563–1.572, nβ 1.568–1.578, nγ 1.573–1.583, SG 2.74–2.75; sglapidary.com bytownite: RI 1.56–1.58, "
                + "birefringence 0.008, dispersion 0.012, no pleochroism; authorhaf.com bytownite: SG 2.75–2.76; rc.unesp.br bytownita: biaxial negative, density 2.76; "
                + "perceptiocs.com (Czech text): colourless, grey, greenish white, translucent yellowish crystals cut",
            Judgement = "birefringence 0.008–0.011 (the lapidary figure and γ − α of the Wikipedia ranges); β's place (0.5–0.6, sign negative) from the same ranges; no UV read; "
                + "hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "smithsonite", BenchWeight = 0.2, Form = StoneForm.Aggregate,
            Indices = PrincipalValues.Uniaxial(new(1.842, 1.850), new(0.225, 0.228), positive: false, epsilon: new(1.619, 1.623)),
            SpecificGravity = new(4.00, 4.65),
            UvLong = [new("inert", .4), new("weak", .25), new("moderate", .2), new("strong", .15)],
            UvShort = [new("inert", .4), new("weak", .25), new("moderate", .2), new("strong", .15)],
            Hues = [new("green", .35), new("blue", .25), new("pink", .15), new("yellow", .1), new("white", .1), new("brown", .05)],
            Citation = "gemfame.com smithsonite: reniform or botryoidal translucent masses, crystals rare, ω 1.842–1.850, ε 1.619–1.623, uniaxial −, birefringence 0.227, SG 4.43; "
                + "jtv.com gemopedia smithsonite: RI over the limit 1.621–1.849, birefringence 0.225–0.228, polariscope aggregate or DR, SG 4.000–4.650, SWUV inert to strong green or red, "
                + "LWUV inert to strong white; gemdat.org smithsonite: SG 4.00–4.65 (Schumann), RI 1.620–1.850, birefringence 0.228 (Blue Chart); studiopjj.blogspot.com: mostly massive",
            Judgement = "the massive stone taken as the bench's smithsonite (an aggregate read by spot at either end: ε near 1.62, or ω over the limit); UV strengths, hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "zincite", BenchWeight = 0.15,
            Indices = PrincipalValues.Uniaxial(new(2.011, 2.015), new(0.015, 0.017), positive: true),
            SpecificGravity = new(5.64, 5.70), Dispersion = 0.127,
            UvLong = [new("inert", .5), new("weak", .25), new("moderate", .25)], UvShort = [new("inert", .5), new("weak", .25), new("moderate", .25)],
            Hues = [new("orange", .45), new("red", .25), new("yellow", .25), new("green", .05)],
            Origins = [new("natural", .1), new("synthetic", .9)],
            OriginCitation = "gemdat.org zincite and gemstones.com gemopedia zincite: gem zincite is mostly a by-product of Polish zinc smelters; gia.edu G&G Spring 2017 "
                + "'Characteristics of gem-quality by-product synthetic zincite' (the synthetic share .9: judgement from those words)",
            Citation = "gemfame.com zincite: ω 2.013, ε 2.029, uniaxial +, birefringence 0.016, SG 5.68; gemstones-guide.com zincite: RI 2.013–2.029, SG 5.70, no fluorescence; "
                + "gemstones.com gemopedia zincite: over the limit 2.013–2.029, dispersion 0.127, SG 5.640–5.680, LW and SW inert to moderate yellow to orange, pleochroism unobservable; "
                + "gemsociety.org zincite: dispersion 0.127, orange-yellow to dark red",
            Judgement = "ω ±0.002 and birefringence ±0.001 about the single published values (always over the limit at a bench); the UV strengths (one page inert, one inert to moderate), "
                + "hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "scapolite", BenchWeight = 0.3, SgFollowsIndex = 1,
            Indices = PrincipalValues.Uniaxial(new(1.550, 1.600), new(0.004, 0.037), positive: false, epsilon: new(1.526, 1.565)),
            SpecificGravity = new(2.50, 2.78), Pleochroism = PleochroismHabit.Moderate, Dispersion = 0.017,
            UvLong = [new("inert", .3), new("weak", .2), new("moderate", .25), new("strong", .25)], UvShort = [new("inert", .5), new("weak", .3), new("moderate", .2)],
            Lines = [new(663, false, "pink"), new(652, false, "pink"), new(663, false, "purple"), new(652, false, "purple")],
            Hues = [new("yellow", .45), new("purple", .25), new("colourless", .15), new("pink", .1), new("grey", .05)],
            Citation = "gemfame.com scapolite: marialite–meionite series, ordinary and extraordinary rays 1.546–1.600 in all, uniaxial −, SG 2.50–2.78 with composition, pink and violet "
                + "stones dichroic, some show 663 and 652 nm (Cr), yellow stones yellow to orange or bright yellow-green in LW, SW variable; mints.uwc.ac.za scapolite: ω 1.540–1.600, "
                + "ε 1.535–1.565, birefringence 0.004–0.037 rising with meionite; review.clateway.com 'Scapolite' (Wikipedia text): ω 1.555–1.594, ε 1.526–1.565, birefringence 0.004–0.038, "
                + "pleochroism moderate to strong, dispersion 0.017, UV inert to strong pink, orange, yellow; cameo.mfa.org: birefringence rises with RI; "
                + "wholesalecrystalsupplier.com: RI, birefringence and density rise with Ca",
            Judgement = "ω 1.550–1.600 between the ranges read; UV strengths, the lines written weak, hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "pyrite", BenchWeight = 0.3, Opaque = true,
            Indices = PrincipalValues.Single(2.60, 3.00),
            SpecificGravity = new(4.90, 5.20),
            Hues = [new("yellow", .85), new("grey", .15)],
            Citation = "tradeshop.com pyrite: opaque, metallic lustre, SG 5.0, faceted as rose cuts; gemfame.com pyrite: SG 5.01–5.03, pale brass yellow, 'marcasite' of the jeweller, "
                + "a semiconductor; m.minerals.net pyrite: opaque, SG 4.9–5.2, metallic yellow or grey, not treated; blog.bhoma.com pyrite: opaque, no refractive index; "
                + "greatspiritlodge.shop (metallic lustre gems): index of metallic-lustre gems about 2.6 to more than 3.0",
            Judgement = "the index range 2.60–3.00 from the general statement on metallic-lustre gems (written only as over the limit at a bench); not written conductive "
                + "(a semiconductor, but whether a bench tester reads it so was not read); hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "scheelite", BenchWeight = 0.15,
            Indices = PrincipalValues.Uniaxial(new(1.918, 1.921), new(0.016, 0.017), positive: true, epsilon: new(1.935, 1.938)),
            SpecificGravity = new(5.90, 6.10), Pleochroism = PleochroismHabit.Moderate, Dispersion = 0.026,
            UvLong = [new("inert", .7), new("weak", .3)], UvShort = [new("strong", .8), new("moderate", .2)],
            Hues = [new("yellow", .4), new("orange", .3), new("colourless", .2), new("brown", .1)],
            Citation = "findatwiki.com and piglix.com 'Scheelite' (Wikipedia text): ω 1.918–1.921, ε 1.935–1.938, uniaxial +, birefringence 0.017 (0.016 maximum in the text), SG 5.9–6.1, "
                + "definite dichroism in yellow, dispersion 0.026, bright blue to bluish white or yellow in SW; gemstoneslist.com scheelite: strong blue in SW, almost none in LW; "
                + "crystalalmanac.com scheelite: SG 6.01, honey yellow, orange, colourless, pale brown",
            Judgement = "natural only (the Czochralski synthetic is named as a diamond imitation and a laser crystal, not met at a bench here); UV strengths, hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "tortoiseshell", BenchWeight = 0.2, Form = StoneForm.Amorphous, Porous = true,
            Indices = PrincipalValues.Single(1.54, 1.56),
            SpecificGravity = new(1.26, 1.35),
            UvLong = [new("inert", .4), new("weak", .3), new("moderate", .3)], UvShort = [new("inert", .4), new("weak", .3), new("moderate", .3)],
            Hues = [new("brown", .55), new("yellow", .35), new("black", .1)],
            Citation = "jtv.com gemopedia 'Tortoise shell': keratin, amorphous, RI 1.55 (−0.010), singly refractive, SG 1.26–1.35 (typical 1.29), SWUV and LWUV inert to moderate bluish white; "
                + "gemdictionary.blogspot.com tortoise shell: RI 1.55, SG 1.29, mottled yellow and brown, yellow parts blue-white in UV; langantiques.com: RI 1.55; "
                + "gemstones.comparenature.com tortoiseshell: RI 1.540–1.560",
            Judgement = "organic and so not immersed (the table's convention for organics); UV strengths, hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "gahnospinel", BenchWeight = 0.15, SgFollowsIndex = 1, Strained = 0.15,
            Indices = PrincipalValues.Single(1.735, 1.790),
            SpecificGravity = new(3.65, 4.40),
            Hues = [new("blue", .8), new("green", .1), new("purple", .1)],
            Citation = "gia.edu G&G Spring 2019 Lab Notes 'Large faceted gahnospinel': dark greenish blue, spinel–gahnite series, RI and SG rise with zinc between spinel (1.718) and gahnite "
                + "(1.800, SG 4.55), the stone read 1.754 and SG 4.10; muuseo.com gahnospinel (quoting a mineral museum's label): RI 1.735–1.790; danugroup.lk spinel: zinc-rich spinel SG "
                + "up to 4.40, anomalous double refraction in some blue zincian stones",
            Judgement = "the SG range 3.65–4.40 (spinel's top to the zinc-rich figure) and SG rising with the index from the GIA note; strain in 15 %, hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "pleonaste", BenchWeight = 0.15, Opaque = true,
            Indices = PrincipalValues.Single(1.770, 1.780),
            SpecificGravity = new(3.60, 3.90),
            Hues = [new("black", .75), new("green", .15), new("blue", .05), new("grey", .05)],
            Citation = "en.wiki.x.io 'Ceylonite' (pleonaste; Wikipedia text): isotropic, RI 1.770–1.780, SG 3.6–3.9, dingy blue or grey to black, dark green; les-pierres-precieuses.fr "
                + "pléonaste: N 1.7–1.8, density 3.6–3.9, translucent to opaque, dark green to black; farlang.com (Catelle, Precious Stones): pleonaste is black and opaque",
            Judgement = "opaque as a bench meets it (black); no UV or lines read for the dark stone; hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "magnesite", BenchWeight = 0.3, Form = StoneForm.Aggregate, Opaque = true,
            Indices = PrincipalValues.Uniaxial(new(1.700, 1.720), new(0.190, 0.202), positive: false, epsilon: new(1.509, 1.515)),
            SpecificGravity = new(2.92, 3.12),
            UvShort = [new("inert", .5), new("weak", .3), new("moderate", .2)],
            Hues = [new("white", .5), new("blue", .2), new("green", .1), new("red", .1), new("grey", .05), new("brown", .05)],
            Origins = [new("natural", .6), new("treated", .4)],
            Citation = "gemfame.com magnesite: crystals rare, mostly white, yellowish, brown or grey earthy or chalky masses, ω 1.710, ε 1.509, uniaxial −, birefringence 0.202, SG 3.0–3.1, "
                + "SWUV blue-green or white; gemdat.org magnesite (Blue Chart 2010): RI 1.509–1.720, birefringence 0.190–0.202, SG 2.92–3.12, masses cut as cabochons, dyed to imitate "
                + "lapis, turquoise and coral; dunebeads.com: often dyed blue or blue-green",
            Judgement = "ω 1.700–1.720 and ε 1.509–1.515 about the values read; the chalky masses taken as opaque (read by spot at either end); UV strengths, the dyed share, hue weights "
                + "and bench weight: judgement",
        },
        new()
        {
            Name = "hematite", BenchWeight = 0.3, Opaque = true,
            Indices = PrincipalValues.Uniaxial(new(3.20, 3.22), new(0.27, 0.28), positive: false),
            SpecificGravity = new(4.95, 5.30),
            UvLong = [new("inert", 1)], UvShort = [new("inert", 1)],
            Hues = [new("black", .6), new("grey", .4)],
            Citation = "jtv.com hematite: opaque, RI over the limit 2.94–3.22, birefringence 0.28, SG 4.95–5.28 (typical 5.2), SW and LW inert, dark grey to black, red-brown streak; "
                + "tradeshop.com hematite: RI 2.94–3.22, SG 4.95–5.26; gemdat.org hematite: SG 5.00–5.30 (Blue Chart), uniaxial −, birefringence 0.280; maygems.com: SG 5.12–5.28",
            Judgement = "always over the limit at a bench; hue weights and bench weight: judgement (the sintered imitation is not a row)",
        },
    ];
}
