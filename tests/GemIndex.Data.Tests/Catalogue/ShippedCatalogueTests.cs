using GemIndex.Core.Catalogue;
using GemIndex.Data.Catalogue;

namespace GemIndex.Data.Tests.Catalogue;

public class ShippedCatalogueTests
{
    /// <summary>
    /// The least share of shipped entries whose indices, birefringence, SG and dispersion all come from published works
    /// (<see cref="SourcingSummary"/>): 277 of 351 (78.9 %) when the sourced family files landed, 295 of 351 (84.0 %)
    /// after the second sourcing pass. Raise it as more values are sourced; never lower it.
    /// </summary>
    private const double SourcedEntryShareFloor = 0.90;

    [Fact]
    public void The_embedded_sources_are_exactly_the_family_files_in_the_repository()
    {
        string[] onDisk = [.. FamilySource.FromDirectory(Fixtures.RepositoryMaterials).Select(s => s.FileName)];
        Assert.Equal(onDisk, ShippedCatalogue.Sources.Select(s => s.FileName));
    }

    [Fact]
    public void First_use_builds_a_file_named_by_the_content_hash_and_later_uses_reuse_it()
    {
        using var temp = new TempDirectory();
        string path = ShippedCatalogue.EnsureBuilt(temp.Path);
        Assert.Equal(Path.Combine(temp.Path, $"catalogue-{ShippedCatalogue.ContentHash}.db"), path);
        Assert.Matches("^[0-9a-f]{16}$", ShippedCatalogue.ContentHash);
        DateTime built = File.GetLastWriteTimeUtc(path);
        File.SetLastWriteTimeUtc(path, built.AddDays(-1));
        Assert.Equal(path, ShippedCatalogue.EnsureBuilt(temp.Path));
        Assert.Equal(built.AddDays(-1), File.GetLastWriteTimeUtc(path));
    }

    [Fact]
    public void A_cache_file_of_another_schema_version_is_rebuilt()
    {
        using var temp = new TempDirectory();
        string path = ShippedCatalogue.EnsureBuilt(temp.Path);
        CatalogueStoreTests.SetUserVersion(path, 99);
        ShippedCatalogue.EnsureBuilt(temp.Path);
        using CatalogueStore store = CatalogueStore.Open(path); // throws CatalogueSchemaVersionException for version 99
        Assert.Equal(FamilyFileReader.ReadAll(ShippedCatalogue.Sources).Count, store.LoadAll().Count);
        Assert.Equal("shipped", store.Kind);
    }

    [Fact]
    public void The_shipped_catalogue_has_no_check_findings()
    {
        // Asserts on whatever family files reference-db/materials holds today (none is an empty catalogue).
        using var temp = new TempDirectory();
        IReadOnlyList<Material> shipped = ShippedCatalogue.Load(temp.Path);
        Assert.Equal(FamilyFileReader.ReadAll(ShippedCatalogue.Sources).Count, shipped.Count);
        IReadOnlyList<CatalogueFinding> findings = CatalogueCheck.Check(shipped, ShippedCatalogue.Families.Species, ShippedCatalogue.Families.Likes);
        Assert.True(findings.Count == 0, string.Join("\n", findings));
    }

    [Fact]
    public void The_shipped_catalogues_sourced_entry_share_does_not_fall_below_its_floor()
    {
        SourcingSummary s = SourcingSummary.Of(ShippedCatalogue.Families.Materials);
        Assert.True(s.SourcedEntryShare >= SourcedEntryShareFloor,
            $"{s.SourcedEntries} of {s.Entries} entries sourced ({s.SourcedEntryShare:P1}); the floor is {SourcedEntryShareFloor:P1}");
        Assert.Equal(0, s.UnsourcedValues); // every number names a source (a check finding otherwise)
    }

    [Fact]
    public void The_shipped_catalogue_reaches_the_target_of_at_least_200_entries()
    {
        // Expected to fail until the family files land in reference-db/materials (the catalogue's issue target).
        using var temp = new TempDirectory();
        int count = ShippedCatalogue.Load(temp.Path).Count;
        Assert.True(count >= 200, $"the shipped catalogue has {count} entries; the target is at least 200");
    }

    [Theory]
    [InlineData("heated tanzanite", "tanzanite")]
    [InlineData("heated sapphire", "sapphire")]
    [InlineData("heated ruby", "ruby")]
    [InlineData("heated aquamarine", "aquamarine")]
    [InlineData("heated pink topaz", "pink topaz")]
    // A filler sits in fissures and leaves the crystal's indices, SG and chromium spectrum as they were (common practice).
    [InlineData("resin-filled emerald", "emerald")]
    [InlineData("fracture-filled diamond", "diamond")]
    public void A_heated_or_filled_entry_is_written_like_its_untreated_sibling_and_reads_with_its_lines_and_sources(string name, string sibling)
    {
        // Built and loaded as the engine sees it; the likeness from the family files.
        using var temp = new TempDirectory();
        IReadOnlyList<Material> shipped = ShippedCatalogue.Load(temp.Path);
        Material heated = shipped.Single(m => m.Name == name), natural = shipped.Single(m => m.Name == sibling);
        Assert.Equal(sibling, ShippedCatalogue.Families.Likes[name].Sibling.Name);
        Assert.Equal((OriginClass.Treated, OriginClass.Natural), (heated.Origin, natural.Origin));
        Assert.Equal(natural.Species, heated.Species);
        Assert.NotEmpty(natural.AbsorptionLines);
        Assert.Equal(natural.AbsorptionLines, heated.AbsorptionLines);
        Assert.Equal((natural.Indices, natural.SpecificGravity, natural.Pleochroism), (heated.Indices, heated.SpecificGravity, heated.Pleochroism));
        Assert.Equal(natural.UvLong, heated.UvLong);
        Assert.Equal(natural.UvShort, heated.UvShort);
        // A field the heated entry does not write keeps the sibling's source key, so the sourcing counts do not change.
        foreach (string field in natural.Sources.Keys.Except(ShippedCatalogue.Families.Likes[name].OwnFields))
            Assert.Equal(natural.Sources[field].Key, heated.Sources[field].Key);
    }
}
