using GemIndex.Cli.TextUi.Bench;
using GemIndex.Cli.TextUi.CatalogueBrowser;
using GemIndex.Cli.TextUi.Export;
using GemIndex.Cli.TextUi.Help;
using GemIndex.Cli.TextUi.Plot;
using GemIndex.Cli.TextUi.Results;
using GemIndex.Cli.TextUi.Stones;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Quantities;
using GemIndex.Data.Batch;
using GemIndex.Data.Workbook;
using Terminal.Gui.App;
using Terminal.Gui.Drawing;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace GemIndex.Cli.TextUi.Main;

/// <summary>
/// The bench: on the left one page of the form (stone, refractometer, SG, other tests, magnification), on the right the live
/// identification, at the top the pages, at the bottom the keys. Wiring only: the models do the work.
/// </summary>
internal sealed class MainWindow : Window
{
    /// <summary>The form's width at every size: its longest row (a label and a reading field); the answer gets the rest.</summary>
    public const int FormWidth = 40;

    /// <summary>The smallest screen the bench is laid out for; below it a notice says so instead of cutting numbers.</summary>
    public const int MinimumColumns = 80, MinimumRows = 24;

    private const string GlobalKeys = "F1 help F10 answer F9 detail F6 plot ^R scales F7 catalogue F8 stones ^E export ^N new ^Q quit";

    // At 80 columns the page's own keys come first and the rest of the line keeps the keys used most, as many as fit
    // (whole: a key and its word); F1 lists them all.
    private static readonly string[] ShortGlobalKeys = ["F1 keys", "F10 answer", "F9 detail", "^E export", "^Q quit"];
    private const string AnswerKeys = "↑↓ PgUp PgDn scroll, Enter detail │ F10 or Esc back to the form";
    private readonly BenchSession _session;
    private IReadOnlyList<Material> _catalogue;
    private readonly Label _pageBar;
    private readonly FrameView _left;
    private readonly Label _keyLine;
    private readonly Label _tooSmall;
    private bool _filling;

    public MainWindow(BenchSession session, IReadOnlyList<Material> catalogue)
    {
        _session = session;
        _catalogue = catalogue;
        Title = "GemIndex";
        BorderStyle = LineStyle.None;
        if (Monochrome.Wanted) Monochrome.Apply(this);
        Pages = [new StonePage(), new RefractometerPage(), new GravityPage(), new TestsPage(), new LoupePage()];
        _pageBar = new PlainLabel { Width = Dim.Fill() };
        _pageBar.MouseEvent += (_, m) =>
        {
            if (!m.IsSingleClicked || m.Position is not { } p) return;
            int page = PageAt(p.X);
            if (page >= 0) GoToPage(page);
            m.Handled = true;
        };
        _left = new FrameView { Y = 1, Width = FormWidth, Height = Dim.Fill(1) };
        foreach (BenchPage page in Pages) _left.Add(page);
        Results = new ResultsView(session.Results) { X = FormWidth, Y = 1, Width = Dim.Fill(), Height = Dim.Fill(1) };
        _keyLine = new PlainLabel { Y = Pos.AnchorEnd(1), Width = Dim.Fill() };
        _tooSmall = new PlainLabel { Width = Dim.Fill(), Height = Dim.Fill(), Visible = false };
        Add(_pageBar, _left, Results, _keyLine, _tooSmall);
        ViewportChanged += (_, _) => FitToScreen();
        Wire();
        FreeWindowKeys(this);
        session.Assessed += ShowAssessment;
        Results.DetailRequested += ShowDetail;
        KeyDown += OnGlobalKey;
        ShowPage(1);
    }

    public IReadOnlyList<BenchPage> Pages { get; }

    /// <summary>The step removed last and where it stood, for Ctrl+Z on the list of steps (one level; another stone forgets it).</summary>
    private (int Index, StepText Step)? _removedStep;

    /// <summary>A new step half typed on the edit line when a stored step was opened to edit: it comes back once the edit is stored.</summary>
    private StepText? _newStepAside;

