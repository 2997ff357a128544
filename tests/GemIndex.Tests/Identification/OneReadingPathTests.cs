using System.Text;
using System.Text.Json;
using GemIndex.Cli.Identification;
using GemIndex.Cli.TextUi.Bench;
using GemIndex.Core.Identification;
using GemIndex.Data.Catalogue;
using GemIndex.Tests.CommandLine;

namespace GemIndex.Tests.Identification;

/// <summary>
/// Issue 11's "done means": one stone typed as command-line options, written as a batch line and entered in the text
/// UI's form gives byte-identical result JSON, and a sheet with three bad fields gets three errors at once in each.
/// The readings are the trade's textbook values, from memory of standard handbook values (indices to the third
/// decimal, SG to the second) unless said otherwise; none is fitted to our catalogue.
/// </summary>
public class OneReadingPathTests
{
    /// <summary>One stone as a bench user would note it: steps "ROTATION:LOW/HIGH", then field → value.</summary>
    public sealed record Stone(string Id, string[] Steps, (string Field, string Value)[] Values);

    private static Stone S(string id, string[] steps, params (string, string)[] values) => new(id, steps, values);

    public static readonly Stone[] Stones =
    [
        S("quartz", ["0:1.544/1.553", "45:1.544/1.551", "90:1.544/1.548", "135:1.544/1.551"], ("sg", "2.65"), ("polariscope", "doubly_refractive"), ("colour", "colourless")),
        S("ruby", ["0:1.762/1.770", "45:1.764/1.770", "90:1.767/1.770", "135:1.765/1.770"], ("sg", "4.00"), ("colour", "red"), ("lines", "694 668 659")),
        // The same ruby noted as faceted (its star varieties weighed as showing no star).
        S("faceted ruby", ["0:1.762/1.770", "45:1.764/1.770", "90:1.767/1.770", "135:1.765/1.770"], ("sg", "4.00"), ("colour", "red"), ("cut", "faceted")),
        S("blue sapphire", ["0:1.762/1.770", "90:1.766/1.770"], ("sg", "4.00"), ("colour", "blue"), ("lines", "450"), ("pleochroism", "dichroic")),
        S("spinel", ["0:1.718", "90:1.718"], ("sg", "3.60"), ("polariscope", "singly_refractive"), ("colour", "red")),
        S("diamond", [], ("over", "yes"), ("thermal", "positive"), ("sg", "3.52")),
        S("emerald", ["0:1.577/1.583", "90:1.579/1.583"], ("sg", "2.72"), ("colour", "green"), ("pleochroism", "dichroic")),
        S("tourmaline", ["0:1.624/1.644", "90:1.630/1.644"], ("sg", "3.06"), ("pleochroism", "dichroic"), ("colour", "green")),
        S("topaz", ["0:1.619/1.627", "45:1.620/1.625", "90:1.621/1.627"], ("sg", "3.53"), ("colour", "blue")),
        S("peridot", ["0:1.654/1.690", "90:1.670/1.690"], ("sg", "3.34"), ("colour", "green")),
        S("pyrope", ["0:1.746", "90:1.746"], ("sg", "3.78"), ("polariscope", "singly_refractive"), ("colour", "red")),
        S("glass", ["0:1.520", "90:1.520"], ("sg", "2.50"), ("polariscope", "anomalous")),
        S("opal", [], ("spot", "1.45"), ("sg", "2.10"), ("polariscope", "singly_refractive")),
        S("jadeite", [], ("spot", "1.66"), ("sg", "3.33"), ("polariscope", "aggregate"), ("colour", "green")),
        S("nephrite", [], ("spot", "1.62"), ("sg", "2.95"), ("polariscope", "aggregate")),
        S("cubic zirconia", [], ("over", "yes"), ("thermal", "negative"), ("sg", "5.80"), ("dispersion", "strong")),
        S("moissanite", [], ("over", "yes"), ("thermal", "positive"), ("electrical", "conductive"), ("sg", "3.22")),
        // A reflectance meter's reading past the limit (diamond about 17.2 %: Fresnel at n 2.417, from memory).
        S("diamond by reflectance", [], ("over", "yes"), ("thermal", "positive"), ("reflectance", "17.2")),
        S("chrysoberyl", ["0:1.746/1.755", "90:1.748/1.755"], ("sg", "3.73"), ("colour", "yellow")),
        S("zircon", [], ("over", "yes"), ("sg", "4.69"), ("lines", "653")),
        S("orthoclase", ["0:1.518/1.526", "90:1.520/1.526"], ("sg", "2.57"), ("colour", "colourless")),
        S("fluorite", ["0:1.434"], ("sg", "3.18"), ("uv_long", "strong"), ("polariscope", "singly_refractive")),
        // Hydrostatic weighing of a quartz: 3.120 ct in air, 1.943 ct in water at 22 °C (SG ≈ 2.65; invented weights).
        S("weighed quartz", ["0:1.544/1.553"], ("air", "3.120"), ("water", "1.943"), ("water_c", "22")),
        // Heavy liquids: floats on 2.89, sinks in 2.57 (common practice: bromoform diluted, and a 2.57 liquid).
        S("quartz by liquids", [], ("spot", "1.54"), ("liquids", "2.89 floats; 2.57 sinks"), ("lines", "none")),
        // Instrument settings on the command line and in the batch as in the text UI: precision and calibration offset.
        S("calibrated spinel", ["0:1.716", "90:1.716"], ("precision", "0.002"), ("offset", "0.002"), ("sg", "3.60")),
    ];

