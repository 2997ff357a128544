using System.Text;
using System.Text.Json;

namespace GemIndex.Bench.Independent;

/// <summary>
/// Writes a bench sheet as one line of the documented batch format (README "Batch format"), field by field as the
/// README shows them; written here rather than with the reader's own writer, so the reader is tested on text it did
/// not produce.
/// </summary>
internal static class BatchLineWriter
{
    public static string Write(BenchReadings r)
    {
        using var stream = new MemoryStream();
        using (var w = new Utf8JsonWriter(stream))
        {
            w.WriteStartObject();
            w.WriteString("id", r.Id);
            if (r.RefractometerMethod is { } method)
            {
                w.WriteStartObject("refractometer");
                w.WriteString("method", method);
                w.WriteNumber("liquid_limit", r.LiquidLimit);
                if (r.Steps.Count > 0)
                {
                    w.WriteStartArray("readings");
                    foreach (var s in r.Steps)
                    {
                        w.WriteStartObject();
                        w.WriteNumber("rotation_deg", s.RotationDegrees);
                        w.WriteNumber("low", s.Low);
                        if (s.High is { } high) w.WriteNumber("high", high);
                        w.WriteEndObject();
                    }
                    w.WriteEndArray();
                }
                if (r.Spot is { } spot) w.WriteNumber("spot", spot);
                if (r.OverLimit) w.WriteBoolean("over_limit", true);
                w.WriteEndObject();
            }
            if (r.SpecificGravity is { } sg) w.WriteNumber("sg", sg);
            else if (r.Weighing is { } weights)
            {
                w.WriteStartObject("sg");
                w.WriteNumber("air_ct", weights.AirCarats);
                w.WriteNumber("water_ct", weights.WaterCarats);
                if (weights.WaterCelsius is { } celsius) w.WriteNumber("water_c", celsius);
                w.WriteEndObject();
            }
            if (r.HeavyLiquids.Count > 0)
            {
                w.WriteStartArray("heavy_liquids");
                foreach (var h in r.HeavyLiquids)
                {
                    w.WriteStartObject();
                    w.WriteNumber("density", h.Density);
                    w.WriteString("result", h.Result);
                    w.WriteEndObject();
                }
                w.WriteEndArray();
            }
            Word(w, "polariscope", r.Polariscope);
            Word(w, "pleochroism", r.Pleochroism);
            Word(w, "dispersion", r.Dispersion);
            Word(w, "thermal_probe", r.ThermalProbe);
            Word(w, "electrical", r.Electrical);
            Word(w, "uv_long", r.UvLong);
            Word(w, "uv_short", r.UvShort);
            if (r.AbsorptionNanometres is { } lines)
            {
                w.WriteStartArray("absorption_nm");
                foreach (double l in lines) w.WriteNumberValue(l);
                w.WriteEndArray();
            }
            Word(w, "colour", r.Colour);
            if (r.FeaturesPresent is not null || r.FeaturesAbsent is not null)
            {
                w.WriteStartObject("magnification");
                Words(w, "present", r.FeaturesPresent ?? []);
                Words(w, "absent", r.FeaturesAbsent ?? []);
                w.WriteEndObject();
            }
            w.WriteEndObject();
        }
        return Encoding.UTF8.GetString(stream.ToArray());
    }

    private static void Words(Utf8JsonWriter w, string name, IReadOnlyList<string> words)
    {
        w.WriteStartArray(name);
        foreach (string word in words) w.WriteStringValue(word);
        w.WriteEndArray();
    }

    private static void Word(Utf8JsonWriter w, string name, string? value)
    {
        if (value is not null) w.WriteString(name, value);
    }
}
