using System.Collections.Concurrent;
using GemIndex.Cli.TextUi.Bench;
using GemIndex.Cli.TextUi.Main;
using GemIndex.Core.Identification;
using GemIndex.Core.Magnification;
using GemIndex.Data.Workbook;
using Terminal.Gui.App;
using Terminal.Gui.Input;
using Terminal.Gui.Testing;

namespace GemIndex.Tests.TextUi.Main;

/// <summary>The bench drawn headless; in the Terminal.Gui collection, so no two Terminal.Gui instances run in parallel.</summary>
[Collection(Headless.Collection)]
public sealed class MainWindowTests : IDisposable
{
    private readonly string _path = Path.Combine(Path.GetTempPath(), "gemindex-tests-" + Guid.NewGuid().ToString("N") + ".db");
    private readonly ConcurrentQueue<Action> _uiQueue = new();
    private readonly StoneWorkbook _workbook;
    private readonly BenchSession _session;

    public MainWindowTests()
    {
        _workbook = StoneWorkbook.Open(_path, TimeProvider.System, WorkbookOpening.CreateIfMissing);
        _session = new BenchSession(_workbook, new BenchAssessor(new Identifier(TestMaterials.All)), _uiQueue.Enqueue);
    }

    public void Dispose()
    {
        _session.Flush(TestHost.SaveWait);
        _workbook.Dispose();
        foreach (string f in new[] { _path, _path + "-wal", _path + "-shm" }) File.Delete(f);
    }

    /// <summary>Waits for the background assessments, then runs their UI updates here (the test is the UI thread).</summary>
    private void Settle()
    {
        Assert.True(_session.Flush(TestHost.SaveWait));
        while (_uiQueue.TryDequeue(out Action? a)) a();
    }

    private static void Type(IApplication app, string text)
    {
        foreach (char c in text) app.InjectKey(new Key(c));
    }

    /// <summary>Types rotation steps on the refractometer page: low edge, Tab, high edge, Enter for each.</summary>
    private static void TypeSteps(IApplication app, params (string Low, string High)[] steps)
    {
        foreach ((string low, string high) in steps)
        {
            Type(app, low);
            app.InjectKey(Key.Tab);
            Type(app, high);
            app.InjectKey(Key.Enter);
        }
    }

    [Theory]
    [InlineData(80, 24)]
    [InlineData(100, 30)]
    public void Typing_quartz_readings_shows_the_step_grid_and_ranks_quartz_first(int columns, int rows)
    {
        using IApplication app = Headless.Start(columns, rows);
        using var window = new MainWindow(_session, TestMaterials.All);
        _session.Start();
        window.FillFromModel();
        SessionToken token = app.Begin(window)!;
        window.ShowPage(1);
        window.Refractometer.Low.SetFocus();
        Type(app, "1.544");
        app.InjectKey(Key.Tab);
        Type(app, "1.553");
        app.InjectKey(Key.Enter);
        app.LayoutAndDraw();
        Assert.Contains("0°  1.544     1.553", app.Driver!.ToString()!);
        // The step's values stand under their headings.
        string[] lines = app.Driver!.ToString()!.Split('\n');
        string heading = lines.First(l => l.Contains("Rotation  Low edge  High edge", StringComparison.Ordinal));
        string row = lines.First(l => l.Contains("0°  1.544", StringComparison.Ordinal));
        Assert.Equal(heading.IndexOf("Low edge", StringComparison.Ordinal), row.IndexOf("1.544", StringComparison.Ordinal));
        Assert.Equal(heading.IndexOf("High edge", StringComparison.Ordinal), row.IndexOf("1.553", StringComparison.Ordinal));
        app.InjectKey(Key.F4);
        Type(app, "2.65");
        Settle();
        app.LayoutAndDraw();
        string screen = app.Driver!.ToString()!;
        Assert.Contains("[F4 SG]", screen);
        Assert.Contains("SG 2.65 ± 0.01", screen);
        Assert.Contains("1 quartz", screen);
        // The key line: the page's own keys first, then F1 (all keys) and the rest as the width allows.
        Assert.Matches(@"Tab next field │ F1 (help|keys)", screen);
        Assert.Equal("15", window.Refractometer.Rotation.Text);
        app.End(token);
    }

    [Fact]
    public void A_rotation_step_set_after_the_first_step_applies_to_the_next_step_offered()
    {
        var (app, window, token) = Open();
        window.ShowPage(1);
        window.Refractometer.Low.SetFocus();
        Type(app, "1.762");
        app.InjectKey(Key.Tab);
        Type(app, "1.770");
        app.InjectKey(Key.Enter);
        Assert.Equal("15", window.Refractometer.Rotation.Text);   // the default step offered
        window.Refractometer.StepField.Edit.SetFocus();
        Type(app, "30");
        Assert.Equal("30", window.Refractometer.Rotation.Text);   // the offer follows the new step
        window.Refractometer.Low.SetFocus();
        Type(app, "1.763");
        app.InjectKey(Key.Tab);
        Type(app, "1.770");
        app.InjectKey(Key.Enter);
        Assert.Equal(["0", "30"], _session.Form.Steps.Select(s => s.Rotation));
        Assert.Equal("60", window.Refractometer.Rotation.Text);
        // A rotation the examiner typed is theirs: a later change of the step leaves it.
        window.Refractometer.Rotation.SetFocus();
        window.Refractometer.Rotation.Text = "75";
        window.Refractometer.StepField.Edit.SetFocus();
        window.Refractometer.StepField.Edit.Text = "45";
        Assert.Equal("75", window.Refractometer.Rotation.Text);
        Close(app, window, token);
    }

    [Fact]
    public void On_the_step_list_the_key_line_says_its_keys_and_Del_after_Del_goes_on_removing_steps()
    {
        var (app, window, token) = Open();
        window.ShowPage(1);
        window.Refractometer.Low.SetFocus();
        // Invented quartz-like steps (ω 1.544, ε' to 1.553: common practice).
        TypeSteps(app, ("1.544", "1.553"), ("1.544", "1.551"), ("1.544", "1.548"), ("1.544", "1.546"));
        window.Refractometer.Grid.SetFocus();
        app.InjectKey(Key.End);
        Assert.Equal(3, window.Refractometer.Grid.SelectedItem);   // the last step, not the hint row under it
        app.InjectKey(Key.Delete);
        app.InjectKey(Key.Delete);
        Assert.Equal(["0", "15"], _session.Form.Steps.Select(s => s.Rotation));
        app.LayoutAndDraw();
        Assert.Contains(GemIndex.Cli.TextUi.Bench.RefractometerPage.StepListKeys, app.Driver!.ToString()!);
        Close(app, window, token);
    }

    [Fact]
    public void Edges_typed_in_the_rotation_box_go_to_the_edges_and_the_step_is_stored_at_the_offered_rotation()
    {
        var (app, window, token) = Open();
        window.ShowPage(1);
        // Tab stops at the rotation's box before the edges: both edges typed there with Enter, then one edge, a space
        // and the high edge in the high edge's box (invented tourmaline-like edges, handbook values from memory).
        window.Refractometer.Rotation.SetFocus();
        window.Refractometer.Rotation.SelectAll();
        Type(app, "1.622 1.642");
        app.InjectKey(Key.Enter);
        Assert.Equal([("0", "1.622", "1.642")], _session.Form.Steps.Select(s => (s.Rotation, s.Low, s.High)));
        Assert.Equal("15", window.Refractometer.Rotation.Text);
        window.Refractometer.Rotation.SetFocus();
        window.Refractometer.Rotation.SelectAll();
        Type(app, "1.625");
        app.InjectKey(Key.Space);
        Assert.Equal(("15", "1.625"), (window.Refractometer.Rotation.Text, window.Refractometer.Low.Text));
        Assert.True(window.Refractometer.High.HasFocus);
        Type(app, "1.642");
        app.InjectKey(Key.Enter);
        Assert.Equal(("15", "1.625", "1.642"), (_session.Form.Steps[1].Rotation, _session.Form.Steps[1].Low, _session.Form.Steps[1].High));
        // A rotation typed there and a space go on to the low edge; Enter with no low edge says why nothing was stored.
        window.Refractometer.Rotation.SetFocus();
        window.Refractometer.Rotation.SelectAll();
        Type(app, "40");
        app.InjectKey(Key.Space);
        Assert.True(window.Refractometer.Low.HasFocus);
        app.InjectKey(Key.Enter);
        app.LayoutAndDraw();
        Assert.Equal(2, _session.Form.Steps.Count);
        Assert.Contains("Step not stored: the low edge is empty", app.Driver!.ToString()!);
        Close(app, window, token);
    }

