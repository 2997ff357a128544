using GemIndex.Cli.TextUi.Main;
using GemIndex.Core.Bench;
using System.Collections.ObjectModel;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace GemIndex.Cli.TextUi.Bench;

/// <summary>
/// Rotation steps typed on one line (rotation, low edge, high edge; Enter stores) into a grid below; spot reading,
/// over the limit and the instrument settings under it.
/// </summary>
internal sealed class RefractometerPage : BenchPage
{
    public const int GridRows = 6;
    private readonly ObservableCollection<string> _rows = [];
    private int? _editing;
    private int _stepCount;

    /// <summary>The bench setting that holds the rotation between steps (kept across stones, like the precision).</summary>
    public const string RotationStepField = "refractometer.rotation_step";

    /// <summary>The step being typed (before Enter), kept in the form so that its draft survives a closed terminal.</summary>
    public const string TypingRotation = "refractometer.typing.rotation", TypingLow = "refractometer.typing.low", TypingHigh = "refractometer.typing.high";

    /// <summary>The step being edited (1-based; empty for a new step), kept with the draft so that an edit survives a closed terminal.</summary>
    public const string TypingStep = "refractometer.typing.step";

    public RefractometerPage() : base("Refractometer", "Enter stores the step", problemRows: 5)
    {
        FootCaution = [Reports.ReportCautions.ContactLiquidShort];
        FootCautionLine = Reports.ReportCautions.ContactLiquidLine;
        NextRow();
        Add(new PlainLabel { Y = 0, Text = "Rotation  Low edge  High edge" });
        Rotation = new TextField { X = 0, Y = NextRow(), Width = 7 };
        Low = new TextField { X = 10, Y = Pos.Top(Rotation), Width = 8 };
        High = new TextField { X = 20, Y = Pos.Top(Rotation), Width = 8 };
        Editing = new PlainLabel { X = 29, Y = Pos.Top(Rotation), Width = Dim.Fill() };
        Grid = new ListView { X = 0, Y = NextRow(GridRows), Width = Dim.Fill(), Height = GridRows };
        Grid.SetSource(_rows);
        Add(Rotation, Low, High, Editing, Grid);
        Rotation.TextChanged += (_, _) => ShowNote();   // a rotation typed over the offer is the examiner's own
        Grid.HasFocusChanged += (_, _) => WrapProblems();
        Grid.ValueChanged += (_, _) =>
        {
            // The hint row under the steps takes no key: the selection stops on the last step (Del there had done nothing).
            if (_stepCount > 0 && Grid.SelectedItem is { } i && i >= _stepCount) Grid.SelectedItem = _stepCount - 1;
            WrapProblems();
        };
        AddField(BenchFields.Spot, "Spot reading", 8, "curved stones");
        AddChoice(BenchFields.OverLimit);
        StepField = AddField(RotationStepField, "Rotation step", 8, "°, default 15");
        AddField(BenchFields.LiquidLimit, "Liquid limit", 8, "default 1.79");
        AddField(BenchFields.LightNm, "Light", 8, "nm (589.3)");
        // Both defaults: a spot reading is read to about ±0.01, an edge to 0.001.
        AddField(BenchFields.Precision, "Precision", 8, $"{Fixed(BenchDefaults.FacetPrecision)}, spot {Fixed(BenchDefaults.SpotPrecision)}");
        AddField(BenchFields.CalibrationOffset, "Calibration", 8, "offset (0)");
        // The list of steps takes the rows a taller window leaves (six at 80x24, where an eight-step series scrolls); the
        // fields under it move down with it.
        int gridRow = ((PosAbsolute)Grid.Y).Position;
        List<(View View, int Row)> below = [.. SubViews.Where(v => v.Y is PosAbsolute a && a.Position > gridRow).Select(v => (v, ((PosAbsolute)v.Y).Position))];
        ViewportChanged += (_, _) =>
        {
            int extra = Math.Max(0, Viewport.Height - FootRows - RowsUsed);
            if (Grid.Height is DimAbsolute h && h.Size == GridRows + extra) return;
            Grid.Height = GridRows + extra;
            foreach (var (view, row) in below) view.Y = row + extra;
        };
        foreach (TextField box in new[] { Rotation, Low, High })
            box.KeyDown += (_, key) =>
            {
                // Esc leaves a step being edited as it was stored (Enter on a step had left no way out but to store it).
                if (key == Key.Esc && _editing is { } edited) { EditCancelled?.Invoke(edited); key.Handled = true; return; }
                if (key != Key.Enter) return;
                // Edges typed in the rotation's box (Tab had stopped there) go to the edges' boxes, not into the rotation.
                if (Low.Text.Trim().Length == 0 && EdgesInRotationBox() is { } typed) MoveToEdges(typed.Low, typed.High);
                string low = Low.Text.Trim(), high = High.Text.Trim();
                // Both edges typed in the low box ("1.624 1.644" or "1.624/1.644") are the two edges, also over a step's
                // old high edge while it is edited (the pair had been stored as a low edge "not a number").
                if (BenchSyntax.EdgePair(low) is { } pair) (low, high) = pair;
                StoreRequested?.Invoke(_editing, new StepText(Rotation.Text.Trim(), low, high));
                key.Handled = true;
            };
        // In the rotation's box a space or '/' after the rotation goes on to the low edge; after an edge typed there by
        // mistake (a number a refractometer shows, 1.30-2.00), the edge moves to the low edge's box and the high edge is next.
        Rotation.KeyDown += (_, key) =>
        {
            if ((key != Key.Space && key.AsRune.Value != '/') || Rotation.InsertionPoint < Rotation.Text.TrimEnd().Length) return;
            string text = Rotation.Text.Trim();
            if (text.Length == 0) return;
            if (LooksLikeEdge(text)) { MoveToEdges(text, ""); High.SetFocus(); }
            else if (Low.Text.Length == 0) Low.SetFocus();
            else return;
            key.Handled = true;
        };
        // A space or '/' after a low edge goes on into the high edge's box, which is empty: the two edges typed in one
        // go stay in sight (the low box is eight wide, and "1.716 1.71" showed as "16 1.71").
        // While a step is edited its old high edge is in the box: it is selected, so the edge typed next replaces it.
        Low.KeyDown += (_, key) =>
        {
            if ((key == Key.Space || key.AsRune.Value == '/') && (High.Text.Length == 0 || _editing is not null)
                && Low.Text.Trim().Length > 0 && Low.InsertionPoint >= Low.Text.TrimEnd().Length)
            {
                High.SetFocus();
                if (High.Text.Length > 0) High.SelectAll();
                key.Handled = true;
            }
        };
        Grid.KeyDown += (_, key) =>
        {
            if (key == Key.Z.WithCtrl && RestoreRequested is not null) { RestoreRequested(); key.Handled = true; return; }   // with or without a step selected
            if (Grid.SelectedItem is not { } i || i >= _stepCount) return;
            if (key == Key.Enter) { EditRequested?.Invoke(i); key.Handled = true; }
            else if (key == Key.Delete) { RemoveRequested?.Invoke(i); key.Handled = true; }
        };
    }

