using GemIndex.Cli.TextUi.Main;
using System.Collections.ObjectModel;
using GemIndex.Core.Bench;
using Terminal.Gui.Configuration;
using Terminal.Gui.Drawing;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace GemIndex.Cli.TextUi.Bench;

/// <summary>
/// Magnification: every feature of the vocabulary, grouped, each marked seen (+), looked for and not seen (-) or not
/// looked for (?). Letters typed narrow the list; under it, what to look for and the lighting for the feature under
/// the cursor. The marks become the fields "magnification.present" and "magnification.absent" (<see cref="LoupeModel"/>).
/// </summary>
internal sealed class LoupePage : BenchPage
{
    /// <summary>The page's keys on the key line (letters and spaces go to the filter; Backspace and Esc edit it).</summary>
    public const string KeyWords = "+ seen  - not seen  ? not looked for  type to find";

    private readonly ObservableCollection<string> _rows = [];
    private readonly Label _find;
    private readonly Label _rule;
    private readonly Label _description;
    private IReadOnlyList<string> _errors = [];
    private (int Width, int Height) _laidOutAt = (-1, -1);
    private bool _meaning;
    private int _lastRow;
    private bool _settling;

    public LoupePage() : base("Magnification", KeyWords, problemRows: 0)
    {
        _find = new PlainLabel { X = 0, Y = 0, Width = Dim.Fill(), Height = 1 };
        // Keystroke navigation off: every letter goes to the filter, so a typed word never jumps to some row instead.
        List = new ListView { X = 0, Y = 1, Width = Dim.Fill(), Height = LoupeModel.MinimumListRows, KeystrokeNavigator = null };
        List.SetSource(_rows);
        _rule = new PlainLabel { X = 0, Y = Pos.Bottom(List), Width = Dim.Fill(), Height = 1 };
        _description = new PlainLabel { X = 0, Y = Pos.Bottom(_rule), Width = Dim.Fill(), Height = 6 };
        Add(_find, List, _rule, _description);
        List.KeyDown += OnListKey;
        List.ValueChanged += (_, _) => OnMoved();
        ViewportChanged += (_, _) => LayOut();
        Fill();
    }

    public LoupeModel Model { get; } = new();

    public ListView List { get; }

    /// <summary>Raised when a mark changes: the two field texts are then <see cref="LoupeModel.PresentText"/> and <see cref="LoupeModel.AbsentText"/>.</summary>
    public event Action<LoupePage>? Marked;

    public override View FirstReading => List;

    /// <summary>Opens with every feature listed and the cursor on the first.</summary>
    public override void FocusFirst()
    {
        Model.SetFilter("");
        Fill();
        List.Viewport = List.Viewport with { Y = 0 };   // the first heading in view too, wherever the list was scrolled
        Select(Model.FirstFeatureRow);
        List.SetFocus();
    }

    /// <summary>Shows the stored marks (a stone opened), without raising <see cref="Marked"/>.</summary>
    public void Load(string presentText, string absentText)
    {
        Model.Load(presentText, absentText);
        Fill();
    }

    /// <summary>The feature row under the cursor, or null (nothing matches the filter).</summary>
    public LoupeRow? Current => List.SelectedItem is { } i && i < Model.Rows.Count && !Model.Rows[i].IsHeading ? Model.Rows[i] : null;

    public override void ShowErrors(IReadOnlyDictionary<string, string> errors)
    {
        _errors = [.. new[] { BenchField.FeaturesPresent, BenchField.FeaturesAbsent }.Where(errors.ContainsKey).Select(f => errors[f])];
        Describe();
    }

    private void OnListKey(object? sender, Key key)
    {
        if (key == Key.Z.WithCtrl) { PutBack(); key.Handled = true; return; }
        if (key.IsCtrl || key.IsAlt) return;   // the window's keys (Ctrl+L, Ctrl+Q, ...)
        if (key == Key.Delete) Mark(FeatureState.NotLookedFor);
        else if (key == Key.Backspace && Model.Filter.Length > 0) Filter(Model.Filter[..^1]);
        else if (key == Key.Esc && Model.Filter.Length > 0) Filter("");
        else if (key == Key.CursorLeft || key == Key.CursorRight) { }   // kept on the list, not moved to the answer
        else if (key.TryGetPrintableRune(out var rune) && rune.IsBmp && (char)rune.Value is var c && !char.IsControl(c))
        {
            if (c == '+') Mark(FeatureState.Present);
            else if (c == '-') Mark(FeatureState.Absent);
            else if (c == '?') Mark(FeatureState.NotLookedFor);
            else if (c != ' ' || Model.Filter.Length > 0) Filter(Model.Filter + c);
        }
        else return;
        key.Handled = true;
    }

