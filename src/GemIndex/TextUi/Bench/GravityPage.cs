using GemIndex.Cli.TextUi.Main;
using Terminal.Gui.Drawing;
using Terminal.Gui.Configuration;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace GemIndex.Cli.TextUi.Bench;

/// <summary>Specific gravity typed directly or weighed in air and water, heavy-liquid results, and the immersion caution inline.</summary>
internal sealed class GravityPage : BenchPage
{
    public const int CautionRows = 7;

    /// <summary>Rows of the SG line: a clash between a typed SG and the weights is said whole in three rows at the form's width.</summary>
    public const int ResultRows = 3;

    private string _result = GravityText.None;
    private string _caution = "";

    public GravityPage() : base("SG", FieldKeys)
    {
        AddField(BenchFields.Sg, "SG", 8, "or weigh:");
        AddField(BenchFields.AirCt, "In air", 8, "ct");
        WaterField = AddField(BenchFields.WaterCt, "In water", 8, "ct");
        AddField(BenchFields.WaterC, "Water", 8, "°C, default 20");
        Result = new PlainLabel { Y = NextRow(ResultRows), Width = Dim.Fill(), Height = ResultRows, Text = GravityText.None };
        Add(Result);
        AddField(BenchFields.HeavyLiquids, "Heavy liquid", 24);
        AddNote("  e.g. 3.32 floats; 2.89 sinks");
        // Several rows: the caution names the candidates and says why, whole, word-wrapped to the page's width.
        Caution = new PlainLabel { Y = NextRow(CautionRows), Width = Dim.Fill(), Height = CautionRows };
        Caution.SchemeName = SchemeManager.SchemesToSchemeName(Schemes.Error);
        Add(Caution);
        ViewportChanged += (_, _) => Wrap();
    }

    /// <summary>Shows the SG line and the immersion caution (empty: none), word-wrapped to the page's width.</summary>
    public void Show(string result, string caution)
    {
        (_result, _caution) = (result, caution);
        Wrap();
    }

    private void Wrap()
    {
        int width = Math.Max(20, Viewport.Width);
        Result.Text = string.Join('\n', TextWrap.Lines([_result], width));
        // Without a stone to keep dry, the rows say the heavy liquids' own caution; with one, that caution and the heavy
        // liquids' in one row after it (a stone the bench judges safe to immerse is still weighed in a toxic liquid).
        IReadOnlyList<string> lines = _caution.Length == 0 ? [.. TextWrap.Lines([Reports.ReportCautions.HeavyLiquidShort], width)] : [.. TextWrap.Lines(["!! " + _caution], width)];
        // As tall as the caution wraps to, but never over the reasons of refused entries at the page's foot: then it
        // ends where they begin, with a pointer to the answer's warnings, which say it whole.
        int room = ReasonRows == 0 ? int.MaxValue : Math.Max(2, Viewport.Height - Caution.Frame.Y - FootRows);
        if (_caution.Length > 0) room = Math.Max(2, room - 1);
        if (lines.Count > room) lines = [.. lines.Take(room - 1), "  (more under Warnings)"];
        if (_caution.Length > 0) lines = [.. lines, Reports.ReportCautions.HeavyLiquidLine];
        Caution.Height = Math.Max(ReasonRows == 0 ? CautionRows : 1, Math.Min(lines.Count, room));
        Caution.Text = string.Join('\n', lines);
    }

    // The base lays out its foot before this page's labels exist (while it is built): nothing to fit then.
    protected override void ProblemsWrapped()
    {
        if (Caution is not null && Result is not null) Wrap();
    }

    public Label Caution { get; }

    /// <summary>The SG in use and where it comes from (or a clash between a typed SG and the weights: neither is used).</summary>
    public Label Result { get; }

    public FormField WaterField { get; }
}
