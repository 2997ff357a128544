using System.Globalization;
using System.Text.Json;
using GemIndex.Cli.TextUi.Results;
using GemIndex.Core.Magnification;
using GemIndex.Data.Workbook;

namespace GemIndex.Cli.TextUi.Stones;

/// <summary>
/// A stone's edit history in words, one line per field change with its time (UTC): "Colour set to 'blue'",
/// "SG changed from 2.65 to 2.66". A value the store keeps as JSON (the readings) is compared field by field, so the
/// JSON itself is never shown.
/// </summary>
internal static class StoneHistoryText
{
    public const int ValueWidth = 60;

    /// <summary>The trade's words for the store's field names and the batch format's keys.</summary>
    private static readonly Dictionary<string, string> Words = new(StringComparer.Ordinal)
    {
        ["created"] = "stone created", ["reference"] = "reference", ["weight_ct"] = "weight (ct)", ["dimensions"] = "dimensions",
        ["shape"] = "shape", ["cutting_style"] = "cutting style", ["transparency"] = "transparency", ["colour"] = "colour",
        ["notes"] = "notes", ["readings"] = "readings", ["refractometer"] = "RI", ["method"] = "method", ["light_nm"] = "light (nm)",
        ["liquid_limit"] = "liquid limit", ["spot"] = "spot reading", ["over_limit"] = "over the limit", ["rotation_deg"] = "rotation (°)",
        ["low"] = "low edge", ["high"] = "high edge", ["sg"] = "SG", ["air_ct"] = "weight in air (ct)", ["water_ct"] = "weight in water (ct)",
        ["water_c"] = "water (°C)", ["heavy_liquids"] = "heavy liquid", ["density"] = "density", ["result"] = "result",
        ["polariscope"] = "polariscope", ["pleochroism"] = "pleochroism", ["dispersion"] = "fire", ["nB"] = "RI at B", ["nG"] = "RI at G",
        ["thermal_probe"] = "thermal probe", ["electrical"] = "conductivity", ["uv_long"] = "UV long wave", ["uv_short"] = "UV short wave",
        ["absorption_nm"] = "absorption lines (nm)", ["id"] = "reference",
        ["magnification.present"] = "features seen under magnification", ["magnification.absent"] = "features looked for and not seen",
    };

    public static IReadOnlyList<string> Lines(string reference, IReadOnlyList<StoneEdit> edits)
    {
        List<string> changes = [.. edits.SelectMany(e => Describe(e).Select(d => $"{e.At.ToString("yyyy-MM-dd HH:mm:ss", CultureInfo.InvariantCulture)}  {d}"))];
        return [$"History of '{reference}' ({changes.Count} change{(changes.Count == 1 ? "" : "s")}, times in UTC)", "", .. changes];
    }

    /// <summary>One sentence per changed field (several when a JSON value changed in several places).</summary>
    public static IEnumerable<string> Describe(StoneEdit e)
    {
        if (e.Field == "created") return [$"stone created as '{e.After}'"];
        // The transparency reading is the description's first word, whose own change is already said.
        if (e.Field == ReadingsPrefix + "transparency") return [];
        // A reading is stored as JSON ("readings.colour" holds "\"blue\""): its text is read as JSON too.
        bool reading = e.Field == "readings" || e.Field.StartsWith(ReadingsPrefix, StringComparison.Ordinal);
        if (Flatten(e.Before, reading) is { } before && Flatten(e.After, reading) is { } after)
            return before.Keys.Union(after.Keys).Where(k => k != "id" && !(e.Field == "readings" && k == "transparency") && before.GetValueOrDefault(k) != after.GetValueOrDefault(k))
                .Select(k => Change(PathWords(k.Length == 0 ? e.Field : e.Field + "." + k), before.GetValueOrDefault(k), after.GetValueOrDefault(k)));
        return [Change(Label(e.Field), AsRead(e.Field, e.Before), AsRead(e.Field, e.After))];
    }

    /// <summary>A stored number of a field in <see cref="NumberFormats"/> to the places it is read to; anything else as it is.</summary>
    private static string? AsRead(string field, string? value) =>
        value is not null && double.TryParse(value, NumberStyles.Float, CultureInfo.InvariantCulture, out double number)
            && AsRead(field, number) is { } read ? read : value;

    /// <summary>A number of a field (a path's last part names it) in <see cref="NumberFormats"/>, to its places; null for another field.</summary>
    private static string? AsRead(string field, double number) =>
        NumberFormats.TryGetValue(field[(field.LastIndexOf('.') + 1)..], out string? format) ? number.ToString(format, CultureInfo.InvariantCulture) : null;

