using GemIndex.Cli.TextUi.Results;
using GemIndex.Core.Gravity;
using GemIndex.Core.Quantities;
using GemIndex.Data.Batch;

namespace GemIndex.Cli.TextUi.Bench;

/// <summary>
/// The SG line of the SG page: the value in use and where it comes from; when an SG is typed and the weights give
/// another, it says the typed one is used and flags the clash.
/// </summary>
internal static class GravityText
{
    /// <summary>Coverage factor for "the two disagree": two combined standard uncertainties (about 95 %, common practice in measurement).</summary>
    public const double ClashCoverage = 2;

    public static string Describe(BenchSnapshot form, SpecificGravity? used)
    {
        bool typed = form.Text(BenchFields.Sg).Trim().Length > 0;
        SpecificGravity? weighed = Weighed(form);
        if (used is not { } sg) return "SG -";
        if (!typed) return ResultText.Gravity(sg) + " from the weights";
        if (weighed is not { } w) return ResultText.Gravity(sg) + " as typed";
        double combined = Math.Sqrt(sg.StandardUncertainty * sg.StandardUncertainty + w.StandardUncertainty * w.StandardUncertainty);
        string both = $"Using the typed {ResultText.Gravity(sg)}; the weights give {ResultText.Gravity(w)[3..]}";
        return Math.Abs(sg.Value - w.Value) > ClashCoverage * combined
            ? both + "\n!! they disagree: check both and clear the wrong one"
            : both + " (they agree)";
    }

    /// <summary>The SG the weights alone give, or null when they are not both typed or do not make an SG.</summary>
    private static SpecificGravity? Weighed(BenchSnapshot form)
    {
        if (!BenchNumber.TryParse(form.Text(BenchFields.AirCt), out double air, out _) || !BenchNumber.TryParse(form.Text(BenchFields.WaterCt), out double water, out _))
            return null;
        double? celsius = BenchNumber.TryParse(form.Text(BenchFields.WaterC), out double c, out _) ? c : null;
        try { return StoneReadingsConverter.ToBenchSheet(new StoneReadings { SgWeighing = new HydrostaticReadings(air, water, celsius) }).SpecificGravity; }
        catch (BatchInputException) { return null; }
    }
}
