using System.CommandLine;
using GemIndex.Core.Optics;
using GemIndex.Core.Optics.Refractometer;
using GemIndex.Core.Quantities;
using static GemIndex.Cli.CommandLine.Calc.CalcFailure;
using static GemIndex.Cli.CommandLine.Calc.CalcText;

namespace GemIndex.Cli.CommandLine.Calc;

/// <summary>
/// <c>calc refractometer</c>: for a hemicylinder of a given glass and contact liquid, the readable range; the index
/// from a shadow-edge angle or the edge angle for an index (or "over the limit"); and a calibration offset from
/// readings of standards.
/// </summary>
internal static class CalcRefractometerCommand
{
    internal sealed record StandardJson(double KnownIndex, double RawReading, double Residual);

    internal sealed record RefractometerResult(double GlassIndex, double ContactLiquidIndex, double LowestReadableIndex,
        double HighestReadableIndex, double? EdgeAngleDegrees, double? Index, bool? OverTheLimit,
        double? CalibrationOffset, double? CalibrationOffsetUncertainty, StandardJson[]? Standards);

    public static Command Create()
    {
        var glass = CalcOptions.Number("--glass", "Index of the hemicylinder glass (no unit); default 1.88", 1.88);
        var liquid = CalcOptions.Number("--liquid", "Index of the contact liquid (no unit); default 1.79", 1.79);
        var edge = CalcOptions.Number("--edge-angle", "Shadow-edge angle in the glass, in degrees: gives the index");
        var index = CalcOptions.Number("--index", "Index of a stone (no unit): gives its edge angle, or over the limit");
        var standards = CalcOptions.Tuples("--standard", "A standard's known index and its raw reading, KNOWN:READ (repeat for more)", ':', 2);
        return CalcBuilder.Command("refractometer", "Hemicylinder refractometer: readable range, edge angle ↔ index, calibration offset", [glass, liquid, edge, index, standards], pr =>
        {
            RefractometerProfile profile = Named("--glass, --liquid", () => new RefractometerProfile(
                new RefractiveIndex(pr.GetValue(glass)), new RefractiveIndex(pr.GetValue(liquid)), ReferenceWavelength, 0.001));
            var result = new RefractometerResult(profile.GlassIndex.Value, profile.ContactLiquidIndex.Value,
                profile.LowestReadable, profile.HighestReadable, null, null, null, null, null, null);
            if (pr.GetValue(edge) is not null && pr.GetValue(index) is not null)
                throw Input("give --edge-angle or --index, not both");
            if (pr.GetValue(edge) is { } edgeDegrees) result = FromEdge(result, profile, edgeDegrees);
            if (pr.GetValue(index) is { } stone) result = FromIndex(result, profile, stone);
            if (pr.GetValue(standards) is { Length: > 0 } pairs) result = Calibrate(result, profile, pairs);
            return CalcAnswer.Of(result, Write);
        });
    }

    // The profile needs a wavelength; none of these results depend on it.
    private static readonly Wavelength ReferenceWavelength = Wavelength.FromNanometres(589.3);

    private static RefractometerResult FromEdge(RefractometerResult result, RefractometerProfile profile, double degrees)
    {
        RefractiveIndex n = Named("--edge-angle", () => profile.IndexFromEdgeAngle(Angle.FromDegrees(degrees)));
        return result with { EdgeAngleDegrees = degrees, Index = n.Value, OverTheLimit = profile.IsOverTheLimit(n) };
    }

    private static RefractometerResult FromIndex(RefractometerResult result, RefractometerProfile profile, double value)
    {
        var n = Named("--index", () => new RefractiveIndex(value));
        Angle? angle = n.Value < profile.GlassIndex.Value ? profile.EdgeAngleFor(n) : null;
        return result with { EdgeAngleDegrees = angle?.Degrees, Index = n.Value, OverTheLimit = profile.IsOverTheLimit(n) };
    }

    private static RefractometerResult Calibrate(RefractometerResult result, RefractometerProfile profile, double[][] pairs)
    {
        StandardReading[] readings = Named("--standard", () => pairs.Select(p => new StandardReading(p[0], p[1])).ToArray());
        CalibrationFit fit = Named("--standard", () => CalibrationFit.From(readings, profile));
        StandardJson[] rows = [.. readings.Select((r, i) => new StandardJson(r.KnownIndex, r.RawReading, fit.Residuals[i]))];
        return result with { CalibrationOffset = fit.Offset, CalibrationOffsetUncertainty = fit.StandardUncertainty, Standards = rows };
    }

    private static void Write(TextWriter output, RefractometerResult r)
    {
        output.WriteLine($"glass {Index(r.GlassIndex)}, contact liquid {Index(r.ContactLiquidIndex)} {NoUnit}: " +
            $"readable from {Index(r.LowestReadableIndex)} to {Index(r.HighestReadableIndex)} {NoUnit}");
        if (r.Index is { } n)
        {
            string edge = r.EdgeAngleDegrees is { } d ? $"edge angle {Degrees(d)}" : "no edge (index not below the glass)";
            output.WriteLine($"index {Index(n)} {NoUnit} ↔ {edge}" +
                (r.OverTheLimit == true ? $": over the limit (above {Index(r.HighestReadableIndex)}), no shadow edge on the scale"
                    : n < r.LowestReadableIndex ? $": below the scale (it starts at {Index(r.LowestReadableIndex)}), not readable"
                    : ": readable"));
        }
        if (r.Standards is { } standards)
        {
            foreach (StandardJson s in standards)
                output.WriteLine($"standard {Index(s.KnownIndex)} read {Index(s.RawReading)} {NoUnit}: residual {Fixed(s.Residual, "+0.0000;-0.0000;0.0000")}");
            output.WriteLine($"calibration offset (added to raw readings): {Fixed(r.CalibrationOffset!.Value, "+0.0000;-0.0000;0.0000")} " +
                $"± {Index(r.CalibrationOffsetUncertainty!.Value)} {NoUnit}");
        }
    }
}
