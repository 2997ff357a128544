namespace GemIndex.Bench.Independent;

internal static partial class PropertyTable
{
    // Pages cited by more than one row of this family (a const: partial-class static initialisation order is undefined).
    private const string OrganicIvoryPages = "gemdat.org ivory (Schumann, Gemstones of the World 2001: RI 1.535–1.570, no birefringence; Lazzarelli, Blue Chart 2010: SG 1.70–2.00, "
        + "most ivory bluish white to violet blue in UV, SW weaker; heated or dyed with tea to darken it; imitated by glass, plastic, bone and vegetable ivory); "
        + "jtv.com gemopedia ivory: RI 1.535–1.54, aggregate, SWUV weak to moderate and LWUV weak to strong bluish white or violet blue, white to light yellow; "
        + "globalgemology.com ivory: RI 1.535–1.540 (usually 1.540), aggregate, SG 1.70–2.00; gems.minsoc.ru 'Ivory, bone': ivory and bone amorphous, density 1.7–2.0, "
        + "non-transparent";

    private const string OrganicGarnetDoubletPages = "studiopjj.blogspot.com 'Garnet and glass doublet': a thin cap of almandine fused to coloured glass, the table reads almandine "
        + "(1.76 or above), pavilion facets the glass (1.50–1.70), garnet inert in UV while the glass may glow chalky; sallyspencer.co.uk 'Garnet topped doublet': fused without glue, "
        + "imitating emerald, sapphire or ruby by the glass's colour; gia.edu G&G Fall 2023 Micro-World 'A red herring in a red garnet': pyrope-almandine crown over glass";

