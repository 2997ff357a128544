using GemIndex.Core.Quantities;

namespace GemIndex.Core.Optics.Refractometer;

/// <summary>
/// A calibration offset fitted from readings of standards of known index. The model is reading + offset = known,
/// so least squares gives offset = mean(known − read). Its standard error is s/√k (s the sample standard deviation
/// of the k differences) when k ≥ 2; with one standard it is the instrument's reading precision. With few standards
/// s is itself uncertain: read more than two when you can.
/// </summary>
public sealed class CalibrationFit
{
    private CalibrationFit(double offset, double standardUncertainty, double[] residuals)
    {
        Offset = offset;
        StandardUncertainty = standardUncertainty;
        Residuals = Array.AsReadOnly(residuals);
    }

    /// <summary>The fitted offset, added to raw readings.</summary>
    public double Offset { get; }

    /// <summary>Standard uncertainty (k = 1) of the offset.</summary>
    public double StandardUncertainty { get; }

    /// <summary>Per standard, known − (read + offset), in the order given.</summary>
    public IReadOnlyList<double> Residuals { get; }

    /// <summary>Fits the offset from one or more readings taken on <paramref name="profile"/>'s instrument.</summary>
    /// <exception cref="QuantityOutOfRangeException">
    /// No readings; a default (unset) reading; a raw reading outside the instrument's readable range; or an offset
    /// beyond ±<see cref="RefractometerProfile.LargestCalibrationOffset"/>.
    /// </exception>
    public static CalibrationFit From(IReadOnlyList<StandardReading> readings, RefractometerProfile profile)
    {
        ArgumentNullException.ThrowIfNull(readings);
        ArgumentNullException.ThrowIfNull(profile);
        if (readings.Count == 0)
            throw new QuantityOutOfRangeException("number of standard readings", 0, "1 or more");
        foreach (StandardReading r in readings)
        {
            QuantityOutOfRangeException.ThrowIfOutside("standard's known index", r.KnownIndex, RefractiveIndex.Minimum, RefractiveIndex.Maximum);
            QuantityOutOfRangeException.ThrowIfOutside("standard's raw reading", r.RawReading, profile.LowestReadable, profile.HighestReadable);
        }
        double offset = readings.Average(r => r.Difference);
        QuantityOutOfRangeException.ThrowIfOutside("calibration offset", offset,
            -RefractometerProfile.LargestCalibrationOffset, RefractometerProfile.LargestCalibrationOffset);
        double[] residuals = readings.Select(r => r.Difference - offset).ToArray();
        int k = readings.Count;
        double sigma = k == 1
            ? profile.ReadingPrecision
            : Math.Sqrt(residuals.Sum(e => e * e) / (k - 1)) / Math.Sqrt(k);
        return new CalibrationFit(offset, sigma, residuals);
    }
}
