namespace GemIndex.Bench.Independent;

/// <summary>
/// The benchmark's own table of what a stone shows under magnification, by species, origin and method of making or
/// treating (docs/benchmark.md, "Magnification"). Compiled for the benchmark from the pages named in each row, never
/// from the engine's magnification tables. The pages say which features occur and in words how often ("sure sign",
/// "usually", "occasionally", "rare"); the numbers are the benchmark's reading of those words: always or in every
/// stone examined 0.85–0.95, usually or typical 0.55–0.75, often or common 0.35–0.5, some or may 0.15–0.3,
/// occasionally 0.1, rare 0.02–0.05. Rows marked "from memory" or "common practice" had no page read for them.
/// The method shares within an origin are judgements.
/// </summary>
internal static partial class MagnificationHabits
{
    // Pages read through the search tool (pages corpus), by short key.
    private const string CurvedStriaeHowTo = "gemsociety.org 'How to find curved striae in synthetic ruby and sapphire' (sure sign, subtle curvature, immersion and the c axis help)";
    private const string RubyForums = "forums.gemsociety.org 'Ruby gem ID' and 'Does this qualify for curved striae?' (curved striae and small bubbles, sometimes in clusters, in flame-fusion corundum; a loupe-clean sapphire of size is suspect)";
    private const string ApsaraSynthetic = "apsara.co.uk gallery 'Synthetic rubies & sapphires' (curved colour banding, gas bubbles; quench-crackled flame-fusion rubies with fingerprint-like liquid inclusions)";
    private const string ApsaraUnheated = "apsara.co.uk gallery 'Inclusions in untreated blue sapphires' (rutile silk, guest crystals, liquid fingerprints, two-phase inclusions)";
    private const string FlaskBubble = "dkrjewelstones.com 'Inner view: inclusion 7' (flask-like bubble with a tail in flame-fusion corundum)";
    private const string MjsaRuby = "mjsa.org 'Hone your ruby radar' (gas bubbles trapped in glass filler; flame-fusion bubbles tiny or in clouds, stones look flawless)";
    private const string JewellerSapphire = "jewellermagazine.com article 7191 (flame fusion the favoured synthetic in the trade; heated stones show damaged silk and discoid fractures; liquid films prove no heating)";
    private const string HeatedSapphire = "suwagem.com 'Distinguishing between untreated and heated sapphire'; gemkids.gia.edu sapphire microscope (heating melts crystals, breaks silk, leaves discoid fractures)";
    private const string GgFluxSapphire2019 = "Gems & Gemology Summer 2019 Lab Notes 'Exsolved particles with natural appearance within flux-grown pink synthetic sapphire' (platinum platelet, flux fingerprints)";
    private const string GgFluxHydrothermalRuby2014 = "Gems & Gemology Summer 2014 Lab Notes (Sun, DeGhionno) 'Flux-grown synthetic ruby with hydrothermal synthetic seed crystal' (zigzag growth of hydrothermal growth; hexagonal platelets and whitish flux of flux growth)";
    private const string GgFlameFluxRuby2014 = "Gems & Gemology Fall 2014 Lab Notes 'Flame-fusion synthetic ruby boule with flux synthetic ruby overgrowth' (quench-crackled, flux-healed flame-fusion stones; subtle curved striae)";
    private const string GgFluxRuby2021 = "Gems & Gemology Summer 2021 Lab Notes 'Chrysoberyl inclusions in flux-grown ruby' (crystals like natural zircon nests, dark platelets, flux in healed fissures)";
    private const string FluxRubyBlog = "social.heyluu.com 'Characteristics of ruby synthesized by flux strategy' (flux remains the main feature; platinum flakes seldom)";
    private const string RubyIdQuestion = "orchid.ganoksin.com 'Ruby ID question' (curved striae only in flame-fusion and pulled synthetics)";
    private const string NailHead = "Choudhary and Golecha (2007), Gems & Gemology 43(3) 228-235, 'A study of nail-head spicule inclusions in natural gemstones' (docslib copy: spicules in hydrothermal and occasionally flux emerald and synthetic quartz, rarely natural emerald and sapphire; look-alikes in yellow sapphire, spinel, diamond, quartz; hound's-tooth growth of hydrothermal, wispy veils of flux, curved lines of flame fusion)";
    private const string GgLeadGlassRuby2014 = "Gems & Gemology Winter 2014 Lab Notes 'Lead-glass-filled Burmese rubies' (rutile silk, planar zoning; filled rubies known by blue or orange flashes and flattened gas bubbles, after McClure et al. 2006; low-lead filler without flash)";
    private const string GgLeadGlassLabRuby2021 = "Gems & Gemology Spring 2021 Lab Notes 'Lead glass-filled laboratory-grown ruby' (flash effect throughout, flattened gas bubbles in fractures)";
    private const string ApsaraLeadGlass = "apsara.co.uk gallery 'Inclusions in lead-glass filled rubies' (gas bubbles in the filler fairly common, interference colours)";
    private const string SsefDiffusion = "ssef.ch 'Ti-diffusion treated sapphire cabochons' (Krzemnicki 2023: faceted diffusion stones show facet-related colour; healed fissures from heating)";
    private const string GgEmeraldChart = "Gems & Gemology Winter 2016 'Chart: inclusions in natural, synthetic, and treated emerald'; annaspurpleemerald.com quoting it (flash effect and flattened bubbles in filled emerald)";
    private const string SyntheticInclusionsBlog = "stones-gems.blogspot.com 'Inclusions in synthetic gemstones' (flux emerald: phenakite, platinum, veils; hydrothermal emerald few inclusions; natural emerald mica, tremolite, three-phase; peridot lily pads; hessonite treacle)";
    private const string SyntheticEmeraldPages = "studiopjj.blogspot.com 'Emerald story' (flux: wispy veils, venetian-blind zoning); grandauctions.co.uk 'Synthetic emerald' (flux veils, platinum platelets; hydrothermal spiky nail-like inclusions, zigzag growth); yourgemologist.com hydrothermal emerald (growth pattern primary test; breadcrumbs with nail-head spikes rare without high magnification)";
    private const string EmeraldEnhancement = "gemsociety.org 'A guide to emerald enhancements' (perhaps 99 % enhanced; large clean aquamarine common); globalgemology.com emerald treatments (blue or orange flash marks filling)";
    private const string EmeraldInclusions = "gem-matrix.com 'Inclusions in emeralds' (two-phase in Brazilian, three-phase in Colombian; interference colours also in unenhanced emerald)";
    private const string InclusionGlossary = "aglthai.com inclusion glossary (rain in beryl, tiger stripes, centipedes in moonstone, sun spangles in amber, horsetail in demantoid, lily pads in peridot)";
    private const string SpinelInclusions = "gem-matrix.com 'Inclusions in spinel' (octahedral crystals first to look for; fluid inclusions comparatively uncommon); lotusgemology.com 'Inclusions in spinel'";
    private const string SyntheticSpinel = "adin.be 'Synthetic spinel' (occasional globular gas bubbles); gemstones-guide.com 'Synthetic spinel' (Verneuil growth)";
    private const string Amethyst = "orchid.ganoksin.com 'Synthetic quartz gems' (natural amethyst nearly always shows numerous straight and V zones; synthetic seldom); yourgemologist.com hydrothermal amethyst (seed plate, breadcrumbs, seldom seen)";
    private const string BerylChannels = "Journal of Gemmology 37(3), 2020, Gem Notes (fliphtml5.com copy, p. 12): elongate growth channels and two-phase inclusions parallel to the c axis 'quite common' in beryl from granitic pegmatites";
    private const string TourmalineMicroFeatures = "gia.edu G&G in a Flash, 'Micro-Features of Tourmaline' (2024): growth tubes among tourmaline's inclusions, dense ones giving a cat's-eye";
    private const string UniqueInclusions = "artsandculture.google.com 'Unique inclusions, unique gems' (Instituto Gemologico Espanol: amethyst tiger stripes, goethite; demantoid horsetail; peridot lily pads; tourmaline trichites)";
    private const string LilyPads = "professionaljeweler.com 'Lilliputian lily pads' (almost always in peridot); learnaboutgemstones.wordpress.com (also mica flakes and droplets)";
    private const string FilledDiamonds = "Gems & Gemology Spring 1995, McClure et al., 'A visual guide to the identification of filled diamonds' (every filled diamond examined showed flash effects; trapped bubbles in some); diamondlab.org";
    private const string SyntheticDiamonds = "Gems & Gemology Fall 2017 'Observations on HPHT-grown synthetic diamonds' and Spring 2015 Lab Notes 'Large HPHT-grown synthetic diamonds' (metallic inclusions; pinpoints common); eco-friendlydiamonds.com (only dark metallic flux in grown diamond, mineral crystals in natural)";
    private const string CubicZirconia = "sarasotagoldandsilver.com 'Cubic zirconia' (Wikipedia text: optically flawless)";
    private const string SyntheticRutile = "gemdictionary.blogspot.com 'Synthetic rutile' (flame fusion; generally clean, strong doubling)";
    private const string Alexandrite = "cigem.ca alexandrite (flux: dust-like layers along the seed, strong banding; floating zone: swirls, tadpole and round bubbles); wordinf.com (pulled: very clean, curved striations); swissgemshop.ch and gemfame.com (flux alexandrite: platinum, flux feathers, some bubbles)";
    private const string Glass = "yourgemologist.com 'Glass imitations' (almost always gas bubbles); langantiques.com 'Gas bubble'; kakilimagems.blogspot.com (bubbles, swirl marks, devitrification); studiopjj.blogspot.com 'Specialty glasses' (flow lines, bubbles, dendritic devitrification)";
    private const string SyntheticOpal = "forums.gemsociety.org 'March eNews mini-quiz' (mosaic: cellular, snake-skin, chicken-wire); opalquest.com 'Colour in opal' (blurred boundaries, repeating pattern in synthetic); muuseo.com Gilson opal (lizard skin at 10x)";
    private const string CompositeOpal = "theopaloutlet.com and blog.balisilver925.com (doublet's straight join line seen from the side, very hard to see when the sides are set; triplet's glassy cap); geology.com 'Composite opal'";
    private const string Doublets = "Wade (1918) A Text-Book of Precious Stones (bitlit.ru p. 66: lustre change and join at the girdle); gemstones-guide.com 'Suggestions for testing doublets'; langantiques.com 'Doublet' (natural sapphire crown on synthetic pavilion)";
    private const string CoatedTopaz = "edelsteine.at 'Mystic topaz' (coating scratched by tweezers); yourgemologist.com mystic topaz (coating flakes in setting and wear, shown in immersion)";
    private const string DyedJade = "studylib.net jade notes (A, B, C jade); wholesale.pink (dyed colour in a spider-web pattern; acid-etched reticulation of B jade)";
    private const string DyedChalcedony = "jiehonggem.com blue agate (from GIA Gem Reference Guide: dye taken unevenly by the bands); mindat.org 'Historic methods of artificially coloring agates'";
    private const string Coral = "itimeaccessories.com coral bead identification (dye in the skin, uneven, white inside); enviroliteracy.org red coral (natural colour uneven, growth striations)";
    private const string Amber = "actforlibraries.org 'Common types of inclusions found in gems' (round bubbles in natural amber); mjsa.org (amber and obsidian the natural hosts of free bubbles); gentarus.com (air bubbles, sand, dust)";
    private const string Sunstone = "gemfame.com sunstone; multicolour.com sunstone; victorygemstone.blogspot.com (reflective hematite, goethite or copper platelets, fingerprints, crystals)";
    private const string Moissanite = "diamondschina.com moissanite identification (Hodgkinson: needle-like inclusions); francoisjewellers.co.za (needle-like lines typical)";
    private const string GarnetNeedles = "J. Mineral. Petrol. Sci. 2023 'Rutile exsolution lamellae of garnet' (rutile needles in almandine-pyrope at 120°)";
    private const string Demantoid = "ilatminerals.ru 'Types of inclusions in the Ural demantoid' (horsetails of byssolite)";
    private const string Plastic = "astrogyangranth.com 'plastic' (gas bubbles, flow lines, mould marks, orange-peel surface)";
    private const string Obsidian = "jiehonggem.com 'Natural glass – obsidian' (gas bubbles, crystallites, stubby needle-like inclusions, banding)";
    private const string Lapis = "gemstones-guide.com lapis lazuli (brassy pyrite and white calcite inclusions)";
    private const string Sodalite = "tannerchaney.com sodalite (white calcite veining, pyrite now and then)";
    private const string Malachite = "gemstonebuzz.com malachite (curved and straight banding under magnification)";
    private const string TurquoiseAndHowlite = "jiehonggem.com turquoise and howlite (matrix, spiderweb veins; dye and impregnation found by magnification 'possibly')";
    private const string Shell = "jtv.com 'Shell pearl' (parallel growth structure, flame-like structure)";
    private const string Alabaster = "jtv.com 'Alabaster' (banded, veined, often dyed)";