    [Fact]
    public void A_bad_entry_is_marked_at_its_field_and_the_candidates_stay()
    {
        var (app, window, token) = Open();
        window.ShowPage(2);
        Type(app, "2.65");
        app.InjectKey(Key.Tab);             // weight in air
        app.InjectKey(Key.Tab);             // weight in water
        app.InjectKey(Key.Tab);             // water temperature
        Type(app, "2x");
        Settle();
        app.LayoutAndDraw();
        string screen = app.Driver!.ToString()!;
        // Too long for the room beside the box: the box says so, the foot of the page gives it whole, after the field's caption.
        Assert.Contains(FormField.SeeBelow, screen);
        Assert.Contains("! Water: '2x' is not a number", screen);
        Assert.Contains("SG 2.65 ± 0.01", screen);
        Assert.Equal("2x", _session.Form.Text(BenchFields.WaterC));
        Close(app, window, token);
    }

    [Fact]
    public void Ctrl_Z_in_a_field_puts_back_the_value_it_held_when_the_cursor_came_in_and_again_what_was_typed()
    {
        // A water temperature of 22 overtyped by mistake with a heavy liquid's words: Ctrl+Z brings the 22 back (the
        // box's own keystroke history went back through older values and never to it), a second Ctrl+Z the words.
        var (app, window, token) = Open();
        window.ShowPage(2);
        Type(app, "2.65");
        app.InjectKey(Key.Tab);             // weight in air
        app.InjectKey(Key.Tab);             // weight in water
        app.InjectKey(Key.Tab);             // water temperature
        Type(app, "22");
        app.InjectKey(Key.Tab);
        app.InjectKey(Key.Tab.WithShift);   // back into the water temperature
        for (int i = 0; i < 2; i++) app.InjectKey(Key.Backspace);
        Type(app, "3.32 float");
        Settle();
        Assert.Equal("3.32 float", _session.Form.Text(BenchFields.WaterC));
        app.InjectKey(Key.Z.WithCtrl);
        Settle();
        Assert.Equal("22", _session.Form.Text(BenchFields.WaterC));
        app.InjectKey(Key.Z.WithCtrl);
        Settle();
        Assert.Equal("3.32 float", _session.Form.Text(BenchFields.WaterC));
        Close(app, window, token);
    }

    [Fact]
    public void An_opaque_stone_s_polariscope_dichroscope_and_fire_say_they_are_not_advised()
    {
        // The transparency typed on the stone's page: an opaque stone's light-through tests say so on F5 (the command line's
        // "no polariscope, dichroscope or fire is advised" had no counterpart in the text UI); the other tests keep their keys.
        var (app, window, token) = Open();
        window.ShowPage(0);
        window.Pages[0].Fields.Single(f => f.Field == BenchFields.Transparency).Edit.SetFocus();
        Type(app, "opaque");
        window.ShowPage(1);
        window.Refractometer.Low.SetFocus();
        Type(app, "1.61");
        app.InjectKey(Key.Enter);
        Settle();
        string Line(string field) => window.Tests.Choices.Single(c => c.Choice.Field == field).Text;
        Assert.EndsWith(TestsPage.OpaqueNote, Line(BenchFields.Polariscope));
        Assert.EndsWith(TestsPage.OpaqueNote, Line(BenchFields.Pleochroism));
        Assert.EndsWith(TestsPage.OpaqueNote, Line(BenchFields.Dispersion));
        Assert.DoesNotContain(TestsPage.OpaqueNote, Line(BenchFields.UvLong));
        window.ShowPage(0);
        var transparency = window.Pages[0].Fields.Single(f => f.Field == BenchFields.Transparency).Edit;
        transparency.SetFocus();
        transparency.Text = "transparent";
        Settle();
        Assert.DoesNotContain(TestsPage.OpaqueNote, Line(BenchFields.Polariscope));
        Close(app, window, token);
    }

    [Fact]
    public void A_mouse_click_on_the_page_bar_changes_page_and_a_click_on_a_choice_cycles_it()
    {
        var (app, window, token) = Open();
        app.LayoutAndDraw();
        app.InjectSequence(InputInjectionExtensions.LeftButtonClick(new System.Drawing.Point(33, 0)));   // " F5 Tests "
        Assert.Equal(3, window.CurrentPage);
        app.LayoutAndDraw();
        ChoiceField polariscope = window.Pages[3].Choices[0];
        System.Drawing.Point at = polariscope.ViewportToScreen(new System.Drawing.Point(2, 0));
        app.InjectSequence(InputInjectionExtensions.LeftButtonClick(at));
        Settle();
        Assert.Equal("singly_refractive", _session.Form.Choice(BenchFields.Polariscope));
        Close(app, window, token);
    }

    [Fact]
    public void The_cut_is_picked_on_the_stone_page_and_reaches_the_answer()
    {
        var (app, window, token) = Open();
        window.ShowPage(0);
        window.Pages[0].Choices[0].SetFocus();
        app.InjectKey(new Key('f'));
        _session.Form.SetText(BenchFields.Sg, "2.65");
        _session.Changed();
        Settle();
        app.LayoutAndDraw();
        Assert.Equal("faceted", _session.Form.Choice(BenchFields.Cut));
        Assert.Contains("Cut           [faceted]", app.Driver!.ToString()!);
        // The answer's readings say it, and the reader counts the star and the cat's-eye as not seen.
        Assert.Contains(window.Results.Rows, r => r.Text.Contains("Cut: faceted", StringComparison.Ordinal));
        Assert.True(_session.Results.Latest!.Readings.Cut == "faceted");
        Close(app, window, token);
    }

    [Fact]
    public void A_choice_is_picked_with_one_letter()
    {
        var (app, window, token) = Open();
        window.ShowPage(3);
        window.Pages[3].Choices[0].SetFocus();
        app.InjectKey(new Key('d'));
        Settle();
        app.LayoutAndDraw();
        Assert.Equal("doubly_refractive", _session.Form.Choice(BenchFields.Polariscope));
        Assert.Contains("[doubly refractive]", app.Driver!.ToString()!);
        Close(app, window, token);
    }

