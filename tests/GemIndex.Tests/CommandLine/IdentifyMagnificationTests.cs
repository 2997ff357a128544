using System.Text.Json;

namespace GemIndex.Tests.CommandLine;

public class IdentifyMagnificationTests
{
    [Fact]
    public void Features_seen_and_not_seen_reach_the_reasons()
    {
        // Corundum ω 1.768, ε 1.760, SG 4.00 (handbook values, from memory) with the curved striae of flame fusion.
        using var run = new CommandRun();
        var (exit, stdout, error) = CommandRun.Plain("identify", "--edge", "0:1.760/1.768", "--sg", "4.00", "--feature", "curved_striae",
            "--feature", "round_bubbles", "--no-feature", "needles_silk", "--json", "--catalogue-dir", run.Folder);
        Assert.True(exit == 0, error);
        using var doc = JsonDocument.Parse(stdout);
        Assert.Contains("curved striae seen", stdout);
        var corundum = doc.RootElement.GetProperty("species").EnumerateArray().First(s => s.GetProperty("species").GetString() == "corundum");
        Assert.True(corundum.GetProperty("origins").GetProperty("synthetic").GetDouble() > 0.5, corundum.ToString());
    }

    [Fact]
    public void The_text_answer_lists_the_features_with_their_meaning()
    {
        using var run = new CommandRun();
        var (exit, stdout, error) = CommandRun.Plain("identify", "--sg", "4.00", "--feature", "curved_striae", "--no-feature", "needles_silk", "--catalogue-dir", run.Folder);
        Assert.True(exit == 0, error);
        var striae = GemIndex.Core.Magnification.MagnificationVocabulary.Of(GemIndex.Core.Magnification.MagnificationFeature.CurvedStriae);
        // Each worded as an indication beside the observation, not as a finding (a report may go to a client).
        Assert.Contains($"Seen under magnification: {striae.Name}: points to: {striae.Meaning}", stdout);
        var silk = GemIndex.Core.Magnification.MagnificationVocabulary.Of(GemIndex.Core.Magnification.MagnificationFeature.NeedlesAndSilk);
        Assert.Contains($"Looked for, not seen: needles and silk: had it been seen, it would point to: {silk.Meaning}", stdout);
    }

    [Fact]
    public void An_unknown_feature_exits_3_naming_the_option_and_the_allowed_words()
    {
        using var run = new CommandRun();
        var (exit, _, error) = CommandRun.Plain("identify", "--sg", "4.00", "--no-feature", "sparkles", "--catalogue-dir", run.Folder);
        Assert.Equal(3, exit);
        Assert.Contains("--no-feature: 'sparkles' is not a magnification feature; allowed: curved_striae", error);
    }

    [Fact]
    public void A_feature_both_seen_and_not_seen_exits_3()
    {
        using var run = new CommandRun();
        var (exit, _, error) = CommandRun.Plain("identify", "--sg", "4.00", "--feature", "flux_residue", "--no-feature", "flux_residue", "--catalogue-dir", run.Folder);
        Assert.Equal(3, exit);
        Assert.Contains("--no-feature:", error);
    }

    [Fact]
    public void Schreger_lines_or_bone_canals_separate_ivory_from_bone_and_the_loupe_is_the_next_test()
    {
        // A white carving, spot 1.54, SG 1.80: inside both ivory's published ranges (gemdat, citing Lazzarelli and
        // Schumann) and bone's (SG after Bukanov; its index from memory), so only the structure tells them (Espinoza and
        // Mann, USFWS ivory identification guide: Schreger lines in elephant and mammoth ivory, Haversian canals in bone).
        using var run = new CommandRun();
        double Share(string species, params string[] looks) => SpeciesOf(run, ["--spot", "1.54", "--sg", "1.80", "--colour", "white", .. looks])
            .Where(s => s.GetProperty("species").GetString() == species).Select(s => s.GetProperty("confidence").GetDouble()).SingleOrDefault();
        Assert.True(Share("ivory") is > 0.1 and < 0.8, "without a look neither leads by far");
        Assert.True(Share("ivory", "--feature", "schreger_lines") > 0.9);
        Assert.True(Share("bone", "--feature", "haversian_canals") > 0.9);
        Assert.True(Share("bone", "--no-feature", "haversian_canals") < Share("bone"), "looked for and not seen counts against bone");

        var (_, text, _) = CommandRun.Plain("identify", "--spot", "1.54", "--sg", "1.80", "--colour", "white", "--catalogue-dir", run.Folder);
        string next = text.Split('\n').Single(l => l.StartsWith("Next test:", StringComparison.Ordinal));
        Assert.Contains("Haversian canals", next);
        Assert.Contains("Schreger lines", next);
    }

