using GemIndex.Core.Catalogue;
using GemIndex.Core.Identification;
using GemIndex.Core.Magnification;
using GemIndex.Core.Observations;
using GemIndex.Core.Optics.Indicatrix;

namespace GemIndex.Core.Tests.Magnification;

/// <summary>The magnification term in the engine's posterior, on a small catalogue of natural and flame-fusion ruby.</summary>
public class MagnificationRankingTests
{
    // Corundum ω 1.768, ε 1.760, SG 3.99–4.01 (handbook values, from memory); both entries share them, so only
    // magnification can separate them (common practice).
    private static Material Ruby(string name, OriginClass origin, MagnificationProfile? profile) => new()
    {
        Name = name, Species = "corundum", Variety = "ruby", Origin = origin, CrystalSystem = CrystalSystem.Trigonal,
        Indices = OpticalIndices.Uniaxial(new(1.767, 1.770), new(1.759, 1.762)), Sign = OpticSign.Negative, Birefringence = new(0.008, 0.009),
        SpecificGravity = new PropertyRange(3.99, 4.01), Polariscope = [PolariscopeReaction.DoublyRefractive], Frequency = BenchFrequency.Common,
        Magnification = profile,
    };

    // Curved striae in virtually all flame-fusion corundum (Hughes & Koivula 2005): 0.9 as the shipped table lists it.
    private static readonly Identifier Engine = new([
        Ruby("ruby", OriginClass.Natural, null),
        Ruby("flame-fusion synthetic ruby", OriginClass.Synthetic, new(OriginClass.Synthetic,
            new Dictionary<MagnificationFeature, double> { [MagnificationFeature.CurvedStriae] = 0.9, [MagnificationFeature.RoundGasBubbles] = 0.5 })),
    ]);

    private static BenchSheet Sheet(MagnificationObservation? look) => new()
    {
        SpecificGravity = new(4.00, 0.01), Polariscope = PolariscopeReaction.DoublyRefractive, Magnification = look,
    };

    private static double Synthetic(IdentificationResult r) => r.Species.Single(s => s.Species == "corundum").Origins.GetValueOrDefault(OriginClass.Synthetic);

    [Fact]
    public void Curved_striae_and_round_bubbles_move_the_origin_to_synthetic_and_say_why()
    {
        double without = Synthetic(Engine.Identify(Sheet(null)));
        var result = Engine.Identify(Sheet(new([MagnificationFeature.CurvedStriae, MagnificationFeature.RoundGasBubbles], [])));
        double with = Synthetic(result);
        Assert.True(with > 0.9 && with > without, $"synthetic share {without:0.000} without, {with:0.000} with");
        Assert.Equal("flame-fusion synthetic ruby", result.Candidates[0].Material.Name);
        var reason = Assert.Single(result.Candidates[0].Reasons, c => c.Test == "magnification");
        Assert.Contains("curved striae seen (held by 90 % of such stones)", reason.Text);
    }

    [Fact]
    public void Natural_inclusions_seen_and_no_striae_favour_the_natural_stone()
    {
        var result = Engine.Identify(Sheet(new([MagnificationFeature.NeedlesAndSilk, MagnificationFeature.CrystalInclusions], [MagnificationFeature.CurvedStriae])));
        Assert.True(Synthetic(result) < 0.1, $"synthetic share {Synthetic(result):0.000}");
        Assert.Equal("ruby", result.Candidates[0].Material.Name);
    }

    [Fact]
    public void The_uncatalogued_likelihood_lies_between_the_natural_and_the_imitation_defaults()
    {
        MagnificationObservation look = new([MagnificationFeature.RoundGasBubbles], [MagnificationFeature.CrystalInclusions]);
        double natural = MagnificationEvidence.LogLikelihood(look, MagnificationProfile.ForOrigin(OriginClass.Natural));
        double imitation = MagnificationEvidence.LogLikelihood(look, MagnificationProfile.ForOrigin(OriginClass.Imitation));
        double broad = MagnificationEvidence.LogBroad(look);
        Assert.InRange(broad, Math.Min(natural, imitation), Math.Max(natural, imitation));
        Assert.Equal(Math.Log((Math.Exp(natural) + Math.Exp(imitation)) / 2), broad, 12);
    }

    [Fact]
    public void The_fit_is_one_for_the_expected_outcome_and_small_for_a_foreign_feature()
    {
        var natural = MagnificationProfile.ForOrigin(OriginClass.Natural);
        Assert.Equal(1, MagnificationEvidence.Fit(new([], [MagnificationFeature.CurvedStriae]), natural), 12);
        Assert.True(MagnificationEvidence.Fit(new([MagnificationFeature.CurvedStriae], []), natural) < 0.05);
    }
}