    [Theory]
    [InlineData(80, 24, 4)]
    [InlineData(100, 30, 5)]
    [InlineData(80, 20, 2)]
    public void The_scales_screen_shows_each_reading_against_the_top_candidates(int columns, int rows, int candidates)
    {
        using IApplication app = Headless.Start(columns, rows);
        using var window = new MainWindow(_session, TestMaterials.All);
        _session.Start();
        window.FillFromModel();
        foreach (var (rotation, high) in new[] { ("0", "1.553"), ("45", "1.551"), ("90", "1.548"), ("135", "1.551") })
            _session.Form.PutStep(_session.Form.Steps.Count, new StepText(rotation, "1.544", high));
        _session.Form.SetText(BenchFields.Sg, "2.65");
        _session.Changed();
        Settle();
        // The layout is under test, not the ranking: the four materials are given equal shares, so that each is listed
        // and the screen's height alone decides how many are drawn.
        BenchAssessment latest = _session.Results.Latest!;
        latest = latest with { Result = latest.Result! with { Candidates = [.. latest.Result.Candidates.Select(c => c with { Confidence = 0.25 })] } };
        using var scales = new GemIndex.Cli.TextUi.Plot.ScaleView(new GemIndex.Cli.TextUi.Plot.ScaleModel(latest));
        SessionToken token = app.Begin(scales)!;
        app.LayoutAndDraw();
        string screen = app.Driver!.ToString()!;
        Assert.Contains("lowest index", screen);
        Assert.Contains("birefringence", screen);
        Assert.Contains("SG", screen);
        Assert.Contains("1.544 ± ", screen);
        Assert.Contains("1 quartz", screen);
        int shown = Math.Min(candidates, _session.Results.Candidates.Count);   // the test catalogue holds four materials
        string[] lines = screen.Split('\n');
        int RowsOfRank(int rank) => lines.Count(l => System.Text.RegularExpressions.Regex.IsMatch(l, $@"^\W*{rank} \S.*\.\.\..* (in|rare|near|out|-)\W*$"));
        Assert.Equal(3, RowsOfRank(shown));
        Assert.Equal(0, RowsOfRank(shown + 1));
        Assert.Contains(GemIndex.Cli.TextUi.Plot.ScaleModel.Legend, screen);   // everything fits: the legend is the last line
        Assert.Equal(3, lines.Count(l => l.Contains("1 quartz", StringComparison.Ordinal)));
        app.End(token);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(1)]
    [InlineData(4)]
    public void The_page_bar_names_the_other_screens_keys_at_80_columns_on_every_page(int page)
    {
        // The key line at 80 columns has room for the most used keys only; the plot, catalogue and stones list are named
        // on the page bar instead, so that no screen is found only through F1.
        string bar = MainWindow.PageBarText(page, MainWindow.MinimumColumns);
        Assert.True(bar.Length <= MainWindow.MinimumColumns, bar);
        Assert.EndsWith("│ F6 plot F7 catalogue F8 stones", bar);
        Assert.Contains($"[{GemIndex.Cli.TextUi.Bench.BenchFields.PageNames[page]}]", bar);
        Assert.EndsWith("│ " + MainWindow.OtherScreens, MainWindow.PageBarText(page, 120));
    }

    [Fact]
    public void Ctrl_E_is_left_to_the_window_as_export_rather_than_taken_by_the_text_fields()
    {
        using var window = new MainWindow(_session, TestMaterials.All);
        Assert.False(window.Refractometer.Low.KeyBindings.TryGet(Key.E.WithCtrl, out _));
        Assert.True(window.Refractometer.Low.KeyBindings.TryGet(Key.End, out _));   // End still moves to the end of the line
        Assert.Contains("^E export", window.KeyLine);
    }

    [Fact]
    public void Ctrl_C_copies_in_a_field_and_says_so_with_how_to_quit_never_silently()
    {
        using IApplication app = Headless.Start();
        using var window = new MainWindow(_session, TestMaterials.All);
        var field = window.Refractometer.Low;
        field.Text = "1.544";
        field.NewKeyDownEvent(Key.C.WithCtrl);
        Assert.Equal(MainWindow.CopyKeyLine(copied: false), window.KeyLine);
        field.SelectAll();
        field.NewKeyDownEvent(Key.C.WithCtrl);
        Assert.Equal(MainWindow.CopyKeyLine(copied: true), window.KeyLine);
        Assert.Equal("1.544", field.Text);   // copying leaves the reading as typed
        Assert.All(new[] { true, false }, c => Assert.True(MainWindow.CopyKeyLine(c).Length < 80));
        Assert.Contains("Ctrl+Q quits", MainWindow.CopyKeyLine(false));
    }

    [Fact]
    public void The_bench_draws_while_the_catalogue_loads_and_ranks_once_it_arrives()
    {
        var session = new BenchSession(_workbook, new BenchAssessor(null), _uiQueue.Enqueue);
        void SettleThis()
        {
            Assert.True(session.Flush(TestHost.SaveWait));
            while (_uiQueue.TryDequeue(out Action? a)) a();
        }
        using IApplication app = Headless.Start();
        using var window = new MainWindow(session, []);
        window.ShowCatalogueState(TextUiLauncher.LoadingCatalogue);
        session.Start();
        window.FillFromModel();
        foreach (var (rotation, high) in new[] { ("0", "1.553"), ("45", "1.551"), ("90", "1.548") })
            session.Form.PutStep(session.Form.Steps.Count, new StepText(rotation, "1.544", high));
        session.Changed();
        SessionToken token = app.Begin(window)!;
        SettleThis();
        app.LayoutAndDraw();
        string screen = app.Driver!.ToString()!;
        Assert.Contains(TextUiLauncher.LoadingCatalogue, screen);
        Assert.DoesNotContain("1 quartz", screen);
        Assert.Contains("0°  1.544     1.553", screen);   // the form works meanwhile

        window.UseCatalogue(TestMaterials.All, new BenchAssessor(new Identifier(TestMaterials.All)));
        SettleThis();
        app.LayoutAndDraw();
        screen = app.Driver!.ToString()!;
        Assert.DoesNotContain(TextUiLauncher.LoadingCatalogue, screen);
        Assert.Contains("1 quartz", screen);
        Assert.Contains("Quartz ", screen);
        app.End(token);
    }

    private (IApplication App, MainWindow Window, SessionToken Token) Open(int columns = 80, int rows = 24)
    {
        IApplication app = Headless.Start(columns, rows);
        var window = new MainWindow(_session, TestMaterials.All);
        _session.Start();
        window.FillFromModel();
        SessionToken token = app.Begin(window)!;
        app.LayoutAndDraw();
        return (app, window, token);
    }

    /// <summary>From the refractometer page's edit line: down to the list of steps, and Enter on the first to edit it.</summary>
    private static void EditFirstStep(IApplication app)
    {
        app.InjectKey(Key.Tab);
        app.InjectKey(Key.Tab);
        app.InjectKey(Key.Home);
        app.InjectKey(Key.Enter);
    }

    /// <summary>Closes the window and the headless application opened by <see cref="Open"/>.</summary>
    private static void Close(IApplication app, MainWindow window, SessionToken token)
    {
        window.Dispose();
        app.End(token);
        app.Dispose();
    }

    /// <summary>The program started again on the same workbook (after the terminal closed): a new session and window.</summary>
    private (BenchSession Session, MainWindow Window) Restart()
    {
        var session = new BenchSession(_workbook, new BenchAssessor(new Identifier(TestMaterials.All)), _uiQueue.Enqueue);
        var window = new MainWindow(session, TestMaterials.All);
        session.Start();
        window.FillFromModel();
        window.ShowLastPage();   // as TextUiLauncher does
        return (session, window);
    }

    [Fact]
    public void After_a_closed_terminal_the_bench_opens_on_the_page_where_the_typing_was()
    {
        var (app, window, token) = Open();
        app.InjectKey(Key.F2);
        Type(app, "lot 9");
        Settle();
        Assert.Equal(0, window.CurrentPage);
        Assert.Equal("0", _workbook.Setting(BenchSession.PageSetting));
        Close(app, window, token);

        var (again, reopened) = Restart();
        using var _ = reopened;
        Assert.Equal(0, reopened.CurrentPage);   // the stone page, not the refractometer's
        Assert.True(again.Flush());
    }

    [Fact]
    public void Each_page_opens_at_its_first_reading_whatever_field_was_used_last()
    {
        var (app, window, token) = Open();
        app.InjectKey(Key.F3);
        Assert.Same(window.Refractometer.Low, window.MostFocused);
        window.Refractometer.Fields.Single(f => f.Field == BenchFields.Precision).Edit.SetFocus();   // the field used last
        app.InjectKey(Key.F2);
        Assert.Same(window.Pages[0].Fields[0].Edit, window.MostFocused);                            // reference
        app.InjectKey(Key.F3);
        Assert.Same(window.Refractometer.Low, window.MostFocused);
        app.InjectKey(Key.F4);
        Assert.Same(window.Gravity.Fields.Single(f => f.Field == BenchFields.Sg).Edit, window.MostFocused);
        app.InjectKey(Key.F5);
        Assert.Same(window.Pages[3].Choices[0], window.MostFocused);                                 // polariscope
        window.Pages[0].Fields.Single(f => f.Field == BenchFields.Notes).Edit.SetFocus();
        app.InjectKey(Key.N.WithCtrl);
        Assert.Same(window.Pages[0].Fields[0].Edit, window.MostFocused);                            // a new stone opens at its reference
        Assert.Equal(0, window.CurrentPage);
        Close(app, window, token);
    }

