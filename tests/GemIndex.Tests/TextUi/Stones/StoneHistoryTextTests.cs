using GemIndex.Cli.TextUi.Stones;
using GemIndex.Data.Workbook;

namespace GemIndex.Tests.TextUi.Stones;

public class StoneHistoryTextTests
{
    private static readonly DateTimeOffset At = new(2026, 3, 1, 9, 5, 0, TimeSpan.Zero);

    [Fact]
    public void Each_field_change_is_one_line_in_words_with_its_time()
    {
        IReadOnlyList<string> lines = StoneHistoryText.Lines("lot 7",
        [
            new StoneEdit(At, "created", "", "lot 7"),
            new StoneEdit(At, "notes", "", "clean"),
            new StoneEdit(At.AddMinutes(1), "colour", "blu", "blue"),
            new StoneEdit(At.AddMinutes(2), "weight_ct", "1.2", ""),
        ]);
        Assert.Equal("History of 'lot 7' (4 changes, times in UTC)", lines[0]);
        Assert.Equal("2026-03-01 09:05:00  stone created as 'lot 7'", lines[2]);
        Assert.Equal("2026-03-01 09:05:00  Notes set to 'clean'", lines[3]);
        Assert.Equal("2026-03-01 09:06:00  Colour changed from 'blu' to 'blue'", lines[4]);
        Assert.Equal("2026-03-01 09:07:00  Weight (ct) cleared (was '1.20')", lines[5]);
    }

    [Fact]
    public void The_transparency_is_told_once_by_its_description_not_again_as_the_reading_taken_from_it()
    {
        IReadOnlyList<string> lines = StoneHistoryText.Lines("lot 7",
        [
            new StoneEdit(At, "transparency", "", "transparent"),
            new StoneEdit(At, "readings.transparency", "", "\"transparent\""),
            new StoneEdit(At.AddMinutes(1), "readings", """{"id":"a"}""", """{"id":"a","transparency":"opaque","colour":"blue"}"""),
        ]);
        Assert.Equal(["2026-03-01 09:05:00  Transparency set to 'transparent'", "2026-03-01 09:06:00  Colour set to 'blue'"], lines.Skip(2));
        Assert.Equal("History of 'lot 7' (1 change, times in UTC)", StoneHistoryText.Lines("lot 7", [new StoneEdit(At, "notes", "", "clean")])[0]);
    }

    [Fact]
    public void Readings_kept_as_JSON_are_told_field_by_field_and_the_JSON_is_never_shown()
    {
        const string before = """{"id":"b","refractometer":{"method":"facet","readings":[{"rotation_deg":0,"low":1.544,"high":1.553}]},"sg":2.65}""";
        const string after = """{"id":"blue","refractometer":{"method":"facet","readings":[{"rotation_deg":0,"low":1.544,"high":1.552}]},"sg":2.66,"polariscope":"doubly_refractive"}""";
        string[] said = [.. StoneHistoryText.Describe(new StoneEdit(At, "readings", before, after))];
        string[] expected =
        [
            "RI step 1 (0°) high edge changed from '1.553' to '1.552'",
            "SG changed from '2.65' to '2.66'",
            "Polariscope set to 'doubly refractive'",
        ];
        Assert.Equal(expected.Order(StringComparer.Ordinal), said.Order(StringComparer.Ordinal));
        Assert.DoesNotContain(said, s => s.Contains('{') || s.Contains('"'));
    }

    [Fact]
    public void An_index_stored_as_a_number_is_told_to_the_thousandth_as_read()
    {
        // 1.770 is stored as the number 1.77; the history shows it as it was read.
        const string before = """{"id":"b","refractometer":{"method":"facet","readings":[{"rotation_deg":0,"low":1.762}]}}""";
        const string after = """{"id":"b","refractometer":{"method":"facet","readings":[{"rotation_deg":0,"low":1.762,"high":1.77}]}}""";
        Assert.Equal(["RI step 1 (0°) high edge set to '1.770'"], StoneHistoryText.Describe(new StoneEdit(At, "readings", before, after)));
    }

    [Fact]
    public void An_SG_a_spot_reading_and_weights_stored_as_numbers_are_told_to_the_places_they_are_read_to()
    {
        // An SG of 4.00 is stored as 4, a spot of 1.61 as 1.61, weights in carats as 1.67: told as typed (SG and spot to
        // the hundredth, weights to the thousandth of a carat).
        const string before = """{"id":"b"}""";
        const string typed = """{"id":"b","refractometer":{"method":"spot","spot":1.61},"sg":4}""";
        const string weighed = """{"id":"b","sg":{"air_ct":1.67,"water_ct":1.17}}""";
        string[] said = [.. StoneHistoryText.Describe(new StoneEdit(At, "readings", before, typed))];
        Assert.Contains("SG set to '4.00'", said);
        Assert.Contains("RI spot reading set to '1.61'", said);
        Assert.Contains("SG weight in air (ct) set to '1.670'", StoneHistoryText.Describe(new StoneEdit(At, "readings", before, weighed)));
    }

