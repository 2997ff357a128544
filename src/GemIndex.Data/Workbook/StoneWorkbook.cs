using System.Globalization;
using GemIndex.Data.Batch;
using Microsoft.Data.Sqlite;

namespace GemIndex.Data.Workbook;

/// <summary>
/// The user's stones in one SQLite file. Every change is one transaction, committed before the call returns
/// (WAL, synchronous=FULL), so a killed terminal loses nothing already saved. Each change to a stone is recorded
/// in its edit history with the time from the <see cref="TimeProvider"/> passed in. A file that is not ours
/// (not SQLite, another application's database, a newer schema) is refused with a <see cref="WorkbookException"/>
/// before anything is written to it.
/// </summary>
public sealed class StoneWorkbook : IDisposable
{
    /// <summary>The schema this code writes; a file with a higher user_version is refused.</summary>
    public const int SchemaVersion = 1;

    /// <summary>PRAGMA application_id marking a GemIndex workbook ("GIWB").</summary>
    public const int ApplicationId = 0x47495742;

    private const string Schema = """
        CREATE TABLE stone(
            id INTEGER PRIMARY KEY,
            reference TEXT NOT NULL,
            weight_ct REAL,
            dimensions TEXT NOT NULL,
            shape TEXT NOT NULL,
            cutting_style TEXT NOT NULL,
            transparency TEXT NOT NULL,
            colour TEXT NOT NULL,
            notes TEXT NOT NULL,
            readings TEXT NOT NULL,
            created TEXT NOT NULL,
            modified TEXT NOT NULL);
        CREATE TABLE stone_edit(
            id INTEGER PRIMARY KEY,
            stone_id INTEGER NOT NULL REFERENCES stone(id) ON DELETE CASCADE,
            at TEXT NOT NULL,
            field TEXT NOT NULL,
            before TEXT NOT NULL,
            after TEXT NOT NULL);
        CREATE INDEX stone_edit_stone ON stone_edit(stone_id);
        CREATE TABLE setting(key TEXT PRIMARY KEY, value TEXT NOT NULL);
        """;

    /// <summary>Edits to one field closer together than this are kept as one history entry.</summary>
    public static readonly TimeSpan EditMergeWindow = TimeSpan.FromMinutes(2);

    private readonly SqliteConnection _db;
    private readonly TimeProvider _clock;

    private StoneWorkbook(SqliteConnection db, TimeProvider clock, string path)
    {
        _db = db;
        _clock = clock;
        Path = path;
    }

    /// <summary>The file this workbook is stored in.</summary>
    public string Path { get; }

    /// <summary>Opens the workbook at <paramref name="path"/>, creating it (and its folder) if it does not exist.</summary>
    /// <exception cref="WorkbookException">The file is not a GemIndex workbook, or is from a newer GemIndex; it is left untouched.</exception>
    public static StoneWorkbook Open(string path, TimeProvider clock)
    {
        string full = System.IO.Path.GetFullPath(path);
        if (System.IO.Path.GetDirectoryName(full) is { } dir) Directory.CreateDirectory(dir);
        var db = new SqliteConnection(new SqliteConnectionStringBuilder
        {
            DataSource = full,
            Mode = SqliteOpenMode.ReadWriteCreate,
            Pooling = false,     // pooled handles keep the file and its -wal open after Dispose
            DefaultTimeout = 5,
        }.ToString());
        try
        {
            db.Open();
            var workbook = new StoneWorkbook(db, clock, full);
            workbook.CheckOrCreate();
            return workbook;
        }
        catch (SqliteException e)
        {
            db.Dispose();
            throw new WorkbookException($"{full}: cannot open workbook: {e.Message}", e);
        }
        catch
        {
            db.Dispose();
            throw;
        }
    }

