using GemIndex.Core.Catalogue;
using GemIndex.Data.Catalogue;

namespace GemIndex.Data.Tests.Catalogue;

public class UserCatalogueTests
{
    private static readonly FamilyCatalogue Shipped = FamilyFileReader.ReadCatalogue(Fixtures.FamilySources);

    private static CatalogueImportResult Import(UserCatalogue user, string fixture, FamilyCatalogue? shipped = null)
    {
        using var reader = new StreamReader(Fixtures.File(fixture));
        return user.Import(reader, shipped ?? Shipped);
    }

    private static CatalogueImportResult ImportText(UserCatalogue user, string csv) => user.Import(new StringReader(csv), Shipped);

    [Fact]
    public void A_good_file_is_imported_and_its_entries_are_marked_as_user_entries()
    {
        using var temp = new TempDirectory();
        var user = new UserCatalogue(temp.File("user-catalogue.db"));
        CatalogueImportResult result = Import(user, "user-good.csv");
        Assert.True(result.Succeeded, string.Join("\n", result.Errors));
        Assert.Equal(3, result.Imported);
        IReadOnlyList<Material> loaded = user.Load();
        Assert.Equal(["my test citrine", "my test glass", "my test amethyst"], loaded.Select(m => m.Name));
        Assert.All(loaded, m => Assert.True(m.IsUserEntry));
        Assert.Equal("heated, from a test parcel\nkept apart", loaded[0].Notes);
        Assert.Equal(["yellow", "orange"], loaded[0].Colours);
        Assert.Equal("user", loaded[0].Family);
        Assert.Equal(("user: my test citrine", SourceKind.FromMemory), (loaded[0].Sources["sg"].Key, loaded[0].Sources["sg"].Kind));
        Material amethyst = loaded[2];
        Assert.Equal(("quartz", 1.544, new PropertyRange(2.65, 2.65)), (amethyst.Species, amethyst.Indices.Omega!.Value.Minimum, amethyst.SpecificGravity));
        Assert.Equal(["sg", "colours"], amethyst.StatedFields);
    }

    [Fact]
    public void A_file_with_bad_rows_imports_nothing_and_names_each_line_and_field()
    {
        using var temp = new TempDirectory();
        var user = new UserCatalogue(temp.File("user-catalogue.db"));
        CatalogueImportResult result = Import(user, "user-bad.csv");
        Assert.False(result.Succeeded);
        Assert.Equal(0, result.Imported);
        Assert.Equal(
        [
            "line 3, field n_min: '1,50' has a comma: use a dot as the decimal mark (1.544)",
            "line 4, field sg_min/sg_max: specific gravity 2.3–40 is outside the physical range 0.5 to 25 (both excluded)",
            "line 5, field origin: 'imitaton' is not one of natural, synthetic, imitation, treated, composite, cultured",
        ], result.Errors.Select(e => e.ToString()));
        Assert.False(File.Exists(user.Path));
        Assert.Empty(user.Load());
    }

    [Fact]
    public void A_bad_row_in_a_second_import_leaves_the_first_import_untouched()
    {
        using var temp = new TempDirectory();
        var user = new UserCatalogue(temp.File("user-catalogue.db"));
        Assert.True(Import(user, "user-good.csv").Succeeded);
        Assert.False(Import(user, "user-bad.csv").Succeeded);
        Assert.Equal(3, user.Load().Count);
    }

    [Fact]
    public void A_name_used_by_the_shipped_catalogue_is_refused()
    {
        using var temp = new TempDirectory();
        var user = new UserCatalogue(temp.File("user-catalogue.db"));
        string renamed = Fixtures.FamilySources[0].Json.Replace("\"sample rock crystal\"", "\"My Test Citrine\"", StringComparison.Ordinal);
        FamilyCatalogue shipped = FamilyFileReader.ReadCatalogue([new FamilySource(Fixtures.FamilySources[0].FileName, renamed), Fixtures.FamilySources[1]]);
        CatalogueImportResult result = Import(user, "user-good.csv", shipped);
        CatalogueImportError e = Assert.Single(result.Errors);
        Assert.Equal("line 2, field name: 'my test citrine' is the name of a shipped catalogue entry; give your entry another name", e.ToString());
        Assert.False(File.Exists(user.Path));
    }

