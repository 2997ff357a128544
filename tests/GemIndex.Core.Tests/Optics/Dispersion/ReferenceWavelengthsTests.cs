using GemIndex.Core.Optics.Dispersion;

namespace GemIndex.Core.Tests.Optics.Dispersion;

public class ReferenceWavelengthsTests
{
    [Fact]
    public void The_named_lines_have_the_DOMAIN_values()
    {
        // Source: DOMAIN.md §4 (Fraunhofer lines; d, F, C as in ISO 7944). Exact: they are defined constants.
        Assert.Equal(686.7, ReferenceWavelengths.B.Nanometres);
        Assert.Equal(656.27, ReferenceWavelengths.C.Nanometres);
        Assert.Equal(589.3, ReferenceWavelengths.D.Nanometres);
        Assert.Equal(587.56, ReferenceWavelengths.SmallD.Nanometres);
        Assert.Equal(546.07, ReferenceWavelengths.E.Nanometres);
        Assert.Equal(486.13, ReferenceWavelengths.F.Nanometres);
        Assert.Equal(430.8, ReferenceWavelengths.G.Nanometres);
    }
}
