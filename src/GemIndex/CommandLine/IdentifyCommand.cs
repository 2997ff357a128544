using System.CommandLine;
using System.CommandLine.Parsing;
using System.Globalization;
using GemIndex.Cli.Identification;
using GemIndex.Core.Bench;
using GemIndex.Core.Identification;
using GemIndex.Data.Catalogue;

namespace GemIndex.Cli.CommandLine;

/// <summary>
/// <c>identify</c>: one stone from options (readable text or <c>--json</c>), or a whole batch file of JSON Lines
/// (<c>--batch FILE</c>, <c>-</c> for standard input). Both fill Core's <see cref="BenchReadings"/> and go through
/// <see cref="BenchIdentification"/>; every bad value is reported at once, naming its option (exit 3).
/// </summary>
internal static class IdentifyCommand
{
    /// <summary>The reading options: option name → the field of <see cref="BenchReadings"/> it fills.</summary>
    private static readonly (string Option, string Field, string Description)[] Values =
    [
        ("--spot", BenchField.Spot, "A spot reading (distant-vision method on a curved surface)"),
        ("--liquid-limit", BenchField.LiquidLimit, $"The contact liquid's index (default {BenchDefaults.LiquidLimit.ToString(CultureInfo.InvariantCulture)}; an edge above it is an error unless the liquid is given)"),
        ("--light-nm", BenchField.LightNm, $"Wavelength of the light the readings were taken in, nm (default {BenchDefaults.LightNanometres.ToString(CultureInfo.InvariantCulture)})"),
        ("--precision", BenchField.Precision, $"Standard uncertainty of one refractometer reading (default {BenchDefaults.FacetPrecision.ToString(CultureInfo.InvariantCulture)} facet, {BenchDefaults.SpotPrecision.ToString(CultureInfo.InvariantCulture)} spot)"),
        ("--calibration-offset", BenchField.CalibrationOffset, "Added to every refractometer reading, from a calibration on a standard (default 0)"),
        ("--sg", BenchField.Sg, $"Specific gravity typed directly (taken as ± {BenchDefaults.DirectSpecificGravityUncertainty.ToString(CultureInfo.InvariantCulture)})"),
        ("--in-air-ct", BenchField.AirCt, $"Hydrostatic weighing: weight in air, carats (each weighing ± {BenchDefaults.WeighingUncertaintyCarats.ToString(CultureInfo.InvariantCulture)} ct)"),
        ("--in-water-ct", BenchField.WaterCt, "Hydrostatic weighing: weight in water, carats"),
        ("--water-c", BenchField.WaterC, $"Hydrostatic weighing: water temperature, °C (default {BenchDefaults.WaterCelsius.ToString(CultureInfo.InvariantCulture)})"),
        ("--polariscope", BenchField.Polariscope, BenchWords.Choices<Core.Observations.PolariscopeReaction>()),
        ("--pleochroism", BenchField.Pleochroism, BenchWords.Choices<Core.Observations.PleochroismObservation>()),
        ("--dispersion", BenchField.Dispersion, BenchWords.Choices<Core.Observations.DispersionStrength>()),
        ("--thermal-probe", BenchField.ThermalProbe, BenchWords.Choices<Core.Observations.ThermalProbeResult>()),
        ("--electrical", BenchField.Electrical, BenchWords.Choices<Core.Observations.ElectricalResult>()),
        ("--reflectance", BenchField.Reflectance, $"A reflectance meter's reading, percent at normal incidence ({Core.Observations.ReflectanceReading.LowestPercent.ToString(CultureInfo.InvariantCulture)}–{Core.Observations.ReflectanceReading.HighestPercent.ToString(CultureInfo.InvariantCulture)}): past the refractometer's limit it parts diamond (about 17.2), cubic zirconia (13.5) and moissanite (20.4–20.9)"),
        ("--uv-long", BenchField.UvLong, BenchWords.Choices<Core.Observations.FluorescenceStrength>()),
        ("--uv-short", BenchField.UvShort, BenchWords.Choices<Core.Observations.FluorescenceStrength>()),
        ("--lines", BenchField.Absorption, "Absorption lines seen, nm, separated by spaces or commas (\"none\" if none)"),
        ("--colour", BenchField.Colour, "The colour in plain words, e.g. yellow, \"bluish green\" (the last hue named is the colour; an -ish word only tones it)"),
        ("--cut", BenchField.Cut, BenchWords.Choices<Core.Observations.StoneCut>() + "; a faceted stone shows no star or cat's-eye"),
        ("--transparency", BenchField.Transparency, BenchWords.Choices<Core.Observations.StoneTransparency>() + "; an opaque stone is advised no test in transmitted light"),
    ];

