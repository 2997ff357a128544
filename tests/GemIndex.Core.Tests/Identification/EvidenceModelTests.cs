using GemIndex.Core.Catalogue;
using GemIndex.Core.Gravity;
using GemIndex.Core.Identification;
using GemIndex.Core.Observations;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Core.Readings;

namespace GemIndex.Core.Tests.Identification;

/// <summary>The evidence models of docs/ranking.md §2–3, on small catalogues invented for each test.</summary>
public class EvidenceModelTests
{
    private static Material Entry(string name, string species, OpticalIndices indices, PropertyRange? birefringence = null, OpticSign sign = OpticSign.None,
        MaterialForm forms = MaterialForm.Crystal, OriginClass origin = OriginClass.Natural, BenchFrequency frequency = BenchFrequency.Common,
        IReadOnlyList<string>? colours = null, bool opaque = false, IReadOnlyList<AbsorptionLine>? lines = null) => new()
    {
        Name = name, Species = species, Variety = name, Origin = origin, CrystalSystem = CrystalSystem.Trigonal, Indices = indices,
        Birefringence = birefringence, Sign = sign, SpecificGravity = new(2.60, 2.66), Forms = forms, Frequency = frequency,
        SpeciesFrequency = BenchFrequency.Common, Colours = colours ?? [], IsOpaque = opaque, AbsorptionLines = lines ?? [],
    };

    // Quartz ω 1.544, ε 1.553 (Handbook of Mineralogy, from memory).
    private static readonly OpticalIndices QuartzIndices = OpticalIndices.Uniaxial(new(1.543, 1.545), new(1.552, 1.554));

    private static RefractometerObservation QuartzSeries() => new(RefractometerMethod.Facet,
        [new(0, 1.544, 1.553), new(45, 1.544, 1.551), new(90, 1.544, 1.548), new(135, 1.544, 1.550)]);

    [Fact]
    public void A_strongly_birefringent_aggregate_is_read_at_the_ends_of_its_span_on_the_spot()
    {
        // Coral: calcite grains, ε 1.486 and ω 1.658 (common practice: the spot blinks between them). A reading at either end
        // is far likelier than one in the middle; a narrow aggregate (nephrite-like, 1.60–1.63) keeps the uniform span.
        var coral = Entry("coral", "coral", OpticalIndices.SingleIndex(new(1.486, 1.658), OpticCharacter.Aggregate), forms: MaterialForm.Aggregate);
        var narrow = Entry("narrow", "narrow", OpticalIndices.SingleIndex(new(1.600, 1.630), OpticCharacter.Aggregate), forms: MaterialForm.Aggregate);
        double Log(Material m, double spot) => EvidenceLikelihood.Evaluate(m, new AnalysedSheet(new BenchSheet
        {
            Refractometer = new RefractometerObservation(RefractometerMethod.Spot, spot: spot),
        })).LogLikelihood;
        Assert.True(Log(coral, 1.49) > Log(coral, 1.57) + 2, $"low end {Log(coral, 1.49)} against the middle {Log(coral, 1.57)}");
        Assert.True(Log(coral, 1.65) > Log(coral, 1.57) + 2, $"high end {Log(coral, 1.65)} against the middle {Log(coral, 1.57)}");
        Assert.Equal(Log(narrow, 1.605), Log(narrow, 1.625), 6);
    }

    [Fact]
    public void A_colour_reason_names_the_first_colours_and_counts_the_rest()
    {
        // An invented catch-all of ten colours: the reason names six, most usual first, and counts four more.
        string[] colours = ["green", "blue", "red", "yellow", "brown", "black", "white", "pink", "orange", "purple"];
        var many = Entry("many", "many", QuartzIndices, colours: colours);
        var reasons = EvidenceLikelihood.Evaluate(many, new AnalysedSheet(new BenchSheet { Colour = "green" }), explain: true).Contributions;
        Assert.Contains(reasons, r => r.Text == "colour green; green, blue, red, yellow, brown, black and 4 more usual, most usual first");
        // A colour of the reading's beyond the six is named after the count.
        var purple = EvidenceLikelihood.Evaluate(many, new AnalysedSheet(new BenchSheet { Colour = "purple" }), explain: true).Contributions;
        Assert.Contains(purple, r => r.Text == "colour purple; green, blue, red, yellow, brown, black and 4 more (purple among them) usual, most usual first");
    }

