using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using GemIndex.Cli.TextUi.Bench;
using GemIndex.Cli.TextUi.Main;
using GemIndex.Core.Bench;
using GemIndex.Core.Magnification;

namespace GemIndex.Tests.TextUi.Bench;

public class LoupeModelTests
{
    /// <summary>The loupe page's width inside the form's frame (the form is as wide at every screen size).</summary>
    private const int PageWidth = MainWindow.FormWidth - 2;

    private static MagnificationFeatureInfo Info(MagnificationFeature f) => MagnificationVocabulary.Of(f);

    [Fact]
    public void A_new_sheet_has_every_feature_not_looked_for_and_gives_both_fields_empty()
    {
        var model = new LoupeModel();
        Assert.All(MagnificationVocabulary.All, f => Assert.Equal(FeatureState.NotLookedFor, model.State(f.Feature)));
        Assert.Equal("", model.PresentText);
        Assert.Equal("", model.AbsentText);
    }

    [Fact]
    public void A_mark_moves_a_feature_between_the_two_fields_and_a_repeat_changes_nothing()
    {
        var model = new LoupeModel();
        Assert.True(model.Set(MagnificationFeature.RoundGasBubbles, FeatureState.Present));
        Assert.False(model.Set(MagnificationFeature.RoundGasBubbles, FeatureState.Present));
        Assert.True(model.Set(MagnificationFeature.CurvedStriae, FeatureState.Present));
        Assert.True(model.Set(MagnificationFeature.NeedlesAndSilk, FeatureState.Absent));
        Assert.Equal("curved_striae round_bubbles", model.PresentText);   // the vocabulary's order, not the order marked
        Assert.Equal("needles_silk", model.AbsentText);

        Assert.True(model.Set(MagnificationFeature.RoundGasBubbles, FeatureState.Absent));   // seen, then looked at again: not there
        Assert.Equal("curved_striae", model.PresentText);
        Assert.Equal("round_bubbles needles_silk", model.AbsentText);
        Assert.Equal((1, 2), (model.Count(FeatureState.Present), model.Count(FeatureState.Absent)));

        Assert.True(model.Set(MagnificationFeature.CurvedStriae, FeatureState.NotLookedFor));
        Assert.Equal("", model.PresentText);
        Assert.Equal(FeatureState.NotLookedFor, model.State(MagnificationFeature.CurvedStriae));
    }

    [Fact]
    public void Undo_puts_back_each_mark_in_turn_and_a_stone_opened_forgets_them()
    {
        var model = new LoupeModel();
        model.Set(MagnificationFeature.RoundGasBubbles, FeatureState.Present);
        model.Set(MagnificationFeature.RoundGasBubbles, FeatureState.Absent);
        model.Set(MagnificationFeature.CurvedStriae, FeatureState.Present);
        Assert.Equal(MagnificationFeature.CurvedStriae, model.Undo());
        Assert.Equal(FeatureState.NotLookedFor, model.State(MagnificationFeature.CurvedStriae));
        Assert.Equal(MagnificationFeature.RoundGasBubbles, model.Undo());
        Assert.Equal(FeatureState.Present, model.State(MagnificationFeature.RoundGasBubbles));
        model.Load("needles_silk", "");
        Assert.Null(model.Undo());
        Assert.Equal("needles_silk", model.PresentText);
    }

    [Theory]
    [InlineData("curved_striae round_bubbles", "needles_silk crystals")]
    [InlineData("", "join_plane")]
    [InlineData("flux_residue metal_platelets", "")]
    [InlineData("", "")]
    public void Field_values_read_into_the_page_come_back_unchanged(string present, string absent)
    {
        var model = new LoupeModel();
        model.Load(present, absent);
        Assert.Equal(present, model.PresentText);
        Assert.Equal(absent, model.AbsentText);
    }

    [Fact]
    public void Words_as_another_front_end_wrote_them_are_read_and_written_back_in_the_vocabularys_form()
    {
        var model = new LoupeModel();
        model.Load("ROUND_BUBBLES;curved-striae, round_bubbles", "Needles_Silk");
        Assert.Equal(FeatureState.Present, model.State(MagnificationFeature.RoundGasBubbles));
        Assert.Equal(FeatureState.Present, model.State(MagnificationFeature.CurvedStriae));
        Assert.Equal(FeatureState.Absent, model.State(MagnificationFeature.NeedlesAndSilk));
        Assert.Equal("curved_striae round_bubbles", model.PresentText);
        Assert.Equal("needles_silk", model.AbsentText);
    }

