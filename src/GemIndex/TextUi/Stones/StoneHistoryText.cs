using System.Globalization;
using System.Text.Json;
using System.Text.Json.Nodes;
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
        ["thermal_probe"] = "thermal probe", ["electrical"] = "conductivity", ["reflectance_pct"] = "reflectance (%)", ["uv_long"] = "UV long wave", ["uv_short"] = "UV short wave",
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
        (string beforeText, string afterText, List<string> steps) = SeriesSteps(e.Field, e.Before, e.After);
        if (Flatten(beforeText, reading) is { } before && Flatten(afterText, reading) is { } after)
            return steps.Concat(before.Keys.Union(after.Keys).Where(k => k != "id" && !(e.Field == "readings" && k == "transparency") && before.GetValueOrDefault(k) != after.GetValueOrDefault(k))
                .Select(k => Change(PathWords(k.Length == 0 ? e.Field : e.Field + "." + k), before.GetValueOrDefault(k), after.GetValueOrDefault(k))));
        return [Change(Label(e.Field), AsRead(e.Field, e.Before), AsRead(e.Field, e.After))];
    }

    /// <summary>
    /// A rotation series' steps told by matching them up, not by position: removing step 3 of six shifts the later
    /// steps, which had read as three edited steps and a sixth cleared. Steps unchanged on both sides are matched in
    /// order (the longest common run); what is left between two matches is edited pairwise, then removed or added. Each
    /// step is named by its position and rotation angle ("RI step 3 (60°)"). Returns the texts without the steps, for
    /// the rest of the comparison, and the steps' sentences.
    /// </summary>
    private static (string Before, string After, List<string> Steps) SeriesSteps(string field, string beforeText, string afterText)
    {
        string[]? path = field switch { "readings" => ["refractometer", "readings"], ReadingsPrefix + "refractometer" => ["readings"], _ => null };
        if (path is null || StepsOf(beforeText, path) is not (var beforeRoot, var b) || StepsOf(afterText, path) is not (var afterRoot, var a))
            return (beforeText, afterText, []);
        var said = new List<string>();
        string[] bKeys = [.. b.Select(x => x?.ToJsonString() ?? "")], aKeys = [.. a.Select(x => x?.ToJsonString() ?? "")];
        // Longest common subsequence of unchanged steps.
        int[,] run = new int[b.Count + 1, a.Count + 1];
        for (int i = b.Count - 1; i >= 0; i--)
            for (int j = a.Count - 1; j >= 0; j--)
                run[i, j] = bKeys[i] == aKeys[j] ? run[i + 1, j + 1] + 1 : Math.Max(run[i + 1, j], run[i, j + 1]);
        // The matched pairs (an equal pair always lies on a longest common run), then the end as a last match.
        var matches = new List<(int B, int A)>();
        for (int i = 0, j = 0; i < b.Count && j < a.Count;)
        {
            if (bKeys[i] == aKeys[j]) matches.Add((i++, j++));
            else if (run[i + 1, j] >= run[i, j + 1]) i++;
            else j++;
        }
        matches.Add((b.Count, a.Count));
        int bi = 0, ai = 0;
        foreach ((int bEnd, int aEnd) in matches)
        {
            // Within the gap, a step keeps its rotation angle when edited: pair by angle first, then in order.
            List<int> bGap = [.. Enumerable.Range(bi, Math.Max(0, bEnd - bi))], aGap = [.. Enumerable.Range(ai, Math.Max(0, aEnd - ai))];
            var pairs = new List<(int B, int A)>();
            foreach (int j in aGap.ToList())
                if (bGap.FindIndex(i => AngleOf(b[i]) is { } angle && angle == AngleOf(a[j])) is var at and >= 0)
                {
                    pairs.Add((bGap[at], j));
                    bGap.RemoveAt(at);
                    aGap.Remove(j);
                }
            int inOrder = Math.Min(bGap.Count, aGap.Count);
            pairs.AddRange(bGap.Take(inOrder).Zip(aGap.Take(inOrder)));
            foreach ((int i, int j) in pairs.OrderBy(p => p.A))
            {
                string name = StepName(j, a[j]);
                if (Flatten(bKeys[i], false) is { } x && Flatten(aKeys[j], false) is { } y)
                    said.AddRange(x.Keys.Union(y.Keys).Where(key => x.GetValueOrDefault(key) != y.GetValueOrDefault(key))
                        .Select(key => Change($"{name} {PathWords(key)}", x.GetValueOrDefault(key), y.GetValueOrDefault(key))));
            }
            said.AddRange(bGap.Skip(inOrder).Select(i => $"{StepName(i, b[i])} removed (was {EdgesOf(b[i])})"));
            said.AddRange(aGap.Skip(inOrder).Select(j => $"{StepName(j, a[j])} added: {EdgesOf(a[j])}"));
            (bi, ai) = (bEnd + 1, aEnd + 1);
        }
        return (Without(beforeRoot, path), Without(afterRoot, path), said);
    }

    /// <summary>The step list at <paramref name="path"/> of a JSON object; null when the text has none (then nothing is matched).</summary>
    private static (JsonNode Root, JsonArray Steps)? StepsOf(string text, string[] path)
    {
        string t = text.TrimStart();
        if (t.Length == 0) return (new JsonObject(), []);
        if (t[0] != '{') return null;
        try
        {
            JsonNode root = JsonNode.Parse(t)!;
            JsonNode? node = root;
            foreach (string part in path) node = node is JsonObject o ? o[part] : null;
            return node is JsonArray steps ? (root, steps) : (root, []);
        }
        catch (JsonException) { return null; }
    }

    private static string Without(JsonNode root, string[] path)
    {
        JsonNode? parent = root;
        foreach (string part in path[..^1]) parent = parent is JsonObject o ? o[part] : null;
        (parent as JsonObject)?.Remove(path[^1]);
        return root.ToJsonString();
    }

    private static double? AngleOf(JsonNode? step) => step?["rotation_deg"] is JsonValue v && v.TryGetValue(out double degrees) ? degrees : null;

    private static string StepName(int index, JsonNode? step) =>
        AngleOf(step) is { } degrees ? $"RI step {index + 1} ({degrees.ToString("0.#", CultureInfo.InvariantCulture)}°)" : $"RI step {index + 1}";

    private static string EdgesOf(JsonNode? step)
    {
        string? Edge(string name) => step?[name] is JsonValue v && v.TryGetValue(out double n) ? AsRead(name, n) : null;
        string[] edges = [.. new[] { Edge("low"), Edge("high") }.OfType<string>()];
        return edges.Length == 0 ? "no edges" : string.Join(" / ", edges);
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