    [Fact]
    public void Importing_the_same_entries_twice_is_refused()
    {
        using var temp = new TempDirectory();
        var user = new UserCatalogue(temp.File("user-catalogue.db"));
        Assert.True(Import(user, "user-good.csv").Succeeded);
        CatalogueImportResult again = Import(user, "user-good.csv");
        Assert.Equal(["line 2, field name: 'my test citrine' is already in your catalogue", "line 5, field name: 'my test glass' is already in your catalogue",
            "line 6, field name: 'my test amethyst' is already in your catalogue"],
            again.Errors.Select(e => e.ToString()));
    }

    [Fact]
    public void A_check_rule_broken_in_a_row_is_reported_with_its_line()
    {
        using var temp = new TempDirectory();
        var user = new UserCatalogue(temp.File("user-catalogue.db"));
        string csv = File.ReadAllLines(Fixtures.File("user-good.csv"))[0] + "\n"
            + "bad sign,quartz,citrine,treated,trigonal,uniaxial,negative,1.544,1.544,1.553,1.553,0.009,0.009,,,2.65,2.66,crystal,doubly_refractive,yellow,common,,own,from_memory,,\n";
        CatalogueImportError e = Assert.Single(ImportText(user, csv).Errors);
        Assert.Equal(2, e.Line);
        Assert.Equal("optic_sign", e.Field);
    }

    [Fact]
    public void An_inheriting_row_that_repeats_or_leaves_its_species_range_is_refused()
    {
        using var temp = new TempDirectory();
        var user = new UserCatalogue(temp.File("user-catalogue.db"));
        string csv = "name,variety,origin,share,inherits,sg_min,sg_max,source,source_kind\n"
            + "same,amethyst,natural,rare,quartz,2.65,2.66,own,from_memory\n"
            + "wider,amethyst,natural,rare,quartz,2.60,2.66,own,from_memory\n";
        Assert.Equal(["sg_min/sg_max", "sg_min/sg_max"], ImportText(user, csv).Errors.Select(e => e.Field));
        Assert.Contains("repeats", ImportText(user, csv).Errors[0].Problem, StringComparison.Ordinal);
        Assert.Contains("outside its species' range", ImportText(user, csv).Errors[1].Problem, StringComparison.Ordinal);
    }

    [Fact]
    public void Merged_loading_returns_shipped_entries_then_user_entries()
    {
        using var temp = new TempDirectory();
        CatalogueLocations locations = CatalogueLocations.Under(temp.Path);
        Assert.True(Import(new UserCatalogue(locations.UserCataloguePath), "user-good.csv").Succeeded);
        IReadOnlyList<Material> all = MergedCatalogue.Load(locations);
        int shipped = ShippedCatalogue.Sources.Count == 0 ? 0 : FamilyFileReader.ReadAll(ShippedCatalogue.Sources).Count;
        Assert.Equal(shipped + 3, all.Count);
        Assert.All(all.Take(shipped), m => Assert.False(m.IsUserEntry));
        Assert.All(all.Skip(shipped), m => Assert.True(m.IsUserEntry));
        Assert.StartsWith(temp.Path, ShippedCatalogue.EnsureBuilt(locations.CacheDirectory), StringComparison.Ordinal);
    }

    [Fact]
    public void A_user_catalogue_of_another_schema_version_is_refused_not_rebuilt()
    {
        using var temp = new TempDirectory();
        var user = new UserCatalogue(temp.File("user-catalogue.db"));
        Assert.True(Import(user, "user-good.csv").Succeeded);
        CatalogueStoreTests.SetUserVersion(user.Path, 99);
        Assert.Throws<CatalogueSchemaVersionException>(user.Load);
        Assert.Throws<CatalogueSchemaVersionException>(() => Import(user, "user-good.csv"));
    }