    /// <summary>Says in the identification panel that the catalogue is loading, or why it could not be loaded.</summary>
    public void ShowCatalogueState(string text, string? reason = null)
    {
        _session.Results.Waiting = text;
        _session.Results.WaitingReason = reason;
        Results.Refresh();
    }

    /// <summary>Hands over the catalogue loaded in the background: the browser gets it and the open stone is re-ranked.</summary>
    public void UseCatalogue(IReadOnlyList<Material> catalogue, BenchAssessor assessor)
    {
        _catalogue = catalogue;
        _session.Results.Waiting = null;
        _session.Results.WaitingReason = null;
        Results.Refresh();
        _session.UseAssessor(assessor);
    }

    /// <summary>
    /// A text field takes Ctrl+E as "end of line" (End does the same), a list Ctrl+N as "down" (the arrow does the
    /// same): let them reach the window as "export" and "new stone", whatever has the cursor.
    /// </summary>
    private void FreeWindowKeys(View view)
    {
        if (view is TextField field)
        {
            field.KeyBindings.Remove(Key.E.WithCtrl);
            // Ctrl+C stays the field's copy; seen first here (KeyDown comes before the bindings) to say what it did.
            field.KeyDown += (_, key) => { if (key == Key.C.WithCtrl) SayCopyKey(field.SelectedLength > 0); };
        }
        if (view is ListView list) list.KeyBindings.Remove(Key.N.WithCtrl);
        foreach (View sub in view.SubViews) FreeWindowKeys(sub);
    }

    /// <summary>Said on the key line when Ctrl+C is pressed (at most 79 characters): many terminal programs quit on it, this one copies.</summary>
    public static string CopyKeyLine(bool copied) =>
        (copied ? "Copied." : "Nothing selected to copy (Shift+arrows select).") + " Ctrl+Q quits; all is saved.";

    private void SayCopyKey(bool copied) => _keyLine.Text = CopyKeyLine(copied);

    public RefractometerPage Refractometer => (RefractometerPage)Pages[1];

    public GravityPage Gravity => (GravityPage)Pages[2];

    public TestsPage Tests => (TestsPage)Pages[3];

    public LoupePage Loupe => (LoupePage)Pages[LoupePageIndex];

    /// <summary>The loupe page's place; Ctrl+L opens it (L for loupe: the function keys next in line are taken or, F11, kept by many terminals for full screen).</summary>
    public const int LoupePageIndex = 4;

    public ResultsView Results { get; }

    public int CurrentPage { get; private set; }

    public string KeyLine => _keyLine.Text;

    private static IReadOnlyList<string> PageNames => BenchFields.PageNames;

    /// <summary>The other screens' keys, on the page bar beside the pages (F1 lists every key).</summary>
    internal const string OtherScreens = "F6 plot  F7 catalogue  F8 stones";

    /// <summary>The page bar: the pages, the current one in brackets, then the other screens' keys as far as they fit.</summary>
    internal static string PageBarText(int current, int columns)
    {
        string pages = string.Join(" ", PageNames.Select((n, i) => i == current ? $"[{n}]" : $" {n} "));
        foreach (string others in new[] { OtherScreens, OtherScreens.Replace("  ", " ", StringComparison.Ordinal) })
            if (pages.Trim().Length + 3 + others.Length <= columns) return pages.Trim() + " │ " + others;
        return pages;
    }

    /// <summary>The page whose name (with a column either side) is at column x of the page bar, or −1.</summary>
    private int PageAt(int x)
    {
        string bar = _pageBar.Text;
        for (int i = 0; i < PageNames.Count; i++)
        {
            int start = bar.IndexOf(PageNames[i], StringComparison.Ordinal);
            if (start >= 0 && x >= start - 1 && x <= start + PageNames[i].Length) return i;
        }
        return -1;
    }

    /// <summary>Shows a page with the cursor in its first reading field (never where it was left: readings would go astray).</summary>
    public void ShowPage(int index)
    {
        CurrentPage = index;
        for (int i = 0; i < Pages.Count; i++) Pages[i].Visible = i == index;
        _left.Title = Pages[index].Title;
        Pages[index].FocusFirst();
        ShowBars();
    }