    private void Mark(FeatureState state)
    {
        if (Current?.Feature is not { } f || !Model.Set(f.Feature, state)) return;
        int row = List.SelectedItem ?? 0;
        _rows[row] = Model.Line(Model.Rows[row]);
        Select(row);
        Describe();
        Marked?.Invoke(this);
    }

    /// <summary>Ctrl+Z: the mark changed last goes back to what it was, with the cursor on it (the filter cleared if it hid it).</summary>
    private void PutBack()
    {
        if (Model.Undo() is not { } feature) { RaiseKeyNotTaken("Ctrl+Z: no mark changed on this stone since it was opened"); return; }
        if (Model.RowOf(feature) < 0) Model.SetFilter("");
        Fill();
        Select(Model.RowOf(feature));
        Marked?.Invoke(this);
    }

    private void Filter(string text)
    {
        var at = Current?.Feature?.Feature;
        Model.SetFilter(text);
        Fill();
        Select(Model.RowAfterFilter(at));
    }

    private void Fill()
    {
        int? selected = List.SelectedItem;
        _settling = true;
        try
        {
            _rows.Clear();
            foreach (LoupeRow row in Model.Rows) _rows.Add(Model.Line(row));
        }
        finally { _settling = false; }
        Select(selected is { } s && s < _rows.Count ? Model.Settle(s, s) : Model.FirstFeatureRow);
    }

    private void Select(int row)
    {
        _settling = true;
        try
        {
            List.SelectedItem = row >= 0 ? row : null;
            if (row >= 0) List.EnsureSelectedItemVisible();
        }
        finally { _settling = false; }
        _lastRow = Math.Max(0, row);
        Describe();
    }

    /// <summary>A heading reached by the arrows, the Page keys or a click is passed over to the next feature.</summary>
    private void OnMoved()
    {
        if (_settling) return;
        if (List.SelectedItem is { } row && Model.Settle(row, _lastRow) is var to && to != row && to >= 0) Select(to);
        else { _lastRow = List.SelectedItem ?? 0; Describe(); }
    }

    private void LayOut()
    {
        (int width, int height) = (Viewport.Width, Viewport.Height);
        if (width <= 0 || height <= 0 || (width, height) == _laidOutAt) return;
        _laidOutAt = (width, height);
        (int listRows, int descriptionRows, bool meaning) = Model.Layout(width, height);
        List.Height = listRows;
        _description.Height = descriptionRows;
        _meaning = meaning;
        if (List.SelectedItem is not null) List.EnsureSelectedItemVisible();
        Describe();
    }

    /// <summary>Tells the page whether the stone is opaque (the batch word of its transparency, or null), for the rule under the list.</summary>
    public void ShowTransparency(string? transparency)
    {
        bool opaque = transparency == "opaque";
        if (Model.Opaque == opaque) return;
        Model.Opaque = opaque;
        Describe();
    }

    private void Describe()
    {
        int width = Math.Max(20, Viewport.Width);
        _find.Text = Model.FindLine(width);
        LoupeRow? row = Current;
        _rule.Text = Model.Rule(row, width);
        // A refused field (a word outside the vocabulary, a feature both seen and not seen) is said here, in place of the description.
        _description.SchemeName = _errors.Count > 0 ? SchemeManager.SchemesToSchemeName(Schemes.Error) : null;
        _description.Text = _errors.Count > 0
            ? string.Join('\n', Main.TextWrap.Lines(_errors.Select(e => "! " + e), width))
            : row?.Feature is { } f ? string.Join('\n', LoupeModel.Description(f, width, _meaning)) : "";
    }
}
