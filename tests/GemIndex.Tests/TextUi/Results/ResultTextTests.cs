using GemIndex.Cli.TextUi.Bench;
using GemIndex.Cli.TextUi.Main;
using GemIndex.Cli.TextUi.Results;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Identification;
using GemIndex.Core.Optics;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Core.Readings;

namespace GemIndex.Tests.TextUi.Results;

public class ResultTextTests
{
    [Theory]
    [InlineData(0.0, "........")]
    [InlineData(0.5, "####....")]
    [InlineData(1.0, "########")]
    [InlineData(0.0625, "#.......")]   // 0.5 cell rounds up
    public void The_confidence_bar_fills_in_proportion(double p, string bar) => Assert.Equal(bar, ResultText.Bar(p));

    // Corundum entries named as the catalogue names them: cutting their ends leaves "flame-fusion…" three times.
    private static readonly string[] Corundums = ["flame-fusion synthetic ruby", "flame-fusion synthetic sapphire", "flame-fusion colourless synthetic sapphire", "ruby"];

    [Fact]
    public void Names_that_fit_stay_whole()
    {
        Assert.Equal(Corundums, CandidateNames.Fit(Corundums, 42));
    }

    [Theory]
    [InlineData(20)]
    [InlineData(24)]
    [InlineData(31)]
    public void Names_cut_to_a_column_never_read_the_same(int width)
    {
        IReadOnlyList<string> fitted = CandidateNames.Fit(Corundums, width);
        Assert.Equal(fitted.Count, fitted.Distinct().Count());
        Assert.All(fitted, n => Assert.True(n.Length <= width, n));
        Assert.Equal("ruby", fitted[3]);
    }

    private static Material Corundum(string name, OriginClass origin, bool doNotImmerse = false) => TestMaterials.All[0] with
    {
        Name = name, Species = "corundum", Variety = name, Origin = origin, DoNotImmerse = doNotImmerse,
    };

    /// <summary>A corundum answer of the shape the issue describes: the species holds almost all of it, split across origins.</summary>
    /// <summary>What the engine says in the warning above, as the structured result it gives beside it.</summary>
    private static InseparableOrigins Inseparable(NextTestAdvice? test) =>
        new() { Species = "corundum", Origins = [OriginClass.Synthetic, OriginClass.Natural, OriginClass.Treated], Test = test };

    private static IdentificationResult CorundumAnswer(NextTestAdvice? next, IReadOnlyList<string>? warnings = null, InseparableOrigins? inseparable = null)
    {
        RankedCandidate[] candidates =
        [
            new() { Material = Corundum("flame-fusion synthetic ruby", OriginClass.Synthetic), Confidence = 0.40, Fit = 0.9 },
            new() { Material = Corundum("ruby", OriginClass.Natural), Confidence = 0.35, Fit = 0.9 },
            new() { Material = Corundum("glass-filled ruby", OriginClass.Treated, doNotImmerse: true), Confidence = 0.18, Fit = 0.9 },
            new() { Material = TestMaterials.All[1], Confidence = 0.07, Fit = 0.5 },
        ];
        return new IdentificationResult
        {
            Id = "blue lot",
            Species =
            [
                new SpeciesResult { Species = "corundum", Confidence = 0.93, Origins = new Dictionary<OriginClass, double> { [OriginClass.Synthetic] = 0.40, [OriginClass.Natural] = 0.35, [OriginClass.Treated] = 0.18 } },
                new SpeciesResult { Species = "spinel", Confidence = 0.07, Origins = new Dictionary<OriginClass, double> { [OriginClass.Natural] = 0.07 } },
            ],
            Candidates = candidates,
            NotInCatalogue = 0,
            NoGoodMatch = false,
            NextTest = next,
            Warnings = warnings ?? [],
            InseparableOrigins = inseparable,
        };
    }

    [Fact]
    public void The_answer_leads_with_the_species_and_its_total_then_its_origins()
    {
        IReadOnlyList<string> lead = ResultText.Lead(CorundumAnswer(null));
        Assert.Equal("Corundum 93%", lead[0]);
        Assert.Equal("  synthetic 40%, natural 35%, treated 18%", lead[1]);
        Assert.Equal("  These tests cannot separate synthetic, natural and treated corundum: refer a valuable stone to a qualified laboratory.", lead[2]);
        Assert.Equal("or spinel 7%", lead[3]);
        // Shares that round up together are shown rounded down: 53.6, 35.6 and 10.8 % had read 54, 36 and 11 %, 101 %.
        IdentificationResult split = CorundumAnswer(null) with
        {
            Species = [new SpeciesResult { Species = "corundum", Confidence = 1.0, Origins = new Dictionary<OriginClass, double> { [OriginClass.Treated] = 0.536, [OriginClass.Synthetic] = 0.356, [OriginClass.Natural] = 0.108 } }],
        };
        Assert.Equal("  treated 53%, synthetic 35%, natural 10%", ResultText.Lead(split)[1]);
    }

