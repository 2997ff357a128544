namespace GemIndex.Cli.TextUi.Bench;

/// <summary>Polariscope, dichroscope, fire, probes, the reflectance meter, UV lamps and the spectroscope.</summary>
internal sealed class TestsPage : BenchPage
{
    public TestsPage() : base("Tests", "a key picks, Space clears")
    {
        FootCaution = [Reports.ReportCautions.UltravioletShort];
        FootCautionLine = Reports.ReportCautions.UltravioletLine;
        AddChoice(BenchFields.Polariscope);
        AddChoice(BenchFields.Pleochroism);
        AddChoice(BenchFields.Dispersion);
        AddField(BenchFields.IndexAtB, "or RI at B", 8, "686.7 nm");
        AddField(BenchFields.IndexAtG, "   RI at G", 8, "430.8 nm");
        AddChoice(BenchFields.ThermalProbe);
        AddChoice(BenchFields.Electrical);
        AddField(BenchFields.Reflectance, "Reflectance", 8, "%, meter");
        AddChoice(BenchFields.UvLong);
        AddChoice(BenchFields.UvShort);
        AddField(BenchFields.Absorption, "Absorption", 16, "nm/none");   // four lines in sight at 80 columns
    }

    /// <summary>What an opaque stone's polariscope, dichroscope and fire are told instead of their keys.</summary>
    public const string OpaqueNote = "opaque: not advised";

    /// <summary>
    /// On an opaque stone the polariscope, the dichroscope and fire are not advised (they need light through the stone;
    /// "stays dark", one colour and no fire are what any opaque stone shows): each says so beside its box while unset.
    /// </summary>
    public void ShowTransparency(string? transparency)
    {
        foreach (ChoiceField c in Choices.Where(c => c.Choice.Field is BenchFields.Polariscope or BenchFields.Pleochroism or BenchFields.Dispersion))
            c.Note = transparency == "opaque" ? OpaqueNote : null;
    }
}
