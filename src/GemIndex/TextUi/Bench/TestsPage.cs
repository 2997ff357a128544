namespace GemIndex.Cli.TextUi.Bench;

/// <summary>Polariscope, dichroscope, fire, probes, UV lamps and the spectroscope.</summary>
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
        AddChoice(BenchFields.UvLong);
        AddChoice(BenchFields.UvShort);
        AddField(BenchFields.Absorption, "Absorption", 12, "nm, or none");
    }
}