    [Theory]
    // Where taking the advice meets a hazard (common practice): the contact liquid, the heavy liquids, the UV lamps.
    [InlineData("refractometer", GemIndex.Cli.Reports.ReportCautions.ContactLiquidShort)]
    [InlineData("heavy_liquids", GemIndex.Cli.Reports.ReportCautions.HeavyLiquidShort)]
    [InlineData("sg", GemIndex.Cli.Reports.ReportCautions.SpecificGravityShort)]   // what the advisor names for weighing or heavy liquids
    [InlineData("uv_long", GemIndex.Cli.Reports.ReportCautions.UltravioletShort)]
    [InlineData("uv_short", GemIndex.Cli.Reports.ReportCautions.UltravioletShort)]
    [InlineData("absorption_nm", null)]
    [InlineData("polariscope", null)]
    public void Advice_to_take_a_hazardous_test_carries_its_caution(string test, string? caution)
    {
        var next = new NextTestAdvice { Test = test, GainBits = 1, Separates = ["flame-fusion synthetic ruby", "ruby"], Expectations = ["ruby: something"] };
        IReadOnlyList<string> lines = ResultText.NextTest(next);
        if (caution is null) Assert.DoesNotContain(lines, l => l.Contains("! ", StringComparison.Ordinal));
        else Assert.Equal("  " + caution, lines[^1]);
        Assert.Equal(caution, GemIndex.Cli.Reports.ReportCautions.ForTest(test));
    }

    [Theory]
    [InlineData(1.3, "  it would clearly separate flame-fusion synthetic ruby and ruby")]
    [InlineData(0.5, "  it would partly separate flame-fusion synthetic ruby and ruby")]
    public void The_next_test_says_how_well_it_would_separate_in_the_reports_words(double bits, string expected)
    {
        // The same words as the reports (ReportDerived.Separation): 1 bit halves the doubt.
        var next = new NextTestAdvice { Test = "absorption_nm", GainBits = bits, Separates = ["flame-fusion synthetic ruby", "ruby"], Expectations = [] };
        Assert.Equal(expected, ResultText.NextTest(next)[1]);
    }

    [Fact]
    public void Two_species_of_one_mineral_group_in_the_lead_bring_the_group_s_total()
    {
        // Elbaite and uvite share a tourmaline's answer (tourmaline supergroup: Henry et al. 2011, as reference-db/mineral-groups.json
        // cites it); dravite holds under 5 %, so it is counted in the total but not named.
        IdentificationResult r = CorundumAnswer(null) with
        {
            Species =
            [
                new SpeciesResult { Species = "elbaite", Confidence = 0.57, Origins = new Dictionary<OriginClass, double> { [OriginClass.Natural] = 0.57 }, MineralGroup = "tourmaline" },
                new SpeciesResult { Species = "uvite", Confidence = 0.39, Origins = new Dictionary<OriginClass, double> { [OriginClass.Natural] = 0.39 }, MineralGroup = "tourmaline" },
                new SpeciesResult { Species = "dravite", Confidence = 0.03, Origins = new Dictionary<OriginClass, double> { [OriginClass.Natural] = 0.03 }, MineralGroup = "tourmaline" },
                new SpeciesResult { Species = "spodumene", Confidence = 0.01, Origins = new Dictionary<OriginClass, double> { [OriginClass.Natural] = 0.01 } },
            ],
            Candidates = [],
        };
        Assert.Equal("tourmaline", r.LeadingGroup!.Group);
        Assert.Equal(["elbaite", "uvite"], r.LeadingGroup.Species);
        Assert.Equal(0.99, r.LeadingGroup.Total, 12);
        Assert.Equal(["Elbaite 57%", "  natural 57%", "or uvite 39%", "tourmaline group 99% in all"], ResultText.Lead(r));
        // One species of the group alone: no group line.
        var alone = r with { Species = [.. r.Species.Select(s => s.Species == "uvite" ? s with { MineralGroup = null } : s)] };
        Assert.Null(alone.LeadingGroup);
        Assert.DoesNotContain(ResultText.Lead(alone), l => l.Contains("group", StringComparison.Ordinal));
    }

    [Fact]
    public void When_one_origin_is_left_among_several_entries_the_lead_still_names_it()
    {
        // Melt-growth signs seen under magnification: the natural and treated entries fall away, two synthetics remain.
        IdentificationResult r = CorundumAnswer(null) with
        {
            Species =
            [
                new SpeciesResult { Species = "corundum", Confidence = 0.97, Origins = new Dictionary<OriginClass, double> { [OriginClass.Synthetic] = 0.96, [OriginClass.Natural] = 0.01 } },
            ],
            Candidates =
            [
                new() { Material = Corundum("flame-fusion synthetic sapphire", OriginClass.Synthetic), Confidence = 0.70, Fit = 0.9 },
                new() { Material = Corundum("flame-fusion synthetic colour-change sapphire", OriginClass.Synthetic), Confidence = 0.26, Fit = 0.9 },
                new() { Material = Corundum("sapphire", OriginClass.Natural), Confidence = 0.01, Fit = 0.9 },
            ],
        };
        Assert.Equal(["Corundum 97%", "  synthetic 96%"], ResultText.Lead(r));
    }