    [Fact]
    public void A_digit_typed_on_a_choice_goes_into_the_next_field()
    {
        var (app, window, token) = Open();
        app.InjectKey(Key.F5);
        window.Pages[3].Choices.Single(c => c.Choice.Field == BenchFields.Dispersion).SetFocus();
        Type(app, "1.65");
        Settle();
        Assert.Equal("1.65", _session.Form.Text(BenchFields.IndexAtB));
        Assert.Null(_session.Form.Choice(BenchFields.Dispersion));
        Close(app, window, token);
    }

    [Fact]
    public void A_digit_typed_on_a_choice_never_replaces_a_value_farther_down()
    {
        var (app, window, token) = Open();
        app.InjectKey(Key.F5);
        var absorption = window.Pages[3].Fields.Single(f => f.Field == BenchFields.Absorption);
        absorption.Edit.SetFocus();
        Type(app, "694 668 659");
        window.Pages[3].Choices.Single(c => c.Choice.Field == BenchFields.UvLong).SetFocus();   // a choice with another choice after it
        Type(app, "4");
        window.Pages[3].Choices.Single(c => c.Choice.Field == BenchFields.UvShort).SetFocus(); // the last choice before the lines
        Type(app, "4");
        Settle();
        Assert.Equal("694 668 659", _session.Form.Text(BenchFields.Absorption));
        Assert.Null(_session.Form.Choice(BenchFields.UvLong));
        Close(app, window, token);
    }

    [Fact]
    public void F10_reaches_the_answer_and_the_arrows_reach_the_second_candidate()
    {
        var (app, window, token) = Open();
        // A spot reading of 1.55 fits quartz (1.544–1.554) and crown glass (1.50–1.70): both stay in play and are listed.
        _session.Form.SetText(BenchFields.Spot, "1.55");
        _session.Changed();
        Settle();
        Assert.Equal([0, 1], _session.Results.Listed);
        app.LayoutAndDraw();
        app.InjectKey(Key.F10);
        Assert.True(window.Results.List.HasFocus);
        Assert.Equal(0, window.Results.SelectedCandidate);
        app.InjectKey(Key.CursorDown);
        Assert.Equal(1, window.Results.SelectedCandidate);
        app.LayoutAndDraw();
        string screen = app.Driver!.ToString()!;
        Assert.Contains("Enter detail", screen);   // the key line names the answer's keys
        Assert.Contains("Quartz ", screen);        // the species leads
        app.InjectKey(Key.F10);
        Assert.Same(window.Refractometer.Low, window.MostFocused);
        Close(app, window, token);
    }

    [Fact]
    public void From_the_answer_F10_or_Esc_go_back_to_the_field_left_and_a_page_key_to_its_first_field()
    {
        var (app, window, token) = Open();
        app.InjectKey(Key.F4);
        var inWater = window.Gravity.WaterField.Edit;
        inWater.SetFocus();
        app.InjectKey(Key.F10);
        Assert.True(window.Results.List.HasFocus);
        app.InjectKey(Key.Esc);
        Assert.Same(inWater, window.MostFocused);
        app.InjectKey(Key.F10);
        app.InjectKey(Key.F10);
        Assert.Same(inWater, window.MostFocused);
        // Another page is another matter: its first reading field, as always.
        app.InjectKey(Key.F10);
        app.InjectKey(Key.F3);
        Assert.Same(window.Refractometer.Low, window.MostFocused);
        Close(app, window, token);
    }

    [Fact]
    public void Below_80_by_24_the_window_says_it_is_too_small_instead_of_cutting_numbers()
    {
        var (app, window, token) = Open(60, 20);
        string screen = app.Driver!.ToString()!;
        Assert.Contains("Window too small", screen);
        Assert.DoesNotContain("F3 RI", screen);
        Assert.True(window.TooSmall);
        app.Driver!.SetScreenSize(80, 24);
        app.LayoutAndDraw();
        Assert.False(window.TooSmall);
        Assert.Contains("F3 RI", app.Driver!.ToString()!);
        Close(app, window, token);
    }

    [Fact]
    public void The_immersion_caution_shows_whole_on_the_SG_page_without_a_pop_up()
    {
        var (app, window, token) = Open();
        app.InjectKey(Key.F3);
        _session.Form.SetText(BenchFields.Spot, "1.45");
        _session.Form.SetText(BenchFields.Sg, "2.10");
        _session.Changed();
        Settle();
        app.InjectKey(Key.F4);
        app.InjectKey(Key.Tab);
        app.InjectKey(Key.Tab);   // weight in water: keys typed there stay there
        Type(app, "1.1");
        Settle();
        app.LayoutAndDraw();
        Assert.Same(window, app.TopRunnableView);
        Assert.Equal("1.1", _session.Form.Text(BenchFields.WaterCt));
        string caution = System.Text.RegularExpressions.Regex.Replace(window.Gravity.Caution.Text, @"\s+", " ");
        Assert.Contains("Do not immerse: opal is possible here.", caution);
        Assert.Contains("rely on the other tests.", caution);
        Assert.Contains("water unless the stone is known to take it", caution);   // as the answer's warning says it
        Assert.EndsWith(GemIndex.Cli.Reports.ReportCautions.HeavyLiquidLine, caution);   // the heavy liquids' caution stays too
        Assert.Contains("tests.", FormText(app.Driver!.ToString()!));   // drawn whole, not cut by the label's height
        Close(app, window, token);
    }

    /// <summary>The form's side of the screen (inside its frame) as one line, runs of spaces made one: what the user reads on the page.</summary>
    private static string FormText(string screen) => System.Text.RegularExpressions.Regex.Replace(
        string.Join(" ", screen.Split('\n').Where(l => l.Length > MainWindow.FormWidth).Select(l => l[1..(MainWindow.FormWidth - 1)])), @"\s+", " ");

    [Fact]
    public void A_typed_SG_that_is_itself_refused_leaves_the_weighing_in_use_and_says_so()
    {
        var (app, window, token) = Open();
        _session.Form.SetText(BenchFields.Spot, "1.54");
        app.InjectKey(Key.F4);
        Type(app, "2,6x");
        app.InjectKey(Key.Tab);
        Type(app, "3.00");
        app.InjectKey(Key.Tab);
        Type(app, "2.00");
        Settle();
        app.LayoutAndDraw();
        string page = FormText(app.Driver!.ToString()!);
        // 3.00 / (3.00 − 2.00) × ρ(20 °C) = 2.995 (hydrostatic weighing, common practice).
        Assert.Matches(@"SG (2\.99|3\.00)\d? ± 0\.0\d+ from the weights \(the SG typed is refused\)", page);
        Assert.InRange(_session.Results.Latest!.SpecificGravity!.Value.Value, 2.990, 3.000);
        Assert.Contains("! SG: '2,6x' has a comma", page);       // the typed value's own reason, not a clash
        Close(app, window, token);
    }

