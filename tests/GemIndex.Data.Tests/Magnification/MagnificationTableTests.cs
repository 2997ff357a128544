using GemIndex.Core.Catalogue;
using GemIndex.Core.Magnification;
using GemIndex.Data.Catalogue;
using GemIndex.Data.Magnification;

namespace GemIndex.Data.Tests.Magnification;

public class MagnificationTableTests
{
    [Fact]
    public void Every_entry_named_in_the_table_is_in_the_shipped_catalogue_and_every_word_is_known()
    {
        // Reading the embedded file checks every word, probability and source key; this checks every name.
        MagnificationTable table = MagnificationTable.Embedded;
        Assert.NotEmpty(table.Entries);
        IReadOnlyList<string> unmatched = table.Unmatched(ShippedCatalogue.Families.Materials);
        Assert.True(unmatched.Count == 0, "not in the catalogue: " + string.Join(", ", unmatched));
    }

    [Fact]
    public void The_loaded_catalogue_carries_the_listed_profiles_and_the_defaults_elsewhere()
    {
        using var temp = new TempDirectory();
        IReadOnlyList<Material> shipped = ShippedCatalogue.Load(temp.Path);
        var table = MagnificationTable.Embedded;
        foreach (Material m in shipped)
        {
            if (table.Entries.TryGetValue(m.Name, out var listed))
                foreach (var (feature, p) in listed) Assert.Equal(p, m.MagnificationProfile.ProbabilityOf(feature));
            else Assert.Null(m.Magnification);   // its origin's defaults
            // Doubling follows the entry's own birefringence, listed or not.
            Assert.Equal(FacetDoubling.Held(m), m.MagnificationProfile.ProbabilityOf(MagnificationFeature.FacetDoubling));
        }
        // Flame-fusion synthetic ruby: curved striae in virtually all stones (Hughes & Koivula 2005, as the table cites it).
        Material flameFusion = shipped.Single(m => m.Name == "flame-fusion synthetic ruby");
        Assert.Equal(0.9, flameFusion.MagnificationProfile.ProbabilityOf(MagnificationFeature.CurvedStriae));
    }

    [Theory]
    [InlineData("""{"references":[{"key":"a"}],"entries":[{"name":"x","source":"a","features":{"sparkles":0.5}}]}""", "'sparkles' is not a word")]
    [InlineData("""{"references":[{"key":"a"}],"entries":[{"name":"x","source":"a","features":{"curved_striae":1.5}}]}""", "curved_striae must be a probability")]
    [InlineData("""{"references":[{"key":"a"}],"entries":[{"name":"x","source":"b","features":{}}]}""", "\"source\" must be one of")]
    [InlineData("""{"references":[{"key":"a"}],"entries":[{"name":"x","source":"a","features":{}},{"name":"x","source":"a","features":{}}]}""", "named twice")]
    [InlineData("""{"references":[{"key":"a"}],"entries":[{"name":"x","source":"a","like":"y"}]}""", "'y', which is not an entry of the table")]
    [InlineData("""{"references":[{"key":"a"}],"entries":[{"name":"y","source":"a","features":{}},{"name":"x","source":"a","like":"y","features":{}}]}""", "given instead of \"features\"")]
    [InlineData("""{"references":[{"key":"a"}],"entries":[{"name":"z","source":"a","features":{}},{"name":"y","source":"a","like":"z"},{"name":"x","source":"a","like":"y"}]}""", "with features of its own")]
    [InlineData("""{"references":[{"key":"a"}],"entries":[{"name":"x","source":"a","features":{"curved_striae":0.5},"feature_sources":{"growth_tubes":"a"}}]}""", "names 'growth_tubes', which is not one of the entry's features")]
    [InlineData("""{"references":[{"key":"a"}],"entries":[{"name":"x","source":"a","features":{"growth_tubes":0.5},"feature_sources":{"growth_tubes":"b"}}]}""", "\"feature_sources\" of 'growth_tubes' must be one of")]
    public void A_fault_in_the_table_is_an_error_naming_the_entry(string json, string expected)
    {
        var e = Assert.Throws<CatalogueFormatException>(() => MagnificationTable.Read(json));
        Assert.Contains("(x)", e.Errors[0]);
        Assert.Contains(expected, e.Errors[0]);
    }