    [Fact]
    public void A_faceted_cut_weighs_against_a_material_met_only_as_an_aggregate_and_nothing_else()
    {
        // Massive rhodonite against transparent rhodonite and a glass (invented entries of one index range): a faceted
        // stone costs the aggregate-only entry ln 0.1 (AggregateFaceted), a cabochon costs nothing, and the fit stays.
        var indices = OpticalIndices.SingleIndex(new(1.71, 1.75), OpticCharacter.Aggregate);
        var massive = Entry("massive", "rhodonite", indices, forms: MaterialForm.Aggregate);
        var both = Entry("either", "rhodonite", indices, forms: MaterialForm.Aggregate | MaterialForm.Crystal);
        var crystal = Entry("crystal", "spinel", OpticalIndices.SingleIndex(new(1.71, 1.75), OpticCharacter.Isotropic));
        CandidateEvaluation Weigh(Material m, StoneCut? cut) =>
            EvidenceLikelihood.Evaluate(m, new AnalysedSheet(new BenchSheet { SpecificGravity = new SpecificGravity(2.63, 0.01), Cut = cut }), explain: true);
        Assert.Equal(Math.Log(EvidenceLikelihood.AggregateFaceted), Weigh(massive, StoneCut.Faceted).LogLikelihood - Weigh(massive, null).LogLikelihood, 9);
        Assert.Equal(Weigh(massive, null).LogLikelihood, Weigh(massive, StoneCut.Cabochon).LogLikelihood, 9);
        Assert.Equal(Weigh(massive, null).Fit, Weigh(massive, StoneCut.Faceted).Fit, 9);
        foreach (Material m in new[] { both, crystal })
            Assert.Equal(Weigh(m, null).LogLikelihood, Weigh(m, StoneCut.Faceted).LogLikelihood, 9);
        Assert.Contains(Weigh(massive, StoneCut.Faceted).Contributions, c => c.Text.StartsWith("cut faceted", StringComparison.Ordinal) && !c.Agrees);
        Assert.DoesNotContain(Weigh(crystal, StoneCut.Faceted).Contributions, c => c.Text.StartsWith("cut faceted", StringComparison.Ordinal));
    }

    [Fact]
    public void A_blinking_aggregate_whose_high_end_is_above_the_liquid_can_give_no_spot_edge_at_all()
    {
        // Smithsonite-like grains, ε 1.62 and ω 1.85 (from memory; ω above a 1.80 liquid): the spot is read at the high end, so lost,
        // about as often as at either end (BlinkEndShare). A narrow aggregate whose whole span lies below the liquid cannot
        // give "over the limit" with no edge: its probability is the robust mixture's floor only.
        var grains = Entry("grains", "grains", OpticalIndices.SingleIndex(new(1.62, 1.85), OpticCharacter.Aggregate), forms: MaterialForm.Aggregate);
        var narrow = Entry("narrow", "narrow", OpticalIndices.SingleIndex(new(1.600, 1.630), OpticCharacter.Aggregate), forms: MaterialForm.Aggregate);
        var sheet = new AnalysedSheet(new BenchSheet
        {
            Refractometer = new RefractometerObservation(RefractometerMethod.Spot, overLimit: true, liquidLimit: 1.80),
        });
        var blinking = EvidenceLikelihood.Evaluate(grains, sheet);
        // ln of the share read at the high end, over the broad "over the limit" density, mixed with the misreading share.
        double expected = Math.Log((1 - BroadDensities.MisreadingShare) * (RefractometerEvidence.BlinkEndShare
            + (1 - 2 * RefractometerEvidence.BlinkEndShare) * 0.05 / 0.23) / BroadDensities.OverLimit + BroadDensities.MisreadingShare);
        Assert.Equal(expected, blinking.LogLikelihood - blinking.LogLikelihoodNotInCatalogue, 1);
        Assert.True(blinking.Fit > 0.5, $"fit {blinking.Fit}");
        var flat = EvidenceLikelihood.Evaluate(narrow, sheet);
        Assert.True(blinking.LogLikelihood > flat.LogLikelihood + 3, $"{blinking.LogLikelihood} against {flat.LogLikelihood}");
    }

    [Fact]
    public void A_sharp_two_edge_series_is_strong_evidence_against_a_material_met_only_as_an_aggregate()
    {
        var crystal = Entry("rock crystal", "quartz", QuartzIndices, new(0.009, 0.009), OpticSign.Positive);
        var aggregate = Entry("quartzite", "quartzite", QuartzIndices, new(0.009, 0.009), OpticSign.Positive, forms: MaterialForm.Aggregate);
        var result = new Identifier([crystal, aggregate]).Identify(new BenchSheet { Refractometer = QuartzSeries() });
        Assert.Equal("rock crystal", result.Candidates[0].Material.Name);
        Assert.True(result.Candidates[0].Confidence > 0.9, $"{result.Candidates[0].Confidence:0.00}");
    }

    [Fact]
    public void A_sharp_single_edge_held_round_the_stone_weighs_ten_times_more_against_a_blinking_aggregate()
    {
        // Common practice: coral's calcite grains (1.486–1.658) make the edge blink; a narrow aggregate (1.510–1.520) can
        // give a flat-polished sharp edge now and then (docs/ranking.md §1, form term).
        var coral = Entry("coral", "coral", OpticalIndices.SingleIndex(new(1.486, 1.658), OpticCharacter.Aggregate), forms: MaterialForm.Aggregate);
        var narrow = Entry("narrow", "narrow", OpticalIndices.SingleIndex(new(1.510, 1.520), OpticCharacter.Aggregate), forms: MaterialForm.Aggregate);
        var series = new RefractometerObservation(RefractometerMethod.Facet, [new(0, 1.515), new(45, 1.515), new(90, 1.515), new(135, 1.515)]);
        var seriesObservation = new SeriesObservation(series.Steps, 0.001, 0, 1.79);
        Assert.Equal(RefractometerEvidence.BlinkingAggregateShowsSharpSeries, RefractometerEvidence.FormFactor(coral, seriesObservation));
        Assert.Equal(RefractometerEvidence.AggregateShowsSharpSeries, RefractometerEvidence.FormFactor(narrow, seriesObservation));
        var reasons = new Identifier([coral, narrow]).Identify(new BenchSheet { Refractometer = series }).Candidates.Single(c => c.Material.Name == "coral").Reasons;
        Assert.Contains(reasons, r => r.Text.Contains("whose grains make the edge blink", StringComparison.Ordinal));
    }

