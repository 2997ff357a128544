using GemIndex.Cli.TextUi.Bench;
using GemIndex.Cli.TextUi.Results;
using GemIndex.Core.Identification;

namespace GemIndex.Tests.TextUi.Bench;

public class BenchAssessorTests
{
    private static readonly BenchAssessor Assessor = new(new Identifier(TestMaterials.All));

    private static BenchModel QuartzForm()
    {
        var form = new BenchModel();
        // An invented quartz-like series: ω constant at 1.544, ε reaching 1.553 (values from memory for quartz).
        foreach (var (rotation, high) in new[] { ("0", "1.553"), ("45", "1.551"), ("90", "1.548"), ("135", "1.551"), ("180", "1.553") })
            form.PutStep(form.Steps.Count, new StepText(rotation, "1.544", high));
        form.SetText(BenchFields.Sg, "2.65");
        return form;
    }

    [Fact]
    public void Quartz_readings_put_quartz_first_and_show_the_indices_and_birefringence()
    {
        BenchAssessment a = Assessor.Assess(QuartzForm().Snapshot());
        Assert.Empty(a.Errors);
        Assert.Equal("quartz", a.Result!.Candidates[0].Material.Name);
        Assert.False(a.Result.NoGoodMatch);
        IReadOnlyList<string> derived = ResultText.Derived(a);
        Assert.Contains("Refractive indices: ω 1.544, ε 1.553", derived);
        Assert.Contains("Birefringence: 0.009", derived);
        Assert.Contains("Specific gravity: 2.65 ± 0.01", derived);
    }

    [Theory]
    [InlineData("0", "weight is 0 ct; allowed: above 0 to 500000 ct.")]
    [InlineData("-4.21", "weight is -4.21 ct; allowed: above 0 to 500000 ct.")]
    [InlineData("600000", "weight is 600000 ct; allowed: above 0 to 500000 ct.")]
    public void A_stone_s_weight_must_be_above_nothing_and_the_error_gives_the_range(string typed, string expected)
    {
        var form = QuartzForm();
        form.SetText(BenchFields.Weight, typed);
        BenchAssessment a = Assessor.Assess(form.Snapshot());
        Assert.Equal(expected, a.Errors[BenchFields.Weight]);
        // A weight that is not a number names the range too.
        form.SetText(BenchFields.Weight, "4.2x");
        Assert.EndsWith("; allowed: above 0 to 500000 ct.", Assessor.Assess(form.Snapshot()).Errors[BenchFields.Weight]);
        Assert.Equal("quartz", a.Result!.Candidates[0].Material.Name);   // the readings' answer stands
    }

    [Theory]
    // Entries the reader refuses in whole or in part, and clashes that make it leave a whole test out: a list with one
    // bad line, a step above the contact liquid, a liquid limit beyond what a contact liquid reaches, a heavy liquid
    // without a result beside a good one, an SG typed beside weights, "over the limit" beside high edges, fire by eye
    // beside measured indices. Each: what the form holds, and the form the answer was in fact worked out on.
    [InlineData("absorption")]
    [InlineData("step")]
    [InlineData("liquid")]
    [InlineData("heavy")]
    [InlineData("sg and weights")]
    [InlineData("over the limit")]
    [InlineData("fire and indices")]
    public void What_is_kept_of_a_stone_gives_the_answer_the_pane_gives_when_an_entry_is_refused(string fault)
    {
        BenchModel form = QuartzForm(), used = QuartzForm();
        switch (fault)
        {
            case "absorption": form.SetText(BenchFields.Absorption, "432 4b0"); break;
            case "step": form.PutStep(form.Steps.Count, new StepText("30", "2.5", "")); break;
            case "liquid": form.SetText(BenchFields.LiquidLimit, "2.6"); break;
            case "heavy": form.SetText(BenchFields.HeavyLiquids, "2.89 sinks; 3.32 maybe"); used.SetText(BenchFields.HeavyLiquids, "2.89 sinks"); break;
            case "sg and weights":
                form.SetText(BenchFields.AirCt, "3.500"); form.SetText(BenchFields.WaterCt, "2.500");
                used.SetText(BenchFields.Sg, ""); break;
            case "over the limit":
                form.Choose(BenchFields.OverLimit, "yes");
                foreach (int i in Enumerable.Range(0, used.Steps.Count).Reverse()) used.RemoveStep(i);
                break;
            default:
                form.Choose(BenchFields.Dispersion, "weak"); form.SetText(BenchFields.IndexAtB, "1.541"); form.SetText(BenchFields.IndexAtG, "1.553");
                break;
        }
        BenchAssessment a = Assessor.Assess(form.Snapshot());
        Assert.NotEmpty(a.Errors);
        // The stone list, the reports and the command line rank what is kept; the pane ranked the form as the reader used it.
        BenchAssessment clean = Assessor.Assess(used.Snapshot());
        Assert.Empty(clean.Errors);
        Assert.Equal(GemIndex.Data.Batch.StoneReadingsConverter.ToReadings(clean.Readings), GemIndex.Data.Batch.StoneReadingsConverter.ToReadings(a.Readings));
        Assert.Equal(ResultText.Short(a.Result!), Assessor.Answer(a.Readings));
    }