    private void CheckOrCreate()
    {
        long version = Scalar<long>("PRAGMA user_version");      // SQLite error 26 here for a file that is not a database
        long application = Scalar<long>("PRAGMA application_id");
        long tables = Scalar<long>("SELECT count(*) FROM sqlite_schema");
        if (application != ApplicationId && (application != 0 || version != 0 || tables != 0))
            throw new WorkbookException($"{Path}: not a GemIndex workbook (another application's SQLite database, application id {application}, {tables} schema objects); it was left untouched");
        if (version > SchemaVersion)
            throw new WorkbookException($"{Path}: made by a newer GemIndex (workbook schema {version}, this version reads up to {SchemaVersion}); it was left untouched");
        Exec("PRAGMA journal_mode = WAL");
        Exec("PRAGMA synchronous = FULL");
        Exec("PRAGMA foreign_keys = ON");
        if (application == 0)
        {
            using var tx = _db.BeginTransaction();
            Exec(Schema);
            Exec($"PRAGMA application_id = {ApplicationId}");
            Exec($"PRAGMA user_version = {SchemaVersion}");
            tx.Commit();
        }
        else if (version < 1)
            throw new WorkbookException($"{Path}: a GemIndex workbook with no schema version; it was left untouched");
    }

    /// <summary>Stones whose reference, colour or notes contain <paramref name="search"/> (any case), newest change first; all when empty.</summary>
    public IReadOnlyList<StoneSummary> List(string? search = null)
    {
        using var cmd = _db.CreateCommand();
        cmd.CommandText = """
            SELECT id, reference, colour, weight_ct, modified FROM stone
            WHERE $q = '' OR instr(lower(reference), $q) > 0 OR instr(lower(colour), $q) > 0 OR instr(lower(notes), $q) > 0
            ORDER BY modified DESC, id DESC
            """;
        cmd.Parameters.AddWithValue("$q", (search ?? "").Trim().ToLowerInvariant());
        using var r = cmd.ExecuteReader();
        var list = new List<StoneSummary>();
        while (r.Read())
            list.Add(new StoneSummary(r.GetInt64(0), r.GetString(1), r.GetString(2), r.IsDBNull(3) ? null : r.GetDouble(3), Time(r.GetString(4))));
        return list;
    }

    /// <summary>The stone with this id, or null when there is none.</summary>
    /// <exception cref="WorkbookException">Its stored readings cannot be read.</exception>
    public StoneSheet? Get(long id)
    {
        using var cmd = _db.CreateCommand();
        cmd.CommandText = "SELECT id, reference, weight_ct, dimensions, shape, cutting_style, transparency, notes, readings, created, modified FROM stone WHERE id = $id";
        cmd.Parameters.AddWithValue("$id", id);
        using var r = cmd.ExecuteReader();
        if (!r.Read()) return null;
        StoneReadings readings;
        try { readings = StoneReadingsJson.Parse(r.GetString(8)); }
        catch (BatchInputException e) { throw new WorkbookException($"{Path}: stone {id} has unreadable readings: {e.Message}", e); }
        return new StoneSheet
        {
            Id = r.GetInt64(0), Reference = r.GetString(1), WeightCarats = r.IsDBNull(2) ? null : r.GetDouble(2),
            Dimensions = r.GetString(3), Shape = r.GetString(4), CuttingStyle = r.GetString(5), Transparency = r.GetString(6),
            Notes = r.GetString(7), Readings = readings, Created = Time(r.GetString(9)), Modified = Time(r.GetString(10)),
        };
    }

    /// <summary>Adds a new stone (its <see cref="StoneSheet.Id"/> is ignored) and returns it as stored.</summary>
    public StoneSheet Create(StoneSheet stone)
    {
        DateTimeOffset now = _clock.GetUtcNow();
        using var tx = _db.BeginTransaction();
        using var cmd = _db.CreateCommand();
        cmd.CommandText = """
            INSERT INTO stone(reference, weight_ct, dimensions, shape, cutting_style, transparency, colour, notes, readings, created, modified)
            VALUES ($reference, $weight, $dimensions, $shape, $cutting, $transparency, $colour, $notes, $readings, $now, $now)
            RETURNING id
            """;
        Bind(cmd, stone);
        cmd.Parameters.AddWithValue("$now", Stamp(now));
        long id = (long)cmd.ExecuteScalar()!;
        AddEdit(id, now, "created", "", stone.Reference);
        tx.Commit();
        return Get(id)!;
    }