    [Theory]
    [InlineData("flame-fusion synthetic sapphire", OriginClass.Synthetic, "  flame-fusion synthetic sapphire")]
    [InlineData("padparadscha sapphire", OriginClass.Natural, "  padparadscha sapphire, natural")]
    public void The_variety_under_its_species_names_its_origin_once(string name, OriginClass origin, string expected)
    {
        IdentificationResult r = CorundumAnswer(null) with
        {
            Species = [new SpeciesResult { Species = "corundum", Confidence = 0.97, Origins = new Dictionary<OriginClass, double> { [origin] = 0.97 } }],
            Candidates = [new() { Material = Corundum(name, origin), Confidence = 0.97, Fit = 0.9 }],
        };
        Assert.Equal(["Corundum 97%", expected], ResultText.Lead(r));
    }

    [Fact]
    public void When_the_next_test_separates_the_origins_the_lead_names_it()
    {
        var next = new NextTestAdvice
        {
            Test = "absorption_nm", GainBits = 1.3, Separates = ["flame-fusion synthetic ruby", "ruby"],
            Expectations = ["flame-fusion synthetic ruby: no diagnostic lines", "ruby: lines at 694, 668, 659 nm"],
        };
        string said = ResultText.Lead(CorundumAnswer(next))[2];
        Assert.EndsWith("corundum: the hand spectroscope (absorption lines) may tell some of them apart.", said);
    }

    [Fact]
    public void A_next_test_that_shows_the_same_for_every_origin_is_not_offered_to_tell_them_apart()
    {
        // The dichroscope tells colours apart, not a synthetic from a natural stone of one colour: both show the same.
        var next = new NextTestAdvice
        {
            Test = "pleochroism", GainBits = 0.2, Separates = ["flame-fusion synthetic ruby", "ruby"],
            Expectations = ["flame-fusion synthetic ruby: dichroic", "ruby: dichroic"],
        };
        string said = ResultText.Lead(CorundumAnswer(next))[2];
        Assert.EndsWith("corundum: refer a valuable stone to a qualified laboratory.", said);
    }

    [Fact]
    public void When_only_the_warnings_name_a_test_for_the_origins_the_lead_points_there()
    {
        var next = new NextTestAdvice
        {
            Test = "pleochroism", GainBits = 0.2, Separates = ["flame-fusion synthetic ruby", "ruby"],
            Expectations = ["flame-fusion synthetic ruby: dichroic", "ruby: dichroic"],
        };
        var look = new NextTestAdvice { Test = "magnification", GainBits = 0.5, Separates = [], Expectations = [], LookFor = ["curved striae"], Lighting = ["diffused light"] };
        IdentificationResult r = CorundumAnswer(next, ["Corundum: synthetic, natural, treated cannot be separated by these tests; the loupe or microscope (magnification): look for curved striae (diffused light) would help; for a valuable stone refer it to a qualified laboratory."],
            Inseparable(look));
        Assert.EndsWith("corundum: the Warnings below name a test that may.", ResultText.Lead(r)[2]);
    }

    [Fact]
    public void When_the_engine_names_the_next_test_for_the_origins_the_lead_names_it_too()
    {
        var next = new NextTestAdvice { Test = "absorption_nm", GainBits = 1.3, Separates = ["flame-fusion synthetic ruby", "ruby"], Expectations = [] };
        IdentificationResult r = CorundumAnswer(next, [$"Corundum: synthetic, natural, treated cannot be separated by these tests; the {next.Description} would help; for a valuable stone refer it to a qualified laboratory."],
            Inseparable(next));
        Assert.EndsWith("corundum: the hand spectroscope (absorption lines) may tell some of them apart.", ResultText.Lead(r)[2]);
    }

    [Fact]
    public void When_the_engine_finds_no_test_for_the_origins_the_lead_does_not_offer_the_next_test()
    {
        // The next test's expectations differ by entry (SG ranges), but the engine finds nothing that parts the origins.
        var next = new NextTestAdvice { Test = "sg", GainBits = 0.4, Separates = ["flame-fusion synthetic ruby", "ruby"], Expectations = ["flame-fusion synthetic ruby: SG 3.99–4.01", "ruby: SG 3.97–4.05"] };
        IdentificationResult r = CorundumAnswer(next, ["Corundum: synthetic, natural, treated cannot be separated by these tests; no bench test left here separates them; for a valuable stone refer it to a qualified laboratory."],
            Inseparable(null));
        Assert.EndsWith("corundum: refer a valuable stone to a qualified laboratory.", ResultText.Lead(r)[2]);
    }

    [Fact]
    public void Magnification_offered_in_the_lead_names_what_to_look_for_without_the_lighting()
    {
        var next = new NextTestAdvice
        {
            Test = "magnification", GainBits = 1.1, Separates = ["flame-fusion synthetic ruby", "ruby"], Expectations = [],
            LookFor = ["curved striae", "needles and silk"], Lighting = ["diffused light", "darkfield"],
        };
        string said = ResultText.Lead(CorundumAnswer(next))[2];
        Assert.EndsWith("may tell some of them apart (look for curved striae and needles and silk).", said);
        Assert.DoesNotContain("darkfield", said);   // the lighting is under Next test, below
    }

