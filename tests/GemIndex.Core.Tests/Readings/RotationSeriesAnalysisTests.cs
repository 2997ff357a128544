using GemIndex.Core.Optics;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Core.Quantities;
using GemIndex.Core.Readings;

namespace GemIndex.Core.Tests.Readings;

using IndicatrixModel = GemIndex.Core.Optics.Indicatrix.Indicatrix;

public class RotationSeriesAnalysisTests
{
    // Readings are simulated from the indicatrix section model (Optics/Indicatrix) on random facets, rounded to 0.001
    // as a bench reading is; the analysis must recover what the published indices say.
    private static List<ShadowEdgeStep> Series(IndicatrixModel truth, Direction facet, double stepDegrees = 15, bool singleEdge = false) =>
        [.. RotationSeries.Simulate(truth, facet, Angle.FromDegrees(stepDegrees)).Select(s => new ShadowEdgeStep(
            s.Rotation.Degrees, Math.Round(s.Low.Value, 3), singleEdge ? null : Math.Round(s.High.Value, 3)))];

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    public void Quartz_reads_uniaxial_positive_with_omega_1_544(int seed)
    {
        // Quartz ω 1.544, ε 1.553, uniaxial + (Handbook of Mineralogy, from memory).
        var quartz = IndicatrixModel.Uniaxial(new RefractiveIndex(1.544), new RefractiveIndex(1.553));
        var result = RotationSeriesAnalysis.Analyse(Series(quartz, Direction.RandomUniform(new Random(seed))), 0.001);
        Assert.Equal(OpticCharacter.Uniaxial, result.Character);
        var h = Assert.Single(result.Interpretations);
        Assert.Equal(OpticSign.Positive, h.Sign);
        // Tolerance: rounding to 0.001 moves a reading by at most 0.0005.
        Assert.Equal(1.544, h.Constant!.Value.Value, 0.0006);
        Assert.Equal(0.009, h.Birefringence.Value, 0.0011);
    }

    [Fact]
    public void A_high_edge_fitted_above_the_contact_liquid_is_said_as_above_it_not_as_read()
    {
        // Epidote-like edges (invented readings): the high edge passes a 1.79 liquid at 60° and 90° and is read elsewhere.
        // The fitted γ (about 1.796) lies above the liquid: the reading says so, and the birefringence is at least
        // 1.790 − α; read against a 1.81 liquid nothing changes.
        ShadowEdgeStep[] steps = [new(0, 1.733, 1.770), new(30, 1.738, 1.781), new(60, 1.742, null), new(90, 1.745, null), new(120, 1.740, 1.786), new(150, 1.735, 1.776)];
        var analysed = RotationSeriesAnalysis.Analyse(steps, 0.001);
        SeriesInterpretation fitted = analysed.Interpretations[0];
        Assert.True(fitted.Highest.Value > 1.79, $"fitted highest {fitted.Highest.Value}");
        var read = RotationSeriesAnalysis.ReadAgainst(analysed, 1.79);
        Assert.All(read.Interpretations, i =>
        {
            Assert.Equal(1.79, i.AboveLiquidLimit);
            Assert.Contains("γ above the liquid 1.790 (about ", i.Description);
            Assert.Contains($"birefringence at least {1.790 - i.Lowest.Value:0.000}", i.Description);
            Assert.Equal(fitted.Highest, i.Highest);   // the estimate is kept for the ranking's summaries; only its words change
        });
        Assert.All(RotationSeriesAnalysis.ReadAgainst(analysed, 1.81).Interpretations, i => Assert.Null(i.AboveLiquidLimit));
        // A uniaxial series read well below the liquid is left as it was.
        var quartz = RotationSeriesAnalysis.Analyse([new(0, 1.544, 1.553), new(45, 1.544, 1.551), new(90, 1.544, 1.548), new(135, 1.544, 1.550)], 0.001);
        Assert.Equal(quartz.Interpretations.Select(i => i.Description), RotationSeriesAnalysis.ReadAgainst(quartz, 1.79).Interpretations.Select(i => i.Description));
    }