    [Fact]
    public void A_word_outside_the_vocabulary_is_kept_so_that_nothing_stored_is_lost()
    {
        var model = new LoupeModel();
        model.Load("sparkles curved_striae", "");
        model.Set(MagnificationFeature.RoundGasBubbles, FeatureState.Present);
        Assert.Equal("curved_striae round_bubbles sparkles", model.PresentText);
        Assert.Single(BenchReader.Read(new BenchReadings().With(BenchField.FeaturesPresent, model.PresentText)).Errors);   // and still refused by the reader
    }

    [Fact]
    public void A_feature_stored_as_both_seen_and_not_seen_shows_as_seen_and_the_next_mark_writes_it_once()
    {
        var model = new LoupeModel();
        model.Load("round_bubbles", "round_bubbles crystals");
        Assert.Equal(FeatureState.Present, model.State(MagnificationFeature.RoundGasBubbles));
        model.Set(MagnificationFeature.JoinPlane, FeatureState.Absent);
        Assert.Equal("round_bubbles", model.PresentText);
        Assert.Equal("crystals join_plane", model.AbsentText);
    }

    private static readonly Arbitrary<FeatureState[]> AnyMarks =
        Gen.Elements(FeatureState.NotLookedFor, FeatureState.Present, FeatureState.Absent)
            .ArrayOf(MagnificationVocabulary.All.Count).ToArbitrary();

    /// <summary>Any marks: the two fields they give, read by Core's one reader, hold exactly those features; and read back, the same marks.</summary>
    [Property(MaxTest = 200)]
    public Property Any_marks_give_fields_that_the_reader_takes_as_the_same_features_and_that_read_back_as_the_same_marks() =>
        Prop.ForAll(AnyMarks, marks =>
        {
            var model = new LoupeModel();
            for (int i = 0; i < marks.Length; i++) model.Set(MagnificationVocabulary.All[i].Feature, marks[i]);
            var readings = new BenchReadings();
            if (model.PresentText.Length > 0) readings = readings.With(BenchField.FeaturesPresent, model.PresentText);
            if (model.AbsentText.Length > 0) readings = readings.With(BenchField.FeaturesAbsent, model.AbsentText);
            BenchReading read = BenchReader.Read(readings);
            var seen = MagnificationVocabulary.All.Where((_, i) => marks[i] == FeatureState.Present).Select(f => f.Feature).ToHashSet();
            var notSeen = MagnificationVocabulary.All.Where((_, i) => marks[i] == FeatureState.Absent).Select(f => f.Feature).ToHashSet();
            bool readerAgrees = read.Errors.Count == 0 && (seen.Count + notSeen.Count == 0
                ? read.Sheet.Magnification is null
                : read.Sheet.Magnification!.Present.SetEquals(seen) && read.Sheet.Magnification.Absent.SetEquals(notSeen));
            var again = new LoupeModel();
            again.Load(model.PresentText, model.AbsentText);
            bool sameMarks = MagnificationVocabulary.All.All(f => again.State(f.Feature) == model.State(f.Feature))
                && again.PresentText == model.PresentText && again.AbsentText == model.AbsentText;
            return (readerAgrees && sameMarks).Label($"present '{model.PresentText}' absent '{model.AbsentText}'");
        });

    [Fact]
    public void Unfiltered_every_feature_is_listed_once_under_its_groups_heading()
    {
        var model = new LoupeModel();
        Assert.Equal(MagnificationVocabulary.All.Select(f => f.Feature), model.Rows.Where(r => !r.IsHeading).Select(r => r.Feature!.Feature));
        Assert.Equal(["GROWTH", "INCLUSIONS", "SIGNS OF TREATMENT", "SIGNS OF A COMPOSITE STONE", "ORGANIC STRUCTURE", "OPTICS (through the stone)", "PHENOMENA (by eye)"],
            model.Rows.Where(r => r.IsHeading).Select(model.Line));
        Assert.All(model.Rows.Where(r => !r.IsHeading), r => Assert.Equal(r.Group, r.Feature!.Group));
        Assert.Equal(1, model.FirstFeatureRow);
    }