    [Theory]
    [InlineData(0.0041, "<1%")]
    [InlineData(0.005, "1%")]
    [InlineData(0.994, "99%")]
    [InlineData(0.9951, ">99%")]
    [InlineData(1.0, ">99%")]   // a 1 is the rest underflowing, never a certainty
    [InlineData(0.0, "0%")]
    public void A_probability_never_reads_as_impossible_or_certain(double p, string shown) =>
        Assert.Equal(shown, ResultText.Percent(p));

    [Fact]
    public void A_next_test_that_names_one_entry_does_not_say_it_separates_it()
    {
        var next = new NextTestAdvice { Test = "absorption_nm", GainBits = 0.3, Separates = ["opal doublet"], Expectations = ["opal doublet: no diagnostic lines"] };
        Assert.Equal(["Next test: hand spectroscope (absorption lines)", "  opal doublet: no diagnostic lines"], ResultText.NextTest(next));
    }

    [Fact]
    public void A_species_listed_after_another_species_many_small_varieties_is_not_cut_off()
    {
        // Eight small corundum entries (0.3 % each) come first in species order; the ninth candidate holds 12 %.
        RankedCandidate[] small = [.. Enumerable.Range(1, 8).Select(k => new RankedCandidate { Material = Corundum($"variety {k}", OriginClass.Natural), Confidence = 0.003, Fit = 0.9 })];
        IdentificationResult r = CorundumAnswer(null) with
        {
            Candidates = [.. small, new() { Material = TestMaterials.All[1], Confidence = 0.12, Fit = 0.5 }],
        };
        var model = new ResultsModel();
        model.Accept(new BenchAssessment { Version = 1, Errors = new Dictionary<string, string>(), Readings = new() { Sg = 4.0 }, Result = r });
        Assert.Equal(Enumerable.Range(0, 9), model.Listed);
        Assert.Contains(model.Rows(60), x => x.Candidate == 8);
    }

    [Fact]
    public void The_answer_pane_ends_as_every_answer_does_and_a_test_a_warning_advises_carries_its_caution()
    {
        IdentificationResult r = CorundumAnswer(null) with
        {
            Warnings = ["Turquoise: treated and natural cannot be separated by these tests; the long-wave UV lamp (365 nm) would help; for a valuable stone refer it to a qualified laboratory."],
            WarningTests = [GemIndex.Core.Bench.BenchField.UvLong],
        };
        var model = new ResultsModel();
        model.Accept(new BenchAssessment { Version = 1, Errors = new Dictionary<string, string>(), Readings = new() { Sg = 4.0 }, Result = r });
        IReadOnlyList<AnswerRow> rows = model.Rows(200);
        Assert.Equal(ResultsModel.ScopeLine, rows[^1].Text);
        Assert.Contains(rows, x => x.Text == GemIndex.Cli.Reports.ReportCautions.UltravioletShort);
        // Beside the next test that is the same lamp, the caution is said there and not again.
        Assert.Empty(GemIndex.Cli.Reports.ReportCautions.ForWarnings(r.WarningTests, GemIndex.Core.Bench.BenchField.UvLong));
        Assert.Empty(GemIndex.Cli.Reports.ReportCautions.ForWarnings([], null));   // a warning that advises no test
    }

    [Fact]
    public void A_candidate_the_readings_rule_out_is_not_listed_and_the_next_keeps_its_rank()
    {
        // A corundum variety at 10⁻⁴⁰ between the leader and a spinel at 2 %: left out; the spinel is still number 3.
        IdentificationResult r = CorundumAnswer(null) with
        {
            Candidates =
            [
                new() { Material = Corundum("ruby", OriginClass.Natural), Confidence = 0.98, Fit = 0.9 },
                new() { Material = Corundum("heated ruby", OriginClass.Treated), Confidence = 1e-40, Fit = 0 },
                new() { Material = TestMaterials.All[1], Confidence = 0.02, Fit = 0.5 },
            ],
        };
        var model = new ResultsModel();
        model.Accept(new BenchAssessment { Version = 1, Errors = new Dictionary<string, string>(), Readings = new() { Sg = 4.0 }, Result = r });
        IReadOnlyList<AnswerRow> rows = model.Rows(60);
        Assert.Equal([0, 2], model.Listed);
        Assert.DoesNotContain(rows, x => x.Text.Contains("heated ruby", StringComparison.Ordinal));
        Assert.Contains(rows, x => x.Candidate == 2 && x.Text.TrimStart().StartsWith("3 spinel", StringComparison.Ordinal));
        // When nothing fits, the whole least-bad list is shown.
        model.Accept(new BenchAssessment { Version = 2, Errors = new Dictionary<string, string>(), Readings = new() { Sg = 4.0 }, Result = r with { NoGoodMatch = true } });
        Assert.Contains(model.Rows(60), x => x.Candidate == 1);
    }

