using GemIndex.Cli.TextUi.Main;
using System.Collections.ObjectModel;
using GemIndex.Data.Workbook;
using Terminal.Gui.App;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace GemIndex.Cli.TextUi.Stones;

/// <summary>The workbook's stones: search, Enter opens, Ctrl+N new, Ctrl+D duplicate, F4 sorts, Delete deletes (after asking).</summary>
internal sealed class StoneListView : FullScreenDialog
{
    private readonly StoneListModel _model;
    private readonly ObservableCollection<string> _rows = [];
    private readonly Action<Action> _toUi;
    private int _fill;               // which fill of the rows the answers being worked out belong to (UI thread)
    private volatile bool _closed;

    public StoneListView(StoneListModel model, Func<long, long> duplicate, Func<long, bool> delete, Func<long, IReadOnlyList<string>> history,
        Action<Action> toUi)
    {
        _model = model;
        _toUi = toUi;
        Title = "Stones: Enter open ^N new ^D duplicate F3 history F4 sort Del delete";
        var label = new PlainLabel { Text = "Search:" };
        Search = new TextField { X = 8, Width = 24 };
        var order = new PlainLabel { X = Pos.Right(Search) + 2, Width = Dim.Fill(), Text = OrderLine };
        var heading = new PlainLabel { Y = 1, Width = Dim.Fill(), Text = _model.Heading };
        List = new ListView { Y = 2, Width = Dim.Fill(), Height = Dim.Fill() };
        List.SetSource(_rows);
        Search.TextChanged += (_, _) => { _model.Search(Search.Text); Fill(); };
        EventHandler<Key> keys = (sender, key) =>
        {
            long? id = Selected;
            if (key == Key.Enter && id is not null) { Chosen = id; App!.RequestStop(); }
            else if (key == Key.N.WithCtrl) { WantsNew = true; App!.RequestStop(); }
            else if (key == Key.D.WithCtrl && id is { } d) Reload(select: duplicate(d));   // the copy, to open or rename next
            else if (key == Key.F3 && id is { } h) Main.TextScreen.Show(App!, "Edit history", string.Join('\n', history(h)));
            else if (key == Key.F4) { _model.NextOrder(); order.Text = OrderLine; ShowMatches(id); }   // the same stone stays selected
            // The last button is the default: Enter keeps the stone; deleting takes Tab or D. The list stays in view after.
            else if (key == Key.Delete && sender == List && id is { } x && MessageBox.Query(App!, "Delete stone",
                         $"Delete '{_model.Shown[List.SelectedItem!.Value].Reference}' and its history?", DeleteButton, "Cancel") == 0) { delete(x); Reload(); }
            else return;
            key.Handled = true;
        };
        List.KeyDown += keys;      // on the focused views: Enter would otherwise close the dialog first
        Search.KeyDown += keys;
        // The list's first row shows selected while the cursor is in the search box (Enter opens it): ↓ moves the
        // selection on as it goes to the list, as it would in the list (it had only moved the cursor, and Enter then
        // opened the first row where the second was meant).
        Search.KeyDown += (_, key) =>
        {
            if (key.Handled || key != Key.CursorDown || _model.Shown.Count == 0) return;
            List.SetFocus();
            List.SelectedItem = Math.Min((List.SelectedItem ?? -1) + 1, _model.Shown.Count - 1);
            key.Handled = true;
        };
        Add(label, Search, order, heading, List);
        // The answer column widens with the screen (a long species name and its share were cut at 18 characters).
        ViewportChanged += (_, _) =>
        {
            (int, int) before = (_model.AnswerWidth, _model.ColourWidth);
            _model.Width = Viewport.Width;
            if ((_model.AnswerWidth, _model.ColourWidth) == before) return;
            heading.Text = _model.Heading;
            ShowMatches();
        };
        Fill();
    }

    public const string DeleteButton = "_Delete";

    private string OrderLine => $"sorted by {_model.OrderWords} (F4)";

    public TextField Search { get; }

    public ListView List { get; }

    public long? Chosen { get; private set; }

    public bool WantsNew { get; private set; }

    private long? Selected => List.SelectedItem is { } i && i < _model.Shown.Count ? _model.Shown[i].Id : null;

    private void Reload(long? select = null)
    {
        int at = List.SelectedItem ?? 0;
        _model.Refresh();
        Fill();
        int shown = select is { } id ? _model.Shown.ToList().FindIndex(s => s.Id == id) : -1;
        if (_rows.Count > 0) List.SelectedItem = shown >= 0 ? shown : Math.Min(at, _rows.Count - 1);
        List.SetFocus();
    }

    private void Fill()
    {
        Rows();
        List.SelectedItem = 0;
        AnswerInBackground();
    }

    private void Rows()
    {
        _rows.Clear();
        foreach (var s in _model.Shown) _rows.Add(_model.LineOf(s));
        if (_rows.Count == 0)
            _rows.Add(_model.Query.Length == 0 ? "(no stones: Ctrl+N starts one)"
                : _model.AnswersPending ? "(no stone matches yet: the answers are being worked out)" : "(no stone matches the search)");
    }

    /// <summary>The rows again, the same stone kept selected, when an answer worked out changes what a search shows.</summary>
    private void ShowMatches(long? keep = null)
    {
        long? selected = keep ?? Selected;
        Rows();
        int at = selected is { } id ? _model.Shown.ToList().FindIndex(s => s.Id == id) : -1;
        List.SelectedItem = Math.Max(0, at);
    }

    /// <summary>
    /// Works out the shown stones' answers one by one away from the UI thread, each put in its row as it comes, so a
    /// large workbook's list opens at once; a new fill (a search, a deletion) or closing the list stops the old work.
    /// </summary>
    private void AnswerInBackground()
    {
        int fill = Interlocked.Increment(ref _fill);   // every fill, so that the work for an older one stops
        var missing = _model.Missing();
        if (missing.Count == 0) return;
        Task.Run(() =>
        {
            foreach (var s in missing)
            {
                if (_closed || Volatile.Read(ref _fill) != fill) return;
                string? text;
                try { text = _model.Compute(s.Id); }
                catch (Exception e) when (e is not OutOfMemoryException) { text = "(not ranked)"; }   // one stone's fault leaves the others' answers
                _toUi(() => Put(s, text, fill));
            }
        });
    }

    private void Put(StoneSummary s, string? text, int fill)
    {
        if (_closed) return;
        bool matchesChanged = _model.Store(s, text);   // null while no catalogue is loaded: asked again at the next fill
        if (fill != Volatile.Read(ref _fill)) return;
        if (matchesChanged || (_model.Query.Length > 0 && !_model.AnswersPending && _model.Shown.Count == 0)) { ShowMatches(); return; }
        for (int i = 0; i < _model.Shown.Count && i < _rows.Count; i++)
            if (_model.Shown[i].Id == s.Id) { _rows[i] = _model.LineOf(s); break; }
    }

    protected override void Dispose(bool disposing)
    {
        _closed = true;
        base.Dispose(disposing);
    }
}