    public static TheoryData<int> StoneIndices() => [.. Enumerable.Range(0, Stones.Length)];

    /// <summary>How each note is given on the command line.</summary>
    private static IEnumerable<string> CommandLine(Stone s)
    {
        yield return "--id";
        yield return s.Id;
        foreach (string step in s.Steps) { yield return "--edge"; yield return step; }
        foreach (var (field, value) in s.Values)
        {
            if (field == "over") { yield return "--over-limit"; continue; }
            if (field == "liquids")
            {
                foreach (string entry in value.Split("; ")) { yield return "--heavy-liquid"; yield return entry; }
                continue;
            }
            yield return field switch
            {
                "sg" => "--sg", "air" => "--in-air-ct", "water" => "--in-water-ct", "water_c" => "--water-c", "spot" => "--spot",
                "polariscope" => "--polariscope", "pleochroism" => "--pleochroism", "dispersion" => "--dispersion", "thermal" => "--thermal-probe",
                "electrical" => "--electrical", "uv_long" => "--uv-long", "colour" => "--colour", "precision" => "--precision", "offset" => "--calibration-offset",
                "cut" => "--cut", "reflectance" => "--reflectance",
                "lines" => "--lines",
                _ => throw new ArgumentException(field),
            };
            // Lines as a shell user writes them: commas.
            yield return field == "lines" ? value.Replace(' ', ',') : value;
        }
    }

    /// <summary>The same stone as a batch line, written by hand (not by our writer).</summary>
    private static string BatchLine(Stone s)
    {
        var v = s.Values.ToDictionary(p => p.Field, p => p.Value);
        var parts = new List<string> { $"\"id\":{JsonSerializer.Serialize(s.Id)}" };
        var rf = new List<string>();
        if (s.Steps.Length > 0)
            rf.Add("\"readings\":[" + string.Join(",", s.Steps.Select(step =>
            {
                string[] p = step.Split(':', '/');
                return $"{{\"rotation_deg\":{p[0]},\"low\":{p[1]}" + (p.Length > 2 ? $",\"high\":{p[2]}" : "") + "}";
            })) + "]");
        if (v.TryGetValue("spot", out string? spot)) rf.Add($"\"spot\":{spot}");
        if (v.ContainsKey("over")) rf.Add("\"over_limit\":true");
        if (v.TryGetValue("precision", out string? precision)) rf.Add($"\"precision\":{precision}");
        if (v.TryGetValue("offset", out string? offset)) rf.Add($"\"calibration_offset\":{offset}");
        if (rf.Count > 0) parts.Add("\"refractometer\":{" + string.Join(",", rf) + "}");
        if (v.TryGetValue("sg", out string? sg)) parts.Add($"\"sg\":{sg}");
        if (v.TryGetValue("air", out string? air))
            parts.Add($"\"sg\":{{\"air_ct\":{air},\"water_ct\":{v["water"]}" + (v.TryGetValue("water_c", out string? t) ? $",\"water_c\":{t}" : "") + "}");
        if (v.TryGetValue("liquids", out string? liquids))
            parts.Add("\"heavy_liquids\":[" + string.Join(",", liquids.Split("; ").Select(e => e.Split(' ')).Select(e => $"{{\"density\":{e[0]},\"result\":\"{e[1]}\"}}")) + "]");
        foreach (var (field, key) in new[] { ("polariscope", "polariscope"), ("pleochroism", "pleochroism"), ("dispersion", "dispersion"), ("thermal", "thermal_probe"),
            ("electrical", "electrical"), ("uv_long", "uv_long"), ("colour", "colour"), ("cut", "cut") })
            if (v.TryGetValue(field, out string? word)) parts.Add($"\"{key}\":\"{word}\"");
        if (v.TryGetValue("reflectance", out string? reflectance)) parts.Add($"\"reflectance_pct\":{reflectance}");
        if (v.TryGetValue("lines", out string? lines))
            parts.Add("\"absorption_nm\":[" + (lines == "none" ? "" : string.Join(",", lines.Split(' '))) + "]");
        return "{" + string.Join(",", parts) + "}";
    }