    [Fact]
    public void A_spot_reading_fits_a_crystal_and_an_aggregate_alike()
    {
        var crystal = Entry("rock crystal", "quartz", QuartzIndices, new(0.009, 0.009), OpticSign.Positive);
        var aggregate = Entry("quartzite", "quartzite", QuartzIndices, new(0.009, 0.009), OpticSign.Positive, forms: MaterialForm.Aggregate);
        var sheet = new BenchSheet { Refractometer = new RefractometerObservation(RefractometerMethod.Spot, spot: 1.55) };
        var result = new Identifier([crystal, aggregate]).Identify(sheet);
        Assert.Equal(result.Candidates[0].Confidence, result.Candidates[1].Confidence, 6);
    }

    [Fact]
    public void A_written_polariscope_or_dichroscope_reading_says_light_passed_and_counts_once_against_an_opaque_material()
    {
        // Common practice: both instruments need light through the stone. The weight is log2 of the rule's share.
        var opaque = Entry("opaque stone", "opaque", OpticalIndices.SingleIndex(new(1.60, 1.62)), opaque: true);
        var engine = new Identifier([opaque, Entry("clear stone", "clear", OpticalIndices.SingleIndex(new(1.60, 1.62)))]);
        double expected = Math.Log2(EvidenceLikelihood.OpaqueReadingShare);
        IReadOnlyList<EvidenceContribution> Reasons(BenchSheet sheet) => engine.Identify(sheet).Candidates.Single(c => c.Material.Name == "opaque stone").Reasons;
        double Weight(IReadOnlyList<EvidenceContribution> reasons, string test) => reasons.Single(r => r.Test == test).WeightBits;

        var polariscopeOnly = Reasons(new BenchSheet { Polariscope = PolariscopeReaction.SinglyRefractive });
        var dichroscopeOnly = Reasons(new BenchSheet { Pleochroism = PleochroismObservation.None });
        var both = Reasons(new BenchSheet { Polariscope = PolariscopeReaction.SinglyRefractive, Pleochroism = PleochroismObservation.None });
        string polariscope = polariscopeOnly.Single().Test, dichroscope = dichroscopeOnly.Single().Test;
        Assert.Equal(expected, Weight(polariscopeOnly, polariscope), 9);
        Assert.Equal(expected, Weight(dichroscopeOnly, dichroscope), 9);
        Assert.Equal(expected, Weight(both, polariscope), 9);
        Assert.Equal(0, Weight(both, dichroscope), 9);
    }

    [Fact]
    public void What_an_opaque_material_shows_in_the_polariscope_or_the_dichroscope_neither_supports_nor_weakens_it()
    {
        var opaque = Entry("opaque stone", "opaque", OpticalIndices.SingleIndex(new(1.60, 1.62)), opaque: true);
        var clear = Entry("clear stone", "clear", OpticalIndices.SingleIndex(new(1.60, 1.62)));
        var engine = new Identifier([opaque, clear]);
        var without = engine.Identify(new BenchSheet { SpecificGravity = new SpecificGravity(2.63, 0.01) });
        var with = engine.Identify(new BenchSheet
        {
            SpecificGravity = new SpecificGravity(2.63, 0.01), Polariscope = PolariscopeReaction.DoublyRefractive, Pleochroism = PleochroismObservation.Dichroic,
        });
        double Share(IdentificationResult r) => r.Candidates.Single(c => c.Material.Name == "opaque stone").Confidence;
        // The clear singly refractive stone is weakened by a doubly refractive reaction and two colours; the opaque one is not.
        Assert.True(Share(with) > Share(without));
        var reasons = engine.Identify(new BenchSheet { Polariscope = PolariscopeReaction.Aggregate });
        Assert.Contains(reasons.Candidates.Single(c => c.Material.Name == "opaque stone").Reasons, r => r.Text.Contains("opaque", StringComparison.Ordinal));
    }