    /// <summary>True while the screen is smaller than the bench's layout (the notice is shown instead).</summary>
    public bool TooSmall => _tooSmall.Visible;

    private void FitToScreen()
    {
        bool small = Viewport.Width < MinimumColumns || Viewport.Height < MinimumRows;
        _tooSmall.Text = small
            ? $"Window too small: the bench needs at least {MinimumColumns} x {MinimumRows} characters (this one is {Viewport.Width} x {Viewport.Height}).\nEnlarge the terminal; Ctrl+Q quits (everything is saved)."
            : "";
        if (small == _tooSmall.Visible)
        {
            if (!small) ShowBars();   // the key line fitted to the new width
            return;
        }
        _tooSmall.Visible = small;
        foreach (View v in new View[] { _pageBar, _left, Results, _keyLine }) v.Visible = !small;
        if (!small) ShowPage(CurrentPage);
    }

    private void ShowBars()
    {
        _pageBar.Text = PageBarText(CurrentPage, Math.Max(MinimumColumns, Viewport.Width));
        // The stone's reference heads its answer: the page bar's room goes to the screens beside the pages.
        string reference = _session.Form.Text(BenchFields.Reference).Trim();
        Results.Title = ResultsView.Name + " (F10)" + (reference.Length > 0 ? " for " + reference : "");
        _keyLine.Text = _session.SaveProblem ?? KeysNow();
    }

    /// <summary>The key line: the answer's keys while it has the cursor, a choice's keys in words while one has it, else the page's keys then the window's.</summary>
    private string KeysNow()
    {
        if (Results.HasFocus) return AnswerKeys;
        if (Pages[CurrentPage].Choices.FirstOrDefault(c => c.HasFocus) is { } choice) return choice.Choice.KeyWords;
        string keys = Pages[CurrentPage].KeysHere;
        int room = Math.Max(MinimumColumns, Viewport.Width) - 1;
        string full = $"{keys} │ {GlobalKeys}";
        if (full.Length <= room) return full;
        string line = keys + " │";
        foreach (string pair in ShortGlobalKeys)
        {
            if (line.Length + 1 + pair.Length > room) break;
            line += " " + pair;
        }
        return line;
    }

    /// <summary>The page and the view that had the cursor when F10 went to the answer.</summary>
    private (int Page, View? View) _leftAt = (-1, null);

    /// <summary>From the answer back to the form: to the field left there, else the page's first field.</summary>
    private void BackToTheForm()
    {
        if (_leftAt is (int page, { } view) && page == CurrentPage && view.Visible && view.CanFocus)
        {
            view.SetFocus();
            ShowBars();
        }
        else ShowPage(CurrentPage);
        _leftAt = (-1, null);
    }

    /// <summary>F10: the cursor to the answer (on the selected candidate, or the first), or back to the form.</summary>
    public void ToggleAnswer()
    {
        if (Results.HasFocus) { BackToTheForm(); return; }
        // The field left, to come back to: a look at the answer is no change of page.
        _leftAt = (CurrentPage, Pages[CurrentPage].MostFocused);
        Results.List.SetFocus();
        if (Results.Rows.Count > 0 && (Results.List.SelectedItem is not { } row || Results.Rows[Math.Min(row, Results.Rows.Count - 1)].Candidate is null))
            Results.SelectCandidate(0);
        ShowBars();
    }

