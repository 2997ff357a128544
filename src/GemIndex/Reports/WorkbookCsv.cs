using GemIndex.Core.Identification;
using GemIndex.Data.Workbook;
using nietras.SeparatedValues;

namespace GemIndex.Cli.Reports;

/// <summary>
/// A whole workbook as CSV (the leading species and its share first, then the best entry), written by the Sep library (comma-separated, a field quoted when it holds a comma, a
/// quote or a line break, quotes doubled, as RFC 4180 says), one row per stone after a header row. Numbers in the
/// invariant culture, units in the column names. A stone not identified (no result) has empty identification
/// columns. A cell that a spreadsheet would run as a formula is neutralised (<see cref="Neutralised"/>).
/// </summary>
internal static class WorkbookCsv
{
    public static readonly IReadOnlyList<string> Columns =
    [
        "reference", "weight_carats", "colour", "refractive_index_low", "refractive_index_high", "birefringence",
        "optic_character", "specific_gravity", "polariscope", "heavy_liquids", "pleochroism", "dispersion_by_eye",
        "thermal_probe", "electrical", "reflectance_pct", "uv_long", "uv_short", "absorption_lines_nm", "magnification_seen",
        "magnification_not_seen", "species", "species_confidence", "best_candidate", "confidence",
        "no_good_match", "high_above_liquid_limit", "refractometer_method", "refused_entries",
    ];

    /// <summary>Characters that make a spreadsheet read a cell as a formula when they lead it.</summary>
    public const string FormulaTriggers = "=+-@\t\r\0";

    /// <summary>
    /// Writes the stones; <paramref name="refused"/> gives, by stone id, the entries typed at the bench and refused (kept
    /// only in the stone's draft, so in no other column: "field: reason", joined by " | ").
    /// </summary>
    public static void Write(TextWriter output, IEnumerable<(StoneSheet Sheet, IdentificationResult? Result)> stones,
        IReadOnlyDictionary<long, IReadOnlyList<string>>? refused = null) =>
        Table(output, Columns, stones.Select(s => (IReadOnlyList<string>)[.. Cells(s.Sheet, s.Result),
            string.Join(" | ", refused?.GetValueOrDefault(s.Sheet.Id) ?? [])]));

    /// <summary>Writes a header and rows of cells, every cell neutralised and quoted as needed.</summary>
    public static void Table(TextWriter output, IReadOnlyList<string> header, IEnumerable<IReadOnlyList<string>> rows)
    {
        using SepWriter writer = Sep.New(',').Writer(o => o with { Escape = true, CultureInfo = System.Globalization.CultureInfo.InvariantCulture })
            .To(output, leaveOpen: true);
        writer.Header.Add(header);
        foreach (IReadOnlyList<string> cells in rows)
        {
            using SepWriter.Row row = writer.NewRow();
            for (int i = 0; i < header.Count; i++) row[header[i]].Set(Neutralised(cells[i]));
        }
    }

    /// <summary>
    /// A cell starting with =, +, -, @, tab, carriage return or NUL gets a leading apostrophe, so a spreadsheet shows it
    /// as text instead of running it as a formula (OWASP ASVS 5.0 requirement 1.2.10; CWE-1236). A reference
    /// such as "=HYPERLINK(…)" then reads back as "'=HYPERLINK(…)".
    /// </summary>
    public static string Neutralised(string cell) =>
        cell.Length > 0 && FormulaTriggers.Contains(cell[0], StringComparison.Ordinal) ? "'" + cell : cell;

    /// <summary>
    /// How the refractive indices were read: "facet" (a rotation series), "spot", "over limit" (no edge below the contact
    /// liquid: its limit in high_above_liquid_limit), or empty with no refractometer reading.
    /// </summary>
    private static string Method(GemIndex.Data.Batch.RefractometerReadings? r) => r switch
    {
        null => "",
        { OverLimit: true } => "over limit",
        { Spot: not null } => "spot",
        { Readings.Count: > 0 } => "facet",
        _ => "",
    };

    private static string Word(string? word) => word is null ? "" : StoneReport.Word(word);

    private static List<string> Cells(StoneSheet sheet, IdentificationResult? result)
    {
        StoneReport? report = result is null ? null : StoneReport.Build(sheet, result);
        ReportInterpretation? best = report?.Interpretations.FirstOrDefault();
        double? spot = sheet.Readings.Refractometer?.Spot;
        RankedCandidate? top = result?.Candidates.FirstOrDefault();
        SpeciesResult? lead = result?.Species.FirstOrDefault();
        return
        [
            sheet.Reference,
            sheet.WeightCarats is { } ct ? ReportNumbers.Fixed(ct, "0.00#") : "",
            sheet.Readings.Colour ?? "",
            // A spot reading is read to the hundredth (refractometer_method says which it was).
            best is not null ? ReportNumbers.Index(best.Lowest) : spot is { } s ? ReportNumbers.SpotIndex(s) : "",
            // A highest index fitted above the contact liquid was not read: no number for it or the birefringence; the
            // last column gives the liquid's limit it lies above.
            best is { AboveLiquidLimit: null } ? ReportNumbers.Index(best.Highest) : "",
            best is { AboveLiquidLimit: null } ? ReportNumbers.Index(GemIndex.Core.Optics.Birefringence.OfShownIndices(best.Highest, best.Lowest)) : "",   // as the two indices shown, so the row adds up
            report?.Character ?? "",
            report?.SpecificGravity is { } sg ? ReportNumbers.Gravity(sg.Value) : sheet.Readings.Sg is { } given ? ReportNumbers.Gravity(given) : "",
            sheet.Readings.Polariscope is { } p ? StoneReport.Word(p) : "",
            // Every other reading as written at the bench, so that a row holds the stone's readings (a heavy liquid's
            // result is an SG bound the specific_gravity column cannot hold).
            GemIndex.Core.Bench.BenchSyntax.HeavyLiquids(sheet.Readings.HeavyLiquids.Select(h => $"{ReportNumbers.Gravity(h.Density)} {h.Result}")),
            Word(sheet.Readings.Pleochroism), Word(sheet.Readings.Dispersion), Word(sheet.Readings.ThermalProbe),
            Word(sheet.Readings.Electrical),
            sheet.Readings.ReflectancePct is { } reflectance ? ReportNumbers.Fixed(reflectance, "0.0#") : "",
            Word(sheet.Readings.UvLong), Word(sheet.Readings.UvShort),
            sheet.Readings.AbsorptionNm is not { } lines ? "" : lines.Count == 0 ? GemIndex.Core.Bench.BenchSyntax.NoLines
                : string.Join(" ", lines.Select(nm => nm.ToString("0.#", System.Globalization.CultureInfo.InvariantCulture))),
            string.Join(" ", sheet.Readings.FeaturesPresent), string.Join(" ", sheet.Readings.FeaturesAbsent),
            lead?.Species ?? "",
            lead is not null ? ReportNumbers.Probability(lead.Confidence) : "",
            top?.Material.Name ?? "",
            top is not null ? ReportNumbers.Probability(top.Confidence) : "",
            result is null ? "" : result.NoGoodMatch ? "true" : "false",
            best?.AboveLiquidLimit is { } limit ? ReportNumbers.Index(limit)
                : sheet.Readings.Refractometer is { OverLimit: true } over ? ReportNumbers.Index(GemIndex.Core.Bench.BenchDefaults.LiquidLimitOrDefault(over.LiquidLimit)) : "",
            Method(sheet.Readings.Refractometer),
        ];
    }
}
