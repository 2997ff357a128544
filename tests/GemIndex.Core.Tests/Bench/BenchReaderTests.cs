using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using GemIndex.Core.Bench;
using GemIndex.Core.Observations;

namespace GemIndex.Core.Tests.Bench;

public class BenchReaderTests
{
    private static BenchReadings R(params (string Field, string Value)[] values) =>
        values.Aggregate(new BenchReadings(), (r, v) => r.With(v.Field, v.Value));

    private static BenchReadings Steps(BenchReadings r, params string[] steps) => steps.Aggregate(r, (x, s) => x.WithStep(BenchSyntax.Step(s)!));

    private static IReadOnlyList<string> Fields(BenchReading reading) => [.. reading.Errors.Select(e => e.Field)];

    [Fact]
    public void Good_readings_give_a_sheet_and_no_errors()
    {
        // Quartz: ω 1.544, ε 1.553, SG 2.65 (from memory of standard handbook values).
        var reading = BenchReader.Read(Steps(R((BenchField.Sg, "2.65"), (BenchField.Polariscope, "doubly refractive")), "0:1.544/1.553", "90:1.544/1.548"));
        Assert.Empty(reading.Errors);
        Assert.Equal(2, reading.Sheet.Refractometer!.Steps.Count);
        Assert.Equal(2.65, reading.Sheet.SpecificGravity!.Value.Value);
        Assert.Equal(BenchDefaults.DirectSpecificGravityUncertainty, reading.Sheet.SpecificGravity!.Value.StandardUncertainty);
        Assert.Equal(PolariscopeReaction.DoublyRefractive, reading.Sheet.Polariscope);
        Assert.Equal(BenchDefaults.LiquidLimit, reading.Sheet.Refractometer.LiquidLimit);
    }

    [Theory]
    // A step's edges are read on the spot reading's scale: the same range to the liquid in use, each edge beyond it named.
    [InlineData("0:1.7a6/1.770", "low: '1.7a6' is not a number; allowed: 1.3 to 1.79.")]
    [InlineData("0:2.5/1.770", "low edge 2.5 is above the liquid limit 1.790, where no edge shows")]
    [InlineData("0:1.80/1.81", "low edge 1.8 and high edge 1.81 are above the liquid limit 1.790")]
    [InlineData("0:1.2/1.25", "low edge 1.2 and high edge 1.25 are below the scale's lowest index 1.30, where no refractometer reads.")]
    public void A_steps_edge_off_the_scale_is_named_with_the_range_a_spot_reading_takes(string step, string sentence)
    {
        var reading = BenchReader.Read(Steps(new BenchReadings(), step));
        var error = Assert.Single(reading.Errors);
        Assert.Equal(BenchField.Step(0), error.Field);
        Assert.Contains(sentence, error.Sentence, StringComparison.Ordinal);
        var spot = Assert.Single(BenchReader.Read(R((BenchField.Spot, "1.7a"))).Errors);
        Assert.EndsWith("allowed: 1.3 to 1.79.", spot.Sentence, StringComparison.Ordinal);
    }

    [Fact]
    public void Without_the_refused_entries_the_readings_read_clean_to_the_same_sheet()
    {
        // Quartz (from memory) with a bad SG, a line list with one bad line and a step above any contact liquid: the reader
        // goes on without them, and the readings without them are exactly what it went on with.
        var readings = Steps(R((BenchField.Sg, "50"), (BenchField.Absorption, "432 4b0"), (BenchField.Polariscope, "doubly refractive")),
            "0:1.544/1.553", "45:2.5", "90:1.544/1.548");
        var reading = BenchReader.Read(readings);
        Assert.Equal(3, reading.Errors.Count);
        BenchReadings kept = readings.WithoutRefused(reading.Errors);
        var again = BenchReader.Read(kept);
        Assert.Empty(again.Errors);
        Assert.Equal(["0:1.544/1.553", "90:1.544/1.548"], kept.Steps.Select(BenchSyntax.Step));
        Assert.Null(kept.Text(BenchField.Sg));
        Assert.Null(kept.Text(BenchField.Absorption));
        Assert.Equal(reading.Sheet.Refractometer!.Steps, again.Sheet.Refractometer!.Steps);
        Assert.Equal(reading.Sheet.ToString(), again.Sheet.ToString());   // every other field (the lists print by type only)
        Assert.Same(readings, readings.WithoutRefused([]));
    }

