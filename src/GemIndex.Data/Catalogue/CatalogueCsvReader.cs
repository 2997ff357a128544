using GemIndex.Core.Catalogue;
using GemIndex.Core.Quantities;
using nietras.SeparatedValues;

namespace GemIndex.Data.Catalogue;

/// <summary>
/// Reads a user-catalogue CSV file (format: reference-db/README.md, "User catalogue CSV") with the Sep library: a
/// header row naming the columns, then one entry per row; quoted cells may hold commas, quotes and line breaks; a
/// byte-order mark is skipped. Lists are separated by ';', a range is two columns X_min and X_max, numbers use a dot.
/// A row may name a shipped species in <c>inherits</c>: it then states only what differs. Every row is read; every
/// problem is reported with its line and column.
/// </summary>
public static class CatalogueCsvReader
{
    /// <summary>Columns every file must have.</summary>
    public static IReadOnlyList<string> RequiredColumns { get; } = ["name", "variety", "origin"];

    /// <summary>Columns a row must fill unless it inherits a shipped species (then it must leave them empty).</summary>
    public static IReadOnlyList<string> SpeciesColumns { get; } = ["species", "crystal_system", "optic_character", "frequency"];

    /// <summary>Columns a file may also have.</summary>
    public static IReadOnlyList<string> OptionalColumns { get; } =
    [
        "inherits", .. SpeciesColumns, "share", "family", "optic_sign", "forms", "opaque", "n_min", "n_max", "omega_min", "omega_max",
        "epsilon_min", "epsilon_max", "alpha_min", "alpha_max", "beta_min", "beta_max", "gamma_min", "gamma_max",
        "birefringence_min", "birefringence_max", "sg_min", "sg_max", "sg_usual_min", "sg_usual_max", "dispersion", "hardness_min", "hardness_max", "pleochroism",
        "polariscope", "thermal_probe", "electrical", "uv_long", "uv_short", "absorption", "colours", "do_not_immerse", "notes",
        "source", "source_kind",
    ];

    private static readonly HashSet<string> RangeFields = ["n", "omega", "epsilon", "alpha", "beta", "gamma", "birefringence", "sg", "sg_usual", "hardness"];

    /// <summary>
    /// The rows that could be read, and every error; the caller imports nothing unless there are no errors.
    /// </summary>
    /// <param name="reader">The CSV text.</param>
    /// <param name="shipped">The shipped catalogue, whose species a row may inherit.</param>
    public static (IReadOnlyList<CatalogueCsvRow> Rows, IReadOnlyList<CatalogueImportError> Errors) Read(TextReader reader, FamilyCatalogue shipped)
    {
        ArgumentNullException.ThrowIfNull(reader);
        ArgumentNullException.ThrowIfNull(shipped);
        string text = reader.ReadToEnd();
        if (text.StartsWith('\uFEFF')) text = text[1..]; // a BOM left by a reader that did not detect the encoding
        var rows = new List<CatalogueCsvRow>();
        var errors = new List<CatalogueImportError>();
        string[]? header = null;
        using SepReader csv = Sep.New(',').Reader(o => o with { HasHeader = false, Unescape = true, DisableColCountCheck = true }).FromText(text);
        foreach (SepReader.Row row in csv)
        {
            int line = row.RowIndex == 0 ? 1 : row.LineNumberFrom; // Sep 0.18 reports the first row as starting on line 2
            if (row.Span.IsWhiteSpace()) continue;
            if (row.Span.Count('"') % 2 != 0) { errors.Add(new(line, "(line)", "a quoted cell is not closed before the end of the file")); continue; }
            string[] cells = new string[row.ColCount];
            for (int i = 0; i < cells.Length; i++) cells[i] = row[i].ToString();
            if (header is null)
            {
                header = [.. cells.Select(c => c.Trim())];
                errors.AddRange(CheckHeader(header, line));
                continue;
            }
            if (cells.Length != header.Length)
            {
                errors.Add(new(line, "(line)", $"{cells.Length} cells, but the header has {header.Length} columns"));
                continue;
            }
            var cellsOfRow = new CsvCells(header, cells, line, errors);
            if (cellsOfRow.ToMaterial(shipped) is { } material && !cellsOfRow.HasErrors) rows.Add(new(line, material));
        }
        if (header is null) errors.Add(new(1, "(header)", "the file is empty; the first line must name the columns"));
        return (rows, errors);
    }

    /// <summary>The CSV column(s) behind a source-file field: "sg" → "sg_min/sg_max".</summary>
    public static string ColumnsOf(string field) => RangeFields.Contains(field) ? $"{field}_min/{field}_max" : field;

    private static IEnumerable<CatalogueImportError> CheckHeader(string[] header, int line)
    {
        foreach (string c in header.Where(c => !RequiredColumns.Contains(c) && !OptionalColumns.Contains(c)))
            yield return new(line, c, $"unknown column '{c}'; the columns are listed in reference-db/README.md");
        foreach (string c in header.GroupBy(c => c).Where(g => g.Count() > 1).Select(g => g.Key))
            yield return new(line, c, "the column appears more than once");
        foreach (string c in RequiredColumns.Where(c => !header.Contains(c)))
            yield return new(line, c, "required column is missing from the header");
    }

    private sealed class CsvCells(string[] header, string[] cells, int line, List<CatalogueImportError> errors)
    {
        private readonly HashSet<string> _badFields = [];

        public bool HasErrors { get; private set; }

        public string? Text(string column)
        {
            int i = Array.IndexOf(header, column);
            return i < 0 || cells[i].Trim().Length == 0 ? null : cells[i].Trim();
        }

        private void Error(string column, string problem)
        {
            _badFields.Add(column.Split('/')[0].Replace("_min", "", StringComparison.Ordinal).Replace("_max", "", StringComparison.Ordinal));
            HasErrors = true;
            errors.Add(new(line, column, problem));
        }

