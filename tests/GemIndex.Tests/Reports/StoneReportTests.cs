using System.Text.Json;
using GemIndex.Cli.Reports;
using GemIndex.Core.Identification;

namespace GemIndex.Tests.Reports;

public class StoneReportTests
{
    [Fact]
    public void A_quartz_reading_ranks_quartz_first_with_its_derived_properties()
    {
        var report = ReportFixtures.Report(ReportFixtures.QuartzLine);
        Assert.Equal("quartz", report.Candidates[0].Name);
        Assert.Equal("uniaxial", report.Character);
        Assert.NotNull(report.SpecificGravity);
        // 2.650 / (2.650 − 1.650) = 2.650 times the water density at 20 °C (0.9982 g/cm³): 2.645, before any correction.
        Assert.Equal(2.645, report.SpecificGravity!.Value.Value, 0.005);
    }

    public static TheoryData<string> Formats => new() { "markdown", "html", "json" };

    [Theory]
    [InlineData("10.1 x 8.0 x 5.2", "10.1 x 8.0 x 5.2 mm")]   // the form's unit added to bare numbers
    [InlineData("10.1 x 8.0 x 5.2 mm", "10.1 x 8.0 x 5.2 mm")]
    [InlineData("about 8 mm round", "about 8 mm round")]
    public void Dimensions_carry_their_unit(string typed, string shown)
    {
        var sheet = ReportFixtures.Sheet(ReportFixtures.QuartzLine) with { Dimensions = typed };
        var report = StoneReport.Build(sheet, ReportFixtures.Identify(sheet));
        Assert.Equal(shown, report.Description.Single(f => f.Key == "dimensions").Value);
    }

    [Theory]
    [InlineData("", "opaque")]                          // a readings file: no description, the reading's word
    [InlineData("opaque, waxy lustre", "opaque, waxy lustre")] // the text UI: the description's words, whose first word is the reading
    public void The_transparency_is_said_once_and_never_not_recorded_beside_a_reading(string described, string shown)
    {
        string line = ReportFixtures.QuartzLine.Replace("\"colour\"", "\"transparency\":\"opaque\",\"colour\"");
        var sheet = ReportFixtures.Sheet(line) with { Transparency = described };
        var report = StoneReport.Build(sheet, ReportFixtures.Identify(sheet));
        Assert.Equal(shown, report.Description.Single(f => f.Key == "transparency").Value);
        string markdown = MarkdownReport.Write(report);
        Assert.Single(System.Text.RegularExpressions.Regex.Matches(markdown, "Transparency"));
        Assert.DoesNotContain("Transparency:** not recorded", markdown);
    }

    [Fact]
    public void A_series_whose_biaxial_readings_have_2V_near_0_is_said_uniaxial_with_them_in_every_front_end()
    {
        // Common practice: a corundum with its optic axis in the facet, read at eight steps (ω 1.768 stays, ε 1.761 at 0°).
        var p = new OpticCharacterPosterior(0, 0, 0.47, 0.53);
        var series = new GemIndex.Core.Readings.RotationSeriesResult
        {
            Character = GemIndex.Core.Optics.Indicatrix.OpticCharacter.Uniaxial, BiaxialLooksUniaxial = true,
            Interpretations =
            [
                new() { Character = GemIndex.Core.Optics.Indicatrix.OpticCharacter.Uniaxial, Sign = GemIndex.Core.Optics.Indicatrix.OpticSign.Negative, Weight = 0.47,
                    Lowest = new(1.761), Highest = new(1.768), Birefringence = new(0.007, 0.001), Description = "uniaxial negative" },
                new() { Character = GemIndex.Core.Optics.Indicatrix.OpticCharacter.Biaxial, Sign = GemIndex.Core.Optics.Indicatrix.OpticSign.Negative, Weight = 0.265,
                    Lowest = new(1.761), Highest = new(1.768), Beta = new(1.768), Birefringence = new(0.007, 0.001), Description = "biaxial" },
                new() { Character = GemIndex.Core.Optics.Indicatrix.OpticCharacter.Biaxial, Sign = GemIndex.Core.Optics.Indicatrix.OpticSign.Negative, Weight = 0.265,
                    Lowest = new(1.761), Highest = new(1.768), Beta = new(1.7675), Birefringence = new(0.007, 0.001), Description = "biaxial" },
            ],
        };
        Assert.Equal("uniaxial (or biaxial, 2V near 0°: not told apart) >99.9 % (negative >99.9 %)", ReportDerived.CharacterOdds(p, series: series));
        Assert.Equal("biaxial 53.0 %, uniaxial 47.0 % (negative 47.0 %)", ReportDerived.CharacterOdds(p));   // without the readings: the posterior as it is
    }

