using System.CommandLine;
using GemIndex.Core.Optics;
using GemIndex.Core.Quantities;
using static GemIndex.Cli.CommandLine.Calc.CalcFailure;
using static GemIndex.Cli.CommandLine.Calc.CalcText;

namespace GemIndex.Cli.CommandLine.Calc;

/// <summary><c>calc prism</c>: the index from a prism's apex angle and its minimum deviation, with uncertainty.</summary>
internal static class CalcPrismCommand
{
    internal sealed record PrismResult(double ApexDegrees, double ApexUncertaintyDegrees, double MinimumDeviationDegrees,
        double MinimumDeviationUncertaintyDegrees, double Index, double IndexUncertainty);

    public static Command Create()
    {
        var apex = CalcOptions.Number("--apex", "Apex angle of the prism (the angle between the two facets), in degrees", required: true);
        var apexUncertainty = CalcOptions.Number("--apex-uncertainty", "Standard uncertainty of --apex, in degrees", 0);
        var deviation = CalcOptions.Number("--deviation", "Minimum deviation angle, in degrees", required: true);
        var deviationUncertainty = CalcOptions.Number("--deviation-uncertainty", "Standard uncertainty of --deviation, in degrees", 0);
        return CalcBuilder.Command("prism", "Refractive index by the minimum-deviation method", [apex, apexUncertainty, deviation, deviationUncertainty], pr =>
        {
            Angle a = Named("--apex, --apex-uncertainty", () => Angle.FromDegrees(pr.GetValue(apex)!.Value, pr.GetValue(apexUncertainty)));
            Angle d = Named("--deviation, --deviation-uncertainty",
                () => Angle.FromDegrees(pr.GetValue(deviation)!.Value, pr.GetValue(deviationUncertainty)));
            RefractiveIndex n = Named("--apex, --deviation", () => MinimumDeviation.IndexFrom(a, d));
            var result = new PrismResult(a.Degrees, a.StandardUncertaintyDegrees, d.Degrees, d.StandardUncertaintyDegrees,
                n.Value, n.StandardUncertainty);
            return CalcAnswer.Of(result, (output, _) => output.WriteLine($"apex {Degrees(a)}, minimum deviation {Degrees(d)}: refractive index {Index(n)} {NoUnit}"));
        });
    }
}