    [Fact]
    public void Steps_whose_high_edge_the_liquid_hid_keep_their_low_edges_and_leave_the_highest_index_above_the_liquid()
    {
        // Epidote-like principal values α 1.748, β 1.776, γ 1.796 (handbook values from memory), the edges worked out by the
        // indicatrix section for the facet normal (0.3, 0.5, 0.8) every 30° and read on a 1.79 liquid: the high edge
        // (1.790-1.796) does not show at 0°, 90°, 120° and 150°. The two steps that show it had given α 1.756, γ 1.788 and
        // a birefringence of 0.032 as if read; the readings show α 1.748 and at least 1.790 − 1.748 = 0.042.
        ShadowEdgeStep[] steps = [new(0, 1.775, null), new(30, 1.772, 1.786), new(60, 1.756, 1.788), new(90, 1.748, null), new(120, 1.755, null), new(150, 1.767, null)];
        var analysed = RotationSeriesAnalysis.Analyse(steps, 0.001);
        Assert.Equal([0.0, 90, 120, 150], analysed.HighHiddenAtDegrees);
        Assert.True(analysed.HighHiddenBy(1.79));
        // The biaxial readings (as the front ends show them, weighed by the character's posterior).
        var biaxial = RotationSeriesAnalysis.EveryCharacter(steps, 0.001)!.Where(i => i.Character == OpticCharacter.Biaxial)
            .Select(i => RotationSeriesAnalysis.ReadAgainst(i, 1.79, analysed.HighHiddenBy(1.79))).ToList();
        Assert.Equal(2, biaxial.Count);
        Assert.All(biaxial, i =>
        {
            Assert.Equal(1.79, i.AboveLiquidLimit);
            Assert.Contains("α 1.748", i.Description);
            Assert.Contains("γ above the liquid 1.790,", i.Description);   // no fitted value: the steps that show γ fit below the liquid
            Assert.Contains("birefringence at least 0.042", i.Description);
        });
        Assert.Contains(biaxial, i => i.Beta is { } b && Math.Abs(b.Value - 1.775) < 1e-9);   // the highest low edge, a hidden step's
        // With γ only known to lie above 1.790, the sign is open: negative only if γ < 2β − α (1.802 for β 1.775).
        Assert.All(biaxial, i => Assert.True(i.SignOpen));
        Assert.Contains(biaxial, i => i.Description.StartsWith("biaxial, sign open (negative only if γ < 1.802)", StringComparison.Ordinal));
        // Where 2β − α lies at or below the liquid, γ above it makes the sign positive (β 1.760 with α 1.748: 1.772).
        var positive = RotationSeriesAnalysis.ReadAgainst(biaxial[0] with { Beta = new GemIndex.Core.Optics.RefractiveIndex(1.760), SignOpen = false, Sign = OpticSign.Negative,
            AboveLiquidLimit = null, Description = "biaxial negative x: α 1.748, β 1.760, γ 1.788, birefringence 0.040", Highest = new GemIndex.Core.Optics.RefractiveIndex(1.788) }, 1.79, highHidden: true);
        Assert.Equal((OpticSign.Positive, false), (positive.Sign, positive.SignOpen));
        Assert.StartsWith("biaxial positive x", positive.Description, StringComparison.Ordinal);
        // The same edges typed at 15° steps leave the character open (a gap of 105°): the two edges are still said with
        // the lowest low edge and a high one above the liquid.
        ShadowEdgeStep[] coarse = [.. steps.Select((x, i) => new ShadowEdgeStep(15 * i, x.Low, x.High))];
        var open = RotationSeriesAnalysis.ReadAgainst(RotationSeriesAnalysis.Analyse(coarse, 0.001), 1.79).Interpretations.Single();
        Assert.Equal("two edges, 1.748 and one above the liquid 1.790 at some steps: doubly refractive, birefringence at least 0.042", open.Description);
        Assert.Equal(1.79, open.AboveLiquidLimit);
        // Read against a liquid far above every high edge read, the unseen high edges were missed, not hidden: no "above".
        Assert.False(analysed.HighHiddenBy(1.85));
        Assert.All(RotationSeriesAnalysis.ReadAgainst(analysed, 1.85).Interpretations, i => Assert.Null(i.AboveLiquidLimit));
    }

