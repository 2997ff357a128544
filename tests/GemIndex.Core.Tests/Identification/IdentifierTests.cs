using GemIndex.Core.Catalogue;
using GemIndex.Core.Gravity;
using GemIndex.Core.Identification;
using GemIndex.Core.Observations;
using GemIndex.Core.Optics;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Core.Readings;

namespace GemIndex.Core.Tests.Identification;

public class IdentifierTests
{
    // A small catalogue of standard handbook values (from memory; the shipped catalogue is tested separately).
    private static Material Make(string name, string species, OpticalIndices indices, double sgLow, double sgHigh, OpticSign sign = OpticSign.None,
        PropertyRange? bire = null, ThermalProbeResult thermal = ThermalProbeResult.Negative, double? dispersion = null, bool porous = false,
        BenchFrequency frequency = BenchFrequency.Common, OriginClass origin = OriginClass.Natural) => new()
    {
        Name = name, Species = species, Variety = name, Origin = origin, CrystalSystem = CrystalSystem.Cubic, Indices = indices, Sign = sign,
        Birefringence = bire, SpecificGravity = new PropertyRange(sgLow, sgHigh), ThermalProbe = thermal, Dispersion = dispersion,
        DoNotImmerse = porous, Frequency = frequency,
        Polariscope = indices.Character is OpticCharacter.Uniaxial or OpticCharacter.Biaxial ? [PolariscopeReaction.DoublyRefractive] : [PolariscopeReaction.SinglyRefractive],
    };

    private static readonly Material[] Catalogue =
    [
        Make("rock crystal", "quartz", OpticalIndices.Uniaxial(new(1.543, 1.545), new(1.552, 1.554)), 2.65, 2.66, OpticSign.Positive, new(0.009, 0.009), frequency: BenchFrequency.VeryCommon),
        Make("sapphire", "corundum", OpticalIndices.Uniaxial(new(1.767, 1.772), new(1.759, 1.763)), 3.99, 4.01, OpticSign.Negative, new(0.008, 0.009)),
        Make("synthetic sapphire", "corundum", OpticalIndices.Uniaxial(new(1.767, 1.770), new(1.759, 1.762)), 3.99, 4.01, OpticSign.Negative, new(0.008, 0.009), origin: OriginClass.Synthetic),
        Make("spinel", "spinel", OpticalIndices.SingleIndex(new(1.712, 1.736)), 3.58, 3.61),
        Make("diamond", "diamond", OpticalIndices.SingleIndex(new(2.417, 2.419)), 3.51, 3.53, thermal: ThermalProbeResult.Positive, dispersion: 0.044),
        Make("cubic zirconia", "cubic zirconia", OpticalIndices.SingleIndex(new(2.15, 2.18)), 5.6, 6.0, dispersion: 0.060, frequency: BenchFrequency.VeryCommon),
        Make("crown glass", "glass", OpticalIndices.SingleIndex(new(1.50, 1.53), OpticCharacter.Amorphous), 2.4, 2.6, frequency: BenchFrequency.VeryCommon),
        Make("opal", "opal", OpticalIndices.SingleIndex(new(1.43, 1.46), OpticCharacter.Amorphous), 1.98, 2.20, porous: true),
    ];

    private static readonly Identifier Engine = new(Catalogue);

    private static RefractometerObservation Facet(params (double Rotation, double Low, double High)[] steps) =>
        new(RefractometerMethod.Facet, [.. steps.Select(s => new ShadowEdgeStep(s.Rotation, s.Low, s.High))]);

    [Fact]
    public void A_quartz_rotation_series_names_quartz_with_high_confidence()
    {
        // Quartz ω 1.544, ε 1.553, uniaxial + (Handbook of Mineralogy, from memory), read every 30°.
        var sheet = new BenchSheet
        {
            Refractometer = Facet((0, 1.544, 1.553), (30, 1.544, 1.552), (60, 1.544, 1.550), (90, 1.544, 1.548), (120, 1.544, 1.549), (150, 1.544, 1.551)),
            SpecificGravity = new SpecificGravity(2.65, 0.01),
        };
        var result = Engine.Identify(sheet);
        Assert.Equal("quartz", result.Candidates[0].Material.Species);
        Assert.True(result.Candidates[0].Confidence > 0.9);
        Assert.False(result.NoGoodMatch);
    }

    [Fact]
    public void A_reading_strongly_against_the_leader_is_named_in_a_warning()
    {
        // Quartz series (ω 1.544, ε 1.553, from memory) with lines at 694 and 659 nm, which colourless quartz never shows (its
        // entry lists none, and a colourless stone has no chromophore to give one): quartz still leads on the
        // refractometer, and the lines are named as the reading to re-check.
        var engine = new Identifier([.. Catalogue.Select(m => m.Name == "rock crystal" ? m with { Colours = ["colourless"] } : m)]);
        var sheet = new BenchSheet
        {
            Refractometer = Facet((0, 1.544, 1.553), (30, 1.544, 1.552), (60, 1.544, 1.550), (90, 1.544, 1.548), (120, 1.544, 1.549), (150, 1.544, 1.551)),
            AbsorptionLinesNanometres = [694, 659],
            Colour = "colourless",
        };
        var result = engine.Identify(sheet, explainTop: 0);
        Assert.Equal("quartz", result.Candidates[0].Material.Species);
        string warning = Assert.Single(result.Warnings, w => w.StartsWith("Unusual for", StringComparison.Ordinal));
        Assert.StartsWith("Unusual for rock crystal, hand spectroscope (absorption lines): lines seen at 694, 659 nm", warning);
        Assert.DoesNotContain(result.Warnings, w => w.StartsWith("No readings", StringComparison.Ordinal));
        // Without the lines nothing speaks against quartz: no such warning.
        var clean = engine.Identify(sheet with { AbsorptionLinesNanometres = null }, explainTop: 0);
        Assert.DoesNotContain(clean.Warnings, w => w.StartsWith("Unusual for", StringComparison.Ordinal));
    }

    [Fact]
    public void A_colour_outside_the_leaders_list_names_another_variety_and_is_never_called_a_misreading()
    {
        // Any weight and tail: a colour against the leader is never named as the reading to re-check, whatever else is.
        Assert.False(BenchWarnings.SpeaksAgainst(GemIndex.Core.Bench.BenchField.Colour, -20, agrees: false));
        Assert.True(BenchWarnings.SpeaksAgainst(GemIndex.Core.Bench.BenchField.Absorption, -20, agrees: false));
    }

    [Fact]
    public void A_spot_reading_on_a_faceted_stone_advises_the_table_s_sharp_edges()
    {
        // Common practice: the spot method is for curved surfaces; a faceted stone's table gives a rotation series.
        var spot = new BenchSheet { Refractometer = new RefractometerObservation(RefractometerMethod.Spot, spot: 1.72), SpecificGravity = new(3.60, 0.01) };
        static bool Advises(IdentificationResult r) => r.Warnings.Any(w => w.StartsWith("A spot reading on a faceted stone", StringComparison.Ordinal));
        Assert.True(Advises(Engine.Identify(spot with { Cut = StoneCut.Faceted })));
        Assert.False(Advises(Engine.Identify(spot)));
        Assert.False(Advises(Engine.Identify(spot with { Cut = StoneCut.Cabochon })));
    }

    [Fact]
    public void A_short_series_beside_three_colours_is_said_biaxial_with_beta_and_sign_left_open()
    {
        // Zoisite-like edges (α 1.691, γ 1.700, from memory) read over 30° only: the series cannot name the character, but a
        // trichroic stone is biaxial (common practice), so the warning says what is still open rather than "undetermined".
        var short30 = Facet((0, 1.691, 1.693), (15, 1.691, 1.696), (30, 1.692, 1.699));
        string? Said(BenchSheet sheet) => Engine.Identify(sheet).Warnings.SingleOrDefault(w => w.Contains("of the half turn unread", StringComparison.Ordinal));
        Assert.StartsWith("Optic character undetermined:", Said(new BenchSheet { Refractometer = short30 }));
        Assert.StartsWith("Biaxial by the dichroscope's three colours; the rotation series leaves β and the optic sign open:",
            Said(new BenchSheet { Refractometer = short30, Pleochroism = PleochroismObservation.Trichroic }));
    }

    [Fact]
    public void A_rotation_read_twice_is_named_and_a_half_turn_is_not()
    {
        // Quartz ω 1.544, ε 1.553 (Handbook of Mineralogy, from memory). A half turn shows the same section again
        // (common practice: 180° confirms 0°); the same angle read twice is a second look, named so that a correction
        // meant to replace the first is not weighed beside it.
        static string? Named(RefractometerObservation r) =>
            Engine.Identify(new BenchSheet { Refractometer = r }).Warnings.SingleOrDefault(w => w.StartsWith("Rotation ", StringComparison.Ordinal));
        Assert.Equal("Rotation 0° read more than once: the answer weighs every reading as another look at that orientation; if a later one corrects an earlier, replace it.",
            Named(Facet((0, 1.544, 1.553), (0, 1.545, 1.553), (45, 1.544, 1.549))));
        Assert.StartsWith("Rotation 0° and 22.5° read more than once", Named(Facet((0, 1.544, 1.553), (22.5, 1.544, 1.551), (0, 1.545, 1.553), (22.5, 1.544, 1.552), (0, 1.544, 1.553))));
        Assert.Null(Named(Facet((0, 1.544, 1.553), (90, 1.544, 1.549), (180, 1.544, 1.553))));
    }

    [Fact]
    public void Species_totals_cover_the_whole_catalogue_and_split_by_origin()
    {
        // Corundum ω 1.770, ε 1.762 (common practice): natural and synthetic sapphire share the species' total.
        var sheet = new BenchSheet { Refractometer = Facet((0, 1.762, 1.770), (45, 1.764, 1.770), (90, 1.767, 1.770), (135, 1.765, 1.770)) };
        var result = Engine.Identify(sheet, maximumCandidates: 1);
        var corundum = result.Species[0];
        Assert.Equal("corundum", corundum.Species);
        Assert.Equal(2, corundum.Origins.Count);
        Assert.Equal(corundum.Confidence, corundum.Origins.Values.Sum(), 12);
        Assert.True(corundum.Confidence > result.Candidates[0].Confidence);   // the total is over both entries, not the one shown
        Assert.Equal(1 - result.NotInCatalogue, result.Species.Sum(s => s.Confidence), 9);
    }

