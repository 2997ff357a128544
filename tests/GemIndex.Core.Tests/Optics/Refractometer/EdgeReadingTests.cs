using GemIndex.Core.Optics;
using GemIndex.Core.Optics.Refractometer;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Optics.Refractometer;

public class EdgeReadingTests
{
    [Fact]
    public void A_raw_reading_is_corrected_and_carries_the_reading_precision()
    {
        RefractometerProfile profile = RefractometerProfile.Default;
        var calibrated = profile.WithCalibration(CalibrationFit.From([new StandardReading(1.544, 1.543)], profile));
        EdgeReading r = EdgeReading.FromRaw(1.761, calibrated);
        Assert.False(r.IsOverTheLimit);
        Assert.Equal(1.762, r.Index.Value, 1e-12);
        Assert.Equal(Math.Sqrt(2) * 0.001, r.Index.StandardUncertainty, 1e-15); // precision and offset, each 0.001
    }

    [Fact]
    public void Over_the_limit_is_a_lower_bound_at_the_liquid()
    {
        EdgeReading r = EdgeReading.OverTheLimit(RefractometerProfile.Default);
        Assert.True(r.IsOverTheLimit);
        Assert.Equal(1.79, r.Index.Value);
        Assert.Equal("over the limit (above 1.790)", r.ToString());
    }

    [Fact]
    public void A_measured_index_is_kept_as_given()
    {
        EdgeReading r = EdgeReading.Measured(new RefractiveIndex(1.544, 0.001));
        Assert.False(r.IsOverTheLimit);
        Assert.Equal(new RefractiveIndex(1.544, 0.001), r.Index);
    }

    [Fact]
    public void A_raw_reading_above_the_liquid_is_refused() =>
        OutOfRangeAssert.Throws(() => EdgeReading.FromRaw(1.85, RefractometerProfile.Default), "refractometer reading", "1.3 to 1.79");
}
