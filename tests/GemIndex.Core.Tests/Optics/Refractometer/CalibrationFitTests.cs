using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using GemIndex.Core.Optics.Refractometer;

namespace GemIndex.Core.Tests.Optics.Refractometer;

public class CalibrationFitTests
{
    [Fact]
    public void One_standard_gives_its_difference_with_the_reading_precision_as_uncertainty()
    {
        // Quartz ω 1.544 (Handbook of Mineralogy, from memory) read as 1.546.
        CalibrationFit fit = CalibrationFit.From([new StandardReading(1.544, 1.546)], RefractometerProfile.Default);
        Assert.Equal(-0.002, fit.Offset, 1e-12);
        Assert.Equal(RefractometerProfile.Default.ReadingPrecision, fit.StandardUncertainty);
        Assert.Equal(0, Assert.Single(fit.Residuals), 1e-12);
    }

    [Fact]
    public void Several_standards_give_the_mean_difference_and_its_standard_error()
    {
        // Worked example of our own: differences (known − read) 0.002, 0.001, 0.003 (quartz ω and ε, fluorite, from
        // memory); mean 0.002; sample s = √((0 + 1e-6 + 1e-6)/2) = 0.001; standard error s/√3 = 0.00057735.
        StandardReading[] readings = [new(1.544, 1.542), new(1.553, 1.552), new(1.434, 1.431)];
        CalibrationFit fit = CalibrationFit.From(readings, RefractometerProfile.Default);
        Assert.Equal(0.002, fit.Offset, 1e-12);
        Assert.Equal(0.00057735, fit.StandardUncertainty, 0.000000005);
        Assert.Equal([0.0, -0.001, 0.001], fit.Residuals.Select(r => Math.Round(r, 12)));
    }

    [Fact]
    public void No_readings_are_refused() =>
        OutOfRangeAssert.Throws(() => CalibrationFit.From([], RefractometerProfile.Default), "number of standard readings", "1 or more");

    [Fact]
    public void A_reading_off_the_instrument_scale_is_refused() =>
        OutOfRangeAssert.Throws(() => CalibrationFit.From([new StandardReading(1.80, 1.81)], RefractometerProfile.Default),
            "standard's raw reading", "1.3 to 1.79");

    [Fact]
    public void An_unset_reading_is_refused() =>
        OutOfRangeAssert.Throws(() => CalibrationFit.From([default], RefractometerProfile.Default), "standard's known index", "1 to 4");

    [Fact]
    public void An_offset_beyond_repair_limits_is_refused() =>
        OutOfRangeAssert.Throws(() => CalibrationFit.From([new StandardReading(1.60, 1.544)], RefractometerProfile.Default),
            "calibration offset", "-0.05 to 0.05");

    [Fact]
    public void A_standard_with_an_impossible_index_is_refused() =>
        OutOfRangeAssert.Throws(() => new StandardReading(0.9, 1.5), "standard's known index", "1 to 4");

    [Property]
    public Property Readings_off_by_a_constant_give_that_constant_back() =>
        Prop.ForAll(OpticsArbitraries.ExactCalibration, c =>
        {
            StandardReading[] readings = c.Known.Select(k => new StandardReading(k, k - c.Offset)).ToArray();
            CalibrationFit fit = CalibrationFit.From(readings, RefractometerProfile.Default);
            // Tolerance: differences of numbers near 1.5 carry rounding of a few 1e-16.
            bool offsetBack = Math.Abs(fit.Offset - c.Offset) < 1e-12;
            bool uncertainty = c.Known.Length == 1 ? fit.StandardUncertainty == 0.001 : fit.StandardUncertainty < 1e-12;
            return (offsetBack && uncertainty && fit.Residuals.All(r => Math.Abs(r) < 1e-12))
                .Label($"offset {c.Offset}, {c.Known.Length} standards: fit {fit.Offset} ± {fit.StandardUncertainty}");
        });
}
