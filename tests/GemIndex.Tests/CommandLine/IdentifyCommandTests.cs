using System.Text.Json;

namespace GemIndex.Tests.CommandLine;

public class IdentifyCommandTests
{
    private static (int Exit, string Out, string Err) Identify(CommandRun run, params string[] args) =>
        CommandRun.Plain(["identify", .. args, "--catalogue-dir", run.Folder]);

    private static string Batch(CommandRun run, params string[] lines)
    {
        string path = Path.Combine(run.Folder, "stones.jsonl");
        File.WriteAllText(path, string.Join("\n", lines) + "\n");
        return path;
    }

    [Fact]
    public void A_batch_gives_one_line_per_stone_in_order_in_the_fixed_format()
    {
        using var run = new CommandRun();
        // Quartz ω 1.544 / ε 1.553 (Handbook of Mineralogy, from memory); diamond n 2.417, SG 3.52, heat conductor (common practice).
        string file = Batch(run,
            """{"id":"Q-1","refractometer":{"method":"facet","readings":[{"rotation_deg":0,"low":1.544,"high":1.553},{"rotation_deg":45,"low":1.544,"high":1.550},{"rotation_deg":90,"low":1.544,"high":1.548},{"rotation_deg":135,"low":1.544,"high":1.551}]},"sg":2.65,"colour":"colourless"}""",
            """{"id":"D-1","refractometer":{"over_limit":true},"thermal_probe":"positive","sg":3.52,"unknown_field":1}""");
        var (exit, output, error) = Identify(run, "--batch", file);
        Assert.True(exit == 0, error);
        var lines = output.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(2, lines.Length);
        using var quartz = JsonDocument.Parse(lines[0]);
        Assert.Equal("Q-1", quartz.RootElement.GetProperty("id").GetString());
        var species = quartz.RootElement.GetProperty("species");
        Assert.Equal("quartz", species[0].GetProperty("species").GetString());
        var best = species[0].GetProperty("candidates")[0];
        Assert.Equal(1, best.GetProperty("rank").GetInt32());
        Assert.Equal("natural", best.GetProperty("origin").GetString());
        Assert.False(quartz.RootElement.GetProperty("no_good_match").GetBoolean());
        var candidates = species.EnumerateArray().SelectMany(x => x.GetProperty("candidates").EnumerateArray()).ToList();
        Assert.InRange(candidates.Sum(c => c.GetProperty("confidence").GetDouble()), 0, 1);
        Assert.InRange(species.EnumerateArray().Sum(x => x.GetProperty("confidence").GetDouble()), 0, 1);
        Assert.True(candidates.Count <= 10);
        Assert.Equal(JsonValueKind.Array, quartz.RootElement.GetProperty("warnings").ValueKind);
        using var diamond = JsonDocument.Parse(lines[1]);
        Assert.Equal("diamond", diamond.RootElement.GetProperty("species")[0].GetProperty("species").GetString());
    }

    [Fact]
    public void A_bad_line_gets_an_error_line_naming_the_field_and_the_batch_goes_on_with_exit_3()
    {
        using var run = new CommandRun();
        string file = Batch(run,
            """{"id":"A","sg":2.65}""",
            """not json at all""",
            """{"id":"B","refractometer":{"readings":[{"rotation_deg":0,"low":1.553,"high":1.544}]}}""",
            """{"id":"C","polariscope":"sparkly"}""",
            """{"id":"D","sg":{"air_ct":1.0,"water_ct":1.2}}""",
            """{"id":"E","sg":"2.65"}""",
            """{"id":"F","sg":1.2}""");
        var (exit, output, error) = Identify(run, "--batch", file);
        Assert.Equal(3, exit);
        Assert.Contains("could not be read", error, StringComparison.Ordinal);
        var lines = output.Split('\n', StringSplitOptions.RemoveEmptyEntries).Select(l => JsonDocument.Parse(l).RootElement).ToArray();
        Assert.Equal(7, lines.Length);
        Assert.Equal("A", lines[0].GetProperty("id").GetString());
        Assert.Equal(2, lines[1].GetProperty("line").GetInt32());
        Assert.StartsWith("$: not valid JSON", lines[1].GetProperty("error").GetString());
        Assert.Equal("refractometer.readings[0]: high edge is 1.544; allowed: not below the low edge 1.5530 of the same step.", lines[2].GetProperty("error").GetString());
        Assert.Equal("polariscope: 'sparkly' is not one of singly_refractive | doubly_refractive | aggregate | anomalous.", lines[3].GetProperty("error").GetString());
        Assert.Equal("sg.water_ct: weight in water is 1.2 ct; allowed: 0 to below the weight in air 1 ct.", lines[4].GetProperty("error").GetString());
        Assert.Equal("sg: must be a number or {\"air_ct\", \"water_ct\", \"water_c\"}, not the text \"2.65\".", lines[5].GetProperty("error").GetString());
        Assert.Equal("F", lines[6].GetProperty("id").GetString());
    }

    [Fact]
    public void A_single_stone_from_options_reads_as_text_with_reasons_and_the_cautions()
    {
        using var run = new CommandRun();
        var (exit, output, error) = Identify(run, "--edge", "0:1.762/1.770", "--edge", "45:1.764/1.770", "--edge", "90:1.767/1.770",
            "--edge", "135:1.765/1.770", "--sg", "4.00", "--colour", "red", "--lines", "694,668,659");
        Assert.True(exit == 0, error);
        Assert.Contains("Optic character: uniaxial", output, StringComparison.Ordinal);
        Assert.Contains("uniaxial negative", output, StringComparison.Ordinal);
        Assert.Contains(" 1. ", output, StringComparison.Ordinal);
        Assert.Contains("ruby", output, StringComparison.Ordinal);
        Assert.Contains("SG 4.00 ± 0.01 lies in", output, StringComparison.Ordinal);
        Assert.Contains("an aid, not a certificate", output, StringComparison.Ordinal);
    }

    [Fact]
    public void A_bad_edge_option_names_the_option()
    {
        using var run = new CommandRun();
        var (exit, _, error) = Identify(run, "--edge", "0:1,544/1.553");
        Assert.Equal(3, exit);
        Assert.Contains("--edge #1: low: '1,544' has a comma", error, StringComparison.Ordinal);
    }

    [Fact]
    public void Steps_without_rotation_angles_are_read_as_evenly_spread_over_a_half_turn()
    {
        using var run = new CommandRun();
        // Corundum ω 1.770, ε 1.762 (common practice), four steps in order with no angles given.
        string file = Batch(run, """{"id":"C-1","refractometer":{"readings":[{"low":1.762,"high":1.770},{"low":1.764,"high":1.770},{"low":1.768,"high":1.770},{"low":1.765,"high":1.770}]}}""");
        var (exit, output, error) = Identify(run, "--batch", file, "--explain");
        Assert.True(exit == 0, error);
        Assert.Contains("uniaxial negative", output, StringComparison.Ordinal);
        Assert.DoesNotContain("undetermined", output, StringComparison.Ordinal);
    }
}