    public static Command Create(Option<DirectoryInfo?> catalogueDirectory)
    {
        var batch = new Option<string?>("--batch") { Description = "JSON Lines file of stones (- for standard input), one object a line, e.g. {\"id\":\"A1\",\"refractometer\":{\"method\":\"facet\",\"readings\":[{\"rotation_deg\":0,\"low\":1.544,\"high\":1.553}]},\"sg\":2.65,\"heavy_liquids\":[{\"density\":3.32,\"result\":\"floats\"}],\"colour\":\"yellow\"} (every field: the README's \"Batch format\"); writes one JSON line per stone" };
        var explain = new Option<bool>("--explain") { Description = "With --batch: add each leading candidate's reasons ('why')" };
        var edges = new Option<string[]>("--edge")
        {
            Description = "A rotation step ROTATION:LOW[/HIGH], e.g. --edge 0:1.544/1.553 --edge 45:1.544/1.549 (repeat per step)",
            AllowMultipleArgumentsPerToken = false,
        };
        var overLimit = new Option<bool>("--over-limit") { Description = "No stone edge below the contact liquid's index (with --edge steps of low edges only: the high edge was above it)" };
        var liquids = new Option<string[]>("--heavy-liquid") { Description = "DENSITY RESULT, RESULT floats | sinks | suspends, e.g. \"3.32 floats\" (repeat per liquid)" };
        var features = new Option<string[]>("--feature")
        {
            Description = "A magnification feature or phenomenon seen, e.g. curved_striae, chatoyancy (repeat per feature; the words are listed by an unknown one's error)",
            AllowMultipleArgumentsPerToken = false,
        };
        var noFeatures = new Option<string[]>("--no-feature")
        {
            Description = "A magnification feature looked for and not seen (repeat per feature); a feature not named was not looked for",
            AllowMultipleArgumentsPerToken = false,
        };
        var values = Values.Select(v => (v.Field, Option: new Option<string?>(v.Option) { Description = v.Description })).ToList();
        var id = new Option<string>("--id") { Description = "The stone's reference", DefaultValueFactory = _ => "stone" };
        var count = new Option<string?>("--candidates") { Description = $"How many candidates to show (1–{BenchDefaults.MostCandidates}, default {BenchDefaults.Candidates})" };
        var json = new Option<bool>("--json") { Description = "Write the result as one JSON line: the result document, the species first (its fields: docs/result-document.md in the source)" };
        var command = new Command("identify", "Rank catalogue materials for a stone's bench readings, with confidence, reasons and the next test")
        {
            batch, explain, edges, overLimit, liquids, features, noFeatures, id, count, json, catalogueDirectory,
        };
        foreach (var (_, option) in values) command.Options.Add(option);
        command.SetAction(pr => CatalogueFailure.Guard(pr, (output, error) =>
        {
            if (Candidates(pr.GetValue(count), error) is not { } candidates) return ExitCodes.BadInput;
            var readings = new BenchReadings().With(BenchField.Id, pr.GetValue(id));
            var shapeErrors = new List<BenchFieldError>();
            foreach (var (text, i) in (pr.GetValue(edges) ?? []).Select((t, i) => (t, i)))
            {
                if (BenchSyntax.Step(text) is { } step) readings = readings.WithStep(step);
                else shapeErrors.Add(new BenchFieldError(BenchField.Step(i), BenchText.Shown(text), "ROTATION:LOW[/HIGH], e.g. 0:1.544/1.553",
                    $"'{BenchText.Shown(text)}' is not ROTATION:LOW[/HIGH] (e.g. 0:1.544/1.553)."));
            }
            if (pr.GetValue(overLimit)) readings = readings.With(BenchField.OverLimit, "yes");
            if (pr.GetValue(liquids) is { Length: > 0 } entries) readings = readings.With(BenchField.HeavyLiquids, BenchSyntax.HeavyLiquids(entries));
            foreach (var (field, option) in values) readings = readings.With(field, pr.GetValue(option));
            if (pr.GetValue(features) is { Length: > 0 } seen) readings = readings.With(BenchField.FeaturesPresent, BenchSyntax.Features(seen));
            if (pr.GetValue(noFeatures) is { Length: > 0 } unseen) readings = readings.With(BenchField.FeaturesAbsent, BenchSyntax.Features(unseen));
            bool anyReading = readings.Values.Count > 1 || readings.Steps.Count > 0 || shapeErrors.Count > 0;
            if (pr.GetValue(batch) is { } file)
            {
                if (anyReading || pr.GetValue(json))
                    return Refuse(error, "--batch reads the stones from the file: reading options and --json are not used with it; give one or the other.");
                return Batch(file, candidates, pr.GetValue(explain), catalogueDirectory, pr, output, error);
            }
            if (pr.GetValue(explain)) return Refuse(error, "--explain is used only with --batch (the single-stone output always gives the reasons).");
            var identifier = new Identifier(MergedCatalogue.Load(CatalogueCommand.Locations(pr, catalogueDirectory)));
            BenchOutcome outcome = BenchIdentification.Identify(identifier, readings, new BenchRequest { Candidates = candidates, RefuseEmpty = true });
            var errors = shapeErrors.Concat(outcome.Reading.Errors).ToList();
            if (errors.Count > 0 || outcome.Result is not { } result)
            {
                foreach (var e in errors)
                    error.WriteLine(e.Field == "$" ? $"gemindex: {InOptions(e.Sentence).TrimEnd('.')}; 'identify --help' lists the reading options"
                        : $"gemindex: {OptionOf(e.Field)}: {InOptions(e.Sentence)}");
                // A script that asked for JSON reads the error document on standard output too, as a batch line gives it.
                if (pr.GetValue(json)) output.WriteLine(ResultDocument.Error(null, pr.GetValue(id), errors));
                return ExitCodes.BadInput;
            }
            if (pr.GetValue(json)) output.WriteLine(ResultDocument.Line(result, explain: true));
            else IdentificationText.Write(result, output, outcome.Reading.Sheet.Magnification, outcome.Reading.Sheet.Cut, outcome.Reading.Sheet.Transparency,
                reflectanceRead: outcome.Reading.Sheet.Reflectance is not null);
            return ExitCodes.Ok;
        }));
        return command;
    }

