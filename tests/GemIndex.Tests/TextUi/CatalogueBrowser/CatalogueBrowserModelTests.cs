using GemIndex.Cli.TextUi.CatalogueBrowser;

namespace GemIndex.Tests.TextUi.CatalogueBrowser;

public class CatalogueBrowserModelTests
{
    [Fact]
    public void Search_matches_names_and_varieties_in_any_case()
    {
        var model = new CatalogueBrowserModel(TestMaterials.All);
        model.Search("ROCK");
        Assert.Equal(["quartz"], model.Shown.Select(m => m.Name));
        model.Search("");
        Assert.Equal(TestMaterials.All.Count, model.Shown.Count);
    }

    [Fact]
    public void Searching_an_origin_word_finds_the_entries_of_that_origin_whatever_their_names()
    {
        // An invented man-made entry whose names do not say "synthetic" (as with cubic zirconia).
        var made = TestMaterials.All[0] with { Name = "made stone", Species = "made stone", Variety = "made stone", Family = "simulants", Origin = GemIndex.Core.Catalogue.OriginClass.Synthetic };
        var model = new CatalogueBrowserModel([.. TestMaterials.All, made]);
        model.Search("synthetic");
        Assert.Contains(made, model.Shown);
        Assert.DoesNotContain(TestMaterials.All[0], model.Shown);
    }

    [Fact]
    public void A_word_lists_the_species_of_that_name_before_entries_that_only_mention_it()
    {
        // A composite with glass in its variety comes first in the catalogue; the glass species' own entries lead the list.
        var doublet = TestMaterials.All[0] with { Name = "garnet-topped doublet", Species = "garnet-topped doublet", Variety = "garnet and glass doublet" };
        var leadGlass = TestMaterials.All[1] with { Name = "lead flint glass", Species = "glass", Variety = "lead glass" };
        var paste = TestMaterials.All[1] with { Name = "paste", Species = "glass", Variety = "paste" };
        var filled = TestMaterials.All[0] with { Name = "glass-filled ruby", Species = "corundum", Variety = "ruby" };
        var model = new CatalogueBrowserModel([doublet, filled, leadGlass, paste]);
        model.Search("glass");
        Assert.Equal(["lead flint glass", "paste", "glass-filled ruby", "garnet-topped doublet"], model.Shown.Select(m => m.Name));
    }

    [Fact]
    public void An_SG_range_whose_ends_print_alike_prints_once()
    {
        var silica = TestMaterials.All[0] with { SpecificGravity = new(2.199, 2.201) };
        var model = new CatalogueBrowserModel([silica]);
        Assert.EndsWith("SG 2.20", model.Line(silica, 20));
        // An index given as one value (copal's 1.540, from memory) prints once too.
        var one = TestMaterials.All[0] with { Indices = GemIndex.Core.Catalogue.OpticalIndices.SingleIndex(new(1.540, 1.540)) };
        Assert.Contains(" 1.540        SG", new CatalogueBrowserModel([one]).Line(one, 20));
        Assert.DoesNotContain("1.540–1.540", new CatalogueBrowserModel([one]).Line(one, 20));
    }

    [Fact]
    public void A_decimal_comma_is_said_rather_than_searched_as_two_numbers()
    {
        var model = new CatalogueBrowserModel(TestMaterials.All);
        model.Search("1,544");
        Assert.Empty(model.Shown);
        Assert.Contains("a dot is the decimal mark", model.Problem);
        model.Search("1.544 2.65");
        Assert.Null(model.Problem);
        Assert.NotEmpty(model.Shown);
    }

    [Fact]
    public void A_number_below_2_5_searches_by_index_and_above_by_SG()
    {
        var model = new CatalogueBrowserModel(TestMaterials.All);
        model.Search("1.72");
        Assert.Equal(["spinel"], model.Shown.Select(m => m.Name));   // glass ends at 1.70, more than 0.01 below
        model.Search("1.705");
        Assert.Equal(["glass", "spinel"], model.Shown.Select(m => m.Name));   // closest first: 0.005 above glass, 0.007 below spinel
        model.Search("3.60");
        Assert.Contains("spinel", model.Shown.Select(m => m.Name));
        Assert.DoesNotContain("quartz", model.Shown.Select(m => m.Name));
    }

    [Fact]
    public void An_index_and_an_SG_together_find_quartz_like_materials_closest_first()
    {
        // Quartz: nω 1.544, SG 2.65 (common practice). Glass's wide ranges hold both values too, but far from their middle.
        var model = new CatalogueBrowserModel(TestMaterials.All);
        model.Search("1.544 2.65");
        Assert.Equal(["quartz", "glass"], model.Shown.Select(m => m.Name));
        model.Search("1.72 2.65");
        Assert.Empty(model.Shown);   // spinel has the index, nothing has both
    }