    [Fact]
    public void A_species_whose_mass_is_spread_over_many_entries_is_shown_before_a_smaller_species_of_one_entry()
    {
        // Readings every entry fits alike: posteriors follow the priors (species weights 16, 8 and 4 of
        // BenchFrequencyWeights; the very common species split over ten varieties of 1.6 each).
        var glassLike = OpticalIndices.SingleIndex(new(1.50, 1.53), OpticCharacter.Amorphous);
        Material[] catalogue =
        [
            .. Enumerable.Range(1, 10).Select(k => Make($"variety {k}", "many", glassLike, 2.4, 2.6) with { SpeciesFrequency = BenchFrequency.VeryCommon }),
            Make("single", "one", glassLike, 2.4, 2.6) with { SpeciesFrequency = BenchFrequency.Common },
            Make("small", "small", glassLike, 2.4, 2.6) with { SpeciesFrequency = BenchFrequency.Occasional },
        ];
        var result = new Identifier(catalogue).Identify(new BenchSheet { SpecificGravity = new(2.5, 0.01) }, maximumCandidates: 2);
        Assert.Equal(["many", "one", "small"], result.Species.Select(s => s.Species).ToArray());
        // The two entries with the largest shares are "single" and "small", yet the leading species must be shown.
        Assert.Equal(["many", "one"], result.Candidates.Select(c => c.Material.Species).ToArray());
    }

    /// <summary>Ten varieties of a very common species and two very rare species of one entry each, all fitting an SG of 2.5 alike.</summary>
    private static Material[] ManyVarietiesAndTwoRareSpecies()
    {
        var glassLike = OpticalIndices.SingleIndex(new(1.50, 1.53), OpticCharacter.Amorphous);
        return
        [
            .. Enumerable.Range(1, 10).Select(k => Make($"variety {k}", "many", glassLike, 2.4, 2.6) with { SpeciesFrequency = BenchFrequency.VeryCommon }),
            Make("second", "second", glassLike, 2.4, 2.6) with { SpeciesFrequency = BenchFrequency.VeryRare },
            Make("third", "third", glassLike, 2.4, 2.6) with { SpeciesFrequency = BenchFrequency.VeryRare },
        ];
    }

    [Fact]
    public void The_second_and_third_species_are_shown_even_when_the_leaders_varieties_could_fill_the_list()
    {
        // Readings every entry fits alike: ten varieties of a very common species (1.6 each of weight 16) against two very
        // rare species of one entry each (weight 1): every variety outranks them, yet the list names all three species.
        Material[] catalogue = ManyVarietiesAndTwoRareSpecies();
        var result = new Identifier(catalogue).Identify(new BenchSheet { SpecificGravity = new(2.5, 0.01) }, maximumCandidates: 10);
        Assert.Equal(10, result.Candidates.Count);
        Assert.Equal(["many", "second", "third"], result.Candidates.Select(c => c.Material.Species).Distinct().ToArray());
    }

    [Fact]
    public void A_species_best_entry_never_displaces_an_entry_more_probable_than_the_whole_species()
    {
        // Readings every entry fits alike (invented, for the rule only): six varieties of a very common species (16/6 each)
        // and eight very rare species of one entry (1 each). Past the three leading species, a rival's best entry may
        // take a place only from a shown entry less probable than its whole species: an amber's pressed amber at 16 %
        // had been left off for the best entries of species at 0.1 %.
        var glassLike = OpticalIndices.SingleIndex(new(1.50, 1.53), OpticCharacter.Amorphous);
        Material[] catalogue =
        [
            .. Enumerable.Range(1, 6).Select(k => Make($"variety {k}", "many", glassLike, 2.4, 2.6) with { SpeciesFrequency = BenchFrequency.VeryCommon }),
            .. Enumerable.Range(1, 8).Select(k => Make($"rival {k}", $"rival {k}", glassLike, 2.4, 2.6) with { SpeciesFrequency = BenchFrequency.VeryRare }),
        ];
        var result = new Identifier(catalogue).Identify(new BenchSheet { SpecificGravity = new(2.5, 0.01) }, maximumCandidates: 10);
        Assert.Equal(10, result.Candidates.Count);
        Assert.Equal(6, result.Candidates.Count(c => c.Material.Species == "many"));
        double leastShown = result.Candidates.Min(c => c.Confidence);
        Assert.All(result.Species.Where(s => result.Candidates.All(c => c.Material.Species != s.Species)), s => Assert.True(s.Confidence <= leastShown));
    }

    [Fact]
    public void A_rival_species_the_answer_would_not_list_never_displaces_the_leaders_likelier_entries()
    {
        // Ten varieties of one species at SG 2.40-2.60 and two rivals whose ranges lie far from an SG of 2.50 (invented,
        // for the rule only): the rivals hold far less than LeadingCandidates.ListedShare, so a list of three is the
        // leader's three varieties, ranked as in a longer list, not "variety, second 0 %, third 0 %".
        var glassLike = OpticalIndices.SingleIndex(new(1.50, 1.53), OpticCharacter.Amorphous);
        Material[] catalogue =
        [
            .. Enumerable.Range(1, 10).Select(k => Make($"variety {k}", "many", glassLike, 2.4, 2.6) with { SpeciesFrequency = BenchFrequency.VeryCommon }),
            Make("second", "second", glassLike, 3.9, 4.0),
            Make("third", "third", glassLike, 4.5, 4.6),
        ];
        var sheet = new BenchSheet { SpecificGravity = new(2.5, 0.01) };
        var three = new Identifier(catalogue).Identify(sheet, maximumCandidates: 3);
        var ten = new Identifier(catalogue).Identify(sheet, maximumCandidates: 10);
        Assert.Equal(3, ten.Species.Count);   // totals over the whole catalogue, listed or not
        Assert.All(ten.Species.Where(s => s.Species != "many"), s => Assert.True(s.Confidence < LeadingCandidates.ListedShare, $"{s.Species} {s.Confidence}"));
        Assert.Equal(["many"], three.Candidates.Select(c => c.Material.Species).Distinct().ToArray());
        Assert.Equal(ten.Candidates.Take(3).Select(c => c.Material.Name), three.Candidates.Select(c => c.Material.Name));
    }

    [Fact]
    public void The_reasons_are_written_for_the_best_entry_of_each_leading_species_first()
    {
        // As above: the leading species' varieties fill the top of the list; the reasons worth reading are the rivals'.
        Material[] catalogue = ManyVarietiesAndTwoRareSpecies();
        var result = new Identifier(catalogue).Identify(new BenchSheet { SpecificGravity = new(2.5, 0.01) }, maximumCandidates: 10, explainTop: 4);
        Assert.Equal(["variety 1", "variety 2", "second", "third"],
            result.Candidates.Where(c => c.Reasons.Count > 0).Select(c => c.Material.Name).ToArray());
    }

    [Fact]
    public void Species_headings_are_needed_only_when_the_order_puts_a_larger_share_after_a_smaller_one()
    {
        RankedCandidate C(string species, double p) => new() { Material = Catalogue[0] with { Species = species }, Confidence = p, Fit = 1 };
        Assert.True(LeadingCandidates.NeedsSpeciesHeadings([C("a", 0.4), C("a", 0.05), C("b", 0.2)]));
        Assert.False(LeadingCandidates.NeedsSpeciesHeadings([C("a", 0.4), C("a", 0.3), C("b", 0.2)]));
        Assert.False(LeadingCandidates.NeedsSpeciesHeadings([C("a", 0.4), C("a", 0.5)]));   // one species: its order is its own
        Assert.False(LeadingCandidates.NeedsSpeciesHeadings([C("a", 0.99), C("b", 0.001), C("c", 0.002)]));   // all read "<1%"
    }

    [Fact]
    public void The_listed_candidates_are_the_leader_and_those_rounding_to_a_tenth_of_a_percent_or_more_each_at_its_place()
    {
        RankedCandidate C(string species, double p) => new() { Material = Catalogue[0] with { Species = species }, Confidence = p, Fit = 1 };
        // A species' tiny variety between two shares that print is left out, the next species keeps its place (rank 4).
        RankedCandidate[] answer = [C("a", 0.9), C("a", 0.0004999), C("b", 0.0005), C("c", 0.0996), C("d", 1e-40)];
        Assert.Equal([0, 2, 3], LeadingCandidates.Listed(answer, noGoodMatch: false));
        // When nothing fits, the whole least-bad list is what the readings leave.
        Assert.Equal([0, 1, 2, 3, 4], LeadingCandidates.Listed(answer, noGoodMatch: true));
        // The leader is listed however small its share (a sheet that says next to nothing).
        Assert.Equal([0], LeadingCandidates.Listed([C("a", 0.0001), C("b", 0.00009)], noGoodMatch: false));
        Assert.Empty(LeadingCandidates.Listed([], noGoodMatch: false));
        // Reasons go to listed candidates first: the second species at 10⁻⁴⁰ waits behind the leader's listed variety.
        Assert.Equal([true, false, false, false, false], LeadingCandidates.Explained([C("a", 0.9), C("b", 1e-40), C("a", 0.05), C("c", 1e-40), C("d", 1e-40)], 1));
        Assert.Equal([true, false, true, false, false], LeadingCandidates.Explained([C("a", 0.9), C("b", 1e-40), C("a", 0.05), C("c", 1e-40), C("d", 1e-40)], 2));
        Assert.True(LeadingCandidates.SpeciesListed(0, 1e-9, noGoodMatch: false));
        Assert.False(LeadingCandidates.SpeciesListed(1, 0.0004999, noGoodMatch: false));
        Assert.True(LeadingCandidates.SpeciesListed(1, 0.0004999, noGoodMatch: true));
    }

    [Fact]
    public void Leading_candidates_take_the_first_entry_of_each_species_then_the_rest_in_order()
    {
        string[] species = ["beryl", "beryl", "beryl", "glass", "beryl", "quartz"];
        Assert.Equal([0, 3, 5, 1, 2, 4], LeadingCandidates.Order(species));
        Assert.Equal([true, true, false, true, false, true], LeadingCandidates.Explained(species, 4));
        Assert.Equal(species.Select(_ => true), LeadingCandidates.Explained(species, 10));
        Assert.Empty(LeadingCandidates.Order(Array.Empty<string>()));
    }

    [Fact]
    public void A_corundum_series_reads_negative_and_names_corundum_and_warns_about_synthetics()
    {
        // Corundum ω 1.770, ε 1.762 (common practice); natural and synthetic cannot be separated by these tests.
        var sheet = new BenchSheet { Refractometer = Facet((0, 1.762, 1.770), (45, 1.764, 1.770), (90, 1.767, 1.770), (135, 1.765, 1.770)) };
        var result = Engine.Identify(sheet);
        Assert.Equal("corundum", result.Candidates[0].Material.Species);
        Assert.Equal("corundum", result.Candidates[1].Material.Species);
        Assert.Contains(result.Warnings, w => w.Contains("cannot be separated", StringComparison.Ordinal));
        Assert.Equal(OpticCharacter.Uniaxial, result.Series!.Character);
        Assert.Equal(OpticSign.Negative, Assert.Single(result.Series.Interpretations).Sign);
    }