    /// <summary>Writes the stone's fields in one transaction and records each changed field in its history.</summary>
    /// <exception cref="WorkbookException">There is no stone with this id.</exception>
    public StoneSheet Save(StoneSheet stone)
    {
        StoneSheet before = Get(stone.Id) ?? throw new WorkbookException($"{Path}: no stone with id {stone.Id} (deleted?)");
        var changes = Fields(before).Zip(Fields(stone)).Where(p => p.First.Value != p.Second.Value).ToList();
        if (changes.Count == 0) return before;
        DateTimeOffset now = _clock.GetUtcNow();
        using var tx = _db.BeginTransaction();
        using var cmd = _db.CreateCommand();
        cmd.CommandText = """
            UPDATE stone SET reference = $reference, weight_ct = $weight, dimensions = $dimensions, shape = $shape,
              cutting_style = $cutting, transparency = $transparency, colour = $colour, notes = $notes, readings = $readings, modified = $now
            WHERE id = $id
            """;
        Bind(cmd, stone);
        cmd.Parameters.AddWithValue("$now", Stamp(now));
        cmd.Parameters.AddWithValue("$id", stone.Id);
        cmd.ExecuteNonQuery();
        foreach (var (old, updated) in changes)
            if (!ExtendLastEdit(stone.Id, now, old.Field, updated.Value)) AddEdit(stone.Id, now, old.Field, old.Value, updated.Value);
        tx.Commit();
        return Get(stone.Id)!;
    }

    /// <summary>A copy of the stone under the reference "… (copy)", with its own new history.</summary>
    public StoneSheet Duplicate(long id)
    {
        StoneSheet original = Get(id) ?? throw new WorkbookException($"{Path}: no stone with id {id}");
        string reference = original.Reference + " (copy)";
        return Create(original with { Reference = reference, Readings = original.Readings with { Id = reference } });
    }

    /// <summary>Removes the stone and its history; returns false when there was none.</summary>
    public bool Delete(long id)
    {
        using var tx = _db.BeginTransaction();
        using var cmd = _db.CreateCommand();
        cmd.CommandText = "DELETE FROM stone WHERE id = $id";
        cmd.Parameters.AddWithValue("$id", id);
        bool deleted = cmd.ExecuteNonQuery() == 1;
        tx.Commit();
        return deleted;
    }

    /// <summary>The stone's edit history, oldest first.</summary>
    public IReadOnlyList<StoneEdit> History(long id)
    {
        using var cmd = _db.CreateCommand();
        cmd.CommandText = "SELECT at, field, before, after FROM stone_edit WHERE stone_id = $id ORDER BY id";
        cmd.Parameters.AddWithValue("$id", id);
        using var r = cmd.ExecuteReader();
        var list = new List<StoneEdit>();
        while (r.Read()) list.Add(new StoneEdit(Time(r.GetString(0)), r.GetString(1), r.GetString(2), r.GetString(3)));
        return list;
    }

    /// <summary>A bench setting (such as the refractometer's calibration offset), or null when never set.</summary>
    public string? Setting(string key)
    {
        using var cmd = _db.CreateCommand();
        cmd.CommandText = "SELECT value FROM setting WHERE key = $key";
        cmd.Parameters.AddWithValue("$key", key);
        return cmd.ExecuteScalar() as string;
    }

    /// <summary>Stores a bench setting in its own transaction.</summary>
    public void SetSetting(string key, string value)
    {
        using var tx = _db.BeginTransaction();
        using var cmd = _db.CreateCommand();
        cmd.CommandText = "INSERT INTO setting(key, value) VALUES ($key, $value) ON CONFLICT(key) DO UPDATE SET value = excluded.value";
        cmd.Parameters.AddWithValue("$key", key);
        cmd.Parameters.AddWithValue("$value", value);
        cmd.ExecuteNonQuery();
        tx.Commit();
    }