    [Fact]
    public void On_an_opaque_stone_a_feature_seen_only_through_it_says_so_on_its_rule()
    {
        // Common practice: on an opaque stone the loupe finds only what shows on the surface (colour banding, dye, a join),
        // not inclusions nor the doubling of facet edges, which are seen through the stone.
        var model = new LoupeModel { Opaque = true };
        LoupeRow Row(MagnificationFeature f) => model.Rows.Single(r => r.Feature?.Feature == f);
        Assert.Contains(LoupeModel.NotOnAnOpaqueStone, model.Rule(Row(MagnificationFeature.RoundGasBubbles), 60));
        Assert.Contains(LoupeModel.NotOnAnOpaqueStone, model.Rule(Row(MagnificationFeature.FacetDoubling), 60));
        Assert.DoesNotContain(LoupeModel.NotOnAnOpaqueStone, model.Rule(Row(MagnificationFeature.DyeInFractures), 60));
        Assert.True(model.Rule(Row(MagnificationFeature.RoundGasBubbles), 38).TrimEnd('─').Length < 38, "the words fit the 80-column page's left half");
        model.Opaque = false;
        Assert.DoesNotContain(LoupeModel.NotOnAnOpaqueStone, model.Rule(Row(MagnificationFeature.RoundGasBubbles), 60));
    }

    [Fact]
    public void Typing_narrows_the_list_to_features_whose_name_or_description_holds_every_word()
    {
        var model = new LoupeModel();
        model.SetFilter("gas bub");
        string[] shown = [.. model.Rows.Where(r => !r.IsHeading).Select(r => r.Feature!.Name)];
        Assert.Contains("round gas bubbles", shown);
        Assert.Contains("elongated gas bubbles", shown);
        Assert.Contains("fluid or multi-phase inclusions", shown);   // "liquid and a gas bubble" in what to look for
        Assert.DoesNotContain("curved striae", shown);
        Assert.All(model.Rows.Select((r, i) => (r, i)).Where(p => p.r.IsHeading),
            p => Assert.False(p.i + 1 == model.Rows.Count || model.Rows[p.i + 1].IsHeading, "a heading with no feature under it"));
        Assert.Contains("swirl marks", shown);                       // "gas bubbles strung along them" in what to look for
        Assert.Equal("GROWTH", model.Line(model.Rows[0]));
    }

    [Fact]
    public void Typing_puts_the_cursor_on_a_feature_the_words_name_before_one_that_only_mentions_them()
    {
        var model = new LoupeModel();
        const MagnificationFeature zoning = MagnificationFeature.AngularGrowthZoning;
        model.SetFilter("crystal");
        // The cursor was on angular zoning (its description mentions crystals): it goes to crystal inclusions.
        Assert.Equal("crystal inclusions", model.Rows[model.RowAfterFilter(zoning)].Feature!.Name);
        // On a feature the words name, it stays.
        int named = model.RowAfterFilter(null);
        Assert.Equal(named, model.RowAfterFilter(model.Rows[named].Feature!.Feature));
    }

    [Theory]
    [InlineData("nail-head", "nail-head spicules")]
    [InlineData("NAIL HEAD", "nail-head spicules")]
    [InlineData("color banding", "colour banding")]
    [InlineData("record", "curved striae")]        // what to look for: "like the grooves of a record"
    [InlineData("doublet", "join plane")]          // its meaning: "assembled stone: doublet or triplet"
    [InlineData("flux_residue", "flux residue")]   // the batch word
    public void A_feature_is_found_by_its_word_name_or_description_in_either_spelling(string typed, string name)
    {
        var model = new LoupeModel();
        model.SetFilter(typed);
        Assert.Contains(model.Rows, r => r.Feature?.Name == name);
    }

    [Fact]
    public void A_filter_that_matches_nothing_leaves_no_row_and_says_so()
    {
        var model = new LoupeModel();
        model.SetFilter("zzz");
        Assert.Empty(model.Rows);
        Assert.Equal(-1, model.FirstFeatureRow);
        Assert.Equal(-1, model.Settle(0, 0));
        Assert.StartsWith("── nothing matches 'zzz' ─", model.Rule(null, PageWidth));
        string find = model.FindLine(PageWidth);
        Assert.StartsWith("Find: zzz_ ", find);
        Assert.EndsWith($" 0 of {GemIndex.Core.Magnification.MagnificationVocabulary.All.Count}", find);
        Assert.Equal(PageWidth, find.Length);
    }