    private void Wire()
    {
        foreach (BenchPage page in Pages)
        {
            foreach (FormField f in page.Fields)
                f.Edit.TextChanged += (_, _) =>
                {
                    if (_filling) return;
                    _session.Form.SetText(f.Field, f.Edit.Text);
                    _session.Changed();
                };
            foreach (ChoiceField c in page.Choices)
                c.Picked += picked => { _session.Form.Choose(picked.Choice.Field, picked.Word); _session.Changed(); };
        }
        Loupe.Marked += page =>
        {
            _session.Form.SetText(BenchFields.FeaturesPresent, page.Model.PresentText);
            _session.Form.SetText(BenchFields.FeaturesAbsent, page.Model.AbsentText);
            _session.Changed();
        };
        foreach (BenchPage page in Pages) page.KeyNotTaken += said => _keyLine.Text = said;
        RefractometerPage rf = Refractometer;
        rf.OfferFillsGap = () => _session.Form.NextRotationFillsGap;
        rf.StepField.Edit.TextChanged += (_, _) =>
        {
            if (!_filling) rf.OfferRotation(_session.Form.NextRotation());
        };
        rf.StoreRequested += (index, step) =>
        {
            if (step.Low.Length == 0)
            {
                _keyLine.Text = "Step not stored: the low edge is empty. Type the edges after the rotation (LOW HIGH), then Enter";
                return;
            }
            _session.Form.PutStep(index ?? _session.Form.Steps.Count, step);
            _session.Form.SetText(RefractometerPage.TypingStep, "");
            _session.Changed();
            rf.ShowSteps(_session.Form.Steps, _session.Results.Latest?.Errors ?? new Dictionary<string, string>());
            rf.ShowStep(index ?? _session.Form.Steps.Count - 1);   // the step just stored stays in sight (six rows at 80x24)
            rf.BeginStep(null, index is null ? null : _newStepAside, _session.Form.NextRotation());
            if (index is not null) _newStepAside = null;
        };
        foreach ((TextField box, string typingKey) in rf.TypingBoxes)
            box.TextChanged += (_, _) =>
            {
                if (_filling) return;
                _session.Form.SetText(typingKey, box.Text);
                _session.Changed();
            };
        rf.EditRequested += i =>
        {
            // A new step being typed is set aside, not overwritten, and comes back after the edit.
            if (_session.Form.Text(RefractometerPage.TypingStep).Length == 0 && (rf.Low.Text.Length > 0 || rf.High.Text.Length > 0))
                _newStepAside = new StepText(rf.Rotation.Text, rf.Low.Text, rf.High.Text);
            _session.Form.SetText(RefractometerPage.TypingStep, (i + 1).ToString(System.Globalization.CultureInfo.InvariantCulture));
            rf.BeginStep(i, _session.Form.Steps[i], _session.Form.NextRotation());
        };
        // A step removed or put back moves the numbers of the steps after it: an edit under way goes on as a new step
        // rather than into another one.
        void EditGoesOnAsNewStep()
        {
            if (_session.Form.Text(RefractometerPage.TypingStep).Length == 0) return;
            _session.Form.SetText(RefractometerPage.TypingStep, "");
            // The cursor stays where the examiner is (the list, after Del): Ctrl+Z there puts the step back.
            rf.BeginStep(null, new StepText(rf.Rotation.Text, rf.Low.Text, rf.High.Text), _session.Form.NextRotation(), focus: false);
        }
        rf.RemoveRequested += i =>
        {
            _removedStep = (i, _session.Form.Steps[i]);
            _session.Form.RemoveStep(i);
            EditGoesOnAsNewStep();
            _session.Changed();
            rf.ShowSteps(_session.Form.Steps, new Dictionary<string, string>());
            rf.OfferRotation(_session.Form.NextRotation());   // an offer not typed over follows the steps left ("0" when none)
        };
        rf.EditCancelled += i =>
        {
            _session.Form.SetText(RefractometerPage.TypingStep, "");
            rf.BeginStep(null, _newStepAside, _session.Form.NextRotation(), focus: false);   // a new step set aside comes back
            _newStepAside = null;
            _session.Changed();
            rf.Grid.SetFocus();
            rf.ShowStep(i);
        };
        rf.RestoreRequested += () =>
        {
            if (_removedStep is not { } removed) return;
            _removedStep = null;
            _session.Form.InsertStep(removed.Index, removed.Step);
            EditGoesOnAsNewStep();
            _session.Changed();
            rf.ShowSteps(_session.Form.Steps, _session.Results.Latest?.Errors ?? new Dictionary<string, string>());
            rf.ShowStep(Math.Min(removed.Index, _session.Form.Steps.Count - 1));
        };
        foreach (ChoiceField c in Pages.SelectMany(p => p.Choices)) c.HasFocusChanged += (_, _) => ShowBars();
        foreach (FormField f in Pages.SelectMany(p => p.Fields)) f.Edit.HasFocusChanged += (_, _) => ShowBars();
        Results.List.HasFocusChanged += (_, _) => ShowBars();
        Refractometer.Grid.HasFocusChanged += (_, _) => ShowBars();   // the step list's own keys on the key line
    }

