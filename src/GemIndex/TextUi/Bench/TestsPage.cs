namespace GemIndex.Cli.TextUi.Bench;

/// <summary>Polariscope, dichroscope, fire, probes, UV lamps and the spectroscope.</summary>
internal sealed class TestsPage : BenchPage
{
    public TestsPage() : base("Tests", "a letter picks, Space clears")
    {
        AddChoice(BenchFields.Polariscope);
        AddChoice(BenchFields.Pleochroism);
        AddChoice(BenchFields.Dispersion);
        AddField(BenchFields.IndexAtB, "  or nB", 7, "index at 686.7 nm");
        AddField(BenchFields.IndexAtG, "     nG", 7, "index at 430.8 nm");
        AddChoice(BenchFields.ThermalProbe);
        AddChoice(BenchFields.Electrical);
        AddChoice(BenchFields.UvLong);
        AddChoice(BenchFields.UvShort);
        AddField(BenchFields.Absorption, "Absorption nm", 16, "or none");
    }
}
