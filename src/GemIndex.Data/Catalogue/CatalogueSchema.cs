using Microsoft.Data.Sqlite;

namespace GemIndex.Data.Catalogue;

/// <summary>The catalogue database schema (reference-db/schema.sql, embedded) and its version.</summary>
public static class CatalogueSchema
{
    /// <summary>The schema version this build reads and writes (PRAGMA user_version and meta 'schema_version').</summary>
    public const int Version = 3;

    /// <summary>The earlier schema this build still reads, and brings up to <see cref="Version"/> before it writes a user catalogue.</summary>
    public const int PreviousVersion = 2;

    /// <summary>PRAGMA application_id marking a catalogue built by GemIndex ("GICA"), so a build never replaces another file.</summary>
    public const int ApplicationId = 0x47494341;

    /// <summary>The schema's SQL text.</summary>
    public static string Sql { get; } = EmbeddedText("GemIndex.Catalogue.schema.sql");

    /// <summary>Creates the tables and records the version and kind ("shipped" or "user"), inside <paramref name="transaction"/>.</summary>
    public static void Create(SqliteConnection connection, SqliteTransaction transaction, string kind, string sourceHash)
    {
        Execute(connection, transaction, Sql);
        Execute(connection, transaction, $"PRAGMA user_version = {Version}"); // a constant: PRAGMA takes no parameters
        Execute(connection, transaction, $"PRAGMA application_id = {ApplicationId}");
        using SqliteCommand meta = connection.CreateCommand();
        meta.Transaction = transaction;
        meta.CommandText = "INSERT INTO meta(key, value) VALUES ('schema_version', $v), ('kind', $kind), ('source_hash', $hash)";
        meta.Parameters.AddWithValue("$v", Version.ToString(System.Globalization.CultureInfo.InvariantCulture));
        meta.Parameters.AddWithValue("$kind", kind);
        meta.Parameters.AddWithValue("$hash", sourceHash);
        meta.ExecuteNonQuery();
    }

    /// <summary>
    /// Brings a catalogue of <see cref="PreviousVersion"/> up to <see cref="Version"/> inside <paramref name="transaction"/>:
    /// the usual SG part's two columns, empty (every entry's whole range alike, as before). Only a user catalogue is
    /// upgraded; the shipped one is rebuilt from its files.
    /// </summary>
    public static void UpgradePrevious(SqliteConnection connection, SqliteTransaction transaction)
    {
        // A column's CHECK may name other columns; it holds the same rule as the table's CHECK in schema.sql.
        Execute(connection, transaction,
            "ALTER TABLE material ADD COLUMN sg_usual_min REAL; " +
            "ALTER TABLE material ADD COLUMN sg_usual_max REAL CHECK ((sg_usual_min IS NULL) = (sg_usual_max IS NULL) " +
            "AND (sg_usual_min IS NULL OR (sg_min <= sg_usual_min AND sg_usual_min <= sg_usual_max AND sg_usual_max <= sg_max)));");
        Execute(connection, transaction, $"PRAGMA user_version = {Version}");
        using SqliteCommand meta = connection.CreateCommand();
        meta.Transaction = transaction;
        meta.CommandText = "UPDATE meta SET value = $v WHERE key = 'schema_version'";
        meta.Parameters.AddWithValue("$v", Version.ToString(System.Globalization.CultureInfo.InvariantCulture));
        meta.ExecuteNonQuery();
    }

    internal static byte[] EmbeddedBytes(string name)
    {
        using Stream stream = typeof(CatalogueSchema).Assembly.GetManifestResourceStream(name)
            ?? throw new InvalidOperationException($"resource {name} is not embedded in GemIndex.Data");
        using var buffer = new MemoryStream();
        stream.CopyTo(buffer);
        return buffer.ToArray();
    }

    private static string EmbeddedText(string name) => System.Text.Encoding.UTF8.GetString(EmbeddedBytes(name));

    private static void Execute(SqliteConnection connection, SqliteTransaction transaction, string sql)
    {
        using SqliteCommand cmd = connection.CreateCommand();
        cmd.Transaction = transaction;
        cmd.CommandText = sql;
        cmd.ExecuteNonQuery();
    }
}