    [Fact]
    public void A_high_edge_hidden_above_the_liquid_is_not_seen_in_the_step_table_not_a_blank()
    {
        // Invented readings: the high edge rises above a 1.79 liquid at three of eight steps.
        var report = ReportFixtures.Report("""{"id":"h","refractometer":{"method":"facet","liquid_limit":1.79,"readings":[{"rotation_deg":0,"low":1.757,"high":1.762},{"rotation_deg":22.5,"low":1.757,"high":1.77},{"rotation_deg":45,"low":1.757,"high":1.782},{"rotation_deg":67.5,"low":1.757},{"rotation_deg":90,"low":1.757},{"rotation_deg":112.5,"low":1.757},{"rotation_deg":135,"low":1.757,"high":1.785},{"rotation_deg":157.5,"low":1.757,"high":1.768}]}}""");
        string markdown = MarkdownReport.Write(report);
        Assert.Contains("| 90° | 1.757 | not seen (liquid 1.790) |", markdown);
        Assert.Contains("not seen (liquid 1.790)", HtmlReport.Write(report));
        // One edge at every step: no second edge to miss.
        var single = ReportFixtures.Report("""{"id":"s","refractometer":{"method":"facet","readings":[{"rotation_deg":0,"low":1.718},{"rotation_deg":90,"low":1.718}]}}""");
        Assert.Contains("| 1.718 | — |", MarkdownReport.Write(single));
    }

    [Fact]
    public void Hydrostatic_weights_are_given_to_the_balances_thousandth()
    {
        var report = ReportFixtures.Report("""{"id":"w","sg":{"air_ct":1.520,"water_ct":1.258}}""");
        Assert.Equal("1.520 ct", report.ReadingFields.Single(f => f.Key == "weight_in_air").Value);
        Assert.Equal("1.258 ct", report.ReadingFields.Single(f => f.Key == "weight_in_water").Value);
    }

    [Fact]
    public void A_calibration_offset_is_given_beside_the_readings_it_shifts()
    {
        // The step table gives the edges as read; the derived indices have the offset added (quartz ω 1.544, ε 1.553,
        // from memory, read 0.010 low): without the offset the two could not be reconciled.
        var report = ReportFixtures.Report("""{"id":"c","refractometer":{"method":"facet","calibration_offset":0.01,"precision":0.001,"readings":[{"rotation_deg":0,"low":1.534,"high":1.543},{"rotation_deg":90,"low":1.534,"high":1.539}]}}""");
        Assert.StartsWith("+0.010, added to every reading", report.ReadingFields.Single(f => f.Key == "calibration_offset").Value);
        Assert.Equal("± 0.001 (one standard uncertainty)", report.ReadingFields.Single(f => f.Key == "precision").Value);
        Assert.Contains("Calibration offset", MarkdownReport.Write(report));
        Assert.DoesNotContain(ReportFixtures.Report(ReportFixtures.QuartzLine).ReadingFields, f => f.Key == "calibration_offset");
    }

    [Fact]
    public void A_spot_reading_is_given_as_read_to_the_hundredth()
    {
        // A spot reading is read to 0.01 on the scale (common practice): "1.610" claimed a third decimal never read.
        var report = ReportFixtures.Report("""{"id":"s","refractometer":{"method":"spot","spot":1.61},"sg":2.7}""");
        Assert.Equal("refractive index 1.61", report.ReadingFields.Single(f => f.Key == "spot").Value);
    }

    [Fact]
    public void A_reading_whose_character_the_series_leaves_open_names_no_sign()
    {
        var open = new ReportInterpretation("undetermined", "none", 1, 1.617, 1.621, null, 0.004, 0.001, "one step: which edge moves is not seen");
        // No chance beside it: the optic character's odds above it give the character, and "chance 100%" beside
        // "undetermined" read as a contradiction of them.
        Assert.Equal("the edges as read, character left open by the steps: one step: which edge moves is not seen", ReportDerived.Line(open));
        var uniaxial = open with { Character = "uniaxial", Sign = "positive" };
        Assert.StartsWith("uniaxial, sign positive (chance 100%)", ReportDerived.Line(uniaxial));
    }

    [Fact]
    public void Two_steps_that_leave_the_character_open_give_the_birefringence_as_a_least_value()
    {
        // Invented tourmaline-like edges at two steps 15° apart (handbook values from memory): the extremes of the half
        // turn are unread, so the spread read, 0.020, is the least the birefringence can be.
        GemIndex.Data.Workbook.StoneSheet two = ReportFixtures.Sheet("""{"id":"t","refractometer":{"method":"facet","readings":[{"rotation_deg":0,"low":1.624,"high":1.644},{"rotation_deg":15,"low":1.624,"high":1.640}]},"sg":3.06}""");
        var report = StoneReport.Build(two, ReportFixtures.Identify(two));
        Assert.Equal("at least 0.020 (the steps leave part of the half turn unread)", ReportDerived.Fields(report).Single(f => f.Key == "birefringence").Value);
    }