    [Fact]
    public void A_stone_described_as_opaque_is_answered_and_its_transparency_listed_among_the_readings_used()
    {
        // The stone page's transparency description is a reading when it starts with one of the three words; the answer's
        // lines must take it (a reading that is no one-key choice once stopped the text UI).
        var form = QuartzForm();
        form.SetText(BenchFields.Transparency, "opaque, waxy");
        BenchAssessment a = Assessor.Assess(form.Snapshot());
        Assert.Equal("opaque", a.Readings.Transparency);
        Assert.Contains("Transparency: opaque", ResultText.Derived(a));
        var model = new ResultsModel();
        Assert.True(model.Accept(a));
        Assert.Contains(model.Rows(76), row => row.Text.Contains("Transparency: opaque", StringComparison.Ordinal));
        // "Stays dark" on a stone said to be opaque is listed but not weighed, and the list says so.
        form.Choose(BenchFields.Polariscope, "singly_refractive");
        Assert.Contains("Polariscope: singly refractive (not weighed: the stone is opaque)", ResultText.Derived(Assessor.Assess(form.Snapshot())));
    }

    [Fact]
    public void The_SG_pages_caution_names_the_same_stones_as_the_answers_do_not_immerse_warning()
    {
        // A natural opal's spot 1.45 and SG 2.00 (from memory) against the shipped catalogue: many opal entries, all porous.
        var form = new BenchModel();
        form.SetText(BenchFields.Spot, "1.45");
        form.SetText(BenchFields.Sg, "2.00");
        BenchAssessment a = new BenchAssessor(new Identifier(GemIndex.Data.Catalogue.ShippedCatalogue.Families.Materials)).Assess(form.Snapshot());
        Assert.True(a.DoNotImmerse.Count > 5, string.Join(", ", a.DoNotImmerse));   // more than the top five candidates
        string warning = Assert.Single(a.Result!.Warnings, w => w.Contains("do not immerse", StringComparison.Ordinal));
        Assert.StartsWith($"Possible {BenchWarnings.KeepDryListed(a.DoNotImmerse)}: do not immerse", warning);
    }

    [Fact]
    public void The_readings_used_name_every_test_the_answer_weighed_not_only_the_numbers()
    {
        var form = QuartzForm();
        form.Choose(BenchFields.Polariscope, "doubly_refractive");
        form.SetText(BenchFields.Absorption, "none");
        form.SetText(BenchFields.Colour, "yellow");
        BenchAssessment a = Assessor.Assess(form.Snapshot());
        IReadOnlyList<string> derived = ResultText.Derived(a);
        Assert.Contains("Polariscope: doubly refractive", derived);
        Assert.Contains("Absorption: no lines", derived);
        Assert.Contains("Colour: yellow", derived);
    }

    [Fact]
    public void Every_listed_candidate_has_its_reasons_since_any_can_be_opened()
    {
        BenchAssessment a = Assessor.Assess(QuartzForm().Snapshot());
        Assert.True(a.Result!.Candidates.Count > 3);
        Assert.All(a.Result.Candidates, c => Assert.NotEmpty(c.Reasons));
    }

    [Fact]
    public void A_step_that_does_not_parse_is_marked_at_its_row_and_the_rest_still_ranks()
    {
        BenchModel form = QuartzForm();
        form.PutStep(1, new StepText("45", "1.5x", "1.551"));
        BenchAssessment a = Assessor.Assess(form.Snapshot());
        Assert.Equal("low: '1.5x' is not a number; allowed: 1.3 to 1.79.", a.Errors[BenchFields.Step(1)]);   // a spot reading's range, to the liquid in use
        Assert.Single(a.Errors);
        Assert.Equal("quartz", a.Result!.Candidates[0].Material.Name);
        Assert.Equal(4, a.Readings.Refractometer!.Readings.Count);
    }

    [Fact]
    public void A_step_with_two_bad_edges_shows_both_faults_at_its_row()
    {
        // The low edge typed as 180 (the rotation in the wrong box) and the pair typed whole in the high box: both are
        // named at the step, not only the first.
        BenchModel form = QuartzForm();
        form.PutStep(1, new StepText("45", "180", "1.691 1.700"));
        string said = Assessor.Assess(form.Snapshot()).Errors[BenchFields.Step(1)];
        Assert.Contains("low", said);
        Assert.Contains("180", said);
        Assert.Contains("'1.691 1.700'", said);
    }

    [Fact]
    public void A_high_edge_below_the_low_edge_is_refused_at_that_step_with_Cores_reason()
    {
        BenchModel form = QuartzForm();
        form.PutStep(2, new StepText("90", "1.548", "1.544"));
        BenchAssessment a = Assessor.Assess(form.Snapshot());
        Assert.Contains("not below the low edge", a.Errors[BenchFields.Step(2)]);
        Assert.NotNull(a.Result);
    }

