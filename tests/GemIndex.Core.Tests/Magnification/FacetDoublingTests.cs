using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Gravity;
using GemIndex.Core.Identification;
using GemIndex.Core.Magnification;
using GemIndex.Core.Observations;
using GemIndex.Core.Optics.Indicatrix;

namespace GemIndex.Core.Tests.Magnification;

public class FacetDoublingTests
{
    // Handbook birefringences (common practice): zircon 0.059, peridot 0.036, tourmaline 0.020, quartz 0.009, corundum 0.008.
    [Theory]
    [InlineData(0.059, FacetDoubling.HeldWhenPlain)]
    [InlineData(0.036, FacetDoubling.HeldWhenPlain)]
    [InlineData(0.000, 0)]
    [InlineData(0.004, 0)]
    public void Doubling_is_plain_in_strongly_birefringent_stones_and_absent_in_weakly_ones(double birefringence, double held) =>
        Assert.Equal(held, FacetDoubling.Held(birefringence), 12);

    [Fact]
    public void Tourmaline_doubles_plainly_and_quartz_and_corundum_seldom()
    {
        // Common practice: doubling is plain in tourmaline (0.020) and seldom seen in quartz (0.009) or corundum (0.008).
        double tourmaline = FacetDoubling.Held(0.020), quartz = FacetDoubling.Held(0.009), corundum = FacetDoubling.Held(0.008);
        Assert.Equal(FacetDoubling.HeldWhenPlain, tourmaline, 12);
        Assert.True(quartz is > 0.1 and < 0.4, $"{quartz}");
        Assert.True(corundum > 0.1 && corundum < quartz, $"{corundum}");
    }

    [Property]
    public Property More_birefringence_never_shows_less_doubling() =>
        Prop.ForAll(Gen.Choose(0, 3000).ToArbitrary(), Gen.Choose(0, 3000).ToArbitrary(), (a, b) =>
        {
            double x = Math.Min(a, b) / 10000.0, y = Math.Max(a, b) / 10000.0;
            double px = FacetDoubling.Held(x), py = FacetDoubling.Held(y);
            return px <= py && px >= 0 && py <= FacetDoubling.HeldWhenPlain;
        });

    private static Material Entry(string name, OpticalIndices indices, PropertyRange? birefringence, bool opaque = false) => new()
    {
        Name = name, Species = name, Variety = name, Origin = OriginClass.Natural, CrystalSystem = CrystalSystem.Tetragonal,
        Indices = indices, Birefringence = birefringence, SpecificGravity = new(4.6, 4.8), IsOpaque = opaque,
    };

    [Fact]
    public void An_entry_takes_its_doubling_from_its_birefringence_and_a_singly_refractive_or_opaque_one_none()
    {
        // Zircon ω 1.925–1.940, ε 1.980–2.000 (handbook values, from memory); a cubic stone and an opaque one show none.
        Material zircon = Entry("zircon", OpticalIndices.Uniaxial(new(1.925, 1.940), new(1.980, 2.000)), new(0.040, 0.060));
        Material cubic = Entry("cubic", OpticalIndices.SingleIndex(new(2.15, 2.18), OpticCharacter.Isotropic), null);
        Material opaque = zircon with { Name = "opaque", IsOpaque = true };
        Assert.Equal(FacetDoubling.HeldWhenPlain, zircon.MagnificationProfile.ProbabilityOf(MagnificationFeature.FacetDoubling));
        Assert.Equal(0, cubic.MagnificationProfile.ProbabilityOf(MagnificationFeature.FacetDoubling));
        Assert.Equal(0, opaque.MagnificationProfile.ProbabilityOf(MagnificationFeature.FacetDoubling));
        // Doubling seen ranks the doubly refractive stone first; looked for and not seen, the cubic one.
        var engine = new Identifier([zircon, cubic]);
        var sg = new SpecificGravity(4.70, 0.01);
        string Leader(MagnificationObservation look) => engine.Identify(new BenchSheet { SpecificGravity = sg, Magnification = look }).Species[0].Species;
        Assert.Equal("zircon", Leader(new([MagnificationFeature.FacetDoubling], [])));
        Assert.Equal("cubic", Leader(new([], [MagnificationFeature.FacetDoubling])));
    }

    [Fact]
    public void Doubling_is_advised_for_a_faceted_stone_and_never_for_a_cabochon()
    {
        // Zircon against a cubic stone of the same SG (handbook values from memory): a faceted stone's back facet edges are
        // the look that parts them; a cabochon has no facets and no table to look through, so the look is another one.
        Material zircon = Entry("zircon", OpticalIndices.Uniaxial(new(1.925, 1.940), new(1.980, 2.000)), new(0.040, 0.060));
        Material cubic = Entry("cubic", OpticalIndices.SingleIndex(new(2.15, 2.18), OpticCharacter.Isotropic), null);
        var sheet = new BenchSheet
        {
            SpecificGravity = new SpecificGravity(4.70, 0.01), Cut = StoneCut.Faceted,
            Refractometer = new RefractometerObservation(RefractometerMethod.Facet, overLimit: true),   // both read over the limit
            Polariscope = PolariscopeReaction.Anomalous, Pleochroism = PleochroismObservation.None, ThermalProbe = ThermalProbeResult.Negative,
            Dispersion = DispersionObservation.ByEye(DispersionStrength.Strong), UvLong = FluorescenceStrength.Inert, UvShort = FluorescenceStrength.Inert,
            AbsorptionLinesNanometres = [],
        };
        NextTestAdvice? Advice(BenchSheet s) => NextTestAdvisor.Advise(s, [(zircon, 0.5), (cubic, 0.5)]);
        Assert.Equal(GemIndex.Core.Bench.BenchField.Magnification, Advice(sheet)!.Test);
        Assert.Contains("doubling of facet edges", Advice(sheet)!.LookFor);
        Assert.DoesNotContain("doubling of facet edges", Advice(sheet with { Cut = StoneCut.Cabochon })?.LookFor ?? []);
    }
}