    [Theory]
    // Bench readings never make a material certain or impossible: no probability above 0 reads 0 %, and none reads 100 %,
    // not even a 1 whose rest underflowed (a ruby's species total printed "100.0 %").
    [InlineData(0.9996, ">99.9 %")]
    [InlineData(0.9994, "99.9 %")]
    [InlineData(0.0004, "<0.1 %")]
    [InlineData(0.0006, "0.1 %")]
    [InlineData(0.5, "50.0 %")]
    [InlineData(1.0, ">99.9 %")]
    [InlineData(0.0, "0.0 %")]
    public void A_percentage_never_rounds_to_certain_or_impossible(double probability, string expected) =>
        Assert.Equal(expected, ReportNumbers.Percent(probability));

    [Theory]
    [MemberData(nameof(Formats))]
    public void Every_format_carries_the_reference_candidates_confidence_and_cautions(string format)
    {
        var report = ReportFixtures.Report(ReportFixtures.QuartzLine);
        string text = Render(format, report);
        Assert.Contains("lot 7 / 2", text);
        foreach (var c in report.Candidates) Assert.Contains(c.Name, text);
        string confidence = format == "json"
            ? GemIndex.Cli.Identification.ResultDocument.Probability(report.Candidates[0].Confidence).ToString("R", System.Globalization.CultureInfo.InvariantCulture)
            : ReportNumbers.Percent(report.Candidates[0].Confidence);
        Assert.Contains(format == "html" ? HtmlReport.E(confidence) : confidence, text);
        foreach (string caution in ReportCautions.All) Assert.Contains(format == "html" ? HtmlReport.E(caution) : caution, text);
        Assert.Contains("1.553", text); // a high edge of the rotation series
        Assert.Contains(format == "json" ? "weight_carats" : "2.65 ct", text);
        // The fit is named as everywhere else and, in a printed report, said what it means.
        if (format != "json") Assert.Contains($"Fit with the entry: {StoneReport.FitMeaning}.", text);
    }

    [Fact]
    public void Html_escapes_markup_in_the_reference()
    {
        string html = HtmlReport.Write(ReportFixtures.Report(ReportFixtures.QuartzLine, "<b>&\""));
        Assert.Contains("&lt;b&gt;&amp;&quot;", html);
        Assert.DoesNotContain("<b>", html);
        Assert.DoesNotContain("<script", html);
        Assert.DoesNotContain("http", html); // no external assets
        Assert.Contains("@media print", html);
    }

    [Fact]
    public void Markdown_escapes_table_and_emphasis_characters()
    {
        string md = MarkdownReport.Write(ReportFixtures.Report(ReportFixtures.QuartzLine, "a|b*c"));
        Assert.Contains(@"a\|b\*c", md);
        // '>' is escaped only where it would open a quotation, at the start: a share ">99.9 %" reads as written.
        Assert.Equal(@"\>99.9 % \<- not \<b>", MarkdownReport.Escape(">99.9 % <- not <b>"));   // "<" always: no tag reaches a viewer
        Assert.Equal("Quartz >99.9 %", MarkdownReport.Escape("Quartz >99.9 %"));
    }

    [Fact]
    public void Json_parses_back_with_stable_names_and_finite_numbers()
    {
        var report = ReportFixtures.Report(ReportFixtures.QuartzLine);
        string json = JsonReport.Write(report);
        Assert.DoesNotContain("NaN", json);
        Assert.DoesNotContain("Infinity", json);
        using var doc = JsonDocument.Parse(json);
        var root = doc.RootElement;
        Assert.Equal("lot 7 / 2", root.GetProperty("stone").GetProperty("reference").GetString());
        Assert.Equal(2.65, root.GetProperty("stone").GetProperty("weight_carats").GetDouble());
        var species = root.GetProperty("result").GetProperty("species")[0];
        Assert.Equal("quartz", species.GetProperty("species").GetString());
        var first = species.GetProperty("candidates")[0];
        Assert.Equal("quartz", first.GetProperty("name").GetString());
        Assert.Equal(1, first.GetProperty("rank").GetInt32());
        Assert.Equal(Math.Floor(report.Candidates[0].Confidence * 10000) / 10000, first.GetProperty("confidence").GetDouble());
        Assert.Equal(4, root.GetProperty("readings").GetProperty("rotation_series").GetArrayLength());
        Assert.Equal(4, root.GetProperty("cautions").GetArrayLength());
        Assert.Equal(JsonValueKind.False, root.GetProperty("result").GetProperty("no_good_match").ValueKind);
    }

