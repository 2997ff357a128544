using GemIndex.Cli.TextUi.Bench;
using GemIndex.Cli.TextUi.Results;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Identification;
using GemIndex.Tests.TextUi.Main;
using Terminal.Gui.App;
using Terminal.Gui.Input;
using Terminal.Gui.Testing;
using Terminal.Gui.ViewBase;

namespace GemIndex.Tests.TextUi.Results;

/// <summary>The answer pane drawn headless at the width it has at 80 columns.</summary>
[Collection(Headless.Collection)]
public sealed class ResultsViewTests
{
    private static Material Entry(string name) => TestMaterials.All[0] with { Name = name, Species = "corundum", Variety = name };

    [Fact]
    public void The_arrows_move_one_candidate_at_a_time_over_a_name_that_goes_on_under_itself()
    {
        string[] names = ["flame-fusion synthetic colour-change sapphire", "sapphire", "star sapphire", "ruby"];
        var result = new IdentificationResult
        {
            Id = "", Candidates = [.. names.Select((n, i) => new RankedCandidate { Material = Entry(n), Confidence = 0.4 - 0.1 * i, Fit = 0.9 })],
            Species = [new SpeciesResult { Species = "corundum", Confidence = 1, Origins = new Dictionary<OriginClass, double> { [OriginClass.Natural] = 1 } }],
            NotInCatalogue = 0, NoGoodMatch = false, Warnings = [],
        };
        var model = new ResultsModel();
        model.Accept(new BenchAssessment { Version = 1, Errors = new Dictionary<string, string>(), Readings = new(), Result = result });
        using IApplication app = Headless.Start(40, 24);
        using var view = new ResultsView(model) { Width = Dim.Fill(), Height = Dim.Fill() };
        var top = new Terminal.Gui.Views.Window();
        top.Add(view);
        SessionToken token = app.Begin(top)!;
        app.LayoutAndDraw();
        view.Refresh();
        view.List.SetFocus();
        view.SelectCandidate(0);
        Assert.Contains(view.Rows, r => r.PassedOver && r.Candidate == 0);   // the long name did go on under itself
        app.InjectKey(Key.CursorDown);
        Assert.Equal(1, view.SelectedCandidate);
        app.InjectKey(Key.CursorDown);
        Assert.Equal(2, view.SelectedCandidate);
        app.InjectKey(Key.CursorUp);
        app.InjectKey(Key.CursorUp);
        Assert.Equal(0, view.SelectedCandidate);
        Assert.False(view.Rows[view.List.SelectedItem!.Value].PassedOver);  // on the name's first row, where its percentage is
        app.End(token);
        top.Dispose();
    }
}