    [Fact]
    public void On_a_stone_read_opaque_stays_dark_one_colour_and_no_fire_are_not_weighed_and_what_needs_light_through_it_is()
    {
        // Common practice: an opaque stone stays dark between crossed polarisers, shows one colour in the dichroscope and no
        // fire whatever it is, so those readings cannot tell an opaque material from a clear one; two colours can.
        var opaque = Entry("opaque stone", "opaque", OpticalIndices.SingleIndex(new(1.60, 1.62)), opaque: true);
        var clear = Entry("clear stone", "clear", OpticalIndices.SingleIndex(new(1.60, 1.62)));
        var engine = new Identifier([opaque, clear]);
        var spot = new RefractometerObservation(RefractometerMethod.Spot, spot: 1.61);
        var nothingElse = engine.Identify(new BenchSheet { Refractometer = spot, Transparency = StoneTransparency.Opaque });
        var dark = engine.Identify(new BenchSheet
        {
            Refractometer = spot, Transparency = StoneTransparency.Opaque, Polariscope = PolariscopeReaction.SinglyRefractive,
            Pleochroism = PleochroismObservation.None, Dispersion = DispersionObservation.ByEye(DispersionStrength.None),
        });
        double Share(IdentificationResult r, string name) => r.Candidates.Single(c => c.Material.Name == name).Confidence;
        Assert.Equal(Share(nothingElse, "opaque stone"), Share(dark, "opaque stone"), 12);
        Assert.Contains(dark.Warnings, w => w.StartsWith("Opaque stone: the polariscope's 'stays dark', the dichroscope's one colour and no fire are what any opaque stone shows", StringComparison.Ordinal));
        // The same readings on a stone not called opaque are weighed: "stays dark" favours the clear singly refractive stone.
        var notCalledOpaque = engine.Identify(new BenchSheet { Refractometer = spot, Polariscope = PolariscopeReaction.SinglyRefractive });
        Assert.True(Share(notCalledOpaque, "clear stone") > Share(nothingElse, "clear stone") + 0.2);
        // Two colours on a stone called opaque need light through it: weighed as read, and warned of.
        var twoColours = engine.Identify(new BenchSheet { Refractometer = spot, Transparency = StoneTransparency.Opaque, Pleochroism = PleochroismObservation.Dichroic });
        Assert.NotEqual(Share(nothingElse, "opaque stone"), Share(twoColours, "opaque stone"), 3);
        Assert.Contains(twoColours.Warnings, w => w.StartsWith("Opaque stone, yet the dichroscope (dichroic) was read", StringComparison.Ordinal));
    }

    [Fact]
    public void The_prior_sits_on_the_species_so_many_entries_give_it_no_extra_mass()
    {
        // Two species with identical data: one has three entries (origins), the other one.
        var entries = new[]
        {
            Entry("natural a", "alpha", QuartzIndices, new(0.009, 0.009), OpticSign.Positive),
            Entry("synthetic a", "alpha", QuartzIndices, new(0.009, 0.009), OpticSign.Positive, origin: OriginClass.Synthetic),
            Entry("treated a", "alpha", QuartzIndices, new(0.009, 0.009), OpticSign.Positive, origin: OriginClass.Treated),
            Entry("b", "beta", QuartzIndices, new(0.009, 0.009), OpticSign.Positive),
        };
        var result = new Identifier(entries).Identify(new BenchSheet { Refractometer = QuartzSeries() });
        Assert.Equal(result.Species[0].Confidence, result.Species[1].Confidence, 9);
        // Candidates follow species order: every entry of the first species before the second species.
        var order = result.Candidates.Select(c => c.Material.Species).ToList();
        Assert.Equal(order.Distinct().Count(), order.Select((s, i) => i == 0 || s != order[i - 1]).Count(x => x));
        Assert.Contains(result.Warnings, w => w.Contains("cannot be separated by these tests", StringComparison.Ordinal));
    }

    [Fact]
    public void An_unknown_colour_word_gives_a_warning_and_no_evidence()
    {
        var blue = Entry("blue stone", "blue", QuartzIndices, new(0.009, 0.009), OpticSign.Positive, colours: ["blue"]);
        var red = Entry("red stone", "red", QuartzIndices, new(0.009, 0.009), OpticSign.Positive, colours: ["red"]);
        var engine = new Identifier([blue, red]);
        var unknown = engine.Identify(new BenchSheet { Refractometer = QuartzSeries(), Colour = "zorbish" });
        Assert.Equal(unknown.Candidates[0].Confidence, unknown.Candidates[1].Confidence, 9);
        Assert.Contains(unknown.Warnings, w => w.Contains("'zorbish' not known", StringComparison.Ordinal));
        var seen = engine.Identify(new BenchSheet { Refractometer = QuartzSeries(), Colour = "light blue" });
        Assert.Equal("blue stone", seen.Candidates[0].Material.Name);
        Assert.DoesNotContain(seen.Warnings, w => w.Contains("not known", StringComparison.Ordinal));
    }

    [Fact]
    public void The_first_listed_colour_is_likelier_than_the_second_and_a_neighbour_than_an_unrelated_hue()
    {
        IReadOnlyList<string> listed = ["blue", "green"];
        double first = ColourWords.Probability(new HashSet<string> { "blue" }, listed);
        double second = ColourWords.Probability(new HashSet<string> { "green" }, listed);
        double neighbour = ColourWords.Probability(new HashSet<string> { "purple" }, listed);
        double unrelated = ColourWords.Probability(new HashSet<string> { "orange" }, listed);
        Assert.True(first > second && second > neighbour && neighbour > unrelated);
        // A probability over the known hues: the shares add up to one (ListedShare + NeighbourShare + the floor).
        Assert.Equal(1, ColourWords.KnownHues.Sum(h => ColourWords.Probability(new HashSet<string> { h }, listed)), 9);
    }