    private static FeatureHabit H(string word, double held) => new(word, held);

    /// <summary>Every row: for each species and origin of the property table, one row per method.</summary>
    public static IReadOnlyList<MagnificationHabit> All { get; } = [.. FirstRows(), .. CrystalRows(), .. OrnamentalRows(), .. OrganicAndManMadeRows(), .. CollectorRaritiesRows(), .. OrnamentalMineralsRows()];

    private static MagnificationHabit[] FirstRows() =>
    [
        // Corundum.
        new() { Species = "corundum", Origin = "natural", Method = "natural", Clean = .05,
            Features = [H("needles_silk", .5), H("crystals", .55), H("healed_fractures", .5), H("fluid_inclusions", .2), H("angular_zoning", .35), H("colour_banding", .35), H("nail_head_spicules", .02)],
            Source = $"{ApsaraUnheated}; {GgLeadGlassRuby2014}; {JewellerSapphire}; {RubyForums}; {NailHead}" },
        new() { Species = "corundum", Origin = "synthetic", Method = "flame fusion", Share = .75, Clean = .2,
            Features = [H("curved_striae", .65), H("round_bubbles", .45), H("elongated_bubbles", .15), H("healed_fractures", .1), H("flux_residue", .03)],
            Source = $"{CurvedStriaeHowTo}; {RubyForums}; {ApsaraSynthetic}; {FlaskBubble}; {MjsaRuby}; {GgFlameFluxRuby2014}; share: {JewellerSapphire}" },
        new() { Species = "corundum", Origin = "synthetic", Method = "flux", Share = .15, Clean = .05,
            Features = [H("flux_residue", .75), H("metal_platelets", .2), H("angular_zoning", .3), H("crystals", .1), H("healed_fractures", .1)],
            Source = $"{GgFluxSapphire2019}; {GgFluxHydrothermalRuby2014}; {GgFluxRuby2021}; {FluxRubyBlog}" },
        new() { Species = "corundum", Origin = "synthetic", Method = "pulled", Share = .07, Clean = .5,
            Features = [H("curved_striae", .4), H("round_bubbles", .2)],
            Source = $"{RubyIdQuestion}; visibility of striae in pulled stones: judgement" },
        new() { Species = "corundum", Origin = "synthetic", Method = "hydrothermal", Share = .03, Clean = .1,
            Features = [H("chevron_growth", .6), H("nail_head_spicules", .15), H("fluid_inclusions", .1), H("crystals", .05)],
            Source = $"{GgFluxHydrothermalRuby2014}; {NailHead}" },
        // Lead-glass filling is a ruby treatment in every note read; diffusion colours the other hues (Be: yellow,
        // orange, pink; Ti: blue). Shares within each hue: judgement.
        new() { Species = "corundum", Origin = "treated", Method = "heat", Hue = "red", Share = .6, Clean = .05,
            Features = [H("crystals", .45), H("healed_fractures", .45), H("needles_silk", .2), H("angular_zoning", .35), H("colour_banding", .3), H("fluid_inclusions", .05)],
            Source = $"{JewellerSapphire}; {HeatedSapphire}" },
        new() { Species = "corundum", Origin = "treated", Method = "glass filled", Hue = "red", Share = .4, Clean = 0,
            Features = [H("flash_effect", .85), H("flattened_bubbles", .6), H("round_bubbles", .15), H("crystals", .35), H("needles_silk", .2), H("healed_fractures", .3)],
            Source = $"{GgLeadGlassRuby2014}; {GgLeadGlassLabRuby2021}; {ApsaraLeadGlass}; {MjsaRuby}" },
        new() { Species = "corundum", Origin = "treated", Method = "heat", Share = .8, Clean = .05,
            Features = [H("crystals", .45), H("healed_fractures", .45), H("needles_silk", .2), H("angular_zoning", .35), H("colour_banding", .3), H("fluid_inclusions", .05)],
            Source = $"{JewellerSapphire}; {HeatedSapphire}" },
        new() { Species = "corundum", Origin = "treated", Method = "diffusion", Share = .2, Clean = 0,
            Features = [H("surface_colour", .8), H("crystals", .35), H("healed_fractures", .35)],
            Source = $"{SsefDiffusion}; hues: {JewellerSapphire} (beryllium-heated stones turn orange)" },
        new() { Species = "corundum", Origin = "composite", Method = "doublet", Clean = 0,
            Features = [H("join_plane", .9), H("cement_bubbles", .35), H("two_lustres", .1), H("crystals", .3), H("needles_silk", .2), H("curved_striae", .2), H("healed_fractures", .25)],
            Source = $"{Doublets}; little lustre change between two corundum parts: judgement" },

        // Beryl: emerald (green) is included, the other beryls often clean.
        new() { Species = "beryl", Origin = "natural", Method = "natural", Hue = "green", Clean = .02,
            Features = [H("crystals", .6), H("fluid_inclusions", .55), H("healed_fractures", .55), H("needles_silk", .15), H("colour_banding", .2), H("angular_zoning", .15), H("nail_head_spicules", .02)],
            Source = $"{SyntheticInclusionsBlog}; {EmeraldInclusions}; {GgEmeraldChart}; {EmeraldEnhancement}; {NailHead}" },
        new() { Species = "beryl", Origin = "natural", Method = "natural", Clean = .35,
            Features = [H("fluid_inclusions", .3), H("needles_silk", .25), H("healed_fractures", .3), H("crystals", .15), H("colour_banding", .1), H("growth_tubes", .3)],
            Source = $"{EmeraldEnhancement}; {InclusionGlossary}; {BerylChannels}" },
        new() { Species = "beryl", Origin = "synthetic", Method = "flux", Share = .45, Clean = .05,
            Features = [H("flux_residue", .7), H("crystals", .3), H("metal_platelets", .15), H("angular_zoning", .25), H("nail_head_spicules", .05)],
            Source = $"{SyntheticInclusionsBlog}; {SyntheticEmeraldPages}; {NailHead}" },
        new() { Species = "beryl", Origin = "synthetic", Method = "hydrothermal", Share = .55, Clean = .15,
            Features = [H("chevron_growth", .55), H("nail_head_spicules", .35), H("crystals", .15), H("fluid_inclusions", .1), H("colour_banding", .1)],
            Source = $"{SyntheticEmeraldPages}; {NailHead}" },
        new() { Species = "beryl", Origin = "treated", Method = "clarity enhanced", Hue = "green", Clean = 0,
            Features = [H("flash_effect", .5), H("flattened_bubbles", .3), H("dye_in_fractures", .05), H("crystals", .6), H("fluid_inclusions", .5), H("healed_fractures", .5), H("colour_banding", .2)],
            Source = $"{EmeraldEnhancement}; {GgEmeraldChart}; oil shows less flash than resin: judgement" },
        new() { Species = "beryl", Origin = "treated", Method = "heated or irradiated", Clean = .35,
            Features = [H("fluid_inclusions", .3), H("needles_silk", .25), H("healed_fractures", .3), H("crystals", .15), H("colour_banding", .1), H("growth_tubes", .3)],
            Source = "common practice: heating and irradiation of beryl leave nothing a loupe shows; the stone's own features as the natural row" },

        // Chrysoberyl.
        new() { Species = "chrysoberyl", Origin = "natural", Method = "natural", Clean = .1,
            Features = [H("fluid_inclusions", .3), H("healed_fractures", .35), H("crystals", .3), H("needles_silk", .3), H("angular_zoning", .15)],
            Source = "from memory (silk of cat's-eye stones, twinning, fingerprints)" },
        new() { Species = "chrysoberyl", Origin = "synthetic", Method = "pulled", Share = .6, Clean = .45,
            Features = [H("curved_striae", .35), H("round_bubbles", .15)],
            Source = Alexandrite },
        new() { Species = "chrysoberyl", Origin = "synthetic", Method = "floating zone", Share = .1, Clean = .2,
            Features = [H("round_bubbles", .4), H("elongated_bubbles", .3), H("curved_striae", .3)],
            Source = Alexandrite },
        new() { Species = "chrysoberyl", Origin = "synthetic", Method = "flux", Share = .3, Clean = .05,
            Features = [H("flux_residue", .6), H("metal_platelets", .2), H("angular_zoning", .35), H("crystals", .05)],
            Source = Alexandrite },

        // Spinel.
        new() { Species = "spinel", Origin = "natural", Method = "natural", Clean = .1,
            Features = [H("crystals", .55), H("healed_fractures", .3), H("fluid_inclusions", .1), H("angular_zoning", .1), H("needles_silk", .05)],
            Source = SpinelInclusions },
        new() { Species = "spinel", Origin = "synthetic", Method = "flame fusion", Share = .85, Clean = .45,
            Features = [H("round_bubbles", .3), H("elongated_bubbles", .1), H("curved_striae", .08)],
            Source = $"{SyntheticSpinel}; curved striae seldom seen in it: from memory" },
        new() { Species = "spinel", Origin = "synthetic", Method = "flux", Share = .15, Clean = .05,
            Features = [H("flux_residue", .65), H("metal_platelets", .25), H("angular_zoning", .2), H("crystals", .05)],
            Source = "from memory (flux spinel shows the flux residue and platelets of flux corundum)" },

        // Topaz: the usual treatments leave nothing a loupe shows; coated stones do.
        new() { Species = "topaz", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("fluid_inclusions", .35), H("healed_fractures", .3), H("crystals", .2), H("colour_banding", .05)],
            Source = "from memory (two-liquid cavities, fingerprints)" },
        new() { Species = "topaz", Origin = "treated", Method = "irradiated or heated", Share = .85, Clean = .3,
            Features = [H("fluid_inclusions", .35), H("healed_fractures", .3), H("crystals", .2), H("colour_banding", .05)],
            Source = "common practice: irradiation and heating leave nothing a loupe shows" },
        new() { Species = "topaz", Origin = "treated", Method = "coated", Share = .15, Clean = 0,
            Features = [H("coating_wear", .6), H("surface_colour", .3), H("fluid_inclusions", .25), H("healed_fractures", .2), H("crystals", .15)],
            Source = CoatedTopaz },

