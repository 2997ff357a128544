using GemIndex.Core.Catalogue;
using GemIndex.Core.Observations;
using GemIndex.Core.Optics.Indicatrix;
using Microsoft.Data.Sqlite;

namespace GemIndex.Data.Catalogue;

/// <summary>
/// A catalogue database opened read-only (no pooling, so the file is really closed on Dispose), its schema
/// version checked on open. Loads every material; entries of a user catalogue come back with IsUserEntry set.
/// </summary>
public sealed class CatalogueStore : IDisposable
{
    private readonly SqliteConnection _connection;

    private CatalogueStore(SqliteConnection connection, string path, string kind, long version)
    {
        _connection = connection;
        Path = path;
        Kind = kind;
        SchemaVersion = version;
    }

    /// <summary>The file's schema version: <see cref="CatalogueSchema.Version"/>, or the previous one for a user catalogue not yet written to by this build.</summary>
    public long SchemaVersion { get; }

    /// <summary>The file opened.</summary>
    public string Path { get; }

    /// <summary>"shipped" or "user" (meta 'kind').</summary>
    public string Kind { get; }

    /// <summary>Opens an existing catalogue file read-only.</summary>
    /// <exception cref="CatalogueStoreException">Missing, not a catalogue, or another schema version.</exception>
    public static CatalogueStore Open(string path)
    {
        if (!File.Exists(path)) throw new CatalogueStoreException($"{path}: no such catalogue file");
        SqliteConnection connection = Connect(path, SqliteOpenMode.ReadOnly);
        try
        {
            long version = ReadVersion(connection, path);
            if (version is not (CatalogueSchema.Version or CatalogueSchema.PreviousVersion))
                throw new CatalogueSchemaVersionException(path, version);
            return new CatalogueStore(connection, path, Meta(connection, "kind") ?? "shipped", version);
        }
        catch (SqliteException e)
        {
            connection.Dispose();
            throw new CatalogueStoreException($"{path}: cannot read the catalogue: {e.Message}", e);
        }
        catch
        {
            connection.Dispose();
            throw;
        }
    }

    internal static SqliteConnection Connect(string path, SqliteOpenMode mode)
    {
        var connection = new SqliteConnection(new SqliteConnectionStringBuilder
        {
            DataSource = path,
            Mode = mode,
            Pooling = false,
            DefaultTimeout = 5,
        }.ToString());
        connection.Open();
        return connection;
    }

    internal static long ReadVersion(SqliteConnection connection, string path)
    {
        using SqliteCommand cmd = connection.CreateCommand();
        cmd.CommandText = "PRAGMA user_version";
        long version = (long)cmd.ExecuteScalar()!;
        if (version == 0) throw new CatalogueStoreException($"{path}: not a GemIndex catalogue (no schema version)");
        return version;
    }

    internal static string? Meta(SqliteConnection connection, string key)
    {
        using SqliteCommand cmd = connection.CreateCommand();
        cmd.CommandText = "SELECT value FROM meta WHERE key = $key";
        cmd.Parameters.AddWithValue("$key", key);
        return cmd.ExecuteScalar() as string;
    }

    /// <summary>Every material, in insertion order.</summary>
    /// <exception cref="CatalogueStoreException">The file cannot be read.</exception>
    public IReadOnlyList<Material> LoadAll()
    {
        try { return Load(_connection, Kind == "user", SchemaVersion == CatalogueSchema.PreviousVersion); }
        catch (SqliteException e) { throw new CatalogueStoreException($"{Path}: cannot read the catalogue: {e.Message}", e); }
    }

