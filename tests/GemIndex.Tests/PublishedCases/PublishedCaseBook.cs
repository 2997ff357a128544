namespace GemIndex.Tests.PublishedCases;

/// <summary>
/// The published cases found for the benchmark (docs/benchmark.md, "Published cases": how they were searched for and
/// what was found). Each line's readings are copied from the source named beside it; none is adjusted to fit.
/// </summary>
public static class PublishedCaseBook
{
    private static readonly string[] Tourmaline = ["elbaite", "dravite", "schorl", "uvite", "liddicoatite"];

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
        new("""{"id":"mllopis-24-1821-ruby","refractometer":{"method":"facet","readings":[{"low":1.762,"high":1.770}]},"sg":4.02,"absorption_nm":[692,694],"colour":"red-orange"}""", ["corundum"], 3,
            "gemologiamllopis.com certificate 24-1821-CO-PR-8451-16 (2016): 4.82 ct ruby, glass-filled; refractive indices 1.770–1.762, birefringence 0.008, optic sign −, density 4.02, "
            + "doublet at 694 and 692 nm; colour red-orange (OR 7/3). The optic sign has no field in the batch format and is left out."),

        // One bench test: reported, not required (a single SG cannot separate the species of a general catalogue).
        new("""{"id":"bauer-quartz","sg":2.66}""", ["quartz"], 1,
            "M. Bauer, Precious Stones (trans. L. J. Spencer), p. 19 (afripics.com page copy): worked hydrostatic example, SG 2.66, 'the stone may therefore be identified as quartz'"),
        new("""{"id":"gemmology-dev-diamond","sg":{"air_ct":17.6,"water_ct":12.6,"water_c":20}}""", ["diamond"], 1,
            "gemmology.dev 'Measurement & Calculation': teaching example 'Diamond: 3.52 g in air, 2.52 g in water at 20 °C = SG 3.52' (grams written as carats: × 5)"),
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
