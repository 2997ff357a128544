using System.Text.RegularExpressions;
using GemIndex.Core.Identification;
using GemIndex.Core.Quantities;
using GemIndex.Data.Batch;

namespace GemIndex.Cli.TextUi.Bench;

/// <summary>
/// Reads a form snapshot, checks it through the batch converter and ranks the candidates. A bad field is reported
/// at that field and left out, so the rest still ranks. Thread-safe: it keeps no state between calls.
/// </summary>
internal sealed partial class BenchAssessor(Identifier? identifier)
{
    /// <summary>Candidates at or above this confidence count as "among the top ones" for the immersion caution.</summary>
    public const double ImmersionCautionConfidence = 0.05;

    private const int MostRetries = 40;

    /// <summary>False when built without a catalogue (nothing is ranked then).</summary>
    public bool HasCatalogue => identifier is not null;

    public BenchAssessment Assess(BenchSnapshot form)
    {
        var errors = new Dictionary<string, string>();
        StoneReadings readings = new FormReader(form, errors).Read();
        CheckWeight(form, errors);
        BenchSheet? sheet = null;
        StoneReadings usable = readings;
        for (int attempt = 0; attempt < MostRetries && sheet is null; attempt++)
        {
            try { sheet = StoneReadingsConverter.ToBenchSheet(usable); }
            catch (BatchInputException e) { usable = Without(usable, e, errors); }
        }
        sheet = sheet is null ? null : Instrument(form, sheet, errors);
        bool anything = sheet is not null && (sheet.Refractometer is not null || sheet.SpecificGravity is not null || sheet.HeavyLiquids.Count > 0
            || sheet.Polariscope is not null || sheet.Pleochroism is not null || sheet.Dispersion is not null || sheet.ThermalProbe is not null
            || sheet.Electrical is not null || sheet.UvLong is not null || sheet.UvShort is not null || sheet.AbsorptionLinesNanometres is not null);
        IdentificationResult? result = anything && identifier is not null ? identifier.Identify(sheet!) : null;
        return new BenchAssessment
        {
            Version = form.Version,
            Errors = errors,
            Readings = readings,
            SpecificGravity = sheet?.SpecificGravity,
            Result = result,
            DoNotImmerse = result is null ? [] : [.. result.Candidates.Take(5)
                .Where(c => c.Confidence >= ImmersionCautionConfidence && c.Material.DoNotImmerse).Select(c => c.Material.Name)],
        };
    }

    private static BenchSheet Instrument(BenchSnapshot form, BenchSheet sheet, Dictionary<string, string> errors)
    {
        double? precision = Number(form, BenchFields.Precision, errors);
        double offset = Number(form, BenchFields.CalibrationOffset, errors) ?? 0;
        try { return BenchModel.WithInstrument(sheet, precision, offset); }
        catch (QuantityOutOfRangeException e)
        {
            errors[e.Message.StartsWith("calibration", StringComparison.Ordinal) ? BenchFields.CalibrationOffset : BenchFields.Precision] = e.Message;
            return sheet;
        }
    }

    private static void CheckWeight(BenchSnapshot form, Dictionary<string, string> errors)
    {
        if (Number(form, BenchFields.Weight, errors) is not { } carats) return;
        try { _ = Mass.FromCarats(carats); }
        catch (QuantityOutOfRangeException e) { errors[BenchFields.Weight] = e.Message; }
    }

    internal static double? Number(BenchSnapshot form, string field, Dictionary<string, string> errors)
    {
        string text = form.Text(field);
        if (string.IsNullOrWhiteSpace(text)) return null;
        if (BenchNumber.TryParse(text, out double v, out string error)) return v;
        errors[field] = error;
        return null;
    }

    /// <summary>The readings without the part an error names, with the error recorded at its field.</summary>
    private static StoneReadings Without(StoneReadings r, BatchInputException e, Dictionary<string, string> errors)
    {
        string problem = e.Message.Length > e.Field.Length + 2 ? e.Message[(e.Field.Length + 2)..] : e.Message;
        if (StepPath().Match(e.Field) is { Success: true } step)
        {
            int i = int.Parse(step.Groups[1].Value, System.Globalization.CultureInfo.InvariantCulture);
            errors.TryAdd(BenchFields.Step(i), problem);
            return WithoutSteps(r, (_, index) => index == i);
        }
        if (e.Field == "refractometer" && r.Refractometer is { } rf) return WithoutRefractometerPart(r, rf, problem, errors);
        string key = e.Field.StartsWith("sg", StringComparison.Ordinal) ? (e.Field == "sg" && r.SgWeighing is not null ? BenchFields.WaterCt : e.Field)
            : e.Field == "dispersion" && r.DispersionIndices is not null ? BenchFields.IndexAtG
            : e.Field.Split('[', '.')[0];
        errors.TryAdd(key, problem);
        return key switch
        {
            BenchFields.HeavyLiquids => r with { HeavyLiquids = [] },
            BenchFields.Absorption => r with { AbsorptionNm = null },
            _ when key.StartsWith("sg", StringComparison.Ordinal) => r with { Sg = null, SgWeighing = null },
            BenchFields.Polariscope => r with { Polariscope = null },
            BenchFields.Pleochroism => r with { Pleochroism = null },
            BenchFields.Dispersion or BenchFields.IndexAtG => r with { Dispersion = null, DispersionIndices = null },
            BenchFields.ThermalProbe => r with { ThermalProbe = null },
            BenchFields.Electrical => r with { Electrical = null },
            BenchFields.UvLong => r with { UvLong = null },
            BenchFields.UvShort => r with { UvShort = null },
            _ => r with { Refractometer = null },
        };
    }

    private static StoneReadings WithoutRefractometerPart(StoneReadings r, RefractometerReadings rf, string problem, Dictionary<string, string> errors)
    {
        if (problem.StartsWith("edge reading", StringComparison.Ordinal))
        {
            double limit = rf.LiquidLimit ?? RefractometerObservation.DefaultLiquidLimit;
            for (int i = 0; i < rf.Readings.Count; i++)
                if (rf.Readings[i].Low > limit + 0.005 || rf.Readings[i].High > limit + 0.005) errors.TryAdd(BenchFields.Step(i), problem);
            return WithoutSteps(r, (s, _) => s.Low > limit + 0.005 || s.High > limit + 0.005);
        }
        (string key, RefractometerReadings rest) = problem switch
        {
            _ when problem.StartsWith("spot", StringComparison.Ordinal) => (BenchFields.Spot, rf with { Spot = null }),
            _ when problem.StartsWith("light", StringComparison.Ordinal) => (BenchFields.LightNm, rf with { LightNm = null }),
            _ when problem.StartsWith("liquid limit", StringComparison.Ordinal) => (BenchFields.LiquidLimit, rf with { LiquidLimit = null }),
            _ => (BenchFields.Spot, rf with { Readings = [], Spot = null, OverLimit = false }),
        };
        errors.TryAdd(key, problem);
        return r with { Refractometer = Empty(rest) ? null : rest };
    }

    private static StoneReadings WithoutSteps(StoneReadings r, Func<EdgeReadingEntry, int, bool> drop)
    {
        RefractometerReadings rf = r.Refractometer!;
        RefractometerReadings rest = rf with { Readings = [.. rf.Readings.Where((s, i) => !drop(s, i))] };
        return r with { Refractometer = Empty(rest) ? null : rest };
    }

    private static bool Empty(RefractometerReadings rf) => rf.Readings.Count == 0 && rf.Spot is null && !rf.OverLimit;

    [GeneratedRegex(@"^refractometer\.readings\[(\d+)\]")]
    private static partial Regex StepPath();
}
