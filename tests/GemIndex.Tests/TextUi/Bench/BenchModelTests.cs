using GemIndex.Cli.TextUi.Bench;
using GemIndex.Data.Batch;
using GemIndex.Data.Workbook;

namespace GemIndex.Tests.TextUi.Bench;

public class BenchModelTests
{
    [Fact]
    public void The_next_rotation_moves_on_by_the_step_from_the_last_one()
    {
        var form = new BenchModel();
        Assert.Equal("0", form.NextRotation());
        form.PutStep(0, new StepText("0", "1.544", "1.553"));
        form.PutStep(1, new StepText("30", "1.544", "1.552"));
        Assert.Equal("45", form.NextRotation());
        Assert.False(form.NextRotationFillsGap);
    }

    [Fact]
    public void After_a_half_turn_the_next_rotation_fills_the_widest_gap_rather_than_repeat_0()
    {
        // Common practice: the shadow edges repeat every 180°, so a step at 180° reads what 0° read.
        var form = new BenchModel();
        form.SetText(RefractometerPage.RotationStepField, "22.5");
        for (int i = 0; i < 8; i++) form.PutStep(i, new StepText((i * 22.5).ToString(System.Globalization.CultureInfo.InvariantCulture), "1.761", "1.768"));
        Assert.Equal("11.25", form.NextRotation());   // 0–157.5° read: the middle of the first of the equal gaps
        Assert.True(form.NextRotationFillsGap);        // and the edit line says so
        var some = new BenchModel();
        some.SetText(RefractometerPage.RotationStepField, "45");
        some.PutStep(0, new StepText("0", "1.544", "1.553"));
        some.PutStep(1, new StepText("135", "1.544", "1.551"));
        Assert.Equal("67.5", some.NextRotation());    // 180° is 0° again: the widest gap, 0–135°, is halved
        var beyond = new BenchModel();
        beyond.PutStep(0, new StepText("200", "1.544", "1.553"));
        Assert.Equal("35", beyond.NextRotation());    // round the half turn (200 + 15 = 215 → 35)
        Assert.False(beyond.NextRotationFillsGap);
    }

    [Fact]
    public void Every_change_bumps_the_version_and_a_repeat_does_not()
    {
        var form = new BenchModel();
        int v = form.Version;
        form.SetText(BenchFields.Sg, "2.65");
        form.SetText(BenchFields.Sg, "2.65");
        form.Choose(BenchFields.Polariscope, "doubly_refractive");
        Assert.Equal(v + 2, form.Version);
    }

    [Fact]
    public void A_reopened_stone_shows_its_indices_to_the_thousandth_as_read()
    {
        // A refractometer reads to 0.001 (common practice): 1.770 is a reading of 1.770, and it comes back as written.
        var stone = new StoneSheet
        {
            Id = 5, Reference = "lot 3",
            Readings = new StoneReadings
            {
                Id = "lot 3",
                Refractometer = new RefractometerReadings { Readings = [new EdgeReadingEntry(0, 1.762, 1.770)], LiquidLimit = 1.8 },
            },
        };
        var form = new BenchModel();
        form.Load(stone);
        Assert.Equal(("1.762", "1.770"), (form.Steps[0].Low, form.Steps[0].High));
        Assert.Equal("1.800", form.Text(BenchFields.LiquidLimit));
    }

