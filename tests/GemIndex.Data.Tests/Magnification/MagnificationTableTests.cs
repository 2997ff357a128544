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
            else Assert.Same(MagnificationProfile.ForOrigin(m.Origin), m.MagnificationProfile);
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
    public void A_fault_in_the_table_is_an_error_naming_the_entry(string json, string expected)
    {
        var e = Assert.Throws<CatalogueFormatException>(() => MagnificationTable.Read(json));
        Assert.Contains("(x)", e.Errors[0]);
        Assert.Contains(expected, e.Errors[0]);
    }
}
