using GemIndex.Core.Quantities;

namespace GemIndex.Data.Catalogue;

/// <summary>
/// Reads a user-catalogue CSV file (format: reference-db/README.md, "User catalogue CSV"): a header row naming
/// the columns, then one entry per line. Lists are separated by ';', a range is two columns X_min and X_max,
/// numbers use a dot. Every row is read; every problem is reported with its line and column.
/// </summary>
public static class CatalogueCsvReader
{
    /// <summary>Columns a file must have.</summary>
    public static IReadOnlyList<string> RequiredColumns { get; } =
    [
        "name", "species", "variety", "origin", "crystal_system", "optic_character", "sg_min", "sg_max",
        "polariscope", "colours", "frequency", "provenance",
    ];

    /// <summary>Columns a file may also have.</summary>
    public static IReadOnlyList<string> OptionalColumns { get; } =
    [
        "family", "optic_sign", "n_min", "n_max", "omega_min", "omega_max", "epsilon_min", "epsilon_max",
        "alpha_min", "alpha_max", "beta_min", "beta_max", "gamma_min", "gamma_max",
        "birefringence_min", "birefringence_max", "dispersion", "hardness_min", "hardness_max", "pleochroism",
        "thermal_probe", "electrical", "uv_long", "uv_short", "absorption_nm", "do_not_immerse", "notes",
    ];

    private static readonly HashSet<string> RangeFields = ["n", "omega", "epsilon", "alpha", "beta", "gamma", "birefringence", "sg", "hardness"];

    /// <summary>The rows that could be read, and every error; the caller imports nothing unless there are no errors.</summary>
    public static (IReadOnlyList<CatalogueCsvRow> Rows, IReadOnlyList<CatalogueImportError> Errors) Read(TextReader reader)
    {
        var rows = new List<CatalogueCsvRow>();
        var errors = new List<CatalogueImportError>();
        string[]? header = null;
        int lineNumber = 0;
        for (string? line; (line = reader.ReadLine()) is not null;)
        {
            lineNumber++;
            if (string.IsNullOrWhiteSpace(line)) continue;
            int n = lineNumber;
            if (!TrySplit(line, out string[] cells, out string splitError)) { errors.Add(new(n, "(line)", splitError)); continue; }
            if (header is null)
            {
                header = [.. cells.Select(c => c.Trim())];
                errors.AddRange(CheckHeader(header, n));
                continue;
            }
            if (cells.Length != header.Length)
            {
                errors.Add(new(n, "(line)", $"{cells.Length} cells, but the header has {header.Length} columns"));
                continue;
            }
            var row = new CsvCells(header, cells, n, errors);
            EntryDocument entry = row.ToEntry();
            var material = EntryMapping.ToMaterial(entry, row.Text("family") ?? "user", (field, problem) =>
            {
                // A cell that did not parse already has its error; the mapping would only add "required" for it.
                if (!row.HasErrorIn(field)) errors.Add(new(n, ColumnsOf(field), problem));
            });
            if (material is not null && !row.HasErrors) rows.Add(new(n, material));
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

    // RFC 4180 quoting within one line: "a, b" and "say ""x""". A quoted field cannot span lines.
    private static bool TrySplit(string line, out string[] cells, out string error)
    {
        var result = new List<string>();
        var cell = new System.Text.StringBuilder();
        bool quoted = false;
        for (int i = 0; i < line.Length; i++)
        {
            char ch = line[i];
            if (quoted)
            {
                if (ch == '"' && i + 1 < line.Length && line[i + 1] == '"') { cell.Append('"'); i++; }
                else if (ch == '"') quoted = false;
                else cell.Append(ch);
            }
            else if (ch == '"') quoted = true;
            else if (ch == ',') { result.Add(cell.ToString()); cell.Clear(); }
            else cell.Append(ch);
        }
        result.Add(cell.ToString());
        cells = [.. result];
        error = quoted ? "a quoted cell is not closed on this line" : "";
        return !quoted;
    }

    private sealed class CsvCells(string[] header, string[] cells, int line, List<CatalogueImportError> errors)
    {
        public bool HasErrors { get; private set; }

        public string? Text(string column)
        {
            int i = Array.IndexOf(header, column);
            return i < 0 || cells[i].Trim().Length == 0 ? null : cells[i].Trim();
        }

        private readonly HashSet<string> _badFields = [];

        public bool HasErrorIn(string field) => _badFields.Contains(field);

        private void Error(string column, string problem)
        {
            _badFields.Add(column.Split('/')[0].Replace("_min", "", StringComparison.Ordinal).Replace("_max", "", StringComparison.Ordinal));
            HasErrors = true;
            errors.Add(new(line, column, problem));
        }

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

        private double[]? Numbers(string column)
        {
            string[]? items = List(column);
            if (items is null) return null;
            var values = new List<double>();
            foreach (string item in items)
            {
                if (BenchNumber.TryParse(item, out double v, out string why)) values.Add(v);
                else Error(column, why);
            }
            return [.. values];
        }

        private bool? Flag(string column) => Text(column)?.ToLowerInvariant() switch
        {
            null => null,
            "true" or "yes" => true,
            "false" or "no" => false,
            var other => Fail(column, $"'{other}' is not true or false"),
        };

        private bool? Fail(string column, string problem) { Error(column, problem); return null; }

        public EntryDocument ToEntry() => new()
        {
            Name = Text("name") ?? "", Species = Text("species") ?? "", Variety = Text("variety") ?? "",
            Origin = Text("origin") ?? "", CrystalSystem = Text("crystal_system") ?? "",
            OpticCharacter = Text("optic_character") ?? "", OpticSign = Text("optic_sign") is "none" ? null : Text("optic_sign"),
            N = Range("n"), Omega = Range("omega"), Epsilon = Range("epsilon"),
            Alpha = Range("alpha"), Beta = Range("beta"), Gamma = Range("gamma"),
            Birefringence = Range("birefringence"), Sg = Range("sg") ?? MissingSg(), Dispersion = Number("dispersion"),
            Hardness = Range("hardness"), Pleochroism = Text("pleochroism"), Polariscope = List("polariscope") ?? [],
            ThermalProbe = Text("thermal_probe"), Electrical = Text("electrical"),
            UvLong = List("uv_long"), UvShort = List("uv_short"), AbsorptionNm = Numbers("absorption_nm"),
            Colours = List("colours") ?? [], Frequency = Text("frequency") ?? "",
            DoNotImmerse = Flag("do_not_immerse"), Notes = Text("notes"), Provenance = Text("provenance") ?? "",
        };

        private double[] MissingSg()
        {
            if (Text("sg_min") is null && Text("sg_max") is null) Error("sg_min/sg_max", "required: the specific gravity range");
            return [1, 1]; // placeholder only: the row already has an error and is never imported
        }
    }
}
