using System.Collections.Immutable;
using System.Text;
using System.Text.Json;

namespace GemIndex.Cli.TextUi.Bench;

/// <summary>
/// The form exactly as typed, as JSON, kept beside the stone so that text which does not parse yet (a half-typed
/// weighing, "1.5x") survives a closed terminal. The stone's readings stay the checked record; this is only the draft.
/// </summary>
internal static class BenchDraft
{
    public static string Write(BenchSnapshot s)
    {
        using var stream = new MemoryStream();
        using (var w = new Utf8JsonWriter(stream))
        {
            w.WriteStartObject();
            w.WriteStartObject("texts");
            foreach (var (key, value) in s.Texts.OrderBy(p => p.Key, StringComparer.Ordinal)) w.WriteString(key, value);
            w.WriteEndObject();
            w.WriteStartObject("choices");
            foreach (var (key, value) in s.Choices.OrderBy(p => p.Key, StringComparer.Ordinal)) w.WriteString(key, value);
            w.WriteEndObject();
            w.WriteStartArray("steps");
            foreach (StepText step in s.Steps)
            {
                w.WriteStartArray();
                w.WriteStringValue(step.Rotation);
                w.WriteStringValue(step.Low);
                w.WriteStringValue(step.High);
                w.WriteEndArray();
            }
            w.WriteEndArray();
            w.WriteEndObject();
        }
        return Encoding.UTF8.GetString(stream.ToArray());
    }

    /// <summary>Reads a draft; null when it is not one of ours (then the stored readings are used as they are).</summary>
    public static (ImmutableDictionary<string, string> Texts, ImmutableDictionary<string, string> Choices, ImmutableList<StepText> Steps)? Read(string json)
    {
        try
        {
            using JsonDocument doc = JsonDocument.Parse(json);
            JsonElement root = doc.RootElement;
            return (Map(root.GetProperty("texts")), Map(root.GetProperty("choices")),
                [.. root.GetProperty("steps").EnumerateArray().Select(a => new StepText(a[0].GetString()!, a[1].GetString()!, a[2].GetString()!))]);
        }
        catch (Exception e) when (e is JsonException or KeyNotFoundException or InvalidOperationException or IndexOutOfRangeException)
        {
            return null;
        }
    }

    /// <summary>
    /// The entries of a stone's draft that the reader refuses (the stone as saved holds only what its answer used, so
    /// they are in no report); none when there is no draft or it is not one of ours.
    /// </summary>
    public static IReadOnlyList<GemIndex.Core.Bench.BenchFieldError> Refused(long stoneId, string? json)
    {
        if (json is null || Read(json) is not { } draft) return [];
        var snapshot = new BenchSnapshot(stoneId, 0, draft.Texts, draft.Choices, draft.Steps);
        return GemIndex.Core.Bench.BenchReader.Read(FormReader.Read(snapshot)).Errors;
    }

    private static ImmutableDictionary<string, string> Map(JsonElement e) =>
        ImmutableDictionary.CreateRange(e.EnumerateObject().Select(p => new KeyValuePair<string, string>(p.Name, p.Value.GetString()!)));
}
