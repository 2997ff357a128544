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

    private readonly Lock _gate = new();
    private (long Id, int Version) _lastSaved = (0, -1);
    private Task _pending = Task.CompletedTask;

    public BenchModel Form { get; } = new();

    public ResultsModel Results { get; } = new();

    public StoneWorkbook Workbook => workbook;

    /// <summary>Raised on the UI thread after a newer assessment arrived.</summary>
    public event Action? Assessed;

    /// <summary>The last save failure, shown on the key line; null after a good save.</summary>
    public string? SaveProblem { get; private set; }

    /// <summary>Opens the most recently changed stone, or a new one when the workbook is empty.</summary>
    public void Start()
    {
        lock (_gate)
        {
            Form.SetText(BenchFields.Precision, workbook.Setting(PrecisionSetting) ?? "");
            Form.SetText(BenchFields.CalibrationOffset, workbook.Setting(CalibrationSetting) ?? "");
            Form.SetText(RefractometerPage.RotationStepField, workbook.Setting(RotationStepSetting) ?? "");
            StoneSummary? latest = workbook.List().FirstOrDefault();
            Load(latest is null ? NewStone() : workbook.Get(latest.Id)!);
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
        Form.Load(stone);
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

    /// <summary>Waits for the background saves still running (at exit), at most five seconds.</summary>
    public bool Flush() => _pending.Wait(TimeSpan.FromSeconds(5));

    private void Process(BenchSnapshot snapshot, bool save)
    {
        BenchAssessment assessment = Assess(snapshot);
        string? problem = save ? Save(snapshot, assessment) : SaveProblem;
        toUi(() =>
        {
            if (save) SaveProblem = problem;
            if (Results.Accept(assessment)) Assessed?.Invoke();
        });
    }

    private string? Save(BenchSnapshot snapshot, BenchAssessment assessment)
    {
        lock (_gate)
        {
            if (snapshot.StoneId == _lastSaved.Id && snapshot.Version <= _lastSaved.Version) return null;  // overtaken by a newer save
            try
            {
                // The draft first: if the process dies between the two commits, the draft is the newer of the two.
                Setting(DraftSetting(snapshot.StoneId), BenchDraft.Write(snapshot));
                workbook.Save(BenchModel.ToStoneSheet(snapshot, assessment.Readings));
                Setting(PrecisionSetting, snapshot.Text(BenchFields.Precision));
                Setting(CalibrationSetting, snapshot.Text(BenchFields.CalibrationOffset));
                Setting(RotationStepSetting, snapshot.Text(RefractometerPage.RotationStepField));
                _lastSaved = (snapshot.StoneId, snapshot.Version);
                return null;
            }
            catch (Exception e) when (e is WorkbookException or Microsoft.Data.Sqlite.SqliteException or IOException)
            {
                return "NOT SAVED: " + e.Message;
            }
        }
    }

    private void Setting(string key, string value)
    {
        if ((workbook.Setting(key) ?? "") != value) workbook.SetSetting(key, value);
    }

    /// <summary>Runs <paramref name="action"/> on the workbook under the lock (for the stone list: duplicate, delete, search).</summary>
    public T WithWorkbook<T>(Func<StoneWorkbook, T> action)
    {
        lock (_gate) return action(workbook);
    }
}
