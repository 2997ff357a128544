using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Magnification;

namespace GemIndex.Core.Tests.Magnification;

public class MagnificationEvidenceTests
{
    // Curved growth lines are "a prominent feature of virtually all Verneuil synthetic corundums" (Hughes & Koivula
    // 2005): listed here as 0.9; natural corundum takes the natural default (curved striae foreign to it).
    private static readonly MagnificationProfile FlameFusion = new(OriginClass.Synthetic,
        new Dictionary<MagnificationFeature, double> { [MagnificationFeature.CurvedStriae] = 0.9, [MagnificationFeature.RoundGasBubbles] = 0.5 });
    private static readonly MagnificationProfile Natural = new(OriginClass.Natural);

    private static double LogRatio(MagnificationObservation seen) =>
        MagnificationEvidence.LogLikelihood(seen, FlameFusion) - MagnificationEvidence.LogLikelihood(seen, Natural);

    [Fact]
    public void Curved_striae_seen_favour_flame_fusion_over_natural_by_more_than_ten_to_one()
    {
        double ratio = LogRatio(new([MagnificationFeature.CurvedStriae], []));
        Assert.True(ratio > Math.Log(10), $"log ratio {ratio}");
    }

    [Fact]
    public void Swirl_marks_seen_favour_a_glass_over_a_crystal_natural_or_synthetic()
    {
        // Swirls of flow are a glass's, never a crystal's (common practice): an imitation (glass, plastic) holds them by
        // default, a natural or synthetic crystal does not, and a listed natural glass (moldavite) may.
        var swirls = new MagnificationObservation([MagnificationFeature.SwirlMarks], []);
        var imitation = new MagnificationProfile(OriginClass.Imitation);
        var synthetic = new MagnificationProfile(OriginClass.Synthetic);
        Assert.True(MagnificationEvidence.LogLikelihood(swirls, imitation) - MagnificationEvidence.LogLikelihood(swirls, Natural) > Math.Log(10));
        Assert.True(MagnificationEvidence.LogLikelihood(swirls, imitation) - MagnificationEvidence.LogLikelihood(swirls, synthetic) > Math.Log(10));
        Assert.Equal(0.3, imitation.ProbabilityOf(MagnificationFeature.SwirlMarks));
        Assert.Equal(MagnificationProfile.Foreign, synthetic.ProbabilityOf(MagnificationFeature.SwirlMarks));
    }

    [Fact]
    public void Looked_for_and_not_seen_is_weaker_evidence_than_seen()
    {
        double seen = LogRatio(new([MagnificationFeature.CurvedStriae], []));
        double notSeen = LogRatio(new([], [MagnificationFeature.CurvedStriae]));
        Assert.True(notSeen < 0, "not seeing the striae counts against flame fusion");
        Assert.True(Math.Abs(notSeen) < Math.Abs(seen) / 2);
    }

    [Fact]
    public void On_a_faceted_stone_a_star_is_excluded_by_the_cut_not_merely_missed()
    {
        // Common practice: a star (or a cat's-eye) shows only on a domed top, so a faceted stone cannot show one, however
        // well it is looked at: the entry's share of stones without one is all that is left (no visibility discount).
        var star = new MagnificationProfile(OriginClass.Synthetic, new Dictionary<MagnificationFeature, double> { [MagnificationFeature.Asterism] = 0.95 });
        var faceted = new MagnificationObservation([], [MagnificationFeature.Asterism]) { Faceted = true, ImpliedByCut = new HashSet<MagnificationFeature> { MagnificationFeature.Asterism } };
        Assert.Equal(Math.Log(1 - (1 - MagnificationEvidence.FalseSighting) * 0.95), MagnificationEvidence.LogLikelihood(faceted, star), 12);
        // Looked for by hand on a cabochon and not seen: a sighting missed now and then, weaker evidence.
        double looked = MagnificationEvidence.LogLikelihood(new([], [MagnificationFeature.Asterism]), star);
        Assert.True(looked > MagnificationEvidence.LogLikelihood(faceted, star));
    }

    [Fact]
    public void Nothing_looked_for_is_no_evidence() =>
        Assert.Equal(0, MagnificationEvidence.LogLikelihood(new([], []), FlameFusion));

