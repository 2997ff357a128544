using GemIndex.Cli.TextUi.Results;
using GemIndex.Core.Bench;
using GemIndex.Core.Gravity;

namespace GemIndex.Cli.TextUi.Bench;

/// <summary>
/// The SG line of the SG page: the value in use and where it comes from. An SG typed together with weights is refused
/// by the reader (one of them must go); the line then shows both values and whether they agree, so the user knows
/// which one to clear.
/// </summary>
internal static class GravityText
{
    /// <summary>Coverage factor for "the two disagree": two combined standard uncertainties (about 95 %, common practice in measurement).</summary>
    public const double ClashCoverage = 2;

    public static string Describe(BenchSnapshot form, SpecificGravity? used)
    {
        string typedText = form.Text(BenchFields.Sg).Trim();
        SpecificGravity? weighed = Weighed(form);
        if (used is { } sg) return ResultText.Gravity(sg) + (typedText.Length > 0 ? " as typed" : " from the weights");
        SpecificGravity? typed = typedText.Length > 0 ? BenchReader.Read(new BenchReadings().With(BenchField.Sg, typedText)).Sheet.SpecificGravity : null;
        if (typed is not { } t || weighed is not { } w) return "SG -";
        double combined = Math.Sqrt(t.StandardUncertainty * t.StandardUncertainty + w.StandardUncertainty * w.StandardUncertainty);
        string verdict = Math.Abs(t.Value - w.Value) > ClashCoverage * combined ? "they disagree" : "they agree";
        return $"!! Typed {ResultText.Gravity(t)}, the weights give {ResultText.Gravity(w)[3..]} ({verdict}):\n   neither is used until one is cleared";
    }

    /// <summary>The SG the weights alone give (read by the one reader), or null when they do not make an SG.</summary>
    private static SpecificGravity? Weighed(BenchSnapshot form)
    {
        var readings = new BenchReadings();
        foreach (string field in new[] { BenchFields.AirCt, BenchFields.WaterCt, BenchFields.WaterC })
            if (form.Text(field).Trim() is { Length: > 0 } text) readings = readings.With(field, text);
        BenchReading reading = BenchReader.Read(readings);
        return reading.Errors.Count == 0 ? reading.Sheet.SpecificGravity : null;
    }
}
