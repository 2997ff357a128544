using GemIndex.Core.Bench;
using System.Text;
using System.Text.Json;
using GemIndex.Cli.Identification;
using GemIndex.Core.Identification;
using GemIndex.Tests.Reports;
using Xunit.Abstractions;

namespace GemIndex.Tests.Reliability;

/// <summary>
/// Batch fuzz: mutated batch lines (seeded, so a failure repeats) go through the batch interface; every non-blank
/// line must get exactly one answer (a result or {"line", "error"}) and nothing may escape as an exception.
/// </summary>
public sealed class BatchFuzzTests(ITestOutputHelper log)
{
    public const int Lines = 600;

    private static readonly string[] Seeds =
    [
        ReportFixtures.QuartzLine,
        """{"id":"ring 2","refractometer":{"method":"spot","spot":1.76},"sg":4.00,"polariscope":"doubly_refractive","colour":"red"}""",
        """{"id":"pendant","refractometer":{"method":"facet","over_limit":true,"liquid_limit":1.79},"sg":5.8,"thermal_probe":"positive"}""",
        """{"id":"lot 9","heavy_liquids":[{"density":2.57,"result":"sinks"},{"density":2.89,"result":"floats"}],"uv_long":"weak","absorption_nm":[440,510]}""",
        """{"id":"b4","refractometer":{"readings":[{"rotation_deg":0,"low":1.654,"high":1.690},{"rotation_deg":90,"low":1.660,"high":1.690}],"light_nm":589.3},"dispersion":{"nB":1.66,"nG":1.68},"pleochroism":"trichroic"}""",
    ];


    [Fact]
    public void Every_non_blank_mutated_line_gets_exactly_one_answer_and_nothing_escapes()
    {
        var random = new Random(9_2026);
        var identifier = new Identifier(ReportFixtures.Catalogue);
        var lines = new List<string>();
        while (lines.Count < Lines) lines.Add(Mutate(Seeds[random.Next(Seeds.Length)], random));

        int answered = 0, errorLines = 0, wrongCount = 0;
        var escaped = new Dictionary<string, int>();
        foreach (string line in lines)
        {
            var output = new StringWriter();
            try { BatchIdentification.Run(new StringReader(line), output, identifier, new BenchRequest { ExplainTop = random.Next(2) == 0 ? 3 : 0 }); }
            catch (Exception e)
            {
                string kind = $"{e.GetType().Name}: {e.Message}";
                if (!escaped.ContainsKey(kind)) log.WriteLine($"first '{kind}' on a line starting {line[..Math.Min(60, line.Length)]}");
                escaped[kind] = escaped.GetValueOrDefault(kind) + 1;
                continue;
            }
            string[] answers = output.ToString().Split('\n', StringSplitOptions.RemoveEmptyEntries);
            int expected = line.Split('\n').Count(l => !string.IsNullOrWhiteSpace(l.TrimEnd('\r')));
            if (answers.Length != expected) wrongCount++;
            foreach (string answer in answers)
            {
                using JsonDocument doc = JsonDocument.Parse(answer);   // every answer is one JSON object
                if (doc.RootElement.TryGetProperty("error", out _)) errorLines++;
                answered++;
            }
        }
        int crashes = escaped.Values.Sum();
        log.WriteLine($"lines {Lines}, answers {answered} ({errorLines} error lines), lines with the wrong number of answers {wrongCount}, " +
            $"exceptions escaped {crashes}" + (crashes > 0 ? " (" + string.Join(", ", escaped.Select(k => $"{k.Key} {k.Value}")) + ")" : ""));
        Assert.Equal(0, wrongCount);
        Assert.Empty(escaped.Keys);
    }

    private static string Mutate(string seed, Random random)
    {
        string line = seed;
        int steps = 1 + random.Next(3);
        for (int i = 0; i < steps; i++)
        {
            line = random.Next(12) switch
            {
                0 => line.Length > 1 ? line.Remove(random.Next(line.Length), 1) : line,
                1 => line.Insert(random.Next(line.Length + 1), Pick(random, "\"", "{", "}", "[", "]", ",", ":", "\\", "\u0000", "\u001b", "é", " ")),
                2 => ReplaceNumber(line, random, Pick(random, "1e308", "-1e308", "-0", "1e-320", "0", "99999999999999999999", "NaN", "\"2.65\"", "null", "true")),
                3 => line[..random.Next(line.Length + 1)],
                4 => line.Replace("\"sg\"", Pick(random, "\"sg\"", "\"SG\"", "\"sg\":1,\"sg\""), StringComparison.Ordinal),
                5 => ReplaceWord(line, random, Pick(random, "", "nonsense", "\\ud800", "\\udfff\\ud800", new string('w', 5000), "\u001b[2J")),
                6 => line.Replace("\"id\":\"", "\"id\":\"\\ud800", StringComparison.Ordinal),
                7 => line.Replace("\"readings\":[", "\"readings\":[" + string.Concat(Enumerable.Repeat("{\"rotation_deg\":0,\"low\":1.544,\"high\":1.553},", 1001 + random.Next(50))), StringComparison.Ordinal),
                8 => "\uFEFF" + line,
                9 => new string('[', 200 + random.Next(800)) + line,
                10 => line + "\n" + (random.Next(2) == 0 ? "   " : "") + "\n" + Seeds[random.Next(Seeds.Length)],
                _ => "[" + line + "]",
            };
        }
        return line;
    }

    private static string Pick(Random random, params string[] options) => options[random.Next(options.Length)];

    private static string ReplaceNumber(string line, Random random, string with)
    {
        var numbers = System.Text.RegularExpressions.Regex.Matches(line, @"-?\d+(\.\d+)?");
        if (numbers.Count == 0) return line;
        var m = numbers[random.Next(numbers.Count)];
        return line[..m.Index] + with + line[(m.Index + m.Length)..];
    }

    private static string ReplaceWord(string line, Random random, string with)
    {
        var words = System.Text.RegularExpressions.Regex.Matches(line, "\"(doubly_refractive|red|positive|sinks|floats|weak|trichroic|colourless|inert|facet|spot)\"");
        if (words.Count == 0) return line;
        var m = words[random.Next(words.Count)];
        return line[..m.Index] + "\"" + with + "\"" + line[(m.Index + m.Length)..];
    }
}
