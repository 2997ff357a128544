using GemIndex.Core.Catalogue;
using GemIndex.Data.Catalogue;
using GemIndex.Data.TradeRules;

namespace GemIndex.Data.Tests.TradeRules;

public class TradeRuleTableTests
{
    [Fact]
    public void Every_entry_named_in_the_table_is_in_the_shipped_catalogue_and_the_loaded_entries_carry_exactly_those_rules()
    {
        using var temp = new TempDirectory();
        var table = TradeRuleTable.Embedded;
        Assert.NotEmpty(table.Rules);
        Assert.Empty(table.Unmatched(ShippedCatalogue.Families.Materials));
        IReadOnlyList<Material> shipped = ShippedCatalogue.Load(temp.Path);
        foreach (Material m in shipped)
            Assert.Equal(table.Rules.GetValueOrDefault(m.Name), m.TradeRule);
        // The hawksbill is in CITES Appendix I (the CITES appendices, as the table cites them).
        Assert.Contains("Appendix I", shipped.Single(m => m.Name == "tortoiseshell").TradeRule!.Text);
        Assert.Contains("CITES", shipped.Single(m => m.Name == "tortoiseshell").TradeRule!.Citation);
        Assert.Null(shipped.Single(m => m.Name == "bone").TradeRule);
    }

    [Theory]
    [InlineData("""{"references":[{"key":"a","citation":"A"}],"entries":[{"name":"x","source":"b","rule":"r"}]}""", "\"source\" must be one of")]
    [InlineData("""{"references":[{"key":"a","citation":"A"}],"entries":[{"name":"x","source":"a"}]}""", "\"rule\" must say")]
    [InlineData("""{"references":[{"key":"a","citation":"A"}],"entries":[{"name":"x","source":"a","rule":"r"},{"name":"x","source":"a","rule":"s"}]}""", "entries[1] (x): the entry is named twice")]
    [InlineData("""{"references":[],"entries":[{"name":"x","source":"a","rule":"r","extra":1}]}""", "trade-rules.json: not valid")]
    [InlineData("""{"references":[]}""", "\"entries\" must be a list")]
    public void A_faulty_table_is_refused_naming_the_fault(string json, string expected)
    {
        var e = Assert.Throws<CatalogueFormatException>(() => TradeRuleTable.Read(json));
        Assert.Contains(e.Errors, m => m.Contains(expected, StringComparison.Ordinal));
    }
}