    [Fact]
    public void A_user_catalogue_of_the_previous_schema_is_read_and_brought_up_to_date_by_the_next_import()
    {
        // Schema 2 had no usual SG part: the file as an earlier build left it, with its entries untouched.
        using var temp = new TempDirectory();
        var user = new UserCatalogue(temp.File("user-catalogue.db"));
        Assert.True(Import(user, "user-good.csv").Succeeded);
        using (var c = new Microsoft.Data.Sqlite.SqliteConnection($"Data Source={user.Path};Pooling=False"))
        {
            c.Open();
            using var cmd = c.CreateCommand();
            cmd.CommandText = SchemaTwoMaterialTable;
            cmd.ExecuteNonQuery();
        }
        CatalogueStoreTests.SetUserVersion(user.Path, CatalogueSchema.PreviousVersion);
        var before = user.Load();
        Assert.Equal(["my test citrine", "my test glass", "my test amethyst"], before.Select(m => m.Name));
        Assert.All(before, m => Assert.Null(m.SpecificGravityUsual));

        var more = ImportText(user, "name,species,variety,origin,crystal_system,optic_character,n_min,n_max,sg_min,sg_max,forms,polariscope,colours,frequency,source,source_kind,share\n"
            + "my second test glass,glass,glass,imitation,amorphous,amorphous,1.51,1.52,2.45,2.50,amorphous,singly_refractive,green,very_common,invented test data,from_memory,common\n");
        Assert.True(more.Succeeded, string.Join("\n", more.Errors));
        Assert.True(more.Upgraded);
        Assert.False(ImportText(user, "name,species,variety,origin,crystal_system,optic_character,n_min,n_max,sg_min,sg_max,forms,polariscope,colours,frequency,source,source_kind,share\n"
            + "my third test glass,glass,glass,imitation,amorphous,amorphous,1.51,1.52,2.45,2.50,amorphous,singly_refractive,green,very_common,invented test data,from_memory,common\n").Upgraded);
        using (CatalogueStore store = CatalogueStore.Open(user.Path)) Assert.Equal(CatalogueSchema.Version, store.SchemaVersion);
        Assert.Equal(before.Select(MaterialSnapshot.Of), user.Load().Take(3).Select(MaterialSnapshot.Of));
        Assert.Equal(5, user.Load().Count);

        // The upgrade adds the usual part's rule with its columns.
        using var upgraded = new Microsoft.Data.Sqlite.SqliteConnection($"Data Source={user.Path};Pooling=False");
        upgraded.Open();
        using var half = upgraded.CreateCommand();
        half.CommandText = "UPDATE material SET sg_usual_min = sg_min WHERE rowid = (SELECT min(rowid) FROM material)";
        Assert.Contains("CHECK", Assert.Throws<Microsoft.Data.Sqlite.SqliteException>(() => half.ExecuteNonQuery()).Message, StringComparison.Ordinal);
    }

    /// <summary>
    /// Rebuilds <c>material</c> as schema 2 declared it (reference-db/schema.sql before e6095ad), keeping its rows: the
    /// columns cannot simply be dropped, since schema 3's table CHECK names them.
    /// </summary>
    private const string SchemaTwoMaterialTable = """
        PRAGMA foreign_keys = OFF;
        CREATE TABLE material_schema_two (
            id                INTEGER PRIMARY KEY,
            name              TEXT NOT NULL UNIQUE COLLATE NOCASE,
            species           TEXT NOT NULL,
            variety           TEXT NOT NULL,
            family            TEXT NOT NULL,
            origin            TEXT NOT NULL,
            crystal_system    TEXT NOT NULL,
            optic_character   TEXT NOT NULL,
            optic_sign        TEXT NOT NULL,
            birefringence_min REAL,
            birefringence_max REAL,
            sg_min            REAL NOT NULL,
            sg_max            REAL NOT NULL,
            dispersion        REAL,
            hardness_min      REAL,
            hardness_max      REAL,
            pleochroism       TEXT NOT NULL,
            thermal_probe     TEXT NOT NULL,
            electrical        TEXT NOT NULL,
            frequency         TEXT NOT NULL,
            share             TEXT NOT NULL,
            forms             TEXT NOT NULL,
            opaque            INTEGER NOT NULL CHECK (opaque IN (0, 1)),
            do_not_immerse    INTEGER NOT NULL CHECK (do_not_immerse IN (0, 1)),
            notes             TEXT NOT NULL,
            stated_fields     TEXT NOT NULL,
            CHECK (sg_min <= sg_max)
        ) STRICT;
        INSERT INTO material_schema_two
            SELECT id, name, species, variety, family, origin, crystal_system, optic_character, optic_sign,
                   birefringence_min, birefringence_max, sg_min, sg_max, dispersion, hardness_min, hardness_max,
                   pleochroism, thermal_probe, electrical, frequency, share, forms, opaque, do_not_immerse, notes, stated_fields
            FROM material;
        DROP TABLE material;
        ALTER TABLE material_schema_two RENAME TO material;
        UPDATE meta SET value = '2' WHERE key = 'schema_version';
        """;