    [Fact]
    public void Over_the_limit_with_a_positive_thermal_probe_and_SG_3_52_is_diamond()
    {
        // Diamond n 2.417, SG 3.52, heat conduction (common practice).
        var sheet = new BenchSheet
        {
            Refractometer = new RefractometerObservation(RefractometerMethod.Facet, overLimit: true),
            ThermalProbe = ThermalProbeResult.Positive,
            SpecificGravity = new SpecificGravity(3.52, 0.01),
        };
        var result = Engine.Identify(sheet);
        Assert.Equal("diamond", result.Candidates[0].Material.Name);
        Assert.True(result.Candidates[0].Confidence > 0.95);
        Assert.Contains(result.Warnings, w => w.StartsWith("Over the limit", StringComparison.Ordinal));
    }

    [Fact]
    public void Readings_that_fit_nothing_say_so_instead_of_naming_the_least_bad()
    {
        // n 1.61 singly refractive with SG 1.20 matches no entry of this catalogue (an invented, impossible-here stone).
        var sheet = new BenchSheet
        {
            Refractometer = Facet((0, 1.610, 1.610), (90, 1.610, 1.610)),
            SpecificGravity = new SpecificGravity(1.20, 0.01),
        };
        var result = Engine.Identify(sheet);
        Assert.True(result.NoGoodMatch);
        Assert.True(result.NotInCatalogue > result.Candidates[0].Confidence);
        Assert.StartsWith("Nothing in the catalogue fits", result.Warnings[0]);
    }

    [Fact]
    public void A_glass_whose_SG_its_index_rules_out_is_nothing_fits_while_a_soda_lime_glass_stays_glass()
    {
        // A catch-all glass spanning every glass index and SG (as the shipped "glass of another composition" does,
        // n 1.458-1.930, SG 2.20-6.05): without the Gladstone-Dale relation an impossible pair (n 1.48 with SG 4.60, or
        // n 1.70 with SG 2.20) fitted it at 1.00 and was named glass.
        Material anyGlass = Make("glass of another composition", "glass", OpticalIndices.SingleIndex(new(1.458, 1.93), OpticCharacter.Amorphous), 2.20, 6.05)
            with { SpecificRefractivity = GladstoneDale.ManMadeGlass };
        var engine = new Identifier([.. Catalogue, anyGlass]);
        BenchSheet Glass(double n, double sg) => new() { Refractometer = Facet((0, n, n), (90, n, n)), SpecificGravity = new SpecificGravity(sg, 0.01) };
        Assert.True(engine.Identify(Glass(1.48, 4.60)).NoGoodMatch);
        Assert.True(engine.Identify(Glass(1.70, 2.20)).NoGoodMatch);
        // Soda-lime (n 1.518, SG 2.52, the Wikipedia figures glass.json cites) and a dense lead glass (n 1.70, SG 4.2, within
        // glass.json's dense lead family) are glass.
        var sodaLime = engine.Identify(Glass(1.518, 2.52));
        Assert.False(sodaLime.NoGoodMatch);
        Assert.Equal("glass", sodaLime.Species[0].Species);
        var lead = engine.Identify(Glass(1.70, 4.20));
        Assert.False(lead.NoGoodMatch);
        Assert.Equal("glass of another composition", lead.Candidates[0].Material.Name);
    }

    [Fact]
    public void A_high_edge_the_liquid_hid_at_some_steps_is_warned_of_with_the_steps()
    {
        // The epidote-like series of RotationSeriesAnalysisTests (indicatrix section of α 1.748, β 1.776, γ 1.796, from
        // memory), read on a 1.79 liquid.
        var sheet = new BenchSheet
        {
            Refractometer = new RefractometerObservation(RefractometerMethod.Facet,
                [new(0, 1.775, null), new(30, 1.772, 1.786), new(60, 1.756, 1.788), new(90, 1.748, null), new(120, 1.755, null), new(150, 1.767, null)]),
        };
        Assert.Contains(Engine.Identify(sheet).Warnings, w => w.StartsWith("High edge not seen at 4 of 6 steps (0°, 90°, 120°, 150°): it lay above the liquid's 1.790", StringComparison.Ordinal));
        // With the 60° step left out only one step shows both edges: the steps alone leave the character open (it had read
        // "a single rotation step"), and the warning says where the section model's reading of the edges points.
        var fewer = sheet with
        {
            Refractometer = new RefractometerObservation(RefractometerMethod.Facet,
                [new(0, 1.775, null), new(30, 1.772, 1.786), new(90, 1.748, null), new(120, 1.755, null), new(150, 1.767, null)]),
        };
        IReadOnlyList<string> warnings = Engine.Identify(fewer).Warnings;
        Assert.Contains(warnings, w => w.StartsWith("High edge not seen at 4 of 5 steps", StringComparison.Ordinal));
        Assert.Contains(warnings, w => w.StartsWith("Optic character undetermined: only one step shows both edges", StringComparison.Ordinal)
            && w.Contains("the edges as read still point to biaxial", StringComparison.Ordinal));
    }

    [Fact]
    public void A_sheet_that_says_nothing_is_not_called_nothing_fits_however_many_species_share_it()
    {
        // Sixty glass-like species of equal frequency (invented, for the rule only): with one SG that every one of them and
        // an unlisted material explain alike, each species holds about 1.6 % and "not in the catalogue" keeps its prior
        // of 3 %, above any one species, yet the readings have said nothing against the catalogue.
        var many = Enumerable.Range(0, 60)
            .Select(i => Make($"material {i}", $"species {i}", OpticalIndices.SingleIndex(new(1.50, 1.53), OpticCharacter.Amorphous), 1.0, 8.0))
            .ToArray();
        var result = new Identifier(many).Identify(new BenchSheet { SpecificGravity = new SpecificGravity(3.0, 0.02) });
        Assert.True(result.NotInCatalogue > result.Species[0].Confidence);
        Assert.False(result.NoGoodMatch);
    }

    [Fact]
    public void Confidences_and_the_not_in_catalogue_share_sum_to_one()
    {
        var result = Engine.Identify(new BenchSheet { SpecificGravity = new SpecificGravity(3.6, 0.02) }, maximumCandidates: 100);
        Assert.Equal(1, result.Candidates.Sum(c => c.Confidence) + result.NotInCatalogue, 1e-9);
    }

    [Fact]
    public void The_next_test_separates_the_leading_candidates()
    {
        // A singly refractive stone over the limit: diamond or cubic zirconia; SG or the thermal probe decide.
        var sheet = new BenchSheet { Refractometer = new RefractometerObservation(RefractometerMethod.Facet, overLimit: true) };
        var result = Engine.Identify(sheet);
        var next = Assert.IsType<NextTestAdvice>(result.NextTest);
        Assert.Contains(next.Test, new[] { "sg", "thermal_probe", "dispersion" });
        Assert.True(next.GainBits > 0.5);
        Assert.Contains("diamond", next.Separates);
        Assert.Contains("cubic zirconia", next.Separates);
    }

    [Fact]
    public void Reasons_give_the_numbers_in_plain_words()
    {
        var sheet = new BenchSheet { SpecificGravity = new SpecificGravity(3.99, 0.01), Refractometer = Facet((0, 1.762, 1.770), (90, 1.767, 1.770)) };
        var reasons = Engine.Identify(sheet).Candidates[0].Reasons;
        Assert.Contains(reasons, r => r.Text == "SG 3.99 ± 0.01 lies in 3.99–4.01");
    }

    [Fact]
    public void A_porous_candidate_brings_the_do_not_immerse_warning()
    {
        var sheet = new BenchSheet { Refractometer = new RefractometerObservation(RefractometerMethod.Spot, spot: 1.45) };
        var result = Engine.Identify(sheet);
        Assert.Equal("opal", result.Candidates[0].Material.Name);
        Assert.Contains(result.Warnings, w => w.StartsWith("Possible opal: do not immerse", StringComparison.Ordinal));
    }

    [Fact]
    public void A_reading_in_other_light_is_moved_to_589_nm_with_the_candidates_dispersion()
    {
        // Diamond's two-term Cauchy through nD 2.418 and nG − nB 0.044 gives about 2.436 at 486 nm (computed by hand:
        // B = 0.044 / (1/0.4308² − 1/0.6867²) = 0.01357 µm²; n(0.486) − n(0.5893) = B (1/0.486² − 1/0.5893²) ≈ 0.0184).
        var shift = RefractometerEvidence.WavelengthShift(Catalogue[4], 486.1, out _);
        Assert.Equal(-0.0184, shift, 0.0005);
    }

    [Fact]
    public void A_candidate_under_a_trade_rule_brings_the_rule_as_a_caution_said_once_for_the_entries_that_share_it()
    {
        // Invented entries: two opals sharing one invented rule, and a look-alike without one. The rule is a caution,
        // never evidence: the confidences are those of the same catalogue without it.
        var rule = new TradeRule("invented", "trade restricted by an invented listing for this test", "invented");
        Material[] ruled = [.. Catalogue.Select(m => m.Name == "opal" ? m with { TradeRule = rule } : m), Catalogue.Single(m => m.Name == "opal") with { Name = "opal two", TradeRule = rule }];
        Material[] plain = [.. Catalogue, Catalogue.Single(m => m.Name == "opal") with { Name = "opal two" }];
        var sheet = new BenchSheet { Refractometer = new RefractometerObservation(RefractometerMethod.Spot, spot: 1.45) };
        var result = new Identifier(ruled).Identify(sheet);
        var cautions = result.Warnings.Where(w => w.Contains("trade restricted", StringComparison.Ordinal)).ToList();
        Assert.Equal(["Possible opal and opal two: trade restricted by an invented listing for this test. Check the rules where you buy, sell or ship them (a summary, not legal advice)."], cautions);
        Assert.Equal(new Identifier(plain).Identify(sheet).Candidates.Select(c => c.Confidence), result.Candidates.Select(c => c.Confidence));
        // A sheet that rules the opals out (spinel's spot 1.72) names no rule: only serious candidates (≥ 5 %) bring one.
        var spinel = new Identifier(ruled).Identify(new BenchSheet { Refractometer = new RefractometerObservation(RefractometerMethod.Spot, spot: 1.72) });
        Assert.True(spinel.Candidates.Where(c => c.Material.TradeRule is not null).All(c => c.Confidence < BenchWarnings.Relevant));
        Assert.DoesNotContain(spinel.Warnings, w => w.Contains("trade restricted", StringComparison.Ordinal));
    }

