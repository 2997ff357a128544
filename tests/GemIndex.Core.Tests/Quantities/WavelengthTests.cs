using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Quantities;

public class WavelengthTests
{
    [Fact]
    public void Nanometres_and_micrometres_convert_both_ways()
    {
        Assert.Equal(0.5893, Wavelength.FromNanometres(589.3).Micrometres, 1e-15);
        Assert.Equal(656.27, Wavelength.FromMicrometres(0.65627).Nanometres, 1e-10);
        Assert.Equal("589.3 nm", Wavelength.FromNanometres(589.3).ToString());
    }

    [Theory]
    [InlineData(200)]
    [InlineData(5000)]
    public void The_ends_of_the_range_are_accepted(double nanometres) =>
        Assert.Equal(nanometres, Wavelength.FromNanometres(nanometres).Nanometres);

    [Theory]
    [InlineData(199, "wavelength is 199 nm; allowed: 200 to 5000 nm.")]
    [InlineData(5001, "wavelength is 5001 nm; allowed: 200 to 5000 nm.")]
    [InlineData(double.NaN, "wavelength is not a finite number; allowed: 200 to 5000 nm.")]
    public void A_wavelength_outside_the_range_is_refused(double nanometres, string message)
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() => Wavelength.FromNanometres(nanometres));
        Assert.Equal(message, error.Message);
    }

    [Fact]
    public void A_wavelength_given_in_micrometres_is_refused_in_nanometres()
    {
        var error = Assert.Throws<QuantityOutOfRangeException>(() => Wavelength.FromMicrometres(0.1));
        Assert.Equal("wavelength is 100 nm; allowed: 200 to 5000 nm.", error.Message);
    }
}
