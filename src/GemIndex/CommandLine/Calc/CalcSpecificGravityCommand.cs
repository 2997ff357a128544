using System.CommandLine;
using GemIndex.Core.Bench;
using GemIndex.Core.Gravity;
using GemIndex.Core.Quantities;
using static GemIndex.Cli.CommandLine.Calc.CalcFailure;
using static GemIndex.Cli.CommandLine.Calc.CalcText;

namespace GemIndex.Cli.CommandLine.Calc;

/// <summary>
/// <c>calc sg</c>: specific gravity by hydrostatic weighing (weights in air and in water, water temperature, balance
/// resolution) with its uncertainty, by the same rules as <c>identify</c> (each weighing ± the bench's weighing
/// uncertainty, <see cref="BenchDefaults"/>); and the density of water at that temperature.
/// </summary>
internal static class CalcSpecificGravityCommand
{
    internal sealed record SpecificGravityResult(double WaterCelsius, double WaterDensityKilogramsPerCubicMetre,
        string? EnteredUnit, double? WeightInAirCarats, double? WeightInWaterCarats, double? BalanceResolutionCarats,
        double? SpecificGravity, double? SpecificGravityUncertainty);

    public static Command Create()
    {
        var inAir = CalcOptions.Number("--in-air", "Weight of the stone in air, in --unit");
        var inWater = CalcOptions.Number("--in-water", "Weight of the stone in water, in --unit");
        var unit = new Option<string>("--unit") { Description = "Unit of the weights and resolution: ct or g (default ct)", DefaultValueFactory = _ => "ct" };
        ChoiceOption.Restrict(unit, "ct", "g");
        var water = CalcOptions.Number("--water-celsius", $"Water temperature in °C (0–40); default {BenchDefaults.WaterCelsius}", BenchDefaults.WaterCelsius, "water temperature", 0, 40, "°C");
        var resolution = CalcOptions.Number("--resolution", "Balance resolution (its smallest step), in --unit; adds its rounding uncertainty");
        return CalcBuilder.Command("sg", "Specific gravity by hydrostatic weighing, and the density of water at a temperature", [inAir, inWater, unit, water, resolution], pr =>
        {
            Temperature t = Temperature.FromCelsius(pr.GetValue(water));
            WaterDensity density = Named("--water-celsius", () => WaterDensity.At(t));
            var result = new SpecificGravityResult(t.Celsius, density.KilogramsPerCubicMetre, null, null, null, null, null, null);
            (double? air, double? inW) = (pr.GetValue(inAir), pr.GetValue(inWater));
            if (air is null != inW is null) throw Input("give both --in-air and --in-water, or neither (for the water density only)");
            if (air is { } a && inW is { } w) result = Weigh(result, pr.GetValue(unit)!, a, w, pr.GetValue(resolution), t);
            return CalcAnswer.Of(result, Write);
        });
    }

    private static SpecificGravityResult Weigh(SpecificGravityResult result, string unit, double air, double inWater, double? resolution, Temperature t)
    {
        Func<double, Mass> mass = unit == "g" ? g => Mass.FromGrams(g) : ct => Mass.FromCarats(ct);
        // Each weighing carries Core's bench uncertainty, as in identify and report (BenchDefaults.WeighingUncertaintyCarats).
        Mass a = Named("--in-air", () => BenchDefaults.Weighed(mass(air).Carats));
        Mass w = Named("--in-water", () => BenchDefaults.Weighed(mass(inWater).Carats));
        Mass? delta = resolution is { } step ? Named("--resolution", () => mass(step)) : null;
        SpecificGravity sg = delta is { } d
            ? Named("--in-air, --in-water, --resolution", () => HydrostaticWeighing.SpecificGravityOf(a, w, t, d))
            : Named("--in-air, --in-water", () => HydrostaticWeighing.SpecificGravityOf(a, w, t));
        return result with { EnteredUnit = unit, WeightInAirCarats = a.Carats, WeightInWaterCarats = w.Carats, BalanceResolutionCarats = delta?.Carats,
            SpecificGravity = sg.Value, SpecificGravityUncertainty = sg.StandardUncertainty };
    }

    private static void Write(TextWriter output, SpecificGravityResult r)
    {
        output.WriteLine($"water at {Fixed(r.WaterCelsius, "0.##")} °C: density {Fixed(r.WaterDensityKilogramsPerCubicMetre, "0.0000")} kg/m³");
        if (r.SpecificGravity is not { } sg) return;
        Func<double, string> weight = r.EnteredUnit == "g" ? ct => Grams(Mass.FromCarats(ct).Grams) : Carats;
        output.WriteLine($"in air {weight(r.WeightInAirCarats!.Value)}, in water {weight(r.WeightInWaterCarats!.Value)}" +
            (r.BalanceResolutionCarats is { } step ? $", balance resolution {weight(step)}" : ""));
        output.WriteLine($"specific gravity {SpecificGravity.Text(sg, r.SpecificGravityUncertainty!.Value)} " +
            "(relative to water at 4 °C, no unit)");
    }
}
