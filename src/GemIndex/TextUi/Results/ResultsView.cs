using Terminal.Gui.Drawing;
using System.Collections.ObjectModel;
using Terminal.Gui.Configuration;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using GemIndex.Cli.TextUi.Main;

namespace GemIndex.Cli.TextUi.Results;

/// <summary>The live identification panel: headline, ranked candidates, then derived properties, next test and warnings.</summary>
internal sealed class ResultsView : FrameView
{
    private readonly ResultsModel _model;
    private readonly ObservableCollection<string> _rows = [];

    public ResultsView(ResultsModel model)
    {
        _model = model;
        Title = "Identification";
        Headline = new Label { Width = Dim.Fill(), Height = 2, Text = model.Headline };
        Header = new Label { Y = 2, Width = Dim.Fill(), Text = model.CandidateHeader };
        Candidates = new ListView { Y = 3, Width = Dim.Fill(), Height = 6 };
        Candidates.SetSource(_rows);
        Details = new WrappedText { Y = 9, Width = Dim.Fill(), Height = Dim.Fill() };
        Candidates.KeyDown += (_, key) =>
        {
            if (key == Key.Enter && Candidates.SelectedItem is { } i && i < model.Candidates.Count) { DetailRequested?.Invoke(i); key.Handled = true; }
        };
        Add(Headline, Header, Candidates, Details);
    }

    public Label Headline { get; }

    public Label Header { get; }

    public ListView Candidates { get; }

    public WrappedText Details { get; }

    public event Action<int>? DetailRequested;

    public int SelectedCandidate => Candidates.SelectedItem is { } i && i < _model.Candidates.Count ? i : 0;

    public void Refresh()
    {
        Headline.Text = _model.Headline;
        Headline.SchemeName = _model.NoGoodMatch ? SchemeManager.SchemesToSchemeName(Schemes.Error) : null;
        int? selected = Candidates.SelectedItem;
        _rows.Clear();
        foreach (string line in _model.CandidateLines) _rows.Add(line);
        if (selected is { } s && _rows.Count > 0) Candidates.SelectedItem = Math.Min(s, _rows.Count - 1);
        Details.Lines = _model.DetailLines;
    }
}
