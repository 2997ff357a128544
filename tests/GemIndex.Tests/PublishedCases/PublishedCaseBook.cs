using GemIndex.Core.Catalogue;

namespace GemIndex.Tests.PublishedCases;

/// <summary>
/// The published cases found for the benchmark (docs/benchmark.md, "Published cases": how they were searched for and
/// what was found). Each line's readings are copied from the source named beside it; none is adjusted to fit.
/// </summary>
public static class PublishedCaseBook
{
    private static readonly IReadOnlyList<string> Tourmaline = PublishedCase.TourmalineGroup;
    private static readonly IReadOnlyList<string> Glass = PublishedCase.GlassGroup;

    private const string ChurchBeryl = "A. H. Church, Handbook of Precious Stones (wikisource, page 103): specific gravities of beryls";
    private const string ChurchTourmaline = "A. H. Church, Handbook of Precious Stones (wikisource, page 92): 'determinations made with particular care'";
    private const string ChurchChrysoberyl = "A. H. Church, Handbook of Precious Stones (wikisource, page 106): specific gravities of chrysoberyls";
    private const string ChurchQuartz = "A. H. Church, Handbook of Precious Stones (wikisource, page 116): specific gravities of 'the purest forms of quartz'";

    public static IReadOnlyList<PublishedCase> Cases { get; } =
    [
        // Two or more bench tests: the published species must be among the first three.
        new("""{"id":"wade-1918-emerald","pleochroism":"dichroic","polariscope":"doubly_refractive","sg":2.70,"colour":"grass green"}""", ["beryl"], 3,
            "F. B. Wade, A Text-Book of Precious Stones (1918), Lesson XVI 'How to test an unknown gem', pp. 110–114 (fliphtml5.com copy, p. 131; jennyjade.com paraphrase): "
            + "a green ring stone, dichroic in the dichroscope, refraction double, SG 2.70 (mean of two specific-gravity-bottle determinations); identified as emerald. "
            + "'Refraction double' is written as the polariscope reaction doubly_refractive, the batch format's word for that observation."),
        new("""{"id":"wade-1918-red-spinel","pleochroism":"none","polariscope":"singly_refractive","colour":"slightly yellowish red"}""", ["spinel"], 2,
            "F. B. Wade, A Text-Book of Precious Stones (1918), Lesson XVI, 'Testing Other Stones' (bitlit.ru copy, "
            + "bitlit.ru/page/en/frank-bertram-wade/a-text-book-of-precious-stones-for-jewelers-and-the-gem-loving-public/37): a pear-shaped brilliant of a "
            + "'peculiar, slightly yellowish, red color', no dichroism in the dichroscope, singly refracting by the sunlight-card test (written as the "
            + "polariscope reaction, as for Wade's emerald); it barely scratched topaz and was attacked by sapphire (hardness: no field, a destructive test); "
            + "'judged to be a red spinel'."),
        new("""{"id":"gg-ln-coated-cats-eye-gypsum","refractometer":{"method":"spot","spot":1.56},"uv_long":"strong","uv_short":"weak","colour":"saturated blue","magnification":{"present":["chatoyancy","coating_wear"]}}""", ["gypsum"], 3,
            "Gems & Gemology, Lab Notes, 'Coated Cat's-Eye Gypsum' (Carlsbad; read as reprinted at lj24magazine.com/article/article_000337/1.aspx, "
            + "'Courtesy of GIA (c) 2012'; the issue is not named there): 30.45 ct translucent saturated blue oval cabochon with a sharp eye, spot RI 1.56, "
            + "'moderately strong' blue LW (written strong, the modifier dropped as elsewhere), weak blue SW; a blue coating on the top with decolorized areas at "
            + "surface damage (coating_wear) and a delaminating colourless coating on the base; Raman (not a bench test) gave polymer resin for the coatings and "
            + "gypsum for the substrate. The spot RI is copied as published: it lies above gypsum's index and is likely the coating's.")
        { Origins = [OriginClass.Treated] },
        new("""{"id":"gg-2022-ln-glass-rough-sapphire-imitation","sg":2.48,"polariscope":"anomalous","colour":"blue","magnification":{"present":["round_bubbles"]}}""", Glass, 2,
            "Gems & Gemology, Summer 2022, Lab Notes (N. Anjomani, Carlsbad), as reported by National Jeweler "
            + "(nationaljeweler.com/articles/11241-gia-finds-lab-growns-simulant-in-parcel-of-natural-sapphires): of four rough blue stones submitted as natural "
            + "sapphires, the 48.63 ct one, partially fashioned: hydrostatic SG 2.48, weak snake-pattern bands in the polariscope (written anomalous), gas "
            + "bubbles (shape not stated: round_bubbles, as for the glass bangle), flow marks and conchoidal fractures (no vocabulary words); a glass "
            + "imitation, confirmed by infrared (not a bench test).")
        { Origins = [OriginClass.Imitation] },
        new("""{"id":"mllopis-24-1821-ruby","refractometer":{"method":"facet","readings":[{"low":1.762,"high":1.770}]},"sg":4.02,"absorption_nm":[692,694],"colour":"red-orange"}""", ["corundum"], 3,
            "gemologiamllopis.com certificate 24-1821-CO-PR-8451-16 (2016): 4.82 ct ruby, glass-filled; refractive indices 1.770–1.762, birefringence 0.008, optic sign −, density 4.02, "
            + "doublet at 694 and 692 nm; colour red-orange (OR 7/3). The optic sign has no field in the batch format and is left out."),


        // Gems & Gemology (GIA) Lab Notes, Gem News International and other laboratories' notes, read in the search
        // tool's stored pages (docs/benchmark.md, "Published cases"; every page looked at is in the ledger there).
        new("""{"id":"gg-2015-gni-synthetic-star-sapphire","refractometer":{"method":"spot","spot":1.76},"sg":4.00,"colour":"blue","magnification":{"present":["needles_silk","round_bubbles","asterism"]}}""", ["corundum"], 2,
            "Gems & Gemology, Summer 2015 (Vol. 51, No. 2), Gem News International, 'Unusual Combination of Inclusions in Synthetic Star Sapphire' "
            + "(gia.edu/gems-gemology/summer-2015-gemnews-unusual-combination-inclusions-synthetic-star-sapphire): 8.975 ct blue star cabochon, spot RI 1.76, "
            + "hydrostatic SG 4.00; three-directional needles and a hexagonal boundary of gas bubbles; gas bubbles and chalky blue SWUV confirmed synthetic. "
            + "The SWUV reaction has no strength word and is left out; the DiamondView result is not a bench test.")
        { Origins = [OriginClass.Synthetic] },
        new("""{"id":"gg-2017-gni-green-synthetic-sapphire","refractometer":{"method":"facet","readings":[{"low":1.763,"high":1.768}]},"sg":3.94,"uv_long":"inert","uv_short":"inert","pleochroism":"dichroic","colour":"green","magnification":{"present":["round_bubbles"]}}""", ["corundum"], 5,
            "Gems & Gemology, Fall 2017 (Vol. 53, No. 3), Gem News International, 'Unusual Inclusions in Green Synthetic Sapphire' "
            + "(gia.edu/gems-gemology/fall-2017-gemnews-green-synthetic-sapphire): 5.00 ct green step cut, RI 1.763–1.768, birefringence 0.005, uniaxial negative, "
            + "hydrostatic SG 3.94, inert to LW and SW, pleochroism moderate green to yellowish green (two colours: dichroic); abundant gas bubbles, some along "
            + "curved lines (Verneuil or Czochralski). Optic sign has no field; EDXRF is not a bench test.")
        { Origins = [OriginClass.Synthetic] },
        new("""{"id":"gg-2019-ln-flux-pink-synthetic-sapphire","refractometer":{"method":"facet","readings":[{"low":1.760,"high":1.770}]},"uv_long":"strong","uv_short":"strong","colour":"pink","magnification":{"present":["metal_platelets","flux_residue"]}}""", ["corundum"], 3,
            "Gems & Gemology, Summer 2019, Lab Notes, 'Exsolved Particles with Natural Appearance Within Flux-Grown Pink Synthetic Sapphire' "
            + "(gia.edu/gems-gemology/summer-2019-labnotes-natural-appearance-flux-grown-synthetic-sapphire): mounted, RI 1.760–1.770, strong red fluorescence "
            + "to LW and SW; a reflective platinum platelet and fingerprints of exsolved flux. The hand-spectroscope 'typical pink sapphire spectrum' names no "
            + "line and is left out; LA-ICP-MS is not a bench test.")
        { Origins = [OriginClass.Synthetic] },
        new("""{"id":"gg-2014-ln-flux-synthetic-ruby-hydrothermal-seed","refractometer":{"method":"facet","readings":[{"low":1.762,"high":1.770}]},"sg":4.01,"pleochroism":"dichroic","uv_long":"strong","uv_short":"weak","colour":"red","magnification":{"present":["chevron_growth","metal_platelets","flux_residue"]}}""", ["corundum"], 5,
            "Gems & Gemology, Summer 2014 (Vol. 50, No. 2), Lab Notes, 'Flux-Grown Synthetic Ruby with Hydrothermal Synthetic Seed Crystal' (Sun and DeGhionno; "
            + "read on a copy at truyenhinhcapsongthu.net): 1.18 ct red step cut, RI 1.762–1.770, birefringence 0.008, uniaxial negative, pleochroism orangy red "
            + "to purplish red, SG 4.01, strong red LW, weak red SW, typical ruby spectrum (no line named, left out); zigzag growth of a hydrothermal synthetic, "
            + "hexagonal platinum platelets and whitish flux. LA-ICP-MS is not a bench test.")
        { Origins = [OriginClass.Synthetic] },
        new("""{"id":"gg-2021-ln-lead-glass-filled-synthetic-ruby","refractometer":{"method":"facet","readings":[{"low":1.761,"high":1.769}]},"sg":4.01,"uv_long":"strong","uv_short":"moderate","magnification":{"present":["flash_effect","flattened_bubbles"],"absent":["curved_striae"]}}""", ["corundum"], 4,
            "Gems & Gemology, Spring 2021, Lab Notes, 'Lead Glass–Filled Laboratory-Grown Ruby' (gia.edu/gems-gemology/spring-2021-labnotes-lead-glass-filled-laboratory-grown-ruby): "
            + "3.53 ct, RI 1.761–1.769, birefringence 0.008, SG 4.01, uniaxial, ruby spectrum (no line named, left out), strong red LW, 'medium' chalky red SW "
            + "(written moderate); a blue and orange flash effect and flattened gas bubbles proved lead-glass filling. No inclusion showed natural or synthetic "
            + "growth: the diagnostic curved striae were looked for and not seen (the chalky SWUV and the filled fractures hid them), and the laboratory-grown "
            + "origin came from the DiamondView, which is not a bench test, so magnification decided the treatment only.")
        { Origins = [OriginClass.Synthetic, OriginClass.Treated] },
        new("""{"id":"gg-2000-uvite-colour-change","refractometer":{"method":"facet","readings":[{"low":1.620,"high":1.640}]},"sg":3.06,"uv_long":"inert","uv_short":"weak","pleochroism":"dichroic","absorption_nm":[650,670]}""", Tourmaline, 6,
            "Gems & Gemology, Fall 2000 (yumpu.com copy 'Fall 2000 Gems & Gemology - Gemfrance', page 84), an item on a colour-shifting green tourmaline: "
            + "pleochroic dark yellowish green and brown-orange, uniaxial negative, RI 1.620–1.640, birefringence 0.020, hydrostatic SG 3.06, inert LW, very chalky "
            + "weak greenish yellow SW, hand spectroscope 400–500 nm cut-off, weak band 610–630 nm and weak lines at 650 and 670 nm; 'consistent with uvite'. "
            + "The cut-off and the band are not lines and are left out; the Chelsea filter has no field; EDXRF is not a bench test. The face-up colour is not stated."),
        new("""{"id":"gg-2017-ln-synthetic-moissanite-rough","refractometer":{"method":"facet","over_limit":true},"sg":3.23,"uv_long":"weak","uv_short":"weak","pleochroism":"dichroic","colour":"very light green"}""", ["moissanite"], 5,
            "Gems & Gemology, Winter 2017 (Vol. 53, No. 4), Lab Notes, 'Synthetic Moissanite Imitating Rough Diamond' "
            + "(gia.edu/gems-gemology/winter-2017-labnotes-synthetic-moissanite-imitating-rough-diamond): 9.71 ct very light green crystal, dichroism bluish green / "
            + "colourless in plane-polarized light, over-the-limit RI, hydrostatic SG 3.23, very weak yellow fluorescence LW and SW (written weak), uniaxial. "
            + "FTIR and Raman are not bench tests."),
        new("""{"id":"gg-2014-ln-spinel-inclusion-in-spinel","refractometer":{"method":"facet","readings":[{"low":1.719}]},"sg":3.59,"uv_long":"weak","uv_short":"inert","absorption_nm":[670,680],"colour":"dark pink-purple"}""", ["spinel"], 5,
            "Gems & Gemology, Winter 2014, Lab Notes, 'Spinel Inclusion in Spinel' (gia.edu/gems-gemology/winter-2014-labnotes-spinel-inclusion-in-spinel): "
            + "26.73 ct dark pink-purple oval, RI 1.719, hydrostatic SG 3.59, very weak red LW (written weak), inert SW, thin bands near 680 nm and fine lines near "
            + "670 nm in a hand spectroscope; 'consistent with spinel'."),
        new("""{"id":"austgem-2007-taaffeite","refractometer":{"method":"facet","readings":[{"low":1.713,"high":1.720}],"spot":1.71},"sg":3.61,"polariscope":"doubly_refractive","colour":"mauve"}""", ["taaffeite"], 3,
            "The Australian Gemmologist, Vol. 23, No. 2 (April–June 2007), 'An Interesting Large Mauve Stone' (read as quoted at studiopjj.blogspot.com/2007/05/interesting-large-mauve-stone.html): "
            + "5.20 ct mauve stone among spinels, spot RI 1.71, SG 3.61, doubly refractive in the polariscope with a uniaxial figure, RI 1.713–1.720, uniaxial "
            + "negative; identified as taaffeite. 'No reaction to ultraviolet light' names no wavelength and is left out."),
        new("""{"id":"gg-2019-ln-gahnospinel","refractometer":{"method":"facet","readings":[{"low":1.754}]},"sg":4.10,"colour":"dark greenish blue"}""", ["spinel", "gahnospinel"], 2,
            "Gems & Gemology, Spring 2019, Lab Notes, 'Large Faceted Gahnospinel' (gia.edu/gems-gemology/spring-2019-labnotes-large-faceted-gahnospinel): "
            + "11.34 ct dark greenish blue oval, RI 1.754, SG 4.10, 'not typical for spinel'; gahnospinel, a zinc-rich member of the spinel series (ICP-MS, not a "
            + "bench test, showed the zinc). Scored as the catalogue's spinel or gahnospinel species (the source names both)."),
        new("""{"id":"gg-2016-ln-emerald-emerald-doublet","refractometer":{"method":"facet","readings":[{"low":1.572,"high":1.580}]},"sg":2.71,"colour":"green","magnification":{"present":["join_plane","cement_bubbles","flash_effect","fluid_inclusions"]}}""", ["beryl"], 2,
            "Gems & Gemology, Spring 2016, Lab Notes, 'Emerald/Emerald Doublet' (read at prachursinghal.blogspot.com/2016/05/emeraldemerald-doublet-figure-1.html and "
            + "fliphtml5.com/qovqs/fkdy/Spring-2016-Gems-Gemology/74): 1.81 ct green step cut, SG 2.71, RI 1.572–1.580 on the crown and 1.570–1.578 on the "
            + "pavilion (only the crown's, the table reading, is entered), chromium spectrum (no line named); a flat separation plane with flattened gas bubbles, "
            + "flash effect in filled fractures of both parts, jagged three-phase inclusions. Both parts are beryl: the species is beryl, assembled.")
        { Origins = [OriginClass.Composite, OriginClass.Treated] },
        new("""{"id":"gg-2014-gni-synthetic-emerald-topaz-doublet","uv_long":"inert","colour":"green","magnification":{"present":["join_plane","cement_bubbles","healed_fractures"]}}""", ["beryl", "topaz"], 1,
            "Gems & Gemology, Winter 2014, Gem News International, 'An Unusual Doublet Set in Fine Jewelry' (gia.edu/gems-gemology/winter-2014-gemnews-unusual-doublet-set-in-fine-jewelry): "
            + "green oval in a closed setting, RI impossible to measure, inert to LW; crown inert and pavilion light blue to SW (two reactions: left out); a "
            + "separation line at the girdle with flat bubbles in cement, natural fingerprint cavities in the pavilion; hydrothermal synthetic emerald on topaz "
            + "(Raman, not a bench test, named the parts).")
        { Origins = [OriginClass.Composite] },
        new("""{"id":"gg-2010-ln-synthetic-spinel-synthetic-ruby-doublet","refractometer":{"method":"facet","readings":[{"low":1.725}]},"colour":"red","magnification":{"present":["join_plane","cement_bubbles","two_lustres","curved_striae","round_bubbles"]}}""", ["spinel", "corundum"], 1,
            "Gems & Gemology, Winter 2010 (Vol. 46, No. 4), Lab Notes, 'Synthetic Spinel and Synthetic Ruby Doublet' (Carlsbad; listed in the issue's contents at scribd 'WN10'), as quoted at linellelynch.com (Gem FAQs, October 2010): 4.85 ct red, RI 1.725 "
            + "on the crown and 1.760–1.770 on the pavilion (only the crown's is entered), a glue layer with planar gas bubbles, a separation plane, a different "
            + "lustre above and below, curved striae in the crown, gas bubbles and curved striae in the pavilion. Crown and pavilion reacted differently to UV "
            + "(left out).")
        { Origins = [OriginClass.Composite] },
        new("""{"id":"gg-2016-ln-synthetic-spinel-sapphire-doublet","refractometer":{"method":"facet","readings":[{"low":1.728}]},"colour":"greenish yellow","magnification":{"present":["join_plane","cement_bubbles","curved_striae"]}}""", ["spinel", "corundum"], 1,
            "Gems & Gemology, Winter 2016 (Vol. 52, No. 4), Lab Notes, 'Synthetic Sapphire and Synthetic Spinel Doublets' "
            + "(gia.edu/gems-gemology/winter-2016-labnotes-synthetic-sapphire-synthetic-spinel-doublets): two greenish yellow doublets with the same published "
            + "readings (one case): crown RI 1.728 with whitish chalky SW (no strength word, left out), pavilion 1.760–1.768 and inert (not entered); a separation "
            + "plane with flattened gas bubbles in colourless cement, faint yellow curved colour banding in the pavilion. PL and EDXRF are not bench tests.")
        { Origins = [OriginClass.Composite] },
        new("""{"id":"gaaj-2008-synthetic-fire-opal","refractometer":{"method":"facet","readings":[{"low":1.35}]},"sg":1.57,"polariscope":"anomalous","colour":"orange"}""", ["opal"], 3,
            "GAAJ-Zenhokyo Laboratory, 'Laboratory of the month' 2008.5, 'Synthetic opal called MexiFire and PeruBlu' (grjapan.ddo.jp/gaaj_report/2008/2008_05en.html): "
            + "faceted orange stone without play-of-colour, RI 1.35 and hydrostatic SG 1.57, anomalous extinction between crossed polars; identified as synthetic opal. "
            + "Copied as published, though far below natural opal's values."),
        new("""{"id":"gaaj-2008-synthetic-blue-opal","refractometer":{"method":"facet","readings":[{"low":1.39}]},"sg":1.75,"polariscope":"anomalous","colour":"blue"}""", ["opal"], 3,
            "GAAJ-Zenhokyo Laboratory, 'Laboratory of the month' 2008.5 (as above): faceted saturated blue stone, RI 1.39 and hydrostatic SG 1.75, anomalous "
            + "extinction between crossed polars; identified as synthetic opal."),
        new("""{"id":"gg-ln-epidote-needles","pleochroism":"dichroic","absorption_nm":[455,470],"colour":"very dark green"}""", ["epidote"], 2,
            "Gems & Gemology, Gem Trade Lab Notes (editor C. W. Fryer), 'Needle-like Inclusions in Epidote' (copy at hobbydocbox.com, "
            + "'...a-new-type-of-opal-assemblage-magnified-10-x'; issue not named on the page): about 5 ct very dark green, birefringence 0.040 (the RI values are "
            + "lost in that copy, so no refractometer reading is entered), distinct pleochroism green and olive brown, broad band centred at 455 nm, faint "
            + "line at 470 nm, cut-off from 430 nm (left out); 'proved that the stone is epidote'."),

        new("""{"id":"gg-2017-ln-cats-eye-kornerupine","refractometer":{"method":"spot","spot":1.67},"sg":3.32,"colour":"yellowish green","magnification":{"present":["chatoyancy"]}}""", ["kornerupine"], 2,
            "Gems & Gemology, Summer 2017 (Vol. 53, No. 2), Lab Notes, 'Cat's-Eye Kornerupine' (gia.edu/gems-gemology/summer-2017-labnotes-cats-eye-kornerupine): "
            + "1.44 ct dark yellowish green cabochon, spot RI 1.67, hydrostatic SG 3.32, 'identified as kornerupine'; Raman (not a bench test) confirmed it. "
            + "The cat's-eye is recorded as chatoyancy."),
        new("""{"id":"jgem-2019-star-enstatite","refractometer":{"method":"facet","readings":[{"low":1.660,"high":1.670}]},"sg":3.25,"pleochroism":"trichroic","uv_long":"inert","uv_short":"inert","absorption_nm":[505,545],"colour":"light brown","magnification":{"present":["asterism"]}}""", ["enstatite"], 6,
            "The Journal of Gemmology, 36(8), 2019, Gem Notes, a six-rayed star enstatite cabochon from Madagascar (fliphtml5.com/bfyz/utyf/..._Volume_36_Issue_8_(Winter_2019)/15): "
            + "1.24 ct, colour light brown, pleochroism strong orangey brown, greyish green and grey (three colours: trichroic), RI 1.660–1.670, birefringence 0.010, "
            + "biaxial positive, hydrostatic SG 3.25, inert to LW and SW, hand spectroscope sharp bands at about 505 and 545 nm; 'consistent with enstatite'. "
            + "Magnetism and the Chelsea filter have no field; infrared reflectance is not a bench test."),
        new("""{"id":"jck-synthetic-forsterite-tanzanite-imitation","refractometer":{"method":"facet","readings":[{"low":1.635,"high":1.647}]},"pleochroism":"dichroic"}""", ["forsterite"], 2,
            "JCK magazine, 'Identifying Forsterite From Tanzanite' (jckonline.com/magazine-article/identifying-forsterite-from-tanzanite/): a 4.575 ct oval cushion "
            + "bought as tanzanite; strong pleochroism, purple and blue in a calcite dichroscope (entered as dichroic, the two colours the dichroscope showed), RI "
            + "1.635–1.647; a three-window colour filter (no field) then showed synthetic forsterite. The face-up colour is given only as 'resembled tanzanite' and "
            + "is left out."),
        new("""{"id":"gg-2020-gni-glass-imitating-gem-silica","refractometer":{"method":"spot","spot":1.48},"uv_long":"inert","uv_short":"weak","colour":"greenish blue","magnification":{"present":["round_bubbles"]}}""", Glass, 3,
            "Gems & Gemology, Summer 2020 (Vol. 56, No. 2), Gem News International, 'Greenish Blue Glass Imitating Gem Silica' "
            + "(gia.edu/gems-gemology/summer-2020-gemnews-greenish-blue-glass-imitating-gem-silica): three cabochons sold as gem silica, uniform greenish blue, spot RI "
            + "1.48, inert LW, weak greenish white SW, numerous gas bubbles of various sizes; identified as glass. The SG (2.48 to about 2.57) is a range over the "
            + "three stones, not one stone's reading, and is left out; the three are one case.")
        { Origins = [OriginClass.Imitation] },
        new("""{"id":"jgem-2022-topaz-rough-diamond-imitation","refractometer":{"method":"spot","spot":1.61},"sg":3.56,"polariscope":"doubly_refractive","uv_long":"inert","uv_short":"inert"}""", ["topaz"], 5,
            "The Journal of Gemmology, 38(4), 2022, Gem Notes, 'A Convincing Rough Diamond Imitation Manufactured from Topaz' (GCS Laboratory, London; "
            + "fliphtml5.com/bfyz/enpd/The_Journal_of_Gemmology_Volume_38_issue_4/24): 20.30 ct purported diamond crystal, anisotropic in the polariscope with a partial "
            + "biaxial figure, inert to LW and SW, spot RI about 1.61, hydrostatic SG 3.56, 'consistent with topaz'. Thermal and dual diamond testers said 'not "
            + "diamond' (no field for a dual tester); UV-Vis-NIR, FTIR, Raman and EDXRF are not bench tests. Colour not stated."),
        new("""{"id":"gg-2019-ln-glass-bangle-white","refractometer":{"method":"spot","spot":1.500},"colour":"white","magnification":{"present":["elongated_bubbles","round_bubbles"]}}""", Glass, 1,
            "Gems & Gemology, Spring 2019 (Vol. 55, No. 1), Lab Notes, 'Glass Bangles' (gia.edu/gems-gemology/spring-2019-labnotes-glass-bangles): 343.94 ct "
            + "translucent white bangle, RI 'about 1.500' (a carved curved surface: entered as a spot reading), gas bubbles of various sizes and an elongated "
            + "bubble below the surface; a manufactured glass.")
        { Origins = [OriginClass.Imitation] },
        new("""{"id":"gg-2019-ln-glass-bangle-mottled","refractometer":{"method":"spot","spot":1.610},"colour":"light purplish gray and green","magnification":{"present":["round_bubbles"]}}""", Glass, 1,
            "Gems & Gemology, Spring 2019, Lab Notes, 'Glass Bangles' (as above): 355.52 ct mottled light purplish gray and green bangle resembling jadeite, RI 1.610 "
            + "(entered as a spot reading), gas bubbles throughout and in strings; a manufactured glass. The bubbles' shape is not stated: recorded as round_bubbles, "
            + "the vocabulary's word for gas bubbles that are not elongated.")
        { Origins = [OriginClass.Imitation] },

        new("""{"id":"gg-2014-gni-aquamarine-strong-dichroism","refractometer":{"method":"facet","readings":[{"low":1.582,"high":1.590}]},"sg":2.71,"pleochroism":"dichroic","colour":"grayish blue","magnification":{"present":["crystals","healed_fractures"]}}""", ["beryl"], 3,
            "Gems & Gemology, Fall 2014 (Vol. 50, No. 3), Gem News International, 'Aquamarine with Unusually Strong Dichroism' (Gem Testing Laboratory, Jaipur; "
            + "gia.edu/gems-gemology/fall-2014-gemnews-aquamarine-dichroism): 4.49 ct grayish blue oval, RI 1.582–1.590, birefringence 0.008, uniaxial negative, "
            + "hydrostatic SG 2.71, dichroism deep blue and pale bluish green; natural origin established by planes of dendritic (ilmenite) platelets and liquid "
            + "fingerprints. FTIR, Raman and UV-Vis-NIR are not bench tests.")
        { Origins = [OriginClass.Natural] },

        new("""{"id":"gg-2018-ln-cats-eye-demantoid","refractometer":{"method":"spot","over_limit":true},"sg":3.84,"colour":"green","magnification":{"present":["needles_silk","chatoyancy"]}}""", ["andradite"], 2,
            "Gems & Gemology, Spring 2018 (Vol. 54, No. 1), Lab Notes, 'Cat's-Eye Demantoid and Brown Andradite with Horsetail Inclusions' (Tokyo; "
            + "gia.edu/gems-gemology/spring-2018-labnotes-cats-eye-demantoid-and-brown-andradite-with-horsetail-inclusions): 2.51 ct green cabochon, RI over the "
            + "limits of the refractometer, hydrostatic SG 3.84; horsetail inclusions (radiating fibres), 'regarded as diagnostic for natural demantoid'. Raman "
            + "(not a bench test) matched andradite. Horsetail fibres are recorded as needles_silk, the vocabulary's word for fine fibres and needles.")
        { Origins = [OriginClass.Natural] },
        new("""{"id":"gg-2018-ln-brown-andradite-horsetail","refractometer":{"method":"facet","over_limit":true},"sg":3.84,"colour":"orangy brown","magnification":{"present":["needles_silk"]}}""", ["andradite"], 2,
            "Gems & Gemology, Spring 2018, Lab Notes (as above): 2.47 ct orangy brown round brilliant, RI over the limits, hydrostatic SG 3.84, radiating horsetail "
            + "inclusions; andradite (Raman). Recorded as for the demantoid above.")
        { Origins = [OriginClass.Natural] },
        new("""{"id":"gg-bosshart-cobalt-glass-lapis-imitation","refractometer":{"method":"spot","spot":1.508},"sg":2.453,"colour":"violet-blue"}""", Glass, 2,
            "Gems & Gemology, Notes and New Techniques, G. Bosshart, 'Cobalt Glass as a Lapis Lazuli Imitation' (SSEF; docslib.org/doc/1042806, issue not shown in "
            + "the stored opening): a necklace of opaque violet-blue 8 mm beads offered as 'blue quartz from India', RI 1.508 (round beads: entered as a spot "
            + "reading), SG 2.453; a nontransparent cobalt glass with white cristobalite crystallites. The absorption spectrum was recorded with a "
            + "spectrophotometer, not a hand spectroscope, and is not entered."),
        new("""{"id":"gsi-synthetic-rock-crystal-egg","uv_long":"inert","uv_short":"inert","colour":"colorless"}""", ["quartz"], 2,
            "Gemological Science International (GSI, Jaipur) Lab Note, 'Massive egg-shaped synthetic rock crystal quartz' (M. B. Vyas and G. Khandelwal; read at "
            + "usa-jewelry-shop.blogspot.com/2022/11/gsi-lab-note-massive-egg-shaped.html, also southernjewelrynews.com): 1588 g colourless spheroid, inert to LW and "
            + "SW; a seed plate and breadcrumb-like particles (no vocabulary word for either) showed it synthetic, FTIR (not a bench test) confirmed. No RI or SG "
            + "was published."),

        new("""{"id":"gg-2018-gni-zambian-emerald-three-direction-inclusions","refractometer":{"method":"spot","spot":1.58},"sg":2.80,"polariscope":"doubly_refractive","colour":"vivid green"}""", ["beryl"], 3,
            "Gems & Gemology, Winter 2018, Gem News International, 'Natural emerald with inclusions along three directions' (Guild Gem Laboratories; read at "
            + "scribd.com/document/620844704/GG-WN18-Gem-News-International): 10.48 ct sugarloaf cabochon of vivid highly saturated green, RI approximately 1.58 "
            + "(a cabochon: entered as a spot reading), SG approximately 2.80, interference colours in the polariscope (written doubly refractive); FTIR (not a "
            + "bench test) confirmed natural emerald, EDXRF pointed to Zambia."),

        new("""{"id":"gg-2017-ln-sapphire-synthetic-ruby-overgrowth-1","refractometer":{"method":"facet","readings":[{"low":1.778,"high":1.788}]},"colour":"red","magnification":{"present":["surface_colour","flux_residue","needles_silk","crystals"]}}""", ["corundum"], 1,
            "Gems & Gemology, Winter 2017 (Vol. 53, No. 4), Lab Notes, 'Two Unusual Natural Sapphires with Synthetic Ruby Overgrowth' (New York; "
            + "gia.edu/gems-gemology/winter-2017-labnotes-two-unusual-natural-sapphires-synthetic-ruby-overgrowth): red oval, RI 1.778–1.788; red colour at the facet "
            + "junctions suggested chromium diffusion, but magnification showed a 0.3 mm synthetic overgrowth with shallow flux fingerprints on a near-colourless "
            + "natural core with intact silk and heat-altered crystals. Origin: natural core, synthetic overgrowth.")
        { Origins = [OriginClass.Natural, OriginClass.Synthetic] },
        new("""{"id":"gg-2017-ln-sapphire-synthetic-ruby-overgrowth-2","refractometer":{"method":"facet","readings":[{"low":1.776,"high":1.787}]},"colour":"red","magnification":{"present":["surface_colour","flux_residue","needles_silk","crystals"]}}""", ["corundum"], 1,
            "Gems & Gemology, Winter 2017, Lab Notes (as above): the second red oval, RI 1.776–1.787; the features are described for the two stones together and "
            + "are recorded as for the first.")
        { Origins = [OriginClass.Natural, OriginClass.Synthetic] },

        // One bench test: reported, not required (a single SG cannot separate the species of a general catalogue).
        new("""{"id":"wade-1918-iolite","pleochroism":"dichroic","colour":"bluish"}""", ["cordierite"], 1,
            "F. B. Wade (1918), Lesson XVI (as wade-1918-red-spinel): 'the large bluish stone ... proved to be iolite, sometimes called cordierite'; marked "
            + "dichroism, smoky blue in one direction and yellowish white in another."),
        new("""{"id":"wade-1918-small-rubies","pleochroism":"dichroic","colour":"red","magnification":{"present":["needles_silk"],"absent":["curved_striae"]}}""", ["corundum"], 1,
            "F. B. Wade (1918), Lesson XVI (as wade-1918-red-spinel): 'the small red stones' (one case for the set): abundant silk, its fibres 'straight and "
            + "parallel, not curved and parallel as in synthetic ruby' (needles_silk seen, curved striae looked for and not seen), tiny bubbles of angular shape "
            + "(no vocabulary word), dichroism; they scratched topaz (no field); 'decided that they at least were genuine'.")
        { Origins = [OriginClass.Natural] },
        new("""{"id":"bauer-quartz","sg":2.66}""", ["quartz"], 1,
            "M. Bauer, Precious Stones (trans. L. J. Spencer), p. 19 (afripics.com page copy): worked hydrostatic example, SG 2.66, 'the stone may therefore be identified as quartz'"),
        new("""{"id":"church-emerald-muzo-1","sg":2.710}""", ["beryl"], 1, ChurchBeryl + ": emerald from Muzo 2.710"),
        new("""{"id":"church-emerald-muzo-2","sg":2.704}""", ["beryl"], 1, ChurchBeryl + ": emerald from Muzo 2.704"),
        new("""{"id":"church-aquamarine-brazil","sg":2.702}""", ["beryl"], 1, ChurchBeryl + ": aquamarine (Brazil) 2.702"),
        new("""{"id":"church-blue-beryl","sg":2.701,"colour":"blue"}""", ["beryl"], 1, ChurchBeryl + ": blue beryl 2.701"),
        new("""{"id":"church-yellow-beryl","sg":2.697,"colour":"yellow"}""", ["beryl"], 1, ChurchBeryl + ": yellow beryl 2.697"),
        new("""{"id":"church-brown-yellow-beryl","sg":2.690,"colour":"brown yellow"}""", ["beryl"], 1, ChurchBeryl + ": brown yellow beryl 2.690"),
        new("""{"id":"church-tourmaline-almandine-coloured","sg":3.009,"colour":"almandine coloured"}""", Tourmaline, 1, ChurchTourmaline + ": almandine coloured 3.009"),
        new("""{"id":"church-tourmaline-rose-pink","sg":3.044,"colour":"rich rose pink"}""", Tourmaline, 1, ChurchTourmaline + ": rich rose pink 3.044"),
        new("""{"id":"church-tourmaline-ceylon","sg":3.082,"colour":"orange-brown"}""", Tourmaline, 1, ChurchTourmaline + ": orange-brown, from Ceylon 3.082"),
        new("""{"id":"church-tourmaline-lemon","sg":3.106,"colour":"lemon yellow"}""", Tourmaline, 1, ChurchTourmaline + ": lemon yellow 3.106"),
        new("""{"id":"church-tourmaline-brazil-1","sg":3.109,"colour":"green"}""", Tourmaline, 1, ChurchTourmaline + ": green, from Brazil 3.109"),
        new("""{"id":"church-tourmaline-devon","sg":3.120,"colour":"black"}""", Tourmaline, 1, ChurchTourmaline + ": black, Bovey Tracey, Devon 3.120"),
        new("""{"id":"church-tourmaline-brazil-2","sg":3.154,"colour":"green"}""", Tourmaline, 1, ChurchTourmaline + ": green, from Brazil 3.154"),
        new("""{"id":"church-chrysoberyl-golden","sg":3.84,"colour":"golden yellow"}""", ["chrysoberyl"], 1, ChurchChrysoberyl + ": golden yellow 3.84"),
        new("""{"id":"church-chrysoberyl-greenish","sg":3.76,"colour":"greenish yellow"}""", ["chrysoberyl"], 1, ChurchChrysoberyl + ": greenish yellow 3.76"),
        new("""{"id":"church-chrysoberyl-brownish","sg":3.734,"colour":"brownish yellow"}""", ["chrysoberyl"], 1, ChurchChrysoberyl + ": brownish yellow 3.734"),
        new("""{"id":"church-alexandrite","sg":3.644}""", ["chrysoberyl"], 1, ChurchChrysoberyl + ": alexandrite 3.644"),
        new("""{"id":"church-milky-quartz","sg":2.642,"colour":"milky"}""", ["quartz"], 1, ChurchQuartz + ": milky quartz 2.642"),
        new("""{"id":"church-rock-crystal","sg":2.650}""", ["quartz"], 1, ChurchQuartz + ": pure rock crystal 2.650"),
        new("""{"id":"church-cairngorm","sg":2.656,"colour":"brown"}""", ["quartz"], 1, ChurchQuartz + ": brown cairngorm 2.656"),
        new("""{"id":"church-amethyst","sg":2.659}""", ["quartz"], 1, ChurchQuartz + ": amethyst 2.659"),
        new("""{"id":"church-very-dark-ditto","sg":2.662}""", ["quartz"], 1, ChurchQuartz + ": 'very dark ditto' 2.662 (the table's ditto is left unresolved, so no colour is given)"),
        new("""{"id":"church-yellow-corundum","sg":4.006,"colour":"yellow"}""", ["corundum"], 1,
            "A. H. Church, Handbook of Precious Stones (wikisource, page 80): 'A fine yellow stone without flaws gave 4.006'"),
    ];
}
