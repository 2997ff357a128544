using System.Text.Json;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Observations;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Data.Catalogue;

namespace GemIndex.Tests.CommandLine;

public class CatalogueCommandTests
{
    private static void ImportGood(CommandRun run) =>
        Assert.Equal(0, run.Catalogue("import", CommandRun.Fixture("user-good.csv")).Exit);

    private static JsonElement[] ListJson(CommandRun run, params string[] filters)
    {
        var (exit, output, error) = run.Catalogue(["list", "--json", .. filters]);
        Assert.True(exit == 0, error);
        using JsonDocument doc = JsonDocument.Parse(output);
        return [.. doc.RootElement.GetProperty("materials").EnumerateArray().Select(e => e.Clone())];
    }

    private static IEnumerable<double[]> IndexRanges(JsonElement m) =>
        new[] { "n", "omega", "epsilon", "alpha", "beta", "gamma" }
            .Where(f => m.TryGetProperty(f, out _))
            .Select(f => m.GetProperty(f).EnumerateArray().Select(x => x.GetDouble()).ToArray());

    [Fact]
    public void Version_is_printed_and_exits_0()
    {
        var (exit, output, _) = CommandRun.Plain("--version");
        Assert.Equal(0, exit);
        Assert.NotEmpty(output.Trim());
    }