    /// <summary>A reason as the command line gives it: the fields it names ("refractometer.liquid_limit") by their options ("--liquid-limit").</summary>
    private static string InOptions(string sentence)
    {
        // Only the dotted names: a plain one ("colour", "sg") is also an everyday word of the sentences.
        foreach (var (option, field, _) in Values.Where(v => v.Field.Contains('.', StringComparison.Ordinal)).OrderByDescending(v => v.Field.Length))
            sentence = sentence.Replace(field, option, StringComparison.Ordinal);
        // The fields with an option of their own (not in Values): the magnification lists.
        foreach (string field in new[] { BenchField.FeaturesPresent, BenchField.FeaturesAbsent })
            sentence = sentence.Replace(field, OptionOf(field), StringComparison.Ordinal);
        return System.Text.RegularExpressions.Regex.Replace(sentence, System.Text.RegularExpressions.Regex.Escape(BenchField.Readings) + @"\[\d+\]", m => OptionOf(m.Value));
    }

    /// <summary>The option a field came from, for messages: refractometer.readings[0] → "--edge #1".</summary>
    private static string OptionOf(string field)
    {
        if (field.StartsWith(BenchField.Readings + "[", StringComparison.Ordinal)
            && int.TryParse(field[(BenchField.Readings.Length + 1)..field.IndexOf(']', StringComparison.Ordinal)], NumberStyles.None, CultureInfo.InvariantCulture, out int i))
            return $"--edge #{i + 1}";
        return field switch
        {
            BenchField.Readings => "--edge",
            BenchField.OverLimit => "--over-limit",
            BenchField.HeavyLiquids => "--heavy-liquid",
            BenchField.FeaturesPresent => "--feature",
            BenchField.FeaturesAbsent => "--no-feature",
            BenchField.IndexAtB or BenchField.IndexAtG => "--dispersion",
            _ => Values.FirstOrDefault(v => v.Field == field).Option ?? field,
        };
    }

