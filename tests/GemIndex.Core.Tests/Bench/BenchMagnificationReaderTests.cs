using GemIndex.Core.Bench;
using GemIndex.Core.Magnification;

namespace GemIndex.Core.Tests.Bench;

public class BenchMagnificationReaderTests
{
    private static BenchReadings R(params (string Field, string Value)[] values) =>
        values.Aggregate(new BenchReadings(), (r, v) => r.With(v.Field, v.Value));

    [Fact]
    public void Nothing_looked_for_gives_no_observation()
    {
        var reading = BenchReader.Read(R((BenchField.Sg, "3.99")));
        Assert.Empty(reading.Errors);
        Assert.Null(reading.Sheet.Magnification);
    }

    [Fact]
    public void Words_separated_like_absorption_lines_are_read_into_seen_and_not_seen()
    {
        // A flame-fusion ruby as handbooks describe it: curved striae and round bubbles, no silk (common practice).
        var reading = BenchReader.Read(R((BenchField.FeaturesPresent, "curved_striae, Round-Bubbles;round_bubbles"), (BenchField.FeaturesAbsent, "needles_silk")));
        Assert.Empty(reading.Errors);
        var observation = reading.Sheet.Magnification!;
        Assert.Equal(new HashSet<MagnificationFeature> { MagnificationFeature.CurvedStriae, MagnificationFeature.RoundGasBubbles }, observation.Present);
        Assert.Equal(new HashSet<MagnificationFeature> { MagnificationFeature.NeedlesAndSilk }, observation.Absent);
    }

    [Fact]
    public void A_faceted_stone_counts_the_star_and_the_cats_eye_as_not_seen()
    {
        // A star or cat's-eye glides over a domed top and never shows on facets (common practice).
        var reading = BenchReader.Read(R((BenchField.Cut, "faceted"), (BenchField.FeaturesAbsent, "needles_silk asterism")));
        Assert.Empty(reading.Errors);
        Assert.Equal(Core.Observations.StoneCut.Faceted, reading.Sheet.Cut);
        Assert.Equal(new HashSet<MagnificationFeature> { MagnificationFeature.NeedlesAndSilk, MagnificationFeature.Asterism, MagnificationFeature.Chatoyancy },
            reading.Sheet.Magnification!.Absent);
        Assert.Empty(reading.Sheet.Magnification.Present);
        Assert.False(reading.Sheet.Magnification.OnlyWhatTheCutSays);   // the silk was looked for
        // Alone, the cut is an observation of its own.
        MagnificationObservation alone = BenchReader.Read(R((BenchField.Cut, "faceted"))).Sheet.Magnification!;
        Assert.Equal(MagnificationVocabulary.DomedPhenomena.ToHashSet(), alone.Absent);
        Assert.True(alone.OnlyWhatTheCutSays);
    }

    [Theory]
    [InlineData("cabochon")]
    [InlineData("other")]
    public void A_cabochon_or_another_cut_says_nothing_on_its_own(string cut)
    {
        var reading = BenchReader.Read(R((BenchField.Cut, cut), (BenchField.Sg, "3.99")));
        Assert.Empty(reading.Errors);
        Assert.NotNull(reading.Sheet.Cut);
        Assert.Null(reading.Sheet.Magnification);
    }

    [Fact]
    public void A_star_seen_on_a_faceted_stone_is_an_error_at_the_cut_and_the_sighting_is_kept()
    {
        var reading = BenchReader.Read(R((BenchField.Cut, "faceted"), (BenchField.FeaturesPresent, "asterism curved_striae")));
        var error = Assert.Single(reading.Errors);
        Assert.Equal(BenchField.Cut, error.Field);
        Assert.Contains("never shows on facets", error.Sentence);
        Assert.Contains(BenchField.FeaturesPresent, error.Sentence);
        Assert.Null(reading.Sheet.Cut);
        Assert.Contains(MagnificationFeature.Asterism, reading.Sheet.Magnification!.Present);
        Assert.Empty(reading.Sheet.Magnification.Absent);
    }

