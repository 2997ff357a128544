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
    public void A_number_below_2_5_searches_by_index_and_above_by_SG()
    {
        var model = new CatalogueBrowserModel(TestMaterials.All);
        model.Search("1.72");
        Assert.Equal(["spinel"], model.Shown.Select(m => m.Name));   // glass ends at 1.70, more than 0.01 below
        model.Search("1.705");
        Assert.Equal(["spinel", "glass"], model.Shown.Select(m => m.Name));
        model.Search("3.60");
        Assert.Contains("spinel", model.Shown.Select(m => m.Name));
        Assert.DoesNotContain("quartz", model.Shown.Select(m => m.Name));
    }

    [Fact]
    public void The_entry_text_shows_the_catalogue_fields()
    {
        string details = CatalogueBrowserModel.Details(TestMaterials.All[2]);
        Assert.Contains("opal", details);
        Assert.Contains("do not immerse", details);
        Assert.Contains("yes: never weigh in water", details);
    }
}
