using GemIndex.Cli.TextUi.Bench;
using GemIndex.Cli.TextUi.Plot;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Gravity;
using GemIndex.Core.Identification;

namespace GemIndex.Tests.TextUi.Plot;

public class ReadingScaleTests
{
    // Invented ranges around an invented reading of 1.544 ± 0.001; only their positions matter here.
    private static ReadingScale Scale(double value = 1.544, double u = 0.001) => new("lowest index", "0.000", value, u, ScaleModel.WidestIndex,
    [
        ("holds it", new PropertyRange(1.540, 1.548)),
        ("above it", new PropertyRange(1.560, 1.570)),
        ("just below", new PropertyRange(1.530, 1.5425)),
        ("no range", null),
    ]);

    /// <summary>The track part of a candidate row (after the name column, before the verdict).</summary>
    private static string Track(string row, int width) => row.Substring(ReadingScale.NameWidth, width - ReadingScale.NameWidth - ReadingScale.VerdictWidth);

    private static (int Marker, int First, int Last) Positions(string track) =>
        (track.IndexOfAny([ReadingScale.Marker, ReadingScale.MarkerOnBar]), track.IndexOf(ReadingScale.Bar), track.LastIndexOf(ReadingScale.Bar));

    [Theory]
    [InlineData(76)]
    [InlineData(96)]
    [InlineData(40)]
    public void The_marker_falls_inside_a_range_that_holds_the_value_and_outside_one_that_does_not(int width)
    {
        IReadOnlyList<string> lines = Scale().Render(width);
        (int at, int first, int last) = Positions(Track(lines[2], width));
        Assert.True(at >= first && at <= last, lines[2]);
        Assert.True(first < at && at < last, lines[2]);   // bar on both sides: the marker sits well inside
        Assert.Equal(ReadingScale.MarkerOnBar, Track(lines[2], width)[at]);
        (at, first, last) = Positions(Track(lines[3], width));
        Assert.True(at >= 0 && at < first, lines[3]);      // reading left of the higher range
        Assert.Equal(ReadingScale.Marker, Track(lines[3], width)[at]);
        (at, first, last) = Positions(Track(lines[4], width));
        Assert.True(at > last && last >= 0, lines[4]);     // reading right of the lower range
    }

    [Fact]
    public void The_marker_is_in_the_same_column_on_every_row()
    {
        IReadOnlyList<string> lines = Scale().Render(76);
        int[] columns = [.. lines.Skip(1).Select(l => l.IndexOfAny([ReadingScale.Marker, ReadingScale.MarkerOnBar], ReadingScale.NameWidth))];
        Assert.All(columns, c => Assert.Equal(columns[0], c));
        Assert.True(columns[0] > ReadingScale.NameWidth);
    }

    [Theory]
    // The verdict is on the number shown: a fitted 0.0092 prints as 0.009 and is in quartz's 0.009 (common practice);
    // 0.0096 prints as 0.010 and lies just outside.
    [InlineData(0.0092, ReadingScale.In)]
    [InlineData(0.0096, ReadingScale.Near)]
    [InlineData(0.0130, ReadingScale.Out)]
    public void The_verdict_is_on_the_value_as_printed(double birefringence, string expected)
    {
        var scale = new ReadingScale("birefringence", "0.000", birefringence, 0.001, ScaleModel.WidestBirefringence, [("quartz", new PropertyRange(0.009, 0.009))]);
        Assert.Equal(expected, scale.Verdict(new PropertyRange(0.009, 0.009)));
    }

    [Theory]
    [InlineData(76)]
    [InlineData(96)]
    [InlineData(40)]
    public void A_birefringence_worked_out_from_two_edges_is_in_the_range_it_equals(int width)
    {
        // Quartz, ω 1.544 and ε 1.553 (common practice): 1.553 − 1.544 is 0.009000000000000008 in binary arithmetic.
        var scale = new ReadingScale("birefringence", "0.000", 1.553 - 1.544, 0.001, ScaleModel.WidestBirefringence, [("quartz", new PropertyRange(0.009, 0.009))]);
        Assert.Equal(ReadingScale.In, scale.Verdict(new PropertyRange(0.009, 0.009)));
        Assert.Equal(ReadingScale.MarkerOnBar, Track(scale.Render(width)[2], width).Trim('.').Single());
    }

    [Fact]
    public void A_range_one_cell_wide_stays_visible_under_the_marker()
    {
        var scale = new ReadingScale("birefringence", "0.000", 0.0094, 0.001, ScaleModel.WidestBirefringence, [("point", new PropertyRange(0.009, 0.009))]);
        string track = Track(scale.Render(76)[2], 76);
        Assert.True(track.Contains(ReadingScale.MarkerOnBar) || (track.Contains(ReadingScale.Bar) && track.Contains(ReadingScale.Marker)), track);
    }

