using Terminal.Gui.Drawing;
using Terminal.Gui.Configuration;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace GemIndex.Cli.TextUi.Bench;

/// <summary>Specific gravity typed directly or weighed in air and water, heavy-liquid results, and the immersion caution inline.</summary>
internal sealed class GravityPage : BenchPage
{
    public const int CautionRows = 7;

    public GravityPage() : base("SG", "Tab next field")
    {
        AddField(BenchFields.Sg, "SG", 8, "or weigh:");
        AddField(BenchFields.AirCt, "In air", 8, "ct");
        WaterField = AddField(BenchFields.WaterCt, "In water", 8, "ct");
        AddField(BenchFields.WaterC, "Water", 8, "°C, default 20");
        Result = new Label { Y = NextRow(2), Width = Dim.Fill(), Height = 2, Text = "SG -" };
        Add(Result);
        AddField(BenchFields.HeavyLiquids, "Heavy liquid", 24);
        AddNote("  e.g. 3.32 floats; 2.89 sinks");
        // Several rows: the caution names the candidates and says why, whole, word-wrapped to the page's width.
        Caution = new Label { Y = NextRow(CautionRows), Width = Dim.Fill(), Height = CautionRows };
        Caution.SchemeName = SchemeManager.SchemesToSchemeName(Schemes.Error);
        Add(Caution);
    }

    public Label Caution { get; }

    /// <summary>The SG in use and where it comes from (and a clash between a typed SG and the weights).</summary>
    public Label Result { get; }

    public FormField WaterField { get; }
}