    /// <summary>The same stone typed into the text UI's form.</summary>
    private static BenchSnapshot Form(Stone s)
    {
        var form = new BenchModel();
        form.SetText(BenchFields.Reference, s.Id);
        foreach (string step in s.Steps)
        {
            string[] p = step.Split(':', '/');
            form.PutStep(form.Steps.Count, new StepText(p[0], p[1], p.Length > 2 ? p[2] : ""));
        }
        foreach (var (field, value) in s.Values)
        {
            switch (field)
            {
                case "over": form.Choose(BenchFields.OverLimit, "yes"); break;
                case "polariscope": form.Choose(BenchFields.Polariscope, value); break;
                case "pleochroism": form.Choose(BenchFields.Pleochroism, value); break;
                case "dispersion": form.Choose(BenchFields.Dispersion, value); break;
                case "thermal": form.Choose(BenchFields.ThermalProbe, value); break;
                case "electrical": form.Choose(BenchFields.Electrical, value); break;
                case "uv_long": form.Choose(BenchFields.UvLong, value); break;
                case "cut": form.Choose(BenchFields.Cut, value); break;
                default:
                    form.SetText(field switch
                    {
                        "sg" => BenchFields.Sg, "air" => BenchFields.AirCt, "water" => BenchFields.WaterCt, "water_c" => BenchFields.WaterC,
                        "spot" => BenchFields.Spot, "colour" => BenchFields.Colour, "lines" => BenchFields.Absorption, "liquids" => BenchFields.HeavyLiquids,
                        "precision" => BenchFields.Precision, "offset" => BenchFields.CalibrationOffset, "reflectance" => BenchFields.Reflectance,
                        _ => throw new ArgumentException(field),
                    }, value);
                    break;
            }
        }
        return form.Snapshot();
    }

    [Fact]
    public void Every_stone_gives_byte_identical_result_JSON_from_the_command_line_a_batch_line_and_the_text_UI()
    {
        using var run = new CommandRun();
        Assert.True(Stones.Length >= 20);
        string file = Path.Combine(run.Folder, "stones.jsonl");
        File.WriteAllText(file, string.Join("\n", Stones.Select(BatchLine)) + "\n", new UTF8Encoding(false));
        var (batchExit, batchOut, batchErr) = CommandRun.Plain("identify", "--batch", file, "--explain", "--catalogue-dir", run.Folder);
        Assert.True(batchExit == 0, batchErr + batchOut);
        string[] batchLines = batchOut.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(Stones.Length, batchLines.Length);
        var assessor = new BenchAssessor(new Identifier(MergedCatalogue.Load(CatalogueLocations.Under(run.Folder))));
        for (int i = 0; i < Stones.Length; i++)
        {
            Stone s = Stones[i];
            var (exit, output, error) = CommandRun.Plain(["identify", .. CommandLine(s), "--json", "--catalogue-dir", run.Folder]);
            Assert.True(exit == 0, $"{s.Id}: {error}");
            BenchAssessment form = assessor.Assess(Form(s));
            Assert.True(form.Errors.Count == 0, $"{s.Id}: {string.Join("; ", form.Errors)}");
            string fromForm = ResultDocument.Line(form.Result!, explain: true);
            Assert.Equal(output.TrimEnd('\n', '\r'), batchLines[i]);
            Assert.Equal(batchLines[i], fromForm);
            using var doc = JsonDocument.Parse(fromForm);
            Assert.Equal(s.Id, doc.RootElement.GetProperty("id").GetString());
        }
    }