    [Fact]
    public void Doubling_of_facet_edges_parts_a_colourless_zircon_from_cubic_zirconia_over_the_limit()
    {
        // A colourless stone over the limit, thermal probe negative (common practice: zircon, cubic zirconia and the other
        // high-index simulants). Zircon's birefringence of about 0.04–0.06 doubles the back facet edges under a loupe, which
        // singly refractive cubic zirconia never does (common practice).
        using var run = new CommandRun();
        string[] readings = ["--over-limit", "--colour", "colourless", "--thermal-probe", "negative"];
        string Leader(params string[] looks) => SpeciesOf(run, [.. readings, .. looks])[0].GetProperty("species").GetString()!;
        Assert.Equal("cubic zirconia", Leader());
        Assert.Equal("zircon", Leader("--feature", "doubling"));
        Assert.Equal("cubic zirconia", Leader("--no-feature", "doubling"));
        var (_, text, _) = CommandRun.Plain(["identify", .. readings, "--feature", "doubling", "--catalogue-dir", run.Folder]);
        Assert.Contains("Seen under magnification: doubling of facet edges: points to: strong double refraction", text);
    }

    [Fact]
    public void Growth_tubes_seen_lead_a_green_cabochon_at_1_63_to_the_tourmalines()
    {
        // A green cabochon read by spot at 1.63: tourmaline, apatite, nephrite and others share the index (handbook values,
        // from memory). Tourmaline grows straight tubes parallel to its length (G&G 2024 micro-features chart), apatite and
        // nephrite do not (common practice), so tubes seen leave the tourmalines in front.
        using var run = new CommandRun();
        string[] readings = ["--spot", "1.63", "--colour", "green"];
        double Tourmaline(params string[] looks) => SpeciesOf(run, [.. readings, .. looks])
            .Where(s => s.TryGetProperty("mineral_group", out var g) && g.GetString() == "tourmaline").Sum(s => s.GetProperty("confidence").GetDouble());
        Assert.True(Tourmaline() < 0.3);
        Assert.True(Tourmaline("--feature", "growth_tubes") > 0.6);
        Assert.True(Tourmaline("--no-feature", "growth_tubes") < Tourmaline(), "looked for and not seen counts a little against tourmaline");
        Assert.Equal("elbaite", SpeciesOf(run, [.. readings, "--feature", "growth_tubes"])[0].GetProperty("species").GetString());
    }

    [Fact]
    public void Elongated_bubbles_point_an_amber_to_pressed_amber_and_the_loupe_is_the_next_test()
    {
        // Amber's spot 1.54 and SG 1.08, floating in saturated brine (1.13), orange (handbook values from memory); pressed
        // amber is fragments joined under heat and pressure, with flow structure (the catalogue's source), its bubbles
        // drawn out (common practice).
        using var run = new CommandRun();
        string[] readings = ["--spot", "1.54", "--sg", "1.08", "--heavy-liquid", "1.13 floats", "--uv-long", "strong", "--colour", "orange", "--cut", "cabochon"];
        double Pressed(params string[] looks) => SpeciesOf(run, [.. readings, .. looks, "--candidates", "20"])
            .SelectMany(s => s.GetProperty("candidates").EnumerateArray())
            .Where(c => c.GetProperty("name").GetString() == "pressed amber").Sum(c => c.GetProperty("confidence").GetDouble());
        Assert.True(Pressed() < 0.3);
        Assert.True(Pressed("--feature", "elongated_bubbles") > 0.8);
        var (exit, text, error) = CommandRun.Plain(["identify", .. readings, "--catalogue-dir", run.Folder]);
        Assert.True(exit == 0, error);
        Assert.Contains("Next test: loupe or microscope (magnification): look for elongated gas bubbles", text, StringComparison.Ordinal);
    }

