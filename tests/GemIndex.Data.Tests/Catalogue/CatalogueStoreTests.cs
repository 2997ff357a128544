using GemIndex.Core.Catalogue;
using GemIndex.Data.Catalogue;
using Microsoft.Data.Sqlite;

namespace GemIndex.Data.Tests.Catalogue;

public class CatalogueStoreTests
{
    internal static void SetUserVersion(string path, int version)
    {
        using var c = new SqliteConnection($"Data Source={path};Pooling=False");
        c.Open();
        using SqliteCommand cmd = c.CreateCommand();
        cmd.CommandText = $"PRAGMA user_version = {version}";
        cmd.ExecuteNonQuery();
    }

    [Fact]
    public void A_built_catalogue_loads_back_every_field_of_every_entry()
    {
        using var temp = new TempDirectory();
        string path = temp.File("out/catalogue.db");
        IReadOnlyList<Material> written = CatalogueBuilder.Build(Fixtures.FamilySources, path, "test");
        using CatalogueStore store = CatalogueStore.Open(path);
        IReadOnlyList<Material> read = store.LoadAll();
        Assert.Equal(written.Select(MaterialSnapshot.Of), read.Select(MaterialSnapshot.Of));
        Assert.Equal("shipped", store.Kind);
        Assert.All(read, m => Assert.False(m.IsUserEntry));
    }

    [Fact]
    public void The_built_file_uses_the_delete_journal_and_leaves_no_temporary_file()
    {
        using var temp = new TempDirectory();
        string path = temp.File("catalogue.db");
        CatalogueBuilder.Build(Fixtures.FamilySources, path, "test");
        using var c = new SqliteConnection($"Data Source={path};Mode=ReadOnly;Pooling=False");
        c.Open();
        using SqliteCommand cmd = c.CreateCommand();
        cmd.CommandText = "PRAGMA journal_mode";
        Assert.Equal("delete", cmd.ExecuteScalar());
        Assert.Equal(["catalogue.db"], Directory.GetFiles(temp.Path).Select(Path.GetFileName));
    }

    [Fact]
    public void A_catalogue_of_another_schema_version_is_refused_with_both_versions_named()
    {
        using var temp = new TempDirectory();
        string path = temp.File("catalogue.db");
        CatalogueBuilder.Build(Fixtures.FamilySources, path, "test");
        SetUserVersion(path, 99);
        var e = Assert.Throws<CatalogueSchemaVersionException>(() => CatalogueStore.Open(path));
        Assert.Contains("schema version 99", e.Message, StringComparison.Ordinal);
        Assert.Contains($"reads versions {CatalogueSchema.PreviousVersion} and {CatalogueSchema.Version}", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_file_that_is_not_a_database_is_refused_naming_the_file()
    {
        using var temp = new TempDirectory();
        string path = temp.File("junk.db");
        File.WriteAllText(path, "this is not a database, only text long enough to fill a header of a hundred bytes or so........");
        var e = Assert.Throws<CatalogueStoreException>(() => CatalogueStore.Open(path));
        Assert.StartsWith(path, e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_missing_file_is_refused_naming_the_file()
    {
        using var temp = new TempDirectory();
        var e = Assert.Throws<CatalogueStoreException>(() => CatalogueStore.Open(temp.File("none.db")));
        Assert.Contains("none.db: no such catalogue file", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void An_empty_source_list_builds_an_empty_catalogue()
    {
        using var temp = new TempDirectory();
        CatalogueBuilder.Build([], temp.File("empty.db"), "none");
        using CatalogueStore store = CatalogueStore.Open(temp.File("empty.db"));
        Assert.Empty(store.LoadAll());
    }
}
