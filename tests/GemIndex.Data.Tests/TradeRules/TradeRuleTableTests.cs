using GemIndex.Core.Catalogue;
using GemIndex.Data.Catalogue;
using GemIndex.Data.TradeRules;

namespace GemIndex.Data.Tests.TradeRules;

public class TradeRuleTableTests
{
    [Fact]
    public void Every_name_and_species_in_the_table_is_in_the_shipped_catalogue_and_the_loaded_entries_carry_exactly_those_rules()
    {
        using var temp = new TempDirectory();
        var table = TradeRuleTable.Embedded;
        Assert.NotEmpty(table.ByName);
        Assert.NotEmpty(table.BySpecies);
        Assert.Empty(table.Unmatched(ShippedCatalogue.Families.Materials));
        IReadOnlyList<Material> shipped = ShippedCatalogue.Load(temp.Path);
        foreach (Material m in shipped)
            Assert.Equal(table.For(m), m.TradeRule);
        // Every entry of a species the table names by species carries its rule: golden coral is bleached black coral.
        Assert.All(shipped.Where(m => table.BySpecies.ContainsKey(m.Species)), m => Assert.NotNull(m.TradeRule));
        Assert.Equal("black-coral", shipped.Single(m => m.Name == "golden coral").TradeRule!.Key);
        // The hawksbill is in CITES Appendix I, not II or III (the CITES appendices, from memory, as the table cites them).
        Assert.Matches(@"Appendix I(?!I)", shipped.Single(m => m.Name == "tortoiseshell").TradeRule!.Text);
        Assert.Contains("CITES", shipped.Single(m => m.Name == "tortoiseshell").TradeRule!.Citation);
        Assert.Null(shipped.Single(m => m.Name == "bone").TradeRule);
    }

    [Fact]
    public void A_user_entry_takes_its_species_rule_but_never_a_shipped_entry_s_rule_by_name()
    {
        var table = TradeRuleTable.Read("""
            {"references":[{"key":"a","citation":"A"}],
             "rules":[{"key":"r1","text":"one","source":"a"},{"key":"r2","text":"two","source":"a"}],
             "entries":[{"species":"tortoiseshell","rule":"r1"},{"name":"red coral","rule":"r2"}]}
            """);
        Material Entry(string name, string species, bool user) => new()
        {
            Name = name, Species = species, Variety = name, Family = "organics", Origin = OriginClass.Natural, CrystalSystem = CrystalSystem.Amorphous,
            Indices = OpticalIndices.SingleIndex(new(1.55, 1.56), Core.Optics.Indicatrix.OpticCharacter.Amorphous),
            SpecificGravity = new(1.3, 1.4), IsUserEntry = user,
        };
        Assert.Equal("r1", table.For(Entry("my shell comb", "tortoiseshell", user: true))?.Key);
        Assert.Null(table.For(Entry("my plastic comb", "tortoiseshell", user: true) with { Origin = OriginClass.Imitation }));
        Assert.Null(table.For(Entry("red coral", "calcareous coral", user: true)));
        Assert.Equal("r2", table.For(Entry("red coral", "calcareous coral", user: false))?.Key);
    }

    [Theory]
    [InlineData("""{"references":[{"key":"a","citation":"A"}],"rules":[{"key":"r","text":"t","source":"b"}],"entries":[]}""", "rules[0] (r): \"source\" must be one of")]
    [InlineData("""{"references":[{"key":"a","citation":"A"}],"rules":[{"key":"r","source":"a"}],"entries":[]}""", "\"text\" must say")]
    [InlineData("""{"references":[{"key":"a","citation":"A"}],"rules":[{"key":"r","text":"t","source":"a"},{"key":"r","text":"u","source":"a"}],"entries":[]}""", "rules[1] (r): the rule is given twice")]
    [InlineData("""{"references":[{"key":"a","citation":"A"}],"rules":[{"key":"r","text":"t","source":"a"}],"entries":[{"name":"x","rule":"s"}]}""", "entries[0] (x): \"rule\" must be the key")]
    [InlineData("""{"references":[{"key":"a","citation":"A"}],"rules":[{"key":"r","text":"t","source":"a"}],"entries":[{"rule":"r"}]}""", "entries[0]: give either \"name\"")]
    [InlineData("""{"references":[{"key":"a","citation":"A"}],"rules":[{"key":"r","text":"t","source":"a"}],"entries":[{"name":"x","species":"y","rule":"r"}]}""", "give either")]
    [InlineData("""{"references":[{"key":"a","citation":"A"}],"rules":[{"key":"r","text":"t","source":"a"}],"entries":[{"name":"x","rule":"r"},{"name":"x","rule":"r"}]}""", "entries[1] (x): named twice")]
    [InlineData("""{"references":[{"key":"a","citation":"A"}],"rules":[{"text":"t","source":"a"}],"entries":[]}""", "rules[0]: \"key\" must name the rule")]
    [InlineData("""{"references":[{"key":"a","citation":"A"}],"rules":[{"key":"r","text":"t","source":"a"}],"entries":[{"species":"y","rule":"r"},{"species":"y","rule":"r"}]}""", "entries[1] (species y): named twice")]
    [InlineData("""{"references":[],"rules":[],"entries":[],"extra":1}""", "trade-rules.json: not valid")]
    [InlineData("""{"references":[],"rules":[]}""", "\"rules\" and \"entries\" must be lists")]
    public void A_faulty_table_is_refused_naming_the_fault(string json, string expected)
    {
        var e = Assert.Throws<CatalogueFormatException>(() => TradeRuleTable.Read(json));
        Assert.Contains(e.Errors, m => m.Contains(expected, StringComparison.Ordinal));
    }
}
