using System.Collections.ObjectModel;
using Terminal.Gui.App;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using GemIndex.Cli.TextUi.Main;

namespace GemIndex.Cli.TextUi.CatalogueBrowser;

/// <summary>Search the catalogue by name or colour, or type an index (below 2.5) or an SG; the entry of the selected line shows below.</summary>
internal sealed class CatalogueBrowserView : FullScreenDialog
{
    private readonly CatalogueBrowserModel _model;
    private readonly ObservableCollection<string> _rows = [];

    public CatalogueBrowserView(CatalogueBrowserModel model)
    {
        _model = model;
        Title = "Catalogue: name, index, SG or both (1.544 2.65); Tab list, entry; Esc closes";
        var label = new PlainLabel { Text = "Search:" };
        Search = new TextField { X = 8, Width = 24 };
        Count = new PlainLabel { X = Pos.Right(Search) + 2, Width = Dim.Fill() };
        List = new ListView { Y = 1, Width = Dim.Fill(), Height = Dim.Percent(40) };
        List.SetSource(_rows);
        Entry = new WrappedText { Y = Pos.Bottom(List), Width = Dim.Fill(), Height = Dim.Fill() };
        Search.TextChanged += (_, _) => Fill();
        List.ViewportChanged += (_, _) => { if (List.Viewport.Width != _filledAt) Fill(); };
        List.ValueChanged += (_, _) => ShowEntry();
        Add(label, Search, Count, List, Entry);
        Fill();
    }

    public TextField Search { get; }

    public Label Count { get; }

    public ListView List { get; }

    public WrappedText Entry { get; }

    private int _filledAt = -1;

    private void Fill()
    {
        _filledAt = List.Viewport.Width;
        _model.Search(Search.Text);
        _rows.Clear();
        int nameWidth = _model.NameWidth(Math.Max(List.Viewport.Width, 76));
        foreach (var m in _model.Shown) _rows.Add(_model.Line(m, nameWidth));
        Count.Text = _model.Problem ?? (_model.Shown.Count == 1 ? "1 entry" : $"{_model.Shown.Count} entries");
        if (_rows.Count > 0) List.SelectedItem = 0;
        ShowEntry();
    }

    private void ShowEntry() =>
        Entry.Lines = List.SelectedItem is { } i && i < _model.Shown.Count ? [CatalogueBrowserModel.Details(_model.Shown[i])] : [];

    public static void Show(IApplication app, CatalogueBrowserModel model)
    {
        using var view = new CatalogueBrowserView(model);
        app.Run(view);
    }
}
