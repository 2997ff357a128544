using System.CommandLine;
using GemIndex.Cli.Identification;
using GemIndex.Core.Identification;
using GemIndex.Data.Batch;
using GemIndex.Data.Catalogue;

namespace GemIndex.Cli.CommandLine;

/// <summary>
/// <c>identify</c>: one stone from options (readable text or <c>--json</c>), or a whole batch file of JSON Lines
/// (<c>--batch FILE</c>, <c>-</c> for standard input) in the batch interface's fixed format.
/// </summary>
internal static class IdentifyCommand
{
    public static Command Create(Option<DirectoryInfo?> catalogueDirectory)
    {
        var batch = new Option<string?>("--batch") { Description = "JSON Lines file of stones (- for standard input); writes one JSON line per stone" };
        var explain = new Option<bool>("--explain") { Description = "With --batch: add each leading candidate's reasons ('why')" };
        var edges = new Option<string[]>("--edge")
        {
            Description = "A rotation step ROTATION:LOW[/HIGH], e.g. --edge 0:1.544/1.553 --edge 45:1.544/1.549 (repeat per step)",
            AllowMultipleArgumentsPerToken = false,
        };
        var spot = NumberOption.Optional("--spot", "A spot reading (distant-vision method on a curved surface)", _ => { });
        var overLimit = new Option<bool>("--over-limit") { Description = "No stone edge below the contact liquid's index" };
        var liquid = NumberOption.Optional("--liquid-limit", "The contact liquid's index (default 1.79)", _ => { });
        var light = NumberOption.Optional("--light-nm", "Wavelength of the light the readings were taken in, nm (default 589.3)", _ => { });
        var sg = NumberOption.Optional("--sg", "Specific gravity", _ => { });
        var inAir = NumberOption.Optional("--in-air-ct", "Hydrostatic weighing: weight in air, carats", _ => { });
        var inWater = NumberOption.Optional("--in-water-ct", "Hydrostatic weighing: weight in water, carats", _ => { });
        var waterC = NumberOption.Optional("--water-c", "Hydrostatic weighing: water temperature, °C (default 20)", _ => { });
        var liquids = new Option<string[]>("--heavy-liquid") { Description = "DENSITY:floats|sinks|suspends (repeat per liquid)" };
        var polariscope = Word("--polariscope", "singly_refractive | doubly_refractive | aggregate | anomalous");
        var pleochroism = Word("--pleochroism", "none | dichroic | trichroic");
        var dispersion = Word("--dispersion", "none | weak | moderate | strong | very_strong");
        var thermal = Word("--thermal-probe", "positive | negative");
        var electrical = Word("--electrical", "conductive | insulating");
        var uvLong = Word("--uv-long", "inert | weak | moderate | strong");
        var uvShort = Word("--uv-short", "inert | weak | moderate | strong");
        var lines = new Option<string?>("--lines") { Description = "Absorption lines seen, nm, comma-separated (\"none\" if none)" };
        var colour = Word("--colour", "a plain colour word");
        var id = new Option<string>("--id") { Description = "The stone's reference", DefaultValueFactory = _ => "stone" };
        var count = new Option<int>("--candidates") { Description = "How many candidates to show (1–50)", DefaultValueFactory = _ => 5 };
        var json = new Option<bool>("--json") { Description = "Write the result as one JSON line (the batch format)" };
        var command = new Command("identify", "Rank catalogue materials for a stone's bench readings, with confidence, reasons and the next test")
        {
            batch, explain, edges, spot, overLimit, liquid, light, sg, inAir, inWater, waterC, liquids, polariscope, pleochroism,
            dispersion, thermal, electrical, uvLong, uvShort, lines, colour, id, count, json, catalogueDirectory,
        };
        command.SetAction(pr => CatalogueFailure.Guard(pr, (output, error) =>
        {
            var identifier = new Identifier(MergedCatalogue.Load(CatalogueCommand.Locations(pr, catalogueDirectory)));
            if (pr.GetValue(batch) is { } file) return Batch(file, identifier, pr.GetValue(explain), output, error);
            try
            {
                var readings = new StoneReadings
                {
                    Id = pr.GetValue(id)!,
                    Refractometer = pr.GetValue(edges) is { Length: > 0 } || pr.GetValue(spot) is not null || pr.GetValue(overLimit)
                        ? new RefractometerReadings
                        {
                            Method = pr.GetValue(spot) is not null && pr.GetValue(edges) is not { Length: > 0 } ? "spot" : "facet",
                            Readings = [.. (pr.GetValue(edges) ?? []).Select((e, i) => Step(e, i))],
                            Spot = pr.GetValue(spot), OverLimit = pr.GetValue(overLimit),
                            LiquidLimit = pr.GetValue(liquid), LightNm = pr.GetValue(light),
                        }
                        : null,
                    Sg = pr.GetValue(sg),
                    SgWeighing = pr.GetValue(inAir) is { } air && pr.GetValue(inWater) is { } water ? new HydrostaticReadings(air, water, pr.GetValue(waterC)) : null,
                    HeavyLiquids = [.. (pr.GetValue(liquids) ?? []).Select((l, i) => Liquid(l, i))],
                    Polariscope = pr.GetValue(polariscope), Pleochroism = pr.GetValue(pleochroism), Dispersion = pr.GetValue(dispersion),
                    ThermalProbe = pr.GetValue(thermal), Electrical = pr.GetValue(electrical), UvLong = pr.GetValue(uvLong), UvShort = pr.GetValue(uvShort),
                    AbsorptionNm = pr.GetValue(lines) is { } l ? Lines(l) : null,
                    Colour = pr.GetValue(colour),
                };
                var result = identifier.Identify(StoneReadingsConverter.ToBenchSheet(readings), Math.Clamp(pr.GetValue(count), 1, 50));
                if (pr.GetValue(json)) output.WriteLine(BatchResultJson.Result(result, explain: true));
                else IdentificationText.Write(result, output);
                return ExitCodes.Ok;
            }
            catch (BatchInputException e)
            {
                error.WriteLine($"gemindex: {e.Message}");
                return ExitCodes.BadInput;
            }
        }));
        return command;
    }