    [Fact]
    public void Varieties_of_one_origin_the_tests_leave_open_are_named_with_the_test_that_would_tell_them()
    {
        // Invented entries of one species and origin, alike in every reading: one holds a cat's-eye (0.95, as the
        // catalogue's cat's-eye varieties do), one is plain; two more differ only in their usual colour, two more in nothing.
        var eye = new GemIndex.Core.Magnification.MagnificationProfile(OriginClass.Natural,
            new Dictionary<GemIndex.Core.Magnification.MagnificationFeature, double> { [GemIndex.Core.Magnification.MagnificationFeature.Chatoyancy] = 0.95 });
        var plain = Make("plain stone", "invented", OpticalIndices.SingleIndex(new(1.70, 1.71)), 3.50, 3.52);
        Material[] catalogue = [plain, plain with { Name = "eye stone", Variety = "eye stone", Magnification = eye },
            Make("green kind", "other", OpticalIndices.SingleIndex(new(1.60, 1.61)), 3.00, 3.02) with { Colours = ["green"] },
            Make("white kind", "other", OpticalIndices.SingleIndex(new(1.60, 1.61)), 3.00, 3.02) with { Colours = ["white"] },
            Make("first twin", "twin", OpticalIndices.SingleIndex(new(1.50, 1.51)), 2.00, 2.02),
            Make("second twin", "twin", OpticalIndices.SingleIndex(new(1.50, 1.51)), 2.00, 2.02),
            Make("near rival", "rival", OpticalIndices.SingleIndex(new(1.50, 1.51)), 2.00, 2.02)];
        var engine = new Identifier(catalogue);
        IReadOnlyList<string> Open(BenchSheet sheet, int shown = 10) =>
            [.. engine.Identify(sheet, shown).Warnings.Where(w => w.Contains("not told apart", StringComparison.Ordinal))];

        var sheet = new BenchSheet { SpecificGravity = new SpecificGravity(3.51, 0.01), Refractometer = new RefractometerObservation(RefractometerMethod.Spot, spot: 1.705) };
        string said = Assert.Single(Open(sheet));
        Assert.StartsWith("Invented: plain stone and eye stone are not told apart by these tests; the eye or loupe (phenomena): look for cat's-eye", said);
        // Worked out over the whole catalogue, not the candidates shown: one shown candidate names the pair all the same.
        Assert.Equal([said], Open(sheet, shown: 1));
        // The eye seen settles it: no warning.
        Assert.Empty(Open(sheet with { Magnification = new([GemIndex.Core.Magnification.MagnificationFeature.Chatoyancy], []) }));

        var pale = new BenchSheet { SpecificGravity = new SpecificGravity(3.01, 0.01), Refractometer = new RefractometerObservation(RefractometerMethod.Spot, spot: 1.605) };
        Assert.Equal(["Other: green kind and white kind are not told apart by these tests; its colour, written down, would help."], Open(pale));
        Assert.Empty(Open(pale with { Colour = "green" }));
        // A colour word the tool does not know is still a colour written: no request for one.
        Assert.Equal(["Other: green kind and white kind are not told apart by these tests; no bench test left here separates them."], Open(pale with { Colour = "mauvish" }));

        // Three entries alike in everything across two species: the species itself is open (a third each is below a
        // half), so no variety line; without the rival, the twins are named with no test left.
        var alike = new BenchSheet { SpecificGravity = new SpecificGravity(2.01, 0.01), Refractometer = new RefractometerObservation(RefractometerMethod.Spot, spot: 1.505) };
        Assert.Empty(Open(alike));
        var twins = new Identifier([.. catalogue.Where(m => m.Species != "rival")]).Identify(alike).Warnings;
        Assert.Contains("Twin: first twin and second twin are not told apart by these tests; no bench test left here separates them.", twins);
    }

    [Fact]
    public void Species_of_one_mineral_group_the_tests_leave_open_are_named_with_the_test_that_would_tell_them()
    {
        // Invented entries: two species of one group alike in index and SG, told apart only by the thermal probe, and a
        // third species of the group far from the readings; a species of no group with the same readings as a control.
        Material first = Make("first member", "first", OpticalIndices.SingleIndex(new(1.70, 1.71)), 3.50, 3.52) with { MineralGroup = "invented" };
        Material second = Make("second member", "second", OpticalIndices.SingleIndex(new(1.70, 1.71)), 3.50, 3.52, thermal: ThermalProbeResult.Positive) with { MineralGroup = "invented" };
        Material far = Make("far member", "third", OpticalIndices.SingleIndex(new(1.50, 1.51)), 2.50, 2.52) with { MineralGroup = "invented" };
        var sheet = new BenchSheet { SpecificGravity = new SpecificGravity(3.51, 0.01), Refractometer = new RefractometerObservation(RefractometerMethod.Spot, spot: 1.705) };
        IReadOnlyList<string> Open(IEnumerable<Material> catalogue, BenchSheet s) =>
            [.. new Identifier([.. catalogue]).Identify(s).Warnings.Where(w => w.Contains("group:", StringComparison.Ordinal))];

        Assert.Equal(["Invented group: first and second are not told apart by these tests; the thermal probe may hint, and a laboratory's analysis settles it."], Open([first, second, far], sheet));
        // The probe read settles it: no line. Without the group, two open species are left to the species lines.
        Assert.Empty(Open([first, second, far], sheet with { ThermalProbe = ThermalProbeResult.Negative }));
        Assert.Empty(Open([first, second with { MineralGroup = null }, far], sheet));
        // The confidences are the same with or without the group: it is never evidence.
        var grouped = new Identifier([first, second, far]).Identify(sheet);
        var ungrouped = new Identifier([first with { MineralGroup = null }, second with { MineralGroup = null }, far with { MineralGroup = null }]).Identify(sheet);
        Assert.Equal(ungrouped.Candidates.Select(c => c.Confidence), grouped.Candidates.Select(c => c.Confidence));
        // Nothing in the group fits (the third's readings far off, an unlisted index): no line.
        var nowhere = new BenchSheet { Refractometer = new RefractometerObservation(RefractometerMethod.Spot, spot: 1.30), SpecificGravity = new SpecificGravity(6.9, 0.01) };
        Assert.True(new Identifier([first, second, far]).Identify(nowhere).NoGoodMatch);
        Assert.Empty(Open([first, second, far], nowhere));
    }

    [Fact]
    public void Weighing_in_water_is_never_suggested_while_a_porous_material_leads()
    {
        // Spot 1.45: opal (porous) leads; SG would separate it but must not be suggested.
        var sheet = new BenchSheet { Refractometer = new RefractometerObservation(RefractometerMethod.Spot, spot: 1.45) };
        var next = Engine.Identify(sheet).NextTest;
        Assert.NotEqual("sg", next?.Test);
    }

    [Fact]
    public void Heavy_liquids_no_SG_satisfies_together_are_named_in_a_warning()
    {
        // Common practice: a stone that floats in 2.62 cannot sink in 2.67; one of the two is misread.
        var sheet = new BenchSheet { HeavyLiquids = [HeavyLiquidResult.Of(2.62, HeavyLiquidOutcome.Floats), HeavyLiquidResult.Of(2.67, HeavyLiquidOutcome.Sinks)] };
        Assert.Contains(Engine.Identify(sheet).Warnings, w => w.StartsWith("The heavy liquids contradict each other (2.62 floats; 2.67 sinks)", StringComparison.Ordinal));
        var agreeing = sheet with { HeavyLiquids = [HeavyLiquidResult.Of(2.62, HeavyLiquidOutcome.Sinks), HeavyLiquidResult.Of(2.67, HeavyLiquidOutcome.Floats)] };
        Assert.DoesNotContain(Engine.Identify(agreeing).Warnings, w => w.Contains("contradict each other", StringComparison.Ordinal));
    }

    [Fact]
    public void The_advice_lists_a_materials_lines_along_the_spectrum_as_the_scale_reads()
    {
        // Invented entries alike but for their lines, listed strongest first in the catalogue (turquoise-like 432, 420, 460).
        var index = OpticalIndices.SingleIndex(new(1.61, 1.62));
        Material lined = Make("lined", "a", index, 2.60, 2.80) with { AbsorptionLines = [new(432, LineStrength.Strong), new(420), new(460, LineStrength.Weak)] };
        Material plain = Make("plain", "b", index, 2.60, 2.80);
        var advice = NextTestAdvisor.Advise(new BenchSheet { SpecificGravity = new SpecificGravity(2.70, 0.01) }, [(lined, 0.5), (plain, 0.5)]);
        var next = Assert.IsType<NextTestAdvice>(advice);
        Assert.Contains("lined: lines at 420, 432, 460 nm", next.Expectations);
    }

    [Theory]
    [InlineData(new[] { 1, 2, 3 }, null)]
    [InlineData(new[] { 1, 2, 3, 5 }, "Rank 4 is not listed (below 0.05 %).")]
    [InlineData(new[] { 1, 2, 3, 5, 8, 10 }, "Ranks 4, 6, 7 and 9 are not listed (each below 0.05 %).")]
    public void Ranks_a_list_leaves_out_between_its_rows_are_said(int[] listed, string? expected)
    {
        // A species-first order may put an entry below the listed share before a listed entry of another species.
        Assert.Equal(expected, LeadingCandidates.UnlistedNote(listed));
    }

    [Fact]
    public void A_look_only_for_a_phenomenon_is_advised_by_eye_not_under_the_microscope()
    {
        // Invented entries alike but for a play of colour that one of them shows (a precious against a common opal, common
        // practice): play of colour is seen by eye, turning the stone under light from above.
        var index = OpticalIndices.SingleIndex(new(1.44, 1.46));
        Material precious = Make("precious", "a", index, 2.00, 2.20) with
        {
            Magnification = new GemIndex.Core.Magnification.MagnificationProfile(OriginClass.Natural,
                new Dictionary<GemIndex.Core.Magnification.MagnificationFeature, double> { [GemIndex.Core.Magnification.MagnificationFeature.PlayOfColour] = 0.95 }),
        };
        Material common = Make("common", "b", index, 2.00, 2.20);
        var next = Assert.IsType<NextTestAdvice>(NextTestAdvisor.Advise(new BenchSheet { SpecificGravity = new SpecificGravity(2.10, 0.01) }, [(precious, 0.5), (common, 0.5)]));
        Assert.Equal("magnification", next.Test);
        Assert.True(next.ByEye);
        Assert.StartsWith("eye or loupe (phenomena): look for play of colour", next.Description, StringComparison.Ordinal);
    }

