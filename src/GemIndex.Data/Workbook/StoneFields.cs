using System.Globalization;
using System.Text.Json.Nodes;
using GemIndex.Data.Batch;

namespace GemIndex.Data.Workbook;

/// <summary>
/// A stone as named fields, each a text: the description's columns ("reference", "weight_ct", "notes", …) and each
/// reading of the batch format on its own ("readings.sg", "readings.refractometer", "readings.colour", …), so an
/// edit is saved, checked and recorded per field and the history never shows the whole readings as one JSON text.
/// </summary>
internal static class StoneFields
{
    public const string ReadingsPrefix = "readings.";

    public static SortedDictionary<string, string> Of(StoneSheet s)
    {
        var fields = new SortedDictionary<string, string>(StringComparer.Ordinal)
        {
            ["reference"] = s.Reference,
            ["weight_ct"] = s.WeightCarats is { } w ? w.ToString("R", CultureInfo.InvariantCulture) : "",
            ["dimensions"] = s.Dimensions,
            ["shape"] = s.Shape,
            ["cutting_style"] = s.CuttingStyle,
            ["transparency"] = s.Transparency,
            ["notes"] = s.Notes,
        };
        var readings = (JsonObject)JsonNode.Parse(StoneReadingsJson.Write(s.Readings))!;
        foreach ((string name, JsonNode? value) in readings)
            if (name != "id" && value is not null) fields[ReadingsPrefix + name] = value.ToJsonString();
        return fields;
    }

    /// <summary>The value of a field, "" when the stone does not have it.</summary>
    public static string Value(IReadOnlyDictionary<string, string> fields, string name) => fields.TryGetValue(name, out string? v) ? v : "";

    /// <summary>A stone from its fields (the inverse of <see cref="Of"/>).</summary>
    /// <exception cref="BatchInputException">The readings fields do not make a valid batch line together.</exception>
    /// <exception cref="FormatException">weight_ct is not a number.</exception>
    public static StoneSheet Sheet(IReadOnlyDictionary<string, string> fields, StoneSheet identity)
    {
        string reference = Value(fields, "reference");
        var readings = new JsonObject { ["id"] = reference };
        foreach ((string name, string value) in fields)
            if (name.StartsWith(ReadingsPrefix, StringComparison.Ordinal) && value.Length > 0)
                readings[name[ReadingsPrefix.Length..]] = JsonNode.Parse(value);
        string weight = Value(fields, "weight_ct");
        return identity with
        {
            Reference = reference,
            WeightCarats = weight.Length == 0 ? null : double.Parse(weight, NumberStyles.Float, CultureInfo.InvariantCulture),
            Dimensions = Value(fields, "dimensions"),
            Shape = Value(fields, "shape"),
            CuttingStyle = Value(fields, "cutting_style"),
            Transparency = Value(fields, "transparency"),
            Notes = Value(fields, "notes"),
            Readings = StoneReadingsJson.Parse(readings.ToJsonString()),
        };
    }
}
