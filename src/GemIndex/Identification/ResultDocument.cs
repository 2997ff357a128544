using System.Buffers;
using System.Text;
using System.Text.Json;
using GemIndex.Core.Bench;
using GemIndex.Core.Identification;

namespace GemIndex.Cli.Identification;

/// <summary>
/// The one JSON shape of an identification (docs/result-document.md), written by <c>identify --json</c>, every batch
/// output line and the JSON report's "result": the species first (species, confidence, origins), each with its
/// shown candidates under it in rank order; then not_in_catalogue, no_good_match, next_test and warnings. A stone
/// that cannot be read gets the error document instead. Probabilities are rounded down to 4 decimals so that a sum
/// never exceeds 1 by rounding; the same stone gives the same bytes through every front end.
/// </summary>
internal static class ResultDocument
{
    /// <summary>Version of the shape; fields are added, never renamed.</summary>
    public const int ShapeVersion = 2;

    /// <summary>The result as one line of JSON (no line break).</summary>
    public static string Line(IdentificationResult result, bool explain)
    {
        // The thread's buffer and writer are reused line after line (a batch writes one line per stone on every core).
        var buffer = t_buffer ??= new ArrayBufferWriter<byte>(16 * 1024);
        buffer.ResetWrittenCount();
        var w = t_writer;
        if (w is null) t_writer = w = new Utf8JsonWriter(buffer);
        else w.Reset(buffer);
        Write(w, result, explain);
        w.Flush();
        return Encoding.UTF8.GetString(buffer.WrittenSpan);
    }

    [ThreadStatic] private static ArrayBufferWriter<byte>? t_buffer;
    [ThreadStatic] private static Utf8JsonWriter? t_writer;