    [Fact]
    public void The_schema_refuses_a_usual_sg_part_with_one_end_or_outside_the_range_and_a_hardness_with_one_end()
    {
        // The importer's check refuses these first; the schema holds the rule for any other writer of the file.
        using var temp = new TempDirectory();
        var user = new UserCatalogue(temp.File("user-catalogue.db"));
        Assert.True(Import(user, "user-good.csv").Succeeded);
        using var c = new Microsoft.Data.Sqlite.SqliteConnection($"Data Source={user.Path};Pooling=False");
        c.Open();
        foreach (string assignment in new[]
        {
            "sg_usual_min = sg_min",                                  // one end only
            "sg_usual_min = sg_min - 0.1, sg_usual_max = sg_max",     // below the range
            "sg_usual_min = sg_min, sg_usual_max = sg_max + 0.1",     // above the range
            "sg_usual_min = sg_max, sg_usual_max = sg_min",           // reversed
            "hardness_min = NULL, hardness_max = 7",                  // one end only
            "birefringence_min = 0.02, birefringence_max = 0.01",     // reversed
        })
        {
            using var cmd = c.CreateCommand();
            cmd.CommandText = $"UPDATE material SET {assignment} WHERE rowid = (SELECT min(rowid) FROM material)";
            var refused = Assert.Throws<Microsoft.Data.Sqlite.SqliteException>(() => cmd.ExecuteNonQuery());
            Assert.Contains("CHECK", refused.Message, StringComparison.Ordinal);
        }
        using var allowed = c.CreateCommand();
        allowed.CommandText = "UPDATE material SET sg_usual_min = sg_min, sg_usual_max = sg_max WHERE rowid = (SELECT min(rowid) FROM material)";
        Assert.Equal(1, allowed.ExecuteNonQuery());
    }

    [Fact]
    public void A_row_may_give_the_usual_part_of_its_sg_range_and_a_part_outside_the_range_is_refused()
    {
        using var temp = new TempDirectory();
        var user = new UserCatalogue(temp.File("user-catalogue.db"));
        const string Header = "name,species,variety,origin,crystal_system,optic_character,n_min,n_max,sg_min,sg_max,sg_usual_min,sg_usual_max,forms,polariscope,colours,frequency,source,source_kind,share\n";
        var bad = ImportText(user, Header + "my porous test glass,glass,glass,imitation,amorphous,amorphous,1.50,1.52,2.0,2.5,2.4,2.6,amorphous,singly_refractive,white,rare,invented test data,from_memory,rare\n");
        Assert.False(bad.Succeeded);
        Assert.Contains(bad.Errors, e => e.ToString().Contains("sg_usual", StringComparison.Ordinal));
        var good = ImportText(user, Header + "my porous test glass,glass,glass,imitation,amorphous,amorphous,1.50,1.52,2.0,2.5,2.3,2.5,amorphous,singly_refractive,white,rare,invented test data,from_memory,rare\n");
        Assert.True(good.Succeeded, string.Join("\n", good.Errors));
        Material read = Assert.Single(user.Load());
        Assert.Equal((new PropertyRange(2.0, 2.5), (PropertyRange?)new PropertyRange(2.3, 2.5)), (read.SpecificGravity, read.SpecificGravityUsual));
    }
}
