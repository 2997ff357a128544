using GemIndex.Core.Bench;
using GemIndex.Core.Identification;
using GemIndex.Core.Quantities;
using GemIndex.Data.Batch;

namespace GemIndex.Cli.TextUi.Bench;

/// <summary>
/// Reads a form snapshot through Core's one reader and ranks the candidates (<see cref="BenchIdentification"/>).
/// Every bad field is reported at that field and left out, so the rest still ranks. Thread-safe: it keeps no state
/// between calls.
/// </summary>
internal sealed class BenchAssessor(Identifier? identifier)
{
    /// <summary>
    /// What the text UI asks for: the bad fields are shown at their places and the rest is ranked; every listed
    /// candidate can be opened, so every one has its reasons.
    /// </summary>
    public static readonly BenchRequest Request = new() { RankDespiteErrors = true, ExplainTop = BenchDefaults.Candidates };

    /// <summary>False when built without a catalogue (nothing is ranked then).</summary>
    public bool HasCatalogue => identifier is not null;

    public BenchAssessment Assess(BenchSnapshot form)
    {
        BenchReadings readings = FormReader.Read(form);
        BenchOutcome outcome = identifier is null
            ? new BenchOutcome(BenchReader.Read(readings), null)
            : BenchIdentification.Identify(identifier, readings, Request);
        var errors = new Dictionary<string, string>();
        // A field with two faults (a step's low edge and its high edge) shows both, one after the other.
        foreach (BenchFieldError e in outcome.Reading.Errors)
            errors[e.Field] = errors.TryGetValue(e.Field, out string? first) ? first + " " + e.Sentence : e.Sentence;
        CheckWeight(form, errors);
        if (GemIndex.Cli.Reports.ReportHeader.ExaminerProblem(form.Text(BenchFields.Examiner)) is { } examiner) errors[BenchFields.Examiner] = examiner;
        IdentificationResult? result = outcome.Reading.HasReadings ? outcome.Result : null;
        return new BenchAssessment
        {
            Version = form.Version,
            Errors = errors,
            // What the answer was worked out on, never a refused entry's parseable part ("432" of "432 4b0"): the stone
            // list, the reports and the command line then give the answer the pane gives. The typed text stays in the draft.
            Readings = StoneReadingsConverter.FromReadings(readings.AsUsedBy(outcome.Reading), lenient: true),
            SpecificGravity = outcome.Reading.Sheet.SpecificGravity,
            Result = result,
            DoNotImmerse = result?.KeepDry ?? [],   // the same stones as the answer's "do not immerse" warning
        };
    }

    /// <summary>
    /// A stored stone's answer in a few words (<see cref="Results.ResultText.Short"/>) for the list of stones: ranked as the
    /// answer pane ranks it, without reasons or the next test; empty when it has no readings or no catalogue is in use.
    /// </summary>
    public string Answer(StoneReadings readings)
    {
        if (identifier is null) return "";
        BenchOutcome outcome = BenchIdentification.Identify(identifier, StoneReadingsConverter.ToReadings(readings),
            Request with { ExplainTop = 1, AdviseNextTest = false });
        return outcome.Reading.HasReadings && outcome.Result is { } result ? Results.ResultText.Short(result) : "";
    }

    /// <summary>The stone's weight is a description, not a reading; it is checked here as a mass.</summary>
    private static void CheckWeight(BenchSnapshot form, Dictionary<string, string> errors)
    {
        string text = form.Text(BenchFields.Weight);
        if (string.IsNullOrWhiteSpace(text)) return;
        // A mass's range (Mass.MaximumCarats), and above 0 as the hydrostatic weights on the command line: a stone weighs something.
        string allowed = $"allowed: above 0 to {Mass.MaximumCarats.ToString(System.Globalization.CultureInfo.InvariantCulture)} ct.";
        if (!BenchNumber.TryParse(text, out double carats, out string problem)) { errors[BenchFields.Weight] = $"{problem.TrimEnd('.')}; {allowed}"; return; }
        if (!(carats > 0 && carats <= Mass.MaximumCarats)) errors[BenchFields.Weight] = $"weight is {text.Trim()} ct; {allowed}";
    }
}