    public override View FirstReading => Low;

    /// <summary>A number with a decimal point between 1.30 and 2.00: what a refractometer's scale shows, never a bench rotation.</summary>
    private static bool LooksLikeEdge(string text) =>
        text.Contains('.') && double.TryParse(text, System.Globalization.NumberStyles.Float, System.Globalization.CultureInfo.InvariantCulture, out double value)
        && value is >= 1.30 and <= 2.00;

    /// <summary>The edges typed in the rotation's box ("1.622 1.642", "1.622/1.642" or one edge), or null when it holds a rotation.</summary>
    private (string Low, string High)? EdgesInRotationBox()
    {
        string text = Rotation.Text.Trim();
        if (BenchSyntax.EdgePair(text) is { } pair && LooksLikeEdge(pair.Low)) return pair;
        return LooksLikeEdge(text) ? (text, "") : null;
    }

    /// <summary>Puts edges typed in the rotation's box into the edges' boxes and gives the rotation box back the rotation it began with.</summary>
    private void MoveToEdges(string low, string high)
    {
        Low.Text = low;
        if (high.Length > 0) High.Text = high;
        Rotation.Text = _rotationAtStart;
    }

    /// <summary>The rotation the edit line began with (the offer, or the edited step's own), given back when edges typed over it move on.</summary>
    private string _rotationAtStart = "";

    /// <summary>The edit line's boxes with the form keys that keep their text.</summary>
    public IReadOnlyList<(TextField Box, string Key)> TypingBoxes => [(Rotation, TypingRotation), (Low, TypingLow), (High, TypingHigh)];

    public FormField StepField { get; }

    public TextField Rotation { get; }

    public TextField Low { get; }

    public TextField High { get; }

    public Label Editing { get; }

    public ListView Grid { get; }

    /// <summary>(index being edited or null for a new step, the step typed).</summary>
    public event Action<int?, StepText>? StoreRequested;

    public event Action<int>? EditRequested;

    /// <summary>Esc while a step is edited: the step stays as stored, and the cursor goes back to it in the list.</summary>
    public event Action<int>? EditCancelled;