    [Fact]
    public void A_loaded_stone_fills_the_form_and_goes_back_unchanged()
    {
        var stone = new StoneSheet
        {
            Id = 4, Reference = "lot 2", WeightCarats = 1.05, Shape = "cushion", Notes = "loose",
            Readings = new StoneReadings
            {
                Id = "lot 2", Colour = "red", Sg = 3.6, Polariscope = "singly_refractive", UvLong = "moderate", AbsorptionNm = [685, 656],
                Refractometer = new RefractometerReadings { Readings = [new EdgeReadingEntry(0, 1.718, null)], LiquidLimit = 1.81 },
                HeavyLiquids = [new HeavyLiquidReading(3.32, "floats")],
                FeaturesPresent = ["crystals", "needles_silk"], FeaturesAbsent = ["round_bubbles"],
            },
        };
        var form = new BenchModel();
        form.Load(stone);
        Assert.Equal("red", form.Text(BenchFields.Colour));
        Assert.Equal("685 656", form.Text(BenchFields.Absorption));
        Assert.Equal("3.32 floats", form.Text(BenchFields.HeavyLiquids));
        Assert.Equal("singly_refractive", form.Choice(BenchFields.Polariscope));
        Assert.Equal("crystals needles_silk", form.Text(BenchFields.FeaturesPresent));
        Assert.Equal("round_bubbles", form.Text(BenchFields.FeaturesAbsent));
        var assessor = new BenchAssessor(null);
        BenchAssessment a = assessor.Assess(form.Snapshot());
        Assert.Empty(a.Errors);
        StoneSheet back = BenchModel.ToStoneSheet(form.Snapshot(), a.Readings);
        Assert.Equal(StoneReadingsJson.Write(stone.Readings), StoneReadingsJson.Write(back.Readings));
        Assert.Equal((4L, "lot 2", 1.05, "cushion", "loose"), (back.Id, back.Reference, back.WeightCarats!.Value, back.Shape, back.Notes));
    }

    [Fact]
    public void A_draft_keeps_text_that_does_not_parse_yet()
    {
        var form = new BenchModel();
        form.SetText(BenchFields.AirCt, "3.1");
        form.SetText(BenchFields.WaterC, "2x");
        form.PutStep(0, new StepText("0", "1.5x", ""));
        form.Choose(BenchFields.OverLimit, "yes");
        string draft = BenchDraft.Write(form.Snapshot());
        var again = new BenchModel();
        Assert.True(again.ApplyDraft(draft));
        Assert.Equal("3.1", again.Text(BenchFields.AirCt));
        Assert.Equal("2x", again.Text(BenchFields.WaterC));
        Assert.Equal(new StepText("0", "1.5x", ""), again.Steps[0]);
        Assert.Equal("yes", again.Choice(BenchFields.OverLimit));
        Assert.False(again.ApplyDraft("not json"));
    }

    [Fact]
    public void A_choice_takes_one_letter_and_refuses_others()
    {
        BenchChoice polariscope = BenchChoice.For(BenchFields.Polariscope);
        Assert.Equal("doubly_refractive", polariscope.WordFor('d'));
        Assert.Equal("singly_refractive", polariscope.WordFor('I'));
        Assert.Null(polariscope.WordFor('n'));
        Assert.Equal("i/d/a/x", polariscope.KeyHint);
        Assert.All(BenchChoice.All, c => Assert.Equal(c.Options.Count, c.Options.Select(o => o.Key).Distinct().Count()));
    }

    [Fact]
    public void A_key_means_one_thing_on_every_choice()
    {
        // "n" is "none" wherever it is offered (it once meant "anomalous" on the polariscope).
        var meanings = BenchChoice.All.SelectMany(c => c.Options.Select(o => (o.Key, Meaning: o.Key == 'n' || o.Word is "inert" ? "none" : o.Word)))
            .GroupBy(o => o.Key).Where(g => g.Select(o => o.Meaning).Distinct().Count() > 1
                && !(g.Key == '+' || g.Key == '-'))   // + and − are "reacts" and "does not react" on both probes
            .Select(g => g.Key);
        Assert.Empty(meanings);
    }

    [Fact]
    public void The_rotation_step_set_once_is_offered_for_every_next_step_and_a_bad_one_is_refused_in_words()
    {
        var form = new BenchModel();
        form.SetText(RefractometerPage.RotationStepField, "45");
        form.PutStep(0, new StepText("0", "1.544", "1.553"));
        Assert.Equal("45", form.NextRotation());
        form.PutStep(1, new StepText("45", "1.544", "1.551"));
        Assert.Equal("90", form.NextRotation());
        form.SetText(RefractometerPage.RotationStepField, "400");
        Assert.Equal("rotation step 400° is outside 1° to 180°", form.RotationStepProblem);
        Assert.Equal("60", form.NextRotation());   // the default 15° meanwhile
    }
}