    /// <summary>Writes the result object (for embedding, as the JSON report does).</summary>
    public static void Write(Utf8JsonWriter w, IdentificationResult result, bool explain)
    {
        w.WriteStartObject();
        w.WriteString("id", result.Id);
        w.WriteStartArray("species");
        var ranks = result.Candidates.Select((c, i) => (c, Rank: i + 1)).ToList();
        bool[] explained = LeadingCandidates.Explained(result.Candidates, BenchDefaults.ExplainedCandidates);
        foreach (SpeciesResult species in SpeciesShown(result))
        {
            w.WriteStartObject();
            w.WriteString("species", species.Species);
            w.WriteNumber("confidence", Probability(species.Confidence));
            if (species.MineralGroup is { } group) w.WriteString("mineral_group", group);
            w.WriteStartObject("origins");
            foreach (var (origin, share) in species.Origins.OrderBy(o => o.Key)) w.WriteNumber(BenchWords.Word(origin), Probability(share));
            w.WriteEndObject();
            w.WriteStartArray("candidates");
            foreach (var (c, rank) in ranks.Where(x => x.c.Material.Species == species.Species))
            {
                w.WriteStartObject();
                w.WriteNumber("rank", rank);
                w.WriteString("name", c.Material.Name);
                w.WriteString("origin", BenchWords.Word(c.Material.Origin));
                w.WriteNumber("confidence", Probability(c.Confidence));
                w.WriteNumber("fit", Math.Round(c.Fit, 4));
                if (explain && c.Reasons.Count > 0 && explained[rank - 1])
                {
                    w.WriteStartArray("why");
                    foreach (var r in c.Reasons)
                    {
                        w.WriteStartObject();
                        w.WriteString("test", r.Test);
                        w.WriteString("text", r.Text);
                        w.WriteNumber("weight_bits", Math.Round(r.WeightBits, 3));
                        w.WriteBoolean("agrees", r.Agrees);
                        w.WriteEndObject();
                    }
                    w.WriteEndArray();
                }
                w.WriteEndObject();
            }
            w.WriteEndArray();
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteNumber("not_in_catalogue", Probability(result.NotInCatalogue));
        w.WriteBoolean("no_good_match", result.NoGoodMatch);
        // What the series (and the dichroscope, when read) says of the optic character (a summary, never a gate), worked
        // out only where the reasons are: a plain batch line skips it for speed.
        if (explain && result.Series is { } series && result.SeriesCharacter is { } character)
        {
            w.WriteStartObject("optic_character");
            w.WriteNumber("singly_refractive", Probability(character.Isotropic));
            w.WriteNumber("uniaxial_positive", Probability(character.UniaxialPositive));
            w.WriteNumber("uniaxial_negative", Probability(character.UniaxialNegative));
            w.WriteNumber("biaxial", Probability(character.Biaxial));
            w.WriteString("summary", Reports.ReportDerived.CharacterOdds(character, series: series));
            w.WriteBoolean("with_dichroscope", character.TakesDichroscope);
            w.WriteStartArray("read_as");
            foreach (var reading in series.Interpretations.Where(i => i.Character is not null))
            {
                w.WriteStartObject();
                w.WriteNumber("share", Probability(reading.Weight));
                w.WriteString("description", reading.Description);
                w.WriteEndObject();
            }
            w.WriteEndArray();
            w.WriteEndObject();
        }
        if (result.NextTest is { } next)
        {
            w.WriteStartObject("next_test");
            w.WriteString("test", next.Test);
            w.WriteString("description", next.Description);
            if (next.LookFor.Count > 0)
            {
                w.WriteStartArray("look_for");
                foreach (string feature in next.LookFor) w.WriteStringValue(feature);
                w.WriteEndArray();
            }
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

    /// <summary>The species that have a shown candidate, by their total confidence, then by their best candidate's rank.</summary>
    public static IReadOnlyList<SpeciesResult> SpeciesShown(IdentificationResult result)
    {
        var firstRank = new Dictionary<string, int>();
        foreach (var (c, i) in result.Candidates.Select((c, i) => (c, i))) firstRank.TryAdd(c.Material.Species, i);
        var known = result.Species.Where(s => firstRank.ContainsKey(s.Species)).ToDictionary(s => s.Species);
        // A species the engine gave no total for still heads its candidates (with their sum), so none is lost.
        return [.. firstRank.Keys.Select(name => known.TryGetValue(name, out var s) ? s : new SpeciesResult
            {
                Species = name,
                Confidence = result.Candidates.Where(c => c.Material.Species == name).Sum(c => c.Confidence),
                Origins = result.Candidates.Where(c => c.Material.Species == name).GroupBy(c => c.Material.Origin).ToDictionary(g => g.Key, g => g.Sum(c => c.Confidence)),
            })
            .OrderByDescending(s => Probability(s.Confidence)).ThenBy(s => firstRank[s.Species])];
    }

    /// <summary>The error document of a stone that cannot be read: every field's error.</summary>
    public static string Error(int? line, string? id, IReadOnlyList<BenchFieldError> errors)
    {
        using var stream = new MemoryStream();
        using (var w = new Utf8JsonWriter(stream))
        {
            w.WriteStartObject();
            if (line is { } n) w.WriteNumber("line", n);
            if (id is not null) w.WriteString("id", id);
            // One line of every error, each without its own full stop but the last ("… 1.79; sg: …", not "1.79.; sg").
            w.WriteString("error", string.Join("; ", errors.Select(e => e.ToString().TrimEnd('.'))) + ".");
            w.WriteStartArray("errors");
            foreach (var e in errors)
            {
                w.WriteStartObject();
                w.WriteString("field", e.Field);
                w.WriteString("value", e.Value);
                w.WriteString("allowed", e.Allowed);
                w.WriteString("message", e.Sentence);
                w.WriteEndObject();
            }
            w.WriteEndArray();
            w.WriteEndObject();
        }
        return Encoding.UTF8.GetString(stream.ToArray());
    }

    /// <summary>A probability rounded down to 4 decimals.</summary>
    public static double Probability(double p) => Math.Floor(p * 10000) / 10000;
}
