using GemIndex.Core.Catalogue;
using Microsoft.Data.Sqlite;

namespace GemIndex.Data.Catalogue;

/// <summary>Inserts materials into a catalogue database inside the caller's transaction (parameterised SQL only).</summary>
internal static class CatalogueWriter
{
    private const string InsertMaterial = """
        INSERT INTO material(name, species, variety, family, origin, crystal_system, optic_character, optic_sign,
            birefringence_min, birefringence_max, sg_min, sg_max, dispersion, hardness_min, hardness_max,
            pleochroism, thermal_probe, electrical, frequency, share, forms, opaque, do_not_immerse, notes, stated_fields,
            sg_usual_min, sg_usual_max)
        VALUES ($name, $species, $variety, $family, $origin, $system, $character, $sign,
            $bmin, $bmax, $sgmin, $sgmax, $dispersion, $hmin, $hmax,
            $pleochroism, $thermal, $electrical, $frequency, $share, $forms, $opaque, $immerse, $notes, $stated,
            $sgumin, $sgumax)
        RETURNING id
        """;

    public static void Insert(SqliteConnection connection, SqliteTransaction transaction, IReadOnlyList<Material> materials, Action<int>? progress = null)
    {
        InsertReferences(connection, transaction, materials.SelectMany(m => m.Sources.Values).Distinct());
        using SqliteCommand cmd = connection.CreateCommand();
        cmd.Transaction = transaction;
        cmd.CommandText = InsertMaterial;
        int written = 0;
        foreach (Material m in materials)
        {
            cmd.Parameters.Clear();
            AddMaterialParameters(cmd, m);
            long id = (long)cmd.ExecuteScalar()!;
            InsertChildren(connection, transaction, id, m);
            progress?.Invoke(++written);
        }
    }

    private static void AddMaterialParameters(SqliteCommand cmd, Material m)
    {
        SqliteParameterCollection p = cmd.Parameters;
        p.AddWithValue("$name", m.Name);
        p.AddWithValue("$species", m.Species);
        p.AddWithValue("$variety", m.Variety);
        p.AddWithValue("$family", m.Family);
        p.AddWithValue("$origin", CatalogueWords.Of(m.Origin));
        p.AddWithValue("$system", CatalogueWords.Of(m.CrystalSystem));
        p.AddWithValue("$character", CatalogueWords.Of(m.OpticCharacter));
        p.AddWithValue("$sign", CatalogueWords.Of(m.Sign));
        p.AddWithValue("$bmin", (object?)m.Birefringence?.Minimum ?? DBNull.Value);
        p.AddWithValue("$bmax", (object?)m.Birefringence?.Maximum ?? DBNull.Value);
        p.AddWithValue("$sgmin", m.SpecificGravity.Minimum);
        p.AddWithValue("$sgmax", m.SpecificGravity.Maximum);
        p.AddWithValue("$sgumin", (object?)m.SpecificGravityUsual?.Minimum ?? DBNull.Value);
        p.AddWithValue("$sgumax", (object?)m.SpecificGravityUsual?.Maximum ?? DBNull.Value);
        p.AddWithValue("$dispersion", (object?)m.Dispersion ?? DBNull.Value);
        p.AddWithValue("$hmin", (object?)m.Hardness?.Minimum ?? DBNull.Value);
        p.AddWithValue("$hmax", (object?)m.Hardness?.Maximum ?? DBNull.Value);
        p.AddWithValue("$pleochroism", CatalogueWords.Of(m.Pleochroism));
        p.AddWithValue("$thermal", CatalogueWords.Of(m.ThermalProbe));
        p.AddWithValue("$electrical", CatalogueWords.Of(m.Electrical));
        p.AddWithValue("$frequency", CatalogueWords.Of(m.SpeciesFrequency));
        p.AddWithValue("$share", CatalogueWords.Of(m.Frequency));
        p.AddWithValue("$forms", string.Join(' ', CatalogueWords.OfForms(m.Forms)));
        p.AddWithValue("$opaque", m.IsOpaque ? 1 : 0);
        p.AddWithValue("$immerse", m.DoNotImmerse ? 1 : 0);
        p.AddWithValue("$notes", m.Notes);
        p.AddWithValue("$stated", string.Join(' ', m.StatedFields));
    }