    internal static IReadOnlyList<Material> Load(SqliteConnection c, bool isUser, bool previousSchema)
    {
        var indices = Children(c, "SELECT material_id, axis, min, max FROM material_index",
            r => (Axis: r.GetString(1), Range: new PropertyRange(r.GetDouble(2), r.GetDouble(3))));
        var polariscope = Children(c, "SELECT material_id, reaction FROM material_polariscope ORDER BY material_id, position",
            r => CatalogueWords.Stored<PolariscopeReaction>(r.GetString(1)));
        var uv = Children(c, "SELECT material_id, wave, strength FROM material_uv ORDER BY material_id, wave, position",
            r => (Wave: r.GetString(1), Strength: CatalogueWords.Stored<FluorescenceStrength>(r.GetString(2))));
        var absorption = Children(c, "SELECT material_id, nanometres, strength FROM material_absorption ORDER BY material_id, position",
            r => new AbsorptionLine(r.GetDouble(1), CatalogueWords.Stored<LineStrength>(r.GetString(2))));
        var sources = Children(c, """
            SELECT s.material_id, s.field, r.key, r.kind, r.citation FROM material_source s JOIN reference r ON r.key = s.reference_key
            ORDER BY s.material_id, s.field
            """, r => (Field: r.GetString(1), Source: new ValueSource(r.GetString(2), CatalogueWords.Stored<SourceKind>(r.GetString(3)), r.GetString(4))));
        var colours = Children(c, "SELECT material_id, colour FROM material_colour ORDER BY material_id, position", r => r.GetString(1));
        // A user catalogue of the previous schema has no usual SG part: read as null, the whole range alike.
        string usual = previousSchema ? "NULL, NULL" : "sg_usual_min, sg_usual_max";
        using SqliteCommand cmd = c.CreateCommand();
        cmd.CommandText = $"""
            SELECT id, name, species, variety, family, origin, crystal_system, optic_character, optic_sign,
                   birefringence_min, birefringence_max, sg_min, sg_max, dispersion, hardness_min, hardness_max,
                   pleochroism, thermal_probe, electrical, frequency, share, forms, opaque, do_not_immerse, notes, stated_fields,
                   {usual}
            FROM material ORDER BY id
            """;
        using SqliteDataReader r = cmd.ExecuteReader();
        var materials = new List<Material>();
        while (r.Read())
        {
            long id = r.GetInt64(0);
            var character = CatalogueWords.Stored<OpticCharacter>(r.GetString(7));
            var own = uv.GetValueOrDefault(id) ?? [];
            materials.Add(new Material
            {
                Name = r.GetString(1), Species = r.GetString(2), Variety = r.GetString(3), Family = r.GetString(4),
                Origin = CatalogueWords.Stored<OriginClass>(r.GetString(5)),
                CrystalSystem = CatalogueWords.Stored<CrystalSystem>(r.GetString(6)),
                Indices = Indices(character, indices.GetValueOrDefault(id) ?? [], r.GetString(1)),
                Sign = CatalogueWords.Stored<OpticSign>(r.GetString(8)),
                Birefringence = OptionalRange(r, 9),
                SpecificGravity = new PropertyRange(r.GetDouble(11), r.GetDouble(12)),
                Dispersion = r.IsDBNull(13) ? null : r.GetDouble(13),
                Hardness = OptionalRange(r, 14),
                SpecificGravityUsual = OptionalRange(r, 26),
                Pleochroism = CatalogueWords.Stored<PleochroismStrength>(r.GetString(16)),
                ThermalProbe = CatalogueWords.Stored<ThermalProbeResult>(r.GetString(17)),
                Electrical = CatalogueWords.Stored<ElectricalResult>(r.GetString(18)),
                SpeciesFrequency = CatalogueWords.Stored<BenchFrequency>(r.GetString(19)),
                Frequency = CatalogueWords.Stored<BenchFrequency>(r.GetString(20)),
                Forms = r.GetString(21).Split(' ', StringSplitOptions.RemoveEmptyEntries)
                    .Aggregate(MaterialForm.None, (all, word) => all | CatalogueWords.Stored<MaterialForm>(word)),
                IsOpaque = r.GetInt64(22) != 0,
                DoNotImmerse = r.GetInt64(23) != 0,
                Notes = r.GetString(24),
                StatedFields = r.GetString(25).Split(' ', StringSplitOptions.RemoveEmptyEntries),
                Sources = (sources.GetValueOrDefault(id) ?? []).ToDictionary(x => x.Field, x => x.Source, StringComparer.Ordinal),
                Polariscope = polariscope.GetValueOrDefault(id) ?? [],
                UvLong = [.. own.Where(u => u.Wave == "long").Select(u => u.Strength)],
                UvShort = [.. own.Where(u => u.Wave == "short").Select(u => u.Strength)],
                AbsorptionLines = absorption.GetValueOrDefault(id) ?? [],
                Colours = colours.GetValueOrDefault(id) ?? [],
                IsUserEntry = isUser,
            });
        }
        return materials;
    }

    private static PropertyRange? OptionalRange(SqliteDataReader r, int column) =>
        r.IsDBNull(column) ? null : new PropertyRange(r.GetDouble(column), r.GetDouble(column + 1));

    private static OpticalIndices Indices(OpticCharacter character, List<(string Axis, PropertyRange Range)> rows, string name)
    {
        PropertyRange Get(string axis) => rows.FirstOrDefault(x => x.Axis == axis) is { Axis: not null } hit
            ? hit.Range
            : throw new CatalogueStoreException($"entry '{name}' has no {axis} index in the catalogue file; rebuild it");
        return character switch
        {
            OpticCharacter.Uniaxial => OpticalIndices.Uniaxial(Get("omega"), Get("epsilon")),
            OpticCharacter.Biaxial => OpticalIndices.Biaxial(Get("alpha"), Get("beta"), Get("gamma")),
            _ => OpticalIndices.SingleIndex(Get("n"), character),
        };
    }

    private static Dictionary<long, List<T>> Children<T>(SqliteConnection c, string sql, Func<SqliteDataReader, T> read)
    {
        var map = new Dictionary<long, List<T>>();
        using SqliteCommand cmd = c.CreateCommand();
        cmd.CommandText = sql;
        using SqliteDataReader r = cmd.ExecuteReader();
        while (r.Read())
        {
            long id = r.GetInt64(0);
            if (!map.TryGetValue(id, out List<T>? list)) map[id] = list = [];
            list.Add(read(r));
        }
        return map;
    }

    /// <inheritdoc />
    public void Dispose() => _connection.Dispose();
}