    /// <inheritdoc/>
    public void Dispose() => _db.Dispose();

    private static IEnumerable<(string Field, string Value)> Fields(StoneSheet s)
    {
        yield return ("reference", s.Reference);
        yield return ("weight_ct", s.WeightCarats is { } w ? w.ToString("R", CultureInfo.InvariantCulture) : "");
        yield return ("dimensions", s.Dimensions);
        yield return ("shape", s.Shape);
        yield return ("cutting_style", s.CuttingStyle);
        yield return ("transparency", s.Transparency);
        yield return ("notes", s.Notes);
        yield return ("readings", StoneReadingsJson.Write(s.Readings with { Id = s.Reference }));
    }

    private static void Bind(SqliteCommand cmd, StoneSheet s)
    {
        cmd.Parameters.AddWithValue("$reference", s.Reference);
        cmd.Parameters.AddWithValue("$weight", s.WeightCarats is { } w ? w : DBNull.Value);
        cmd.Parameters.AddWithValue("$dimensions", s.Dimensions);
        cmd.Parameters.AddWithValue("$shape", s.Shape);
        cmd.Parameters.AddWithValue("$cutting", s.CuttingStyle);
        cmd.Parameters.AddWithValue("$transparency", s.Transparency);
        cmd.Parameters.AddWithValue("$colour", s.Readings.Colour ?? "");
        cmd.Parameters.AddWithValue("$notes", s.Notes);
        cmd.Parameters.AddWithValue("$readings", StoneReadingsJson.Write(s.Readings with { Id = s.Reference }));
    }

    /// <summary>
    /// Typing saves on every keystroke; keystrokes to the same field within <see cref="EditMergeWindow"/> of the
    /// stone's last edit make one history entry (before = the value before the first, after = the latest).
    /// </summary>
    private bool ExtendLastEdit(long id, DateTimeOffset now, string field, string after)
    {
        using var cmd = _db.CreateCommand();
        cmd.CommandText = """
            UPDATE stone_edit SET after = $after, at = $at
            WHERE id = (SELECT max(id) FROM stone_edit WHERE stone_id = $id) AND field = $field AND at >= $since
            """;
        cmd.Parameters.AddWithValue("$after", after);
        cmd.Parameters.AddWithValue("$at", Stamp(now));
        cmd.Parameters.AddWithValue("$id", id);
        cmd.Parameters.AddWithValue("$field", field);
        cmd.Parameters.AddWithValue("$since", Stamp(now - EditMergeWindow));
        return cmd.ExecuteNonQuery() == 1;
    }

    private void AddEdit(long id, DateTimeOffset at, string field, string before, string after)
    {
        using var cmd = _db.CreateCommand();
        cmd.CommandText = "INSERT INTO stone_edit(stone_id, at, field, before, after) VALUES ($id, $at, $field, $before, $after)";
        cmd.Parameters.AddWithValue("$id", id);
        cmd.Parameters.AddWithValue("$at", Stamp(at));
        cmd.Parameters.AddWithValue("$field", field);
        cmd.Parameters.AddWithValue("$before", before);
        cmd.Parameters.AddWithValue("$after", after);
        cmd.ExecuteNonQuery();
    }

    private static string Stamp(DateTimeOffset t) => t.ToUniversalTime().ToString("yyyy-MM-dd'T'HH:mm:ss.fffffff'Z'", CultureInfo.InvariantCulture);

    private static DateTimeOffset Time(string s) => DateTimeOffset.Parse(s, CultureInfo.InvariantCulture, DateTimeStyles.AssumeUniversal | DateTimeStyles.AdjustToUniversal);

    private void Exec(string sql)
    {
        using var cmd = _db.CreateCommand();
        cmd.CommandText = sql;
        cmd.ExecuteNonQuery();
    }

    private T Scalar<T>(string sql)
    {
        using var cmd = _db.CreateCommand();
        cmd.CommandText = sql;
        return (T)Convert.ChangeType(cmd.ExecuteScalar()!, typeof(T), CultureInfo.InvariantCulture);
    }
}
