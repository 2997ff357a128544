using System.CommandLine;
using GemIndex.Core.Quantities;
using static GemIndex.Cli.CommandLine.Calc.CalcFailure;
using static GemIndex.Cli.CommandLine.Calc.CalcText;

namespace GemIndex.Cli.CommandLine.Calc;

/// <summary><c>calc carats</c>: metric carats to grams and back.</summary>
internal static class CalcCaratsCommand
{
    internal sealed record CaratsResult(double Carats, double Grams);

    public static Command Create()
    {
        var carats = CalcOptions.Number("--carats", "A mass in metric carats: gives grams");
        var grams = CalcOptions.Number("--grams", "A mass in grams: gives carats");
        return CalcBuilder.Command("carats", "Convert metric carats to grams or grams to carats (1 ct = 0.2 g)", [carats, grams], pr =>
        {
            Mass mass = (pr.GetValue(carats), pr.GetValue(grams)) switch
            {
                ({ } ct, null) => Named("--carats", () => Mass.FromCarats(ct)),
                (null, { } g) => Named("--grams", () => Mass.FromGrams(g)),
                _ => throw Input("give exactly one of --carats or --grams"),
            };
            var result = new CaratsResult(mass.Carats, mass.Grams);
            return CalcAnswer.Of(result, (output, _) => output.WriteLine($"{Carats(result.Carats)} = {Grams(result.Grams)}"));
        });
    }
}