    [Fact]
    public void With_a_refused_liquid_limit_a_step_above_the_default_liquid_is_refused_at_its_own_row()
    {
        // A liquid limit of 2.6 (beyond a contact liquid) and a step read at 2.5 beside a quartz step (from memory): the
        // default 1.79 stays in use, the 2.5 step is refused at its row and the quartz step is read.
        var reading = BenchReader.Read(Steps(R((BenchField.LiquidLimit, "2.6")), "0:2.5", "45:1.544/1.553"));
        Assert.Equal([BenchField.LiquidLimit, BenchField.Step(0)], Fields(reading).Order(StringComparer.Ordinal));
        Assert.Single(reading.Sheet.Refractometer!.Steps);
        Assert.Equal(BenchDefaults.LiquidLimit, reading.Sheet.Refractometer.LiquidLimit);
    }

    [Fact]
    public void The_instruments_settings_typed_before_any_reading_are_no_error_but_are_still_checked_for_their_range()
    {
        // The liquid's limit is set up before the first edge is read: it had been refused as "nothing to apply it to".
        var first = BenchReader.Read(R((BenchField.LiquidLimit, "1.80"), (BenchField.Precision, "0.001"), (BenchField.Sg, "2.65")));
        Assert.Empty(first.Errors);
        Assert.Null(first.Sheet.Refractometer);
        var beyond = BenchReader.Read(R((BenchField.LiquidLimit, "2.6"), (BenchField.Sg, "2.65")));
        Assert.Equal([BenchField.LiquidLimit], Fields(beyond));
        Assert.Contains("allowed: 1.5 to 2.2", beyond.Errors[0].Sentence, StringComparison.Ordinal);
        // Once a reading comes, the setting applies to it.
        var read = BenchReader.Read(Steps(R((BenchField.LiquidLimit, "1.80")), "0:1.795"));
        Assert.Empty(read.Errors);
        Assert.Equal(1.80, read.Sheet.Refractometer!.LiquidLimit);
    }

    [Theory]
    [InlineData("17.2")]
    [InlineData("17.2%")]
    [InlineData("17.2 %")]
    public void A_reflectance_reading_may_carry_its_percent_sign(string typed)
    {
        // A meter shows "17.2 %" (a diamond's reflectance, Fresnel at n 2.417, from memory); the sign had been "not a number".
        var reading = BenchReader.Read(R((BenchField.Reflectance, typed)));
        Assert.Empty(reading.Errors);
        Assert.Equal(17.2, reading.Sheet.Reflectance!.Value.Percent);
        Assert.Contains("allowed: 1 to 30 %", Assert.Single(BenchReader.Read(R((BenchField.Reflectance, "high%"))).Errors).Sentence, StringComparison.Ordinal);
    }

    [Fact]
    public void As_used_by_its_reading_a_stone_keeps_only_what_the_reader_took()
    {
        // An SG typed beside weights (both left out), a heavy liquid without a result beside a good one (the good one kept),
        // fire by eye beside measured indices (both left out), a good polariscope answer (kept); quartz values from memory.
        var readings = Steps(R((BenchField.Sg, "2.65"), (BenchField.AirCt, "3.5"), (BenchField.WaterCt, "2.5"),
            (BenchField.HeavyLiquids, "2.89 sinks; 3.32 maybe"), (BenchField.Dispersion, "weak"), (BenchField.IndexAtB, "1.541"),
            (BenchField.IndexAtG, "1.553"), (BenchField.Polariscope, "doubly refractive")), "0:1.544/1.553");
        var reading = BenchReader.Read(readings);
        BenchReadings used = readings.AsUsedBy(reading);
        var again = BenchReader.Read(used);
        Assert.Empty(again.Errors);
        Assert.Equal(reading.Sheet.ToString(), again.Sheet.ToString());
        Assert.Equal(reading.Sheet.HeavyLiquids, again.Sheet.HeavyLiquids);
        Assert.Equal("2.89 sinks", used.Text(BenchField.HeavyLiquids));
        Assert.All(new[] { BenchField.Sg, BenchField.AirCt, BenchField.WaterCt, BenchField.Dispersion, BenchField.IndexAtB, BenchField.IndexAtG },
            f => Assert.Null(used.Text(f)));
        Assert.Equal("doubly refractive", used.Text(BenchField.Polariscope));
        Assert.Single(used.Steps);
    }

