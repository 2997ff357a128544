using System.Collections.ObjectModel;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace GemIndex.Cli.TextUi.Results;

/// <summary>
/// The answer pane: one list of rows (species, top warning, candidates, readings used, next test, warnings), focusable
/// (F10) and scrolled with the arrows and Page keys; Enter on a candidate opens its detail.
/// </summary>
internal sealed class ResultsView : FrameView
{
    public const string Name = "Answer";
    private readonly ResultsModel _model;
    private readonly ObservableCollection<string> _shown = [];
    private IReadOnlyList<AnswerRow> _rows = [];
    private int _builtAt = -1;

    public ResultsView(ResultsModel model)
    {
        _model = model;
        Title = Name + " (F10)";
        HotKeySpecifier = Main.PlainLabel.NoHotKey;   // the title carries the stone's reference, underscores and all
        CanFocus = true;
        List = new ListView { Width = Dim.Fill(), Height = Dim.Fill(), CanFocus = true };
        List.SetSource(_shown);
        List.KeyDown += (_, key) =>
        {
            if (key == Key.Enter && CandidateAt(List.SelectedItem) is { } i) { DetailRequested?.Invoke(i); key.Handled = true; }
        };
        List.ViewportChanged += (_, _) => { if (List.Viewport.Width != _builtAt) Refresh(); };
        List.ValueChanged += (_, _) => PassOverBetweenRows();
        Add(List);
    }

    public ListView List { get; }

    /// <summary>The rows as shown (for tests and for the key line).</summary>
    public IReadOnlyList<AnswerRow> Rows => _rows;

    public event Action<int>? DetailRequested;

    /// <summary>The candidate on the selected row, else the first.</summary>
    public int SelectedCandidate => CandidateAt(List.SelectedItem) ?? 0;

    private int? CandidateAt(int? row) => row is { } r && r < _rows.Count ? _rows[r].Candidate : null;

    /// <summary>Moves the selection to a candidate's row (for F10 and the tests).</summary>
    public void SelectCandidate(int index)
    {
        for (int r = 0; r < _rows.Count; r++)
            if (_rows[r].Candidate == index) { List.SelectedItem = r; return; }
    }

    private int _lastRow;
    private bool _moving;

    /// <summary>A row between candidates (the rest of a name, a species' heading) is passed over in the direction the selection moved.</summary>
    private void PassOverBetweenRows()
    {
        if (_moving || List.SelectedItem is not { } row) return;
        int step = row >= _lastRow ? 1 : -1;
        int to = row;
        while (to > 0 && to < _rows.Count - 1 && _rows[to].PassedOver) to += step;
        if (to < _rows.Count && _rows[to].PassedOver) to = row - step;   // nothing beyond: stay on the candidate's first row
        while (to > 0 && _rows[to].PassedOver) to--;
        _lastRow = to;
        if (to == row) return;
        _moving = true;
        try { List.SelectedItem = to; }
        finally { _moving = false; }
    }

    /// <summary>
    /// A new answer (the readings changed): shown from its top, the species headline and any "no good match" first; the
    /// place in the old answer means nothing in the new one.
    /// </summary>
    public void ShowNewAnswer()
    {
        Refresh();
        if (_rows.Count == 0) return;
        List.SelectedItem = 0;
        List.Viewport = List.Viewport with { Y = 0 };
    }

    /// <summary>The same answer again (another width, the catalogue's state): the selected candidate kept.</summary>
    public void Refresh()
    {
        int? candidate = CandidateAt(List.SelectedItem);
        int? row = List.SelectedItem;
        _builtAt = List.Viewport.Width;
        _rows = _model.Rows(_builtAt > 0 ? _builtAt : 40);
        _shown.Clear();
        foreach (AnswerRow r in _rows) _shown.Add(r.Text);
        if (candidate is { } c && _model.Listed.Contains(c)) SelectCandidate(c);
        else if (row is { } at && _rows.Count > 0) List.SelectedItem = Math.Min(at, _rows.Count - 1);
    }
}
