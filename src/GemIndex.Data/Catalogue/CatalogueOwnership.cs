using Microsoft.Data.Sqlite;

namespace GemIndex.Data.Catalogue;

/// <summary>Whether a file is a catalogue this tool built, so <c>catalogue build</c> replaces only its own files.</summary>
public static class CatalogueOwnership
{
    /// <summary>
    /// True for a SQLite file with the catalogue's application id, or one built before the id was stamped (application
    /// id 0 with the catalogue's schema version and 'kind' in its meta table). Read-only; never changes the file.
    /// </summary>
    public static bool IsBuiltCatalogue(string path)
    {
        // The SQLite file header holds the application id (offset 68) and user version (offset 60), big-endian.
        var header = new byte[100];
        using (var file = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.ReadWrite))
            if (file.ReadAtLeast(header, header.Length, throwOnEndOfStream: false) < header.Length) return false;
        if (!header.AsSpan(0, 16).SequenceEqual("SQLite format 3\0"u8)) return false;
        int application = System.Buffers.Binary.BinaryPrimitives.ReadInt32BigEndian(header.AsSpan(68, 4));
        if (application == CatalogueSchema.ApplicationId) return true;
        if (application != 0 || System.Buffers.Binary.BinaryPrimitives.ReadInt32BigEndian(header.AsSpan(60, 4)) < 1) return false;
        try
        {
            // Immutable: a catalogue is written whole (no WAL), and reading it this way leaves no -wal or -shm file.
            using SqliteConnection c = CatalogueStore.Connect("file:" + Uri.EscapeDataString(Path.GetFullPath(path)).Replace("%2F", "/", StringComparison.Ordinal) + "?immutable=1", SqliteOpenMode.ReadOnly);
            if (Long(c, "SELECT count(*) FROM sqlite_schema WHERE type = 'table' AND name = 'meta'") == 0) return false;
            return CatalogueStore.Meta(c, "kind") is "shipped" or "user";
        }
        catch (SqliteException)
        {
            return false;   // not SQLite, or damaged: not something we can call ours
        }
    }

    private static long Long(SqliteConnection c, string sql)
    {
        using SqliteCommand cmd = c.CreateCommand();
        cmd.CommandText = sql;
        return Convert.ToInt64(cmd.ExecuteScalar(), System.Globalization.CultureInfo.InvariantCulture);
    }
}