    /// <summary>A page the examiner asked for (a key, a click): shown, and kept for the next start.</summary>
    private void GoToPage(int index)
    {
        ShowPage(index);
        _session.RememberPage(index);
    }

    /// <summary>Shows the page the last session ended on (the refractometer's when none, or not a page).</summary>
    public void ShowLastPage() => ShowPage(_session.LastPage is int page && page >= 0 && page < Pages.Count ? page : 1);

    /// <summary>Puts the model's texts into the fields (after a stone is opened), without echoing them back as edits.</summary>
    public void FillFromModel()
    {
        _removedStep = null;
        _filling = true;
        try
        {
            foreach (BenchPage page in Pages)
            {
                foreach (FormField f in page.Fields)
                {
                    f.Edit.Text = _session.Form.Text(f.Field);
                    f.Edit.InsertionPoint = 0;   // show a value's start (a number's leading digits, a note's first words)
                }
                foreach (ChoiceField c in page.Choices) c.Show(_session.Form.Choice(c.Choice.Field));
            }
            Loupe.Load(_session.Form.Text(BenchFields.FeaturesPresent), _session.Form.Text(BenchFields.FeaturesAbsent));
            Refractometer.ShowSteps(_session.Form.Steps, new Dictionary<string, string>());
            // A step typed but not stored (a closed terminal, another stone opened meanwhile) comes back on the edit line,
            // and an edit of a stored step comes back as that edit.
            int? editing = int.TryParse(_session.Form.Text(RefractometerPage.TypingStep), System.Globalization.NumberStyles.None,
                System.Globalization.CultureInfo.InvariantCulture, out int number) && number >= 1 && number <= _session.Form.Steps.Count ? number - 1 : null;
            Refractometer.BeginStep(editing, editing is { } e ? _session.Form.Steps[e] : null, _session.Form.NextRotation());
            foreach ((TextField box, string typingKey) in Refractometer.TypingBoxes)
                if (_session.Form.Text(typingKey) is { Length: > 0 } typed) box.Text = typed;
        }
        finally { _filling = false; }
        ShowPage(CurrentPage);
    }

    private void ShowAssessment()
    {
        BenchAssessment? a = _session.Results.Latest;
        string? transparency = GemIndex.Data.Workbook.StoneSheet.TransparencyWord(_session.Form.Text(BenchFields.Transparency));
        Tests.ShowTransparency(transparency);
        Loupe.ShowTransparency(transparency);
        if (a is null) return;
        IReadOnlyDictionary<string, string> errors = _session.Form.RotationStepProblem is { } step
            ? new Dictionary<string, string>(a.Errors) { [RefractometerPage.RotationStepField] = step } : a.Errors;
        foreach (BenchPage page in Pages) page.ShowErrors(errors);
        Refractometer.ShowSteps(_session.Form.Steps, a.Errors);
        // Inline and whole (no pop-up that would take the keys being typed): wrapped to the page's width.
        Gravity.Show(GravityText.Describe(_session.Form.Snapshot(), a.SpecificGravity), _session.Results.ImmersionCaution ?? "");
        Results.ShowNewAnswer();
        ShowBars();
    }

    private void ShowDetail(int index)
    {
        if (index >= _session.Results.Candidates.Count) return;
        TextScreen.Show(App!, "Candidate", CandidateDetail.Render(_session.Results.Candidates[index], index + 1, _session.Results.Latest?.Result));
    }

