using System.Collections.Immutable;
using System.Globalization;
using GemIndex.Core.Identification;
using GemIndex.Data.Batch;
using GemIndex.Data.Workbook;

namespace GemIndex.Cli.TextUi.Bench;

/// <summary>
/// The stone being worked on, exactly as typed: every field keeps its text even when it does not parse, so nothing
/// typed is lost. Changes bump <see cref="Version"/>; <see cref="Snapshot"/> hands an immutable copy to the
/// assessor and the workbook. No Terminal.Gui here.
/// </summary>
internal sealed class BenchModel
{
    /// <summary>Rotation step suggested between readings until the user sets one, degrees (common practice: 10°–30° steps over 180°).</summary>
    public const double RotationStepDegrees = 15;

    /// <summary>The texts that belong to the bench rather than the stone: kept when another stone opens.</summary>
    private static readonly string[] BenchSettings = [RefractometerPage.RotationStepField, BenchFields.Examiner];

    /// <summary>
    /// The refractometer as used: a stone read on it keeps the precision and calibration offset it was read with (its
    /// indices depend on them); a stone not yet read takes the instrument of the day.
    /// </summary>
    public static readonly IReadOnlyList<string> InstrumentFields = [BenchFields.Precision, BenchFields.CalibrationOffset];

    private ImmutableDictionary<string, string> _instrumentAsLoaded = ImmutableDictionary<string, string>.Empty;

    private ImmutableDictionary<string, string> _texts = ImmutableDictionary<string, string>.Empty;
    private ImmutableDictionary<string, string> _choices = ImmutableDictionary<string, string>.Empty;
    private ImmutableList<StepText> _steps = [];
    private DateTimeOffset _created;

    public long StoneId { get; private set; }

    public int Version { get; private set; }

    public IReadOnlyList<StepText> Steps => _steps;

    public string Text(string field) => _texts.GetValueOrDefault(field, "");

    public string? Choice(string field) => _choices.GetValueOrDefault(field);

    public void SetText(string field, string text)
    {
        if (Text(field) == text) return;
        _texts = _texts.SetItem(field, text);
        Version++;
    }

    public void Choose(string field, string? word)
    {
        if (Choice(field) == word) return;
        _choices = word is null ? _choices.Remove(field) : _choices.SetItem(field, word);
        Version++;
    }

    /// <summary>Replaces step <paramref name="index"/>, or adds one when index is the count.</summary>
    public void PutStep(int index, StepText step)
    {
        _steps = index == _steps.Count ? _steps.Add(step) : _steps.SetItem(index, step);
        Version++;
    }

    public void RemoveStep(int index)
    {
        _steps = _steps.RemoveAt(index);
        Version++;
    }

    /// <summary>Puts a removed step back at <paramref name="index"/> (Ctrl+Z on the list of steps).</summary>
    public void InsertStep(int index, StepText step)
    {
        _steps = _steps.Insert(Math.Clamp(index, 0, _steps.Count), step);
        Version++;
    }

    /// <summary>The rotation between steps as set on the RI page (a number from 1° to 180°), else <see cref="RotationStepDegrees"/>.</summary>
    public double RotationStep =>
        double.TryParse(Text(RefractometerPage.RotationStepField), NumberStyles.Float, CultureInfo.InvariantCulture, out double step) && step is >= 1 and <= 180
            ? step : RotationStepDegrees;

    /// <summary>Why the rotation step typed cannot be used (the default is used meanwhile), or null.</summary>
    public string? RotationStepProblem
    {
        get
        {
            string text = Text(RefractometerPage.RotationStepField);
            if (string.IsNullOrWhiteSpace(text)) return null;
            if (!GemIndex.Core.Quantities.BenchNumber.TryParse(text, out double step, out string error)) return error;
            return step is >= 1 and <= 180 ? null : $"rotation step {text.Trim()}° is outside 1° to 180°";
        }
    }

    /// <summary>
    /// The rotation to offer for the next step: 0, then the last rotation plus <see cref="RotationStep"/>, round a half
    /// turn (the edges repeat every 180°, so 180° would read 0° again); once that rotation has been read, the middle of
    /// the widest gap left between the rotations read, which makes the series denser where it is thinnest.
    /// </summary>
    public string NextRotation() => NextRotationOffer().Rotation;

    /// <summary>
    /// Whether the rotation offered next fills a gap of a half turn already read round, rather than going on by the
    /// rotation step (the edit line says so: a reading meant for 180° had gone in at 15° unremarked).
    /// </summary>
    public bool NextRotationFillsGap => NextRotationOffer().FillsGap;