    [Fact]
    public void A_candidate_name_too_long_for_its_column_goes_on_under_itself_whole()
    {
        IdentificationResult r = CorundumAnswer(null) with
        {
            Candidates = [new() { Material = Corundum("flame-fusion synthetic colour-change sapphire", OriginClass.Synthetic), Confidence = 0.6, Fit = 0.9 },
                .. CorundumAnswer(null).Candidates],
        };
        var model = new ResultsModel();
        model.Accept(new BenchAssessment { Version = 1, Errors = new Dictionary<string, string>(), Readings = new() { Sg = 4.0 }, Result = r });
        int width = 80 - MainWindow.FormWidth - 2;
        AnswerRow[] first = [.. model.Rows(width).Where(x => x.Candidate == 0)];
        Assert.Equal(2, first.Length);                              // both rows open candidate 1's detail
        Assert.Equal("flame-fusion synthetic colour-change sapphire", string.Join(" ", first.Select(x => x.Text.Replace("60%", "").Trim()[(x == first[0] ? 2 : 0)..].Trim())));
        Assert.EndsWith("60%", first[0].Text.TrimEnd());
        Assert.DoesNotContain(model.Rows(width), x => x.Text.Contains('…'));
        Assert.Contains(ResultsModel.CandidatesHeading, model.Rows(width).Select(x => x.Text));
    }

    [Fact]
    public void A_percentage_stays_with_its_word_and_an_uncertainty_with_its_value_when_a_line_wraps()
    {
        Assert.Equal(["  natural 49%, synthetic 33%,", "    treated 14%"], TextWrap.Lines(["  natural 49%, synthetic 33%, treated 14%"], 36));
        Assert.Equal(["Specific gravity:", "  2.650 ± 0.010"], TextWrap.Lines(["Specific gravity: 2.650 ± 0.010"], 26));
    }

    [Fact]
    public void A_spot_reading_is_shown_as_read_to_the_hundredth()
    {
        var form = new BenchModel();
        form.SetText(BenchFields.Spot, "1.61");   // a spot reading is read to about 0.01 (common practice)
        BenchAssessment a = new BenchAssessor(new Identifier(TestMaterials.All)).Assess(form.Snapshot());
        Assert.Contains("Spot reading: 1.61", ResultText.Derived(a));
    }

    [Fact]
    public void A_biaxial_reading_whose_beta_is_one_of_two_values_says_both_and_no_2V()
    {
        // Invented readings near peridot's handbook indices (from memory): six steps, the low edge up to 1.668 and the high
        // edge down to 1.677, so β is the highest low edge or the lowest high edge.
        var form = new BenchModel();
        foreach (var (rotation, low, high) in new[] { ("0", "1.654", "1.690"), ("30", "1.658", "1.686"), ("60", "1.664", "1.681"), ("90", "1.668", "1.677"), ("120", "1.664", "1.681"), ("150", "1.658", "1.686") })
            form.PutStep(form.Steps.Count, new StepText(rotation, low, high));
        BenchAssessment a = new BenchAssessor(new Identifier(TestMaterials.All)).Assess(form.Snapshot());
        Assert.Equal(OpticCharacter.Biaxial, a.Result!.Series!.Interpretations.MaxBy(i => i.Weight)!.Character);
        IReadOnlyList<string> lines = ResultText.Derived(a);
        Assert.Contains("Refractive indices: α 1.654, β 1.668 or 1.677, γ 1.690", lines);
        Assert.DoesNotContain(lines, l => l.Contains("2V", StringComparison.Ordinal));
    }

    [Fact]
    public void The_stone_lists_answer_names_the_species_and_its_likeliest_entry_so_a_search_finds_either()
    {
        IdentificationResult r = CorundumAnswer(null) with
        {
            Candidates = [new() { Material = Corundum("flame-fusion synthetic sapphire", OriginClass.Synthetic), Confidence = 0.92, Fit = 0.9 }],
            Species = [new SpeciesResult { Species = "corundum", Confidence = 0.999, Origins = new Dictionary<OriginClass, double> { [OriginClass.Synthetic] = 0.999 } }],
        };
        Assert.Equal("corundum >99%: flame-fusion synthetic sapphire", ResultText.Short(r));
        Assert.Equal("nothing fits", ResultText.Short(r with { NoGoodMatch = true }));
    }

    [Fact]
    public void The_stone_lists_answer_leaves_the_origin_open_when_the_tests_leave_several()
    {
        // A blue corundum with no sign of its origin: the catalogue's market shares put the heated entry first, which the
        // bench has not found; the list names the natural variety and says the origin is open.
        IdentificationResult r = CorundumAnswer(null) with
        {
            Candidates = [new() { Material = Corundum("heated sapphire", OriginClass.Treated), Confidence = 0.64, Fit = 0.9 },
                          new() { Material = Corundum("sapphire", OriginClass.Natural), Confidence = 0.35, Fit = 0.9 }],
            Species = [new SpeciesResult { Species = "corundum", Confidence = 0.999, Origins = new Dictionary<OriginClass, double> { [OriginClass.Treated] = 0.64, [OriginClass.Natural] = 0.359 } }],
        };
        Assert.Equal("corundum >99%: sapphire, origin open", ResultText.Short(r));
        // A species of a mineral group is named with it, so that a search for "garnet" finds a pyrope.
        SpeciesResult pyrope = new() { Species = "pyrope", Confidence = 0.98, Origins = new Dictionary<OriginClass, double> { [OriginClass.Natural] = 0.98 }, MineralGroup = "garnet" };
        Assert.Equal("pyrope (garnet) 98%", ResultText.Short(r with { Species = [pyrope], Candidates = [] }));
        Assert.Equal("corundum >99%, origin open", ResultText.Short(r with { Candidates = r.Candidates.Take(1).ToList() }));
    }

