using GemIndex.Cli.TextUi.Main;
using Terminal.Gui.Drawing;
using Terminal.Gui.Configuration;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace GemIndex.Cli.TextUi.Bench;

/// <summary>
/// A label, a text box and, to its right, the hint or the reason the entry is refused ("! ..."); a reason too long for
/// the room beside the box says "! see below" there, and the page lists it whole at its bottom.
/// </summary>
internal sealed class FormField : View
{
    /// <summary>Shown beside the box when the reason does not fit there.</summary>
    public const string SeeBelow = "! see below";

    private readonly string _hint;
    private readonly Label _mark;
    private string? _reason;

    public FormField(string field, string label, int labelWidth, int editWidth, string hint = "")
    {
        Field = field;
        string name = label.Trim();
        Label = name.StartsWith("or ", StringComparison.Ordinal) ? name[3..] : name;
        _hint = hint;
        Width = Dim.Fill();
        Height = 1;
        CanFocus = true;
        var caption = new PlainLabel { Text = label, Width = labelWidth };
        Edit = new TextField { X = labelWidth, Width = editWidth };
        _mark = new PlainLabel { X = Pos.Right(Edit) + 1, Width = Dim.Fill(), Text = hint };
        Add(caption, Edit, _mark);
        _mark.ViewportChanged += (_, _) => ShowMark();
        // A value longer than its box shows its start when the cursor leaves (it scrolled to its end while typed:
        // "694, 668, 659" read as "4, 668, 659").
        Edit.HasFocusChanged += (_, e) =>
        {
            if (!e.NewValue) Edit.InsertionPoint = 0;
            else { _onEntry = Edit.Text; _typed = null; }
        };
        // Ctrl+Z puts back the value the box held when the cursor came into it, and a second Ctrl+Z what was typed over
        // it: one step each way, which an examiner can predict (the box's own history of keystrokes went back through
        // values of earlier stones and never to the one overtyped).
        Edit.KeyDown += (_, key) =>
        {
            if (key != Terminal.Gui.Input.Key.Z.WithCtrl) return;
            key.Handled = true;
            if (Edit.Text != _onEntry) { _typed = Edit.Text; Edit.Text = _onEntry; }
            else if (_typed is not null) { Edit.Text = _typed; _typed = null; }
            Edit.InsertionPoint = Edit.Text.Length;
        };
    }

    /// <summary>The box's text when the cursor came into it, and what was typed over it before a Ctrl+Z put it back.</summary>
    private string _onEntry = "";
    private string? _typed;

    public string Field { get; }

    /// <summary>The field's name as the page's reasons give it: its caption ("In air"), without the "or" that links it to the row above.</summary>
    public string Label { get; }

    public TextField Edit { get; }

    public string Mark => _mark.Text;

    public void ShowError(string? reason)
    {
        _reason = reason;
        _mark.SchemeName = reason is null ? null : SchemeManager.SchemesToSchemeName(Schemes.Error);
        ShowMark();
    }

    private void ShowMark()
    {
        string text = _reason is null ? _hint : "! " + _reason;
        int room = _mark.Viewport.Width;
        _mark.Text = _reason is null || room <= 0 || text.Length <= room ? text : SeeBelow;
    }
}
