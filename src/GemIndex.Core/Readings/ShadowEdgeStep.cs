using System.Globalization;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Readings;

/// <summary>
/// One step of a refractometer rotation series: the rotation angle of the stone (or polariser) and the
/// shadow edges read there, as read on the scale (before any calibration offset). A single edge has no
/// <see cref="High"/>.
/// </summary>
public readonly record struct ShadowEdgeStep
{
    /// <summary>Creates a step; indices 1–4, high not below low, rotation −360° to 360°.</summary>
    /// <exception cref="QuantityOutOfRangeException">A value out of range, or high below low.</exception>
    public ShadowEdgeStep(double rotationDegrees, double low, double? high = null)
    {
        QuantityOutOfRangeException.ThrowIfOutside("rotation", rotationDegrees, -360, 360, "°");
        QuantityOutOfRangeException.ThrowIfOutside("low edge", low, 1, 4);
        if (high is { } h)
        {
            QuantityOutOfRangeException.ThrowIfOutside("high edge", h, 1, 4);
            if (h < low)
                throw new QuantityOutOfRangeException("high edge", h,
                    $"not below the low edge {low.ToString("0.000#", CultureInfo.InvariantCulture)} of the same step");
        }
        RotationDegrees = rotationDegrees;
        Low = low;
        High = high;
    }

    /// <summary>Rotation angle, degrees.</summary>
    public double RotationDegrees { get; }

    /// <summary>The lower (or only) shadow edge.</summary>
    public double Low { get; }

    /// <summary>The higher shadow edge, when two were seen.</summary>
    public double? High { get; }
}
