using GemIndex.Core.Optics;
using GemIndex.Core.Optics.Dispersion;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Optics.Dispersion;

public class ReadingConversionTests
{
    [Fact]
    public void A_reading_in_green_light_moves_to_its_sodium_value()
    {
        // Sapphire ordinary ray (Malitson & Dodge 1972, from memory): a stone 0.002 above the model at e (546.07 nm)
        // stays 0.002 above it at D; the shift itself comes from the model.
        SellmeierModel model = DispersionModels.SapphireOrdinary;
        double atE = model.IndexAt(ReferenceWavelengths.E) + 0.002;
        RefractiveIndex converted = ReadingConversion.ToSodiumD(new RefractiveIndex(atE, 0.001), ReferenceWavelengths.E, model);
        Assert.Equal(model.IndexAt(ReferenceWavelengths.D) + 0.002, converted.Value, 1e-12);
        Assert.True(converted.Value < atE, "green light reads higher than sodium light in normal dispersion");
        Assert.Equal(0.001, converted.StandardUncertainty);
    }

    [Fact]
    public void A_reading_at_589_3_nm_is_unchanged()
    {
        RefractiveIndex converted = ReadingConversion.ToSodiumD(new RefractiveIndex(1.762), ReferenceWavelengths.D, DispersionModels.SapphireOrdinary);
        Assert.Equal(1.762, converted.Value, 1e-15);
    }

    [Fact]
    public void A_reading_at_an_unset_wavelength_is_refused() =>
        OutOfRangeAssert.Throws(() => ReadingConversion.ToSodiumD(new RefractiveIndex(1.762), default, DispersionModels.SapphireOrdinary),
            "wavelength", "200 to 5000 nm");
}