    /// <summary>--candidates checked here, not clamped: 1–50, a bad value exits 3 naming the range.</summary>
    private static int? Candidates(string? text, TextWriter error)
    {
        if (text is null) return BenchDefaults.Candidates;
        if (int.TryParse(text.Trim(), NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out int n) && n is >= 1 and <= BenchDefaults.MostCandidates) return n;
        error.WriteLine($"gemindex: --candidates: '{BenchText.Shown(text)}' is not a whole number from 1 to {BenchDefaults.MostCandidates}; allowed: 1–{BenchDefaults.MostCandidates}.");
        return null;
    }

    private static int Refuse(TextWriter error, string sentence)
    {
        error.WriteLine($"gemindex: {sentence}");
        return ExitCodes.Usage;
    }

    private static int Batch(string file, int candidates, bool explain, Option<DirectoryInfo?> catalogueDirectory, ParseResult pr, TextWriter output, TextWriter error)
    {
        if (file.Trim().Length == 0)
        {
            error.WriteLine("gemindex: --batch: the path is empty; give a file, or - for standard input.");
            return ExitCodes.BadInput;
        }
        if (file != "-" && Directory.Exists(file))
        {
            error.WriteLine($"gemindex: --batch: {BenchText.Shown(file)} is a folder, not a file.");
            return ExitCodes.BadFile;
        }
        if (file != "-" && !File.Exists(file))
        {
            error.WriteLine($"gemindex: --batch: there is no file {BenchText.Shown(file)}.");
            return ExitCodes.BadFile;
        }
        var identifier = new Identifier(MergedCatalogue.Load(CatalogueCommand.Locations(pr, catalogueDirectory)));
        // Standard input is read as UTF-8 with or without a byte order mark, as a file is.
        using TextReader input = file == "-" ? new StreamReader(Console.OpenStandardInput(), System.Text.Encoding.UTF8, detectEncodingFromByteOrderMarks: true) : new StreamReader(file);
        var progress = BatchProgress.ForConsole(error, file == "-" ? null : new FileInfo(file).Length, "stones");
        var summary = BatchIdentification.Run(input, output, identifier, new BenchRequest { Candidates = candidates, ExplainTop = explain ? BenchDefaults.ExplainedCandidates : 0 }, progress);
        if (summary.LinesWithUnread > 0)
            error.WriteLine($"gemindex: {summary.LinesWithUnread} line(s) hold fields the batch format does not know, which were not read (first: {summary.FirstUnread}); each answer's warnings name them");
        if (summary.Failed > 0) error.WriteLine($"gemindex: {summary.Failed} line(s) could not be read or ranked; see their error lines");
        return summary.Failed > 0 ? ExitCodes.BadInput : ExitCodes.Ok;
    }
}