    private (string Rotation, bool FillsGap) NextRotationOffer()
    {
        if (_steps.Count == 0) return ("0", false);
        if (!double.TryParse(_steps[^1].Rotation, NumberStyles.Float, CultureInfo.InvariantCulture, out double last)) return ("", false);
        double next = ((last + RotationStep) % 180 + 180) % 180;
        var read = _steps.Select(st => double.TryParse(st.Rotation, NumberStyles.Float, CultureInfo.InvariantCulture, out double r) ? ((r % 180) + 180) % 180 : double.NaN)
            .Where(r => !double.IsNaN(r)).Distinct().Order().ToList();
        bool fillsGap = false;
        if (read.Any(r => Math.Abs(r - next) < 0.01 || Math.Abs(r - next) > 179.99))
        {
            fillsGap = true;
            // The widest gap, the one across 180° included: its middle, on the half turn.
            var gaps = read.Select((r, i) => (Start: r, Width: (i + 1 < read.Count ? read[i + 1] : read[0] + 180) - r)).ToList();
            var widest = gaps.MaxBy(g => g.Width);
            next = (widest.Start + widest.Width / 2) % 180;
        }
        return (next.ToString("0.##", CultureInfo.InvariantCulture), fillsGap);
    }

    /// <summary>Bumps <see cref="Version"/> without an edit, so that results worked out before (with an older catalogue) count as stale.</summary>
    public void Renew() => Version++;

    public BenchSnapshot Snapshot() => new(StoneId, Version, _texts, _choices, _steps) { InstrumentAsLoaded = _instrumentAsLoaded };

    /// <summary>
    /// Fills the form from a stored stone. The bench settings (rotation step, examiner) are kept; the precision and
    /// calibration offset are the stone's own when it was read on the refractometer, else <paramref name="today"/>'s
    /// (the instrument of the day; without it, those the form holds). Opening a stone never changes its readings.
    /// </summary>
    public void Load(StoneSheet stone, IEnumerable<KeyValuePair<string, string>>? today = null)
    {
        StoneId = stone.Id;
        _created = stone.Created;
        bool read = stone.Readings.Refractometer is not null;
        var instrument = read ? [] : (today ?? _texts).Where(p => InstrumentFields.Contains(p.Key)).ToList();
        var keep = _texts.Where(p => BenchSettings.Contains(p.Key)).Concat(instrument);
        _texts = ImmutableDictionary.CreateRange(keep.Concat(StoneFormText.From(stone)).Where(p => p.Value.Length > 0));
        _instrumentAsLoaded = ImmutableDictionary.CreateRange(_texts.Where(p => InstrumentFields.Contains(p.Key)));
        _choices = ImmutableDictionary.CreateRange(StoneFormText.Choices(stone.Readings));
        _steps = [.. (stone.Readings.Refractometer?.Readings ?? []).Select(s =>
            new StepText(StoneFormText.Number(s.RotationDeg), StoneFormText.Index(s.Low), s.High is { } h ? StoneFormText.Index(h) : ""))];
        Version++;
    }

    /// <summary>Puts back the texts of a saved draft (see <see cref="BenchDraft"/>) over a loaded stone.</summary>
    public bool ApplyDraft(string? json)
    {
        if (json is null || BenchDraft.Read(json) is not { } draft) return false;
        // A draft with nothing read on the refractometer keeps the instrument of the day the stone opened with.
        bool read = draft.Steps.Count > 0 || draft.Texts.ContainsKey(BenchFields.Spot) || draft.Choices.ContainsKey(BenchFields.OverLimit);
        var bench = _texts.Where(p => BenchSettings.Contains(p.Key) || (!read && InstrumentFields.Contains(p.Key)));
        _texts = draft.Texts.RemoveRange(BenchSettings).RemoveRange(read ? [] : InstrumentFields).SetItems(bench);
        _choices = draft.Choices;
        _steps = draft.Steps;
        Version++;
        return true;
    }

    /// <summary>The stone to store: the description as typed and the readings that parse (the rest stay in the form).</summary>
    public static StoneSheet ToStoneSheet(BenchSnapshot s, StoneReadings readings) => new()
    {
        Id = s.StoneId,
        Reference = s.Text(BenchFields.Reference).Trim(),
        WeightCarats = StoneFormText.TryNumber(s.Text(BenchFields.Weight)),
        Dimensions = s.Text(BenchFields.Dimensions),
        Shape = s.Text(BenchFields.Shape),
        CuttingStyle = s.Text(BenchFields.CuttingStyle),
        Transparency = s.Text(BenchFields.Transparency),
        Notes = s.Text(BenchFields.Notes),
        Readings = readings,
    };

    /// <summary>Applies the bench settings that the batch format does not hold (precision, calibration offset) to a converted sheet.</summary>
    public static BenchSheet WithInstrument(BenchSheet sheet, double? precision, double offset) =>
        sheet.Refractometer is not { } r ? sheet : sheet with
        {
            Refractometer = new RefractometerObservation(r.Method, r.Steps, r.Spot, r.OverLimit, r.LightNanometres, r.LiquidLimit, precision, offset),
        };
}