    [Fact]
    public void The_verdicts_say_in_near_and_out()
    {
        IReadOnlyList<string> lines = Scale().Render(76);
        Assert.EndsWith(" " + ReadingScale.In, lines[2]);
        Assert.EndsWith(" " + ReadingScale.Out, lines[3]);
        Assert.EndsWith(" " + ReadingScale.Near, lines[4]);   // 1.5425 is within 2 × 0.001 of 1.544
        Assert.EndsWith(" -", lines[5]);
        Assert.StartsWith("4 no range", lines[5]);
        Assert.DoesNotContain(ReadingScale.Bar, Track(lines[5], 76));
    }

    [Theory]
    [InlineData(76)]
    [InlineData(96)]
    public void Every_line_fits_the_width_and_the_reading_shows_its_uncertainty(int width)
    {
        IReadOnlyList<string> lines = Scale(u: 0.004).Render(width);
        Assert.All(lines, l => Assert.True(l.Length <= width, $"{l.Length}: {l}"));
        Assert.StartsWith("lowest index", lines[0]);
        Assert.Contains("1.544 ± 0.004", lines[1]);
        string reading = Track(lines[1], width);
        Assert.True(reading.IndexOf('<') < reading.IndexOf('*') && reading.IndexOf('*') < reading.IndexOf('>'), reading);
    }

    [Fact]
    public void A_range_wider_than_the_window_is_cut_and_marked_at_the_edges()
    {
        var scale = new ReadingScale("SG", "0.00", 2.65, 0.01, ScaleModel.WidestGravity,
            [("wide glass", new PropertyRange(1.0, 6.0)), ("far away", new PropertyRange(5.5, 5.6))]);
        IReadOnlyList<string> lines = scale.Render(76);
        string wide = Track(lines[2], 76), far = Track(lines[3], 76);
        Assert.Equal('<', wide[0]);
        Assert.Equal('>', wide[^1]);
        Assert.Equal('>', far[^1]);
        Assert.True(scale.Window().High - scale.Window().Low <= ScaleModel.WidestGravity + 1e-12);
    }

    [Fact]
    public void The_model_scales_index_birefringence_and_SG_of_a_quartz_like_stone()
    {
        var form = new BenchModel();
        // An invented quartz-like series (values from memory for quartz), as in BenchAssessorTests.
        foreach (var (rotation, high) in new[] { ("0", "1.553"), ("45", "1.551"), ("90", "1.548"), ("135", "1.551"), ("180", "1.553") })
            form.PutStep(form.Steps.Count, new StepText(rotation, "1.544", high));
        form.SetText(BenchFields.Sg, "2.65");
        BenchAssessment a = new BenchAssessor(new Identifier(TestMaterials.All)).Assess(form.Snapshot());
        var model = new ScaleModel(a);

        IReadOnlyList<ReadingScale> scales = model.Scales(3);
        Assert.Equal(["lowest index", "birefringence", "SG"], scales.Select(s => s.Title));
        Assert.Equal("quartz", scales[0].Candidates[0].Name);
        Assert.Equal(ReadingScale.In, scales[2].Verdict(scales[2].Candidates[0].Range));   // SG 2.65 in quartz's 2.65-2.66
        Assert.Equal(ReadingScale.Out, scales[2].Verdict(TestMaterials.All[1].SpecificGravity));   // not in spinel's 3.58-3.61
        Assert.Equal(3, model.CandidatesFor(20));   // 80x24: three scales of three candidates
        Assert.Equal(5, model.CandidatesFor(26));   // 100x30
        IReadOnlyList<string> screen = model.Lines(76, 20);
        Assert.True(screen.Count <= 20, string.Join('\n', screen));
        Assert.Equal(ScaleModel.Legend, screen[^1]);
    }

    [Theory]
    [InlineData(0.004, "0.00", "0.004")]     // an SG weighed to ±0.004 was shown "± 0.00"
    [InlineData(0.02, "0.00", "0.02")]
    [InlineData(0.0004, "0.000", "0.0004")]
    [InlineData(0.00004, "0.00", "0.0000")]  // two decimals more at most
    public void An_uncertainty_keeps_a_significant_digit_the_values_format_would_round_away(double u, string format, string shown) =>
        Assert.Equal(shown, ReadingScale.Uncertainty(u, format));