    [Theory]
    [InlineData("2.65", "3.00", "2.00", @"!! SG typed 2\.650, weighed 2\.99\d: they disagree\. Neither is used; clear the SG or the weights\.")]
    [InlineData("2.99", "3.00", "2.00", @"!! SG typed 2\.990, weighed 2\.99\d: they agree\. Neither is used; clear the SG or the weights\.")]
    [InlineData("2.65", "3.00", "", @"!! SG typed 2\.650 and a weighing begun\. Neither is used; clear the SG or the weights\.")]
    public void A_typed_SG_and_weights_are_a_clash_said_whole_on_the_SG_page_with_which_is_used(string sg, string air, string water, string said)
    {
        // 3.00 ct in air, 2.00 ct in water: 3.00 / (3.00 − 2.00) × ρ(20 °C) = 2.995 (hydrostatic weighing, common practice).
        var (app, window, token) = Open();
        _session.Form.SetText(BenchFields.Spot, "1.54");   // a reading to rank on, so that the answer lists what it used
        app.InjectKey(Key.F4);
        Type(app, sg);
        app.InjectKey(Key.Tab);
        Type(app, air);
        app.InjectKey(Key.Tab);
        Type(app, water);
        Settle();
        app.LayoutAndDraw();
        string page = FormText(app.Driver!.ToString()!);
        Assert.Matches(said, page);                               // whole, on the page, at 80x24: no row of it cut off
        Assert.Same(window, app.TopRunnableView);                 // no pop-up: the keys typed went into the fields
        Assert.Equal(water, _session.Form.Text(BenchFields.WaterCt));
        Assert.Null(_session.Results.Latest!.SpecificGravity);
        Assert.Contains("! SG: is given directly", page);        // the reason at the foot, after the field's caption,
        Assert.Contains("(In air, In water)", page);             // naming the fields by their captions
        Assert.DoesNotContain("sg.", page);
        string answer = System.Text.RegularExpressions.Regex.Replace(string.Join(" ", window.Results.Rows.Select(r => r.Text)), @"\s+", " ");
        Assert.Contains("Specific gravity: none used (the SG page, F4, says why)", answer);
        Close(app, window, token);
    }

    [Fact]
    public void Refused_entries_are_marked_at_their_rows_and_their_reasons_given_whole_or_not_at_all()
    {
        var (app, window, token) = Open();
        app.InjectKey(Key.F3);
        TypeSteps(app, ("1.544", "1.553"), ("1.95", "2.0"));
        for (int i = 0; i < 3; i++) app.InjectKey(Key.Tab);      // the spot reading
        Type(app, "1.5x");
        Settle();
        app.LayoutAndDraw();
        string screen = app.Driver!.ToString()!;
        Assert.Matches(@" 15°  1\.95      2\.0    ! see below│", screen);   // the step row says where its reason is
        string page = FormText(screen);
        IReadOnlyDictionary<string, string> errors = _session.Results.Latest!.Errors;
        Assert.True(errors.Count >= 2);
        foreach (string reason in errors.Values)
        {
            string words = System.Text.RegularExpressions.Regex.Replace(window.Refractometer.InCaptions(reason), @"\s+", " ");
            Assert.True(page.Contains(words, StringComparison.Ordinal) || !page.Contains(words[..Math.Min(12, words.Length)], StringComparison.Ordinal), $"cut short: {words}\n{page}");
        }
        Close(app, window, token);
    }

    [Fact]
    public void A_digit_a_choice_cannot_pass_on_is_said_on_the_key_line_not_dropped_silently()
    {
        var (app, window, token) = Open();
        app.InjectKey(Key.F5);
        var tests = window.Pages[3];
        var choice = tests.Choices.First(c => tests.Choices.IndexOf(c) + 1 < tests.Choices.Count);   // a choice followed by another
        choice.SetFocus();
        app.InjectKey(new Key('5'));
        Assert.StartsWith($"'5' not taken: {choice.Choice.Label} takes one of {choice.Choice.KeyHint}", window.KeyLine);
        Close(app, window, token);
    }

    [Fact]
    public void The_list_of_steps_takes_the_rows_a_taller_window_leaves_and_the_fields_move_down_with_it()
    {
        using IApplication app = Headless.Start(120, 40);
        using var window = new MainWindow(_session, TestMaterials.All);
        SessionToken token = app.Begin(window)!;
        app.LayoutAndDraw();
        var rf = window.Refractometer;
        Assert.True(rf.Grid.Frame.Height > RefractometerPage.GridRows, $"{rf.Grid.Frame.Height} rows at 120x40");
        var spot = rf.Fields.Single(f => f.Field == BenchFields.Spot);
        Assert.Equal(rf.Grid.Frame.Bottom, spot.Frame.Y);   // the spot reading right under the list
        app.End(token);
    }

    [Fact]
    public void With_every_step_removed_the_rotation_offered_is_0_again()
    {
        var (app, window, token) = Open();
        app.InjectKey(Key.F3);
        Type(app, "1.544 1.553");
        app.InjectKey(Key.Enter);
        Settle();
        Assert.NotEqual("0", window.Refractometer.Rotation.Text);
        window.Refractometer.Grid.SetFocus();
        window.Refractometer.Grid.SelectedItem = 0;
        app.InjectKey(Key.Delete);
        Settle();
        Assert.Empty(_session.Form.Steps);
        Assert.Equal("0", window.Refractometer.Rotation.Text);
        Close(app, window, token);
    }

    [Fact]
    public void Both_edges_typed_in_one_go_stay_in_sight_the_second_going_on_into_the_high_box()
    {
        var (app, window, token) = Open();
        app.InjectKey(Key.F3);
        Type(app, "1.716 1.721");
        Assert.Equal("1.716", window.Refractometer.Low.Text);
        Assert.Equal("1.721", window.Refractometer.High.Text);
        app.InjectKey(Key.Enter);
        Settle();
        Assert.Equal(new StepText("0", "1.716", "1.721"), _session.Form.Steps[0]);
        Close(app, window, token);
    }

    [Fact]
    public void A_refused_choice_is_marked_at_its_row_and_its_reason_named_by_its_caption()
    {
        var (app, window, token) = Open();
        app.InjectKey(Key.F3);
        window.Refractometer.Fields.Single(f => f.Field == BenchFields.Spot).Edit.SetFocus();
        Type(app, "1.62");
        app.InjectKey(Key.Tab);            // the over-limit choice
        app.InjectKey(Key.Y);              // "no edge seen" beside a spot reading: the over-limit answer is refused
        Settle();
        app.LayoutAndDraw();
        string page = FormText(app.Driver!.ToString()!);
        Assert.Matches(@"Over limit\s+\[yes\]\s+" + System.Text.RegularExpressions.Regex.Escape(FormField.SeeBelow), page);
        Assert.Contains("! Over limit: says no edge was seen, but a spot reading 1.62 is given too.", page);
        Close(app, window, token);
    }

    [Fact]
    public void The_reason_of_the_step_under_the_cursor_is_shown_first_so_every_marked_entry_can_be_read()
    {
        var (app, window, token) = Open();
        app.InjectKey(Key.F3);
        TypeSteps(app, ("1.7x2", "1.718"), ("1.95", "2.0"), ("1.96", "2.1"), ("1.544", "1.553"));
        Settle();
        app.LayoutAndDraw();
        Assert.Contains("! step 1:", FormText(app.Driver!.ToString()!));
        Assert.DoesNotContain("! step 3:", FormText(app.Driver!.ToString()!));   // three reasons do not fit: the first are shown
        app.InjectKey(Key.Tab);            // the high edge
        app.InjectKey(Key.Tab);            // the list of steps
        app.InjectKey(Key.Home);
        app.InjectKey(Key.CursorDown);
        app.InjectKey(Key.CursorDown);     // step 3
        app.LayoutAndDraw();
        string page = FormText(app.Driver!.ToString()!);
        Assert.Contains("! step 3: low edge 1.96 and high edge 2.1 are above the liquid limit 1.790, where no edge shows (a denser liquid? set Liquid limit).", page);
        // Its four rows leave none for the pointer to the others (their steps keep their marks); the contact liquid's
        // caution keeps the last row.
        Assert.Contains(GemIndex.Cli.Reports.ReportCautions.ContactLiquidLine, page);
        app.InjectKey(Key.Home);           // step 1: a shorter reason, with the pointer to the others
        app.LayoutAndDraw();
        page = FormText(app.Driver!.ToString()!);
        Assert.Contains("! step 1:", page);
        Assert.Contains(BenchPage.MoreProblems, page);
        Assert.Contains(GemIndex.Cli.Reports.ReportCautions.ContactLiquidLine, page);
        Close(app, window, token);
    }

