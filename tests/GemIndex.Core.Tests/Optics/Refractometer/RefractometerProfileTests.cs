using GemIndex.Core.Optics;
using GemIndex.Core.Optics.Refractometer;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Optics.Refractometer;

public class RefractometerProfileTests
{
    private static RefractometerProfile Make(double glass = 1.88, double liquid = 1.79, double precision = 0.001,
        double offset = 0, double offsetUncertainty = 0) =>
        new(new RefractiveIndex(glass), new RefractiveIndex(liquid), Wavelength.FromNanometres(589.3), precision, offset, offsetUncertainty);

    [Fact]
    public void The_default_profile_is_the_common_bench_instrument()
    {
        // Common practice (DOMAIN.md §2): glass 1.86–1.89, liquid about 1.79, sodium light, ±0.001.
        RefractometerProfile p = RefractometerProfile.Default;
        Assert.Equal(1.88, p.GlassIndex.Value);
        Assert.Equal(1.79, p.ContactLiquidIndex.Value);
        Assert.Equal(589.3, p.Wavelength.Nanometres);
        Assert.Equal(0.001, p.ReadingPrecision);
        Assert.Equal(0, p.CalibrationOffset);
    }

    [Fact]
    public void The_readable_range_runs_from_the_scale_bottom_to_the_liquid()
    {
        RefractometerProfile p = Make(liquid: 1.81);
        Assert.Equal(1.30, p.LowestReadable);
        Assert.Equal(1.81, p.HighestReadable);
    }

    [Theory]
    [InlineData(1.762, false)] // corundum ω region (common practice): readable
    [InlineData(1.790, false)] // at the liquid's index: still its own edge
    [InlineData(2.417, true)]  // diamond: over the limit
    public void Stones_above_the_liquid_are_over_the_limit(double index, bool over) =>
        Assert.Equal(over, RefractometerProfile.Default.IsOverTheLimit(new RefractiveIndex(index)));

    [Fact]
    public void A_raw_reading_is_corrected_by_the_offset_with_combined_uncertainty()
    {
        RefractiveIndex n = Make(offset: 0.002, offsetUncertainty: 0.0005).Corrected(1.542);
        Assert.Equal(1.544, n.Value, 1e-12);
        Assert.Equal(Math.Sqrt(0.001 * 0.001 + 0.0005 * 0.0005), n.StandardUncertainty, 1e-15);
    }

    [Fact]
    public void A_calibration_fit_becomes_the_profile_offset()
    {
        CalibrationFit fit = CalibrationFit.From([new StandardReading(1.544, 1.541)], RefractometerProfile.Default);
        RefractometerProfile p = RefractometerProfile.Default.WithCalibration(fit);
        Assert.Equal(0.003, p.CalibrationOffset, 1e-12);
        Assert.Equal(0.001, p.CalibrationOffsetUncertainty, 1e-15);
    }

    [Theory]
    [InlineData(1.29)]
    [InlineData(1.80)]
    public void A_raw_reading_off_the_scale_is_refused(double raw) =>
        OutOfRangeAssert.Throws(() => RefractometerProfile.Default.Corrected(raw), "refractometer reading", "1.3 to 1.79");

    [Fact]
    public void A_liquid_at_or_above_the_glass_is_refused() =>
        OutOfRangeAssert.Throws(() => Make(glass: 1.80, liquid: 1.81), "contact liquid index", "below the glass index 1.800");

    [Fact]
    public void A_liquid_below_the_scale_bottom_is_refused() =>
        OutOfRangeAssert.Throws(() => Make(liquid: 1.25), "contact liquid index", "above the scale bottom 1.30");

    [Fact]
    public void A_glass_below_1_5_is_refused() =>
        OutOfRangeAssert.Throws(() => Make(glass: 1.4, liquid: 1.35), "refractometer glass index", "1.5 to 4");

    [Theory]
    [InlineData(0)]
    [InlineData(-0.001)]
    public void A_reading_precision_not_above_zero_is_refused(double precision) =>
        OutOfRangeAssert.Throws(() => Make(precision: precision), "reading precision", "above 0");

    [Fact]
    public void A_coarse_reading_precision_is_refused() =>
        OutOfRangeAssert.Throws(() => Make(precision: 0.1), "reading precision", "0 to 0.05");

    [Fact]
    public void A_large_calibration_offset_is_refused() =>
        OutOfRangeAssert.Throws(() => Make(offset: 0.06), "calibration offset", "-0.05 to 0.05");

    [Fact]
    public void A_negative_offset_uncertainty_is_refused() =>
        OutOfRangeAssert.Throws(() => Make(offsetUncertainty: -0.001), "calibration offset uncertainty", "0 to 0.05");

    [Fact]
    public void An_unset_wavelength_is_refused() =>
        OutOfRangeAssert.Throws(() => new RefractometerProfile(new RefractiveIndex(1.88), new RefractiveIndex(1.79), default, 0.001),
            "wavelength", "200 to 5000 nm");
}