    [Theory]
    // Common practice in describing colour: the last hue named is the colour, an "-ish" or "-y" word only its tone;
    // a hyphenated pair names both; "with" and "and" join colours that are both there.
    [InlineData("bluish green", "green")]
    [InlineData("yellowish green", "green")]
    [InlineData("greenish yellow", "yellow")]
    [InlineData("golden yellow", "yellow")]
    [InlineData("orangy red", "red")]
    [InlineData("purplish red", "red")]
    [InlineData("blue-green", "blue green")]
    [InlineData("yellowish-green", "green")]
    [InlineData("pink with black veins", "pink black")]
    [InlineData("green and red", "green red")]
    [InlineData("bluish", "blue")]
    [InlineData("light blue", "blue")]
    [InlineData("sky blue", "blue")]
    [InlineData("apple green", "green")]
    [InlineData("zorbish", "")]
    [InlineData("green, mottled", "green")]          // how the colour lies, not which
    [InlineData("near colourless", "colourless")]
    [InlineData("cream", "yellow")]                  // a yellowish white, as pearls and ivory are described (common practice)
    public void A_colour_description_names_its_last_hue_and_a_tint_only_tones_it(string description, string expected)
    {
        Assert.Equal(expected.Split(' ', StringSplitOptions.RemoveEmptyEntries), ColourWords.PrincipalHues(description).ToArray());
    }

    [Theory]
    [InlineData("green, mottled")]
    [InlineData("white, pinkish overtone")]
    [InlineData("near colourless")]
    [InlineData("cream")]
    public void Bench_descriptions_of_how_a_colour_lies_are_no_unknown_words(string description) =>
        Assert.Empty(ColourWords.UnknownWords(description));

    [Fact]
    public void A_tint_in_an_entrys_colours_does_not_list_that_hue()
    {
        // An emerald's "yellowish green" is a green: a yellow stone must favour the yellow variety of the same species.
        var green = Entry("green variety", "s", QuartzIndices, colours: ["green", "yellowish green"], frequency: BenchFrequency.VeryCommon);
        var yellow = Entry("yellow variety", "s", QuartzIndices, colours: ["yellow", "greenish yellow"]);
        var result = new Identifier([green, yellow]).Identify(new BenchSheet { Colour = "yellow" });
        Assert.Equal("yellow variety", result.Candidates[0].Material.Name);
        Assert.Equal(["green"], new MaterialProfile(green, null, null).ColourHues);
        // "orangy" is a colour word of the trade: no "not known" warning.
        Assert.DoesNotContain(new Identifier([green]).Identify(new BenchSheet { Colour = "orangy red" }).Warnings,
            w => w.Contains("not known", StringComparison.Ordinal));
    }

    [Fact]
    public void A_hue_the_species_shows_is_less_unlikely_for_an_entry_that_does_not_list_it_than_a_hue_the_species_never_shows()
    {
        // The mixture of docs/ranking.md §2 (colour): (1 − SpeciesShare)·P(own list) + SpeciesShare·P(species' list).
        var green = Entry("green entry", "s", QuartzIndices, colours: ["green"]);
        var pink = Entry("pink entry", "s", QuartzIndices, colours: ["pink", "green"]);
        IReadOnlyList<string> species = MaterialProfile.SpeciesHueList([green, pink]);
        Assert.Equal(["green", "pink"], species); // listed by both entries first
        IReadOnlyList<string> own = ["green"];
        double pinkSeen = ColourWords.EntryProbability(["pink"], own, species);
        double orangeSeen = ColourWords.EntryProbability(["orange"], own, species);
        double expected = (1 - ColourWords.SpeciesShare) * ColourWords.Probability(["pink"], own) + ColourWords.SpeciesShare * ColourWords.Probability(["pink"], species);
        Assert.Equal(expected, pinkSeen, 12);
        Assert.True(pinkSeen > 5 * ColourWords.Probability(["pink"], own));
        Assert.True(pinkSeen > orangeSeen);
        // Still a probability over the known hues, and an entry that is its species' only one is unchanged.
        Assert.Equal(1, ColourWords.KnownHues.Sum(h => ColourWords.EntryProbability([h], own, species)), 9);
        Assert.Equal(ColourWords.Probability(["pink"], own), ColourWords.EntryProbability(["pink"], own, own), 12);
    }

    [Fact]
    public void A_variety_named_by_its_colour_takes_neither_its_species_colours_nor_its_hues_neighbours()
    {
        // Common practice of the trade: emerald is green beryl, so a beryl called blue is never an emerald of an odd colour;
        // an entry the trade names by its colour keeps its own list and the floor every hue has (docs/ranking.md §2, colour).
        var loose = Entry("loose", "s", QuartzIndices, colours: ["green"]);
        var named = loose with { Name = "named", NamedByColour = true };
        var blue = Entry("blue entry", "s", QuartzIndices, colours: ["blue"]);
        IReadOnlyList<string> species = MaterialProfile.SpeciesHueList([loose, named, blue]);
        double floor = (1 - ColourWords.ListedShare) * ColourWords.BroadProbability;
        Assert.Equal(floor, ColourWords.EntryProbability(["blue"], ["green"], species, namedByColour: true), 12);
        Assert.Equal(ColourWords.ListedShare + floor, ColourWords.EntryProbability(["green"], ["green"], species, namedByColour: true), 12);
        Assert.Equal(1, ColourWords.KnownHues.Sum(h => ColourWords.EntryProbability([h], ["green"], species, namedByColour: true)), 9);
        // Alike but for the mark, so their shares differ by the colour test alone (tempered, Identifier.Temperature).
        var result = new Identifier([loose, named, blue]).Identify(new BenchSheet { Colour = "blue" });
        double looseShare = result.Candidates.Single(c => c.Material.Name == "loose").Confidence;
        double namedShare = result.Candidates.Single(c => c.Material.Name == "named").Confidence;
        double ratio = ColourWords.EntryProbability(["blue"], ["green"], species) / floor;
        Assert.Equal(Math.Pow(ratio, 1 / Identifier.Temperature), looseShare / namedShare, 6);
        Assert.True(ratio > 5);
    }