    [Fact]
    public void A_new_answer_is_shown_from_its_top_even_after_the_old_one_was_scrolled()
    {
        var (app, window, token) = Open();
        app.InjectKey(Key.F4);
        Type(app, "3.99");
        Settle();
        app.LayoutAndDraw();
        app.InjectKey(Key.F10);
        for (int i = 0; i < 3; i++) { app.InjectKey(Key.PageDown); app.LayoutAndDraw(); }
        Assert.True(window.Results.List.SelectedItem > 0);   // the place in the old answer moved down
        app.InjectKey(Key.F4);
        app.InjectKey(Key.Backspace);
        Type(app, "1.50");                                          // another SG: a new answer (nothing fits)
        Settle();
        app.LayoutAndDraw();
        Assert.Equal(0, window.Results.List.Viewport.Y);
        Assert.Equal(0, window.Results.List.SelectedItem);
        Close(app, window, token);
    }

    [Fact]
    public void A_text_field_on_the_tests_page_has_a_text_fields_keys_and_a_choice_its_own()
    {
        var (app, window, token) = Open();
        app.InjectKey(Key.F5);                      // the polariscope, a choice
        app.LayoutAndDraw();
        string[] screen = app.Driver!.ToString()!.Split('\n');
        Assert.DoesNotContain(BenchPage.FieldKeys, screen.Last(l => l.Trim().Length > 0));
        app.InjectKey(Key.Tab.WithShift);           // the absorption lines, a text field
        app.LayoutAndDraw();
        screen = app.Driver!.ToString()!.Split('\n');
        Assert.StartsWith(BenchPage.FieldKeys, screen.Last(l => l.Trim().Length > 0).Trim());
        Close(app, window, token);
    }

    /// <summary>Three quartz-like steps typed on F3 (handbook values from memory), the cursor on the second in the list.</summary>
    private static void OnTheSecondOfThreeQuartzSteps(IApplication app)
    {
        app.InjectKey(Key.F3);
        TypeSteps(app, ("1.544", "1.553"), ("1.544", "1.551"), ("1.544", "1.549"));
        app.InjectKey(Key.Tab);
        app.InjectKey(Key.Tab);            // the list of steps
        app.InjectKey(Key.Home);
        app.InjectKey(Key.CursorDown);     // step 2
    }

    [Fact]
    public void Esc_leaves_a_step_being_edited_as_it_was_stored()
    {
        // Quartz-like steps (handbook values from memory): Enter on a step put it on the edit line, where Delete cleared
        // its low edge and no key but Enter (storing it) led out.
        var (app, window, token) = Open();
        OnTheSecondOfThreeQuartzSteps(app);
        app.InjectKey(Key.Enter);          // edit it: the cursor goes to its low edge
        app.InjectKey(Key.Delete);
        app.InjectKey(Key.Esc);
        Assert.Equal(["1.544", "1.544", "1.544"], _session.Form.Steps.Select(s => s.Low).ToArray());
        Assert.Equal(["1.553", "1.551", "1.549"], _session.Form.Steps.Select(s => s.High).ToArray());
        Assert.Same(window.Refractometer.Grid, window.MostFocused);
        Assert.Equal(1, window.Refractometer.Grid.SelectedItem);
        Assert.Equal("", _session.Form.Text(RefractometerPage.TypingStep));
        Close(app, window, token);
    }

    [Fact]
    public void A_step_removed_by_mistake_comes_back_with_Ctrl_Z()
    {
        var (app, window, token) = Open();
        OnTheSecondOfThreeQuartzSteps(app);
        app.InjectKey(Key.Delete);
        Assert.Equal(["1.553", "1.549"], _session.Form.Steps.Select(s => s.High).ToArray());
        app.InjectKey(Key.Z.WithCtrl);
        Assert.Equal(["1.553", "1.551", "1.549"], _session.Form.Steps.Select(s => s.High).ToArray());
        // With an edit under way (Enter on a step), a step removed from the list leaves the cursor on the list, so the
        // Ctrl+Z the key line offers puts the step back (the cursor had jumped to the edit line, where it undid text).
        app.InjectKey(Key.Enter);                  // edit the selected step: the cursor goes to its edges
        app.InjectKey(Key.Tab);
        app.InjectKey(Key.Tab);                    // back to the list
        Assert.Same(window.Refractometer.Grid, window.MostFocused);
        app.InjectKey(Key.Delete);
        Assert.Same(window.Refractometer.Grid, window.MostFocused);
        Assert.Equal(2, _session.Form.Steps.Count);
        app.InjectKey(Key.Z.WithCtrl);
        Assert.Equal(3, _session.Form.Steps.Count);
        Close(app, window, token);
    }

    [Fact]
    public void On_the_SG_page_a_long_immersion_caution_leaves_room_for_the_reason_of_a_refused_entry()
    {
        // A porous candidate's caution (turquoise: spot 1.62, the shipped catalogue) and an SG typed beside weights
        // (values invented): at 80x24 both are read, the caution ending with a pointer to the answer's warnings.
        var materials = GemIndex.Data.Catalogue.ShippedCatalogue.Families.Materials;
        var session = new BenchSession(_workbook, new BenchAssessor(new Identifier(materials)), _uiQueue.Enqueue);
        IApplication app = Headless.Start(80, 24);
        var window = new MainWindow(session, materials);
        session.Start();
        window.FillFromModel();
        SessionToken token = app.Begin(window)!;
        session.Form.SetText(BenchFields.Spot, "1.62");
        session.Form.SetText(BenchFields.Colour, "blue");
        session.Form.SetText(BenchFields.Sg, "2.70");
        session.Form.SetText(BenchFields.AirCt, "3.000");
        session.Form.SetText(BenchFields.WaterCt, "2.000");
        session.Changed();
        Assert.True(session.Flush(TestHost.SaveWait));
        while (_uiQueue.TryDequeue(out Action? a)) a();
        app.InjectKey(Key.F4);
        app.LayoutAndDraw();
        string page = FormText(app.Driver!.ToString()!);
        Assert.Contains("!! Do not immerse", page);
        Assert.Contains("(more under Warnings)", page);
        Assert.Contains("! SG: is given directly (2.70) and by", page);   // the reason's first line, not hidden under the caution
        Assert.Contains("one of them.", page);
        window.Dispose();
        app.End(token);
        app.Dispose();
        session.Flush(TestHost.SaveWait);
    }

    [Fact]
    public void The_exports_refused_entries_are_said_in_the_pages_words_with_their_page()
    {
        var (app, window, token) = Open();
        _session.Form.SetText(BenchFields.Sg, "2.65");
        _session.Form.SetText(BenchFields.AirCt, "3.500");
        _session.Form.SetText(BenchFields.WaterCt, "2.500");
        _session.Changed();
        Settle();
        var lines = window.RefusedInWords(_session.Results.Latest!.Errors);
        string sg = Assert.Single(lines);
        Assert.StartsWith("SG: ", sg);
        Assert.Contains("(In air, In water)", sg);          // the captions, not the batch format's names
        Assert.DoesNotContain("sg.air_ct", sg);
        Assert.EndsWith("(F4 SG)", sg);
        Close(app, window, token);
    }

    [Fact]
    public void A_refused_entry_is_said_at_the_top_of_the_answer()
    {
        var (app, window, token) = Open();
        app.InjectKey(Key.F4);
        Type(app, "3.99");
        for (int i = 0; i < 4; i++) app.InjectKey(Key.Tab);   // the heavy liquids
        Type(app, "3,32 floats");
        Settle();
        app.LayoutAndDraw();
        string answer = System.Text.RegularExpressions.Regex.Replace(string.Join(" ", window.Results.Rows.Select(r => r.Text)), @"\s+", " ");
        Assert.Contains("! 1 entry refused and not used: see the entry marked '!' on F4 SG.", answer);   // the page named
        Close(app, window, token);
    }