    [Theory]
    // Each weighing fault on its own field, in the bench's words (weights invented for the rule).
    [InlineData("0", "0", BenchField.AirCt, "weight in air is 0 ct; allowed: above 0 ct")]
    [InlineData("-1", "0.5", BenchField.AirCt, "weight in air is -1 ct; allowed: above 0 ct")]
    [InlineData("3", "-2.1", BenchField.WaterCt, "weight in water is -2.1 ct; allowed: 0 ct or more, below the weight in air")]
    [InlineData("2", "2.5", BenchField.WaterCt, "weight in water is 2.5 ct; allowed: 0 to below the weight in air 2 ct")]
    [InlineData("0.001", "0.0005", BenchField.AirCt, "weight in air 0.001 ct is too small to weigh hydrostatically")]
    [InlineData("600000", "1", BenchField.AirCt, "weight in air is 600000 ct; allowed: 0 to 500000 ct")]
    public void A_weighing_fault_is_named_on_its_own_field_in_the_benchs_words(string air, string water, string field, string sentence)
    {
        var reading = BenchReader.Read(R((BenchField.AirCt, air), (BenchField.WaterCt, water)));
        BenchFieldError error = Assert.Single(reading.Errors);
        Assert.Equal(field, error.Field);
        Assert.StartsWith(sentence, error.Sentence);
        Assert.DoesNotContain("mass", error.Sentence);
        Assert.Null(reading.Sheet.SpecificGravity);
    }

    [Fact]
    public void A_heavy_liquid_result_may_be_written_as_the_plain_verb()
    {
        // "3.32 float; 2.89 sink" as a bench note writes it: the same as floats and sinks.
        var plain = BenchReader.Read(R((BenchField.HeavyLiquids, "3.32 float; 2.89 sink; 3.05 suspend")));
        var usual = BenchReader.Read(R((BenchField.HeavyLiquids, "3.32 floats; 2.89 sinks; 3.05 suspends")));
        Assert.Empty(plain.Errors);
        Assert.Equal(usual.Sheet.HeavyLiquids, plain.Sheet.HeavyLiquids);
        Assert.Single(BenchReader.Read(R((BenchField.HeavyLiquids, "3.32 hovers"))).Errors);
    }

    [Theory]
    [InlineData("opaque", StoneTransparency.Opaque)]
    [InlineData("Translucent", StoneTransparency.Translucent)]
    [InlineData("transparent", StoneTransparency.Transparent)]
    public void The_transparency_is_read_as_one_of_three_words(string word, StoneTransparency expected)
    {
        var reading = BenchReader.Read(R((BenchField.Transparency, word)));
        Assert.Empty(reading.Errors);
        Assert.Equal(expected, reading.Sheet.Transparency);
        BenchFieldError error = Assert.Single(BenchReader.Read(R((BenchField.Transparency, "cloudy"))).Errors);
        Assert.Equal(BenchField.Transparency, error.Field);
        Assert.Equal("transparent | translucent | opaque", error.Allowed);
    }

    [Fact]
    public void Every_bad_field_is_reported_at_once_with_its_name_value_range_and_sentence()
    {
        var reading = BenchReader.Read(R((BenchField.Sg, "50"), (BenchField.Polariscope, "sparkly"), (BenchField.Absorption, "900"), (BenchField.UvLong, "")));
        Assert.Equal([BenchField.Sg, BenchField.Polariscope, BenchField.UvLong, BenchField.Absorption], Fields(reading));
        BenchFieldError sg = reading.Errors[0];
        Assert.Equal("50", sg.Value);
        Assert.Contains("25", sg.Allowed);
        Assert.StartsWith("specific gravity is 50; allowed:", sg.Sentence);
        Assert.Equal("singly_refractive | doubly_refractive | aggregate | anomalous", reading.Errors[1].Allowed);
        Assert.StartsWith("is empty", reading.Errors[2].Sentence);
    }

