using GemIndex.Core.Optics.Dispersion;

namespace GemIndex.Core.Tests.Optics.Dispersion;

public class TradeDispersionTests
{
    [Fact]
    public void Diamond_has_a_G_to_B_dispersion_of_0_044()
    {
        // Source: Peter (1923), Z. Phys. 15, 358, coefficients from memory; nG − nB ≈ 0.044. Tolerance: 3 decimals, ±0.0005.
        Assert.Equal(0.044, TradeDispersion.Of(DispersionModels.Diamond), 0.0005);
    }

    [Fact]
    public void Sapphire_ordinary_ray_has_a_G_to_B_dispersion_of_0_018()
    {
        // Source: Malitson & Dodge (1972), J. Opt. Soc. Am. 62, 1405, coefficients from memory; nG − nB ≈ 0.018.
        // Tolerance: 3 decimals, ±0.0005.
        Assert.Equal(0.018, TradeDispersion.Of(DispersionModels.SapphireOrdinary), 0.0005);
    }
}
