using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Optics;

namespace GemIndex.Core.Tests.Optics;

public class GladstoneDaleTests
{
    [Fact]
    public void Soda_lime_glass_has_a_specific_refractivity_near_0_21()
    {
        // Soda-lime container glass: nD 1.518, density 2.52 g/cm³ (Wikipedia, "Soda-lime glass", typical properties, the
        // page reference-db glass.json cites): K = 0.518/2.52 = 0.2056. Tolerance 0.0005: the quoted places.
        Assert.Equal(0.2056, GladstoneDale.SpecificRefractivity(1.518, 2.52), 0.0005);
        // Fused silica: nD 1.458, density 2.20 (refractiveindex.info, Malitson 1965, from memory): K 0.208.
        Assert.Equal(0.208, GladstoneDale.SpecificRefractivity(1.458, 2.20), 0.0005);
    }

    [Fact]
    public void A_glass_of_index_1_48_is_never_as_dense_as_4_6_nor_one_of_index_1_70_as_light_as_2_2()
    {
        PropertyRange light = GladstoneDale.Density(1.48, GladstoneDale.ManMadeGlass);
        Assert.False(light.Contains(4.60));
        Assert.True(light.Contains(2.30));    // a borosilicate-like glass (n 1.47-1.52, SG 2.23-2.51, glass.json)
        PropertyRange dense = GladstoneDale.Density(1.70, GladstoneDale.ManMadeGlass);
        Assert.False(dense.Contains(2.20));
        Assert.True(dense.Contains(4.20));    // dense lead glass (n 1.67-1.74, SG 3.95-4.5, glass.json)
    }

    [Property]
    public Property The_densities_at_an_index_give_back_the_refractivity_bounds(PositiveInt thousandths)
    {
        double index = 1.3 + (thousandths.Get % 1000) / 1000.0;
        PropertyRange density = GladstoneDale.Density(index, GladstoneDale.ManMadeGlass);
        return (Math.Abs(GladstoneDale.SpecificRefractivity(index, density.Maximum) - GladstoneDale.ManMadeGlass.Minimum) < 1e-12
            && Math.Abs(GladstoneDale.SpecificRefractivity(index, density.Minimum) - GladstoneDale.ManMadeGlass.Maximum) < 1e-12).ToProperty();
    }

    [Fact]
    public void An_index_not_above_1_or_a_density_not_above_0_is_refused()
    {
        OutOfRangeAssert.Throws(() => GladstoneDale.Density(1.0, GladstoneDale.ManMadeGlass), "refractive index", "above 1");
        OutOfRangeAssert.Throws(() => GladstoneDale.SpecificRefractivity(1.5, 0), "density", "above 0");
    }
}