    [Fact]
    public void A_highest_index_fitted_above_the_liquid_draws_no_birefringence_scale()
    {
        // Invented readings of a strongly birefringent stone whose high edge rises above a 1.79 liquid at three of eight
        // steps: the fitted birefringence is a bound, not a reading, so only the lowest index is scaled.
        var form = new BenchModel();
        foreach (var (rotation, low, high) in new[] { ("0", "1.757", "1.762"), ("22.5", "1.757", "1.77"), ("45", "1.757", "1.782"), ("67.5", "1.757", ""),
                     ("90", "1.757", ""), ("112.5", "1.757", ""), ("135", "1.757", "1.785"), ("157.5", "1.757", "1.768") })
            form.PutStep(form.Steps.Count, new StepText(rotation, low, high));
        BenchAssessment a = new BenchAssessor(new Identifier(TestMaterials.All)).Assess(form.Snapshot());
        Assert.NotNull(a.Result!.Series!.Interpretations.MaxBy(i => i.Weight)!.AboveLiquidLimit);
        Assert.Equal(["lowest index"], new ScaleModel(a).Scales(3).Select(s => s.Title));
    }

    [Fact]
    public void A_spot_reading_is_scaled_against_each_candidates_whole_index_span()
    {
        var form = new BenchModel();
        form.SetText(BenchFields.Spot, "1.55");   // quartz reads 1.54-1.55 on a cabochon (common practice)
        BenchAssessment a = new BenchAssessor(new Identifier(TestMaterials.All)).Assess(form.Snapshot());
        IReadOnlyList<ReadingScale> scales = new ScaleModel(a).Scales(3);
        ReadingScale spot = Assert.Single(scales);
        Assert.Equal("spot reading", spot.Title);
        Assert.Equal(1.55, spot.Value);
        var quartz = spot.Candidates.Single(c => c.Name == "quartz");
        Assert.Equal(ReadingScale.In, spot.Verdict(quartz.Range));   // between ω 1.544 and ε 1.553
    }

    [Fact]
    public void The_scales_show_the_best_entry_of_each_species_first_under_its_rank_in_the_answer()
    {
        // Three quartz entries lead, spinel is fourth: a rival species' ranges say more than a third quartz variety's.
        Material quartz = TestMaterials.All[0], spinel = TestMaterials.All[1];
        RankedCandidate[] ranked =
        [
            new() { Material = quartz, Confidence = 0.4, Fit = 0.9 },
            new() { Material = quartz with { Name = "citrine" }, Confidence = 0.3, Fit = 0.9 },
            new() { Material = quartz with { Name = "amethyst" }, Confidence = 0.2, Fit = 0.9 },
            new() { Material = spinel, Confidence = 0.1, Fit = 0.5 },
        ];
        var result = new IdentificationResult { Id = "x", Candidates = ranked, NotInCatalogue = 0, NoGoodMatch = false, Warnings = [] };
        var a = new BenchAssessment { Version = 1, Errors = new Dictionary<string, string>(), Readings = new() { Sg = 2.65 }, Result = result,
            SpecificGravity = new SpecificGravity(2.65, 0.01) };
        ReadingScale sg = Assert.Single(new ScaleModel(a).Scales(3));
        Assert.Equal(["quartz", "spinel", "citrine"], sg.Candidates.Select(c => c.Name));
        Assert.Equal([1, 4, 2], Enumerable.Range(0, 3).Select(sg.Rank));
        Assert.Contains(sg.Render(76), l => l.StartsWith("4 spinel", StringComparison.Ordinal));
    }

    [Fact]
    public void The_scales_draw_only_candidates_the_answer_lists()
    {
        // Two quartz entries and a glass at 0.1 % are listed; a spinel at 0.04 % is not listed (LeadingCandidates.Listed), so not drawn.
        Material quartz = TestMaterials.All[0], spinel = TestMaterials.All[1], glass = TestMaterials.All[3];
        RankedCandidate[] ranked =
        [
            .. Enumerable.Range(1, 2).Select(k => new RankedCandidate { Material = quartz with { Name = $"quartz {k}" }, Confidence = 0.4995, Fit = 0.9 }),
            new() { Material = spinel, Confidence = 0.0004, Fit = 0.1 },
            new() { Material = glass, Confidence = 0.001, Fit = 0.1 },
        ];
        var result = new IdentificationResult { Id = "x", Candidates = ranked, NotInCatalogue = 0, NoGoodMatch = false, Warnings = [] };
        var a = new BenchAssessment { Version = 1, Errors = new Dictionary<string, string>(), Readings = new() { Sg = 2.65 }, Result = result,
            SpecificGravity = new SpecificGravity(2.65, 0.01) };
        ReadingScale sg = Assert.Single(new ScaleModel(a).Scales(5));
        Assert.DoesNotContain(sg.Candidates, c => c.Name == "spinel");
        Assert.Contains(sg.Candidates, c => c.Name == "glass");
    }

