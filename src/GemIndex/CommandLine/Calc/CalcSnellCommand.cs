using System.CommandLine;
using GemIndex.Core.Optics;
using GemIndex.Core.Quantities;
using static GemIndex.Cli.CommandLine.Calc.CalcFailure;
using static GemIndex.Cli.CommandLine.Calc.CalcText;

namespace GemIndex.Cli.CommandLine.Calc;

/// <summary><c>calc snell</c>: the refraction angle from two indices and an incidence angle, or total reflection.</summary>
internal static class CalcSnellCommand
{
    internal sealed record SnellResult(double IndexFrom, double IndexTo, double IncidenceDegrees, bool TotallyReflected,
        double? RefractionDegrees, double? CriticalAngleDegrees);

    public static Command Create()
    {
        var from = CalcOptions.Number("--n1", "Index of the medium the light comes from (no unit), e.g. 1.000 for air", required: true);
        var to = CalcOptions.Number("--n2", "Index of the medium the light enters (no unit)", required: true);
        var incidence = CalcOptions.Number("--incidence", "Angle of incidence from the normal, in degrees (0–90)", required: true);
        return CalcBuilder.Command("snell", "Refraction angle by Snell's law, or total internal reflection", [from, to, incidence], pr =>
        {
            var n1 = Named("--n1", () => new RefractiveIndex(pr.GetValue(from)!.Value));
            var n2 = Named("--n2", () => new RefractiveIndex(pr.GetValue(to)!.Value));
            Angle theta = Named("--incidence", () => Angle.FromDegrees(pr.GetValue(incidence)!.Value));
            Refraction refraction = Named("--incidence", () => Snell.Refract(n1, n2, theta));
            Angle? critical = CriticalAngle.Between(n1, n2);
            var result = new SnellResult(n1.Value, n2.Value, theta.Degrees, refraction.IsTotallyReflected,
                refraction.TryGetAngle(out Angle refracted) ? refracted.Degrees : null, critical?.Degrees);
            return CalcAnswer.Of(result, Write);
        });
    }

    private static void Write(TextWriter output, SnellResult r)
    {
        output.WriteLine($"n1 {Index(r.IndexFrom)} {NoUnit} → n2 {Index(r.IndexTo)} {NoUnit}, incidence {Degrees(r.IncidenceDegrees)}");
        output.WriteLine(r.RefractionDegrees is { } angle
            ? $"refraction angle: {Degrees(angle)}"
            : $"totally reflected (the critical angle is {Degrees(r.CriticalAngleDegrees!.Value)})");
    }
}