    [Fact]
    public void Import_of_a_good_file_adds_user_entries_that_list_and_show_see()
    {
        using var run = new CommandRun();
        var (exit, output, error) = run.Catalogue("import", CommandRun.Fixture("user-good.csv"));
        Assert.True(exit == 0, error);
        Assert.Contains("imported 3 entries into", output, StringComparison.Ordinal);
        Assert.True(File.Exists(Path.Combine(run.Folder, "user-catalogue.db")));
        (exit, output, _) = run.Catalogue("list");
        Assert.Equal(0, exit);
        Assert.Contains("my test citrine", output, StringComparison.Ordinal);
        Assert.Contains("RI at 589.3 nm", output, StringComparison.Ordinal);
        Assert.Contains("ω 1.544 ε 1.553", output, StringComparison.Ordinal);
        Assert.Contains("2.65–2.66", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Import_of_a_file_with_bad_rows_imports_nothing_and_names_lines_and_fields_on_stderr()
    {
        using var run = new CommandRun();
        var (exit, _, error) = run.Catalogue("import", CommandRun.Fixture("user-bad.csv"));
        Assert.Equal(3, exit);
        Assert.Contains("gemindex: user-bad.csv: line 3, field n_min: '1,50' has a comma", error, StringComparison.Ordinal);
        Assert.Contains("line 4, field sg_min/sg_max:", error, StringComparison.Ordinal);
        Assert.Contains("line 5, field origin: 'imitaton'", error, StringComparison.Ordinal);
        Assert.Contains("nothing imported: 3 problem(s)", error, StringComparison.Ordinal);
        Assert.False(File.Exists(Path.Combine(run.Folder, "user-catalogue.db")));
    }

    [Fact]
    public void Import_with_json_reports_the_errors_as_json()
    {
        using var run = new CommandRun();
        var (exit, output, _) = run.Catalogue("import", CommandRun.Fixture("user-bad.csv"), "--json");
        Assert.Equal(3, exit);
        using JsonDocument doc = JsonDocument.Parse(output);
        Assert.Equal(0, doc.RootElement.GetProperty("imported").GetInt32());
        Assert.Equal([3, 4, 5], doc.RootElement.GetProperty("errors").EnumerateArray().Select(e => e.GetProperty("line").GetInt32()));
    }

    [Fact]
    public void Import_of_a_missing_file_is_a_usage_error()
    {
        using var run = new CommandRun();
        var (exit, _, error) = run.Catalogue("import", Path.Combine(run.Folder, "none.csv"));
        Assert.Equal(3, exit);   // a refused value, not a usage fault
        Assert.Contains("none.csv", error, StringComparison.Ordinal);
    }

    [Fact]
    public void List_by_index_shows_only_entries_with_an_index_range_within_tolerance()
    {
        using var run = new CommandRun();
        ImportGood(run);
        // Citrine ω 1.544, ε 1.553; glass n 1.50–1.70. 1.560 is 0.007 above ε: in with 0.01, out with 0.005 (glass stays).
        JsonElement[] wide = ListJson(run, "--index", "1.560");
        Assert.Contains(wide, m => m.GetProperty("name").GetString() == "my test citrine");
        Assert.All(wide, m => Assert.Contains(IndexRanges(m), r => 1.560 >= r[0] - 0.01 && 1.560 <= r[1] + 0.01));
        JsonElement[] narrow = ListJson(run, "--index", "1.560", "--tolerance", "0.005");
        Assert.DoesNotContain(narrow, m => m.GetProperty("name").GetString() == "my test citrine");
        Assert.Contains(narrow, m => m.GetProperty("name").GetString() == "my test glass");
    }

    [Fact]
    public void List_by_sg_and_optic_character_filters_both()
    {
        using var run = new CommandRun();
        ImportGood(run);
        JsonElement[] found = ListJson(run, "--sg", "2.70", "--optic-character", "uniaxial");
        Assert.Contains(found, m => m.GetProperty("name").GetString() == "my test citrine"); // 2.66 + 0.05 ≥ 2.70
        Assert.All(found, m => Assert.Equal("uniaxial", m.GetProperty("optic_character").GetString()));
        Assert.All(found, m => Assert.True(m.GetProperty("sg")[0].GetDouble() - 0.05 <= 2.70 && m.GetProperty("sg")[1].GetDouble() + 0.05 >= 2.70));
        Assert.DoesNotContain(ListJson(run, "--sg", "2.80"), m => m.GetProperty("name").GetString() == "my test citrine");
    }

    [Theory]
    [InlineData("--index", "1,544", "--index: '1,544' has a comma")]
    [InlineData("--index", "NaN", "--index: 'NaN' is not a finite number")]
    [InlineData("--index", "abc", "--index: 'abc' is not a number")]
    [InlineData("--index", "5", "--index: refractive index is 5; allowed: 1 to 4.")]
    [InlineData("--sg", "30", "--sg: specific gravity is 30")]
    [InlineData("--tolerance", "0", "--tolerance: refractive-index tolerance is 0; allowed: above 0 up to 0.5.")]
    public void Bad_numbers_are_usage_errors_naming_the_option_and_the_value(string option, string value, string expected)
    {
        using var run = new CommandRun();
        var (exit, _, error) = run.Catalogue("list", option, value);
        Assert.Equal(3, exit);   // a refused value, not a usage fault
        Assert.Contains(expected, error, StringComparison.Ordinal);
    }

    [Fact]
    public void An_unknown_optic_character_is_a_usage_error()
    {
        using var run = new CommandRun();
        var (exit, _, error) = run.Catalogue("list", "--optic-character", "cubic");
        Assert.Equal(3, exit);   // a refused value, not a usage fault
        Assert.Contains("'cubic'", error, StringComparison.Ordinal);
    }

    [Fact]
    public void Show_prints_every_field_of_an_entry_found_ignoring_case()
    {
        using var run = new CommandRun();
        ImportGood(run);
        var (exit, output, _) = run.Catalogue("show", "MY TEST CITRINE");
        Assert.Equal(0, exit);
        foreach (string label in new[] { "species", "variety", "origin", "crystal system", "optic character", "ω at 589.3 nm",
                     "ε at 589.3 nm", "birefringence", "specific gravity", "dispersion", "hardness", "pleochroism", "polariscope",
                     "thermal probe", "electrical", "UV long (365 nm)", "UV short (254 nm)", "absorption", "colours", "forms", "opaque",
                     "species frequency", "share of species", "do not immerse", "notes", "entry", "sources" })
            Assert.Contains(label, output, StringComparison.Ordinal);
        Assert.Contains("heated, from a test parcel", output, StringComparison.Ordinal);
        Assert.Contains("your own (user catalogue)", output, StringComparison.Ordinal);
        Assert.Contains("own measurements (invented test data) [user: my test citrine, from memory]", output, StringComparison.Ordinal);
        // A shipped entry's kind alone where its key only repeats it.
        var (_, ruby, _) = run.Catalogue("show", "ruby");
        Assert.Contains("[common practice]", ruby, StringComparison.Ordinal);
        Assert.DoesNotContain("[practice, common practice]", ruby, StringComparison.Ordinal);
        // The family in words, not its file's name; a species of no mineral group says so.
        var (_, nephrite, _) = run.Catalogue("show", "green nephrite");
        Assert.Matches(@"family\s+jade and ornamentals", nephrite);
        Assert.Matches(@"mineral group\s+none", nephrite);
    }

    [Fact]
    public void Show_of_an_inheriting_user_entry_lists_each_value_with_its_source()
    {
        using var run = new CommandRun();
        ImportGood(run);
        var (exit, output, _) = run.Catalogue("show", "my test amethyst");
        Assert.Equal(0, exit);
        Assert.Contains("own fields         sg, colours (the rest from species 'quartz')", output, StringComparison.Ordinal);
        string[] sources = output[output.IndexOf("\nsources\n", StringComparison.Ordinal)..].Split('\n');
        Assert.Contains(sources, l => l.StartsWith("  colours, sg: own measurements (invented test data) [user: my test citrine".Replace("citrine", "amethyst", StringComparison.Ordinal), StringComparison.Ordinal));
        // The inherited indices carry the shipped quartz species' own published source, not the user row's.
        Assert.Contains(sources, l => l.Contains("epsilon", StringComparison.Ordinal) && l.Contains("omega", StringComparison.Ordinal)
            && !l.Contains("[user:", StringComparison.Ordinal) && !l.Contains("from memory", StringComparison.Ordinal));
    }

    [Fact]
    public void Show_json_gives_the_family_file_fields()
    {
        using var run = new CommandRun();
        ImportGood(run);
        var (exit, output, _) = run.Catalogue("show", "my test glass", "--json");
        Assert.Equal(0, exit);
        using JsonDocument doc = JsonDocument.Parse(output);
        Assert.Equal([1.50, 1.70], doc.RootElement.GetProperty("n").EnumerateArray().Select(x => x.GetDouble()));
        Assert.Equal("very_common", doc.RootElement.GetProperty("frequency").GetString());
        Assert.Equal("very_common", doc.RootElement.GetProperty("share").GetString());
        Assert.Equal(["amorphous"], doc.RootElement.GetProperty("forms").EnumerateArray().Select(x => x.GetString()));
        Assert.Equal("user: my test glass", doc.RootElement.GetProperty("sources").GetProperty("n").GetString());
        JsonElement reference = Assert.Single(doc.RootElement.GetProperty("references").EnumerateArray());
        Assert.Equal(("user: my test glass", "from_memory", "own measurements (invented test data)"),
            (reference.GetProperty("key").GetString(), reference.GetProperty("kind").GetString(), reference.GetProperty("citation").GetString()));
        Assert.True(doc.RootElement.GetProperty("is_user_entry").GetBoolean());
    }

    [Fact]
    public void Show_names_a_protected_material_s_trade_rule_in_text_and_json_and_leaves_it_out_elsewhere()
    {
        // The hawksbill is in CITES Appendix I (the CITES appendices, as reference-db/trade-rules.json cites them).
        using var run = new CommandRun();
        var (exit, text, _) = run.Catalogue("show", "tortoiseshell");
        Assert.Equal(0, exit);
        Assert.Contains("trade ", text);
        Assert.Contains("Appendix I (a summary, not legal advice; Convention on International Trade", text);
        var (_, json, _) = run.Catalogue("show", "tortoiseshell", "--json");
        using JsonDocument doc = JsonDocument.Parse(json);
        Assert.Matches(@"Appendix I$", doc.RootElement.GetProperty("trade_rule").GetProperty("text").GetString());
        var (_, quartz, _) = run.Catalogue("show", "rock crystal", "--json");
        Assert.DoesNotContain("trade_rule", quartz);
    }

    [Fact]
    public void Show_of_an_unknown_name_is_one_line_on_stderr_and_exit_3()
    {
        using var run = new CommandRun();
        ImportGood(run);
        var (exit, output, error) = run.Catalogue("show", "test");
        Assert.Equal(3, exit);
        Assert.Empty(output);
        Assert.Equal("gemindex: no entry named 'test'", error.Split(" among ")[0]);
        Assert.Contains("did you mean: my test citrine, my test glass, my test amethyst?", error, StringComparison.Ordinal);
        Assert.Single(error.TrimEnd().Split('\n'));
    }

    [Fact]
    public void Check_of_the_shipped_catalogue_passes_when_it_has_entries_and_fails_clearly_when_empty()
    {
        // Asserts on whatever family files reference-db/materials holds: with none, the catalogue is empty and check must fail.
        using var run = new CommandRun();
        var (exit, output, error) = run.Catalogue("check");
        if (ShippedCatalogue.Sources.Count == 0)
        {
            Assert.Equal(3, exit);
            Assert.Contains("the catalogue is empty", error, StringComparison.Ordinal);
        }
        else
        {
            Assert.True(exit == 0, error);
            Assert.Matches(@"(?m)^\d+ entries checked, no findings$", output);
            Assert.Matches(@"(?m)^sourced entries: \d+ of \d+ \(\d+\.\d %\) have every index, birefringence, SG and dispersion from a published work$", output);
            Assert.Matches(@"(?m)^numeric values: \d+: published \d+, from memory \d+, common practice \d+, judgement \d+, no source 0$", output);
        }
    }

    [Fact]
    public void Check_reports_each_finding_on_stderr_naming_entry_and_field_and_exits_3()
    {
        using var run = new CommandRun();
        var bad = new Material
        {
            Name = "bad entry", Species = "Quartz", Variety = "v", Origin = OriginClass.Natural, CrystalSystem = CrystalSystem.Cubic,
            Indices = OpticalIndices.SingleIndex(new(1.5, 1.5)), SpecificGravity = new(2.6, 2.6),
            Polariscope = [PolariscopeReaction.SinglyRefractive],
            Sources = new Dictionary<string, ValueSource> { ["n"] = new("memory", SourceKind.FromMemory, "from memory of standard handbook values"), ["sg"] = new("memory", SourceKind.FromMemory, "from memory of standard handbook values") },
        };
        // Written directly, as a damaged or hand-edited user catalogue would be: import would refuse it.
        CatalogueBuilder.Write([bad, bad with { Name = "other", Sign = OpticSign.Positive }], Path.Combine(run.Folder, "user-catalogue.db"), "user", "");
        var (exit, _, error) = run.Catalogue("check");
        Assert.Equal(3, exit);
        Assert.Contains("gemindex: user catalogue: entry 'bad entry', field species: 'Quartz' must be lower-case", error, StringComparison.Ordinal);
        Assert.Contains("gemindex: user catalogue: entry 'other', field optic_sign:", error, StringComparison.Ordinal);
        Assert.Contains("finding(s) in", error, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_with_json_lists_the_findings()
    {
        using var run = new CommandRun();
        ImportGood(run);
        var (_, output, _) = run.Catalogue("check", "--json");
        using JsonDocument doc = JsonDocument.Parse(output);
        int entries = doc.RootElement.GetProperty("entries").GetInt32();
        Assert.True(entries >= 3);
        JsonElement sourcing = doc.RootElement.GetProperty("sourcing");
        Assert.Equal(entries, sourcing.GetProperty("entries").GetInt32());
        Assert.Equal(sourcing.GetProperty("values").GetInt32(), new[] { "published_values", "memory_values", "practice_values", "judgement_values", "unsourced_values" }
            .Sum(p => sourcing.GetProperty(p).GetInt32()));
        Assert.Equal(JsonValueKind.Array, doc.RootElement.GetProperty("findings").ValueKind);
    }

    [Fact]
    public void A_damaged_user_catalogue_is_one_clear_line_and_exit_4_never_a_stack_trace()
    {
        using var run = new CommandRun();
        File.WriteAllText(Path.Combine(run.Folder, "user-catalogue.db"), new string('x', 4096));
        var (exit, _, error) = run.Catalogue("list");
        Assert.Equal(4, exit);
        Assert.StartsWith("gemindex: ", error, StringComparison.Ordinal);
        Assert.Contains("user-catalogue.db", error, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", error, StringComparison.Ordinal);
    }

    [Fact]
    public void Build_writes_a_catalogue_that_loads_back()
    {
        using var run = new CommandRun();
        string output = Path.Combine(run.Folder, "built.db");
        var (exit, text, error) = run.Catalogue("build", "--output", output, "--source", CommandRun.Fixture("families"));
        Assert.True(exit == 0, error);
        Assert.Contains("built 5 entries from 2 family files", text, StringComparison.Ordinal);
        using CatalogueStore store = CatalogueStore.Open(output);
        Assert.Equal(5, store.LoadAll().Count);
    }

    [Fact]
    public void Build_refuses_family_files_with_errors_and_writes_nothing()
    {
        using var run = new CommandRun();
        string source = Path.Combine(run.Folder, "families");
        Directory.CreateDirectory(source);
        File.WriteAllText(Path.Combine(source, "broken.json"), "{ \"family\": \"broken\", \"species\": [ { \"species\": 1 } ] }");
        string output = Path.Combine(run.Folder, "built.db");
        var (exit, _, error) = run.Catalogue("build", "--output", output, "--source", source);
        Assert.Equal(3, exit);
        Assert.StartsWith("gemindex: broken.json: line 1, species 0, field species:", error, StringComparison.Ordinal);
        Assert.False(File.Exists(output));
    }

    [Fact]
    public void Build_of_an_empty_folder_refuses_to_write_an_empty_catalogue()
    {
        using var run = new CommandRun();
        string source = Path.Combine(run.Folder, "empty");
        Directory.CreateDirectory(source);
        var (exit, _, error) = run.Catalogue("build", "--output", Path.Combine(run.Folder, "x.db"), "--source", source);
        Assert.Equal(3, exit);
        Assert.Contains("no catalogue entries to build", error, StringComparison.Ordinal);
    }

    [Fact]
    public void An_entrys_optic_character_is_said_in_the_benchs_words_with_either_sign_in_words()
    {
        var glass = GemIndex.Tests.TextUi.TestMaterials.All[0] with { Indices = OpticalIndices.SingleIndex(new(1.50, 1.52), OpticCharacter.Amorphous), Sign = OpticSign.None };
        Assert.Equal("singly refractive (amorphous)", GemIndex.Cli.CommandLine.MaterialText.Character(glass));
        var either = GemIndex.Tests.TextUi.TestMaterials.All[0] with { Sign = OpticSign.Either };
        Assert.StartsWith(GemIndex.Cli.TextUi.Results.ResultText.Character(either.OpticCharacter), GemIndex.Cli.CommandLine.MaterialText.Character(either));
        Assert.EndsWith(", either sign", GemIndex.Cli.CommandLine.MaterialText.Character(either));
    }
}