    private static Option<string?> Word(string name, string description) => new(name) { Description = description };

    private static int Batch(string file, Identifier identifier, bool explain, TextWriter output, TextWriter error)
    {
        using TextReader input = file == "-" ? Console.In : new StreamReader(file);
        int failed = BatchIdentification.Run(input, output, identifier, explain);
        if (failed > 0) error.WriteLine($"gemindex: {failed} line(s) could not be read; see their error lines");
        return failed > 0 ? ExitCodes.BadInput : ExitCodes.Ok;
    }

    private static EdgeReadingEntry Step(string text, int index)
    {
        string field = $"--edge #{index + 1}";
        var parts = text.Split(':');
        if (parts.Length != 2) throw new BatchInputException(field, $"'{text}' is not ROTATION:LOW[/HIGH] (e.g. 0:1.544/1.553)");
        var edges = parts[1].Split('/');
        double rotation = Number(parts[0], field + " rotation");
        double low = Number(edges[0], field + " low edge");
        double? high = edges.Length > 1 ? Number(edges[1], field + " high edge") : null;
        return new EdgeReadingEntry(rotation, low, high);
    }

    private static HeavyLiquidReading Liquid(string text, int index)
    {
        var parts = text.Split(':');
        string field = $"--heavy-liquid #{index + 1}";
        if (parts.Length != 2) throw new BatchInputException(field, $"'{text}' is not DENSITY:floats|sinks|suspends");
        return new HeavyLiquidReading(Number(parts[0], field + " density"), parts[1]);
    }

    private static List<double> Lines(string text) => text.Trim().Equals("none", StringComparison.OrdinalIgnoreCase)
        ? []
        : [.. text.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries).Select((t, i) => Number(t, $"--lines #{i + 1}"))];

    private static double Number(string text, string field) =>
        Core.Quantities.BenchNumber.TryParse(text, out double v, out string problem) ? v : throw new BatchInputException(field, problem);
}