    [Fact]
    public void Magnification_features_are_told_by_their_names_as_seen_or_looked_for_and_not_seen()
    {
        const string before = """{"id":"b","sg":4.0}""";
        const string after = """{"id":"b","sg":4.0,"magnification":{"present":["curved_striae","round_bubbles"],"absent":["needles_silk"]}}""";
        string[] said = [.. StoneHistoryText.Describe(new StoneEdit(At, "readings", before, after))];
        string[] expected =
        [
            "Features seen under magnification set to 'curved striae, round gas bubbles'",
            "Features looked for and not seen set to 'needles and silk'",
        ];
        Assert.Equal(expected.Order(StringComparer.Ordinal), said.Order(StringComparer.Ordinal));
    }

    [Fact]
    public void Readings_stored_one_field_each_are_named_without_the_store_prefix_or_JSON_quotes()
    {
        Assert.Equal(["Colour set to 'blue'"], StoneHistoryText.Describe(new StoneEdit(At, "readings.colour", "", "\"blue\"")));
        Assert.Equal(["Polariscope changed from 'singly refractive' to 'doubly refractive'"],
            StoneHistoryText.Describe(new StoneEdit(At, "readings.polariscope", "\"singly_refractive\"", "\"doubly_refractive\"")));
        Assert.Equal(["SG set to '4.00'"], StoneHistoryText.Describe(new StoneEdit(At, "readings.sg", "", "4")));
        // The stone's weight to the hundredth of a carat, as the balance gives it (2.30, not 2.3).
        Assert.Equal(["Weight (ct) set to '2.30'"], StoneHistoryText.Describe(new StoneEdit(At, "weight_ct", "", "2.3")));
        Assert.Equal(["Features seen under magnification set to 'curved striae'"],
            StoneHistoryText.Describe(new StoneEdit(At, "readings.magnification", "", """{"present":["curved_striae"]}""")));
        Assert.Equal(["Notes set to '\"as found\"'"], StoneHistoryText.Describe(new StoneEdit(At, "notes", "", "\"as found\"")));   // a note is text, never JSON
    }

    [Fact]
    public void A_field_path_from_the_store_is_named_in_words()
    {
        Assert.Equal(["RI step 2 low edge set to '1.762'"], StoneHistoryText.Describe(new StoneEdit(At, "refractometer.readings[1].low", "", "1.762")));
        Assert.Equal(["SG weight in water (ct) changed from '1.100' to '1.200'"], StoneHistoryText.Describe(new StoneEdit(At, "sg.water_ct", "1.1", "1.2")));
    }

    [Fact]
    public void A_step_removed_from_the_middle_of_a_series_is_one_line_naming_it_and_the_later_steps_are_not_told_as_edited()
    {
        // Invented peridot-like series (handbook values from memory): removing the 60° step had read as three steps
        // edited and the last one cleared, since the later steps moved up one place.
        const string before = """{"method":"facet","readings":[{"rotation_deg":0,"low":1.654,"high":1.69},{"rotation_deg":30,"low":1.656,"high":1.689},{"rotation_deg":60,"low":1.664,"high":1.681},{"rotation_deg":90,"low":1.662,"high":1.684}]}""";
        const string after = """{"method":"facet","readings":[{"rotation_deg":0,"low":1.654,"high":1.69},{"rotation_deg":30,"low":1.656,"high":1.689},{"rotation_deg":90,"low":1.662,"high":1.684}]}""";
        Assert.Equal(["RI step 3 (60°) removed (was 1.664 / 1.681)"], StoneHistoryText.Describe(new StoneEdit(At, "readings.refractometer", before, after)));
        Assert.Equal(["RI step 3 (60°) added: 1.664 / 1.681"], StoneHistoryText.Describe(new StoneEdit(At, "readings.refractometer", after, before)));
        // A step edited beside a removal elsewhere is still told as edited, named where it now stands.
        const string edited = """{"method":"facet","readings":[{"rotation_deg":0,"low":1.654,"high":1.69},{"rotation_deg":90,"low":1.662,"high":1.685}]}""";
        Assert.Equal(["RI step 2 (90°) high edge changed from '1.684' to '1.685'", "RI step 2 (30°) removed (was 1.656 / 1.689)"],
            StoneHistoryText.Describe(new StoneEdit(At, "readings.refractometer", after, edited)));
        // Within the whole readings, and the first series typed in.
        string whole = $$"""{"id":"p","refractometer":{{after}},"sg":3.34}""";
        Assert.Equal(["RI step 1 (0°) added: 1.654 / 1.690", "RI step 2 (30°) added: 1.656 / 1.689", "RI step 3 (90°) added: 1.662 / 1.684", "RI method set to 'facet'"],
            StoneHistoryText.Describe(new StoneEdit(At, "readings.refractometer", "", after)));
        Assert.Equal(["SG changed from '3.34' to '3.35'"], StoneHistoryText.Describe(new StoneEdit(At, "readings", whole, whole.Replace("3.34", "3.35"))));
    }
}
