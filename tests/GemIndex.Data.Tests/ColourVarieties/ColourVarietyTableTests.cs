using GemIndex.Core.Catalogue;
using GemIndex.Data.Catalogue;
using GemIndex.Data.ColourVarieties;

namespace GemIndex.Data.Tests.ColourVarieties;

public class ColourVarietyTableTests
{
    [Fact]
    public void Every_entry_in_the_table_is_in_the_shipped_catalogue_and_the_loaded_entries_carry_exactly_their_mark()
    {
        using var temp = new TempDirectory();
        var table = ColourVarietyTable.Embedded;
        Assert.Empty(table.Unmatched(ShippedCatalogue.Families.Materials));
        IReadOnlyList<Material> shipped = ShippedCatalogue.Load(temp.Path);
        foreach (Material m in shipped)
            Assert.Equal(table.ByName.ContainsKey(m.Name), m.NamedByColour);
        // Common practice of the trade: emerald is green beryl, aquamarine blue beryl, ruby red corundum, and a filled or
        // laboratory-grown stone sold under the name is held to the same colour.
        Assert.All(new[] { "emerald", "resin-filled emerald", "aquamarine", "ruby", "glass-filled ruby", "flame-fusion synthetic ruby" },
            name => Assert.True(shipped.Single(m => m.Name == name).NamedByColour, name));
        // A name given to many colours is not held to one: a flame-fusion synthetic sapphire comes in blue, yellow, pink….
        Assert.False(shipped.Single(m => m.Name == "flame-fusion synthetic sapphire").NamedByColour);
        Assert.False(shipped.Single(m => m.Name == "corundum doublet").NamedByColour);
    }

    [Fact]
    public void A_user_entry_keeps_its_species_share_even_when_it_bears_a_listed_name()
    {
        var table = ColourVarietyTable.Read("""
            {"references":[{"key":"a","citation":"A"}],"varieties":[{"variety":"emerald","colour":"green","source":"a","entries":["emerald"]}]}
            """);
        Material entry = new()
        {
            Name = "emerald", Species = "beryl", Variety = "emerald", Family = "user", Origin = OriginClass.Natural, CrystalSystem = CrystalSystem.Hexagonal,
            Indices = OpticalIndices.Uniaxial(new(1.57, 1.59), new(1.565, 1.585)), SpecificGravity = new(2.67, 2.78), IsUserEntry = true,
        };
        Assert.False(Assert.Single(table.Attach([entry])).NamedByColour);
        Assert.True(Assert.Single(table.Attach([entry with { IsUserEntry = false }])).NamedByColour);
    }

    [Theory]
    [InlineData("""{"references":[{"key":"a","citation":"A"}],"varieties":[{"variety":"v","colour":"c","source":"b","entries":["x"]}]}""", "varieties[0] (v): \"source\" must be one of")]
    [InlineData("""{"references":[{"key":"a","citation":"A"}],"varieties":[{"colour":"c","source":"a","entries":["x"]}]}""", "varieties[0]: \"variety\" must name the variety")]
    [InlineData("""{"references":[{"key":"a","citation":"A"}],"varieties":[{"variety":"v","source":"a","entries":["x"]}]}""", "\"colour\" must say the colour")]
    [InlineData("""{"references":[{"key":"a","citation":"A"}],"varieties":[{"variety":"v","colour":"c","source":"a","entries":[]}]}""", "\"entries\" must list one or more")]
    [InlineData("""{"references":[{"key":"a","citation":"A"}],"varieties":[{"variety":"v","colour":"c","source":"a","entries":["x"]},{"variety":"w","colour":"c","source":"a","entries":["x"]}]}""", "varieties[1] (w): entry 'x' is blank or already listed")]
    [InlineData("""{"references":[],"varieties":[],"extra":1}""", "colour-varieties.json: not valid")]
    [InlineData("""{"references":[]}""", "\"varieties\" must be a list")]
    public void A_faulty_table_is_refused_naming_the_fault(string json, string expected)
    {
        var e = Assert.Throws<CatalogueFormatException>(() => ColourVarietyTable.Read(json));
        Assert.Contains(e.Errors, m => m.Contains(expected, StringComparison.Ordinal));
    }
}