    [Fact]
    public void A_reference_with_underscores_shows_them_in_the_answer_s_title()
    {
        var (app, window, token) = Open();
        app.InjectKey(Key.F2);
        Type(app, "lot_7 a_b");
        Settle();
        app.LayoutAndDraw();
        Assert.Contains("Answer (F10) for lot_7 a_b", app.Driver!.ToString()!.Split('\n')[1]);   // Terminal.Gui would take the first '_' as a hot key
        Close(app, window, token);
    }

    [Fact]
    public void The_examiner_is_reached_from_the_keyboard_at_the_foot_of_the_stone_page_and_kept_for_the_next_stone()
    {
        var (app, window, token) = Open();
        app.InjectKey(Key.F2);
        for (int i = 0; i < 9; i++) app.InjectKey(Key.Tab);   // past the stone's eight fields and its cut
        Type(app, "A. Example");
        Settle();
        app.InjectKey(Key.N.WithCtrl);                        // a new stone: the bench's examiner stays
        Settle();
        app.LayoutAndDraw();
        string screen = app.Driver!.ToString()!;
        Assert.Contains("Examiner      A. Example", screen);
        Assert.Contains(StonePage.ExaminerNote.Trim(), screen);
        Assert.Contains(StonePage.WeighedNote.Trim(), screen);   // what of the stone page the answer uses
        Assert.True(_session.Flush(TestHost.SaveWait));
        Assert.Equal("A. Example", _workbook.Setting(BenchSession.ExaminerSetting));
        Close(app, window, token);
    }

    [Theory]
    [InlineData("1.544 1.553")]
    [InlineData("1.544/1.553")]
    [InlineData("1.544   1.553")]
    public void Both_edges_typed_in_the_low_box_are_stored_as_the_two_edges(string typed)
    {
        var (app, window, token) = Open();
        app.InjectKey(Key.F3);
        Type(app, typed);
        app.InjectKey(Key.Enter);
        Settle();
        var step = Assert.Single(_session.Form.Steps);
        Assert.Equal(("1.544", "1.553"), (step.Low, step.High));
        Close(app, window, token);
    }

    [Fact]
    public void A_step_typed_but_not_stored_comes_back_when_the_workbook_is_opened_again()
    {
        var (app, window, token) = Open();
        app.InjectKey(Key.F3);
        Type(app, "1.762");
        app.InjectKey(Key.Tab);
        Type(app, "1.770");        // no Enter: the terminal closes here
        Settle();
        Close(app, window, token);

        var (again, reopened) = Restart();
        using var _ = reopened;
        Assert.Equal("1.762", reopened.Refractometer.Low.Text);
        Assert.Equal("1.770", reopened.Refractometer.High.Text);
        Assert.Empty(again.Form.Steps);   // still only typed: a step is stored with Enter
        Assert.True(again.Flush());
    }

    [Fact]
    public void Both_edges_typed_in_one_go_over_a_stored_step_replace_both_of_its_edges()
    {
        // Editing a stored step, the examiner retypes "1.618 1.623" in the low box: the space moves on to the old high
        // edge, selected, and what is typed replaces it; the pair typed whole in the low box is the two edges too (it was
        // stored as a low edge "not a number").
        var (app, window, token) = Open();
        app.InjectKey(Key.F3);
        TypeSteps(app, ("1.616", "1.621"), ("1.617", "1.622"));
        EditFirstStep(app);
        window.Refractometer.Low.Text = "";
        Type(app, "1.618 1.623");
        app.InjectKey(Key.Enter);
        Settle();
        Assert.Equal(2, _session.Form.Steps.Count);
        Assert.Equal(("1.618", "1.623"), (_session.Form.Steps[0].Low, _session.Form.Steps[0].High));
        EditFirstStep(app);                // again, the pair pasted whole in the low box
        window.Refractometer.Low.Text = "1.619 1.624";
        window.Refractometer.Low.NewKeyDownEvent(Key.Enter);
        Settle();
        Assert.Equal(("1.619", "1.624"), (_session.Form.Steps[0].Low, _session.Form.Steps[0].High));
        Close(app, window, token);
    }

    [Fact]
    public void A_new_step_half_typed_when_a_stored_step_is_opened_comes_back_after_the_edit()
    {
        // "Lose nothing already typed": a high edge typed for a new step, then a stored step opened to correct it; once
        // the correction is stored, the new step is back on the edit line as it was.
        var (app, window, token) = Open();
        app.InjectKey(Key.F3);
        TypeSteps(app, ("1.616", "1.621"), ("1.617", "1.622"));
        string rotation = window.Refractometer.Rotation.Text;
        window.Refractometer.Low.Text = "1.618";
        window.Refractometer.High.Text = "1.55";
        EditFirstStep(app);
        Assert.Equal("1.616", window.Refractometer.Low.Text);
        window.Refractometer.Low.Text = "1.615";
        window.Refractometer.Low.NewKeyDownEvent(Key.Enter);
        Settle();
        Assert.Equal("1.615", _session.Form.Steps[0].Low);
        Assert.Equal((rotation, "1.618", "1.55"), (window.Refractometer.Rotation.Text, window.Refractometer.Low.Text, window.Refractometer.High.Text));
        Assert.Equal(2, _session.Form.Steps.Count);
        Close(app, window, token);
    }

    [Fact]
    public void Past_a_half_turn_the_edit_line_says_the_rotation_offered_fills_a_gap()
    {
        // Six steps of 30° read the half turn round; the next offer, 15°, fills a gap (180° is 0° again), and the edit line
        // says so: a reading meant for 180° had gone in at 15° unremarked. A rotation typed over the offer drops the note.
        var (app, window, token) = Open();
        app.InjectKey(Key.F3);
        _session.Form.SetText(RefractometerPage.RotationStepField, "30");
        window.Refractometer.OfferRotation(_session.Form.NextRotation());
        TypeSteps(app, ("1.616", "1.621"), ("1.617", "1.622"), ("1.618", "1.623"), ("1.617", "1.622"), ("1.616", "1.621"), ("1.616", "1.622"));
        Settle();
        Assert.Equal("15", window.Refractometer.Rotation.Text);
        Assert.Equal(RefractometerPage.FillsGapNote, window.Refractometer.Editing.Text);
        window.Refractometer.Rotation.Text = "180";
        Assert.Equal("", window.Refractometer.Editing.Text);
        Close(app, window, token);
    }

    [Fact]
    public void An_edit_of_a_stored_step_interrupted_by_a_closed_terminal_comes_back_as_that_edit()
    {
        var (app, window, token) = Open();
        app.InjectKey(Key.F3);
        TypeSteps(app, ("1.616", "1.621"), ("1.617", "1.622"));
        EditFirstStep(app);
        window.Refractometer.Low.Text = "1.618";
        Settle();
        Close(app, window, token);

        var (again, reopened) = Restart();
        using var _ = reopened;
        Assert.Equal("1.618", reopened.Refractometer.Low.Text);
        Assert.StartsWith("editing step 1", reopened.Refractometer.Editing.Text);
        reopened.Refractometer.Low.NewKeyDownEvent(Key.Enter);   // stores the edit into step 1, not as a third step
        Assert.Equal(2, again.Form.Steps.Count);
        Assert.Equal("1.618", again.Form.Steps[0].Low);
        Assert.True(again.Flush());
    }