    [Fact]
    public void When_only_origin_is_open_the_advice_names_a_look_under_magnification()
    {
        // Natural and synthetic sapphire share every bench reading here; only what is inside tells them apart (nature's
        // crystals and healed fractures against growth signatures: the defaults by origin of docs/ranking.md, common practice).
        var sheet = new BenchSheet
        {
            Refractometer = Facet((0, 1.762, 1.770), (45, 1.764, 1.770), (90, 1.767, 1.770), (135, 1.765, 1.770)),
            SpecificGravity = new SpecificGravity(4.00, 0.01), Polariscope = PolariscopeReaction.DoublyRefractive,
            Pleochroism = PleochroismObservation.Dichroic, Dispersion = DispersionObservation.ByEye(DispersionStrength.Weak), ThermalProbe = ThermalProbeResult.Negative,
            Electrical = ElectricalResult.Insulating, UvLong = FluorescenceStrength.Inert, UvShort = FluorescenceStrength.Inert, AbsorptionLinesNanometres = [],
        };
        var result = Engine.Identify(sheet);
        var next = Assert.IsType<NextTestAdvice>(result.NextTest);
        Assert.Equal("magnification", next.Test);
        Assert.NotEmpty(next.LookFor);
        Assert.Equal(next.LookFor.Count, next.Lighting.Count);
        string natural = Assert.Single(next.Expectations, e => e.StartsWith("sapphire:", StringComparison.Ordinal));
        string synthetic = Assert.Single(next.Expectations, e => e.StartsWith("synthetic sapphire:", StringComparison.Ordinal));
        Assert.NotEqual(natural[natural.IndexOf(':')..], synthetic[synthetic.IndexOf(':')..]);
        Assert.StartsWith("loupe or microscope (magnification): look for ", next.Description, StringComparison.Ordinal);
        Assert.Contains(result.Warnings, w => w.StartsWith("Corundum: natural and synthetic cannot be separated", StringComparison.Ordinal) && w.Contains("look for", StringComparison.Ordinal));
    }

    [Fact]
    public void Magnification_that_settles_the_origin_keeps_the_laboratory_caution()
    {
        // Curved striae and round bubbles seen: the synthetic leads alone, but the species is also met natural-looking
        // treated or grown stones a loupe cannot expose, so the laboratory caution remains.
        var sheet = new BenchSheet
        {
            Refractometer = Facet((0, 1.762, 1.770), (45, 1.764, 1.770), (90, 1.767, 1.770), (135, 1.765, 1.770)),
            Magnification = new GemIndex.Core.Magnification.MagnificationObservation(
                [GemIndex.Core.Magnification.MagnificationFeature.CrystalInclusions, GemIndex.Core.Magnification.MagnificationFeature.NeedlesAndSilk],
                [GemIndex.Core.Magnification.MagnificationFeature.CurvedStriae, GemIndex.Core.Magnification.MagnificationFeature.RoundGasBubbles]),
        };
        var result = Engine.Identify(sheet);
        Assert.Equal("corundum", result.Species[0].Species);
        Assert.Contains(result.Warnings, w => w.StartsWith("Corundum is also found laboratory-grown: even with the magnification recorded", StringComparison.Ordinal)
                                              && w.EndsWith("refer it to a qualified laboratory.", StringComparison.Ordinal)
                                              // Only a laboratory-grown entry is hidden here: no word of fillers or heating.
                                              && w.Contains("some laboratory growth leaves no sign", StringComparison.Ordinal) && !w.Contains("fillers", StringComparison.Ordinal));
    }

    [Fact]
    public void Without_a_test_that_separates_them_no_origin_holds_more_than_eighty_percent_of_its_species()
    {
        // Natural sapphire very common, synthetic rare (a serious alternative: one in eight): on the refractometer alone the
        // shares would give natural 16/18 = 89 %; the tests do not separate the two, so the split is held at the cap (75 / 25).
        Material natural = Make("blue sapphire", "corundum", OpticalIndices.Uniaxial(new(1.767, 1.772), new(1.759, 1.763)), 3.99, 4.01, OpticSign.Negative,
            new(0.008, 0.009), frequency: BenchFrequency.VeryCommon);
        Material synthetic = Make("synthetic blue sapphire", "corundum", OpticalIndices.Uniaxial(new(1.767, 1.772), new(1.759, 1.763)), 3.99, 4.01, OpticSign.Negative,
            new(0.008, 0.009), frequency: BenchFrequency.Rare, origin: OriginClass.Synthetic);
        var engine = new Identifier([natural, synthetic, Catalogue[0]]);
        var series = Facet((0, 1.762, 1.770), (45, 1.764, 1.770), (90, 1.767, 1.770), (135, 1.765, 1.770));
        var corundum = engine.Identify(new BenchSheet { Refractometer = series }).Species.Single(s => s.Species == "corundum");
        Assert.Equal(OriginBalance.Cap * corundum.Confidence, corundum.Origins[OriginClass.Natural], 9);
        Assert.Equal((1 - OriginBalance.Cap) * corundum.Confidence, corundum.Origins[OriginClass.Synthetic], 9);

        // Crystals and healed fractures seen: nature's inclusions (the defaults by origin, common practice) decide, and the
        // natural origin may hold far more than the cap.
        var seen = engine.Identify(new BenchSheet
        {
            Refractometer = series,
            Magnification = new GemIndex.Core.Magnification.MagnificationObservation(
                [GemIndex.Core.Magnification.MagnificationFeature.CrystalInclusions, GemIndex.Core.Magnification.MagnificationFeature.HealedFractures], []),
        }).Species.Single(s => s.Species == "corundum");
        Assert.True(seen.Origins[OriginClass.Natural] > 0.95 * seen.Confidence, $"natural {seen.Origins[OriginClass.Natural]} of {seen.Confidence}");
    }

    [Fact]
    public void Variety_shares_within_an_origin_do_not_decide_the_origin()
    {
        // Invented entries after zoisite: a heated stone (very common) and its unheated twin (rare) read alike; a natural
        // massive variety (common) of another SG cannot give the reading. Weighing the natural entries by their shares made
        // the natural origin a fifth as likely as the treated one on the tests alone (treated 83 %, "decided"); no test
        // tells heated from unheated, so the split is held at the cap.
        var indices = OpticalIndices.Uniaxial(new(1.767, 1.772), new(1.759, 1.763));
        Material heated = Make("heated violet stone", "violet species", indices, 3.34, 3.36, OpticSign.Negative, new(0.008, 0.009),
            frequency: BenchFrequency.VeryCommon, origin: OriginClass.Treated);
        Material unheated = Make("unheated violet stone", "violet species", indices, 3.34, 3.36, OpticSign.Negative, new(0.008, 0.009),
            frequency: BenchFrequency.Rare);
        Material massive = Make("massive pink variety", "violet species", indices, 3.10, 3.15, OpticSign.Negative, new(0.008, 0.009),
            frequency: BenchFrequency.Common);
        var sheet = new BenchSheet
        {
            Refractometer = Facet((0, 1.762, 1.770), (45, 1.764, 1.770), (90, 1.767, 1.770), (135, 1.765, 1.770)),
            SpecificGravity = new SpecificGravity(3.35, 0.01),
        };
        var species = new Identifier([heated, unheated, massive, Catalogue[0]]).Identify(sheet).Species.Single(s => s.Species == "violet species");
        Assert.Equal(OriginBalance.Cap * species.Confidence, species.Origins[OriginClass.Treated], 9);
    }

    [Fact]
    public void The_share_held_back_from_an_undecided_origin_goes_to_the_alternative_whose_colour_fits()
    {
        // Invented entries after quartz: natural purple (very common), a heated yellow (common) and a synthetic purple
        // (rare), alike in every other test. Nothing decides the origin, so natural is held at the cap; of the rest,
        // the purple stone's colour sends most to the purple synthetic, not to the yellow treated entry (before, the two
        // shared it by the tests without colour, half each).
        var indices = OpticalIndices.Uniaxial(new(1.544, 1.545), new(1.553, 1.554));
        Material natural = Make("purple natural", "purple species", indices, 2.64, 2.66, OpticSign.Positive, new(0.009, 0.009),
            frequency: BenchFrequency.VeryCommon) with { Colours = ["purple"] };
        Material heated = Make("yellow heated", "purple species", indices, 2.64, 2.66, OpticSign.Positive, new(0.009, 0.009),
            frequency: BenchFrequency.Common, origin: OriginClass.Treated) with { Colours = ["yellow"] };
        Material synthetic = Make("purple synthetic", "purple species", indices, 2.64, 2.66, OpticSign.Positive, new(0.009, 0.009),
            frequency: BenchFrequency.Rare, origin: OriginClass.Synthetic) with { Colours = ["purple"] };
        var sheet = new BenchSheet { SpecificGravity = new SpecificGravity(2.65, 0.01), Colour = "purple" };
        var species = new Identifier([natural, heated, synthetic, Catalogue[0]]).Identify(sheet).Species.Single(s => s.Species == "purple species");
        Assert.Equal(OriginBalance.Cap * species.Confidence, species.Origins[OriginClass.Natural], 9);
        Assert.True(species.Origins[OriginClass.Synthetic] > 3 * species.Origins[OriginClass.Treated],
            $"synthetic {species.Origins[OriginClass.Synthetic]:0.000}, treated {species.Origins[OriginClass.Treated]:0.000}");
    }

    [Fact]
    public void The_test_named_to_separate_origins_tells_origins_apart_not_varieties_of_one_origin()
    {
        // Two natural varieties told apart only by the heat probe, and a treated entry told from both only by SG (invented
        // entries). Over the materials the probe is the better test; over the origins it gains nothing, since it only
        // splits the natural varieties (I(origin; outcome) = I(material; outcome) − Σ P(origin) I(material; outcome | origin)).
        var indices = OpticalIndices.Uniaxial(new(1.767, 1.772), new(1.759, 1.763));
        Material cool = Make("cool variety", "s", indices, 3.99, 4.01, OpticSign.Negative, new(0.008, 0.009));
        Material warm = Make("warm variety", "s", indices, 3.99, 4.01, OpticSign.Negative, new(0.008, 0.009), thermal: ThermalProbeResult.Positive);
        Material treated = Make("treated entry", "s", indices, 3.60, 3.62, OpticSign.Negative, new(0.008, 0.009), origin: OriginClass.Treated);
        var sheet = new BenchSheet { Refractometer = Facet((0, 1.762, 1.770), (45, 1.764, 1.770), (90, 1.767, 1.770), (135, 1.765, 1.770)) };
        IReadOnlyList<(Material, double)> posterior = [(cool, 0.4), (warm, 0.4), (treated, 0.2)];
        Assert.Equal(GemIndex.Core.Bench.BenchField.ThermalProbe, NextTestAdvisor.Advise(sheet, posterior)!.Test);
        Assert.Equal(GemIndex.Core.Bench.BenchField.Sg, NextTestAdvisor.Advise(sheet, posterior, m => (int)m.Origin)!.Test);

        // A treated entry identical in every test to the one natural variety left: no test tells the origins apart, and
        // none is named, though the probe still splits the natural varieties when both are there.
        Material alike = treated with { SpecificGravity = new(3.99, 4.01) };
        var none = NextTestAdvisor.Advise(sheet, [(cool, 0.6), (alike, 0.4)], m => (int)m.Origin);
        Assert.True(none is null, $"{none?.Test} {none?.GainBits}");
    }

