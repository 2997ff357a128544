using System.Globalization;
using System.Text.Json;
using GemIndex.Data.Batch;

namespace GemIndex.Data.Workbook;

/// <summary>
/// The demo workbook: invented stones of a small estate lot (reference-db/demo-workbook.jsonl, embedded). Each line
/// holds the stone's description and, under "readings", one batch-format line.
/// </summary>
public static class DemoStones
{
    private const string Resource = "GemIndex.Workbook.demo-workbook.jsonl";

    /// <summary>The embedded demo lines.</summary>
    public static string Source()
    {
        using Stream stream = typeof(DemoStones).Assembly.GetManifestResourceStream(Resource)
            ?? throw new InvalidOperationException($"the demo stones ({Resource}) are missing from the assembly");
        using var reader = new StreamReader(stream);
        return reader.ReadToEnd();
    }

    /// <summary>Reads the demo lines into stones.</summary>
    /// <exception cref="BatchInputException">A line is malformed (the message gives its line number and field).</exception>
    public static IReadOnlyList<StoneSheet> Parse(string jsonl)
    {
        var stones = new List<StoneSheet>();
        int number = 0;
        foreach (string line in jsonl.Split('\n'))
        {
            number++;
            if (line.Trim().Length == 0) continue;
            try { stones.Add(Stone(line)); }
            catch (BatchInputException e) { throw new BatchInputException($"line {number}: {e.Field}", e.Message[(e.Field.Length + 2)..]); }
            catch (Exception e) when (e is JsonException or KeyNotFoundException or InvalidOperationException)
            { throw new BatchInputException($"line {number}", e.Message); }
        }
        return stones;
    }

    private static StoneSheet Stone(string line)
    {
        using JsonDocument doc = JsonDocument.Parse(line);
        JsonElement root = doc.RootElement;
        string Text(string name) => root.TryGetProperty(name, out JsonElement e) ? e.GetString() ?? "" : "";
        return new StoneSheet
        {
            Reference = Text("reference"),
            WeightCarats = root.TryGetProperty("weight_ct", out JsonElement w) ? w.GetDouble() : null,
            Dimensions = Text("dimensions"),
            Shape = Text("shape"),
            CuttingStyle = Text("cutting_style"),
            Transparency = Text("transparency"),
            Notes = Text("notes"),
            Readings = StoneReadingsJson.Parse(root.GetProperty("readings").GetRawText()),
        };
    }

    /// <summary>Adds the demo stones to a workbook (one transaction each) and returns how many were added.</summary>
    public static int AddTo(StoneWorkbook workbook)
    {
        IReadOnlyList<StoneSheet> stones = Parse(Source());
        foreach (StoneSheet s in stones) workbook.Create(s);
        return stones.Count;
    }

    /// <summary>A one-line summary for the command line.</summary>
    public static string Describe(int count, string path) =>
        string.Create(CultureInfo.InvariantCulture, $"added {count} invented demo stones to {path}");
}
