using Terminal.Gui.Drawing;
using Terminal.Gui.Configuration;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace GemIndex.Cli.TextUi.Bench;

/// <summary>A label, a text box and, to its right, the hint or the reason the entry is refused ("! ...").</summary>
internal sealed class FormField : View
{
    private readonly string _hint;
    private readonly Label _mark;

    public FormField(string field, string label, int labelWidth, int editWidth, string hint = "")
    {
        Field = field;
        _hint = hint;
        Width = Dim.Fill();
        Height = 1;
        CanFocus = true;
        var caption = new Label { Text = label, Width = labelWidth };
        Edit = new TextField { X = labelWidth, Width = editWidth };
        _mark = new Label { X = Pos.Right(Edit) + 1, Width = Dim.Fill(), Text = hint };
        Add(caption, Edit, _mark);
    }

    public string Field { get; }

    public TextField Edit { get; }

    public string Mark => _mark.Text;

    public void ShowError(string? reason)
    {
        _mark.Text = reason is null ? _hint : "! " + reason;
        _mark.SchemeName = reason is null ? null : SchemeManager.SchemesToSchemeName(Schemes.Error);
    }
}
