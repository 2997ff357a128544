using GemIndex.Cli.TextUi.Bench;
using GemIndex.Cli.TextUi.Results;
using GemIndex.Data.Workbook;

namespace GemIndex.Cli.TextUi.Main;

/// <summary>
/// Ties the form to the workbook and the identification: every change is saved (one transaction) and re-ranked off
/// the UI thread, and the result is handed back through <c>toUi</c>. All workbook access goes through one lock,
/// since a SQLite connection serves one thread at a time. No Terminal.Gui here.
/// </summary>
internal sealed class BenchSession(StoneWorkbook workbook, BenchAssessor assessor, Action<Action> toUi)
{
    private volatile BenchAssessor _assessor = assessor;

    public const string PrecisionSetting = "refractometer.precision";
    public const string CalibrationSetting = "refractometer.calibration_offset";
    public const string RotationStepSetting = RefractometerPage.RotationStepField;

    /// <summary>The bench page last shown, so that a restart (after a crash or a closed terminal) opens where the typing was.</summary>
    public const string PageSetting = "bench.page";

    private bool _started;

    /// <summary>The page shown when the session last ran (0 stone, 1 refractometer, …), or null.</summary>
    public int? LastPage { get; private set; }

    /// <summary>Keeps the page shown (after <see cref="Start"/>; nothing while the workbook is read-only).</summary>
    public void RememberPage(int page)
    {
        if (!_started || LastPage == page) return;
        LastPage = page;
        lock (_gate)
        {
            if (workbook.ReadOnlyReason is not null) return;
            try { Setting(PageSetting, page.ToString(System.Globalization.CultureInfo.InvariantCulture)); }
            catch (Exception e) when (e is WorkbookException or Microsoft.Data.Sqlite.SqliteException or IOException) { }   // a page is no reading: never worth a message
        }
    }

    /// <summary>The examiner named in every report exported from this workbook (a workbook is one examiner's bench book).</summary>
    public const string ExaminerSetting = BenchFields.Examiner;

    private readonly Lock _gate = new();
    // The form's version last saved for each stone, and the last version whose bench settings (examiner, rotation step,
    // instrument) were written: a save overtaken by a newer one, of its stone or of the bench, writes nothing stale.
    private readonly Dictionary<long, int> _lastSaved = [];
    private int _settingsVersion = -1;
    private Task _pending = Task.CompletedTask;

    // Each stone as this window last read it: a save writes only what changed since, and only where the workbook
    // still holds that value (another window's edit is reported as a conflict, never reverted).
    private readonly Dictionary<long, StoneSheet> _lastRead = [];

    public BenchModel Form { get; } = new();

    public ResultsModel Results { get; } = new();

    public StoneWorkbook Workbook => workbook;

    /// <summary>Raised on the UI thread after a newer assessment arrived.</summary>
    public event Action? Assessed;

    /// <summary>The last save failure, shown on the key line; null after a good save.</summary>
    public string? SaveProblem { get; private set; }

    /// <summary>Fields changed in another window that this window's last save left unwritten (both values); empty when none.</summary>
    public IReadOnlyList<FieldConflict> Conflicts { get; private set; } = [];

    /// <summary>Why the workbook is open for reading only (nothing typed is saved), or null.</summary>
    public string? ReadOnlyReason => workbook.ReadOnlyReason;

    /// <summary>Opens the most recently changed stone, or a new one when the workbook is empty.</summary>
    public void Start()
    {
        lock (_gate)
        {
            Form.SetText(RefractometerPage.RotationStepField, workbook.Setting(RotationStepSetting) ?? "");
            Form.SetText(BenchFields.Examiner, workbook.Setting(ExaminerSetting) ?? "");
            LastPage = int.TryParse(workbook.Setting(PageSetting), System.Globalization.NumberStyles.None, System.Globalization.CultureInfo.InvariantCulture, out int page) ? page : null;
            _started = true;
            StoneSummary? latest = workbook.List().FirstOrDefault();
            Load(latest is not null ? workbook.Get(latest.Id)! : workbook.IsReadOnly ? new StoneSheet() : NewStone());
        }
        Changed();
    }

