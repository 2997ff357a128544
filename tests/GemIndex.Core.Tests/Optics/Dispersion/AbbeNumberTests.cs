using GemIndex.Core.Optics.Dispersion;

namespace GemIndex.Core.Tests.Optics.Dispersion;

public class AbbeNumberTests
{
    [Fact]
    public void Fused_silica_has_an_Abbe_number_of_67_8()
    {
        // Source: Malitson (1965) model, Vd ≈ 67.8 (DOMAIN.md §7). Tolerance: quoted to 0.1, so ±0.05.
        Assert.Equal(67.8, AbbeNumber.Of(DispersionModels.FusedSilica), 0.05);
    }

    [Fact]
    public void The_Abbe_number_follows_its_definition()
    {
        // (1.5168 − 1)/(1.52238 − 1.51432) = 0.5168/0.00806 = 64.1191 (worked example of our own, a crown-glass-like set).
        Assert.Equal(64.1191, AbbeNumber.FromIndices(1.5168, 1.52238, 1.51432), 0.00005);
    }

    [Fact]
    public void An_nF_not_above_nC_is_refused() =>
        OutOfRangeAssert.Throws(() => AbbeNumber.FromIndices(1.5, 1.50, 1.51), "index nF", "above nC (1.5100)");

    [Fact]
    public void An_impossible_index_is_refused() =>
        OutOfRangeAssert.Throws(() => AbbeNumber.FromIndices(0.5, 1.52, 1.51), "index nd", "1 to 4");
}