    [Fact]
    public void With_the_origin_open_a_natural_entry_far_less_likely_than_the_leader_does_not_name_the_stone()
    {
        // A light blue topaz (invented readings at handbook values): blue topaz leads at 67 %, the likeliest natural entry
        // is imperial topaz at 13 %, an orange variety the colour rules out; the list had named it.
        Material Topaz(string name, OriginClass origin) => Corundum(name, origin) with { Species = "topaz" };
        IdentificationResult r = CorundumAnswer(null) with
        {
            Candidates = [new() { Material = Topaz("blue topaz", OriginClass.Treated), Confidence = 0.67, Fit = 1 },
                          new() { Material = Topaz("imperial topaz", OriginClass.Natural), Confidence = 0.13, Fit = 0.95 }],
            Species = [new SpeciesResult { Species = "topaz", Confidence = 0.999, Origins = new Dictionary<OriginClass, double> { [OriginClass.Treated] = 0.75, [OriginClass.Natural] = 0.25 } }],
        };
        Assert.Equal("topaz >99%: blue topaz, origin open", ResultText.Short(r));
    }

    [Fact]
    public void A_single_edge_is_one_refractive_index()
    {
        var form = new BenchModel();
        foreach (string rotation in new[] { "0", "45", "90", "135" }) form.PutStep(form.Steps.Count, new StepText(rotation, "1.620", ""));
        BenchAssessment a = new BenchAssessor(new Identifier(TestMaterials.All)).Assess(form.Snapshot());
        Assert.Contains("Refractive index: 1.620", ResultText.Derived(a));
        // What the four readings alone say, by the section model: singly refractive first, never a flat "isotropic" verdict.
        Assert.Matches(@"^Optic character: singly refractive \d+%, ", ResultText.Derived(a)[0]);
    }

    [Fact]
    public void A_high_edge_above_the_liquid_is_said_so_in_the_readings_used_with_the_least_birefringence()
    {
        // Invented epidote-like steps whose high edge passes the default 1.79 liquid at 60° and 90°.
        var form = new BenchModel();
        foreach (var (rotation, low, high) in new[] { ("0", "1.733", "1.770"), ("30", "1.738", "1.781"), ("60", "1.742", ""), ("90", "1.745", ""), ("120", "1.740", "1.786"), ("150", "1.735", "1.776") })
            form.PutStep(form.Steps.Count, new StepText(rotation, low, high));
        IReadOnlyList<string> derived = ResultText.Derived(new BenchAssessor(new Identifier(TestMaterials.All)).Assess(form.Snapshot()));
        Assert.Contains(derived, l => l.StartsWith("Refractive indices: α 1.733, ", StringComparison.Ordinal) && l.Contains("γ above the liquid 1.790 (about 1.79", StringComparison.Ordinal) && !l.Contains("2V", StringComparison.Ordinal));
        Assert.Contains(derived, l => l.StartsWith("Birefringence: at least 0.057 (about 0.06", StringComparison.Ordinal));
    }

    [Fact]
    public void A_character_the_readings_rule_out_is_left_out_of_the_odds_not_shown_as_none()
    {
        // Quartz-like edges 1.544 and 1.553 (from memory): two edges apart rule out one index, so "singly refractive"
        // has no share at all and is not listed as "0%"; the others keep their order of share.
        var odds = new OpticCharacterPosterior(0, 0.5, 0.2, 0.3);
        string line = GemIndex.Cli.Reports.ReportDerived.CharacterOdds(odds, ResultText.Percent);
        Assert.Equal("uniaxial 70% (positive 50%, negative 20%), biaxial 30%", line);
        Assert.Contains("singly refractive <1%", GemIndex.Cli.Reports.ReportDerived.CharacterOdds(odds with { Isotropic = 0.001 }, ResultText.Percent));
    }

    [Fact]
    public void The_answer_pane_names_no_jargon_and_keeps_the_numbers_for_the_detail_view()
    {
        var next = new NextTestAdvice { Test = "absorption_nm", GainBits = 1.3, Separates = ["flame-fusion synthetic ruby", "ruby"], Expectations = ["ruby: lines at 694 nm"] };
        var model = new ResultsModel();
        model.Accept(new BenchAssessment { Version = 1, Errors = new Dictionary<string, string>(), Readings = new() { Sg = 4.0 }, Result = CorundumAnswer(next) });
        IReadOnlyList<AnswerRow> rows = model.Rows(38);
        Assert.All(rows, r => Assert.True(r.Text.Length <= 38, r.Text));   // wrapped or fitted, never cut by the pane's edge
        string pane = string.Join('\n', rows.Select(r => r.Text));
        foreach (string jargon in new[] { "bits", "fit ", "conf", "σ", "weight", "undetermined", "family" })
            Assert.DoesNotContain(jargon, pane);
        Assert.Contains("1.30 bits", CandidateDetail.Render(CorundumAnswer(next).Candidates[0], 1, CorundumAnswer(next)));   // to two decimals, as the command line gives it
    }