    [Fact]
    public void The_result_document_gives_the_optic_character_the_text_gives_and_a_plain_batch_line_leaves_it_out()
    {
        // Quartz ω 1.544 constant, ε 1.553 (handbook values, from memory): uniaxial positive.
        using var run = new CommandRun();
        Stone quartz = Stones[0];
        var (_, json, _) = CommandRun.Plain(["identify", .. CommandLine(quartz), "--json", "--catalogue-dir", run.Folder]);
        var (_, text, _) = CommandRun.Plain(["identify", .. CommandLine(quartz), "--catalogue-dir", run.Folder]);
        using var doc = JsonDocument.Parse(json);
        JsonElement character = doc.RootElement.GetProperty("optic_character");
        double positive = character.GetProperty("uniaxial_positive").GetDouble();
        Assert.True(positive > 0.5, json);
        Assert.True(positive > character.GetProperty("biaxial").GetDouble() && positive > character.GetProperty("uniaxial_negative").GetDouble());
        Assert.Contains("Optic character, from the readings alone: " + character.GetProperty("summary").GetString(), text);
        Assert.StartsWith("uniaxial positive", character.GetProperty("read_as")[0].GetProperty("description").GetString());
        string file = Path.Combine(run.Folder, "one.jsonl");
        File.WriteAllText(file, BatchLine(quartz) + "\n", new UTF8Encoding(false));
        var (_, plain, _) = CommandRun.Plain("identify", "--batch", file, "--catalogue-dir", run.Folder);
        Assert.DoesNotContain("optic_character", plain);
    }

    [Fact]
    public void Three_bad_fields_get_three_errors_at_once_in_every_front_end()
    {
        using var run = new CommandRun();
        // SG 50 (allowed 0.5–25), an unknown polariscope word, a line at 900 nm (the spectroscope reads 380–780).
        var (exit, _, error) = CommandRun.Plain("identify", "--sg", "50", "--polariscope", "sparkly", "--lines", "900", "--catalogue-dir", run.Folder);
        Assert.Equal(3, exit);
        string[] messages = error.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(3, messages.Length);
        Assert.Contains(messages, m => m.StartsWith("gemindex: --sg: specific gravity is 50; allowed:", StringComparison.Ordinal));
        Assert.Contains(messages, m => m.StartsWith("gemindex: --polariscope: 'sparkly' is not one of", StringComparison.Ordinal));
        Assert.Contains(messages, m => m.StartsWith("gemindex: --lines: absorption line is 900 nm; allowed: 380", StringComparison.Ordinal));

        string file = Path.Combine(run.Folder, "bad.jsonl");
        File.WriteAllText(file, """{"id":"bad","sg":50,"polariscope":"sparkly","absorption_nm":[900]}""" + "\n");
        var (batchExit, batchOut, _) = CommandRun.Plain("identify", "--batch", file, "--catalogue-dir", run.Folder);
        Assert.Equal(3, batchExit);
        using var line = JsonDocument.Parse(batchOut);
        // In the reader's field order.
        Assert.Equal(["sg", "polariscope", "absorption_nm"], line.RootElement.GetProperty("errors").EnumerateArray().Select(e => e.GetProperty("field").GetString()!));

        var form = new BenchModel();
        form.SetText(BenchFields.Sg, "50");
        form.Choose(BenchFields.Polariscope, "sparkly");
        form.SetText(BenchFields.Absorption, "900");
        BenchAssessment a = new BenchAssessor(new Identifier(GemIndex.Tests.TextUi.TestMaterials.All)).Assess(form.Snapshot());
        Assert.Equal(new[] { BenchFields.Absorption, BenchFields.Polariscope, BenchFields.Sg }, a.Errors.Keys.Order(StringComparer.Ordinal).ToArray());
    }

    [Fact]
    public void Calc_sg_and_identify_give_the_same_SG_and_uncertainty_for_one_weighing()
    {
        using var run = new CommandRun();
        var (exit, output, error) = CommandRun.Plain("calc", "sg", "--in-air", "2.65", "--in-water", "1.65", "--json");
        Assert.True(exit == 0, error);
        using var calc = JsonDocument.Parse(output);
        double sg = calc.RootElement.GetProperty("specific_gravity").GetDouble();
        double sigma = calc.RootElement.GetProperty("specific_gravity_uncertainty").GetDouble();
        var reading = Core.Bench.BenchReader.Read(new Core.Bench.BenchReadings().With(Core.Bench.BenchField.AirCt, "2.65").With(Core.Bench.BenchField.WaterCt, "1.65"));
        Assert.Empty(reading.Errors);
        Assert.Equal(reading.Sheet.SpecificGravity!.Value.Value, sg);
        Assert.Equal(reading.Sheet.SpecificGravity!.Value.StandardUncertainty, sigma);
        // First-order propagation by hand (JCGM 100:2008, from memory): k·0.002·√(1.65² + 2.65²)/1² with k = 0.99823
        // (water at 20 °C relative to 4 °C, Tanaka 2001, from memory): 0.00623; SG = k·2.65 = 2.6453.
        Assert.Equal(2.6453, sg, 0.0001);
        Assert.Equal(0.00623, sigma, 0.00001);

    }
}