    [Fact]
    public void A_refused_part_does_not_hide_the_fault_of_another()
    {
        // A bad water temperature still lets the weights be checked against each other (water 0.6 ct above air 0.5 ct).
        var weighing = BenchReader.Read(R((BenchField.AirCt, "0.5"), (BenchField.WaterCt, "0.6"), (BenchField.WaterC, "95")));
        Assert.Equal([BenchField.WaterC, BenchField.WaterCt], Fields(weighing).Order(StringComparer.Ordinal));
        // A step with a comma in its low edge and letters for its high edge: both parts are named.
        var step = BenchReader.Read(Steps(R(), "0:1,544/abc"));
        Assert.Equal(2, step.Errors.Count(e => e.Field == BenchField.Step(0)));
        Assert.Contains(step.Errors, e => e.Sentence.StartsWith("high:", StringComparison.Ordinal));
    }

    [Fact]
    public void An_edge_above_the_usual_liquid_is_an_error_asking_for_the_liquid_never_a_guess()
    {
        var reading = BenchReader.Read(Steps(new BenchReadings(), "0:1.81", "90:1.81"));
        Assert.Equal([BenchField.Step(0), BenchField.Step(1)], Fields(reading));
        Assert.Contains(BenchField.LiquidLimit, reading.Errors[0].Sentence);
        Assert.Null(reading.Sheet.Refractometer);
        var denser = BenchReader.Read(Steps(R((BenchField.LiquidLimit, "1.81")), "0:1.81", "90:1.81"));
        Assert.Empty(denser.Errors);
        Assert.Equal(1.81, denser.Sheet.Refractometer!.LiquidLimit);
    }

    [Fact]
    public void Within_the_slack_above_the_liquid_an_edge_is_read()
    {
        var reading = BenchReader.Read(Steps(new BenchReadings(), "0:1.794"));
        Assert.Empty(reading.Errors);
    }

    [Fact]
    public void SG_typed_and_weighed_is_an_error_naming_both()
    {
        var reading = BenchReader.Read(R((BenchField.Sg, "2.65"), (BenchField.AirCt, "3.12"), (BenchField.WaterCt, "1.943")));
        BenchFieldError e = Assert.Single(reading.Errors);
        Assert.Equal(BenchField.Sg, e.Field);
        Assert.Contains(BenchField.AirCt, e.Sentence);
        Assert.Null(reading.Sheet.SpecificGravity);
    }

    [Theory]
    [InlineData("-2.7", "allowed: 0.5")]
    [InlineData("2.7x", "not a number")]
    public void A_typed_SG_that_is_itself_refused_gets_its_own_reason_and_the_weighing_stands(string typed, string reason)
    {
        var reading = BenchReader.Read(R((BenchField.Sg, typed), (BenchField.AirCt, "3.12"), (BenchField.WaterCt, "1.943")));
        BenchFieldError e = Assert.Single(reading.Errors);
        Assert.Equal(BenchField.Sg, e.Field);
        Assert.DoesNotContain("by weighing", e.Sentence);
        Assert.Contains(reason, e.Allowed + " " + e.Sentence);
        // 3.12 / (3.12 − 1.943) at 20 °C: 2.65 (the hydrostatic relation; common practice).
        Assert.Equal(2.65, reading.Sheet.SpecificGravity!.Value.Value, 2);
    }

    [Fact]
    public void A_weight_in_air_without_the_weight_in_water_is_refused()
    {
        var reading = BenchReader.Read(R((BenchField.AirCt, "3.12")));
        Assert.Equal([BenchField.WaterCt], Fields(reading));
    }

    [Theory]
    [InlineData(BenchField.WaterC, "20")]
    [InlineData(BenchField.LiquidLimit, "1.81")]
    [InlineData(BenchField.Precision, "0.002")]
    [InlineData(BenchField.CalibrationOffset, "0.001")]
    [InlineData(BenchField.LightNm, "589.3")]
    public void A_setting_given_before_its_reading_is_kept_without_an_error(string field, string value)
    {
        // Set up at the bench before the stone is read (the liquid, the light, the water's temperature): it had been
        // refused as having "nothing to apply it to", a "!" beside a value typed in the natural order.
        var reading = BenchReader.Read(R((BenchField.Sg, "2.65"), (field, value)));
        Assert.Empty(reading.Errors);
        Assert.Equal(2.65, reading.Sheet.SpecificGravity!.Value.Value);
    }