        public Material? ToMaterial(FamilyCatalogue shipped)
        {
            string? inherits = Text("inherits");
            SpeciesDocument? species = null;
            if (inherits is not null && !shipped.SpeciesDocuments.TryGetValue(inherits, out species))
                Error("inherits", $"'{inherits}' is not a species of the shipped catalogue; 'gemindex catalogue list' shows each entry's species");
            foreach (string c in SpeciesColumns)
            {
                if (inherits is not null && Text(c) is not null) Error(c, $"leave it empty: it comes from the inherited species '{inherits}'");
                if (inherits is null && Text(c) is null) Error(c, "required unless the row inherits a shipped species");
            }
            foreach (string c in RequiredColumns.Where(c => Text(c) is null)) Error(c, "required: the cell is empty");
            EntryFieldsDocument own = Fields();
            ValueSource? source = Source(own.Stated().Any(CatalogueFields.Numeric.Contains));
            string share = Text("share") ?? (inherits is null ? Text("frequency") ?? "" : "");
            if (share.Length == 0 && inherits is not null) Error("share", "required when the row inherits: how common this variety is among its species");
            var id = new EntryIdentity(Text("name") ?? "", species?.Species ?? Text("species") ?? "", Text("variety") ?? "", Text("origin") ?? "",
                share, species?.CrystalSystem ?? Text("crystal_system") ?? "", species?.OpticCharacter ?? Text("optic_character") ?? "",
                species?.Frequency ?? Text("frequency") ?? "", Text("family") ?? "user");
            if (HasErrors && inherits is not null && species is null) return null;
            Func<string, ValueSource?> inherited = field =>
                species?.Sources is { } map && (map.TryGetValue(field, out string? key) || map.TryGetValue("*", out key))
                && shipped.References.TryGetValue(key, out ValueSource? s) ? s : null;
            return EntryMapping.Flatten(id, species, inherited, own, _ => source, (field, problem) =>
            {
                // A cell that did not parse already has its error; the mapping would only add "required" for it.
                if (!_badFields.Contains(field)) { HasErrors = true; errors.Add(new(line, ColumnsOf(field), problem)); }
            });
        }

        private ValueSource? Source(bool needed)
        {
            string? citation = Text("source"), kind = Text("source_kind");
            if (citation is null && kind is null)
            {
                if (needed) Error("source", "required for the numbers this row states: who published them, or your own measurements");
                return null;
            }
            if (citation is null) { Error("source", "give the citation with its source_kind"); return null; }
            if (kind is null) { Error("source_kind", $"give one of {CatalogueWords.Expected<SourceKind>()} with the source"); return null; }
            if (!CatalogueWords.TryParse(kind, out SourceKind k)) { Error("source_kind", $"'{kind}' is not one of {CatalogueWords.Expected<SourceKind>()}"); return null; }
            return new ValueSource($"user: {Text("name")}", k, citation);
        }

        private EntryFieldsDocument Fields() => new()
        {
            OpticSign = Text("optic_sign") is "none" ? null : Text("optic_sign"), Forms = List("forms"), Opaque = Flag("opaque"),
            N = Range("n"), Omega = Range("omega"), Epsilon = Range("epsilon"),
            Alpha = Range("alpha"), Beta = Range("beta"), Gamma = Range("gamma"),
            Birefringence = Range("birefringence"), Sg = Range("sg"), SgUsual = Range("sg_usual"), Dispersion = Number("dispersion"),
            Hardness = Range("hardness"), Pleochroism = Text("pleochroism"), Polariscope = List("polariscope"),
            ThermalProbe = Text("thermal_probe"), Electrical = Text("electrical"),
            UvLong = List("uv_long"), UvShort = List("uv_short"), Absorption = Lines("absorption"),
            Colours = List("colours"), DoNotImmerse = Flag("do_not_immerse"), Notes = Text("notes"),
        };

        private double? Number(string column)
        {
            string? t = Text(column);
            if (t is null) return null;
            if (BenchNumber.TryParse(t, out double v, out string why)) return v;
            Error(column, why);
            return null;
        }

        private double[]? Range(string field)
        {
            string lo = $"{field}_min", hi = $"{field}_max";
            double? min = Number(lo), max = Number(hi);
            if (Text(lo) is null != Text(hi) is null) { Error($"{lo}/{hi}", "give both ends of the range (equal for a single value) or neither"); return null; }
            return min is { } a && max is { } b ? [a, b] : null;
        }

        private string[]? List(string column) =>
            Text(column)?.Split(';', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries);

        // "694.2 strong; 668" → 694.2 nm strong, 668 nm moderate.
        private AbsorptionDocument[]? Lines(string column)
        {
            string[]? items = List(column);
            if (items is null) return null;
            var lines = new List<AbsorptionDocument>();
            foreach (string item in items)
            {
                string[] parts = item.Split(' ', StringSplitOptions.RemoveEmptyEntries);
                if (parts.Length > 2) { Error(column, $"'{item}' is not 'nanometres' or 'nanometres strength'"); continue; }
                if (!BenchNumber.TryParse(parts[0], out double nm, out string why)) { Error(column, why); continue; }
                lines.Add(new AbsorptionDocument { Nm = nm, Strength = parts.Length == 2 ? parts[1] : "moderate" });
            }
            return [.. lines];
        }

        private bool? Flag(string column) => Text(column)?.ToLowerInvariant() switch
        {
            null => null,
            "true" or "yes" => true,
            "false" or "no" => false,
            var other => Fail(column, $"'{other}' is not true or false"),
        };

        private bool? Fail(string column, string problem) { Error(column, problem); return null; }
    }
}