    [Fact]
    public void An_opaque_candidate_is_not_said_to_show_a_polariscope_reaction()
    {
        // A spot reading shared by a singly refractive, a doubly refractive and an opaque entry (invented entries): the
        // polariscope tells the first two apart, and the opaque one, whose outcome table is flat, is said to show nothing.
        var index = OpticalIndices.SingleIndex(new(1.52, 1.53));
        Material glassy = Make("glassy", "a", index, 2.50, 2.60);
        Material crystal = Make("crystal", "b", OpticalIndices.Uniaxial(new(1.52, 1.53), new(1.529, 1.535)), 2.50, 2.60, OpticSign.Positive, new(0.006, 0.009));
        Material opaque = Make("opaque", "c", index, 2.50, 2.60) with { IsOpaque = true };
        var sheet = new BenchSheet { Refractometer = new RefractometerObservation(RefractometerMethod.Spot, spot: 1.525), SpecificGravity = new(2.55, 0.01) };
        var advice = NextTestAdvisor.Advise(sheet, [(glassy, 0.4), (crystal, 0.4), (opaque, 0.2)])!;
        Assert.Equal(GemIndex.Core.Bench.BenchField.Polariscope, advice.Test);
        Assert.Contains("glassy: singly refractive", advice.Expectations);
        Assert.Contains("crystal: doubly refractive", advice.Expectations);
        Assert.Contains($"opaque: {NextTestAdvisor.OpaqueInPolariscope}", advice.Expectations);
    }

    [Fact]
    public void A_stone_said_to_be_opaque_is_advised_no_test_in_transmitted_light_and_no_inclusion_to_look_for()
    {
        // As above, with a thermal probe that tells them apart too (invented entries): the polariscope leads for a
        // translucent stone; for one the examiner says is opaque, no polariscope, dichroscope or fire is advised, and
        // under the loupe only what shows on a surface.
        var index = OpticalIndices.SingleIndex(new(1.52, 1.53));
        Material glassy = Make("glassy", "a", index, 2.50, 2.60);
        Material crystal = Make("crystal", "b", OpticalIndices.Uniaxial(new(1.52, 1.53), new(1.529, 1.535)), 2.50, 2.60, OpticSign.Positive, new(0.006, 0.009),
            thermal: ThermalProbeResult.Positive);
        var sheet = new BenchSheet { Refractometer = new RefractometerObservation(RefractometerMethod.Spot, spot: 1.525), SpecificGravity = new(2.55, 0.01) };
        var translucent = NextTestAdvisor.Advise(sheet with { Transparency = StoneTransparency.Translucent }, [(glassy, 0.5), (crystal, 0.5)])!;
        Assert.Equal(GemIndex.Core.Bench.BenchField.Polariscope, translucent.Test);
        var opaque = NextTestAdvisor.Advise(sheet with { Transparency = StoneTransparency.Opaque }, [(glassy, 0.5), (crystal, 0.5)]);
        Assert.NotNull(opaque);
        Assert.Equal(GemIndex.Core.Bench.BenchField.ThermalProbe, opaque.Test);
        // The loupe's choices for an opaque stone: surface features only.
        Assert.True(GemIndex.Core.Magnification.MagnificationVocabulary.Of(GemIndex.Core.Magnification.MagnificationFeature.ColourBanding).SeenOnTheSurface);
        Assert.True(GemIndex.Core.Magnification.MagnificationVocabulary.Of(GemIndex.Core.Magnification.MagnificationFeature.DyeInFractures).SeenOnTheSurface);
        Assert.False(GemIndex.Core.Magnification.MagnificationVocabulary.Of(GemIndex.Core.Magnification.MagnificationFeature.RoundGasBubbles).SeenOnTheSurface);
        Assert.False(GemIndex.Core.Magnification.MagnificationVocabulary.Of(GemIndex.Core.Magnification.MagnificationFeature.FilledFractureFlash).SeenOnTheSurface);
    }

    [Fact]
    public void A_spot_reading_beside_facet_steps_keeps_the_spot_s_own_precision()
    {
        // A bench may take a quick spot reading and then read a facet (a published mauve taaffeite: spot 1.71, facet
        // 1.713–1.720). The spot is judged at the spot method's σ 0.006 (a 90 % bound of about ±0.01, common practice), not
        // at the facet's 0.001; a precision the user gives beside steps is the facet's, and a spot alone takes the one given.
        var both = new RefractometerObservation(RefractometerMethod.Facet, [new ShadowEdgeStep(0, 1.713, 1.720)], spot: 1.71);
        Assert.Equal(RefractometerObservation.DefaultSpotPrecision, both.SpotPrecision);
        Assert.Equal(RefractometerObservation.DefaultFacetPrecision, both.ReadingPrecision);
        Assert.Equal(RefractometerObservation.DefaultSpotPrecision, new RefractometerObservation(RefractometerMethod.Facet, [new ShadowEdgeStep(0, 1.713, 1.720)], spot: 1.71, readingPrecision: 0.001).SpotPrecision);
        Assert.Equal(0.004, new RefractometerObservation(RefractometerMethod.Spot, spot: 1.71, readingPrecision: 0.004).SpotPrecision);
        // Opal (n 1.43–1.46 as this test catalogue holds it) with a spot 0.01 below its range beside a step: within the
        // spot's uncertainty, not ten standard deviations out.
        var result = Engine.Identify(new BenchSheet { Refractometer = new RefractometerObservation(RefractometerMethod.Facet, [new ShadowEdgeStep(0, 1.45)], spot: 1.42) }, 10, explainTop: 10);
        var spotReason = result.Candidates.Single(c => c.Material.Name == "opal").Reasons.Single(r => r.Text.StartsWith("spot reading", StringComparison.Ordinal));
        Assert.Contains("within the reading's uncertainty", spotReason.Text);
    }

    [Fact]
    public void A_series_of_the_other_uniaxial_sign_than_the_leader_s_is_named()
    {
        // Sapphire readings with the low edge held still: the pattern of a positive stone, while corundum is uniaxial
        // negative (ω 1.770 the constant high edge, ε 1.762; common practice). The test catalogue has no positive stone at
        // these indices, so sapphire still leads; the warning asks for the edges to be looked at again.
        var swapped = new BenchSheet { Refractometer = Facet((0, 1.762, 1.770), (45, 1.762, 1.768), (90, 1.762, 1.765), (135, 1.762, 1.769)), SpecificGravity = new SpecificGravity(4.00, 0.01) };
        var result = Engine.Identify(swapped);
        Assert.Equal("corundum", result.Species[0].Species);
        Assert.Contains(result.Warnings, w => w.StartsWith("The readings show a uniaxial positive pattern (the low edge stays still as the stone turns), but corundum is uniaxial negative", StringComparison.Ordinal));
        // The usual negative pattern (the high edge still): no warning.
        var usual = swapped with { Refractometer = Facet((0, 1.762, 1.770), (45, 1.764, 1.770), (90, 1.767, 1.770), (135, 1.765, 1.770)) };
        Assert.DoesNotContain(Engine.Identify(usual).Warnings, w => w.Contains("pattern", StringComparison.Ordinal));
        // A user's own corundum entry of the other sign among the candidates (far from these readings, so sapphire still
        // leads): the species holds both signs, so no warning.
        Material odd = Make("my odd corundum", "corundum", OpticalIndices.Uniaxial(new(1.600, 1.602), new(1.608, 1.610)), 3.99, 4.01, OpticSign.Positive, new(0.008, 0.008));
        var mixed = new Identifier([.. Catalogue, odd]).Identify(swapped);
        Assert.Equal("corundum", mixed.Species[0].Species);
        Assert.NotEqual(OpticSign.Positive, mixed.Candidates[0].Material.Sign);
        Assert.Contains(mixed.Candidates, c => c.Material.Name == "my odd corundum");
        Assert.DoesNotContain(mixed.Warnings, w => w.Contains("pattern", StringComparison.Ordinal));
    }

    [Fact]
    public void Over_the_limit_the_answer_names_only_the_tests_not_yet_done()
    {
        // Over the limit (common practice: SG, fire, the thermal probe, or a reflectance meter go beyond a refractometer).
        var over = new BenchSheet { Refractometer = new RefractometerObservation(RefractometerMethod.Facet, overLimit: true) };
        Assert.Contains(Engine.Identify(over).Warnings, w => w.EndsWith("SG, dispersion, the thermal probe or a reflectance meter (or a prism method) can go further.", StringComparison.Ordinal));
        var done = over with { SpecificGravity = new SpecificGravity(3.52, 0.01), ThermalProbe = ThermalProbeResult.Positive, Dispersion = DispersionObservation.ByEye(DispersionStrength.Strong) };
        Assert.Contains(Engine.Identify(done).Warnings, w => w.EndsWith("higher. A reflectance meter (or a prism method) can go further.", StringComparison.Ordinal));
        // With the reflectance meter read too, only the prism method is left to offer.
        Assert.Contains(Engine.Identify(done with { Reflectance = new ReflectanceReading(17.2) }).Warnings, w => w.EndsWith("higher. A prism method can go further.", StringComparison.Ordinal));
        // A heavy liquid only bounds the SG: a measured one is still offered (it parts diamond 3.52, YAG 4.55 and CZ 5.8, from memory).
        var sank = over with { HeavyLiquids = [new HeavyLiquidResult(new SpecificGravity(3.32), HeavyLiquidOutcome.Sinks)] };
        Assert.Contains(Engine.Identify(sank).Warnings, w => w.EndsWith("SG, dispersion, the thermal probe or a reflectance meter (or a prism method) can go further.", StringComparison.Ordinal));
        // Low edges read, the high edge above the liquid: the warning says so rather than "no stone edge".
        var lowOnly = new BenchSheet { Refractometer = new RefractometerObservation(RefractometerMethod.Facet, [new ShadowEdgeStep(0, 1.780), new ShadowEdgeStep(90, 1.781)], overLimit: true) };
        Assert.Contains(Engine.Identify(lowOnly).Warnings, w => w.StartsWith("Over the limit: the high edge lies above the liquid's 1.79; only the low edge was read", StringComparison.Ordinal));
    }

    [Fact]
    public void A_species_also_found_treated_is_cautioned_of_treatments_not_of_growth()
    {
        // Invented entries: a natural kind and a treated one of the same species that the SG rules out. The caution stays
        // (a treatment can leave no sign these tests find) and speaks of treatments only, with no laboratory growth.
        var index = OpticalIndices.SingleIndex(new(1.52, 1.53));
        Material plain = Make("plain kind", "x", index, 2.50, 2.60);
        Material treated = Make("treated kind", "x", index, 2.90, 3.00, origin: OriginClass.Treated);
        var sheet = new BenchSheet { Refractometer = new RefractometerObservation(RefractometerMethod.Spot, spot: 1.525), SpecificGravity = new SpecificGravity(2.55, 0.01) };
        var caution = Assert.Single(new Identifier([plain, treated]).Identify(sheet).Warnings, w => w.StartsWith("X is also found", StringComparison.Ordinal));
        Assert.StartsWith("X is also found treated: many treatments (heating, filling, dyeing, irradiation, coating) leave no sign these tests find", caution);
        Assert.DoesNotContain("growth", caution);
    }

