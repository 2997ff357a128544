using Terminal.Gui.Drawing;
using Terminal.Gui.Configuration;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace GemIndex.Cli.TextUi.Bench;

/// <summary>Specific gravity typed directly or weighed in air and water, and heavy-liquid results.</summary>
internal sealed class GravityPage : BenchPage
{
    public GravityPage() : base("SG", "Tab next field")
    {
        AddField(BenchFields.Sg, "SG direct", 8, "or weigh:");
        AddField(BenchFields.AirCt, "In air ct", 8);
        WaterField = AddField(BenchFields.WaterCt, "In water ct", 8);
        AddField(BenchFields.WaterC, "Water °C", 8, "default 20");
        Result = AddNote("SG -");
        NextRow();
        AddField(BenchFields.HeavyLiquids, "Heavy liquid", 14, "3.32 floats;");
        AddNote("  floats | sinks | suspends; ';' between");
        NextRow();
        // Several rows: the caution names the candidates and says why, word-wrapped to the page's width.
        Caution = new Label { Y = NextRow(5), Width = Dim.Fill(), Height = 5 };
        Caution.SchemeName = SchemeManager.SchemesToSchemeName(Schemes.Error);
        Add(Caution);
    }

    public Label Caution { get; }

    public Label Result { get; }

    public FormField WaterField { get; }
}
