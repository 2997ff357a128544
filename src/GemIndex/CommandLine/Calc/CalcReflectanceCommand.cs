using System.CommandLine;
using GemIndex.Core.Optics;
using GemIndex.Core.Quantities;
using static GemIndex.Cli.CommandLine.Calc.CalcFailure;
using static GemIndex.Cli.CommandLine.Calc.CalcText;

namespace GemIndex.Cli.CommandLine.Calc;

/// <summary>
/// <c>calc reflectance</c>: Fresnel reflectance (s, p, unpolarised) at an incidence angle, or the index from a
/// measured normal-incidence reflectance.
/// </summary>
internal static class CalcReflectanceCommand
{
    internal sealed record ReflectanceResult(double IndexFrom, double IndexTo, double IndexToUncertainty, double IncidenceDegrees,
        double? SPercent, double? PPercent, double UnpolarisedPercent);

    public static Command Create()
    {
        var from = CalcOptions.Number("--n1", "Index of the medium the light comes from (no unit); default 1.000, air", 1.0);
        var to = CalcOptions.Number("--n2", "Index of the stone (no unit): gives the reflectance");
        var incidence = CalcOptions.Number("--incidence", "Angle of incidence in degrees (0–90); default 0, normal incidence", 0);
        var measured = CalcOptions.Number("--reflectance-percent", "Measured normal-incidence reflectance in %: gives the index");
        var measuredUncertainty = CalcOptions.Number("--reflectance-uncertainty-percent", "Standard uncertainty of the reflectance, in % (0–100)", 0, "reflectance uncertainty", 0, 100, "%");
        return CalcBuilder.Command("reflectance", "Fresnel reflectance from indices, or an index from normal-incidence reflectance", [from, to, incidence, measured, measuredUncertainty], pr =>
        {
            var n1 = Named("--n1", () => new RefractiveIndex(pr.GetValue(from)));
            ReflectanceResult result = (pr.GetValue(to), pr.GetValue(measured)) switch
            {
                ({ } n, null) => FromIndex(n1, Named("--n2", () => new RefractiveIndex(n)),
                    Named("--incidence", () => Angle.FromDegrees(pr.GetValue(incidence)))),
                (null, { } percent) => FromReflectance(n1, percent, pr.GetValue(measuredUncertainty)),
                _ => throw Input("give exactly one of --n2 (to get the reflectance) or --reflectance-percent (to get the index)"),
            };
            return CalcAnswer.Of(result, Write);
        });
    }

    private static ReflectanceResult FromIndex(RefractiveIndex n1, RefractiveIndex n2, Angle incidence)
    {
        Reflectance r = Named("--incidence", () => Fresnel.At(n1, n2, incidence));
        return new ReflectanceResult(n1.Value, n2.Value, 0, incidence.Degrees, r.S * 100, r.P * 100, r.Unpolarised * 100);
    }

    private static ReflectanceResult FromReflectance(RefractiveIndex n1, double percent, double uncertaintyPercent)
    {
        // Checked in the option's own unit first: the Core method works in fractions ("1.2; allowed 0 to 0.36" for 120 %).
        double highest = Fresnel.AtNormalIncidence(n1, new RefractiveIndex(RefractiveIndex.Maximum)) * 100;
        Named("--reflectance-percent", () =>
        {
            QuantityOutOfRangeException.ThrowIfNotAbove("normal-incidence reflectance", percent, 0, "%");
            QuantityOutOfRangeException.ThrowIfOutside("normal-incidence reflectance", percent, 0, Math.Floor(highest * 100) / 100, "%");
            return 0;
        });
        RefractiveIndex n2 = Named("--reflectance-percent, --reflectance-uncertainty-percent",
            () => Fresnel.IndexFromNormalReflectance(percent / 100, n1, uncertaintyPercent / 100));
        return new ReflectanceResult(n1.Value, n2.Value, n2.StandardUncertainty, 0, null, null, percent);
    }

    private static void Write(TextWriter output, ReflectanceResult r)
    {
        if (r.SPercent is { } s && r.PPercent is { } p)
        {
            output.WriteLine($"from n1 {Index(r.IndexFrom)} into n2 {Index(r.IndexTo)} {NoUnit}, incidence {Degrees(r.IncidenceDegrees)}");
            output.WriteLine($"reflectance: s-polarised {Percent(s / 100)}, p-polarised {Percent(p / 100)}, unpolarised {Percent(r.UnpolarisedPercent / 100)}");
        }
        else
        {
            output.WriteLine($"normal-incidence reflectance {Percent(r.UnpolarisedPercent / 100)} in n1 {Index(r.IndexFrom)} {NoUnit}: " +
                $"stone index {Index(new RefractiveIndex(r.IndexTo, r.IndexToUncertainty))} {NoUnit}");
        }
    }
}
