using System.Globalization;
using System.Text;
using System.Text.Json;

namespace GemIndex.Data.Batch;

/// <summary>
/// Reads and writes one line of the batch format (JSON, one stone per line). Reading is strict where it matters —
/// numbers must be finite JSON numbers, words must be known — and lenient where the format says so: unknown fields
/// are ignored. Errors name the field by its path ("refractometer.readings[1].high").
/// </summary>
public static class StoneReadingsJson
{
    private static readonly JsonDocumentOptions Options = new() { AllowTrailingCommas = false, CommentHandling = JsonCommentHandling.Disallow };

    /// <summary>Parses one line.</summary>
    /// <exception cref="BatchInputException">The line is not valid JSON, or a field has the wrong form.</exception>
    public static StoneReadings Parse(string line)
    {
        JsonDocument doc;
        try { doc = JsonDocument.Parse(line, Options); }
        catch (JsonException e) { throw new BatchInputException("$", "not valid JSON: " + e.Message.Split(" Path: ")[0].Split(" LineNumber: ")[0].TrimEnd('.', ' ', '|')); }
        using (doc)
        {
            var root = doc.RootElement;
            if (root.ValueKind != JsonValueKind.Object) throw new BatchInputException("$", "each line must be one JSON object");
            var id = root.TryGetProperty("id", out var idElement)
                ? idElement.ValueKind switch
                {
                    JsonValueKind.String => idElement.GetString()!,
                    JsonValueKind.Number => idElement.GetRawText(),
                    _ => throw new BatchInputException("id", "must be a string"),
                }
                : throw new BatchInputException("id", "is required");
            return new StoneReadings
            {
                Id = id,
                Refractometer = Optional(root, "refractometer", Refractometer),
                Sg = Optional(root, "sg", e => e.ValueKind == JsonValueKind.Number ? Number(e, "sg") : (double?)null),
                SgWeighing = Optional(root, "sg", e => e.ValueKind == JsonValueKind.Object ? Weighing(e) : e.ValueKind == JsonValueKind.Number ? null
                    : throw new BatchInputException("sg", "must be a number or {\"air_ct\", \"water_ct\", \"water_c\"}")),
                HeavyLiquids = Optional(root, "heavy_liquids", e => Array(e, "heavy_liquids", HeavyLiquid)) ?? [],
                Polariscope = Optional(root, "polariscope", e => Word(e, "polariscope")),
                Pleochroism = Optional(root, "pleochroism", e => Word(e, "pleochroism")),
                Dispersion = Optional(root, "dispersion", e => e.ValueKind == JsonValueKind.Object ? null : Word(e, "dispersion")),
                DispersionIndices = Optional(root, "dispersion", e => e.ValueKind == JsonValueKind.Object
                    ? (Number(Required(e, "nB", "dispersion"), "dispersion.nB"), Number(Required(e, "nG", "dispersion"), "dispersion.nG"))
                    : ((double, double)?)null),
                ThermalProbe = Optional(root, "thermal_probe", e => Word(e, "thermal_probe")),
                Electrical = Optional(root, "electrical", e => Word(e, "electrical")),
                UvLong = Optional(root, "uv_long", e => Word(e, "uv_long")),
                UvShort = Optional(root, "uv_short", e => Word(e, "uv_short")),
                AbsorptionNm = Optional(root, "absorption_nm", e => Array(e, "absorption_nm", (x, path) => Number(x, path))),
                Colour = Optional(root, "colour", e => Word(e, "colour")),
            };
        }
    }