    [Fact]
    public void An_index_read_as_an_edge_ranks_the_entry_whose_own_index_it_is_first()
    {
        // Oligoclase (from memory: α 1.533–1.540, γ 1.542–1.552, SG 2.62–2.67) spans 1.544 too, but none of its
        // indices is 1.544; quartz's ω is (common practice).
        var oligoclase = TestMaterials.All[0] with
        {
            Name = "oligoclase", Species = "plagioclase", Variety = "oligoclase",
            Indices = GemIndex.Core.Catalogue.OpticalIndices.Uniaxial(new(1.533, 1.540), new(1.542, 1.552)),
            SpecificGravity = new(2.62, 2.67),
        };
        var model = new CatalogueBrowserModel([oligoclase, TestMaterials.All[0]]);
        model.Search("1.544 2.65");
        Assert.Equal(["quartz", "oligoclase"], model.Shown.Select(m => m.Name));
    }

    [Fact]
    public void Names_are_not_cut_while_the_line_has_room()
    {
        var model = new CatalogueBrowserModel([TestMaterials.All[0] with { Name = "flame-fusion colourless synthetic sapphire" }]);
        int width = model.NameWidth(76);
        Assert.Contains("flame-fusion colourless synthetic sapphire 1.544–1.554  SG 2.65–2.66", model.Line(model.Shown[0], width));
    }

    [Fact]
    public void The_entry_text_shows_the_catalogue_fields()
    {
        string details = CatalogueBrowserModel.Details(TestMaterials.All[2]);
        Assert.Contains("opal", details);
        Assert.Contains("do not immerse", details);
        Assert.Contains("yes: never weigh in water", details);
    }

    [Fact]
    public void One_number_below_the_scale_is_an_SG_and_one_on_it_an_index_first_then_an_SG()
    {
        var amber = TestMaterials.All[0] with { Name = "amber", Species = "amber", Indices = GemIndex.Core.Catalogue.OpticalIndices.SingleIndex(new(1.539, 1.545)), SpecificGravity = new(1.05, 1.10) };
        var model = new CatalogueBrowserModel([.. TestMaterials.All, amber]);
        model.Search("1.08");   // below the refractometer's 1.30: amber's SG (from memory, 1.05–1.10)
        Assert.Equal(["amber"], model.Shown.Select(m => m.Name));
        model.Search("2.15");   // opal's SG 1.98–2.20 (test values): no index that high here, so the SG finds it
        Assert.Contains(model.Shown, m => m.Name == "opal");
        model.Search("1.544");  // quartz by its index first
        Assert.Equal("quartz", model.Shown[0].Name);
    }

    [Fact]
    public void Among_entries_that_hold_an_index_the_commoner_at_a_bench_comes_first()
    {
        // Spinel 1.712–1.736 (common) beside two rarer entries with an index near 1.718 (taaffeite-like 1.717–1.724 and
        // kyanite-like α 1.710–1.718, from memory): the textbook spinel index 1.718 had listed spinel after two screens.
        var spinel = TestMaterials.All[0] with
        {
            Name = "red spinel", Species = "spinel", Variety = "red spinel", Frequency = GemIndex.Core.Catalogue.BenchFrequency.Common,
            Indices = GemIndex.Core.Catalogue.OpticalIndices.SingleIndex(new(1.712, 1.736)),
        };
        var taaffeite = spinel with { Name = "taaffeite", Species = "taaffeite", Variety = "taaffeite", Frequency = GemIndex.Core.Catalogue.BenchFrequency.Rare,
            Indices = GemIndex.Core.Catalogue.OpticalIndices.Uniaxial(new(1.721, 1.724), new(1.717, 1.720)) };
        var kyanite = spinel with { Name = "kyanite", Species = "kyanite", Variety = "kyanite", Frequency = GemIndex.Core.Catalogue.BenchFrequency.Occasional,
            Indices = GemIndex.Core.Catalogue.OpticalIndices.Uniaxial(new(1.710, 1.718), new(1.727, 1.734)) };
        var model = new CatalogueBrowserModel([taaffeite, kyanite, spinel]);
        model.Search("1.718");
        Assert.Equal(["red spinel", "kyanite", "taaffeite"], model.Shown.Select(m => m.Name));
        model.Search("1.709");                                       // outside them all: nearness alone
        Assert.Equal("kyanite", model.Shown[0].Name);
    }
}
