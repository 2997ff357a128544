using GemIndex.Data.Catalogue;

namespace GemIndex.Data.Tests.Catalogue;

public class CatalogueLocationsTests
{
    [Fact]
    public void One_folder_holds_the_user_catalogue_and_a_cache_subfolder()
    {
        using var temp = new TempDirectory();
        CatalogueLocations l = CatalogueLocations.Under(temp.Path);
        Assert.Equal(Path.Combine(temp.Path, "user-catalogue.db"), l.UserCataloguePath);
        Assert.Equal(Path.Combine(temp.Path, "cache"), l.CacheDirectory);
    }

    [Fact]
    public void The_default_folders_end_in_a_gemindex_folder()
    {
        // Reads the environment only; nothing is created.
        CatalogueLocations l = CatalogueLocations.FromEnvironment();
        Assert.Contains("gemindex", l.CacheDirectory, StringComparison.Ordinal);
        Assert.Equal("gemindex", Path.GetFileName(l.UserDirectory));
        Assert.NotEqual(l.CacheDirectory, l.UserDirectory);
    }
}
