using GemIndex.Core.Catalogue;
using Microsoft.Data.Sqlite;

namespace GemIndex.Data.Catalogue;

/// <summary>
/// Writes a shipped-catalogue SQLite file from materials, in one transaction, to a temporary file that then
/// replaces the target, so a reader never sees half a catalogue. DELETE journal mode: the file is read-only
/// data, and a WAL file cannot be read from a read-only folder (STACK.md §4).
/// </summary>
public static class CatalogueBuilder
{
    /// <summary>Reads the family files and writes the catalogue to <paramref name="outputPath"/>.</summary>
    /// <returns>The materials written.</returns>
    /// <exception cref="CatalogueFormatException">A family file cannot be read.</exception>
    public static IReadOnlyList<Material> Build(IReadOnlyList<FamilySource> sources, string outputPath, string sourceHash)
    {
        IReadOnlyList<Material> materials = FamilyFileReader.ReadAll(sources);
        Write(materials, outputPath, "shipped", sourceHash);
        return materials;
    }

    /// <summary>Writes materials to a new catalogue file of the given kind ("shipped" or "user").</summary>
    /// <exception cref="CatalogueStoreException">The file cannot be written (for example a name used twice).</exception>
    public static void Write(IReadOnlyList<Material> materials, string outputPath, string kind, string sourceHash, Action<int>? progress = null)
    {
        string full = Path.GetFullPath(outputPath);
        Directory.CreateDirectory(Path.GetDirectoryName(full)!);
        string temporary = $"{full}.{Guid.NewGuid():N}.tmp";
        try
        {
            using (SqliteConnection c = CatalogueStore.Connect(temporary, SqliteOpenMode.ReadWriteCreate))
            {
                using (SqliteCommand journal = c.CreateCommand())
                {
                    journal.CommandText = "PRAGMA journal_mode = DELETE";
                    journal.ExecuteNonQuery();
                }
                using SqliteTransaction tx = c.BeginTransaction();
                CatalogueSchema.Create(c, tx, kind, sourceHash);
                CatalogueWriter.Insert(c, tx, materials, progress);
                tx.Commit();
            }
            File.Move(temporary, full, overwrite: true);
        }
        catch (SqliteException e)
        {
            throw new CatalogueStoreException($"{full}: cannot write the catalogue: {e.Message}", e);
        }
        finally
        {
            if (File.Exists(temporary)) File.Delete(temporary);
        }
    }
}
