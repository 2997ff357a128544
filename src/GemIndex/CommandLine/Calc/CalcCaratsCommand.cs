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
        var json = CalcOptions.Json();
        var command = new Command("carats", "Convert metric carats to grams or grams to carats (1 ct = 0.2 g)") { carats, grams, json };
        command.SetAction(pr => Guard(pr, output =>
        {
            Mass mass = (pr.GetValue(carats), pr.GetValue(grams)) switch
            {
                ({ } ct, null) => Named("--carats", () => Mass.FromCarats(ct)),
                (null, { } g) => Named("--grams", () => Mass.FromGrams(g)),
                _ => throw Input("give exactly one of --carats or --grams"),
            };
            var result = new CaratsResult(mass.Carats, mass.Grams);
            if (pr.GetValue(json)) CalcJson.Write(output, result);
            else output.WriteLine($"{Carats(result.Carats)} = {Grams(result.Grams)}");
            return ExitCodes.Ok;
        }));
        return command;
    }
}