    private void OnGlobalKey(object? sender, Key key)
    {
        if (key == Key.F1) TextScreen.Show(App!, "Help", HelpText.Render());
        else if (key == Key.F2) GoToPage(0);
        else if (key == Key.F3) GoToPage(1);
        else if (key == Key.F4) GoToPage(2);
        else if (key == Key.F5) GoToPage(3);
        else if (key == Key.L.WithCtrl) GoToPage(LoupePageIndex);
        else if (key == Key.F6) EdgePlotView.Show(App!, new EdgePlotModel(_session.Results.Latest?.Readings.Refractometer?.Readings ?? [], _session.Results.Latest?.Readings.Refractometer?.LiquidLimit));
        else if (key == Key.R.WithCtrl) ScaleView.Show(App!, new ScaleModel(_session.Results.Latest));
        else if (key == Key.F7 && _catalogue.Count == 0) _keyLine.Text = "F7: " + (_session.Results.WaitingReason ?? _session.Results.Waiting ?? "the catalogue is empty");   // no pop-up to swallow the next keys
        else if (key == Key.F7) CatalogueBrowserView.Show(App!, new CatalogueBrowserModel(_catalogue));
        else if (key == Key.F8) ShowStones();
        else if (key == Key.F9) ShowDetail(Results.SelectedCandidate);
        else if (key == Key.F10) ToggleAnswer();
        else if (key == Key.Esc && Results.HasFocus) BackToTheForm();
        else if (key == Key.E.WithCtrl) Export();
        else if (key == Key.N.WithCtrl) NewStone();
        else if (key == Key.Q.WithCtrl) App!.RequestStop();
        else if (key == Key.C.WithCtrl) SayCopyKey(false);   // outside a text field there is nothing to copy
        else if (key == Key.Esc) { }                       // Esc quits the application by default: keep the bench open
        else return;
        key.Handled = true;
    }

    /// <summary>A new stone, opened at its reference with the suggested one selected, so that typing replaces it.</summary>
    private void NewStone()
    {
        _session.New();
        FillFromModel();
        GoToPage(0);
        Pages[0].Fields[0].Edit.SelectAll();
    }

    /// <summary>Writes the open stone's reports beside the workbook off the UI thread, then shows where they went (or why not).</summary>
    private void Export()
    {
        IApplication app = App!;
        BenchSnapshot snapshot = _session.Form.Snapshot();
        string workbook = _session.Workbook.Path;
        _keyLine.Text = "writing the reports…";
        _ = Task.Run(() =>
        {
            (string title, string text) = ExportNow(snapshot, workbook);
            app.Invoke(() =>
            {
                ShowBars();
                MessageBox.Query(app, title, text, "OK");
            });
        });
    }

    private (string Title, string Text) ExportNow(BenchSnapshot snapshot, string workbook) =>
        ExportNow(snapshot, workbook, _session.Assess(snapshot));

    private (string Title, string Text) ExportNow(BenchSnapshot snapshot, string workbook, BenchAssessment assessment) =>
        StoneExport.Write(workbook, snapshot, assessment, _session.HasCatalogue, () => _session.WithWorkbook(w => w.List()),
            DateOnly.FromDateTime(TimeProvider.System.GetLocalNow().Date),   // the report's date, read here at the edge
            RefusedInWords(assessment.Errors));

    /// <summary>Each refused entry in its page's words, with the page that holds it; one no page words, as the reader gives it.</summary>
    internal List<string> RefusedInWords(IReadOnlyDictionary<string, string> errors)
    {
        var worded = Pages.SelectMany(p => p.ReasonsInWords(errors)).ToList();
        var keys = worded.Select(w => w.Key).ToHashSet(StringComparer.Ordinal);
        return [.. worded.Concat(errors.Where(e => !keys.Contains(e.Key)).Select(e => (e.Key, e.Value))).Select(r => $"{r.Item2} ({BenchFields.PageOf(r.Item1)})")];
    }

    private void ShowStones()
    {
        var model = new StoneListModel(q => _session.WithWorkbook(w => w.List(q)), _session.Answer);
        using var view = new StoneListView(model, _session.Duplicate, id => _session.WithWorkbook(w => w.Delete(id)),
            id => _session.WithWorkbook(w => StoneHistoryText.Lines(w.Get(id)?.Reference ?? "", w.History(id))), action => App!.Invoke(action));
        App!.Run(view);
        if (view.WantsNew) NewStone();
        else if (view.Chosen is { } id) { _session.Open(id); FillFromModel(); }
        else if (_session.WithWorkbook(w => w.Get(_session.Form.StoneId)) is null) { _session.Start(); FillFromModel(); }  // the open stone was deleted
    }
}
