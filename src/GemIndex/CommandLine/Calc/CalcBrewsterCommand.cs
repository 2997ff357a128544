using System.CommandLine;
using GemIndex.Core.Optics;
using GemIndex.Core.Quantities;
using static GemIndex.Cli.CommandLine.Calc.CalcFailure;
using static GemIndex.Cli.CommandLine.Calc.CalcText;

namespace GemIndex.Cli.CommandLine.Calc;

/// <summary><c>calc brewster</c>: the polarising (Brewster) angle from an index, or the index from that angle.</summary>
internal static class CalcBrewsterCommand
{
    internal sealed record BrewsterResult(double SurroundingIndex, double StoneIndex, double? StoneIndexUncertainty,
        double BrewsterAngleDegrees, double? BrewsterAngleUncertaintyDegrees);

    public static Command Create()
    {
        var surrounding = CalcOptions.Number("--surrounding", "Index of the surrounding medium (no unit); default 1.000, air", 1.0);
        var stone = CalcOptions.Number("--index", "Index of the stone (no unit): gives the angle");
        var angle = CalcOptions.Number("--angle", "Measured Brewster angle in degrees: gives the index");
        var angleUncertainty = CalcOptions.Number("--angle-uncertainty", "Standard uncertainty of --angle, in degrees (0–10)", 0, "angle uncertainty", 0, 10, "°");
        return CalcBuilder.Command("brewster", "Brewster (polarising) angle from an index, or an index from that angle", [surrounding, stone, angle, angleUncertainty], pr =>
        {
            var medium = Named("--surrounding", () => new RefractiveIndex(pr.GetValue(surrounding)));
            BrewsterResult result = (pr.GetValue(stone), pr.GetValue(angle)) switch
            {
                ({ } n, null) => FromIndex(medium, Named("--index", () => new RefractiveIndex(n))),
                (null, { } degrees) => FromAngle(medium, Named("--angle, --angle-uncertainty",
                    () => Angle.FromDegrees(degrees, pr.GetValue(angleUncertainty)))),
                _ => throw Input("give exactly one of --index (to get the angle) or --angle (to get the index)"),
            };
            return CalcAnswer.Of(result, (output, _) => output.WriteLine($"in {Index(result.SurroundingIndex)} {NoUnit}: index " +
                Index(new RefractiveIndex(result.StoneIndex, result.StoneIndexUncertainty ?? 0)) + $" {NoUnit} ↔ Brewster angle " +
                Degrees(Angle.FromDegrees(result.BrewsterAngleDegrees, result.BrewsterAngleUncertaintyDegrees ?? 0))));
        });
    }

    private static BrewsterResult FromIndex(RefractiveIndex medium, RefractiveIndex stone)
    {
        Angle angle = Named("--index", () => BrewsterAngle.Of(medium, stone));
        return new BrewsterResult(medium.Value, stone.Value, null, angle.Degrees, null);
    }

    private static BrewsterResult FromAngle(RefractiveIndex medium, Angle angle)
    {
        RefractiveIndex stone = Named("--angle", () => BrewsterAngle.IndexFrom(angle, medium));
        return new BrewsterResult(medium.Value, stone.Value, stone.StandardUncertainty, angle.Degrees, angle.StandardUncertaintyDegrees);
    }
}