    [Fact]
    public void A_stone_nothing_fits_says_so_plainly_in_every_format()
    {
        // An invented reading far from all three materials: index 2.40 over a wide range, SG 7.0.
        const string line = """{"id":"odd one","refractometer":{"method":"spot","spot":1.60},"sg":7.0,"polariscope":"doubly_refractive"}""";
        var report = ReportFixtures.Report(line);
        Assert.True(report.NoGoodMatch);
        Assert.Contains("No good match", MarkdownReport.Write(report));
        Assert.Contains("No good match", HtmlReport.Write(report));
        using var doc = JsonDocument.Parse(JsonReport.Write(report));
        Assert.True(doc.RootElement.GetProperty("result").GetProperty("no_good_match").GetBoolean());
    }

    private static string Render(string format, StoneReport report) => format switch
    {
        "html" => HtmlReport.Write(report),
        "json" => JsonReport.Write(report),
        _ => MarkdownReport.Write(report),
    };

    [Fact]
    public void A_printed_report_leaves_out_candidates_that_would_read_0_0_percent_and_the_JSON_result_keeps_them()
    {
        var report = ReportFixtures.Report(ReportFixtures.QuartzLine);
        Assert.All(report.Candidates, c => Assert.NotEqual("0.0 %", ReportNumbers.Percent(c.Confidence)));
        Assert.DoesNotContain("| 0.0 % |", MarkdownReport.Write(report));
        // The quartz readings leave the fixture's other materials far below 0.05 %: they are in the result, not on paper.
        int tiny = report.Result.Candidates.Count(c => c.Confidence < LeadingCandidates.ListedShare);
        Assert.True(tiny > 0);
        Assert.Equal(report.Result.Candidates.Count - tiny, report.Candidates.Count);
    }

    [Fact]
    public void The_html_scales_draw_only_the_candidates_the_report_lists_and_the_cut_is_a_reading()
    {
        // The quartz readings leave corundum and glass far below 0.05 %: not in the table, so not on the scales either.
        string line = ReportFixtures.QuartzLine.Replace("\"colour\":\"colourless\"", "\"colour\":\"colourless\",\"cut\":\"faceted\"", StringComparison.Ordinal);
        var report = ReportFixtures.Report(line);
        Assert.Equal(["quartz"], report.Candidates.Select(c => c.Name));
        string html = HtmlReport.Write(report);
        Assert.Contains("<figure>", html, StringComparison.Ordinal);
        Assert.DoesNotContain(">corundum<", html, StringComparison.Ordinal);
        Assert.DoesNotContain(">glass<", html, StringComparison.Ordinal);
        Assert.Contains(report.ReadingFields, f => f.Label == "Cut" && f.Value == "faceted");
        Assert.Contains("**Cut:** faceted", MarkdownReport.Write(report), StringComparison.Ordinal);
    }

    [Fact]
    public void The_report_gives_reasons_for_the_best_entry_of_each_species_first_and_names_each_candidates_species()
    {
        // Every candidate comes with its reasons (as the text UI works them out); the report writes out three of them:
        // the first entry of each species, then the next entry.
        var sheet = ReportFixtures.Sheet(ReportFixtures.QuartzLine);
        IdentificationResult found = ReportFixtures.Identify(sheet);
        var reasons = found.Candidates[0].Reasons;
        RankedCandidate Entry(string name, string species, double p) => new()
        {
            Material = ReportFixtures.Catalogue[0] with { Name = name, Species = species }, Confidence = p, Fit = 0.9, Reasons = reasons,
        };
        IdentificationResult result = found with
        {
            Candidates = [Entry("rock crystal", "quartz", 0.5), Entry("citrine", "quartz", 0.2), Entry("amethyst", "quartz", 0.1), Entry("crown glass", "glass", 0.1)],
        };
        var report = StoneReport.Build(sheet, result);
        Assert.Equal(["rock crystal", "citrine", "crown glass"], report.Candidates.Where(c => c.Reasons.Count > 0).Select(c => c.Name));
        string markdown = MarkdownReport.Write(report);
        Assert.Contains("| Rank | Material | Species | Origin |", markdown);
        // Each species with its total, so that a rank holding less than the next reads as the species-first order it is.
        string glass = $"glass ({ReportNumbers.Percent(result.Species.Single(x => x.Species == "glass").Confidence)})";
        Assert.Contains($"| 4 | crown glass | {MarkdownReport.Escape(glass)} | natural |", markdown);
        Assert.Contains(StoneReport.CandidateOrder, markdown);
        Assert.Contains("Reasons for crown glass:", markdown);
        Assert.DoesNotContain("Reasons for amethyst:", markdown);
        Assert.Contains("<td>crown glass</td><td>glass (", HtmlReport.Write(report));
    }
}