        new() { Species = "tourmaline", Origin = "natural", Method = "natural", Clean = .15,
            Features = [H("fluid_inclusions", .45), H("healed_fractures", .45), H("colour_banding", .3), H("needles_silk", .15), H("crystals", .1), H("growth_tubes", .35)],
            Source = $"{UniqueInclusions} (trichites); {TourmalineMicroFeatures}; colour zoning: common practice" },

        // Zircon: heating leaves nothing a loupe shows.
        new() { Species = "zircon", Origin = "natural", Method = "natural", Clean = .25,
            Features = [H("crystals", .25), H("healed_fractures", .25), H("angular_zoning", .2), H("fluid_inclusions", .1), H("needles_silk", .05)],
            Source = "from memory" },
        new() { Species = "zircon", Origin = "treated", Method = "heated", Clean = .25,
            Features = [H("crystals", .25), H("healed_fractures", .25), H("angular_zoning", .2), H("fluid_inclusions", .1), H("needles_silk", .05)],
            Source = "common practice: heating leaves nothing a loupe shows" },

        new() { Species = "olivine", Origin = "natural", Method = "natural", Clean = .1,
            Features = [H("healed_fractures", .6), H("crystals", .5), H("fluid_inclusions", .15)],
            Source = $"{LilyPads}; {UniqueInclusions}; {SyntheticInclusionsBlog}" },