    [Fact]
    public void A_red_spinel_s_chromium_lines_leave_the_flux_grown_synthetic_open()
    {
        // Spinel n 1.718, SG 3.60 (handbook values, from memory), red, with the chromium lines near 685 nm and the band
        // near 540 nm: flux-grown red synthetic spinel is chromium-coloured too and shows them (common practice), so the
        // lines must not call the stone natural.
        using var run = new CommandRun();
        var spinel = SpeciesOf(run, ["--edge", "0:1.718", "--edge", "90:1.718", "--sg", "3.60", "--polariscope", "singly_refractive",
            "--colour", "red", "--cut", "faceted", "--lines", "686 684 675 540"])[0];
        Assert.Equal("spinel", spinel.GetProperty("species").GetString());
        var origins = spinel.GetProperty("origins");
        Assert.True(origins.GetProperty("synthetic").GetDouble() > 0.1 && origins.GetProperty("natural").GetDouble() < 0.9, origins.ToString());
    }

    [Fact]
    public void An_alexandrite_s_chromium_and_iron_lines_leave_natural_and_synthetic_open()
    {
        // Chrysoberyl α 1.745, γ 1.754, SG 3.73 (handbook values, from memory), trichroic, a colour change, and the
        // alexandrite spectrum (chromium doublet 680.5/678.5, 665, 655, 645; 473 and 468): synthetic alexandrite shows
        // the same spectrum as natural (common practice), so the lines must not decide the origin.
        using var run = new CommandRun();
        var chrysoberyl = SpeciesOf(run, ["--edge", "0:1.745/1.754", "--edge", "90:1.747/1.754", "--sg", "3.73", "--pleochroism", "trichroic",
            "--feature", "colour_change", "--lines", "680.5 678.5 665 655 645 473 468"])[0];
        Assert.Equal("chrysoberyl", chrysoberyl.GetProperty("species").GetString());
        var origins = chrysoberyl.GetProperty("origins");
        Assert.True(origins.GetProperty("natural").GetDouble() > 0.2 && origins.GetProperty("synthetic").GetDouble() > 0.2, origins.ToString());
        // The cat's-eye variety shows the same spectrum: on a faceted stone (no eye) the chromium doublet alone leaves it
        // at the cut's misread share, not lifted by a shorter list of lines.
        var faceted = SpeciesOf(run, ["--edge", "0:1.745/1.754", "--edge", "90:1.747/1.754", "--sg", "3.73", "--lines", "680.5 678.5", "--cut", "faceted", "--candidates", "20"])[0];
        double catsEye = faceted.GetProperty("candidates").EnumerateArray().Where(c => c.GetProperty("name").GetString() == "cat's-eye alexandrite")
            .Sum(c => c.GetProperty("confidence").GetDouble());
        Assert.True(catsEye < 0.01, $"{catsEye}");
    }

    [Fact]
    public void A_blue_beryl_s_usual_indices_lead_with_aquamarine_not_the_rarely_met_synthetic()
    {
        // Aquamarine's usual RI 1.577-1.583 (gemstone pages, e.g. amezin.com): inside both the natural entries' range and the
        // narrow published range of hydrothermal synthetic aquamarine, which a bench seldom meets (a small production).
        using var run = new CommandRun();
        var beryl = SpeciesOf(run, ["--edge", "0:1.577/1.583", "--edge", "45:1.579/1.583", "--edge", "90:1.582/1.583", "--edge", "135:1.580/1.583", "--colour", "blue"])[0];
        Assert.Equal("beryl", beryl.GetProperty("species").GetString());
        var origins = beryl.GetProperty("origins");
        Assert.True(origins.GetProperty("natural").GetDouble() + origins.GetProperty("treated").GetDouble() > origins.GetProperty("synthetic").GetDouble(), origins.ToString());
        Assert.NotEqual("hydrothermal synthetic aquamarine", beryl.GetProperty("candidates")[0].GetProperty("name").GetString());
    }

