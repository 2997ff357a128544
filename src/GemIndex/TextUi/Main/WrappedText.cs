using System.Collections.ObjectModel;
using Terminal.Gui.Views;

namespace GemIndex.Cli.TextUi.Main;

/// <summary>Read-only text shown as a scrollable list of lines, word-wrapped to the view's width.</summary>
internal sealed class WrappedText : ListView
{
    private readonly ObservableCollection<string> _rows = [];
    private IReadOnlyList<string> _lines = [];
    private int _wrappedAt = -1;

    public WrappedText()
    {
        SetSource(_rows);
        ViewportChanged += (_, _) => { if (Viewport.Width != _wrappedAt) Rewrap(); };
    }

    public IReadOnlyList<string> Lines
    {
        get => _lines;
        set { _lines = value; Rewrap(); }
    }

    private void Rewrap()
    {
        _wrappedAt = Viewport.Width;
        _rows.Clear();
        foreach (string row in TextWrap.Lines(_lines, Math.Max(20, Viewport.Width))) _rows.Add(row);
    }
}
