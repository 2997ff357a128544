using GemIndex.Core.Identification;
using GemIndex.Cli.Reports;

namespace GemIndex.Tests.Reports;

public class ReportDerivedTests
{
    [Theory]
    // Likelihood ratios: 10 to 1 is "strongly" (log2 10 = 3.32 bits), 2 to 1 plain (1 bit), below a tenth of a bit none.
    [InlineData(5.0, true, "strongly for")]
    [InlineData(-3.4, false, "strongly against, unusual")]
    [InlineData(1.5, true, "for")]
    [InlineData(0.4, true, "slightly for")]
    [InlineData(-0.4, true, "slightly against")]
    [InlineData(0.0, false, "unusual for it")]
    [InlineData(5.0, false, "unusual for it")]
    [InlineData(0.4, false, "unusual for it")]
    [InlineData(0.05, true, "neither for nor against")]
    public void A_reason_s_verdict_names_its_weight_in_words(double bits, bool agrees, string expected) =>
        Assert.Equal(expected, ReportDerived.Verdict(new EvidenceContribution("magnification", "a look", bits, agrees)));

    [Theory]
    // ω is the edge that stays still: the low one of a positive stone (quartz, ω 1.544, ε 1.553), the high one of a
    // negative stone (corundum, ω 1.770, ε 1.762); handbook values from memory. No settled sign: no names.
    [InlineData(true, "positive", 1.544, 1.553, null, "ω 1.544, ε 1.553")]
    [InlineData(true, "negative", 1.762, 1.770, null, "ω 1.770, ε 1.762")]
    [InlineData(true, "not fixed by the series: positive (50%) or negative (50%)", 1.544, 1.553, null, "1.544 to 1.553")]
    [InlineData(false, "negative", 1.654, 1.690, 1.672, "α 1.654, β 1.672, γ 1.690")]
    [InlineData(false, "none", 1.718, 1.718, null, "1.718")]
    public void The_indices_are_named_as_the_optic_character_and_a_settled_sign_name_them(bool uniaxial, string sign, double lowest, double highest, double? beta, string expected) =>
        Assert.Equal(expected, ReportDerived.Indices(uniaxial, sign, lowest, highest, beta));

    [Fact]
    public void A_feature_seen_that_neither_the_candidate_nor_an_unknown_material_holds_is_weighed_as_neither_for_nor_against()
    {
        // Bone with Schreger lines seen: bone holds them at the rate of an unlisted feature (0.01), as an unknown material
        // does, so the look moves bone only against ivory, which holds them (Espinoza and Mann's ivory guide).
        using var run = new CommandLine.CommandRun();
        var (exit, text, error) = CommandLine.CommandRun.Plain("identify", "--spot", "1.54", "--sg", "1.80", "--colour", "white",
            "--feature", "schreger_lines", "--catalogue-dir", run.Folder);
        Assert.True(exit == 0, error);
        Assert.Contains("unusual for it: magnification: Schreger lines seen (held by 1 % of such stones)", text);
    }

    [Fact]
    public void The_species_lines_end_with_the_mineral_group_when_two_of_its_species_share_the_answer()
    {
        // Invented shares: two species of the tourmaline group (Henry et al. 2011, as reference-db/mineral-groups.json cites it).
        var sheet = ReportFixtures.Sheet(ReportFixtures.QuartzLine);
        var result = ReportFixtures.Identify(sheet) with
        {
            Species =
            [
                new SpeciesResult { Species = "elbaite", Confidence = 0.6, Origins = new Dictionary<Core.Catalogue.OriginClass, double> { [Core.Catalogue.OriginClass.Natural] = 0.6 }, MineralGroup = "tourmaline" },
                new SpeciesResult { Species = "uvite", Confidence = 0.4, Origins = new Dictionary<Core.Catalogue.OriginClass, double> { [Core.Catalogue.OriginClass.Natural] = 0.4 }, MineralGroup = "tourmaline" },
            ],
        };
        Assert.Equal(["Elbaite 60.0 % (natural)", "Uvite 40.0 % (natural)", "Tourmaline group >99.9 % in all (elbaite, uvite)"],
            ReportDerived.SpeciesLines(StoneReport.Build(sheet, result)));
        Assert.Equal(2, ReportDerived.SpeciesLines(StoneReport.Build(sheet, result with { NoGoodMatch = true })).Count);
    }
}