        // Quartz.
        new() { Species = "quartz", Origin = "natural", Method = "natural", Clean = .15,
            Features = [H("colour_banding", .45), H("angular_zoning", .3), H("healed_fractures", .35), H("fluid_inclusions", .3), H("crystals", .15), H("needles_silk", .1)],
            Source = $"{Amethyst}; {UniqueInclusions}" },
        new() { Species = "quartz", Origin = "synthetic", Method = "hydrothermal", Clean = .55,
            Features = [H("nail_head_spicules", .2), H("crystals", .12), H("chevron_growth", .1), H("colour_banding", .1), H("fluid_inclusions", .05)],
            Source = $"{Amethyst}; {NailHead}" },
        new() { Species = "quartz", Origin = "treated", Method = "heated or irradiated", Clean = .15,
            Features = [H("colour_banding", .45), H("angular_zoning", .3), H("healed_fractures", .35), H("fluid_inclusions", .3), H("crystals", .15), H("needles_silk", .1)],
            Source = "common practice: heating and irradiation of quartz leave nothing a loupe shows" },

        new() { Species = "chalcedony", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("colour_banding", .5), H("crystals", .05)],
            Source = DyedChalcedony },
        new() { Species = "chalcedony", Origin = "treated", Method = "dyed", Clean = 0,
            Features = [H("dye_in_fractures", .35), H("colour_banding", .45)],
            Source = DyedChalcedony },

        // Garnets.
        new() { Species = "pyrope", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("crystals", .35), H("needles_silk", .2), H("healed_fractures", .2), H("fluid_inclusions", .05)],
            Source = $"{GarnetNeedles}; the rest from memory" },
        new() { Species = "almandine", Origin = "natural", Method = "natural", Clean = .15,
            Features = [H("needles_silk", .4), H("crystals", .45), H("healed_fractures", .2)],
            Source = $"{GarnetNeedles}; crystals: from memory" },
        new() { Species = "spessartine", Origin = "natural", Method = "natural", Clean = .2,
            Features = [H("healed_fractures", .4), H("crystals", .2), H("fluid_inclusions", .2)],
            Source = "from memory (wavy fingerprints)" },
        new() { Species = "grossular", Origin = "natural", Method = "natural", Clean = .2,
            Features = [H("crystals", .5), H("healed_fractures", .2), H("fluid_inclusions", .1)],
            Source = $"{SyntheticInclusionsBlog} (treacly hessonite); rounded crystals: from memory" },
        new() { Species = "andradite", Origin = "natural", Method = "natural", Clean = .2,
            Features = [H("needles_silk", .5), H("crystals", .2), H("healed_fractures", .2)],
            Source = $"{Demantoid}; {UniqueInclusions}; {InclusionGlossary}" },

        // Diamond.
        new() { Species = "diamond", Origin = "natural", Method = "natural", Clean = .15,
            Features = [H("crystals", .6), H("healed_fractures", .1), H("needles_silk", .03)],
            Source = SyntheticDiamonds },
        new() { Species = "diamond", Origin = "synthetic", Method = "HPHT", Share = .6, Clean = .3,
            Features = [H("metal_platelets", .5), H("crystals", .2)],
            Source = SyntheticDiamonds },
        new() { Species = "diamond", Origin = "synthetic", Method = "CVD", Share = .4, Clean = .6,
            Features = [H("crystals", .3)],
            Source = "from memory (dark pinpoints of non-diamond carbon)" },
        new() { Species = "diamond", Origin = "treated", Method = "fracture filled", Share = .5, Clean = 0,
            Features = [H("flash_effect", .9), H("flattened_bubbles", .3), H("crystals", .5)],
            Source = FilledDiamonds },
        new() { Species = "diamond", Origin = "treated", Method = "colour treated", Share = .5, Clean = .15,
            Features = [H("crystals", .6), H("healed_fractures", .1)],
            Source = "common practice: annealing and irradiation leave nothing a loupe shows" },

        new() { Species = "cubic zirconia", Origin = "synthetic", Method = "skull melt", Clean = .9,
            Features = [H("round_bubbles", .5), H("crystals", .3)],
            Source = $"{CubicZirconia}; the rare bubbles and unmelted particles: from memory" },
        new() { Species = "moissanite", Origin = "synthetic", Method = "sublimation", Clean = .3,
            Features = [H("needles_silk", .7)],
            Source = Moissanite },
        new() { Species = "yttrium aluminium garnet", Origin = "synthetic", Method = "pulled", Clean = .8,
            Features = [H("round_bubbles", .5), H("curved_striae", .2)],
            Source = "from memory" },
        new() { Species = "gadolinium gallium garnet", Origin = "synthetic", Method = "pulled", Clean = .8,
            Features = [H("round_bubbles", .4), H("metal_platelets", .2)],
            Source = "from memory" },
        new() { Species = "rutile", Origin = "synthetic", Method = "flame fusion", Clean = .75,
            Features = [H("round_bubbles", .5), H("curved_striae", .2)],
            Source = SyntheticRutile },
        new() { Species = "rutile", Origin = "natural", Method = "natural", Clean = .2,
            Features = [H("crystals", .3), H("needles_silk", .2), H("healed_fractures", .3)],
            Source = "from memory" },

        new() { Species = "spodumene", Origin = "natural", Method = "natural", Clean = .25,
            Features = [H("growth_tubes", .3), H("needles_silk", .05), H("fluid_inclusions", .3), H("healed_fractures", .3)],
            Source = "from memory (growth tubes, fingerprints)" },
        new() { Species = "zoisite", Origin = "natural", Method = "natural", Clean = .25,
            Features = [H("fluid_inclusions", .2), H("crystals", .25), H("healed_fractures", .25)],
            Source = "from memory" },
        new() { Species = "zoisite", Origin = "treated", Method = "heated", Clean = .25,
            Features = [H("fluid_inclusions", .2), H("crystals", .25), H("healed_fractures", .25)],
            Source = "common practice: heating of tanzanite leaves nothing a loupe shows" },
        new() { Species = "cordierite", Origin = "natural", Method = "natural", Clean = .2,
            Features = [H("crystals", .3), H("fluid_inclusions", .15), H("needles_silk", .1), H("healed_fractures", .2)],
            Source = "from memory" },

        // Feldspars.
        new() { Species = "orthoclase", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("healed_fractures", .3), H("crystals", .1), H("fluid_inclusions", .05)],
            Source = $"{InclusionGlossary} (centipedes in moonstone)" },
        new() { Species = "microcline", Origin = "natural", Method = "natural", Clean = .2,
            Features = [H("colour_banding", .3), H("healed_fractures", .2)],
            Source = "from memory" },
        new() { Species = "oligoclase", Origin = "natural", Method = "natural", Clean = .1,
            Features = [H("metal_platelets", .65), H("crystals", .2), H("healed_fractures", .2)],
            Source = Sunstone },
        new() { Species = "labradorite", Origin = "natural", Method = "natural", Clean = .2,
            Features = [H("needles_silk", .4), H("crystals", .2), H("healed_fractures", .1)],
            Source = "from memory" },

        // Jade.
        new() { Species = "jadeite", Origin = "natural", Method = "natural", Clean = .6,
            Features = [H("crystals", .1), H("colour_banding", .15)],
            Source = "from memory" },
        new() { Species = "jadeite", Origin = "treated", Method = "dyed", Share = .5, Clean = 0,
            Features = [H("dye_in_fractures", .7)],
            Source = DyedJade },
        new() { Species = "jadeite", Origin = "treated", Method = "bleached and impregnated", Share = .5, Clean = .5,
            Features = [H("dye_in_fractures", .1)],
            Source = $"{DyedJade}; the etched surface has no word in the vocabulary" },
        new() { Species = "nephrite", Origin = "natural", Method = "natural", Clean = .6,
            Features = [H("crystals", .3), H("colour_banding", .1)],
            Source = "from memory (black specks)" },

        // Opal.
        new() { Species = "opal", Origin = "natural", Method = "natural", Clean = .7,
            Features = [H("colour_banding", .3), H("mosaic_patches", .1), H("crystals", .1)],
            Source = $"{SyntheticOpal} (natural grain boundaries sharp); harlequin patches read as mosaic: judgement" },
        new() { Species = "opal", Origin = "synthetic", Method = "precipitated", Clean = 0,
            Features = [H("mosaic_patches", .85), H("colour_banding", .05)],
            Source = SyntheticOpal },
        new() { Species = "opal", Origin = "treated", Method = "smoke, sugar or impregnated", Clean = .2,
            Features = [H("dye_in_fractures", .5)],
            Source = "from memory (carbon or dye gathered in pores and cracks)" },
        new() { Species = "opal", Origin = "composite", Method = "doublet", Share = .6, Clean = 0,
            Features = [H("join_plane", .85), H("cement_bubbles", .3), H("two_lustres", .05)],
            Source = CompositeOpal },
        new() { Species = "opal", Origin = "composite", Method = "triplet", Share = .4, Clean = 0,
            Features = [H("join_plane", .9), H("two_lustres", .6), H("cement_bubbles", .35)],
            Source = CompositeOpal },

        new() { Species = "apatite", Origin = "natural", Method = "natural", Clean = .2,
            Features = [H("fluid_inclusions", .3), H("crystals", .2), H("healed_fractures", .25), H("needles_silk", .15)],
            Source = "from memory" },
        new() { Species = "andalusite", Origin = "natural", Method = "natural", Clean = .25,
            Features = [H("needles_silk", .2), H("crystals", .2), H("healed_fractures", .2)],
            Source = "from memory" },
        new() { Species = "kyanite", Origin = "natural", Method = "natural", Clean = .2,
            Features = [H("healed_fractures", .3), H("crystals", .2), H("colour_banding", .3)],
            Source = "from memory (cleavage cracks, colour zoning)" },
        new() { Species = "sillimanite", Origin = "natural", Method = "natural", Clean = .25,
            Features = [H("needles_silk", .4), H("healed_fractures", .2)],
            Source = "from memory (fibrous habit)" },
        new() { Species = "diopside", Origin = "natural", Method = "natural", Clean = .25,
            Features = [H("crystals", .2), H("needles_silk", .15), H("healed_fractures", .2), H("fluid_inclusions", .1)],
            Source = "from memory" },
        new() { Species = "titanite", Origin = "natural", Method = "natural", Clean = .2,
            Features = [H("crystals", .2), H("healed_fractures", .3), H("fluid_inclusions", .2), H("colour_banding", .1)],
            Source = "from memory" },
        new() { Species = "fluorite", Origin = "natural", Method = "natural", Clean = .15,
            Features = [H("fluid_inclusions", .4), H("healed_fractures", .35), H("colour_banding", .4)],
            Source = "from memory (two- and three-phase inclusions, colour zoning)" },
        new() { Species = "amber", Origin = "natural", Method = "natural", Clean = .35,
            Features = [H("round_bubbles", .55), H("elongated_bubbles", .1), H("healed_fractures", .1)],
            Source = $"{Amber}; {InclusionGlossary} (sun spangles)" },
        new() { Species = "coral", Origin = "natural", Method = "natural", Clean = .5,
            Features = [H("colour_banding", .4)],
            Source = Coral },
        new() { Species = "coral", Origin = "treated", Method = "dyed", Clean = 0,
            Features = [H("dye_in_fractures", .6), H("colour_banding", .2)],
            Source = Coral },
        new() { Species = "glass", Origin = "imitation", Method = "glass", Clean = .2,
            Features = [H("round_bubbles", .7), H("elongated_bubbles", .3), H("curved_striae", .15), H("crystals", .03), H("colour_banding", .05)],
            Source = $"{Glass}; swirl marks written as curved striae: judgement" },
        new() { Species = "phenakite", Origin = "natural", Method = "natural", Clean = .4,
            Features = [H("needles_silk", .15), H("crystals", .15), H("fluid_inclusions", .15)],
            Source = "from memory" },
        new() { Species = "euclase", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("healed_fractures", .2), H("fluid_inclusions", .2), H("colour_banding", .2)],
            Source = "from memory" },

        // The rows added with the rival species of the property table (kept short: their features rarely decide an origin).
        new() { Species = "plastic", Origin = "imitation", Method = "moulded plastic", Clean = .3,
            Features = [H("round_bubbles", .5), H("elongated_bubbles", .2), H("curved_striae", .2)],
            Source = $"{Plastic}; flow lines written as curved striae, as for glass: judgement" },
        new() { Species = "natural glass", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("round_bubbles", .3), H("elongated_bubbles", .2), H("crystals", .3), H("needles_silk", .2), H("colour_banding", .2)],
            Source = Obsidian },
        new() { Species = "lazurite", Origin = "natural", Method = "natural", Clean = .1,
            Features = [H("crystals", .7), H("colour_banding", .2)],
            Source = Lapis },
        new() { Species = "lazurite", Origin = "treated", Method = "dyed or waxed", Clean = .2,
            Features = [H("crystals", .6), H("dye_in_fractures", .4)],
            Source = $"{Lapis}; dye gathered in cracks and calcite: from memory" },
        new() { Species = "sodalite", Origin = "natural", Method = "natural", Clean = .2,
            Features = [H("colour_banding", .5), H("crystals", .2)],
            Source = $"{Sodalite}; veins written as colour banding: judgement" },
        new() { Species = "calcite", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("colour_banding", .5), H("crystals", .1)],
            Source = "Smith, Gem-Stones (bitlit.ru p. 99: marble streaked with other substances)" },
        new() { Species = "calcite", Origin = "treated", Method = "dyed", Clean = .1,
            Features = [H("dye_in_fractures", .5), H("colour_banding", .4)],
            Source = "from memory (dye along grain boundaries and cracks)" },
        new() { Species = "malachite", Origin = "natural", Method = "natural", Clean = .05,
            Features = [H("colour_banding", .9)],
            Source = Malachite },
        new() { Species = "malachite", Origin = "treated", Method = "waxed or resin filled", Clean = .05,
            Features = [H("colour_banding", .9)],
            Source = $"{Malachite}; common practice: wax leaves nothing the vocabulary names" },
        new() { Species = "turquoise", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("crystals", .3), H("colour_banding", .3)],
            Source = $"{TurquoiseAndHowlite}; matrix written as crystals or banding: judgement" },
        new() { Species = "turquoise", Origin = "treated", Method = "stabilized or dyed", Clean = .3,
            Features = [H("crystals", .3), H("colour_banding", .3), H("dye_in_fractures", .25)],
            Source = TurquoiseAndHowlite },
        new() { Species = "pearl", Origin = "natural", Method = "natural", Clean = .8,
            Features = [H("colour_banding", .2)],
            Source = "from memory (a bead nucleus or a seeding cavity shows on X-radiographs, not under a loupe)" },
        new() { Species = "pearl", Origin = "cultured", Method = "beaded or tissue-nucleated", Clean = .8,
            Features = [H("colour_banding", .2)],
            Source = "from memory (a bead nucleus or a seeding cavity shows on X-radiographs, not under a loupe)" },
        new() { Species = "pearl", Origin = "treated", Method = "dyed or irradiated", Clean = .5,
            Features = [H("dye_in_fractures", .5)],
            Source = "from memory (dye gathered at the drill hole and in blemishes)" },
        new() { Species = "shell", Origin = "natural", Method = "natural", Clean = .4,
            Features = [H("colour_banding", .5)],
            Source = $"{Shell}; parallel growth written as banding: judgement" },
        new() { Species = "shell", Origin = "treated", Method = "dyed", Clean = .2,
            Features = [H("dye_in_fractures", .5), H("colour_banding", .4)],
            Source = $"{Shell}; dye: from memory" },
        new() { Species = "howlite", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("colour_banding", .5)],
            Source = $"{TurquoiseAndHowlite}; spiderweb veins written as banding: judgement" },
        new() { Species = "howlite", Origin = "treated", Method = "dyed", Clean = .1,
            Features = [H("dye_in_fractures", .6), H("colour_banding", .4)],
            Source = TurquoiseAndHowlite },
        new() { Species = "albite", Origin = "natural", Method = "natural", Clean = .4,
            Features = [H("healed_fractures", .2), H("crystals", .1), H("needles_silk", .1)],
            Source = "from memory" },
        new() { Species = "gypsum", Origin = "natural", Method = "natural", Clean = .4,
            Features = [H("colour_banding", .4)],
            Source = Alabaster },
        new() { Species = "gypsum", Origin = "treated", Method = "dyed", Clean = .2,
            Features = [H("dye_in_fractures", .4), H("colour_banding", .3)],
            Source = Alabaster },
        new() { Species = "aragonite", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("colour_banding", .5), H("crystals", .1)],
            Source = "gemdat.org aragonite (layered, banded massive material)" },
        new() { Species = "staurolite", Origin = "natural", Method = "natural", Clean = .2,
            Features = [H("crystals", .3), H("healed_fractures", .2)],
            Source = "from memory" },
        new() { Species = "dumortierite", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("needles_silk", .4), H("crystals", .2), H("healed_fractures", .2)],
            Source = "gemstonebuzz.com dumortierite (parallel fibrous inclusions, crystals, fingerprints)" },
        new() { Species = "sinhalite", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("healed_fractures", .2), H("crystals", .15), H("fluid_inclusions", .15)],
            Source = "from memory" },
        // Second pass of rivals: short rows, most from memory, so that every stone of the new rows may be looked at.
        new() { Species = "jet", Origin = "natural", Method = "natural", Clean = .7,
            Features = [H("crystals", .3)],
            Source = "review.clateway.com 'Jet (gemstone)' (Wikipedia text: may contain brassy pyrite inclusions); the share: judgement" },
        new() { Species = "bytownite", Origin = "natural", Method = "natural", Clean = .4,
            Features = [H("healed_fractures", .2), H("crystals", .15), H("needles_silk", .1)],
            Source = "from memory" },
        new() { Species = "smithsonite", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("colour_banding", .5)],
            Source = "gemdat.org smithsonite (botryoidal masses often slightly banded); the share: judgement" },
        new() { Species = "zincite", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("crystals", .2), H("healed_fractures", .2)],
            Source = "from memory" },
        new() { Species = "zincite", Origin = "synthetic", Method = "smelter by-product", Clean = .4,
            Features = [H("elongated_bubbles", .3), H("round_bubbles", .2)],
            Source = "gia.edu G&G Spring 2017 'Characteristics of gem-quality by-product synthetic zincite' (oval and tadpole-like inclusions of soot or captured gas); written as bubbles: judgement" },
        new() { Species = "scapolite", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("needles_silk", .4), H("fluid_inclusions", .2), H("crystals", .15)],
            Source = "wholesalecrystalsupplier.com scapolite (tubular and needle-like inclusions, solid and gas-liquid inclusions, negative crystals); shares: judgement" },
        new() { Species = "pyrite", Origin = "natural", Method = "natural", Clean = .9,
            Features = [H("crystals", .05)],
            Source = "from memory (an opaque metallic stone shows little under the loupe)" },
        new() { Species = "scheelite", Origin = "natural", Method = "natural", Clean = .4,
            Features = [H("healed_fractures", .2), H("crystals", .1)],
            Source = "from memory" },
        new() { Species = "tortoiseshell", Origin = "natural", Method = "natural", Clean = .2,
            Features = [H("colour_banding", .6)],
            Source = "jtv.com 'Tortoise shell' and gemdictionary.blogspot.com (mottled colour of spherical dots); mottling written as banding: judgement" },
        new() { Species = "gahnospinel", Origin = "natural", Method = "natural", Clean = .4,
            Features = [H("crystals", .3)],
            Source = "gia.edu G&G Spring 2019 Lab Notes 'Large faceted gahnospinel' (only tiny crystals); shares: judgement" },
        new() { Species = "pleonaste", Origin = "natural", Method = "natural", Clean = .7,
            Features = [H("crystals", .1)],
            Source = "from memory" },
        new() { Species = "magnesite", Origin = "natural", Method = "natural", Clean = .3,
            Features = [H("colour_banding", .5)],
            Source = "villa-parenzana.eu magnesite (white cabochons with grey, black or brownish matrix); matrix written as banding: judgement" },
        new() { Species = "magnesite", Origin = "treated", Method = "dyed", Clean = .1,
            Features = [H("dye_in_fractures", .6), H("colour_banding", .4)],
            Source = "gemdat.org magnesite (dyed to imitate lapis, turquoise, coral); dye in fractures: from memory" },
        new() { Species = "hematite", Origin = "natural", Method = "natural", Clean = .8,
            Features = [H("crystals", .05)],
            Source = "jtv.com hematite (reddish colour in surface fractures, not a word of the vocabulary); the row: from memory" },
    ];

    /// <summary>
    /// The rows that apply to a stone: those of its species and origin written for its hue, else those written for
    /// any hue. Empty when the table has no row for the pair (the run reports such pairs).
    /// </summary>
    public static IReadOnlyList<MagnificationHabit> For(string species, string origin, string hue)
    {
        var rows = All.Where(r => r.Species == species && r.Origin == origin).ToList();
        var forHue = rows.Where(r => r.Hue == hue).ToList();
        return forHue.Count > 0 ? forHue : [.. rows.Where(r => r.Hue is null)];
    }

    /// <summary>The chance that a stone of the species, origin and hue holds the feature, over the origin's methods.</summary>
    public static double ChanceOf(string species, string origin, string hue, string word)
    {
        var rows = For(species, origin, hue);
        double total = rows.Sum(r => r.Share);
        return total == 0 ? 0 : rows.Sum(r => r.Share * r.ChanceOf(word)) / total;
    }

    /// <summary>
    /// A feature points at the stone's origin when, held on its own, it gives that origin at least 80 % among the
    /// origins the property table gives the species: the origin's share times its chance of holding the feature, over
    /// the same sum for every origin (same hue). Derived from the two tables, never from the engine; docs/benchmark.md.
    /// </summary>
    public static bool IsDiagnostic(SpeciesProperties species, string origin, string hue, string word)
    {
        double Weight(Weighted o) => o.Weight * ChanceOf(species.Name, o.Word, hue, word);
        double total = species.Origins.Sum(Weight);
        double own = species.Origins.Where(o => o.Word == origin).Sum(Weight);
        return total > 0 && own / total >= DiagnosticShare;
    }

    /// <summary>The share of the species' origins a feature must give the stone's own origin to count as pointing at it.</summary>
    public const double DiagnosticShare = 0.8;
}