    [Fact]
    public void On_a_wide_screen_a_long_name_is_not_cut()
    {
        var scale = new ReadingScale("SG", "0.00", 4.0, 0.01, ScaleModel.WidestGravity, [("flame-fusion synthetic sapphire", new PropertyRange(3.98, 4.02))]);
        Assert.DoesNotContain(scale.Render(118), l => l.Contains('…'));          // 120 columns: the names get a third
        Assert.Contains(scale.Render(76), l => l.Contains('…'));                 // 80 columns: cut to keep the track
        Assert.Equal(ReadingScale.NameWidth, ReadingScale.NameWidthFor(76));
    }

    [Fact]
    public void A_scale_never_runs_below_zero()
    {
        // A birefringence of 0.001 against a range from 0 (an isotropic material's): no negative axis label.
        var scale = new ReadingScale("birefringence", "0.000", 0.001, 0.001, ScaleModel.WidestBirefringence, [("glass", new PropertyRange(0, 0))]);
        Assert.True(scale.Window().Low >= 0);
    }

    [Theory]
    // Natural opal's SG 1.25-2.25 with its usual part 1.98-2.25 (reference-db opal.json, opal-sg-span): a plastic's
    // 1.54 lies among the rare extremes, 2.10 in the usual part, 2.40 beyond the range.
    [InlineData(1.54, ReadingScale.Rare)]
    [InlineData(2.10, ReadingScale.In)]
    [InlineData(1.97, ReadingScale.In)]      // within two uncertainties of the usual part: no rare extreme, as the reasons say
    [InlineData(2.40, ReadingScale.Out)]
    public void A_range_with_a_usual_part_draws_its_rare_extremes_thin_and_names_a_reading_there(double sg, string expected)
    {
        var scale = new ReadingScale("SG", "0.00", sg, 0.01, ScaleModel.WidestGravity,
            [("white opal", new PropertyRange(1.25, 2.25)), ("flat range", new PropertyRange(1.25, 2.25))], null,
            [new PropertyRange(1.98, 2.25), null]);
        Assert.True(scale.HasUsualParts);
        IReadOnlyList<string> lines = scale.Render(76);
        Assert.EndsWith(" " + expected, lines[2]);
        Assert.EndsWith(" " + (expected == ReadingScale.Rare ? ReadingScale.In : expected), lines[3]);   // the same range without a usual part
        string opal = Track(lines[2], 76), flat = Track(lines[3], 76);
        // The rare extremes run from the range's lower end up to the usual part; the usual part is the bar.
        int firstRare = opal.IndexOf(ReadingScale.RareBar), lastRare = opal.LastIndexOf(ReadingScale.RareBar);
        int firstBar = opal.IndexOf(ReadingScale.Bar), lastBar = opal.LastIndexOf(ReadingScale.Bar);
        Assert.True(firstRare >= 0 && lastRare < firstBar && lastBar > firstBar, opal);
        Assert.Equal(flat.IndexOf(ReadingScale.Bar), firstRare);      // the whole range starts where the flat one does
        Assert.Equal(flat.LastIndexOf(ReadingScale.Bar), lastBar);   // and ends where it does (the usual part reaches 2.25)
        Assert.DoesNotContain(ReadingScale.RareBar, flat);
        if (expected == ReadingScale.Rare) Assert.Equal(ReadingScale.MarkerOnBar, opal[opal.IndexOfAny([ReadingScale.Marker, ReadingScale.MarkerOnBar])]);
    }

    [Fact]
    public void The_legend_explains_the_rare_extremes_only_when_a_scale_draws_them()
    {
        // The shipped catalogue's natural opal carries a usual part (opal-sg-span); a natural opal's spot 1.45 and SG 2.00
        // (values from memory) put one of its entries first among the species' shown on the scale.
        var form = new BenchModel();
        form.SetText(BenchFields.Spot, "1.45");
        form.SetText(BenchFields.Sg, "2.00");
        IReadOnlyList<Material> catalogue = GemIndex.Data.Catalogue.ShippedCatalogue.Families.Materials;
        BenchAssessment a = new BenchAssessor(new Identifier(catalogue)).Assess(form.Snapshot());
        IReadOnlyList<string> screen = new ScaleModel(a).Lines(76, 20);
        Assert.True(screen.Count <= 20, string.Join('\n', screen));
        ReadingScale sg = new ScaleModel(a).Scales(5).Single(s => s.Title == "SG");
        Assert.Equal(sg.HasUsualParts, screen[^1] == ScaleModel.RareLegend);
        Assert.True(sg.HasUsualParts, string.Join('\n', screen));   // an opal is among the candidates of such a stone
        Assert.All(screen, l => Assert.True(l.Length <= 76, l));
    }

    [Fact]
    public void Without_readings_the_model_says_what_it_needs()
    {
        var model = new ScaleModel(null);
        Assert.True(model.IsEmpty);
        Assert.Contains("F3", Assert.Single(model.Lines(76, 20)));
    }
}