    [Theory]
    [InlineData(BenchField.WaterC, "99")]
    [InlineData(BenchField.Precision, "0.5")]
    public void A_setting_given_before_its_reading_is_still_checked_for_its_range(string field, string value)
    {
        var reading = BenchReader.Read(R((BenchField.Sg, "2.65"), (field, value)));
        Assert.Equal([field], Fields(reading));
        Assert.Contains("allowed:", reading.Errors[0].Sentence, StringComparison.Ordinal);
    }

    [Fact]
    public void Over_the_limit_with_a_high_edge_read_is_a_contradiction_naming_both()
    {
        var reading = BenchReader.Read(Steps(R((BenchField.OverLimit, "yes")), "0:1.544/1.553"));
        BenchFieldError e = Assert.Single(reading.Errors);
        Assert.Equal(BenchField.OverLimit, e.Field);
        Assert.Contains(BenchField.Step(0), e.Sentence);
    }

    [Fact]
    public void Over_the_limit_with_only_low_edges_read_is_the_trades_high_edge_over_the_limit()
    {
        // A birefringent stone whose high edge lies above the liquid: the low edges are read and the high one is "OTL"
        // (common practice). Not a contradiction; the steps without a high edge already say it.
        var reading = BenchReader.Read(Steps(R((BenchField.OverLimit, "yes")), "0:1.72", "90:1.73"));
        Assert.Empty(reading.Errors);
        Assert.Equal(2, reading.Sheet.Refractometer!.Steps.Count);
    }

    [Theory]
    // Text that is not a number is told the field's range, the range its value's own check states.
    [InlineData(BenchField.Sg, "2.7x", "allowed: 0.5 to 25.")]
    [InlineData(BenchField.LiquidLimit, "1.8x", "allowed: 1.5 to 2.2.")]
    [InlineData(BenchField.WaterC, "2x", "allowed: 0 to 40 °C.")]   // the water table's range, as for a number outside it
    public void Text_that_is_not_a_number_is_told_the_fields_range(string field, string text, string allowed)
    {
        var readings = R((field, text));
        if (field == BenchField.LiquidLimit) readings = readings.With(BenchField.Spot, "1.60");
        if (field == BenchField.WaterC) readings = readings.With(BenchField.AirCt, "3.12").With(BenchField.WaterCt, "1.943");
        BenchFieldError e = Assert.Single(BenchReader.Read(readings).Errors);
        Assert.Equal(field, e.Field);
        Assert.EndsWith(allowed, e.Sentence);
    }

    [Fact]
    public void More_steps_than_the_analysis_reads_is_one_error_not_a_crash()
    {
        var r = new BenchReadings();
        for (int i = 0; i <= BenchDefaults.MostSteps; i++) r = r.WithStep(new EdgeStepText("0", "1.544", ""));
        var reading = BenchReader.Read(r);
        Assert.Equal([BenchField.Readings], Fields(reading));
        Assert.Contains("1–1000", reading.Errors[0].Sentence);
    }

    [Fact]
    public void A_bad_value_is_echoed_at_most_80_characters_with_control_characters_made_visible()
    {
        string huge = "1" + new string('x', 100_000);
        var reading = BenchReader.Read(R((BenchField.Sg, huge), (BenchField.Colour, "\u001b[31mred")));
        Assert.Equal(2, reading.Errors.Count);   // the endless SG, and a colour holding an escape sequence
        BenchFieldError e = reading.Errors.Single(x => x.Field == BenchField.Sg);
        Assert.Equal(BenchText.MostShown, e.Value.Length);
        Assert.True(e.Sentence.Length < 200, e.Sentence);
        Assert.Equal("\\u001b[31mred", reading.Errors.Single(x => x.Field == BenchField.Colour).Value);
        Assert.Equal("\\u001b[31mred", BenchText.Shown("\u001b[31mred"));
        Assert.Equal("\\ud800", BenchText.Shown("\ud800"));
    }

    [Fact]
    public void Instrument_settings_reach_the_observation_and_bad_ones_are_reported_together()
    {
        var good = BenchReader.Read(Steps(R((BenchField.Precision, "0.002"), (BenchField.CalibrationOffset, "0.003")), "0:1.718"));
        Assert.Empty(good.Errors);
        Assert.Equal(0.002, good.Sheet.Refractometer!.ReadingPrecision);
        Assert.Equal(0.003, good.Sheet.Refractometer.CalibrationOffset);
        var bad = BenchReader.Read(Steps(R((BenchField.Precision, "-1"), (BenchField.CalibrationOffset, "0.5"), (BenchField.LightNm, "100")), "0:1.718"));
        Assert.Equal([BenchField.LightNm, BenchField.Precision, BenchField.CalibrationOffset], Fields(bad));
        Assert.NotNull(bad.Sheet.Refractometer);   // the steps still count, at the default settings
    }

