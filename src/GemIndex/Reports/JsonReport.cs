using System.Text;
using System.Text.Json;
using GemIndex.Cli.Identification;

namespace GemIndex.Cli.Reports;

/// <summary>
/// A report as JSON: stable snake_case field names, units in the names (<c>weight_carats</c>), finite numbers only
/// (a non-finite number is a bug upstream and throws rather than being written), absent values as null.
/// Version 2 of the shape (version 1 had its own candidates list; the identification is now the result document).
/// </summary>
internal static class JsonReport
{
    public const int ShapeVersion = 2;

    public static string Write(StoneReport report)
    {
        using var stream = new MemoryStream();
        using (var w = new Utf8JsonWriter(stream, new JsonWriterOptions { Indented = true }))
        {
            w.WriteStartObject();
            w.WriteNumber("report_version", ShapeVersion);
            if (report.Header is { } header)
            {
                w.WriteStartObject("header");
                foreach (var f in header.Fields()) w.WriteString(f.Key, f.Value == StoneReport.NotRecorded ? null : f.Value);
                w.WriteEndObject();
            }
            else w.WriteNull("header");
            Stone(w, report);
            Readings(w, report);
            Derived(w, report);
            // The identification in the one result document (docs/result-document.md), as identify --json writes it.
            w.WritePropertyName("result");
            ResultDocument.Write(w, report.Result, explain: true);
            if (report.NoGoodMatch) w.WriteString("no_good_match_statement", StoneReport.NoGoodMatchStatement);
            else w.WriteNull("no_good_match_statement");
            Strings(w, "cautions", report.Cautions);
            w.WriteEndObject();
        }
        return Encoding.UTF8.GetString(stream.ToArray()) + "\n";
    }

    private static void Stone(Utf8JsonWriter w, StoneReport report)
    {
        w.WriteStartObject("stone");
        w.WriteString("reference", report.Reference);
        Number(w, "weight_carats", report.WeightCarats);
        foreach (var f in report.Description.Where(f => f.Key is not ("reference" or "weight")))
            w.WriteString(f.Key, f.Value == StoneReport.NotRecorded ? null : f.Value);
        w.WriteEndObject();
    }

    private static void Readings(Utf8JsonWriter w, StoneReport report)
    {
        w.WriteStartObject("readings");
        w.WriteStartArray("rotation_series");
        foreach (var s in report.Readings.Refractometer?.Readings ?? [])
        {
            w.WriteStartObject();
            Number(w, "rotation_degrees", s.RotationDeg);
            Number(w, "low_index", s.Low);
            Number(w, "high_index", s.High);
            w.WriteEndObject();
        }
        w.WriteEndArray();
        Number(w, "spot_index", report.Readings.Refractometer?.Spot);
        w.WriteBoolean("over_limit", report.Readings.Refractometer?.OverLimit ?? false);
        Number(w, "specific_gravity_given", report.Readings.Sg);
        if (report.Readings.SgWeighing is { } sg)
        {
            w.WriteStartObject("hydrostatic");
            Number(w, "weight_in_air_carats", sg.AirCt);
            Number(w, "weight_in_water_carats", sg.WaterCt);
            Number(w, "water_celsius", sg.WaterC);
            w.WriteEndObject();
        }
        else w.WriteNull("hydrostatic");
        w.WriteStartObject("magnification");
        Features(w, "present", report.Readings.FeaturesPresent);
        Features(w, "absent", report.Readings.FeaturesAbsent);
        w.WriteEndObject();
        w.WriteStartArray("all");
        foreach (var f in report.ReadingFields)
        {
            w.WriteStartObject();
            w.WriteString("field", f.Key);
            w.WriteString("label", f.Label);
            w.WriteString("value", f.Value);
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteEndObject();
    }

    /// <summary>Features seen or looked for and not seen, each with its word, name and meaning.</summary>
    private static void Features(Utf8JsonWriter w, string name, IReadOnlyList<string> words)
    {
        w.WriteStartArray(name);
        foreach (var info in ReportReadings.Features(words))
        {
            w.WriteStartObject();
            w.WriteString("feature", info.Word);
            w.WriteString("name", info.Name);
            w.WriteString("meaning", info.Meaning);
            w.WriteEndObject();
        }
        w.WriteEndArray();
    }

    private static void Derived(Utf8JsonWriter w, StoneReport report)
    {
        w.WriteStartObject("derived");
        w.WriteString("optic_character", report.Character);
        w.WriteString("undetermined_reason", report.UndeterminedReason.Length > 0 ? report.UndeterminedReason : null);
        w.WriteStartArray("interpretations");
        foreach (var i in report.Interpretations)
        {
            w.WriteStartObject();
            w.WriteString("optic_character", i.Character);
            w.WriteString("optic_sign", i.Sign);
            Number(w, "weight", i.Weight);
            Number(w, "lowest_index", i.Lowest);
            Number(w, "beta_index", i.Beta);
            Number(w, "highest_index", i.Highest);
            Number(w, "highest_above_liquid_limit", i.AboveLiquidLimit);
            // A difference of two readings carries the subtraction's last bits (0.008999999999999897): to the fourth decimal.
            Number(w, "birefringence", Math.Round(i.Birefringence, 4));
            Number(w, "birefringence_uncertainty", Math.Round(i.BirefringenceUncertainty, 4));
            w.WriteString("description", i.Description);
            w.WriteEndObject();
        }
        w.WriteEndArray();
        Strings(w, "misreadings", report.Misreadings);
        Number(w, "specific_gravity", report.SpecificGravity?.Value);
        Number(w, "specific_gravity_uncertainty", report.SpecificGravity?.StandardUncertainty);
        w.WriteEndObject();
    }

    private static void Strings(Utf8JsonWriter w, string name, IReadOnlyList<string> items)
    {
        w.WriteStartArray(name);
        foreach (string s in items) w.WriteStringValue(s);
        w.WriteEndArray();
    }

    /// <summary>Writes a finite number, or null when absent.</summary>
    /// <exception cref="InvalidOperationException">The number is NaN or infinite (never written as JSON).</exception>
    private static void Number(Utf8JsonWriter w, string name, double? value)
    {
        if (value is not { } v) { w.WriteNull(name); return; }
        if (!double.IsFinite(v)) throw new InvalidOperationException($"report field {name} is {v}, not a finite number; it cannot be written as JSON");
        w.WriteNumber(name, v);
    }
}