    [Fact]
    public void The_immersion_caution_is_the_warning_under_the_lead_and_cut_before_the_notes()
    {
        IdentificationResult r = CorundumAnswer(null, ["Likely misreading: step at 90°.", "Possible glass-filled ruby: do not immerse (no water or heavy liquids) — lead-glass filler.."]);
        Assert.Equal("Possible glass-filled ruby: do not immerse (no water or heavy liquids); more under Warnings.", ResultsModel.Short(ResultsModel.TopWarning(r)!));
        Assert.Equal("filler.", ResultsModel.Sentence("filler.."));
    }

    [Fact]
    public void Every_candidate_row_names_its_candidate_and_none_reads_like_another_at_80_columns()
    {
        var model = new ResultsModel();
        model.Accept(new BenchAssessment { Version = 1, Errors = new Dictionary<string, string>(), Readings = new() { Sg = 4.0 }, Result = CorundumAnswer(null) });
        int width = 80 - MainWindow.FormWidth - 2;
        AnswerRow[] candidates = [.. model.Rows(width).Where(r => r.Candidate is not null)];
        Assert.Equal([0, 1, 2, 3], candidates.Select(r => r.Candidate!.Value));
        Assert.Equal(4, candidates.Select(r => r.Text).Distinct().Count());
        Assert.All(candidates, r => Assert.True(r.Text.Length <= width, r.Text));
        Assert.StartsWith("1 flame-fusion synthetic ruby", candidates[0].Text);   // in order of share: no species headings
    }

    [Fact]
    public void When_a_rival_species_follows_the_leaders_smaller_varieties_each_species_heads_its_entries_with_its_total()
    {
        // Corundum's varieties 40 %, 6 %, 5 %, then spinel at 20 %: out of order of share, so headings say why.
        IdentificationResult r = CorundumAnswer(null) with
        {
            Species =
            [
                new SpeciesResult { Species = "corundum", Confidence = 0.51, Origins = new Dictionary<OriginClass, double> { [OriginClass.Synthetic] = 0.40, [OriginClass.Natural] = 0.11 } },
                new SpeciesResult { Species = "spinel", Confidence = 0.20, Origins = new Dictionary<OriginClass, double> { [OriginClass.Natural] = 0.20 } },
            ],
            Candidates =
            [
                new() { Material = Corundum("flame-fusion synthetic ruby", OriginClass.Synthetic), Confidence = 0.40, Fit = 0.9 },
                new() { Material = Corundum("ruby", OriginClass.Natural), Confidence = 0.06, Fit = 0.9 },
                new() { Material = Corundum("star ruby", OriginClass.Natural), Confidence = 0.05, Fit = 0.9 },
                new() { Material = TestMaterials.All[1], Confidence = 0.20, Fit = 0.5 },
            ],
        };
        var model = new ResultsModel();
        model.Accept(new BenchAssessment { Version = 1, Errors = new Dictionary<string, string>(), Readings = new() { Sg = 4.0 }, Result = r });
        string[] rows = [.. model.Rows(38).Select(x => x.Text)];
        int heading = Array.IndexOf(rows, ResultsModel.CandidatesHeading);
        Assert.Equal("corundum 51%", rows[heading + 1]);
        Assert.StartsWith("  1 flame-fusion synthetic ruby", rows[heading + 2]);
        Assert.Equal("spinel 20%", rows[heading + 5]);
        Assert.StartsWith("  4 ", rows[heading + 6]);
        // The headings open no detail: Enter acts on candidates only.
        Assert.All(model.Rows(38).Where(x => x.Text is "corundum 51%" or "spinel 20%"), x => Assert.Null(x.Candidate));
    }

    [Fact]
    public void With_one_species_listed_its_entries_need_no_heading()
    {
        IdentificationResult r = CorundumAnswer(null) with { Candidates = [.. CorundumAnswer(null).Candidates.Take(3)] };
        var model = new ResultsModel();
        model.Accept(new BenchAssessment { Version = 1, Errors = new Dictionary<string, string>(), Readings = new() { Sg = 4.0 }, Result = r });
        string[] rows = [.. model.Rows(38).Select(x => x.Text)];
        int heading = Array.IndexOf(rows, ResultsModel.CandidatesHeading);
        Assert.StartsWith("1 flame-fusion synthetic ruby", rows[heading + 1]);
    }

    private static RotationSeriesResult TwoSigns() => new()
    {
        Character = OpticCharacter.Uniaxial,
        Interpretations =
        [
            new SeriesInterpretation { Character = OpticCharacter.Uniaxial, Weight = 0.5, Sign = OpticSign.Positive, Lowest = new RefractiveIndex(1.544), Highest = new RefractiveIndex(1.553), Birefringence = new Birefringence(0.009), Description = "" },
            new SeriesInterpretation { Character = OpticCharacter.Uniaxial, Weight = 0.5, Sign = OpticSign.Negative, Lowest = new RefractiveIndex(1.544), Highest = new RefractiveIndex(1.553), Birefringence = new Birefringence(0.009), Description = "" },
        ],
    };

