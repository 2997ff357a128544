using System.CommandLine;
using GemIndex.Core.Optics;
using GemIndex.Core.Quantities;
using static GemIndex.Cli.CommandLine.Calc.CalcFailure;
using static GemIndex.Cli.CommandLine.Calc.CalcText;

namespace GemIndex.Cli.CommandLine.Calc;

/// <summary><c>calc critical-angle</c>: the critical angle from the denser medium into the rarer one.</summary>
internal static class CalcCriticalAngleCommand
{
    internal sealed record CriticalAngleResult(double DenserIndex, double RarerIndex, double? CriticalAngleDegrees);

    public static Command Create()
    {
        var denser = CalcOptions.Number("--denser", "Index of the denser medium, e.g. the stone (no unit)", required: true);
        var rarer = CalcOptions.Number("--rarer", "Index of the rarer medium (no unit); default 1.000, air", 1.0);
        return CalcBuilder.Command("critical-angle", "Critical angle for total internal reflection", [denser, rarer], pr =>
        {
            var high = Named("--denser", () => new RefractiveIndex(pr.GetValue(denser)!.Value));
            var low = Named("--rarer", () => new RefractiveIndex(pr.GetValue(rarer)));
            Angle? angle = CriticalAngle.Between(high, low);
            var result = new CriticalAngleResult(high.Value, low.Value, angle?.Degrees);
            return CalcAnswer.Of(result, (output, _) => output.WriteLine(result.CriticalAngleDegrees is { } degrees
                ? $"critical angle from {Index(high)} into {Index(low)} {NoUnit}: {Degrees(degrees)}"
                : $"no critical angle: {Index(high)} is not denser than {Index(low)} {NoUnit}, so light is never totally reflected"));
        });
    }
}