    public event Action<int>? RemoveRequested;

    /// <summary>Ctrl+Z on the list: the step removed last comes back.</summary>
    public event Action? RestoreRequested;

    /// <summary>
    /// Puts a step on the edit line (null: an empty new step at <paramref name="nextRotation"/>), with the cursor in its
    /// low edge unless <paramref name="focus"/> is false (a step removed from the list leaves the cursor there).
    /// </summary>
    public void BeginStep(int? index, StepText? step, string nextRotation, bool focus = true)
    {
        _editing = index;
        _offeredRotation = step is null ? nextRotation : null;
        Rotation.Text = step?.Rotation ?? nextRotation;
        _rotationAtStart = Rotation.Text;
        Low.Text = step?.Low ?? "";
        High.Text = step?.High ?? "";
        ShowNote();
        if (focus) Low.SetFocus();
    }

    /// <summary>Whether the rotation offered next fills a gap of a half turn already read (the window's model knows).</summary>
    public Func<bool>? OfferFillsGap { get; set; }

    /// <summary>The word beside the edit line's boxes: the step being edited, or that the offered rotation fills a gap.</summary>
    public const string FillsGapNote = "fills gap";

    private void ShowNote() =>
        Editing.Text = _editing is { } i ? $"editing step {i + 1}"
            : _offeredRotation is not null && Rotation.Text == _offeredRotation && OfferFillsGap?.Invoke() == true ? FillsGapNote : "";

    /// <summary>The rotation offered for a new step, while the examiner has not typed another (null: none offered).</summary>
    private string? _offeredRotation;

    /// <summary>
    /// Offers <paramref name="nextRotation"/> on a new step whose offered rotation is still untouched: a rotation step set
    /// after a step was stored applies to the next one (it stayed at the old step's 15° and every later step followed it).
    /// </summary>
    public void OfferRotation(string nextRotation)
    {
        if (_editing is not null || _offeredRotation is null || Rotation.Text != _offeredRotation) return;
        _offeredRotation = nextRotation;
        Rotation.Text = nextRotation;
        _rotationAtStart = nextRotation;
        ShowNote();
    }

    public void ShowSteps(IReadOnlyList<StepText> steps, IReadOnlyDictionary<string, string> errors)
    {
        int? selected = Grid.SelectedItem;
        _rows.Clear();
        _stepCount = steps.Count;
        for (int i = 0; i < steps.Count; i++)
            _rows.Add($"{steps[i].Rotation,7}°  {steps[i].Low,-8}  {steps[i].High,-7}{(errors.ContainsKey(BenchFields.Step(i)) ? FormField.SeeBelow : "")}");   // the reason whole at the page's foot
        if (_rows.Count == 0) _rows.Add("(no steps yet: low high, then Enter)");
        else _rows.Add("(Enter edits, Del removes, ^Z undo)");
        // The selection stays on a step (after Del, the next one, or the last): the hint row below them takes no key.
        if (selected is { } s) Grid.SelectedItem = Math.Min(s, Math.Max(0, _stepCount - 1));
    }

    /// <summary>The keys where the cursor is: on the step list, what Enter, Del and Ctrl+Z do there.</summary>
    public override string KeysHere => Grid.HasFocus && _stepCount > 0 ? StepListKeys : base.KeysHere;

    /// <summary>The key line's words while the step list has the cursor.</summary>
    public const string StepListKeys = "Enter edits the step, Del removes it, ^Z puts it back";

    /// <summary>Scrolls the list so that step <paramref name="index"/> is in sight (and selected).</summary>
    public void ShowStep(int index)
    {
        if (index < 0 || index >= _stepCount) return;
        Grid.SelectedItem = index;
        Grid.EnsureSelectedItemVisible();
    }

    protected override IEnumerable<(string Key, string Text)> OwnErrors(IReadOnlyDictionary<string, string> errors) =>
        errors.Where(p => p.Key.StartsWith("refractometer.readings[", StringComparison.Ordinal))
            .Select(p => (p.Key, $"step {int.Parse(p.Key[23..p.Key.IndexOf(']')], System.Globalization.CultureInfo.InvariantCulture) + 1}: {InCaptions(p.Value)}"));

    /// <summary>The step selected in the list, while the list has the cursor; else the field under it.</summary>
    protected override string? FocusedProblemKey =>
        Grid.HasFocus && Grid.SelectedItem is { } i && i < _stepCount ? BenchFields.Step(i) : base.FocusedProblemKey;

    /// <summary>".001": the hint's room at 80 columns is 15 characters.</summary>
    private static string Fixed(double value) => value.ToString(".000", System.Globalization.CultureInfo.InvariantCulture);
}