    [Fact]
    public void A_single_edge_where_a_uniaxial_stones_edges_meet_is_not_taken_for_a_hidden_high_edge()
    {
        // Tourmaline-like ω 1.644, ε 1.624 (handbook values from memory): at 90° the two edges meet and one edge is read.
        ShadowEdgeStep[] steps = [new(0, 1.624, 1.644), new(30, 1.628, 1.644), new(60, 1.637, 1.644), new(90, 1.644, null), new(120, 1.637, 1.644), new(150, 1.628, 1.644)];
        var analysed = RotationSeriesAnalysis.Analyse(steps, 0.001);
        Assert.Empty(analysed.HighHiddenAtDegrees);
        Assert.All(RotationSeriesAnalysis.ReadAgainst(analysed, 1.79).Interpretations, i => Assert.Null(i.AboveLiquidLimit));
    }

    [Fact]
    public void Corundum_reads_uniaxial_negative_with_omega_1_770()
    {
        // Corundum ω 1.770, ε 1.762, uniaxial − (common practice, from memory).
        var corundum = IndicatrixModel.Uniaxial(new RefractiveIndex(1.770), new RefractiveIndex(1.762));
        var result = RotationSeriesAnalysis.Analyse(Series(corundum, new Direction(1, 0.3, 0.4)), 0.001);
        var h = Assert.Single(result.Interpretations);
        Assert.Equal(OpticSign.Negative, h.Sign);
        Assert.Equal(1.770, h.Constant!.Value.Value, 0.0006);
        Assert.Equal(1.762, h.Lowest.Value, 0.0011);
    }

    [Fact]
    public void A_facet_across_the_optic_axis_carries_both_signs()
    {
        // Both edges constant (ω and ε): the sign needs more evidence (DOMAIN.md §3).
        var quartz = IndicatrixModel.Uniaxial(new RefractiveIndex(1.544), new RefractiveIndex(1.553));
        var result = RotationSeriesAnalysis.Analyse(Series(quartz, Direction.AlongZ), 0.001);
        Assert.Equal(OpticCharacter.Uniaxial, result.Character);
        Assert.Equal([OpticSign.Positive, OpticSign.Negative], result.Interpretations.Select(h => h.Sign));
        Assert.All(result.Interpretations, h => Assert.Equal(0.5, h.Weight));
    }

    [Fact]
    public void The_birefringence_in_words_is_the_difference_of_the_indices_shown_beside_it()
    {
        // A sapphire read at four steps, both edges held (published readings of corundum: ω 1.770, ε 1.762, common
        // practice): the means are 1.76225 and 1.76975, 0.0075 apart, but the line shows 1.762 and 1.770, so it says 0.008.
        ShadowEdgeStep[] steps = [new(0, 1.762, 1.770), new(45, 1.762, 1.769), new(90, 1.762, 1.770), new(135, 1.763, 1.770)];
        var result = RotationSeriesAnalysis.Analyse(steps, 0.001);
        Assert.Equal(2, result.Interpretations.Count);
        Assert.Contains(result.Interpretations, h => h.Description == "uniaxial positive: ω 1.762 constant, ε 1.770, birefringence 0.008");
        Assert.Contains(result.Interpretations, h => h.Description == "uniaxial negative: ω 1.770 constant, ε 1.762, birefringence 0.008");
    }