    [Fact]
    public void Ctrl_L_opens_the_loupe_on_its_first_feature_and_its_marks_are_saved_as_the_two_fields()
    {
        var (app, window, token) = Open();
        long id = _session.Form.StoneId;
        app.InjectKey(Key.L.WithCtrl);
        Assert.Equal(MainWindow.LoupePageIndex, window.CurrentPage);
        Assert.Same(window.Loupe.List, window.MostFocused);
        Assert.Equal(MagnificationFeature.CurvedStriae, window.Loupe.Current?.Feature?.Feature);
        app.InjectKey(new Key('+'));
        for (int i = 0; i < 6; i++) app.InjectKey(Key.CursorDown);   // five growth features on, then over the INCLUSIONS heading
        Assert.Equal(MagnificationFeature.RoundGasBubbles, window.Loupe.Current?.Feature?.Feature);
        app.InjectKey(new Key('+'));
        Type(app, "silk");                                           // typing finds; the cursor goes to the first match
        Assert.Equal(MagnificationFeature.NeedlesAndSilk, window.Loupe.Current?.Feature?.Feature);
        app.InjectKey(new Key('-'));
        Settle();
        app.LayoutAndDraw();
        string screen = app.Driver!.ToString()!;
        Assert.Contains("Find: silk_", screen);
        Assert.Contains(" no  needles and silk", screen);
        Assert.Contains("── looked for, not seen ─", screen);
        Assert.Equal("curved_striae round_bubbles", _session.Form.Text(BenchFields.FeaturesPresent));
        Assert.Equal("needles_silk", _session.Form.Text(BenchFields.FeaturesAbsent));
        StoneSheet stored = _workbook.Get(id)!;
        Assert.Equal(["curved_striae", "round_bubbles"], stored.Readings.FeaturesPresent);
        Assert.Equal(["needles_silk"], stored.Readings.FeaturesAbsent);

        app.InjectKey(Key.Esc);                                      // the filter cleared, the cursor stays on its feature
        Assert.Equal("", window.Loupe.Model.Filter);
        Assert.Equal(MagnificationFeature.NeedlesAndSilk, window.Loupe.Current?.Feature?.Feature);
        app.InjectKey(new Key('?'));                                 // not looked for after all
        Settle();
        Assert.Equal("", _session.Form.Text(BenchFields.FeaturesAbsent));
        Assert.Empty(_workbook.Get(id)!.Readings.FeaturesAbsent);
        Close(app, window, token);
    }

    [Fact]
    public void Ctrl_Z_on_the_loupe_page_puts_back_the_marks_in_turn_and_finds_one_the_filter_hid()
    {
        var (app, window, token) = Open();
        app.InjectKey(Key.L.WithCtrl);
        app.InjectKey(new Key('+'));                                 // curved striae seen
        app.InjectKey(Key.CursorDown);
        app.InjectKey(new Key('-'));                                 // angular zoning not seen
        foreach (char c in "bubb") app.InjectKey(new Key(c));        // the filter now hides both
        app.InjectKey(Key.Z.WithCtrl);
        Settle();
        Assert.Equal(FeatureState.NotLookedFor, window.Loupe.Model.State(MagnificationFeature.AngularGrowthZoning));
        Assert.Equal(FeatureState.Present, window.Loupe.Model.State(MagnificationFeature.CurvedStriae));
        Assert.Equal(MagnificationFeature.AngularGrowthZoning, window.Loupe.Current?.Feature?.Feature);   // shown, the filter cleared
        Assert.Equal("", window.Loupe.Model.Filter);
        Assert.Equal("curved_striae", _session.Form.Text(BenchFields.FeaturesPresent));
        Assert.Equal("", _session.Form.Text(BenchFields.FeaturesAbsent));
        app.InjectKey(Key.Z.WithCtrl);
        Settle();
        Assert.Equal("", _session.Form.Text(BenchFields.FeaturesPresent));
        app.InjectKey(Key.Z.WithCtrl);                               // nothing more to put back: said, nothing changed
        Assert.Contains("no mark changed", window.KeyLine);
        Close(app, window, token);
    }

    [Fact]
    public void The_marks_stored_show_again_when_the_stone_is_reopened_or_the_program_restarted()
    {
        var (app, window, token) = Open();
        long id = _session.Form.StoneId;
        app.InjectKey(Key.L.WithCtrl);
        app.InjectKey(new Key('+'));
        app.InjectKey(Key.CursorDown);
        app.InjectKey(new Key('-'));
        Settle();
        app.InjectKey(Key.N.WithCtrl);                               // another stone: nothing marked
        Settle();
        Assert.NotEqual(id, _session.Form.StoneId);
        Assert.Equal(0, window.Loupe.Model.Count(FeatureState.Present) + window.Loupe.Model.Count(FeatureState.Absent));
        _session.Open(id);                                           // what F8 does on Enter
        window.FillFromModel();
        Settle();
        Assert.Equal(FeatureState.Present, window.Loupe.Model.State(MagnificationFeature.CurvedStriae));
        Assert.Equal(FeatureState.Absent, window.Loupe.Model.State(MagnificationFeature.AngularGrowthZoning));
        app.InjectKey(Key.L.WithCtrl);                               // one more mark, so that this stone is the one changed last
        app.InjectKey(Key.CursorDown);
        app.InjectKey(Key.CursorDown);
        app.InjectKey(new Key('+'));
        Settle();
        Close(app, window, token);

        var (again, reopened) = Restart();                          // the stone changed last opens
        using var _ = reopened;
        Assert.Equal(id, again.Form.StoneId);
        Assert.Equal("curved_striae chevron_growth", reopened.Loupe.Model.PresentText);
        Assert.Equal("angular_zoning", reopened.Loupe.Model.AbsentText);
        Assert.True(again.Flush());
    }

    [Fact]
    public void On_the_loupe_a_heading_is_never_the_cursors_row_whether_reached_by_keys_or_a_click()
    {
        var (app, window, token) = Open();
        app.InjectKey(Key.L.WithCtrl);
        app.InjectKey(Key.CursorUp);                                 // from the first feature: nowhere to go, the heading is passed over
        Assert.Equal(MagnificationFeature.CurvedStriae, window.Loupe.Current?.Feature?.Feature);
        app.InjectKey(Key.End);
        Assert.Equal(MagnificationVocabulary.All[^1].Feature, window.Loupe.Current?.Feature?.Feature);   // the last feature of the last group
        app.InjectKey(Key.Home);
        Assert.Equal(MagnificationFeature.CurvedStriae, window.Loupe.Current?.Feature?.Feature);
        app.LayoutAndDraw();
        int inclusions = window.Loupe.Model.Rows.ToList().FindIndex(r => r.IsHeading && r.Group == FeatureGroup.Inclusion);
        app.InjectSequence(InputInjectionExtensions.LeftButtonClick(window.Loupe.List.ViewportToScreen(new System.Drawing.Point(2, inclusions))));
        Assert.Equal(MagnificationFeature.RoundGasBubbles, window.Loupe.Current?.Feature?.Feature);
        Close(app, window, token);
    }

    [Theory]
    [InlineData(80, 24, false)]
    [InlineData(120, 40, true)]
    public void The_loupe_page_fits_whole_rows_the_description_and_its_keys(int columns, int rows, bool meaning)
    {
        var (app, window, token) = Open(columns, rows);
        app.InjectKey(Key.L.WithCtrl);
        app.LayoutAndDraw();
        string screen = app.Driver!.ToString()!;
        string[] lines = screen.Split('\n');
        Assert.Contains("[^L Loupe]", lines[0]);
        string keyLine = lines.Last(l => l.Trim().Length > 0).Trim();
        Assert.StartsWith(LoupePage.KeyWords + " │ F1 keys F10 answer", keyLine);
        Assert.Contains("Look for: fine curved growth lines", screen);
        Assert.Contains("Lighting: diffused light", screen);
        Assert.Equal(meaning, screen.Contains("Meaning: melt growth", StringComparison.Ordinal));
        // Every list row on the screen is a whole row of the model: a heading or a feature's mark and full name.
        string[] whole = [.. window.Loupe.Model.Rows.Select(window.Loupe.Model.Line)];
        string[] shown = [.. lines.Skip(3).Take(window.Loupe.List.Viewport.Height).Select(l => l.Split('│')[1].TrimEnd())];
        Assert.Equal(whole.Take(shown.Length), shown);
        Assert.True(shown.Length >= LoupeModel.MinimumListRows);
        Close(app, window, token);
    }
}