    [Fact]
    public void A_star_on_a_faceted_stone_is_found_beside_a_bad_feature_word_in_one_pass()
    {
        var reading = BenchReader.Read(R((BenchField.Cut, "faceted"), (BenchField.FeaturesPresent, "asterism sparkles")));
        Assert.Equal([BenchField.Cut, BenchField.FeaturesPresent], reading.Errors.Select(e => e.Field).Order().ToArray());
    }

    [Fact]
    public void The_cuts_implied_absences_are_no_look_taken_by_hand()
    {
        MagnificationObservation alone = BenchReader.Read(R((BenchField.Cut, "faceted"))).Sheet.Magnification!;
        Assert.False(alone.AnyLooked);
        Assert.Equal(alone.Absent, alone.ImpliedByCut);
        Assert.True(BenchReader.Read(R((BenchField.Cut, "faceted"))).IsEmpty);   // a cut alone is nothing to rank by
        // A star typed as looked for on a faceted stone is a look; the cat's-eye stays implied.
        MagnificationObservation typed = BenchReader.Read(R((BenchField.Cut, "faceted"), (BenchField.FeaturesAbsent, "asterism"))).Sheet.Magnification!;
        Assert.True(typed.AnyLooked);
        Assert.Equal(new HashSet<MagnificationFeature> { MagnificationFeature.Chatoyancy }, typed.ImpliedByCut);
        // The fit leaves the implied looks out: a profile that holds the star fits the cut alone fully.
        var star = MagnificationProfile.ForOrigin(Core.Catalogue.OriginClass.Natural);
        Assert.Equal(1.0, MagnificationEvidence.Fit(alone, star), 12);
    }

    [Fact]
    public void An_unknown_cut_names_the_allowed_words()
    {
        var error = Assert.Single(BenchReader.Read(R((BenchField.Cut, "brilliant"))).Errors);
        Assert.Equal(BenchField.Cut, error.Field);
        Assert.Contains("faceted", error.Allowed);
        Assert.Contains("cabochon", error.Allowed);
    }

    [Fact]
    public void Only_absent_features_are_an_observation_too()
    {
        var observation = BenchReader.Read(R((BenchField.FeaturesAbsent, "curved_striae"))).Sheet.Magnification!;
        Assert.Empty(observation.Present);
        Assert.Single(observation.Absent);
    }

    [Fact]
    public void An_unknown_word_names_the_field_the_word_and_every_allowed_word()
    {
        var reading = BenchReader.Read(R((BenchField.FeaturesPresent, "curved_striae sparkles")));
        var error = Assert.Single(reading.Errors);
        Assert.Equal(BenchField.FeaturesPresent, error.Field);
        Assert.Equal("sparkles", error.Value);
        Assert.Contains("curved_striae", error.Allowed);
        Assert.Contains("'sparkles' is not a magnification feature", error.Sentence);
        Assert.All(MagnificationVocabulary.Words, w => Assert.Contains(w, error.Allowed));
        Assert.Null(reading.Sheet.Magnification);
    }

    [Fact]
    public void A_misspelt_feature_is_told_the_word_it_was_likely_meant_to_be()
    {
        var error = Assert.Single(BenchReader.Read(R((BenchField.FeaturesPresent, "crystal"))).Errors);
        Assert.Contains("did you mean crystals?", error.Sentence);
    }

    [Fact]
    public void A_word_both_seen_and_not_seen_is_an_error()
    {
        var reading = BenchReader.Read(R((BenchField.FeaturesPresent, "flux_residue"), (BenchField.FeaturesAbsent, "Flux_Residue curved_striae")));
        var error = Assert.Single(reading.Errors);
        Assert.Equal(BenchField.FeaturesAbsent, error.Field);
        Assert.Contains("flux_residue", error.Sentence);
        Assert.Null(reading.Sheet.Magnification);
    }

    [Fact]
    public void An_empty_field_is_an_error()
    {
        var error = Assert.Single(BenchReader.Read(R((BenchField.FeaturesAbsent, "  "))).Errors);
        Assert.Equal(BenchField.FeaturesAbsent, error.Field);
    }
}