    [Fact]
    public void A_biaxial_series_carries_both_beta_hypotheses_and_one_is_right()
    {
        // Peridot-like α 1.654, β 1.672, γ 1.690 (from memory); β is either the highest low or the lowest high edge.
        var truth = IndicatrixModel.Biaxial(new RefractiveIndex(1.654), new RefractiveIndex(1.672), new RefractiveIndex(1.690));
        var result = RotationSeriesAnalysis.Analyse(Series(truth, new Direction(0.3, 0.5, 0.8), 10), 0.001);
        Assert.Equal(OpticCharacter.Biaxial, result.Character);
        Assert.Equal(2, result.Interpretations.Count);
        Assert.Contains(result.Interpretations, h => Math.Abs(h.Beta!.Value.Value - 1.672) <= 0.0006);
        Assert.All(result.Interpretations, h => Assert.Equal(1.654, h.Lowest.Value, 0.0011));
    }

    [Fact]
    public void Where_the_highest_low_edge_and_the_lowest_high_edge_read_the_same_beta_is_read_once()
    {
        // β is the highest low edge or the lowest high edge (DOMAIN.md §3); read the same, the two readings are one, not
        // two rows with the same indices that add up to more than the biaxial share.
        ShadowEdgeStep[] steps = [new(0, 1.577, 1.582), new(60, 1.582, 1.586), new(120, 1.579, 1.584)];
        var biaxial = RotationSeriesAnalysis.EveryCharacter(steps, 0.001)!.Where(i => i.Character == OpticCharacter.Biaxial).ToList();
        var one = Assert.Single(biaxial);
        Assert.Equal(1, one.Weight);
        Assert.Equal(1.582, one.Beta!.Value.Value, 0.0006);
        Assert.Equal("biaxial negative with β where the low and high edges meet: α 1.577, β 1.582, γ 1.586, birefringence 0.009", one.Description);
    }

    [Fact]
    public void One_constant_edge_is_isotropic()
    {
        // Spinel n 1.718 (from memory).
        var spinel = IndicatrixModel.Isotropic(new RefractiveIndex(1.718));
        var result = RotationSeriesAnalysis.Analyse(Series(spinel, Direction.AlongX, 30, singleEdge: true), 0.001);
        Assert.Equal(OpticCharacter.Isotropic, result.Character);
        Assert.Equal(1.718, Assert.Single(result.Interpretations).Lowest.Value, 0.0006);
    }

    [Fact]
    public void A_lone_stray_reading_on_a_constant_edge_is_named_as_a_misreading()
    {
        List<ShadowEdgeStep> steps =
        [
            new(0, 1.544, 1.553), new(30, 1.544, 1.552), new(60, 1.534, 1.550), new(90, 1.544, 1.548), new(120, 1.544, 1.549), new(150, 1.544, 1.551),
        ];
        var result = RotationSeriesAnalysis.Analyse(steps, 0.001);
        var warning = Assert.Single(result.Misreadings);
        Assert.Contains("step at 60°", warning);
        Assert.Equal(OpticSign.Positive, Assert.Single(result.Interpretations).Sign);
    }

    [Fact]
    public void Edges_that_meet_at_one_step_of_a_smoothly_moving_edge_are_not_a_misreading()
    {
        // Quartz ω 1.544, ε 1.553 (from memory) with its optic axis in the facet: the high edge falls from ε to meet the
        // low edge at 90° and rises again (1.553, 1.550, 1.544, 1.550 within the 0.001 of a reading).
        List<ShadowEdgeStep> steps = [new(0, 1.544, 1.553), new(45, 1.544, 1.550), new(90, 1.544, 1.544), new(135, 1.544, 1.550)];
        var result = RotationSeriesAnalysis.Analyse(steps, 0.001);
        Assert.Empty(result.Misreadings);
        var h = Assert.Single(result.Interpretations);
        Assert.Equal(OpticSign.Positive, h.Sign);
        Assert.Equal(1.544, h.Lowest.Value, 0.0015);      // the harmonic's extremes, within a reading's rounding and noise
        Assert.InRange(h.Highest.Value, 1.552, 1.556);
    }

