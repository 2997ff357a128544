using System.Text.Json.Nodes;

namespace GemIndex.Data.Workbook;

/// <summary>
/// Which parts of a field a change touched: for a readings field held as JSON (a refractometer's steps, the loupe's marks)
/// the paths whose values differ ("readings[2].low", "readings.length"); for plain text, nothing more than the field. Two
/// quick changes of one field merge into one history entry only when they touch the same parts (typing an SG or a spot
/// reading), never when one edits a step and the next removes another, and never when a step or mark is added or removed
/// (each is an entry of its own, so a step removed and put back leaves two entries, not one that changed nothing).
/// </summary>
internal static class EditParts
{
    /// <summary>The changed paths of <paramref name="before"/> → <paramref name="after"/>, sorted and joined; "" for text that is not JSON.</summary>
    public static string Of(string before, string after)
    {
        if (Parse(before) is not { } b || Parse(after) is not { } a) return "";
        var paths = new SortedSet<string>(StringComparer.Ordinal);
        Differ(b, a, "", paths);
        return string.Join(' ', paths);
    }

    /// <summary>Whether the parts name a list whose length changed: a step or a mark added or removed.</summary>
    public static bool AddOrRemove(string parts) => parts.Split(' ').Any(p => p.EndsWith(".length", StringComparison.Ordinal));

    private static JsonNode? Parse(string text)
    {
        if (text.Length == 0 || (text[0] != '{' && text[0] != '[')) return null;
        try { return JsonNode.Parse(text); }
        catch (System.Text.Json.JsonException) { return null; }
    }

    private static void Differ(JsonNode? before, JsonNode? after, string path, SortedSet<string> paths)
    {
        switch (before, after)
        {
            case (JsonObject b, JsonObject a):
                foreach (string key in b.Select(p => p.Key).Union(a.Select(p => p.Key)))
                    Differ(b[key], a[key], path.Length == 0 ? key : $"{path}.{key}", paths);
                break;
            case (JsonArray b, JsonArray a):
                if (b.Count != a.Count) paths.Add(path + ".length");
                for (int i = 0; i < Math.Min(b.Count, a.Count); i++) Differ(b[i], a[i], $"{path}[{i}]", paths);
                break;
            default:
                if ((before?.ToJsonString() ?? "") != (after?.ToJsonString() ?? "")) paths.Add(path);
                break;
        }
    }
}