    [Fact]
    public void A_species_also_found_cultured_is_cautioned_of_culturing()
    {
        // Invented entries: a natural kind, and a cultured and a treated one of the same species that the SG rules out.
        // Both hidden origins are named, in the order of the species' origins, with what can hide them.
        var index = OpticalIndices.SingleIndex(new(1.52, 1.53));
        Material plain = Make("plain kind", "x", index, 2.50, 2.60);
        Material cultured = Make("cultured kind", "x", index, 2.90, 3.00, origin: OriginClass.Cultured);
        Material treated = Make("treated kind", "x", index, 2.90, 3.00, origin: OriginClass.Treated);
        var sheet = new BenchSheet { Refractometer = new RefractometerObservation(RefractometerMethod.Spot, spot: 1.525), SpecificGravity = new SpecificGravity(2.55, 0.01) };
        var caution = Assert.Single(new Identifier([plain, cultured, treated]).Identify(sheet).Warnings, w => w.StartsWith("X is also found", StringComparison.Ordinal));
        Assert.StartsWith("X is also found cultured and treated: many treatments and culturing leave no sign these tests find", caution);
        var onlyCultured = Assert.Single(new Identifier([plain, cultured]).Identify(sheet).Warnings, w => w.StartsWith("X is also found", StringComparison.Ordinal));
        Assert.StartsWith("X is also found cultured: culturing leaves no sign these tests find", onlyCultured);
    }

    [Fact]
    public void A_caution_stays_however_few_candidates_are_shown()
    {
        // Two invented entries alike in every reading, the porous one less common: shown one candidate, the answer still
        // says not to immerse the porous one, which holds a serious share (at least 5 %).
        var index = OpticalIndices.SingleIndex(new(1.52, 1.53));
        Material common = Make("common kind", "a", index, 2.50, 2.60, frequency: BenchFrequency.VeryCommon);
        Material porous = Make("porous kind", "b", index, 2.50, 2.60, porous: true, frequency: BenchFrequency.Occasional);
        var sheet = new BenchSheet { Refractometer = new RefractometerObservation(RefractometerMethod.Spot, spot: 1.525) };
        var one = new Identifier([common, porous]).Identify(sheet, 1);
        Assert.Equal(["common kind"], one.Candidates.Select(c => c.Material.Name));
        Assert.Contains(one.Warnings, w => w.StartsWith("Possible porous kind: do not immerse", StringComparison.Ordinal));
        Assert.Equal(new Identifier([common, porous]).Identify(sheet).Warnings, one.Warnings);
    }

    [Fact]
    public void A_heavy_liquid_beside_a_weighed_SG_says_only_what_the_weighing_leaves_open()
    {
        // Zoisite's SG 3.15–3.38 (handbook values, from memory). Weighed at 3.35 ± 0.01, "sinks in 3.32" follows from the
        // weighing itself: it must not count against zoisite as if most of its range floated (weighed alone it had, by a
        // factor of about (3.38 − 3.32)/(3.38 − 3.15) against the even chance of a stone the catalogue lacks).
        var index = OpticalIndices.SingleIndex(new(1.69, 1.70));
        Material zoisite = Make("zoisite", "z", index, 3.15, 3.38);
        var sinks = EvidenceLikelihood.LiquidBounds(new BenchSheet { SpecificGravity = new(3.35, 0.01), HeavyLiquids = [HeavyLiquidResult.Of(3.32, HeavyLiquidOutcome.Sinks)] })!;
        Assert.Equal(1, EvidenceLikelihood.LiquidsGivenGravity(zoisite, sinks)!.Value / sinks.Broad, 0.05);
        // A coarse weighing (a small stone, ± 0.11) leaves room the liquid closes: a stone that floats in 3.90 is no
        // corundum (3.97–4.05), though its SG of 3.88 alone would allow one.
        Material corundum = Make("corundum", "c", index, 3.97, 4.05);
        var floats = EvidenceLikelihood.LiquidBounds(new BenchSheet { SpecificGravity = new(3.88, 0.11), HeavyLiquids = [HeavyLiquidResult.Of(3.90, HeavyLiquidOutcome.Floats)] })!;
        double ratio = EvidenceLikelihood.LiquidsGivenGravity(corundum, floats)!.Value / floats.Broad;
        Assert.True(ratio < 0.01, $"{ratio}");
    }

    [Fact]
    public void A_long_list_of_stones_to_keep_dry_names_the_three_likeliest_and_counts_the_rest()
    {
        Assert.Equal("amber", BenchWarnings.KeepDryListed(["amber"]));
        Assert.Equal("amber, copal, pressed amber and heated amber", BenchWarnings.KeepDryListed(["amber", "copal", "pressed amber", "heated amber"]));
        Assert.Equal("amber, copal, pressed amber and 3 more candidates",
            BenchWarnings.KeepDryListed(["amber", "copal", "pressed amber", "heated amber", "blue amber", "autoclave-treated copal"]));
    }

    [Fact]
    public void A_porous_entry_below_the_warnings_share_is_kept_dry_when_its_species_leads()
    {
        // Invented entries alike in every reading: the leading species, of a common porous kind and a rare porous kind (under
        // 5 % on its own), and two other species. The rare porous kind is named, in the warning and on the SG page alike; a
        // porous kind of another species under 5 % is not.
        var index = OpticalIndices.SingleIndex(new(1.52, 1.53));
        Material treated = Make("common t", "t", index, 2.50, 2.60, porous: true, frequency: BenchFrequency.VeryCommon);
        Material natural = Make("rare t", "t", index, 2.50, 2.60, porous: true, frequency: BenchFrequency.VeryRare);
        Material other = Make("other", "o", index, 2.50, 2.60, frequency: BenchFrequency.VeryCommon) with { SpeciesFrequency = BenchFrequency.Common };
        Material rare = Make("rare porous", "r", index, 2.50, 2.60, porous: true) with { SpeciesFrequency = BenchFrequency.VeryRare };
        var sheet = new BenchSheet { Refractometer = new RefractometerObservation(RefractometerMethod.Spot, spot: 1.525) };
        var result = new Identifier([treated with { SpeciesFrequency = BenchFrequency.VeryCommon }, natural with { SpeciesFrequency = BenchFrequency.VeryCommon }, other, rare]).Identify(sheet);
        Assert.Equal("t", result.Species[0].Species);
        double Share(string name) => result.Candidates.Single(c => c.Material.Name == name).Confidence;
        Assert.InRange(Share("rare t"), BenchWarnings.Relevant / 10, BenchWarnings.Relevant);
        Assert.InRange(Share("rare porous"), 0, BenchWarnings.Relevant);
        Assert.True(result.Species.Single(x => x.Species == "r").Confidence < BenchWarnings.Relevant);
        Assert.Equal(["common t", "rare t"], result.KeepDry);
        Assert.Contains(result.Warnings, w => w.StartsWith("Possible common t and rare t: do not immerse", StringComparison.Ordinal));
        // Heavy liquids never; water only where the stone is known to take it (common practice: amber's salt-water float test).
        Assert.Contains(result.Warnings, w => w.Contains("do not immerse (no heavy liquids, and no water unless the stone is known to take it)", StringComparison.Ordinal)
            && w.EndsWith("amber and copal take the saturated brine test, a doublet's join is looked for in water, a porous stone takes neither.", StringComparison.Ordinal));

        // A leading species whose stones to keep dry are a small part of it (a sapphire beside its rare filled and
        // assembled kin) does not ban the routine weighing: the rare porous kind under 5 % is not named.
        Material plain = Make("plain t", "t", index, 2.50, 2.60, frequency: BenchFrequency.VeryCommon) with { SpeciesFrequency = BenchFrequency.VeryCommon };
        var mostlyDry = new Identifier([plain, natural with { SpeciesFrequency = BenchFrequency.VeryCommon }, other]).Identify(sheet);
        Assert.Equal("t", mostlyDry.Species[0].Species);
        Assert.InRange(mostlyDry.Candidates.Single(c => c.Material.Name == "rare t").Confidence, BenchWarnings.Relevant / 10, BenchWarnings.Relevant);
        Assert.Empty(mostlyDry.KeepDry);
    }

    [Fact]
    public void An_opaque_entry_takes_no_evidence_from_fire_judged_by_eye()
    {
        // Fire is judged in light that has passed through the stone (common practice): an opaque entry with a strong
        // dispersion (invented, like a black andradite's 0.057) is neither helped nor hurt by "no fire", while the same
        // entry transparent is.
        var index = OpticalIndices.SingleIndex(new(1.52, 1.53));
        Material plain = Make("plain", "a", index, 2.50, 2.60);
        Material dark = Make("dark", "b", index, 2.50, 2.60, dispersion: 0.057) with { IsOpaque = true };
        var sheet = new BenchSheet { Refractometer = new RefractometerObservation(RefractometerMethod.Spot, spot: 1.525), SpecificGravity = new(2.55, 0.01) };
        var noFire = sheet with { Dispersion = DispersionObservation.ByEye(DispersionStrength.None) };
        double Share(Material[] catalogue, BenchSheet s) => new Identifier(catalogue).Identify(s).Candidates.Single(c => c.Material.Name == "dark").Confidence;
        Assert.Equal(Share([plain, dark], sheet), Share([plain, dark], noFire), 9);
        Assert.True(Share([plain, dark with { IsOpaque = false }], noFire) < 0.5 * Share([plain, dark with { IsOpaque = false }], sheet));
    }

    [Fact]
    public void The_next_test_names_a_rival_species_not_only_the_varieties_of_the_leading_one()
    {
        // Six varieties of one species lead, each ahead of the one rival species' entry; the probe tells the species
        // apart (invented entries): the advice must name the rival and what it would show.
        var indices = OpticalIndices.Uniaxial(new(1.767, 1.772), new(1.759, 1.763));
        var varieties = Enumerable.Range(1, 6).Select(k => (Make($"variety {k}", "leading", indices, 3.99, 4.01, OpticSign.Negative, new(0.008, 0.009)), 0.13)).ToList();
        Material rival = Make("rival", "other", indices, 3.99, 4.01, OpticSign.Negative, new(0.008, 0.009), thermal: ThermalProbeResult.Positive);
        var sheet = new BenchSheet { Refractometer = Facet((0, 1.762, 1.770), (45, 1.764, 1.770), (90, 1.767, 1.770), (135, 1.765, 1.770)) };
        var advice = NextTestAdvisor.Advise(sheet, [.. varieties, (rival, 0.1)])!;
        Assert.Equal(GemIndex.Core.Bench.BenchField.ThermalProbe, advice.Test);
        Assert.Equal("variety 1", advice.Separates[0]);
        Assert.Contains("rival", advice.Separates);
        // The varieties that would all read the same share one line; the rival's reading stands apart.
        Assert.Equal(2, advice.Expectations.Count);
        Assert.StartsWith("variety 1, variety 2, variety 3 and variety 4: negative", advice.Expectations[0]);
        Assert.StartsWith("rival: positive", advice.Expectations[1]);
        Assert.Equal("variety 1, variety 2, variety 3 and variety 4 from rival", advice.SeparatesInWords);
    }

