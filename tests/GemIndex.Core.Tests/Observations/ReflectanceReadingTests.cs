using GemIndex.Core.Catalogue;
using GemIndex.Core.Identification;
using GemIndex.Core.Observations;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Core.Tests.Optics;

namespace GemIndex.Core.Tests.Observations;

public class ReflectanceReadingTests
{
    [Theory]
    // Normal-incidence reflectance in air, R = ((n − 1)/(n + 1))² (Hecht, Optics, ch. 4, from memory): diamond 2.417 →
    // 17.2 %, cubic zirconia 2.16 → 13.5 %, synthetic moissanite ω 2.648 → 20.4 %. Tolerance 0.005 in n: the percent's
    // quoted tenth moves n by at most that much here.
    [InlineData(17.2, 2.417)]
    [InlineData(13.5, 2.16)]
    [InlineData(20.4, 2.648)]
    public void A_reading_gives_the_index_by_Fresnel_s_law(double percent, double index)
    {
        var reading = new ReflectanceReading(percent);
        Assert.Equal(index, reading.Index.Value, 0.005);
        // Half a percentage point of the reading is a few hundredths of the index near diamond's.
        Assert.InRange(reading.Index.StandardUncertainty, 0.02, 0.06);
    }

    [Theory]
    [InlineData(0.5)]
    [InlineData(31)]
    public void A_reading_outside_1_to_30_percent_is_refused(double percent) =>
        OutOfRangeAssert.Throws(() => new ReflectanceReading(percent), "reflectance", "1 to 30 %");

    [Fact]
    public void Past_the_refractometer_s_limit_the_reading_parts_diamond_cubic_zirconia_and_moissanite()
    {
        // Handbook indices from memory; all three read over the limit, so the refractometer alone cannot part them.
        Material Make(string name, double low, double high) => new()
        {
            Name = name, Species = name, Variety = name, Origin = OriginClass.Natural, CrystalSystem = CrystalSystem.Cubic,
            Indices = OpticalIndices.SingleIndex(new(low, high)), SpecificGravity = new(3.2, 6.0),
            Polariscope = [PolariscopeReaction.SinglyRefractive],
        };
        var engine = new Identifier([Make("diamond", 2.417, 2.419), Make("cubic zirconia", 2.15, 2.18), Make("moissanite", 2.648, 2.691)]);
        string Leader(double percent) => engine.Identify(new BenchSheet
        {
            Refractometer = new RefractometerObservation(RefractometerMethod.Facet, overLimit: true),
            Reflectance = new ReflectanceReading(percent),
        }).Candidates[0].Material.Name;
        Assert.Equal("diamond", Leader(17.2));
        Assert.Equal("cubic zirconia", Leader(13.5));
        Assert.Equal("moissanite", Leader(20.6));
    }

    [Fact]
    public void An_opaque_absorbing_entry_is_not_weighed_by_the_reading()
    {
        // A pyrite-like opaque entry (index span invented for the rule): its reflectance follows its absorption, so a reading
        // within the index span it lists must neither raise nor lower it.
        Material opaque = new()
        {
            Name = "metallic", Species = "metallic", Variety = "metallic", Origin = OriginClass.Natural, CrystalSystem = CrystalSystem.Cubic,
            Indices = OpticalIndices.SingleIndex(new(2.6, 3.0)), SpecificGravity = new(4.9, 5.2), IsOpaque = true,
        };
        var sheet = new AnalysedSheet(new BenchSheet { Reflectance = new ReflectanceReading(20.5) });
        CandidateEvaluation weighed = EvidenceLikelihood.Evaluate(opaque, sheet, explain: true);
        Assert.Equal(weighed.LogLikelihoodNotInCatalogue, weighed.LogLikelihood, 12);
        Assert.Contains(weighed.Contributions, c => c.Text.Contains("not weighed", StringComparison.Ordinal));
    }
}