    [Theory]
    [InlineData("sky blue", "")]
    [InlineData("royal blue", "")]
    [InlineData("light zorbish green", "zorbish")]
    public void Trade_names_of_a_shade_are_no_unknown_colour_words(string description, string unknown)
    {
        Assert.Equal(unknown.Split(' ', StringSplitOptions.RemoveEmptyEntries), ColourWords.UnknownWords(description));
    }

    [Theory]
    [InlineData(2.65, "lies in 2.64–2.66")]
    [InlineData(2.63, "lies 0.01 below 2.64–2.66 (1σ, within the reading's uncertainty)")]
    [InlineData(2.70, "lies 0.04 above 2.64–2.66 (4σ)")]
    [InlineData(3.52, "lies 0.86 above 2.64–2.66 (over 10σ)")]
    public void A_reading_just_outside_a_range_is_said_to_lie_within_its_uncertainty(double sg, string expected)
    {
        // Quartz SG 2.64–2.66 (from memory), read to ± 0.01.
        Assert.Equal(expected, EvidenceLikelihood.Where(sg, new PropertyRange(2.64, 2.66), 0.01, "0.00"));
    }

    [Fact]
    public void A_range_narrower_than_the_shown_decimals_reads_as_one_number()
    {
        // Silica glass SG 2.200–2.203 (the catalogue's entry, from memory) shown to two decimals: a display check.
        Assert.Equal("2.20", new PropertyRange(2.2, 2.203).ToString("0.00"));
        Assert.Equal("2.200–2.203", new PropertyRange(2.2, 2.203).ToString("0.000"));
        Assert.Equal("lies 0.10 below 2.20 (over 10σ)", EvidenceLikelihood.Where(2.1, new PropertyRange(2.2, 2.203), 0.01, "0.00"));
    }

    [Fact]
    public void A_strong_listed_line_not_seen_costs_far_more_than_a_weak_one()
    {
        // By the model's own numbers: missing a strong line costs ln(1 − 0.95), a weak one ln(1 − 0.3).
        double strong = AbsorptionLines.LogLikelihood([new(594, LineStrength.Strong)], [], out _, out int missedStrong);
        double weak = AbsorptionLines.LogLikelihood([new(594, LineStrength.Weak)], [], out _, out _);
        Assert.Equal(1, missedStrong);
        Assert.Equal(Math.Log(0.05) - Math.Log(0.7), strong - weak, 9);
    }

    [Fact]
    public void A_seen_line_is_scored_by_its_distance_to_the_listed_line_with_a_two_nanometre_sigma()
    {
        // A line seen 2 nm from the listed one against 6 nm: ln ratio = (6² − 2²)/(2·2²) = 4 (the Gaussian of §2).
        double near = AbsorptionLines.LogLikelihood([new(594)], [596], out int unexplainedNear, out _);
        double far = AbsorptionLines.LogLikelihood([new(594)], [600], out _, out _);
        Assert.Equal(0, unexplainedNear);
        Assert.Equal(4, near - far, 9);
        // Beyond 4σ the line is no longer paired: it counts as a stray line and the listed one as missed.
        AbsorptionLines.LogLikelihood([new(594)], [603], out int unexplainedFar, out _);
        Assert.Equal(1, unexplainedFar);
    }

    [Fact]
    public void Listed_lines_within_the_resolution_read_as_one_line_and_one_seen_line_stands_for_both()
    {
        // Ruby's chromium doublet, 694.2 and 692.8 nm (1.4 nm apart, closer than a hand spectroscope's ~2 nm; from
        // memory), is written as one line "694": the unpaired 692.8 is not a missed strong line.
        AbsorptionLine[] doublet = [new(694.2, LineStrength.Strong), new(692.8, LineStrength.Strong)];
        double one = AbsorptionLines.LogLikelihood(doublet, [694], out int unexplained, out int missedStrong);
        Assert.Equal(0, unexplained);
        Assert.Equal(0, missedStrong);
        Assert.Equal(AbsorptionLines.LogLikelihood([doublet[0]], [694], out _, out _), one, 12);
        // Seeing neither misses one line, the group, with its strongest member's chance; a good instrument's two lines
        // still both pair.
        double none = AbsorptionLines.LogLikelihood(doublet, [], out _, out int missedBoth);
        Assert.Equal(1, missedBoth);
        Assert.Equal(AbsorptionLines.LogLikelihood([doublet[0]], [], out _, out _), none, 12);
        AbsorptionLines.LogLikelihood(doublet, [694.2, 692.8], out int unexplainedTwo, out _);
        Assert.Equal(0, unexplainedTwo);
        // Emerald's 683 and 680 nm (3 nm apart; from memory) are resolved: one seen, the other missed.
        AbsorptionLines.LogLikelihood([new(683, LineStrength.Strong), new(680, LineStrength.Strong)], [683], out _, out int missedEmerald);
        Assert.Equal(1, missedEmerald);
    }

