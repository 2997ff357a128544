using GemIndex.Core.Catalogue;
using GemIndex.Data.Catalogue;
using GemIndex.Data.MineralGroups;

namespace GemIndex.Data.Tests.MineralGroups;

public class MineralGroupTableTests
{
    [Fact]
    public void Every_species_in_the_table_is_in_the_shipped_catalogue_and_the_loaded_entries_carry_exactly_their_groups()
    {
        using var temp = new TempDirectory();
        var table = MineralGroupTable.Embedded;
        Assert.Empty(table.Unmatched(ShippedCatalogue.Families.Materials));
        IReadOnlyList<Material> shipped = ShippedCatalogue.Load(temp.Path);
        foreach (Material m in shipped)
            Assert.Equal(table.BySpecies.GetValueOrDefault(m.Species), m.MineralGroup);
        // Elbaite, dravite, schorl and uvite are species of the tourmaline supergroup (Henry et al. 2011, as the table cites it).
        Assert.Equal(["tourmaline"], shipped.Where(m => m.Species is "elbaite" or "dravite" or "schorl" or "uvite").Select(m => m.MineralGroup).Distinct());
        // Man-made garnet-structured simulants are their own species, not members of the garnet group.
        Assert.Null(shipped.First(m => m.Species == "yttrium aluminium garnet").MineralGroup);
        Assert.Equal("garnet", shipped.First(m => m.Species == "pyrope-almandine").MineralGroup);
        // A laboratory-grown stone filed under a member species is a member with it.
        Assert.Equal("spinel", shipped.First(m => m.Species == "spinel" && m.Origin == OriginClass.Synthetic).MineralGroup);
        Assert.Null(shipped.First(m => m.Species == "quartz").MineralGroup);
    }

    [Fact]
    public void A_user_entry_of_a_listed_species_joins_its_group()
    {
        var table = MineralGroupTable.Read("""
            {"references":[{"key":"a","citation":"A"}],"groups":[{"group":"tourmaline","source":"a","species":["elbaite","uvite"]}]}
            """);
        Material entry = new()
        {
            Name = "my green tourmaline", Species = "uvite", Variety = "green", Family = "user", Origin = OriginClass.Natural, CrystalSystem = CrystalSystem.Trigonal,
            Indices = OpticalIndices.Uniaxial(new(1.632, 1.66), new(1.612, 1.64)), SpecificGravity = new(3.0, 3.1), IsUserEntry = true,
        };
        Assert.Equal("tourmaline", Assert.Single(table.Attach([entry])).MineralGroup);
        Assert.Null(Assert.Single(table.Attach([entry with { Species = "quartz" }])).MineralGroup);
    }

    [Theory]
    [InlineData("""{"references":[{"key":"a","citation":"A"}],"groups":[{"group":"g","source":"b","species":["x","y"]}]}""", "groups[0] (g): \"source\" must be one of")]
    [InlineData("""{"references":[{"key":"a","citation":"A"}],"groups":[{"source":"a","species":["x","y"]}]}""", "groups[0]: \"group\" must name the group")]
    [InlineData("""{"references":[{"key":"a","citation":"A"}],"groups":[{"group":"g","source":"a","species":["x"]}]}""", "\"species\" must list two or more")]
    [InlineData("""{"references":[{"key":"a","citation":"A"}],"groups":[{"group":"g","source":"a","species":["x","y"]},{"group":"h","source":"a","species":["y","z"]}]}""", "groups[1] (h): species 'y' is blank or already in a group")]
    [InlineData("""{"references":[{"key":"a","citation":"A"}],"groups":[{"group":"g","source":"a","species":["x","y"]},{"group":"g","source":"a","species":["z","w"]}]}""", "groups[1] (g): the group is given twice")]
    [InlineData("""{"references":[{"key":"a","citation":"A"}],"groups":[{"group":"g","source":"b","species":["x"]}]}""", "\"species\" must list two or more")]
    [InlineData("""{"references":[],"groups":[],"extra":1}""", "mineral-groups.json: not valid")]
    [InlineData("""{"references":[]}""", "\"groups\" must be a list")]
    public void A_faulty_table_is_refused_naming_the_fault(string json, string expected)
    {
        var e = Assert.Throws<CatalogueFormatException>(() => MineralGroupTable.Read(json));
        Assert.Contains(e.Errors, m => m.Contains(expected, StringComparison.Ordinal));
    }
}
