using GemIndex.Core.Catalogue;
using Microsoft.Data.Sqlite;

namespace GemIndex.Data.Catalogue;

/// <summary>
/// The user's own catalogue: a SQLite file with the shipped catalogue's schema, created on the first import.
/// Imports are all-or-nothing; a name already used by the shipped catalogue or by an earlier user entry is refused.
/// </summary>
public sealed class UserCatalogue(string path)
{
    /// <summary>The file (it may not exist yet).</summary>
    public string Path { get; } = System.IO.Path.GetFullPath(path);

    /// <summary>The user's entries (IsUserEntry set); none when the file does not exist yet.</summary>
    /// <exception cref="CatalogueStoreException">The file is not a user catalogue or cannot be read.</exception>
    /// <exception cref="CatalogueSchemaVersionException">The file has another schema version (never rebuilt: it is user data).</exception>
    public IReadOnlyList<Material> Load()
    {
        if (!File.Exists(Path)) return [];
        using CatalogueStore store = CatalogueStore.Open(Path);
        if (store.Kind != "user") throw new CatalogueStoreException($"{Path}: this is a {store.Kind} catalogue, not a user catalogue");
        return store.LoadAll();
    }

    /// <summary>Reads, checks and adds every row of a CSV file in one transaction, or nothing if any row is bad.</summary>
    /// <param name="csv">The CSV text (reference-db/README.md, "User catalogue CSV").</param>
    /// <param name="shipped">The shipped catalogue, whose names a user entry may not take and whose species a row may inherit.</param>
    public CatalogueImportResult Import(TextReader csv, FamilyCatalogue shipped)
    {
        ArgumentNullException.ThrowIfNull(shipped);
        (IReadOnlyList<CatalogueCsvRow> rows, IReadOnlyList<CatalogueImportError> readErrors) = CatalogueCsvReader.Read(csv, shipped);
        var errors = new List<CatalogueImportError>(readErrors);
        IReadOnlyList<Material> existing = Load();
        errors.AddRange(CheckRows(rows, shipped, existing));
        if (errors.Count > 0) return new(0, [.. errors.OrderBy(e => e.Line)]);
        bool upgraded = Write(rows.Select(r => r.Material with { IsUserEntry = true }).ToList());
        return new(rows.Count, []) { Upgraded = upgraded };
    }

    private static IEnumerable<CatalogueImportError> CheckRows(IReadOnlyList<CatalogueCsvRow> rows, FamilyCatalogue shipped, IReadOnlyList<Material> existing)
    {
        var shippedNames = shipped.Materials.Select(m => m.Name).ToHashSet(StringComparer.OrdinalIgnoreCase);
        var userNames = existing.Select(m => m.Name).ToHashSet(StringComparer.OrdinalIgnoreCase);
        var seen = new Dictionary<string, int>(StringComparer.OrdinalIgnoreCase);
        foreach (CatalogueCsvRow row in rows)
        {
            IEnumerable<CatalogueFinding> findings = CatalogueCheck.CheckEntry(row.Material);
            if (row.Material.StatedFields.Count > 0 && shipped.Species.TryGetValue(row.Material.Species, out Material? species))
                findings = findings.Concat(CatalogueCheck.CheckAgainstSpecies(row.Material, species));
            foreach (CatalogueFinding f in findings)
                yield return new(row.Line, CatalogueCsvReader.ColumnsOf(f.Field), f.Problem);
            string name = row.Material.Name;
            if (shippedNames.Contains(name))
                yield return new(row.Line, "name", $"'{name}' is the name of a shipped catalogue entry; give your entry another name");
            else if (userNames.Contains(name))
                yield return new(row.Line, "name", $"'{name}' is already in your catalogue");
            else if (seen.TryGetValue(name, out int first))
                yield return new(row.Line, "name", $"'{name}' is also on line {first} (names are compared ignoring case)");
            else seen[name] = row.Line;
        }
    }

    /// <summary>Adds the entries; true when the file was of the previous schema and was brought up to date first.</summary>
    private bool Write(IReadOnlyList<Material> materials)
    {
        Directory.CreateDirectory(System.IO.Path.GetDirectoryName(Path)!);
        try
        {
            using SqliteConnection c = CatalogueStore.Connect(Path, SqliteOpenMode.ReadWriteCreate);
            using SqliteTransaction tx = c.BeginTransaction();
            bool upgraded = false;
            if (IsEmptyFile(c, tx)) CatalogueSchema.Create(c, tx, "user", "");
            else
            {
                long version = CatalogueStore.ReadVersion(c, Path);
                if (version == CatalogueSchema.PreviousVersion) { CatalogueSchema.UpgradePrevious(c, tx); upgraded = true; }
                else if (version != CatalogueSchema.Version) throw new CatalogueSchemaVersionException(Path, version);
            }
            CatalogueWriter.Insert(c, tx, materials);
            tx.Commit();
            return upgraded;
        }
        catch (SqliteException e)
        {
            throw new CatalogueStoreException($"{Path}: cannot write the user catalogue: {e.Message}", e);
        }
    }

    private static bool IsEmptyFile(SqliteConnection c, SqliteTransaction tx)
    {
        using SqliteCommand cmd = c.CreateCommand();
        cmd.Transaction = tx;
        cmd.CommandText = "SELECT count(*) FROM sqlite_schema";
        return (long)cmd.ExecuteScalar()! == 0;
    }
}