    [Fact]
    public void The_spectroscope_outcomes_treat_a_doublet_as_one_line_and_sum_to_one()
    {
        AbsorptionLine[] ruby = [new(694.2, LineStrength.Strong), new(692.8, LineStrength.Strong), new(668, LineStrength.Weak)];
        var outcomes = AbsorptionLines.Outcomes(ruby).ToList();
        Assert.Equal(4, outcomes.Count);
        Assert.Equal(1, outcomes.Sum(o => o.Probability), 12);
        // Nothing seen: the doublet missed as one strong line (0.05) and the weak line missed (0.7), by the model's numbers.
        Assert.Equal(0.05 * 0.7, outcomes[0].Probability, 12);
    }

    [Fact]
    public void A_pair_of_lines_within_the_resolution_not_seen_costs_what_one_line_not_seen_costs()
    {
        // Ruby's blue lines 476.5 and 475 nm (moderate, from memory) show as one line: missing it costs ln(1 − 0.7), not
        // twice that; a red corundum with the chromium doublet alone and its blue lines unseen then ranks the ruby entry
        // above the pink sapphire entry that lists no blue lines (invented entries with the catalogue's lines and shares;
        // counting the pair as two chances put pink sapphire first).
        AbsorptionLine[] blue = [new(476.5, LineStrength.Moderate), new(475, LineStrength.Moderate)];
        Assert.Equal(Math.Log(1 - AbsorptionLines.Detection(LineStrength.Moderate)) - AbsorptionLines.SpuriousLineRate,
            AbsorptionLines.LogLikelihood(blue, [], out _, out _), 12);
        AbsorptionLine[] chromium = [new(694.2, LineStrength.Strong), new(692.8, LineStrength.Strong)];
        var indices = OpticalIndices.Uniaxial(new(1.767, 1.772), new(1.759, 1.763));
        var ruby = Entry("ruby", "corundum", indices, new(0.008, 0.009), OpticSign.Negative, colours: ["red"], lines: [.. chromium, .. blue],
            frequency: BenchFrequency.VeryCommon);   // as the catalogue's heated ruby against its pink sapphire (common)
        AbsorptionLine[] pinkLines = [new(694.2, LineStrength.Moderate), new(692.8, LineStrength.Moderate)];
        var pink = Entry("pink sapphire", "corundum", indices, new(0.008, 0.009), OpticSign.Negative, colours: ["pink"], lines: pinkLines);
        var result = new Identifier([ruby, pink]).Identify(new BenchSheet { AbsorptionLinesNanometres = [694], Colour = "red" });
        Assert.True(result.Candidates[0].Material.Name == "ruby", string.Join("; ", result.Candidates.Select(c => $"{c.Material.Name} {c.Confidence:0.000} "
            + string.Join(", ", c.Reasons.Select(r => $"{r.Test} {r.WeightBits:0.00}")))));
    }

    [Fact]
    public void A_usual_sg_part_weighs_a_reading_among_the_rare_extremes_lower_but_never_as_a_misfit()
    {
        // Opal: SG 1.25-2.23, usually about 2.15 (GIA Gem Reference Guide 1995, as quoted in the catalogue's opal-sg-span):
        // an invented entry with that range, with and without its usual part (1.98-2.25 in the catalogue).
        var whole = Entry("opal", "opal", OpticalIndices.SingleIndex(new(1.37, 1.47), OpticCharacter.Amorphous), forms: MaterialForm.Amorphous)
            with { SpecificGravity = new(1.25, 2.25) };
        var usual = whole with { SpecificGravityUsual = new(1.98, 2.25) };
        CandidateEvaluation Weigh(Material m, double sg) =>
            EvidenceLikelihood.Evaluate(m, new AnalysedSheet(new BenchSheet { SpecificGravity = new(sg, 0.01) }));
        // Inside the usual part the density is (1 - r)/1.98-2.25's width + r/the whole width, far above the flat whole range's.
        Assert.True(Weigh(usual, 2.15).LogLikelihood > Weigh(whole, 2.15).LogLikelihood + 1);
        // Among the extremes it is r times the whole range's: ln 0.1 = -2.3 below, as the share says.
        double drop = Weigh(usual, 1.60).LogLikelihood - Weigh(whole, 1.60).LogLikelihood;
        Assert.InRange(drop, Math.Log(UsualPart.RareShare) - 0.01, Math.Log(UsualPart.RareShare) + 0.05); // the 2 % misreading share lifts it a little
        // Neither is a misfit: the fit's tail is the whole range's.
        Assert.Equal(Weigh(whole, 1.60).Fit, Weigh(usual, 1.60).Fit, 12);
    }