    private static string Change(string what, string? before, string? after) =>
        (before ?? "", after ?? "") switch
        {
            ("", "") => $"{Capital(what)} left empty",
            ("", var a) => $"{Capital(what)} set to {Shown(a)}",
            (var b, "") => $"{Capital(what)} cleared (was {Shown(b)})",
            var (b, a) => $"{Capital(what)} changed from {Shown(b)} to {Shown(a)}",
        };

    private static string Capital(string s) => ResultText.Capital(s);

    private static string Label(string field) => field.Contains('.') || field.Contains('[') ? PathWords(field) : Words.GetValueOrDefault(field, field.Replace('_', ' '));

    private const string ReadingsPrefix = "readings.";

    /// <summary>
    /// The stored numbers and the places they are read to (a number is stored as 1.77 for 1.770, 4 for an SG of 4.00):
    /// edges and the liquid to the thousandth, a spot reading and an SG to the hundredth, weights to the thousandth of a
    /// carat, as they are typed and shown everywhere else.
    /// </summary>
    private static readonly Dictionary<string, string> NumberFormats = new(StringComparer.Ordinal)
    {
        ["low"] = "0.000#", ["high"] = "0.000#", ["liquid_limit"] = "0.000#", ["spot"] = "0.00#",
        ["sg"] = "0.00#", ["density"] = "0.00#", ["air_ct"] = "0.000#", ["water_ct"] = "0.000#", ["weight_ct"] = "0.00#",
    };

    /// <summary>
    /// "refractometer.readings[2].low" → "RI step 3 low edge"; the store's "readings." before a reading is left out
    /// ("readings.colour" → "colour"), since every such field is a reading.
    /// </summary>
    private static string PathWords(string path)
    {
        if (path.StartsWith(ReadingsPrefix, StringComparison.Ordinal)) path = path[ReadingsPrefix.Length..];
        return Words.TryGetValue(path, out string? whole) ? whole : string.Join(" ", path.Split('.').Select(PartWords));
    }

    private static string PartWords(string part)
    {
        int bracket = part.IndexOf('[');
        if (bracket < 0) return Words.GetValueOrDefault(part, part.Replace('_', ' '));
        int index = int.Parse(part[(bracket + 1)..part.IndexOf(']')], CultureInfo.InvariantCulture);
        string name = part[..bracket];
        return name == "readings" ? $"step {index + 1}" : $"{Words.GetValueOrDefault(name, name.Replace('_', ' '))} {index + 1}";
    }

    /// <summary>
    /// A JSON object or array (or, for a reading, a JSON string) as path → value; null when the text is not JSON: it
    /// is then shown as it is.
    /// </summary>
    private static Dictionary<string, string>? Flatten(string text, bool reading)
    {
        string t = text.Trim();
        if (t.Length == 0) return [];
        if (t[0] is not ('{' or '[') && !(reading && t[0] == '"')) return null;
        try
        {
            using JsonDocument doc = JsonDocument.Parse(t);
            var map = new Dictionary<string, string>(StringComparer.Ordinal);
            Walk(doc.RootElement, "", map);
            return map;
        }
        catch (JsonException) { return null; }
    }

    private static void Walk(JsonElement e, string path, Dictionary<string, string> map)
    {
        switch (e.ValueKind)
        {
            case JsonValueKind.Object:
                foreach (JsonProperty p in e.EnumerateObject()) Walk(p.Value, path.Length == 0 ? p.Name : path + "." + p.Name, map);
                break;
            case JsonValueKind.Array when e.EnumerateArray().All(x => x.ValueKind is JsonValueKind.Number):
                map[path] = string.Join(" ", e.EnumerateArray().Select(x => x.GetRawText()));
                break;
            case JsonValueKind.Array when e.EnumerateArray().All(x => x.ValueKind is JsonValueKind.String):
                // Words (the magnification features): their names, separated so that a name of two words reads as one.
                map[path] = string.Join(", ", e.EnumerateArray().Select(x => x.GetString()!)
                    .Select(w => MagnificationVocabulary.Find(w) is { } f ? MagnificationVocabulary.Of(f).Name : w.Replace('_', ' ')));
                break;
            case JsonValueKind.Array:
                int i = 0;
                foreach (JsonElement x in e.EnumerateArray()) Walk(x, $"{path}[{i++}]", map);
                break;
            case JsonValueKind.Null:
                break;
            case JsonValueKind.String:
                map[path] = e.GetString()!.Replace('_', ' ');
                break;
            case JsonValueKind.True: map[path] = "yes"; break;
            case JsonValueKind.False: map[path] = "no"; break;
            case JsonValueKind.Number when AsRead(path, e.GetDouble()) is { } read:
                map[path] = read;
                break;
            default: map[path] = e.GetRawText(); break;
        }
    }

    private static string Shown(string value) => "'" + ResultText.Clip(value, ValueWidth) + "'";
}