    /// <summary>Rows of this family, compiled like the first rows (each names the pages read).</summary>
    private static SpeciesProperties[] OrganicAndManMadeRows() =>
    [
        // Organics: not immersed (the table's convention for organics, common practice), so their SG never reaches a bench line.
        new()
        {
            Name = "ivory", BenchWeight = 0.3, Form = StoneForm.Aggregate, Opaque = true, Porous = true,
            Indices = PrincipalValues.Single(1.535, 1.545),
            SpecificGravity = new(1.70, 2.00),
            UvLong = [new("weak", .35), new("moderate", .35), new("strong", .3)], UvShort = [new("weak", .5), new("moderate", .5)],
            Hues = [new("white", .7), new("yellow", .3)],
            Origins = [new("natural", .9), new("treated", .1)],
            OriginCitation = "gemdat.org ivory (Lazzarelli 2010: heated or dyed with tea to darken the colour); the treated share .1: judgement",
            Citation = OrganicIvoryPages,
            Judgement = "the spot range 1.535–1.545 from the two bench references (Schumann's upper 1.570 left out); opaque and aggregate as the bench meets it (a translucent "
                + "aggregate that the polariscope would call aggregate in any case); UV strengths, hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "bone", BenchWeight = 0.2, Form = StoneForm.Aggregate, Opaque = true, Porous = true,
            Indices = PrincipalValues.Single(1.535, 1.555),
            SpecificGravity = new(1.70, 2.00),
            Hues = [new("white", .75), new("yellow", .15), new("brown", .1)],
            Citation = "gems.minsoc.ru 'Ivory, bone' (Bukanov, Russian Gemstones Encyclopedia): ivory and vertebrate bone, calcium hydroxyl phosphate with organic matter, density 1.7–2.0, "
                + "dull, non-transparent; rockidentifier.com bone: opaque, off-white to cream, brown; US Fish and Wildlife Service 'Ivory identification guide' (govdocs copy): "
                + "compact bone permeated by Haversian canals seen as pits with a 10x lens",
            Judgement = "the index (about 1.54) from memory, widened to 1.535–1.555; no UV read; opaque aggregate as the bench meets it; no dyed share written (none read); "
                + "hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "vegetable ivory", BenchWeight = 0.1, Form = StoneForm.Aggregate, Opaque = true, Porous = true,
            Indices = PrincipalValues.Single(1.535, 1.545),
            SpecificGravity = new(1.37, 1.42),
            Hues = [new("white", .75), new("yellow", .15), new("brown", .1)],
            Origins = [new("natural", .7), new("treated", .3)],
            OriginCitation = "cameo.mfa.org 'Vegetable ivory' (may be dyed any colour) and en.wikipedia.org 'Vegetable ivory' (it can be dyed; dyeing often brings out the grain); "
                + "the dyed share .3: judgement",
            Citation = "cameo.mfa.org 'Vegetable ivory' (after the GIA Gem Identification Lab Manual 2016): palm-seed endosperm, white, no birefringence or pleochroism, fluorescence "
                + "variable, RI 1.54, density 1.38–1.42, parallel torpedo-shaped cells; cambridge.org abstract of Connell (1844) 'Chemical examination of the tagua nut': density 1.376",
            Judgement = "RI ±0.005 about the single value read; SG 1.37–1.42 spanning both densities read; fibrous cells taken as an opaque aggregate; UV not written ('variable' only); "
                + "hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "copal", BenchWeight = 0.3, Form = StoneForm.Amorphous, Porous = true, Strained = 0.3,
            Indices = PrincipalValues.Single(1.535, 1.545),
            SpecificGravity = new(1.00, 1.19),
            UvLong = [new("weak", .4), new("moderate", .35), new("strong", .25)],
            Hues = [new("yellow", .6), new("orange", .2), new("brown", .15), new("colourless", .05)],
            Origins = [new("natural", .7), new("treated", .3)],
            OriginCitation = "jtv.com 'Copal vs. amber' part 1 (Campbell Pedersen and Williams, Gem & Jewellery News 2011): autoclave-treated copal, greened or with sun spangles, "
                + "appears more and more; p.gyb.elementfx.com copy of Crystals 11 (2021) 1223: copal heat- and pressure-treated to imitate amber (the share .3: judgement)",
            Citation = "foreveramber.au 'Amber imitations – copal': subfossil resin, density 1.0–1.19, RI 1.54, ice-lemon-yellow to yellow-brown; issuhub.com (Jewel, p. 308): "
                + "amorphous, SG 1.05–1.10, RI 1.54, light lemon yellow to orange; td.alljournals.cn abstract (Li et al. 2024, copal from six origins): fluorescence in long-wave UV "
                + "strongest in Borneo and New Zealand copal, weakest in Madagascar copal",
            Judgement = "RI ±0.005 about the single value read; strain in 30 % (as resins show in the polariscope, from memory); LW strengths from the abstract's words, SW not written; "
                + "hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "horny coral", BenchWeight = 0.2, Form = StoneForm.Amorphous, Opaque = true, Porous = true,
            Indices = PrincipalValues.Single(1.555, 1.575),
            SpecificGravity = new(1.30, 1.40),
            Hues = [new("black", .75), new("yellow", .15), new("brown", .1)],
            Citation = "wonderstarter.com 'Black coral': horny (not calcic) skeletons, black with brownish yellow streaks, concentric rings across the axis, density about 1.36, "
                + "no effervescence with acid; tradeshop.com coral: black coral SG 1.34; gemstone.pk coral: the proteinaceous substance of horny corals is non-crystalline; "
                + "gemstonebuzz.com coral: conchiolin corals black, blue, golden and brown, concentric structure about the axis, SG 1.30–2.20",
            Judgement = "the index (about 1.56) from memory, written 1.555–1.575; SG 1.30–1.40 about the single values read (never written, the stone not being immersed); "
                + "opaque as the black stone is met; golden coral written yellow; no UV read; hue weights and bench weight: judgement",
        },
        // Man-made materials: crystals grown with no gem counterpart are "synthetic" as for cubic zirconia and the garnets
        // above; sintered materials made to look like something else are "imitation" as for glass and plastic.
        new()
        {
            Name = "strontium titanate", BenchWeight = 0.1,
            Indices = PrincipalValues.Single(2.39, 2.41),
            SpecificGravity = new(5.10, 5.16), Dispersion = 0.190,
            UvLong = [new("inert", .9), new("weak", .1)], UvShort = [new("inert", .9), new("weak", .1)],
            Hues = [new("colourless", .85), new("red", .04), new("blue", .04), new("yellow", .04), new("brown", .03)],
            Origins = [new("synthetic", 1)],
            Citation = "gemstonebuzz.com strontium titanate: man-made (no natural counterpart used), cubic, isotropic, RI 2.409, dispersion 0.190, flame fusion; cameo.mfa.org "
                + "'Strontium titanate' (GIA Gem Identification Lab Manual 2016): RI 2.39–2.41, density 5.13 (synthetic), dispersion 0.190, fluorescence generally inert, colourless "
                + "or doped red, yellow, brown or blue; gemstones-guide.com strontium titanate: RI 2.409, SG 5.13 (its dispersion 0.109 taken as a misprint of 0.190)",
            Judgement = "SG ±0.03 about 5.13; always over the limit at a bench; the UV shares ('generally inert'), hue weights and a low bench weight (a soft simulant "
                + "displaced by later ones, from memory): judgement",
        },
        new()
        {
            Name = "lithium niobate", BenchWeight = 0.05,
            Indices = PrincipalValues.Uniaxial(new(2.29, 2.31), new(0.085, 0.095), positive: false),
            SpecificGravity = new(4.62, 4.70), Dispersion = 0.120,
            Hues = [new("colourless", .6), new("green", .1), new("red", .1), new("blue", .1), new("yellow", .1)],
            Origins = [new("synthetic", 1)],
            Citation = "gemstones-guide.com 'Linobate': lithium niobate, RI 2.21–2.30, birefringence 0.09, SG 4.65, colourless or doped green (Cr), red (Fe), blue or violet (Co), "
                + "yellow (Ni, Mn), dispersion almost three times diamond's; gemologiamllopis.com 'Niobato de litio': birefringent (doubled facet edges), dispersion 0.120, "
                + "Czochralski growth; es.wikipedia.org 'Niobato de litio': negative uniaxial; Wikipedia 'Lithium niobate' chembox (revision diff copy): nₒ 2.3007, nₑ 2.2116, "
                + "density 4.65; acousto-optics.phys.msu.ru: density 4.628",
            Judgement = "the sign negative (ω 2.30, ε 2.21) although gemstones-guide prints 'uniaxial +'; ranges ±0.01 and ±0.005 about the values read; always over the limit at a "
                + "bench; no pleochroism or UV read; hue weights and bench weight: judgement",
        },
        new()
        {
            Name = "ferrite", BenchWeight = 0.3, Form = StoneForm.Aggregate, Opaque = true,
            Indices = PrincipalValues.Single(2.90, 3.10),
            SpecificGravity = new(4.80, 5.20),
            Hues = [new("black", .6), new("grey", .4)],
            Origins = [new("imitation", 1)],
            Citation = "gemstones.com gemopedia 'Hematine': hematite simulant (hemalyke, magnetic hematite), mostly a ceramic-like barium-strontium ferrite, highly magnetic; "
                + "en.wikipedia.org 'Hematine': artificial barium-strontium ferrite; gemdat.org hematite (Schumann 2001): hematine pressed and sintered; wikimili.com 'Ferrite (magnet)': "
                + "a fired ceramic of iron oxide, electrically non-conductive; china-magnet.net 'Hard ferrite magnets': density about 5 g/cm3",
            Judgement = "the row is hematine as a bench meets it: opaque, a sintered aggregate; SG ±0.2 about the single figure read; the index from memory (written only as over the "
                + "limit, as for hematite); insulating (as read); hue weights and bench weight: judgement",
        },
        // Sintered or bonded imitations of opaque ornamental stones (turquoise, lapis lazuli, larimar): the catalogue's
        // ceramic, not the zirconia ceramic of watch cases. Three materials read, each a spot reading and a weighed SG, kept
        // as three rows (CatalogueSpeciesNames maps each to the catalogue's ceramic): one row spanning all three drew
        // index and SG pairs that no page describes.
        new()
        {
            Name = "ceramic imitation of larimar", BenchWeight = 0.05, Form = StoneForm.Aggregate, Opaque = true,
            Indices = PrincipalValues.Single(1.52, 1.54),
            SpecificGravity = new(1.84, 1.90),
            Hues = [new("blue", 1)],
            Origins = [new("imitation", 1)],
            Citation = "gia.edu G&G Summer 2013 Gem News 'Imitation larimar': a ceramic cabochon (95 % Al₂O₃, 4 % SiO₂) made in China, spot RI 1.53, SG 1.87, light blue",
            Judgement = "one stone read: the spot ±0.01 and SG ±0.03 about its figures; blue (the page's light blue); the bench weight: judgement",
        },
        new()
        {
            Name = "sintered imitation of lapis", BenchWeight = 0.08, Form = StoneForm.Aggregate, Opaque = true,
            Indices = PrincipalValues.Single(1.54, 1.56),
            SpecificGravity = new(2.33, 2.53),
            Hues = [new("blue", 1)],
            Origins = [new("imitation", 1)],
            Citation = "baike.wangchao.net.cn 'artificial lapis' (the Gilson imitation): SG 2.33–2.53 with or without pyrite, RI 1.55, gives off hydrogen sulphide with acid; "
                + "juwelir.info 'Synthetic lazurite' (the Gilson material): density 2.38, noticeably porous, weighing the simplest test; yourgemologist.com 'Imitation of lapis lazuli': very porous",
            Judgement = "the spot ±0.01 about 1.55; not written porous although the pages say it is (each gives a weighed SG, so the bench weighs it); the bench weight: judgement",
        },
        new()
        {
            Name = "bonded imitation of turquoise", BenchWeight = 0.07, Form = StoneForm.Aggregate, Opaque = true,
            Indices = PrincipalValues.Single(1.588, 1.608),
            SpecificGravity = new(2.56, 2.75),
            UvLong = [new("moderate", 1)], UvShort = [new("weak", 1)],
            Hues = [new("blue", 1)],
            Origins = [new("imitation", 1)],
            Citation = "gemstones-guide.com 'Synthetic turquoise' (the Gilson material, spheres held by a binder, so not a true synthetic): blue, semi-translucent to opaque, RI 1.598 ±0.01 "
                + "as a single reading, SG 2.56–2.75 (closer 2.75), LW moderate greenish blue, SW very faint yellowish green; Wikipedia 'Turquoise' (imitations section, zalansite.site "
                + "copy): pressed, bonded and sintered turquoise imitations of copper and aluminium compounds, Gilson's with black spiderweb matrix",
            Judgement = "SW 'very faint' written weak; blue only (the page's hue); the bench weight: judgement",
        },
        new()
        {
            Name = "marcasite", BenchWeight = 0.05, Opaque = true,
            Indices = PrincipalValues.Single(2.60, 3.00),
            SpecificGravity = new(4.85, 4.92),
            Hues = [new("yellow", .6), new("grey", .3), new("brown", .1)],
            Citation = "gemfame.com marcasite: orthorhombic FeS₂, SG 4.88–4.92, tin-white then pale bronze-yellow darkening with an iridescent tarnish, metallic; jeweller's "
                + "'marcasite' typically pyrite; tradeshop.com marcasite: opaque, metallic, SG 4.85, whitish to brassy yellow darkening in air; balcano.eu marcasite: SG 4.85–4.92; "
                + "Wikipedia 'Marcasite' (ipfs copy): SG 4.875 calculated, 4.887 measured, opaque; geologypage.com: marcasite itself too brittle to be used as a gem",
            Judgement = "the true mineral (the jeweller's 'marcasite' reads as the pyrite row); index written only as over the limit (the metallic-lustre figure of the pyrite row, "
                + "not read again here); not written conductive, as for pyrite; hue weights and a very low bench weight (the mineral crumbles): judgement",
        },
        // A composite: what the bench reads is the crown's index (the table facet is the garnet's), and SG, polariscope and
        // colour of the whole stone. Both parts are singly refractive, so the row is isotropic with the garnet's index and
        // an SG drawn apart from it (SgFollowsIndex 0), mostly the glass's.
        new()
        {
            Name = "garnet-topped doublet", BenchWeight = 0.2, Strained = 0.2,
            Indices = PrincipalValues.Single(1.760, 1.830),
            SpecificGravity = new(2.60, 4.20),
            UvLong = [new("inert", .6), new("weak", .4)], UvShort = [new("inert", .6), new("weak", .4)],
            Hues = [new("green", .45), new("blue", .3), new("red", .15), new("purple", .05), new("yellow", .05)],
            Origins = [new("composite", 1)],
            Citation = OrganicGarnetDoubletPages + "; the crown's index range as the almandine row's (gemstone.pk: 1.76–1.83)",
            Judgement = "no SG of the whole stone was read: 2.60–4.20 is the glass row's published range (2.4–4.2) moved a little towards the garnet cap's: judgement; strain in 20 % "
                + "(the glass's), the UV shares (the glass part chalky or not), hue weights (emerald imitations first) and bench weight: judgement; no lines written (the garnet's "
                + "bands through a thin cap were not read)",
        },
    ];
}