    public void Open(long id)
    {
        lock (_gate) Load(workbook.Get(id) ?? throw new WorkbookException($"{workbook.Path}: no stone with id {id}"));
        Changed();
    }

    public void New()
    {
        lock (_gate) Load(NewStone());
        Changed();
    }

    /// <summary>The setting that holds a stone's form as typed.</summary>
    public static string DraftSetting(long id) => $"draft.{id}";

    private void Load(StoneSheet stone)
    {
        _lastRead[stone.Id] = stone;
        Form.Load(stone, today: [new(BenchFields.Precision, workbook.Setting(PrecisionSetting) ?? ""), new(BenchFields.CalibrationOffset, workbook.Setting(CalibrationSetting) ?? "")]);
        Form.ApplyDraft(workbook.Setting(DraftSetting(stone.Id)));
    }

    private StoneSheet NewStone() => workbook.Create(new StoneSheet { Reference = $"stone {workbook.List().Count + 1}" });

    /// <summary>Call after every change to the form (on the UI thread): saves and re-ranks in the background.</summary>
    public Task Changed()
    {
        BenchSnapshot snapshot = Form.Snapshot();
        Task task = Task.Run(() => Process(snapshot, save: true));
        _pending = Task.WhenAll(_pending, task);
        return task;
    }

    /// <summary>Assesses a snapshot with the current catalogue (any thread; the assessor keeps no state).</summary>
    public BenchAssessment Assess(BenchSnapshot snapshot) => _assessor.Assess(snapshot);

    /// <summary>
    /// A stored stone's answer in a few words, for the list of stones: empty if it is gone or has no readings, null while
    /// no catalogue is loaded (so that the list asks again later).
    /// </summary>
    public string? Answer(long id)
    {
        BenchAssessor assessor = _assessor;
        if (!assessor.HasCatalogue) return null;
        return WithWorkbook(w => w.Get(id)) is { } sheet ? assessor.Answer(sheet.Readings) : "";
    }

    /// <summary>True once a catalogue is in use (see <see cref="UseAssessor"/>).</summary>
    public bool HasCatalogue => _assessor.HasCatalogue;

    /// <summary>
    /// Swaps in the assessor with the catalogue (loaded in the background at start) and re-ranks the open stone (on the
    /// UI thread). Nothing is saved: the form did not change, and any result still coming from the old assessor is stale.
    /// </summary>
    public Task UseAssessor(BenchAssessor ready)
    {
        _assessor = ready;
        Form.Renew();
        BenchSnapshot snapshot = Form.Snapshot();
        Task task = Task.Run(() => Process(snapshot, save: false));
        _pending = Task.WhenAll(_pending, task);
        return task;
    }

    /// <summary>Waits for the background saves still running (at exit), at most five seconds or <paramref name="within"/>.</summary>
    public bool Flush(TimeSpan? within = null) => _pending.Wait(within ?? TimeSpan.FromSeconds(5));

    private void Process(BenchSnapshot snapshot, bool save)
    {
        BenchAssessment assessment = Assess(snapshot);
        var outcome = save ? Save(snapshot, assessment) : null;
        toUi(() =>
        {
            // Only the newest form's save outcome is shown: a save overtaken by a newer one, or one whose result arrives
            // after a newer one's, must not clear the newer save's conflict with its "no problem".
            if (outcome is { } o)
                lock (_shownGate)
                    if (o.Version > _shownVersion) (_shownVersion, SaveProblem, Conflicts) = (o.Version, o.Problem, o.Conflicts);
            if (Results.Accept(assessment)) Assessed?.Invoke();
        });
    }

    private readonly Lock _shownGate = new();
    private int _shownVersion = -1;

    /// <summary>Saves the snapshot, its outcome under the form's version (which only grows); null when a newer save of the stone went first (its outcome stands).</summary>
    private (int Version, string? Problem, IReadOnlyList<FieldConflict> Conflicts)? Save(BenchSnapshot snapshot, BenchAssessment assessment)
    {
        lock (_gate)
        {
            if (_lastSaved.TryGetValue(snapshot.StoneId, out int saved) && snapshot.Version <= saved) return null;  // overtaken by a newer save
            var (problem, conflicts) = Write(snapshot, assessment);
            return (snapshot.Version, problem, conflicts);
        }
    }