    [Fact]
    public void Low_edges_above_other_steps_high_edges_are_impossible_and_reported()
    {
        List<ShadowEdgeStep> steps = [new(0, 1.600, 1.640), new(45, 1.630, 1.650), new(90, 1.610, 1.620), new(135, 1.605, 1.645)];
        var result = RotationSeriesAnalysis.Analyse(steps, 0.001);
        Assert.Contains(result.Misreadings, m => m.Contains("no orientation", StringComparison.Ordinal));
    }

    [Fact]
    public void A_single_step_leaves_the_character_undetermined_with_a_reason()
    {
        var result = RotationSeriesAnalysis.Analyse([new ShadowEdgeStep(0, 1.544, 1.553)], 0.001);
        Assert.Null(result.Character);
        Assert.Contains("single rotation step", result.UndeterminedReason);
    }

    [Fact]
    public void Steps_over_too_little_of_the_half_turn_say_how_much_is_unread_and_how_far_to_go_on()
    {
        // Four steps 15° apart (0–45°) leave 135° of the half turn unread; no gap may exceed 90° for the character.
        var result = RotationSeriesAnalysis.Analyse([new(0, 1.544, 1.553), new(15, 1.544, 1.551), new(30, 1.544, 1.548), new(45, 1.544, 1.550)], 0.001);
        Assert.Null(result.Character);
        Assert.Equal("the steps leave 135° of the half turn unread, from 45° to 180°: read steps in that gap, leaving none over 90°, to fix the optic character",
            result.UndeterminedReason);
        // A gap in the middle is named by its ends: reading on past the last step would not close it.
        var middle = RotationSeriesAnalysis.Analyse([new(0, 1.544, 1.553), new(20, 1.544, 1.551), new(130, 1.544, 1.548), new(170, 1.544, 1.550)], 0.001);
        Assert.Contains("110° of the half turn unread, from 20° to 130°", middle.UndeterminedReason, StringComparison.Ordinal);
    }

    [Fact]
    public void The_largest_gap_wraps_around_the_half_turn() =>
        // Steps at 0, 45, 90, 135: gaps of 45° including 135 → 180 (= 0).
        Assert.Equal(45, RotationSeriesAnalysis.LargestGap([0, 45, 90, 135]), 9);

    [Fact]
    public void A_high_edge_below_the_low_edge_is_refused_naming_both()
    {
        var e = Assert.Throws<QuantityOutOfRangeException>(() => new ShadowEdgeStep(0, 1.553, 1.544));
        Assert.Equal("high edge is 1.544; allowed: not below the low edge 1.553 of the same step.", e.Message);
    }

    [Fact]
    public void No_steps_is_refused() =>
        Assert.Contains("number of rotation steps", Assert.Throws<QuantityOutOfRangeException>(() => RotationSeriesAnalysis.Analyse([], 0.001)).Message);
}

public class HarmonicFitTests
{
    [Fact]
    public void The_harmonic_fit_matches_MathNets_general_least_squares()
    {
        // Independent reference: MathNet.Numerics Fit.LinearCombination with the basis 1, cos, sin (QR least squares).
        double[] x = [.. new[] { 0.0, 30, 60, 90, 120, 150 }.Select(d => d * Math.PI / 90)];
        double[] y = [1.5440, 1.5482, 1.5517, 1.5530, 1.5511, 1.5473];
        double[] expected = MathNet.Numerics.Fit.LinearCombination(x, y, _ => 1.0, Math.Cos, Math.Sin);
        double[] actual = RotationSeriesAnalysis.MovingEdge.HarmonicFit(x, y);
        for (int i = 0; i < 3; i++) Assert.Equal(expected[i], actual[i], 1e-12);
    }
}