    [Fact]
    public void Nacre_platelet_edges_seen_rule_out_the_coated_bead_imitations()
    {
        // A white bead, spot 1.53 (one end of aragonite's blink), SG 2.71: inside the catalogue's ranges of pearl,
        // mother-of-pearl and the coated shell bead alike (aragonite's index and SG, from handbooks, from memory). Overlapping nacre layers end in serrated lines on a pearl's surface
        // (Kunz and Stevenson 1908); a coating looks smooth. Twenty candidates, so that the bead is listed among the
        // pearls' origins and mother-of-pearl whatever its share.
        using var run = new CommandRun();
        double Entry(string name, params string[] looks) => SpeciesOf(run, ["--spot", "1.53", "--sg", "2.71", "--colour", "white", "--candidates", "20", .. looks])
            .SelectMany(s => s.GetProperty("candidates").EnumerateArray())
            .Where(c => c.GetProperty("name").GetString() == name).Select(c => c.GetProperty("confidence").GetDouble()).SingleOrDefault();
        double before = Entry("coated shell bead imitation pearl");
        Assert.True(before > 0.02, $"without a look the coated bead holds {before}");
        Assert.True(Entry("coated shell bead imitation pearl", "--feature", "nacre_platelets") < before / 20);
        Assert.True(Entry("freshwater cultured pearl", "--feature", "nacre_platelets") > Entry("freshwater cultured pearl"));
    }

    [Fact]
    public void A_nacreous_bead_is_a_pearl_whose_culturing_the_bench_cannot_tell()
    {
        // The same white bead with its nacre seen. Cultured pearls are named apart from natural ones in the trade, and
        // only a laboratory's X-radiography tells them apart (common practice): the answer leads with the pearl, holds
        // the cultured ones above the natural (the catalogue's shares) without calling either, and says so.
        using var run = new CommandRun();
        var (exit, text, error) = CommandRun.Plain("identify", "--spot", "1.53", "--sg", "2.71", "--colour", "white", "--feature", "nacre_platelets", "--catalogue-dir", run.Folder);
        Assert.True(exit == 0, error);
        Assert.StartsWith("Species: pearl ", text.Split('\n').First(l => l.StartsWith("Species:", StringComparison.Ordinal)));
        JsonElement pearl = SpeciesOf(run, ["--spot", "1.53", "--sg", "2.71", "--colour", "white", "--feature", "nacre_platelets"])[0];
        var origins = pearl.GetProperty("origins");
        double cultured = origins.GetProperty("cultured").GetDouble(), natural = origins.GetProperty("natural").GetDouble();
        Assert.True(cultured > natural && natural > 0.05 * pearl.GetProperty("confidence").GetDouble(), pearl.ToString());
        Assert.True(cultured < 0.8 * pearl.GetProperty("confidence").GetDouble(), "no test here decides the origin");
        // No bench test is offered for it, even one whose catalogue outcomes differ between the kinds (their glow).
        Assert.Contains("Warning: Pearl: cultured and natural cannot be separated by these tests; no bench test left here separates them; "
            + "for a valuable stone refer it to a qualified laboratory (its X-radiography tells cultured from natural).", text);
        var (_, unlooked, _) = CommandRun.Plain("identify", "--spot", "1.53", "--sg", "2.71", "--colour", "white", "--catalogue-dir", run.Folder);
        Assert.Contains("Warning: Pearl: cultured and natural cannot be separated by these tests; no bench test left here separates them;", unlooked);
    }

    /// <summary>The answer's species list for <c>identify</c> with these readings, as JSON.</summary>
    private static List<JsonElement> SpeciesOf(CommandRun run, string[] readings)
    {
        var (exit, stdout, error) = CommandRun.Plain(["identify", .. readings, "--json", "--catalogue-dir", run.Folder]);
        Assert.True(exit == 0, error);
        using var doc = JsonDocument.Parse(stdout);
        return [.. doc.RootElement.GetProperty("species").EnumerateArray().Select(s => s.Clone())];
    }
}
