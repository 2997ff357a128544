using GemIndex.Cli.TextUi.Stones;
using GemIndex.Data.Workbook;
using GemIndex.Tests.TextUi.Main;
using Terminal.Gui.App;
using Terminal.Gui.Input;
using Terminal.Gui.Testing;

namespace GemIndex.Tests.TextUi.Stones;

/// <summary>The list of stones (F8) drawn headless, on a workbook of invented stones.</summary>
[Collection(Headless.Collection)]
public sealed class StoneListViewTests : IDisposable
{
    private readonly string _path = Path.Combine(Path.GetTempPath(), "gemindex-list-" + Guid.NewGuid().ToString("N") + ".db");
    private readonly StoneWorkbook _workbook;

    public StoneListViewTests() => _workbook = StoneWorkbook.Open(_path, TimeProvider.System, WorkbookOpening.CreateIfMissing);

    public void Dispose()
    {
        _workbook.Dispose();
        foreach (string f in new[] { _path, _path + "-wal", _path + "-shm" }) File.Delete(f);
    }

    [Fact]
    public void A_duplicated_stone_is_selected_so_that_Enter_opens_the_copy()
    {
        foreach (string reference in new[] { "lot A", "lot B", "lot C" }) _workbook.Create(new StoneSheet { Reference = reference });
        using IApplication app = Headless.Start();
        var model = new StoneListModel(q => _workbook.List(q));
        using var view = new StoneListView(model, id => _workbook.Duplicate(id).Id, id => _workbook.Delete(id), _ => [], a => a());
        SessionToken token = app.Begin(view)!;
        view.List.SetFocus();
        view.List.SelectedItem = 1;
        long original = model.Shown[1].Id;
        app.InjectKey(Key.D.WithCtrl);
        long selected = model.Shown[view.List.SelectedItem!.Value].Id;
        Assert.NotEqual(original, selected);
        Assert.Equal(4, model.Shown.Count);
        Assert.Equal(_workbook.Get(original)!.Reference + " (copy)", _workbook.Get(selected)!.Reference);
        app.InjectKey(Key.Enter);
        Assert.Equal(selected, view.Chosen);
        app.End(token);
    }

    [Fact]
    public void F4_sorts_the_list_keeps_the_stone_selected_and_says_the_order()
    {
        foreach (string reference in new[] { "lot 2", "lot 10", "lot 1" }) _workbook.Create(new StoneSheet { Reference = reference });
        using IApplication app = Headless.Start();
        var model = new StoneListModel(q => _workbook.List(q));
        using var view = new StoneListView(model, id => _workbook.Duplicate(id).Id, id => _workbook.Delete(id), _ => [], a => a());
        SessionToken token = app.Begin(view)!;
        view.List.SetFocus();
        view.List.SelectedItem = 1;                                   // "lot 10" (the list opens changed last first)
        long chosen = model.Shown[1].Id;
        app.InjectKey(Key.F4);
        app.LayoutAndDraw();
        Assert.Equal(["lot 1", "lot 2", "lot 10"], model.Shown.Select(s => s.Reference));
        Assert.Equal(chosen, model.Shown[view.List.SelectedItem!.Value].Id);
        Assert.Contains("sorted by reference (F4)", app.Driver!.ToString()!, StringComparison.Ordinal);
        app.End(token);
    }

    [Fact]
    public void Down_from_the_search_box_moves_the_selection_to_the_next_stone()
    {
        foreach (string reference in new[] { "Q-15", "Q-15 (copy)" }) _workbook.Create(new StoneSheet { Reference = reference });
        using IApplication app = Headless.Start();
        var model = new StoneListModel(q => _workbook.List(q));
        using var view = new StoneListView(model, id => _workbook.Duplicate(id).Id, id => _workbook.Delete(id), _ => [], a => a());
        SessionToken token = app.Begin(view)!;
        view.Search.SetFocus();
        foreach (char c in "Q-15") app.InjectKey(new Key(c));
        Assert.Equal(0, view.List.SelectedItem);                      // shown selected; Enter here opens it
        app.InjectKey(Key.CursorDown);
        Assert.Same(view.List, view.MostFocused);
        Assert.Equal(1, view.List.SelectedItem);
        app.InjectKey(Key.Enter);
        Assert.Equal(model.Shown[1].Id, view.Chosen);
        app.End(token);
    }
}
