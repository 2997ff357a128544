using System.Globalization;
using GemIndex.Cli.TextUi.Results;
using GemIndex.Core.Bench;
using GemIndex.Core.Gravity;

namespace GemIndex.Cli.TextUi.Bench;

/// <summary>
/// The SG line of the SG page: the value in use and where it comes from. An SG typed together with weights is refused
/// by the reader (one of them must go), so then the line says so whole: both values, whether they agree, that neither
/// is used, and what to clear. It stays on the page while the user types (no pop-up, not only the key line).
/// </summary>
internal static class GravityText
{
    /// <summary>Coverage factor for "the two disagree": two combined standard uncertainties (about 95 %, common practice in measurement).</summary>
    public const double ClashCoverage = 2;

    /// <summary>
    /// Above this standard uncertainty a hydrostatic SG hardly tells gem materials apart (most lie within 1.0–4.5 of each
    /// other in steps of a few tenths; judgement): the line then says the stone is too light for the balance.
    /// </summary>
    public const double UsefulWeighingUncertainty = 0.1;

    /// <summary>Added to the SG line of a weighing less certain than <see cref="UsefulWeighingUncertainty"/>.</summary>
    public const string TooLight = ": too uncertain to tell much (a light stone, or weights that lie close together); heavy liquids tell more";

    /// <summary>What the SG line says when there is no SG to use and nothing clashes.</summary>
    public const string None = "SG -";

    /// <summary>The end of every clash sentence: which value is used, and the way out.</summary>
    public const string NeitherUsed = "Neither is used; clear the SG or the weights.";

    public static string Describe(BenchSnapshot form, SpecificGravity? used)
    {
        string typedText = form.Text(BenchFields.Sg).Trim();
        // The typed SG read alone, once: refused or not, and its value.
        BenchReading? typedAlone = typedText.Length > 0 ? BenchReader.Read(new BenchReadings().With(BenchField.Sg, typedText)) : null;
        if (used is { } sg)
            return ResultText.Gravity(sg) + (typedAlone is null ? " from the weights" : typedAlone.Errors.Count > 0 ? " from the weights (the SG typed is refused)" : " as typed")
                + (typedAlone is null && sg.StandardUncertainty > UsefulWeighingUncertainty ? TooLight : "");
        bool weighing = new[] { BenchFields.AirCt, BenchFields.WaterCt }.Any(f => form.Text(f).Trim().Length > 0);
        if (typedAlone is null && !weighing && HeavyLiquidsSay(form) is { } said) return said;
        if (typedAlone is null || !weighing) return None;
        SpecificGravity? typed = typedAlone.Sheet.SpecificGravity;
        string typedWords = typed is { } t ? $"SG typed {Value(t)}" : $"SG typed '{BenchText.Shown(typedText)}'";
        if (Weighed(form) is not { } w) return $"!! {typedWords} and a weighing begun. {NeitherUsed}";
        string verdict = typed is not { } both ? "." : Disagree(both, w) ? ": they disagree." : ": they agree.";
        return $"!! {typedWords}, weighed {Value(w)}{verdict} {NeitherUsed}";
    }

    /// <summary>
    /// "SG above 3.32 (heavy liquids)" when only heavy liquids were used and they read clean; else null. A liquid lighter
    /// than <see cref="LightestHeavyLiquid"/> is no heavy liquid (amber's saturated salt water, about 1.13): a float test.
    /// </summary>
    private static string? HeavyLiquidsSay(BenchSnapshot form)
    {
        if (form.Text(BenchFields.HeavyLiquids).Trim() is not { Length: > 0 } text) return null;
        BenchReading reading = BenchReader.Read(new BenchReadings().With(BenchField.HeavyLiquids, text));
        if (reading.Errors.Count > 0) return null;
        string how = reading.Sheet.HeavyLiquids.All(h => h.Liquid.Value >= LightestHeavyLiquid) ? "heavy liquids" : "float test";
        return HeavyLiquidResult.Together(reading.Sheet.HeavyLiquids) is { } bounds ? $"SG {bounds} ({how})" : "SG - (the heavy liquids contradict each other: check them; the answer weighs them as read)";
    }

    /// <summary>
    /// The lightest liquid called a heavy liquid (common practice: the bench's heavy liquids run from about 2.6 up, diluted
    /// sets from about 2; salt water and water are float tests).
    /// </summary>
    public const double LightestHeavyLiquid = 2.0;

    /// <summary>True when a typed and a weighed SG lie further apart than <see cref="ClashCoverage"/> combined standard uncertainties.</summary>
    public static bool Disagree(SpecificGravity typed, SpecificGravity weighed) =>
        Math.Abs(typed.Value - weighed.Value) > ClashCoverage * Math.Sqrt(typed.StandardUncertainty * typed.StandardUncertainty + weighed.StandardUncertainty * weighed.StandardUncertainty);

    private static string Value(SpecificGravity sg) => sg.Value.ToString("0.000", CultureInfo.InvariantCulture);

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