    private (string? Problem, IReadOnlyList<FieldConflict> Conflicts) Write(BenchSnapshot snapshot, BenchAssessment assessment)
    {
        if (workbook.ReadOnlyReason is { } why) return ($"READ-ONLY: {why}; nothing typed is saved", []);
        try
        {
            // The draft first: if the process dies between the two commits, the draft is the newer of the two.
            Setting(DraftSetting(snapshot.StoneId), BenchDraft.Write(snapshot));
            StoneSheet lastRead = _lastRead.GetValueOrDefault(snapshot.StoneId) ?? workbook.Get(snapshot.StoneId)
                ?? throw new WorkbookException($"{workbook.Path}: no stone with id {snapshot.StoneId} (deleted elsewhere?)");
            StoneSaveResult saved = workbook.Save(lastRead, BenchModel.ToStoneSheet(snapshot, assessment.Readings));
            _lastRead[snapshot.StoneId] = saved.NextLastRead;
            // The bench's settings from the newest form only: a late save of the stone left before (its start, say) must
            // not put back an examiner or a rotation step typed over since.
            if (snapshot.Version > _settingsVersion)
            {
                _settingsVersion = snapshot.Version;
                // The instrument of the day follows what the user sets, never what an opened stone was read with.
                if (snapshot.InstrumentChanged(BenchFields.Precision)) Setting(PrecisionSetting, snapshot.Text(BenchFields.Precision));
                if (snapshot.InstrumentChanged(BenchFields.CalibrationOffset)) Setting(CalibrationSetting, snapshot.Text(BenchFields.CalibrationOffset));
                Setting(RotationStepSetting, snapshot.Text(RefractometerPage.RotationStepField));
                Setting(ExaminerSetting, snapshot.Text(BenchFields.Examiner));
            }
            _lastSaved[snapshot.StoneId] = snapshot.Version;
            return saved.IsClean ? (null, []) : (ConflictText(saved.Conflicts), saved.Conflicts);
        }
        catch (Exception e) when (e is WorkbookException or Microsoft.Data.Sqlite.SqliteException or IOException)
        {
            return ("NOT SAVED: " + e.Message, []);
        }
    }

    /// <summary>The key line's words for fields another window changed meanwhile (until the text UI shows its dialog).</summary>
    public static string ConflictText(IReadOnlyList<FieldConflict> conflicts) =>
        "NOT SAVED, changed in another window: " + string.Join("; ", conflicts.Select(c => $"{c.Field} is '{c.Stored}' there, yours '{c.Yours}'"));

    private void Setting(string key, string value)
    {
        if ((workbook.Setting(key) ?? "") != value) workbook.SetSetting(key, value);
    }

    /// <summary>
    /// A copy of the stone as it was typed: the stored stone and its draft, so that entries the reader refuses (an SG typed
    /// beside a weighing) and the places typed (a weight of 1.230) come along; the copy's draft takes the copy's reference.
    /// Returns the copy's id.
    /// </summary>
    public long Duplicate(long id)
    {
        Flush();
        lock (_gate)
        {
            StoneSheet copy = workbook.Duplicate(id);
            if (workbook.Setting(DraftSetting(id)) is { } json && BenchDraft.Read(json) is { } draft)
                workbook.SetSetting(DraftSetting(copy.Id),
                    BenchDraft.Write(new BenchSnapshot(copy.Id, 0, draft.Texts.SetItem(BenchFields.Reference, copy.Reference), draft.Choices, draft.Steps)));
            return copy.Id;
        }
    }

    /// <summary>Runs <paramref name="action"/> on the workbook under the lock (for the stone list: duplicate, delete, search).</summary>
    public T WithWorkbook<T>(Func<StoneWorkbook, T> action)
    {
        lock (_gate) return action(workbook);
    }
}