    [Theory]
    [InlineData("""{"references":[{"key":"a"}],"entries":[{"name":"x","source":"a","featurs":{"curved_striae":0.5}}]}""", "featurs")]
    [InlineData("""{"references":[{"key":"a"}],"entries":[{"name":"x","source":"a","features":{"curved_striae":"often"}}]}""", "curved_striae")]
    [InlineData("""{"referenses":[{"key":"a"}],"entries":[]}""", "referenses")]
    public void A_field_the_table_does_not_know_or_a_probability_not_a_number_is_an_error_naming_it(string json, string named)
    {
        // Read strictly, as the trade rules and mineral groups are: a misspelt field is not silently left out.
        var e = Assert.Throws<CatalogueFormatException>(() => MagnificationTable.Read(json));
        Assert.StartsWith("magnification.json: not valid", e.Errors[0]);
        Assert.Contains(named, e.Errors[0]);
    }

    [Fact]
    public void The_shipped_tourmalines_and_beryls_hold_growth_tubes_and_other_species_only_by_default()
    {
        // Growth tubes: tourmaline (G&G 2024 micro-features chart) and beryl, now and then spodumene (gemsociety.org), as the table cites them.
        using var temp = new TempDirectory();
        IReadOnlyList<Material> shipped = ShippedCatalogue.Load(temp.Path);
        double Tubes(string name) => shipped.Single(m => m.Name == name).MagnificationProfile.ProbabilityOf(MagnificationFeature.GrowthTubes);
        Assert.Equal(0.3, Tubes("verdelite"));
        Assert.Equal(0.2, Tubes("aquamarine"));
        Assert.Equal(0.1, Tubes("kunzite"));
        Assert.Equal(MagnificationProfile.Foreign, Tubes("peridot"));
        Assert.Equal(MagnificationProfile.Foreign, Tubes("hydrothermal synthetic emerald"));
    }

    [Fact]
    public void An_entry_like_another_takes_its_listed_features()
    {
        MagnificationTable table = MagnificationTable.Read("""
            {"references":[{"key":"a"}],"entries":[{"name":"x","source":"a","like":"y"},{"name":"y","source":"a","features":{"curved_striae":0.7}}]}
            """);
        Assert.Equal(0.7, table.Entries["x"][MagnificationFeature.CurvedStriae]);
    }

    [Fact]
    public void The_shipped_heated_ruby_keeps_the_unheated_rubys_inclusions_but_little_of_its_silk()
    {
        // Heating dissolves most rutile silk (Koivula and Hughes, "Rutile silk in ruby & sapphire"; the entries' source):
        // the heated stone keeps every other inclusion of the unheated one, and holds intact silk far less often.
        using var temp = new TempDirectory();
        IReadOnlyList<Material> shipped = ShippedCatalogue.Load(temp.Path);
        Material ruby = shipped.Single(m => m.Name == "ruby"), heated = shipped.Single(m => m.Name == "heated ruby");
        Assert.NotEmpty(MagnificationTable.Embedded.Entries["ruby"]);
        foreach (MagnificationFeature f in Enum.GetValues<MagnificationFeature>().Where(f => f != MagnificationFeature.NeedlesAndSilk))
            Assert.Equal(ruby.MagnificationProfile.ProbabilityOf(f), heated.MagnificationProfile.ProbabilityOf(f));
        Assert.True(heated.MagnificationProfile.ProbabilityOf(MagnificationFeature.NeedlesAndSilk) < ruby.MagnificationProfile.ProbabilityOf(MagnificationFeature.NeedlesAndSilk) / 2);
        Material sapphire = shipped.Single(m => m.Name == "sapphire"), heatedSapphire = shipped.Single(m => m.Name == "heated sapphire");
        Assert.True(heatedSapphire.MagnificationProfile.ProbabilityOf(MagnificationFeature.NeedlesAndSilk) < sapphire.MagnificationProfile.ProbabilityOf(MagnificationFeature.NeedlesAndSilk) / 2);
    }
}