    [Fact]
    public void A_variety_of_the_leading_species_that_fits_keeps_nothing_fits_away()
    {
        // Beryl's indices and density rise with its alkali content, so a chromium emerald may read beyond the emerald entries:
        // emerald 1.565-1.599 with origin (vincenzotaormina.net, 'What is the RI of Emerald?'), beryl's ω to 1.600
        // (Laboratoire Francais de Gemmologie, Gemstone library: Beryl), emerald's SG 2.67-2.78 (Amezin, Emerald) against
        // the species' 2.63-2.92 (Wikipedia's Beryl infobox): the catalogue's beryl-span, emerald-sg-span references.
        // Invented entries in that shape: the lines and the colour favour the emerald entry, which cannot give a stone that
        // sinks in a 2.85 liquid, while a green beryl entry of the same species, listing no lines, fits every reading. The
        // species is beryl either way; before the species counted, the emerald's misfit alone called it "nothing fits".
        var emerald = Entry("emerald", "beryl", OpticalIndices.Uniaxial(new(1.570, 1.599), new(1.565, 1.592)), new(0.005, 0.007),
            OpticSign.Negative, colours: ["green"], lines: [new(683, LineStrength.Strong), new(680, LineStrength.Strong), new(637, LineStrength.Moderate)],
            frequency: BenchFrequency.VeryCommon) with { SpecificGravity = new(2.67, 2.78) };
        var greenBeryl = Entry("green beryl", "beryl", OpticalIndices.Uniaxial(new(1.570, 1.602), new(1.565, 1.595)), new(0.004, 0.008),
            OpticSign.Negative, colours: ["green", "yellow", "blue", "pink", "colourless"], frequency: BenchFrequency.VeryRare)
            with { SpecificGravity = new(2.63, 2.92) };
        var other = Entry("other", "other", OpticalIndices.SingleIndex(new(1.715, 1.720)), colours: ["green"]);
        var sheet = new BenchSheet
        {
            Refractometer = new RefractometerObservation(RefractometerMethod.Facet,
                [new(0, 1.596, 1.600), new(22.5, 1.594, 1.598), new(45, 1.594, 1.598), new(67.5, 1.594, 1.599), new(90, 1.595, 1.598),
                 new(112.5, 1.597, 1.599), new(135, 1.598), new(157.5, 1.597, 1.599)]),
            HeavyLiquids = [HeavyLiquidResult.Of(3.05, HeavyLiquidOutcome.Floats), HeavyLiquidResult.Of(2.85, HeavyLiquidOutcome.Sinks)],
            AbsorptionLinesNanometres = [680, 683],
            Colour = "green",
        };
        var result = new Identifier([emerald, greenBeryl, other]).Identify(sheet);
        var fits = string.Join("; ", result.Candidates.Select(c => $"{c.Material.Name} {c.Confidence:0.000} fit {c.Fit:0.000}"));
        Assert.True(result.Candidates[0].Material.Name == "emerald" && result.Candidates[0].Fit < Identifier.MinimumFit, fits);
        Assert.True(result.Candidates[1].Confidence < Identifier.SeriousCandidate * result.Candidates[0].Confidence
            && result.Candidates[1].Fit >= Identifier.MinimumFit, fits);
        Assert.False(result.NoGoodMatch, fits);
        Assert.Equal("beryl", result.Species[0].Species);
    }

    [Fact]
    public void A_high_edge_hidden_above_the_liquid_at_some_steps_is_censored_evidence_not_a_misfit()
    {
        // An invented uniaxial + material, ω 1.770, ε 1.797: with a 1.79 liquid the high edge shows only where it is below
        // about 1.787. Steps written with a low edge alone near the limit must not make the stone "nothing fits".
        var high = Entry("high", "high", OpticalIndices.Uniaxial(new(1.769, 1.771), new(1.796, 1.798)), new(0.026, 0.028), OpticSign.Positive);
        var single = Entry("single", "single", OpticalIndices.SingleIndex(new(1.765, 1.775)));
        var sheet = new BenchSheet
        {
            Refractometer = new RefractometerObservation(RefractometerMethod.Facet,
                [new(0, 1.770, 1.781), new(45, 1.770, 1.786), new(90, 1.770), new(135, 1.770, 1.785)], overLimit: true),
        };
        var result = new Identifier([high, single]).Identify(sheet);
        Assert.Equal("high", result.Candidates[0].Material.Name);
        Assert.False(result.NoGoodMatch);
    }

    [Fact]
    public void A_line_seen_on_a_coloured_entry_that_lists_none_is_likelier_than_a_stray_on_a_colourless_or_listed_one()
    {
        // Most entries carry no spectrum in the catalogue at all (docs/ranking.md §2): on a coloured one a line seen may be
        // its own, unlisted; a colourless entry has no chromophore, and an entry with listed lines has its known ones.
        Material Entry(string[] colours, AbsorptionLine[] lines) => new()
        {
            Name = "e", Species = "e", Variety = "e", Origin = OriginClass.Natural, CrystalSystem = CrystalSystem.Cubic,
            Indices = OpticalIndices.SingleIndex(new(1.50, 1.52), OpticCharacter.Isotropic), SpecificGravity = new(2.5, 2.6),
            Colours = colours, AbsorptionLines = lines,
        };
        Assert.Equal(AbsorptionLines.NoLinesListedRate, AbsorptionLines.UnexplainedLineRate(Entry(["green"], []), ["green"]));
        Assert.Equal(AbsorptionLines.NoLinesListedRate, AbsorptionLines.UnexplainedLineRate(Entry([], []), []));
        Assert.Equal(AbsorptionLines.SpuriousLineRate, AbsorptionLines.UnexplainedLineRate(Entry(["colourless"], []), ["colourless"]));
        Assert.Equal(AbsorptionLines.SpuriousLineRate, AbsorptionLines.UnexplainedLineRate(Entry(["green"], [new(683)]), ["green"]));
        Assert.True(AbsorptionLines.NoLinesListedRate > AbsorptionLines.SpuriousLineRate);
    }
}