    [Fact]
    public void A_sign_the_series_leaves_open_is_not_shown_as_fixed()
    {
        var a = new BenchAssessment { Version = 1, Errors = new Dictionary<string, string>(), Readings = new(), Result = CorundumAnswer(null) with { Series = TwoSigns() } };
        IReadOnlyList<string> used = ResultText.Derived(a);
        Assert.Contains("Optic sign: not fixed (positive and negative both fit the series)", used);
        Assert.Contains("Refractive indices: 1.544 to 1.553", used);
    }

    [Fact]
    public void A_refused_cut_is_not_shown_as_used_and_an_accepted_one_is()
    {
        var readings = new GemIndex.Data.Batch.StoneReadings { Sg = 4.0, Cut = "faceted" };
        var accepted = new BenchAssessment { Version = 1, Errors = new Dictionary<string, string>(), Readings = readings, Result = CorundumAnswer(null) };
        Assert.Contains("Cut: faceted", ResultText.Derived(accepted));
        var refused = accepted with { Errors = new Dictionary<string, string> { [BenchFields.Cut] = "'faceted' cannot show the asterism given" } };
        Assert.DoesNotContain(ResultText.Derived(refused), l => l.StartsWith("Cut:", StringComparison.Ordinal));
    }

    [Fact]
    public void A_refused_spot_reading_is_not_shown_as_used()
    {
        var form = new BenchModel();
        form.SetText(BenchFields.Spot, "90");
        form.SetText(BenchFields.Sg, "2.65");
        BenchAssessment a = new BenchAssessor(new Identifier(TestMaterials.All)).Assess(form.Snapshot());
        Assert.True(a.Errors.ContainsKey(BenchFields.Spot));
        Assert.DoesNotContain(ResultText.Derived(a), l => l.Contains("90", StringComparison.Ordinal));
        Assert.Contains("Specific gravity: 2.65 ± 0.01", ResultText.Derived(a));
    }

    [Fact]
    public void With_readings_typed_but_none_usable_the_pane_does_not_ask_for_readings()
    {
        var model = new ResultsModel();
        var form = new BenchModel();
        form.SetText(BenchFields.Sg, "2.6x");
        model.Accept(new BenchAssessor(new Identifier(TestMaterials.All)).Assess(form.Snapshot()));
        Assert.Equal("No usable reading yet: see the entries marked '!'.", model.Headline);
    }

    [Fact]
    public void A_two_column_line_wraps_under_its_second_column()
    {
        string[] rows = [.. TextWrap.Lines(["  F7    catalogue browser by name or index"], 30)];
        Assert.Equal(["  F7    catalogue browser by", "        name or index"], rows);
    }

    [Fact]
    public void An_older_assessment_does_not_replace_a_newer_one()
    {
        var model = new ResultsModel();
        var assessor = new BenchAssessor(null);
        var form = new BenchModel();
        var old = assessor.Assess(form.Snapshot());
        form.SetText(BenchFields.Sg, "2.65");
        var newer = assessor.Assess(form.Snapshot());
        Assert.True(model.Accept(newer));
        Assert.False(model.Accept(old));
        Assert.Same(newer, model.Latest);
    }

    [Fact]
    public void Long_lines_wrap_at_word_boundaries_with_an_indent()
    {
        string[] rows = [.. TextWrap.Lines(["  * one two three four five six"], 14)];
        Assert.Equal(["  * one two", "    three four", "    five six"], rows);
        Assert.All(rows, r => Assert.True(r.Length <= 14));
    }

    [Fact]
    public void The_origins_listed_are_those_the_engine_names_a_share_of_the_species_not_of_the_whole_answer()
    {
        // Beryl at 27 %: treated 4.9 % of the whole answer is 18 % of the species, which the engine's warning names.
        var beryl = new SpeciesResult
        {
            Species = "beryl", Confidence = 0.27,
            Origins = new Dictionary<OriginClass, double>
            {
                [OriginClass.Synthetic] = 0.14, [OriginClass.Natural] = 0.07,
                [OriginClass.Treated] = 0.049, [OriginClass.Composite] = 0.011,
            },
        };
        Assert.Equal([OriginClass.Synthetic, OriginClass.Natural, OriginClass.Treated],
            ResultText.Origins(beryl).Select(o => o.Key).ToArray());   // composite 4 % of the species stays out (BenchWarnings.OriginShare 5 %)
    }

    [Fact]
    public void Ranks_of_one_and_two_digits_line_up()
    {
        Assert.Equal(" 9 beryl   3%", ResultText.Candidate(9, "beryl", 5, 0.03, bar: false, rankWidth: 2));
        Assert.Equal("10 topaz   3%", ResultText.Candidate(10, "topaz", 5, 0.03, bar: false, rankWidth: 2));
    }
}
