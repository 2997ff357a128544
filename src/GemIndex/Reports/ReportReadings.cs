using GemIndex.Core.Bench;
using GemIndex.Core.Magnification;
using GemIndex.Data.Batch;

namespace GemIndex.Cli.Reports;

/// <summary>The readings of a stone other than the rotation series table, as labelled lines in words with units.</summary>
internal static class ReportReadings
{
    public static List<ReportField> Fields(StoneReadings r)
    {
        var fields = new List<ReportField>();
        if (r.Refractometer is { } rf)
        {
            fields.Add(new("refractometer_method", "Refractometer method", StoneReport.Word(rf.Method)));
            if (rf.LightNm is { } light) fields.Add(new("light", "Light", ReportNumbers.Nanometres(light)));
            if (rf.LiquidLimit is { } limit) fields.Add(new("liquid_limit", "Contact-liquid limit", $"refractive index {ReportNumbers.Index(limit)}"));
            if (rf.Precision is { } precision) fields.Add(new("precision", "Reading precision", $"± {ReportNumbers.Fixed(precision, "0.000#")} (one standard uncertainty)"));
            // The readings are given as read; the derived indices have the offset added, so the report must say it.
            if (rf.CalibrationOffset is { } offset and not 0)
                fields.Add(new("calibration_offset", "Calibration offset", $"{ReportNumbers.Fixed(offset, "+0.000#;−0.000#")}, added to every reading for the derived indices (the readings are given as read)"));
            if (rf.Spot is { } spot) fields.Add(new("spot", "Spot reading", $"refractive index {ReportNumbers.SpotIndex(spot)}"));
            if (rf.OverLimit) fields.Add(new("over_limit", "Over the limit", "yes: no shadow edge below the contact liquid's limit"));
        }
        if (r.Sg is { } sg) fields.Add(new("sg_given", "Specific gravity (given)", ReportNumbers.Gravity(sg)));
        if (r.SgWeighing is { } w)
        {
            fields.Add(new("weight_in_air", "Weight in air", w.AirCt is { } air ? ReportNumbers.WeighedCarats(air) : StoneReport.NotRecorded));
            fields.Add(new("weight_in_water", "Weight in water", w.WaterCt is { } water ? ReportNumbers.WeighedCarats(water) : StoneReport.NotRecorded));
            fields.Add(new("water_temperature", "Water temperature", w.WaterC is { } t ? ReportNumbers.Celsius(t)
                : $"not given ({ReportNumbers.Celsius(BenchDefaults.WaterCelsius)} assumed)"));
        }
        foreach (var (h, i) in r.HeavyLiquids.Select((h, i) => (h, i)))
            fields.Add(new($"heavy_liquid_{i + 1}", $"Heavy liquid {i + 1}", $"{ReportNumbers.Density(h.Density)}: {StoneReport.Word(h.Result)}"));
        AddWord(fields, BenchField.Polariscope, "Polariscope", r.Polariscope);
        AddWord(fields, BenchField.Pleochroism, "Pleochroism (dichroscope)", r.Pleochroism);
        if (r.DispersionIndices is { } d)
            fields.Add(new(BenchField.Dispersion, "Dispersion", $"nB {ReportNumbers.Index(d.NB)}, nG {ReportNumbers.Index(d.NG)} (refractive indices)"));
        else AddWord(fields, BenchField.Dispersion, "Dispersion (by eye)", r.Dispersion);
        AddWord(fields, BenchField.ThermalProbe, "Thermal probe", r.ThermalProbe);
        AddWord(fields, BenchField.Electrical, "Electrical conductivity", r.Electrical);
        if (r.ReflectancePct is { } reflectance && ReflectanceText(reflectance) is { } said)
            fields.Add(new("reflectance", "Reflectance (meter)", said));
        AddWord(fields, BenchField.UvLong, "Long-wave UV (365 nm)", r.UvLong);
        AddWord(fields, BenchField.UvShort, "Short-wave UV (254 nm)", r.UvShort);
        if (r.AbsorptionNm is { } lines)
            fields.Add(new("absorption", "Spectroscope", lines.Count == 0 ? "looked; no lines seen"
                : "lines or bands at " + string.Join(", ", lines.Select(ReportNumbers.Nanometres))));
        AddWord(fields, BenchField.Cut, "Cut", r.Cut);
        // The transparency is said once, in the description (StoneReport.DescriptionOf).
        foreach (var info in Features(r.FeaturesPresent))
            fields.Add(new($"feature_seen_{info.Word}", $"{info.SeenHow}: {info.Name}", info.WhenSeen));
        foreach (var info in Features(r.FeaturesAbsent))
            fields.Add(new($"feature_not_seen_{info.Word}", $"Looked for, not seen: {info.Name}", info.WhenNotSeen));
        return fields;
    }

    /// <summary>
    /// A reflectance reading with the index it gives, "17.2 % (index about 2.42 ± 0.04)", for the reports and the text UI;
    /// null for one out of range (refused on reading, so never shown as used).
    /// </summary>
    public static string? ReflectanceText(double percent)
    {
        try
        {
            var n = new Core.Observations.ReflectanceReading(percent).Index;
            return $"{ReportNumbers.Fixed(percent, "0.0")} % (index about {ReportNumbers.Fixed(n.Value, "0.00")} ± {ReportNumbers.Fixed(n.StandardUncertainty, "0.00")})";
        }
        catch (Core.Quantities.QuantityOutOfRangeException) { return null; }
    }

    /// <summary>The vocabulary's entries for the words given (a word the vocabulary does not know was refused on reading).</summary>
    public static IEnumerable<MagnificationFeatureInfo> Features(IEnumerable<string> words) =>
        words.Select(MagnificationVocabulary.Find).OfType<MagnificationFeature>().Distinct().Select(MagnificationVocabulary.Of);

    private static void AddWord(List<ReportField> fields, string key, string label, string? word)
    {
        if (!string.IsNullOrWhiteSpace(word)) fields.Add(new(key, label, StoneReport.Word(word.Trim())));
    }
}