    private static RefractometerReadings Refractometer(JsonElement e)
    {
        if (e.ValueKind != JsonValueKind.Object) throw new BatchInputException("refractometer", "must be an object");
        return new RefractometerReadings
        {
            Method = Optional(e, "method", x => Word(x, "refractometer.method")) ?? "facet",
            LightNm = Optional(e, "light_nm", x => (double?)Number(x, "refractometer.light_nm")),
            LiquidLimit = Optional(e, "liquid_limit", x => (double?)Number(x, "refractometer.liquid_limit")),
            Readings = EvenlySpreadWhenUnrotated(e, Optional(e, "readings", x => Array(x, "refractometer.readings", Step)) ?? []),
            Spot = Optional(e, "spot", x => (double?)Number(x, "refractometer.spot")),
            OverLimit = Optional(e, "over_limit", x => x.ValueKind switch
            {
                JsonValueKind.True => (bool?)true,
                JsonValueKind.False => false,
                _ => throw new BatchInputException("refractometer.over_limit", "must be true or false"),
            }) ?? false,
        };
    }

    /// <summary>
    /// Steps given with no rotation angle at all are taken as read in order, evenly over a half turn (i·180°/n), the
    /// usual way of reading a series; one angle given anywhere means the angles are the user's own (missing ones 0°).
    /// </summary>
    private static List<EdgeReadingEntry> EvenlySpreadWhenUnrotated(JsonElement refractometer, List<EdgeReadingEntry> steps)
    {
        if (!refractometer.TryGetProperty("readings", out var list) || list.ValueKind != JsonValueKind.Array) return steps;
        bool anyRotation = list.EnumerateArray().Any(x => x.ValueKind == JsonValueKind.Object && x.TryGetProperty("rotation_deg", out var r) && r.ValueKind != JsonValueKind.Null);
        return anyRotation ? steps : [.. steps.Select((s, i) => s with { RotationDeg = i * 180.0 / steps.Count })];
    }

    private static EdgeReadingEntry Step(JsonElement e, string path)
    {
        if (e.ValueKind != JsonValueKind.Object) throw new BatchInputException(path, "must be an object {\"rotation_deg\", \"low\", \"high\"}");
        double rotation = Optional(e, "rotation_deg", x => (double?)Number(x, path + ".rotation_deg")) ?? 0;
        double low = Number(Required(e, "low", path), path + ".low");
        double? high = Optional(e, "high", x => (double?)Number(x, path + ".high"));
        return new EdgeReadingEntry(rotation, low, high);
    }

    private static HydrostaticReadings Weighing(JsonElement e) => new(
        Number(Required(e, "air_ct", "sg"), "sg.air_ct"),
        Number(Required(e, "water_ct", "sg"), "sg.water_ct"),
        Optional(e, "water_c", x => (double?)Number(x, "sg.water_c")));

    private static HeavyLiquidReading HeavyLiquid(JsonElement e, string path)
    {
        if (e.ValueKind != JsonValueKind.Object) throw new BatchInputException(path, "must be an object {\"density\", \"result\"}");
        return new HeavyLiquidReading(Number(Required(e, "density", path), path + ".density"), Word(Required(e, "result", path), path + ".result"));
    }

    private static T? Optional<T>(JsonElement parent, string name, Func<JsonElement, T?> read)
    {
        if (!parent.TryGetProperty(name, out var e) || e.ValueKind == JsonValueKind.Null) return default;
        return read(e);
    }

    private static JsonElement Required(JsonElement parent, string name, string path) =>
        parent.TryGetProperty(name, out var e) && e.ValueKind != JsonValueKind.Null ? e : throw new BatchInputException($"{path}.{name}", "is required");

    private static double Number(JsonElement e, string path)
    {
        if (e.ValueKind != JsonValueKind.Number) throw new BatchInputException(path, $"must be a number, not {Shown(e)}");
        if (!e.TryGetDouble(out double v) || !double.IsFinite(v)) throw new BatchInputException(path, $"number out of range: {e.GetRawText()}");
        return v;
    }

    private static string Word(JsonElement e, string path) =>
        e.ValueKind == JsonValueKind.String ? e.GetString()!.Trim() : throw new BatchInputException(path, $"must be a string, not {Shown(e)}");