    private static void InsertChildren(SqliteConnection c, SqliteTransaction tx, long id, Material m)
    {
        foreach ((string symbol, PropertyRange r) in m.Indices.Named())
            Row(c, tx, "INSERT INTO material_index(material_id, axis, min, max) VALUES ($id, $a, $b, $c)", id, AxisWord(symbol), r.Minimum, r.Maximum);
        for (int i = 0; i < m.Polariscope.Count; i++)
            Row(c, tx, "INSERT INTO material_polariscope(material_id, position, reaction) VALUES ($id, $a, $b)", id, i, CatalogueWords.Of(m.Polariscope[i]));
        for (int i = 0; i < m.UvLong.Count; i++)
            Row(c, tx, "INSERT INTO material_uv(material_id, wave, position, strength) VALUES ($id, 'long', $a, $b)", id, i, CatalogueWords.Of(m.UvLong[i]));
        for (int i = 0; i < m.UvShort.Count; i++)
            Row(c, tx, "INSERT INTO material_uv(material_id, wave, position, strength) VALUES ($id, 'short', $a, $b)", id, i, CatalogueWords.Of(m.UvShort[i]));
        for (int i = 0; i < m.AbsorptionLines.Count; i++)
            Row(c, tx, "INSERT INTO material_absorption(material_id, position, nanometres, strength) VALUES ($id, $a, $b, $c)", id, i,
                m.AbsorptionLines[i].Nanometres, CatalogueWords.Of(m.AbsorptionLines[i].Strength));
        foreach ((string field, ValueSource source) in m.Sources)
            Row(c, tx, "INSERT INTO material_source(material_id, field, reference_key) VALUES ($id, $a, $b)", id, field, source.Key);
        for (int i = 0; i < m.Colours.Count; i++)
            Row(c, tx, "INSERT INTO material_colour(material_id, position, colour) VALUES ($id, $a, $b)", id, i, m.Colours[i]);
    }

    // One row per key; a key already in the file must carry the same kind and citation (one key, one citation).
    private static void InsertReferences(SqliteConnection c, SqliteTransaction tx, IEnumerable<ValueSource> sources)
    {
        foreach (ValueSource s in sources)
        {
            using SqliteCommand find = c.CreateCommand();
            find.Transaction = tx;
            find.CommandText = "SELECT kind, citation FROM reference WHERE key = $key";
            find.Parameters.AddWithValue("$key", s.Key);
            using (SqliteDataReader r = find.ExecuteReader())
            {
                if (r.Read())
                {
                    if (r.GetString(0) != CatalogueWords.Of(s.Kind) || r.GetString(1) != s.Citation)
                        throw new CatalogueStoreException($"reference '{s.Key}' is already in the catalogue file with another citation ('{r.GetString(1)}')");
                    continue;
                }
            }
            using SqliteCommand insert = c.CreateCommand();
            insert.Transaction = tx;
            insert.CommandText = "INSERT INTO reference(key, kind, citation) VALUES ($key, $kind, $citation)";
            insert.Parameters.AddWithValue("$key", s.Key);
            insert.Parameters.AddWithValue("$kind", CatalogueWords.Of(s.Kind));
            insert.Parameters.AddWithValue("$citation", s.Citation);
            insert.ExecuteNonQuery();
        }
    }

    internal static string AxisWord(string symbol) => symbol switch
    {
        "ω" => "omega", "ε" => "epsilon", "α" => "alpha", "β" => "beta", "γ" => "gamma", _ => "n",
    };

    private static void Row(SqliteConnection c, SqliteTransaction tx, string sql, long id, params object[] values)
    {
        using SqliteCommand cmd = c.CreateCommand();
        cmd.Transaction = tx;
        cmd.CommandText = sql;
        cmd.Parameters.AddWithValue("$id", id);
        string[] names = ["$a", "$b", "$c"];
        for (int i = 0; i < values.Length; i++) cmd.Parameters.AddWithValue(names[i], values[i]);
        cmd.ExecuteNonQuery();
    }
}