    [Fact]
    public void The_cursor_passes_over_a_heading_in_the_direction_it_moves()
    {
        var model = new LoupeModel();
        int inclusions = model.Rows.ToList().FindIndex(r => r.IsHeading && r.Group == FeatureGroup.Inclusion);
        Assert.Equal(inclusions + 1, model.Settle(inclusions, inclusions - 1));   // down from the last growth feature
        Assert.Equal(inclusions - 1, model.Settle(inclusions, inclusions + 1));   // up from the first inclusion
        Assert.Equal(1, model.Settle(0, 1));                                      // up (or Home) onto the first heading
        Assert.Equal(model.Rows.Count - 1, model.Settle(model.Rows.Count + 5, 0)); // past the end
    }

    [Fact]
    public void Every_row_fits_the_page_whole_and_no_two_rows_read_the_same()
    {
        var model = new LoupeModel();
        foreach (FeatureState state in Enum.GetValues<FeatureState>())
        {
            foreach (var f in MagnificationVocabulary.All) model.Set(f.Feature, state);
            string[] lines = [.. model.Rows.Select(model.Line)];
            Assert.All(lines, l => Assert.True(l.Length <= PageWidth, $"'{l}' is wider than {PageWidth}"));
            Assert.Equal(lines.Length, lines.Distinct().Count());
            Assert.All(model.Rows.Where(r => !r.IsHeading), r => Assert.Contains(r.Feature!.Name, model.Line(r)));
        }
    }

    [Fact]
    public void A_row_shows_its_state_by_a_mark_and_the_rule_names_it_in_words()
    {
        var model = new LoupeModel();
        LoupeRow striae = model.Rows[model.RowOf(MagnificationFeature.CurvedStriae)];
        Assert.Equal("     curved striae", model.Line(striae));
        Assert.StartsWith("── not looked for ─", model.Rule(striae, PageWidth));
        model.Set(MagnificationFeature.CurvedStriae, FeatureState.Present);
        Assert.Equal(" yes curved striae", model.Line(striae));
        Assert.StartsWith("── seen ─", model.Rule(striae, PageWidth));
        model.Set(MagnificationFeature.CurvedStriae, FeatureState.Absent);
        Assert.Equal(" no  curved striae", model.Line(striae));
        Assert.StartsWith("── looked for, not seen ─", model.Rule(striae, PageWidth));
        Assert.Equal(PageWidth, model.Rule(striae, PageWidth).Length);
        string find = model.FindLine(PageWidth);
        Assert.StartsWith("Type to find a feature ", find);
        Assert.EndsWith(" 1 not seen", find);
    }

    [Fact]
    public void The_description_gives_what_to_look_for_and_the_lighting_wrapped_whole_words()
    {
        MagnificationFeatureInfo bubbles = Info(MagnificationFeature.RoundGasBubbles);
        IReadOnlyList<string> lines = LoupeModel.Description(bubbles, PageWidth, meaning: false);
        string joined = string.Join(" ", lines.Select(l => l.Trim()));
        Assert.Equal($"Look for: {bubbles.LookFor} Lighting: {bubbles.Lighting}", joined);
        Assert.All(lines, l => Assert.True(l.Length <= PageWidth));
        Assert.Contains("Meaning: ", string.Join(" ", LoupeModel.Description(bubbles, PageWidth, meaning: true)));
    }

    [Theory]
    [InlineData(24, false)]   // 80x24: the frame holds 20 rows
    [InlineData(40, true)]    // 120x40: 36 rows
    public void The_page_gives_the_list_its_rows_and_the_description_room_for_its_longest_entry(int screenRows, bool meaning)
    {
        var model = new LoupeModel();
        int height = screenRows - 4;   // the page bar, the key line and the frame's two borders
        (int list, int description, bool withMeaning) = model.Layout(PageWidth, height);
        Assert.Equal(meaning, withMeaning);
        Assert.True(list >= LoupeModel.MinimumListRows);
        Assert.Equal(height, list + description + LoupeModel.FixedRows);
        Assert.All(MagnificationVocabulary.All, f => Assert.True(LoupeModel.Description(f, PageWidth, meaning).Count <= description, f.Name));
    }
}
