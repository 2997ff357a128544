using System.Text;
using System.Text.Json;
using GemIndex.Core.Identification;

namespace GemIndex.Cli.Identification;

/// <summary>
/// Writes one output line of the batch interface (README "Batch format"): id, candidates (best first, at most 10),
/// no_good_match, next_test, warnings; or an error line naming the input line.
/// </summary>
internal static class BatchResultJson
{
    public static string Result(IdentificationResult result, bool explain)
    {
        using var stream = new MemoryStream();
        using (var w = new Utf8JsonWriter(stream))
        {
            w.WriteStartObject();
            w.WriteString("id", result.Id);
            w.WriteStartArray("candidates");
            foreach (var c in result.Candidates)
            {
                w.WriteStartObject();
                w.WriteString("species", c.Material.Species);
                w.WriteString("name", c.Material.Name);
                w.WriteString("origin", c.Material.Origin.ToString().ToLowerInvariant());
                // Rounded down so that the candidates' sum never exceeds 1 by rounding.
                w.WriteNumber("confidence", Math.Floor(c.Confidence * 10000) / 10000);
                w.WriteNumber("fit", Math.Round(c.Fit, 4));
                if (explain && c.Reasons.Count > 0)
                {
                    w.WriteStartArray("why");
                    foreach (var r in c.Reasons) w.WriteStringValue(r.Text);
                    w.WriteEndArray();
                }
                w.WriteEndObject();
            }
            w.WriteEndArray();
            w.WriteBoolean("no_good_match", result.NoGoodMatch);
            if (result.NextTest is { } next)
            {
                w.WriteStartObject("next_test");
                w.WriteString("test", next.Test);
                w.WriteNumber("gain_bits", Math.Round(next.GainBits, 3));
                w.WriteStartArray("separates");
                foreach (string name in next.Separates) w.WriteStringValue(name);
                w.WriteEndArray();
                w.WriteEndObject();
            }
            else w.WriteNull("next_test");
            w.WriteStartArray("warnings");
            foreach (string warning in result.Warnings) w.WriteStringValue(warning);
            w.WriteEndArray();
            w.WriteEndObject();
        }
        return Encoding.UTF8.GetString(stream.ToArray());
    }

    public static string Error(int line, string message)
    {
        using var stream = new MemoryStream();
        using (var w = new Utf8JsonWriter(stream))
        {
            w.WriteStartObject();
            w.WriteNumber("line", line);
            w.WriteString("error", message);
            w.WriteEndObject();
        }
        return Encoding.UTF8.GetString(stream.ToArray());
    }
}