    [Fact]
    public void Instrument_settings_are_checked_while_no_step_is_readable_yet()
    {
        // A step not yet a number leaves nothing to read, but a liquid limit of 2.5, a precision of 5 and an offset of
        // 0.5 are told their ranges now, not once a good step is typed.
        var r = BenchReader.Read(Steps(R((BenchField.LiquidLimit, "2.5"), (BenchField.Precision, "5"), (BenchField.CalibrationOffset, "0.5")), "0:abc"));
        Assert.Equal([BenchField.LiquidLimit, BenchField.Precision, BenchField.CalibrationOffset, BenchField.Step(0)], Fields(r));
        Assert.Null(r.Sheet.Refractometer);
        Assert.Contains("allowed: 1.5 to 2.2", r.Errors.Single(e => e.Field == BenchField.LiquidLimit).Sentence);
    }

    [Fact]
    public void Steps_with_no_rotation_are_spread_evenly_over_a_half_turn()
    {
        var r = new BenchReadings().WithStep(new EdgeStepText("", "1.544", "1.553")).WithStep(new EdgeStepText("", "1.544", "1.548"));
        var reading = BenchReader.Read(r);
        Assert.Equal([0.0, 90.0], reading.Sheet.Refractometer!.Steps.Select(s => s.RotationDegrees));
    }

    [Fact]
    public void Absorption_none_means_looked_and_saw_none_and_an_empty_text_is_an_error()
    {
        Assert.Empty(BenchReader.Read(R((BenchField.Absorption, "none"))).Sheet.AbsorptionLinesNanometres!);
        Assert.Equal([694.0, 668, 659], BenchReader.Read(R((BenchField.Absorption, "694, 668 659"))).Sheet.AbsorptionLinesNanometres!);
        Assert.Equal([BenchField.Absorption], Fields(BenchReader.Read(R((BenchField.Absorption, " ")))));
    }

    [Theory]
    [InlineData("505 520-540", "'520-540' is a band: write its middle, 530, as a line; allowed: lines (or a band's middle) in nm, 380 to 780, or none.")]
    [InlineData("505 abc", "'abc' is not a number; allowed: lines (or a band's middle) in nm, 380 to 780, or none.")]
    public void A_line_that_is_not_a_number_is_told_what_to_write_and_a_band_its_middle(string lines, string sentence)
    {
        var r = BenchReader.Read(R((BenchField.Absorption, lines)));
        Assert.Equal(sentence, Assert.Single(r.Errors).Sentence);
    }

    [Fact]
    public void An_unknown_field_is_an_error()
    {
        Assert.Equal(["refractometer.prism"], Fields(BenchReader.Read(R(("refractometer.prism", "1")))));
    }

    [FsCheck.Xunit.Property(MaxTest = 300)]
    public Property Any_text_in_any_field_gives_errors_never_an_exception()
    {
        var texts = Gen.Elements("", " ", "1.5x", "1,544", "NaN", "1e308", "-1", "0", "2.65", "floats", "3.32 floats", "yes", "\u001b", "\ud800", "999999",
            "singly_refractive", "none", "1.544", "0:1.5/1.6", "; ;");
        var gen = Gen.ListOf(Gen.Zip(Gen.Elements(BenchField.All.ToArray()), texts)).Zip(Gen.ListOf(Gen.Zip(texts, texts).Select(t => new EdgeStepText(t.Item1, t.Item2, ""))));
        return Prop.ForAll(gen.ToArbitrary(), input =>
        {
            var r = input.Item1.Aggregate(new BenchReadings(), (x, v) => x.With(v.Item1, v.Item2));
            r = input.Item2.Aggregate(r, (x, s) => x.WithStep(s));
            BenchReading reading = BenchReader.Read(r);
            return reading.Errors.All(e => e.Value.Length <= BenchText.MostShown && e.Sentence.Length > 0);
        });
    }
}