    [Fact]
    public void A_weight_in_water_not_below_the_weight_in_air_is_marked_at_the_water_field()
    {
        BenchModel form = QuartzForm();
        form.SetText(BenchFields.Sg, "");
        form.SetText(BenchFields.AirCt, "3.12");
        form.SetText(BenchFields.WaterCt, "3.50");
        BenchAssessment a = Assessor.Assess(form.Snapshot());
        Assert.True(a.Errors.ContainsKey(BenchFields.WaterCt), string.Join("; ", a.Errors));
        Assert.Null(a.SpecificGravity);
        Assert.Equal("quartz", a.Result!.Candidates[0].Material.Name);   // the refractometer still ranks
    }

    [Fact]
    public void Hydrostatic_weights_give_an_SG_with_its_uncertainty()
    {
        var form = new BenchModel();
        form.SetText(BenchFields.AirCt, "3.120");
        form.SetText(BenchFields.WaterCt, "1.943");
        BenchAssessment a = Assessor.Assess(form.Snapshot());
        // 3.120 / (3.120 − 1.943) = 2.651 before the water-density correction (worked by hand); the correction at 20 °C is −0.2 %.
        Assert.InRange(a.SpecificGravity!.Value.Value, 2.640, 2.652);
        Assert.InRange(a.SpecificGravity.Value.StandardUncertainty, 0.001, 0.02);
    }

    [Fact]
    public void A_comma_as_decimal_mark_is_refused_with_the_reason_at_the_field()
    {
        var form = new BenchModel();
        form.SetText(BenchFields.Sg, "2,65");
        BenchAssessment a = Assessor.Assess(form.Snapshot());
        Assert.Contains("comma", a.Errors[BenchFields.Sg]);
        Assert.Null(a.Result);
    }

    [Fact]
    public void A_porous_candidate_near_the_top_raises_the_immersion_caution()
    {
        var form = new BenchModel();
        form.SetText(BenchFields.Spot, "1.45");
        BenchAssessment a = Assessor.Assess(form.Snapshot());
        Assert.Contains("opal", a.DoNotImmerse);
        var results = new ResultsModel();
        results.Accept(a);
        Assert.StartsWith("Do not immerse: opal", results.ImmersionCaution);
        var quartz = new ResultsModel();
        quartz.Accept(Assessor.Assess(QuartzForm().Snapshot()));
        Assert.Null(quartz.ImmersionCaution);
    }

    [Fact]
    public void Readings_nothing_in_the_catalogue_fits_give_the_no_good_match_state()
    {
        var form = new BenchModel();
        form.PutStep(0, new StepText("0", "2.05", ""));
        form.SetText(BenchFields.LiquidLimit, "2.1");
        form.SetText(BenchFields.Sg, "7.0");
        BenchAssessment a = Assessor.Assess(form.Snapshot());
        Assert.True(a.Result!.NoGoodMatch);
        var results = new ResultsModel();
        results.Accept(a);
        Assert.StartsWith("!! NO GOOD MATCH", results.Headline);
    }

    [Fact]
    public void An_edge_above_the_liquid_limit_is_marked_at_its_step()
    {
        var form = new BenchModel();
        form.PutStep(0, new StepText("0", "1.544", "1.553"));
        form.PutStep(1, new StepText("15", "1.544", "1.85"));
        BenchAssessment a = Assessor.Assess(form.Snapshot());
        Assert.Contains("liquid limit", a.Errors[BenchFields.Step(1)]);
        Assert.False(a.Errors.ContainsKey(BenchFields.Step(0)));
        Assert.NotNull(a.Result);
    }

    [Fact]
    public void A_calibration_offset_outside_its_range_is_marked_and_ignored()
    {
        BenchModel form = QuartzForm();
        form.SetText(BenchFields.CalibrationOffset, "0.2");
        BenchAssessment a = Assessor.Assess(form.Snapshot());
        Assert.Contains("calibration offset", a.Errors[BenchFields.CalibrationOffset]);
        Assert.Equal("quartz", a.Result!.Candidates[0].Material.Name);
    }

    [Fact]
    public void Measured_dispersion_indices_go_into_the_readings_and_a_reversed_pair_is_marked()
    {
        BenchModel form = QuartzForm();
        form.SetText(BenchFields.IndexAtB, "1.541");
        form.SetText(BenchFields.IndexAtG, "1.554");
        BenchAssessment a = Assessor.Assess(form.Snapshot());
        Assert.Equal((1.541, 1.554), a.Readings.DispersionIndices);
        Assert.Empty(a.Errors);
        form.SetText(BenchFields.IndexAtG, "1.530");   // nG below nB by more than Core allows
        BenchAssessment reversed = Assessor.Assess(form.Snapshot());
        Assert.True(reversed.Errors.ContainsKey(BenchFields.IndexAtG), string.Join("; ", reversed.Errors));
        Assert.Equal("quartz", reversed.Result!.Candidates[0].Material.Name);
    }
}
