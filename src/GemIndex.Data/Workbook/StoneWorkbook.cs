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

    /// <summary>Edits to one field closer together than this, with no other edit between, are one history entry (typing saves on every key).</summary>
    public static readonly TimeSpan EditMergeWindow = TimeSpan.FromMinutes(2);

    /// <summary>The tables and their columns a workbook of <see cref="SchemaVersion"/> has.</summary>
    private static readonly (string Table, string[] Columns)[] Tables =
    [
        ("stone", ["id", "reference", "weight_ct", "dimensions", "shape", "cutting_style", "transparency", "colour", "notes", "readings", "created", "modified"]),
        ("stone_edit", ["id", "stone_id", "at", "field", "before", "after"]),
        ("setting", ["key", "value"]),
    ];

    private readonly SqliteConnection _db;
    private readonly TimeProvider _clock;

    private StoneWorkbook(SqliteConnection db, TimeProvider clock, string path, string? readOnlyReason)
    {
        _db = db;
        _clock = clock;
        Path = path;
        ReadOnlyReason = readOnlyReason;
    }

    /// <summary>The file this workbook is stored in.</summary>
    public string Path { get; }

    /// <summary>Why the workbook is open for reading only ("the file is read-only", …), or null when edits are saved.</summary>
    public string? ReadOnlyReason { get; }

    /// <summary>True when nothing can be saved (see <see cref="ReadOnlyReason"/>).</summary>
    public bool IsReadOnly => ReadOnlyReason is not null;

    /// <summary>
    /// Opens the workbook at <paramref name="path"/>. An existing file is verified first on a read-only connection
    /// (application id, schema version, tables and columns, <c>PRAGMA quick_check</c>, timestamps), so a damaged or
    /// foreign file is refused byte-identical. A read-only file or folder opens for reading only
    /// (<see cref="ReadOnlyReason"/>). A missing or 0-byte file becomes a new workbook only with
    /// <see cref="WorkbookOpening.CreateIfMissing"/>.
    /// </summary>
    /// <exception cref="WorkbookMissingException">No workbook there, and none was asked for.</exception>
    /// <exception cref="WorkbookException">The file cannot be used as a workbook; the message says why in words; it is left untouched.</exception>
    public static StoneWorkbook Open(string path, TimeProvider clock, WorkbookOpening opening = WorkbookOpening.Existing)
    {
        if (string.IsNullOrWhiteSpace(path)) throw new WorkbookException("the workbook path is empty; give a file name");
        string full = System.IO.Path.GetFullPath(path);
        string folder = System.IO.Path.GetDirectoryName(full) ?? ".";
        FileKind.Entry kind = FileKind.Of(full);
        if (kind == FileKind.Entry.Link && File.Exists(full)) kind = FileKind.Of(new FileInfo(full).ResolveLinkTarget(returnFinalTarget: true)!.FullName);
        if (kind is FileKind.Entry.Folder) throw new WorkbookException($"{full}: is a folder, not a workbook file; give the path of the workbook file inside it");
        if (kind is FileKind.Entry.Special) throw new WorkbookException($"{full}: is {FileKind.Describe(kind)}, not a workbook file; it was left untouched");
        bool empty = kind is FileKind.Entry.Missing or FileKind.Entry.Link || new FileInfo(full).Length == 0;
        if (empty)
        {
            if (opening != WorkbookOpening.CreateIfMissing)
                throw new WorkbookMissingException(full, kind == FileKind.Entry.Missing || kind == FileKind.Entry.Link
                    ? $"{full}: no workbook there (no such file{(Directory.Exists(folder) ? "" : ", nor its folder")}); nothing was created"
                    : $"{full}: the file is empty (0 bytes), not a workbook; nothing was written to it");
            return CreateNew(full, folder, clock);
        }
        Verify(full);
        string? readOnly = opening == WorkbookOpening.ReadOnly ? "opened for reading only" : ReadOnlyReasonFor(full, folder);
        SqliteConnection db = Connect(full, readOnly is not null);
        try
        {
            if (readOnly is null)
            {
                Exec(db, "PRAGMA journal_mode = WAL");
                Exec(db, "PRAGMA synchronous = FULL");
                Exec(db, "PRAGMA foreign_keys = ON");
            }
            return new StoneWorkbook(db, clock, full, readOnly);
        }
        catch (SqliteException e) when (readOnly is null && e.SqliteErrorCode is 8 or 14)
        {
            // Permissions the mode bits did not show (a read-only mount, another owner): read it, save nothing.
            db.Dispose();
            return new StoneWorkbook(Connect(full, readOnly: true), clock, full, SqliteProblem.Describe(e));
        }
        catch (SqliteException e)
        {
            db.Dispose();
            throw new WorkbookException($"{full}: cannot open the workbook: {SqliteProblem.Describe(e)}", e);
        }
    }

    private static StoneWorkbook CreateNew(string full, string folder, TimeProvider clock)
    {
        try
        {
            Directory.CreateDirectory(folder);   // the user asked for a new workbook here
            var db = new SqliteConnection(ConnectionString(full, SqliteOpenMode.ReadWriteCreate));
            try
            {
                db.Open();
                Exec(db, "PRAGMA journal_mode = WAL");
                Exec(db, "PRAGMA synchronous = FULL");
                Exec(db, "PRAGMA foreign_keys = ON");
                using (SqliteTransaction tx = db.BeginTransaction())
                {
                    Exec(db, Schema);
                    Exec(db, $"PRAGMA application_id = {ApplicationId}");
                    Exec(db, $"PRAGMA user_version = {SchemaVersion}");
                    tx.Commit();
                }
                return new StoneWorkbook(db, clock, full, null);
            }
            catch
            {
                db.Dispose();
                throw;
            }
        }
        catch (SqliteException e) { throw new WorkbookException($"{full}: cannot create the workbook: {SqliteProblem.Describe(e)}", e); }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        { throw new WorkbookException($"{full}: cannot create the workbook: {(e is UnauthorizedAccessException ? "the folder is read-only or not yours" : e.Message)}", e); }
    }

    /// <summary>Checks an existing file on a read-only connection, so nothing is written to a file that is refused.</summary>
    private static void Verify(string full)
    {
        SqliteConnection db;
        try { db = Connect(full, readOnly: true); }
        catch (SqliteException e) { throw new WorkbookException($"{full}: cannot open the workbook: {SqliteProblem.Describe(e)}; it was left untouched", e); }
        using (db)
        {
            try
            {
                long version = Scalar<long>(db, "PRAGMA user_version");      // SQLite error 26 here for a file that is not a database
                long application = Scalar<long>(db, "PRAGMA application_id");
                long objects = Scalar<long>(db, "SELECT count(*) FROM sqlite_schema");
                if (application != ApplicationId)
                    throw new WorkbookException($"{full}: not a GemIndex workbook (another application's SQLite database, application id {application}, {objects} schema objects); it was left untouched");
                if (version > SchemaVersion)
                    throw new WorkbookException($"{full}: made by a newer GemIndex (workbook schema {version}, this version reads up to {SchemaVersion}); it was left untouched");
                if (version < 1)
                    throw new WorkbookException($"{full}: a GemIndex workbook with no schema version; it was left untouched");
                foreach ((string table, string[] columns) in Tables)
                {
                    var have = new HashSet<string>(StringComparer.OrdinalIgnoreCase);
                    using (SqliteCommand cmd = db.CreateCommand())
                    {
                        cmd.CommandText = $"SELECT name FROM pragma_table_info('{table}')";
                        using SqliteDataReader r = cmd.ExecuteReader();
                        while (r.Read()) have.Add(r.GetString(0));
                    }
                    if (have.Count == 0) throw new WorkbookException($"{full}: the workbook is damaged (its table '{table}' is missing); it was left untouched");
                    if (columns.FirstOrDefault(c => !have.Contains(c)) is { } lost)
                        throw new WorkbookException($"{full}: the workbook is damaged (table '{table}' has no column '{lost}'); it was left untouched");
                }
                string check = Scalar<string>(db, "PRAGMA quick_check(1)");
                if (check != "ok") throw new WorkbookException($"{full}: the workbook is damaged ({Shown(check.Replace("*** in database main ***", "").ReplaceLineEndings(" ").Trim())}); it was left untouched");
                CheckTimes(db, full, "SELECT id, 'created', created FROM stone UNION ALL SELECT id, 'modified', modified FROM stone", "stone");
                CheckTimes(db, full, "SELECT stone_id, 'history time', at FROM stone_edit", "stone");
            }
            catch (SqliteException e) { throw new WorkbookException($"{full}: {SqliteProblem.Describe(e)}; it was left untouched", e); }
        }
    }

    private static void CheckTimes(SqliteConnection db, string full, string sql, string what)
    {
        using SqliteCommand cmd = db.CreateCommand();
        cmd.CommandText = sql;
        using SqliteDataReader r = cmd.ExecuteReader();
        while (r.Read())
            if (r.IsDBNull(2) || !TryTime(r.GetValue(2) as string, out _))
                throw new WorkbookException($"{full}: the workbook is damaged ({what} {r.GetInt64(0)}: its {r.GetString(1)} '{Shown(r.GetValue(2))}' is not a time); it was left untouched");
    }

    private static string Shown(object? value)
    {
        string text = Convert.ToString(value, CultureInfo.InvariantCulture) ?? "";
        return text.Length > 80 ? text[..80] + "…" : text;
    }

    /// <summary>Why this process could not save to the file, judged from the mode bits (root ignores them, the user's intent does not).</summary>
    private static string? ReadOnlyReasonFor(string full, string folder)
    {
        if (OperatingSystem.IsWindows())
            return new FileInfo(full).IsReadOnly ? "the file is read-only" : null;
        if ((File.GetUnixFileMode(full) & (UnixFileMode.UserWrite | UnixFileMode.GroupWrite | UnixFileMode.OtherWrite)) == 0)
            return "the file is read-only";
        if ((File.GetUnixFileMode(folder) & (UnixFileMode.UserWrite | UnixFileMode.GroupWrite | UnixFileMode.OtherWrite)) == 0)
            return "the folder is read-only";
        return null;
    }

    private static SqliteConnection Connect(string full, bool readOnly)
    {
        // Read-only with no -wal file (the last writer closed cleanly): read it as immutable, which needs no -shm or
        // -wal file, so a read-only folder can be read and a report leaves no files behind. In WAL mode the file only
        // changes at a checkpoint; one during the read (a writer closing meanwhile) is reported as an error, never
        // read as data. With a -wal file present, the ordinary read-only open reads the writes it holds.
        bool immutable = readOnly && !File.Exists(full + "-wal");
        var db = new SqliteConnection(immutable
            ? ConnectionString("file:" + Uri.EscapeDataString(full).Replace("%2F", "/", StringComparison.Ordinal) + "?immutable=1", SqliteOpenMode.ReadOnly)
            : ConnectionString(full, readOnly ? SqliteOpenMode.ReadOnly : SqliteOpenMode.ReadWrite));
        try
        {
            db.Open();
            return db;
        }
        catch
        {
            db.Dispose();
            throw;
        }
    }

    private static string ConnectionString(string source, SqliteOpenMode mode) => new SqliteConnectionStringBuilder
    {
        DataSource = source,
        Mode = mode,
        Pooling = false,     // pooled handles keep the file and its -wal open after Dispose
        DefaultTimeout = 5,
    }.ToString();

    /// <summary>Stones whose reference, colour or notes contain <paramref name="search"/> (any case), newest change first; all when empty.</summary>
    /// <exception cref="WorkbookException">A stone's weight is stored as text (the message names the stone and the field), or the file cannot be read.</exception>
    public IReadOnlyList<StoneSummary> List(string? search = null) => Reading(() =>
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
            list.Add(new StoneSummary(r.GetInt64(0), r.GetString(1), r.GetString(2), Number(r, 3, r.GetInt64(0), r.GetString(1)), Time(r.GetString(4))));
        return list;
    });

    /// <summary>The stone with this id, or null when there is none.</summary>
    /// <exception cref="WorkbookException">Its stored readings or weight cannot be read (the message names the stone and field).</exception>
    public StoneSheet? Get(long id) => Reading(() =>
    {
        using var cmd = _db.CreateCommand();
        cmd.CommandText = "SELECT id, reference, weight_ct, dimensions, shape, cutting_style, transparency, notes, readings, created, modified FROM stone WHERE id = $id";
        cmd.Parameters.AddWithValue("$id", id);
        using var r = cmd.ExecuteReader();
        if (!r.Read()) return null;
        string reference = r.GetString(1);
        StoneReadings readings;
        try { readings = StoneReadingsJson.Parse(r.GetString(8)); }
        catch (BatchInputException e) { throw new WorkbookException($"{Path}: stone '{reference}' (id {id}) has unreadable readings: {e.Message}", e); }
        // A stone saved before transparency was a reading carries it only in its description: read it from there, as the
        // text UI's form does, so the stone list and the reports answer as the form will.
        if (readings.Transparency is null && StoneSheet.TransparencyWord(r.GetString(6)) is { } light) readings = readings with { Transparency = light };
        return new StoneSheet
        {
            Id = r.GetInt64(0), Reference = reference, WeightCarats = Number(r, 2, id, reference),
            Dimensions = r.GetString(3), Shape = r.GetString(4), CuttingStyle = r.GetString(5), Transparency = r.GetString(6),
            Notes = r.GetString(7), Readings = readings, Created = Time(r.GetString(9)), Modified = Time(r.GetString(10)),
        };
    });

    /// <summary>Adds a new stone (its <see cref="StoneSheet.Id"/> is ignored) and returns it as stored.</summary>
    public StoneSheet Create(StoneSheet stone) => Writing(() =>
    {
        DateTimeOffset now = _clock.GetUtcNow();
        long id;
        using (var tx = _db.BeginTransaction())
        {
            using var cmd = _db.CreateCommand();
            cmd.CommandText = """
                INSERT INTO stone(reference, weight_ct, dimensions, shape, cutting_style, transparency, colour, notes, readings, created, modified)
                VALUES ($reference, $weight, $dimensions, $shape, $cutting, $transparency, $colour, $notes, $readings, $now, $now)
                RETURNING id
                """;
            Bind(cmd, stone);
            cmd.Parameters.AddWithValue("$now", Stamp(now));
            id = (long)cmd.ExecuteScalar()!;
            AddEdit(id, now, "created", "", stone.Reference);
            tx.Commit();
        }
        return Get(id)!;
    });

    /// <summary>
    /// Saves what this window changed, field by field: each field where <paramref name="edited"/> differs from
    /// <paramref name="lastRead"/> (the stone as this window last read it) is written only if the workbook still holds
    /// the value last read; a field changed elsewhere meanwhile is not written and comes back as a
    /// <see cref="FieldConflict"/> with both values, never resolved silently. One transaction (taken before reading,
    /// so two processes cannot interleave), and one history entry per field written.
    /// </summary>
    /// <exception cref="WorkbookException">There is no stone with this id (deleted elsewhere?), the workbook is read-only, or the disk refused the write.</exception>
    public StoneSaveResult Save(StoneSheet lastRead, StoneSheet edited) => Writing(() =>
    {
        if (lastRead.Id != edited.Id) throw new ArgumentException($"last-read stone {lastRead.Id} and edited stone {edited.Id} differ", nameof(edited));
        SortedDictionary<string, string> read = StoneFields.Of(lastRead), mine = StoneFields.Of(edited);
        var saved = new List<string>();
        var conflicts = new List<FieldConflict>();
        var changes = new List<(string Field, string Before, string After)>();
        using (var tx = _db.BeginTransaction())   // BEGIN IMMEDIATE: the write lock is held from the read on
        {
            StoneSheet stored = Get(edited.Id) ?? throw new WorkbookException($"{Path}: no stone with id {edited.Id} (deleted elsewhere?); nothing was saved");
            SortedDictionary<string, string> now = StoneFields.Of(stored);
            foreach (string field in read.Keys.Union(mine.Keys).Union(now.Keys).Distinct())
            {
                string was = StoneFields.Value(read, field), want = StoneFields.Value(mine, field), there = StoneFields.Value(now, field);
                if (want == was || want == there) continue;
                if (there != was)
                {
                    conflicts.Add(new FieldConflict(field, was, there, want));
                    continue;
                }
                changes.Add((field, there, want));
                if (want.Length == 0) now.Remove(field); else now[field] = want;
            }
            if (changes.Count > 0)
            {
                StoneSheet merged;
                try { merged = StoneFields.Sheet(now, stored); }
                catch (Exception e) when (e is BatchInputException or FormatException)
                { throw new WorkbookException($"{Path}: stone '{stored.Reference}': the readings do not go together after merging another window's edits ({e.Message}); nothing was saved", e); }
                DateTimeOffset at = _clock.GetUtcNow();
                using var cmd = _db.CreateCommand();
                cmd.CommandText = """
                    UPDATE stone SET reference = $reference, weight_ct = $weight, dimensions = $dimensions, shape = $shape,
                      cutting_style = $cutting, transparency = $transparency, colour = $colour, notes = $notes, readings = $readings, modified = $now
                    WHERE id = $id
                    """;
                Bind(cmd, merged);
                cmd.Parameters.AddWithValue("$now", Stamp(at));
                cmd.Parameters.AddWithValue("$id", edited.Id);
                cmd.ExecuteNonQuery();
                foreach ((string field, string before, string after) in changes)
                {
                    if (!ExtendLastEdit(edited.Id, at, field, before, after)) AddEdit(edited.Id, at, field, before, after);
                    saved.Add(field);
                }
            }
            tx.Commit();
        }
        StoneSheet result = Get(edited.Id)!;
        // The window's next last-read stone: what it read, plus what it wrote (or found already written). A field changed
        // only elsewhere keeps the value the window shows, so a later edit of it here is checked against the right value.
        SortedDictionary<string, string> next = new(read, StringComparer.Ordinal);
        var conflicting = conflicts.Select(c => c.Field).ToHashSet(StringComparer.Ordinal);
        foreach (string field in mine.Keys.Union(read.Keys))
            if (!conflicting.Contains(field))
            {
                if (mine.TryGetValue(field, out string? want)) next[field] = want; else next.Remove(field);
            }
        StoneSheet nextLastRead;
        try { nextLastRead = StoneFields.Sheet(next, result); }
        catch (Exception e) when (e is BatchInputException or FormatException) { nextLastRead = lastRead; }
        return new StoneSaveResult(result, saved, conflicts, nextLastRead);
    });

    /// <summary>A copy of the stone under the reference "… (copy)", with its own new history.</summary>
    public StoneSheet Duplicate(long id)
    {
        StoneSheet original = Get(id) ?? throw new WorkbookException($"{Path}: no stone with id {id}");
        string reference = original.Reference + " (copy)";
        return Create(original with { Reference = reference, Readings = original.Readings with { Id = reference } });
    }

    /// <summary>Removes the stone and its history; returns false when there was none.</summary>
    public bool Delete(long id) => Writing(() =>
    {
        using var tx = _db.BeginTransaction();
        using var cmd = _db.CreateCommand();
        cmd.CommandText = "DELETE FROM stone WHERE id = $id";
        cmd.Parameters.AddWithValue("$id", id);
        bool deleted = cmd.ExecuteNonQuery() == 1;
        tx.Commit();
        return deleted;
    });

    /// <summary>The stone's edit history, oldest first: one entry per field change, with its time.</summary>
    public IReadOnlyList<StoneEdit> History(long id) => Reading(() =>
    {
        using var cmd = _db.CreateCommand();
        cmd.CommandText = "SELECT at, field, before, after FROM stone_edit WHERE stone_id = $id ORDER BY id";
        cmd.Parameters.AddWithValue("$id", id);
        using var r = cmd.ExecuteReader();
        var list = new List<StoneEdit>();
        while (r.Read()) list.Add(new StoneEdit(Time(r.GetString(0)), r.GetString(1), r.GetString(2), r.GetString(3)));
        return list;
    });

    /// <summary>A bench setting (such as the refractometer's calibration offset), or null when never set.</summary>
    public string? Setting(string key) => Reading(() =>
    {
        using var cmd = _db.CreateCommand();
        cmd.CommandText = "SELECT value FROM setting WHERE key = $key";
        cmd.Parameters.AddWithValue("$key", key);
        return cmd.ExecuteScalar() as string;
    });

    /// <summary>Stores a bench setting in its own transaction.</summary>
    public void SetSetting(string key, string value) => Writing(() =>
    {
        using var tx = _db.BeginTransaction();
        using var cmd = _db.CreateCommand();
        cmd.CommandText = "INSERT INTO setting(key, value) VALUES ($key, $value) ON CONFLICT(key) DO UPDATE SET value = excluded.value";
        cmd.Parameters.AddWithValue("$key", key);
        cmd.Parameters.AddWithValue("$value", value);
        cmd.ExecuteNonQuery();
        tx.Commit();
        return true;
    });

    /// <inheritdoc/>
    public void Dispose() => _db.Dispose();

    private T Reading<T>(Func<T> read)
    {
        try { return read(); }
        catch (SqliteException e) { throw new WorkbookException($"{Path}: cannot read the workbook: {SqliteProblem.Describe(e)}", e); }
    }

    private T Writing<T>(Func<T> write)
    {
        if (ReadOnlyReason is { } why) throw new WorkbookException($"{Path}: nothing was saved: the workbook is open for reading only ({why})");
        try { return write(); }
        catch (SqliteException e) { throw new WorkbookException($"{Path}: nothing was saved: {SqliteProblem.Describe(e)}", e); }
    }

    private double? Number(SqliteDataReader r, int column, long id, string reference)
    {
        if (r.IsDBNull(column)) return null;
        object value = r.GetValue(column);
        if (value is double or long) return Convert.ToDouble(value, CultureInfo.InvariantCulture);
        throw new WorkbookException($"{Path}: stone '{reference}' (id {id}): its field {r.GetName(column)} holds '{Shown(value)}', not a number; correct it in the workbook");
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
    /// Typing saves on every keystroke: a save of the same field that continues the stone's last history entry
    /// (its after is this save's before) within <see cref="EditMergeWindow"/> extends that entry instead of adding one.
    /// </summary>
    private bool ExtendLastEdit(long id, DateTimeOffset now, string field, string before, string after)
    {
        // The stone's last entry, when it is this field's, recent, and ends where this change begins.
        long row;
        string lastBefore;
        using (var last = _db.CreateCommand())
        {
            last.CommandText = """
                SELECT id, before FROM stone_edit
                WHERE id = (SELECT max(id) FROM stone_edit WHERE stone_id = $id) AND field = $field AND after = $before AND at >= $since
                """;
            last.Parameters.AddWithValue("$id", id);
            last.Parameters.AddWithValue("$field", field);
            last.Parameters.AddWithValue("$before", before);
            last.Parameters.AddWithValue("$since", Stamp(now - EditMergeWindow));
            using var r = last.ExecuteReader();
            if (!r.Read()) return false;
            (row, lastBefore) = (r.GetInt64(0), r.GetString(1));
        }
        // Only a change of the same parts continues it (typing a value); another step edited or removed is an entry of
        // its own, with its own time (a removal had carried an earlier step edit's entry to its time).
        string parts = EditParts.Of(before, after);
        if (EditParts.AddOrRemove(parts) || EditParts.Of(lastBefore, before) != parts) return false;
        using var cmd = _db.CreateCommand();
        // Typing that comes back to where the entry began (3.85 typed over with 3.95, then Ctrl+Z) changed nothing: the
        // entry goes, rather than read "SG changed from '3.85' to '3.85'".
        cmd.CommandText = after == lastBefore ? "DELETE FROM stone_edit WHERE id = $row" : "UPDATE stone_edit SET after = $after, at = $at WHERE id = $row";
        cmd.Parameters.AddWithValue("$after", after);
        cmd.Parameters.AddWithValue("$at", Stamp(now));
        cmd.Parameters.AddWithValue("$row", row);
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

    private static string Stamp(DateTimeOffset t) => t.ToUniversalTime().ToString(StampPattern, CultureInfo.InvariantCulture);

    private const string StampPattern = "yyyy-MM-dd'T'HH:mm:ss.fffffff'Z'";

    private static bool TryTime(string? s, out DateTimeOffset time) =>
        DateTimeOffset.TryParseExact(s, StampPattern, CultureInfo.InvariantCulture, DateTimeStyles.AssumeUniversal | DateTimeStyles.AdjustToUniversal, out time);

    // Verified on open (every stored time has the stamp's form), so a failure here is a file changed since.
    private DateTimeOffset Time(string s) =>
        TryTime(s, out DateTimeOffset t) ? t : throw new WorkbookException($"{Path}: the workbook is damaged (a stored time '{Shown(s)}' is not a time)");

    private static void Exec(SqliteConnection db, string sql)
    {
        using var cmd = db.CreateCommand();
        cmd.CommandText = sql;
        cmd.ExecuteNonQuery();
    }

    private static T Scalar<T>(SqliteConnection db, string sql)
    {
        using var cmd = db.CreateCommand();
        cmd.CommandText = sql;
        return (T)Convert.ChangeType(cmd.ExecuteScalar()!, typeof(T), CultureInfo.InvariantCulture);
    }
}