    [Fact]
    public void When_every_leader_would_show_the_same_the_advice_names_what_the_test_tells_them_from()
    {
        // Five invented entries of one species lead alike; a sixth, less likely than the advice's leader share, is the one
        // the probe would tell apart. The lines must show that contrast rather than five identical readings.
        var indices = OpticalIndices.Uniaxial(new(1.767, 1.772), new(1.759, 1.763));
        var alike = Enumerable.Range(1, 5).Select(k => (Make($"variety {k}", "leading", indices, 3.99, 4.01, OpticSign.Negative, new(0.008, 0.009)), 0.19)).ToList();
        Material apart = Make("conductor", "leading", indices, 3.99, 4.01, OpticSign.Negative, new(0.008, 0.009), thermal: ThermalProbeResult.Positive);
        var sheet = new BenchSheet { Refractometer = Facet((0, 1.762, 1.770), (45, 1.764, 1.770), (90, 1.767, 1.770), (135, 1.765, 1.770)) };
        var advice = NextTestAdvisor.Advise(sheet, [.. alike, (apart, 0.015)])!;
        Assert.Equal(GemIndex.Core.Bench.BenchField.ThermalProbe, advice.Test);
        Assert.Equal(["variety 1, variety 2, variety 3, variety 4 and variety 5: negative", "conductor: positive"],
            advice.Expectations.Select(e => e.Split(" (")[0]).ToArray());
        Assert.Equal("variety 1, variety 2, variety 3, variety 4 and variety 5 from conductor", advice.SeparatesInWords);
    }

    [Fact]
    public void An_SG_that_a_heavy_liquid_result_contradicts_is_said_with_both()
    {
        // A stone of SG 3.99 sinks in a liquid of 3.32 (the definition of the test; common practice).
        var floats = new HeavyLiquidResult(new SpecificGravity(3.32), HeavyLiquidOutcome.Floats);
        var clash = Engine.Identify(new BenchSheet { SpecificGravity = new SpecificGravity(3.99, 0.01), HeavyLiquids = [floats] });
        Assert.Contains(clash.Warnings, w => w.StartsWith("SG 3.99 and the heavy liquid 3.32 (floats) disagree: a stone of that SG would sink", StringComparison.Ordinal));
        var agrees = Engine.Identify(new BenchSheet { SpecificGravity = new SpecificGravity(2.65, 0.01), HeavyLiquids = [floats] });
        Assert.DoesNotContain(agrees.Warnings, w => w.Contains("disagree", StringComparison.Ordinal));
        // Within two standard uncertainties of the liquid: no clash said (3.33 ± 0.01 "floats" in 3.32).
        Assert.DoesNotContain(Engine.Identify(new BenchSheet { SpecificGravity = new SpecificGravity(3.33, 0.01), HeavyLiquids = [floats] }).Warnings,
            w => w.Contains("disagree", StringComparison.Ordinal));
    }

    [Fact]
    public void Colour_alone_never_decides_the_origin()
    {
        // The natural entry lists blue, the treated one orange (invented shares, both common): an orange stone read only on
        // the refractometer leans to the treated entry by colour, but colour lists by origin are the market's usual colours,
        // so the split is held at the cap. An SG that only the treated entry can give decides it.
        Material natural = Make("blue stone", "corundum", OpticalIndices.Uniaxial(new(1.767, 1.772), new(1.759, 1.763)), 3.99, 4.01, OpticSign.Negative,
            new(0.008, 0.009), frequency: BenchFrequency.Common) with { Colours = ["blue"] };
        Material treated = Make("orange treated stone", "corundum", OpticalIndices.Uniaxial(new(1.767, 1.772), new(1.759, 1.763)), 3.99, 4.01, OpticSign.Negative,
            new(0.008, 0.009), frequency: BenchFrequency.Common, origin: OriginClass.Treated) with { Colours = ["orange"] };
        var engine = new Identifier([natural, treated, Catalogue[0]]);
        var series = Facet((0, 1.762, 1.770), (45, 1.764, 1.770), (90, 1.767, 1.770), (135, 1.765, 1.770));
        var byColour = engine.Identify(new BenchSheet { Refractometer = series, Colour = "orange" }).Species.Single(s => s.Species == "corundum");
        Assert.Equal(OriginBalance.Cap * byColour.Confidence, byColour.Origins[OriginClass.Treated], 9);

        Material denser = treated with { SpecificGravity = new(4.20, 4.25) };
        var bySg = new Identifier([natural, denser, Catalogue[0]]).Identify(new BenchSheet
        {
            Refractometer = series, Colour = "orange", SpecificGravity = new SpecificGravity(4.22, 0.01),
        }).Species.Single(s => s.Species == "corundum");
        Assert.True(bySg.Origins[OriginClass.Treated] > 0.95 * bySg.Confidence, $"treated {bySg.Origins[OriginClass.Treated]} of {bySg.Confidence}");
    }

    [Fact]
    public void A_leader_with_an_impossible_reading_does_not_make_nothing_fit_while_a_rival_fits_everything()
    {
        // Over the limit at 1.80 with SG 4.02: a corundum-like entry (n 1.76–1.77, very common) cannot be over the limit, a
        // low-zircon-like entry (ω 1.80–1.84, SG 3.95–4.20) can. Whichever leads, a candidate that fits every test exists.
        Material corundumLike = Make("sapphire", "corundum", OpticalIndices.Uniaxial(new(1.767, 1.772), new(1.759, 1.763)), 4.015, 4.025, OpticSign.Negative,
            new(0.008, 0.009), frequency: BenchFrequency.VeryCommon) with { Colours = ["colourless"] };
        Material zirconLike = Make("low zircon", "zircon", OpticalIndices.Uniaxial(new(1.80, 1.84), new(1.805, 1.845)), 3.50, 4.60, OpticSign.Positive,
            new(0.0, 0.008), frequency: BenchFrequency.VeryRare);
        var engine = new Identifier([corundumLike, zirconLike]);
        var result = engine.Identify(new BenchSheet
        {
            Refractometer = new RefractometerObservation(RefractometerMethod.Facet, overLimit: true, liquidLimit: 1.80),
            SpecificGravity = new SpecificGravity(4.02, 0.01), Colour = "colourless",
        });
        Assert.True(result.Candidates[0].Material.Name == "sapphire", string.Join("; ", result.Candidates.Select(c => $"{c.Material.Name} {c.Confidence:0.000} fit {c.Fit:0.00}")) + $"; other {result.NotInCatalogue:0.000}");   // the leader, on SG, colour and its prior
        Assert.False(result.NoGoodMatch);
        Assert.True(result.NotInCatalogue < 0.5, $"not in the catalogue {result.NotInCatalogue}");
        Assert.Contains(result.Candidates, c => c.Material.Name == "low zircon" && c.Fit > Identifier.MinimumFit);
    }

    [Fact]
    public void With_one_feature_left_to_look_for_the_advice_still_works()
    {
        // Every feature but one recorded as looked for and not seen: the look, if advised, is that one feature alone.
        var all = GemIndex.Core.Magnification.MagnificationVocabulary.All.Select(i => i.Feature).ToList();
        var sheet = new BenchSheet
        {
            Refractometer = Facet((0, 1.762, 1.770), (45, 1.764, 1.770), (90, 1.767, 1.770), (135, 1.765, 1.770)),
            Magnification = new GemIndex.Core.Magnification.MagnificationObservation([], all.Skip(1)),
        };
        var result = Engine.Identify(sheet);
        Assert.NotEmpty(result.Candidates);
        if (result.NextTest is { Test: "magnification" } next) Assert.Equal([GemIndex.Core.Magnification.MagnificationVocabulary.Of(all[0]).Name], next.LookFor);
    }

    [Fact]
    public void The_inseparable_origins_are_given_as_data_beside_the_warning_that_says_them()
    {
        // Corundum ω 1.770, ε 1.762 (common practice): natural and synthetic sapphire share every reading here.
        var result = Engine.Identify(new BenchSheet { Refractometer = Facet((0, 1.762, 1.770), (45, 1.764, 1.770), (90, 1.767, 1.770), (135, 1.765, 1.770)) });
        var held = Assert.IsType<InseparableOrigins>(result.InseparableOrigins);
        Assert.Equal("corundum", held.Species);
        Assert.Equal([OriginClass.Natural, OriginClass.Synthetic], held.Origins.Order());
        Assert.Contains(result.Warnings, w => w.StartsWith("Corundum: ", StringComparison.Ordinal) && w.Contains("cannot be separated", StringComparison.Ordinal)
            && (held.Test is null ? w.Contains("no bench test left", StringComparison.Ordinal) : w.Contains($"the {held.Test.Description} would help", StringComparison.Ordinal)));
    }

    [Fact]
    public void The_next_test_is_named_in_plain_words() =>
        Assert.Equal("hand spectroscope (absorption lines)", GemIndex.Core.Bench.BenchTestWords.DisplayOfWire("absorption_nm"));

    [Fact]
    public void A_biaxial_stone_with_beta_near_alpha_is_not_penalised_for_looking_uniaxial()
    {
        // Topaz is biaxial + with β only about 0.003 above α (from memory), so its low edge stays within the constant band
        // on every facet. A uniaxial decoy with the same ranges (invented for this test) must not win ten to one. Under these
        // ranges topaz's β − α may be anything from 0 to the birefringence, and only the part of that with β near α fits a
        // low edge that moves by at most 0.001, so odds of about one to three are the honest answer; neither may fall below
        // one in ten.
        var topaz = Make("topaz", "topaz", OpticalIndices.Biaxial(new(1.610, 1.620), new(1.613, 1.623), new(1.620, 1.630)), 3.53, 3.57,
            OpticSign.Positive, new(0.008, 0.010));
        var decoy = Make("decoy", "decoy", OpticalIndices.Uniaxial(new(1.610, 1.620), new(1.620, 1.630)), 3.53, 3.57, OpticSign.Positive, new(0.008, 0.010));
        var sheet = new BenchSheet { Refractometer = Facet((0, 1.615, 1.624), (45, 1.616, 1.622), (90, 1.616, 1.619), (135, 1.615, 1.621)) };
        var result = new Identifier([topaz, decoy]).Identify(sheet);
        double topazShare = result.Candidates.Single(c => c.Material.Name == "topaz").Confidence;
        double decoyShare = result.Candidates.Single(c => c.Material.Name == "decoy").Confidence;
        Assert.True(topazShare >= 0.1, $"topaz {topazShare:0.00}");
        Assert.True(decoyShare >= 0.1, $"decoy {decoyShare:0.00}");
    }
}
