using GemIndex.Core.Bench;

namespace GemIndex.Cli.TextUi.Bench;

/// <summary>
/// The form's texts as Core's <see cref="BenchReadings"/>: every filled field as typed, every choice made, every step
/// row. A blank field is "not given". The bench settings (precision, calibration offset) stay in the form between
/// stones, so they are passed only with a refractometer reading to apply them to.
/// </summary>
internal static class FormReader
{
    private static readonly string[] TextFields =
    [
        BenchFields.Spot, BenchFields.LiquidLimit, BenchFields.LightNm, BenchFields.Sg, BenchFields.AirCt, BenchFields.WaterCt, BenchFields.WaterC,
        BenchFields.HeavyLiquids, BenchFields.IndexAtB, BenchFields.IndexAtG, BenchFields.Reflectance, BenchFields.Absorption, BenchFields.Colour,
        BenchFields.FeaturesPresent, BenchFields.FeaturesAbsent,
    ];

    public static BenchReadings Read(BenchSnapshot form)
    {
        var readings = new BenchReadings().With(BenchField.Id, form.Text(BenchFields.Reference).Trim());
        foreach (string field in TextFields)
            if (form.Text(field) is { } text && !string.IsNullOrWhiteSpace(text)) readings = readings.With(field, text);
        // Every one-key choice of the pages (BenchChoice.All): a choice added there is read here too.
        foreach (string field in BenchChoice.All.Select(c => c.Field))
            if (form.Choice(field) is { Length: > 0 } word) readings = readings.With(field, word);
        if (GemIndex.Data.Workbook.StoneSheet.TransparencyWord(form.Text(BenchFields.Transparency)) is { } light) readings = readings.With(BenchField.Transparency, light);
        foreach (StepText step in form.Steps) readings = readings.WithStep(new EdgeStepText(step.Rotation, step.Low, step.High));
        bool refractometer = readings.Steps.Count > 0 || readings.Text(BenchField.Spot) is not null || readings.Text(BenchField.OverLimit) is not null;
        if (refractometer)
            foreach (string setting in new[] { BenchFields.Precision, BenchFields.CalibrationOffset })
                if (form.Text(setting) is { } text && !string.IsNullOrWhiteSpace(text)) readings = readings.With(setting, text);
        return readings;
    }
}