    private static List<T> Array<T>(JsonElement e, string path, Func<JsonElement, string, T> read)
    {
        if (e.ValueKind != JsonValueKind.Array) throw new BatchInputException(path, $"must be a list, not {Shown(e)}");
        var list = new List<T>();
        int i = 0;
        foreach (var x in e.EnumerateArray()) list.Add(read(x, $"{path}[{i++}]"));
        return list;
    }

    private static string Shown(JsonElement e) => e.ValueKind switch
    {
        JsonValueKind.String => $"the text \"{e.GetString()}\"",
        JsonValueKind.Object => "an object",
        JsonValueKind.Array => "a list",
        _ => e.GetRawText(),
    };

    /// <summary>Writes readings as one line of the batch format (no line break).</summary>
    public static string Write(StoneReadings r)
    {
        using var stream = new MemoryStream();
        using (var w = new Utf8JsonWriter(stream))
        {
            w.WriteStartObject();
            w.WriteString("id", r.Id);
            if (r.Refractometer is { } rf)
            {
                w.WriteStartObject("refractometer");
                w.WriteString("method", rf.Method);
                if (rf.LightNm is { } l) w.WriteNumber("light_nm", l);
                if (rf.LiquidLimit is { } ll) w.WriteNumber("liquid_limit", ll);
                if (rf.Readings.Count > 0)
                {
                    w.WriteStartArray("readings");
                    foreach (var s in rf.Readings)
                    {
                        w.WriteStartObject();
                        w.WriteNumber("rotation_deg", s.RotationDeg);
                        w.WriteNumber("low", s.Low);
                        if (s.High is { } h) w.WriteNumber("high", h);
                        w.WriteEndObject();
                    }
                    w.WriteEndArray();
                }
                if (rf.Spot is { } spot) w.WriteNumber("spot", spot);
                if (rf.OverLimit) w.WriteBoolean("over_limit", true);
                w.WriteEndObject();
            }
            if (r.Sg is { } sg) w.WriteNumber("sg", sg);
            else if (r.SgWeighing is { } wg)
            {
                w.WriteStartObject("sg");
                w.WriteNumber("air_ct", wg.AirCt);
                w.WriteNumber("water_ct", wg.WaterCt);
                if (wg.WaterC is { } t) w.WriteNumber("water_c", t);
                w.WriteEndObject();
            }
            if (r.HeavyLiquids.Count > 0)
            {
                w.WriteStartArray("heavy_liquids");
                foreach (var h in r.HeavyLiquids) { w.WriteStartObject(); w.WriteNumber("density", h.Density); w.WriteString("result", h.Result); w.WriteEndObject(); }
                w.WriteEndArray();
            }
            WriteWord(w, "polariscope", r.Polariscope);
            WriteWord(w, "pleochroism", r.Pleochroism);
            if (r.DispersionIndices is { } d) { w.WriteStartObject("dispersion"); w.WriteNumber("nB", d.NB); w.WriteNumber("nG", d.NG); w.WriteEndObject(); }
            else WriteWord(w, "dispersion", r.Dispersion);
            WriteWord(w, "thermal_probe", r.ThermalProbe);
            WriteWord(w, "electrical", r.Electrical);
            WriteWord(w, "uv_long", r.UvLong);
            WriteWord(w, "uv_short", r.UvShort);
            if (r.AbsorptionNm is { } lines)
            {
                w.WriteStartArray("absorption_nm");
                foreach (double l in lines) w.WriteNumberValue(l);
                w.WriteEndArray();
            }
            WriteWord(w, "colour", r.Colour);
            w.WriteEndObject();
        }
        return Encoding.UTF8.GetString(stream.ToArray());
    }

    private static void WriteWord(Utf8JsonWriter w, string name, string? value)
    {
        if (!string.IsNullOrWhiteSpace(value)) w.WriteString(name, value);
    }

    internal static string Format(double v) => v.ToString("0.####", CultureInfo.InvariantCulture);
}