    [Fact]
    public void A_natural_stone_with_crystals_and_healed_fractures_leans_natural()
    {
        double ratio = LogRatio(new([MagnificationFeature.CrystalInclusions, MagnificationFeature.HealedFractures], []));
        Assert.True(ratio < -Math.Log(10), $"log ratio {ratio}");
    }

    [Fact]
    public void A_cats_eye_seen_favours_the_variety_named_for_it_and_none_seen_the_plain_one()
    {
        // Common practice: a cat's-eye chrysoberyl shows its eye whenever looked for with one light; a plain chrysoberyl
        // only by rare coincidence (the default for an unlisted feature). The eye is obvious, so not seeing it counts.
        var catsEye = new MagnificationProfile(OriginClass.Natural, new Dictionary<MagnificationFeature, double> { [MagnificationFeature.Chatoyancy] = 0.95 });
        var plain = MagnificationProfile.ForOrigin(OriginClass.Natural);
        double Ratio(MagnificationObservation look) => MagnificationEvidence.LogLikelihood(look, catsEye) - MagnificationEvidence.LogLikelihood(look, plain);
        Assert.True(Ratio(new([MagnificationFeature.Chatoyancy], [])) > Math.Log(20), "seen");   // 0.856 against 0.019 by the model's numbers
        Assert.True(Ratio(new([], [MagnificationFeature.Chatoyancy])) < -Math.Log(5), "looked for, not seen");
        Assert.Equal(FeatureGroup.Phenomenon, MagnificationVocabulary.Of(MagnificationFeature.Chatoyancy).Group);
        Assert.Equal(MagnificationFeature.Asterism, MagnificationVocabulary.Find("asterism"));
        Assert.Equal("Seen by eye", MagnificationVocabulary.Of(MagnificationFeature.PlayOfColour).SeenHow);
    }

    [Fact]
    public void The_organic_structures_are_a_group_seen_under_magnification_that_no_origin_holds_by_default()
    {
        // Each structure belongs to one organic material (Espinoza and Mann; Kunz and Stevenson 1908; Newman; CAMEO):
        // an entry holds it only where reference-db/magnification.json says so, whatever its origin.
        var organic = MagnificationVocabulary.All.Where(f => f.Group == FeatureGroup.OrganicStructure).Select(f => f.Word).ToList();
        Assert.Equal(["nacre_platelets", "schreger_lines", "haversian_canals", "plant_cells", "coral_growth", "pigment_spots"], organic);
        Assert.All(Enum.GetValues<OriginClass>(), origin => Assert.All(organic,
            w => Assert.Equal(MagnificationProfile.Foreign, MagnificationProfile.ForOrigin(origin).ProbabilityOf(MagnificationVocabulary.Find(w)!.Value))));
        Assert.Equal("Seen under magnification", MagnificationVocabulary.Of(MagnificationFeature.SchregerLines).SeenHow);
        Assert.Equal(MagnificationFeature.HaversianCanals, MagnificationVocabulary.Find("Haversian canals"));
    }

    [Fact]
    public void A_listed_probability_outside_zero_to_one_is_refused()
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => new MagnificationProfile(OriginClass.Natural,
            new Dictionary<MagnificationFeature, double> { [MagnificationFeature.FluxResidue] = 1.2 }));
        Assert.Contains("flux_residue", e.Message);
    }

    [Property]
    public Property Seen_and_not_seen_are_the_two_outcomes_of_one_look() =>
        Prop.ForAll(Gen.Elements(Enum.GetValues<MagnificationFeature>()).ToArbitrary(),
            Gen.Elements(Enum.GetValues<OriginClass>()).ToArbitrary(), (feature, origin) =>
        {
            var profile = new MagnificationProfile(origin);
            double seen = Math.Exp(MagnificationEvidence.LogLikelihood(new([feature], []), profile));
            double notSeen = Math.Exp(MagnificationEvidence.LogLikelihood(new([], [feature]), profile));
            return Math.Abs(seen + notSeen - 1) < 1e-12 && seen > 0 && notSeen > 0;
        });
}
