using GemIndex.Core.Bench;
using GemIndex.Core.Gravity;
using GemIndex.Core.Identification;
using GemIndex.Core.Readings;
using GemIndex.Data.Batch;
using GemIndex.Data.Workbook;

namespace GemIndex.Cli.Reports;

/// <summary>
/// Everything a printed report of one identified stone says, worked out once from the stone sheet and its
/// identification; the formats (<see cref="MarkdownReport"/>, <see cref="HtmlReport"/>, <see cref="JsonReport"/>)
/// only lay it out. No calculation happens here beyond choosing what to show: the derived values come from Core.
/// </summary>
internal sealed record StoneReport
{
    /// <summary>What a candidate's fit means, in every front end that explains it.</summary>
    public const string FitMeaning = "1 = every reading typical of the entry, 0 = none";

    /// <summary>What the report says when nothing in the catalogue fits.</summary>
    public const string NoGoodMatchStatement =
        "No good match: no catalogue material fits these readings well. The stone may be something the catalogue does not hold, " +
        "or a reading may be wrong; the candidates below are the least unlikely, not an answer.";

    public required string Reference { get; init; }
    /// <summary>Weight in carats, when weighed.</summary>
    public double? WeightCarats { get; init; }
    /// <summary>The stone's description: reference, weight, dimensions, shape, cutting style, colour, transparency, notes.</summary>
    public required IReadOnlyList<ReportField> Description { get; init; }
    /// <summary>The readings as entered (numbers kept for the machine-readable format).</summary>
    public required StoneReadings Readings { get; init; }
    /// <summary>Every reading but the rotation series table, in words with units.</summary>
    public required IReadOnlyList<ReportField> ReadingFields { get; init; }
    /// <summary>Optic character from the series, or null when it does not fix one.</summary>
    public string? Character { get; init; }
    /// <summary>What the series alone says of the optic character (the section model's posterior), or null without a series.</summary>
    public OpticCharacterPosterior? CharacterOdds { get; init; }
    /// <summary>Why the character could not be fixed, or empty.</summary>
    public string UndeterminedReason { get; init; } = "";
    /// <summary>The rotation series' interpretations, heaviest first.</summary>
    public required IReadOnlyList<ReportInterpretation> Interpretations { get; init; }
    /// <summary>Likely misreadings in the series.</summary>
    public required IReadOnlyList<string> Misreadings { get; init; }
    /// <summary>The SG used in the ranking, with its standard uncertainty.</summary>
    public SpecificGravity? SpecificGravity { get; init; }
    /// <summary>How the SG was obtained ("given directly", "hydrostatic weighing").</summary>
    public string SpecificGravitySource { get; init; } = "";
    public required IReadOnlyList<ReportCandidate> Candidates { get; init; }
    public required double NotInCatalogue { get; init; }
    public required bool NoGoodMatch { get; init; }
    public NextTestAdvice? NextTest { get; init; }
    public required IReadOnlyList<string> Warnings { get; init; }
    /// <summary>Date, examiner, program and catalogue versions; null when the caller gives none.</summary>
    public ReportHeader? Header { get; init; }
    /// <summary>The identification itself (the JSON report embeds it as the result document).</summary>
    public required IdentificationResult Result { get; init; }
    public IReadOnlyList<string> Cautions => ReportCautions.All;

    /// <summary>Builds the report of one stone.</summary>
    public static StoneReport Build(StoneSheet sheet, IdentificationResult result, ReportHeader? header = null)
    {
        BenchSheet bench = BenchReader.Read(StoneReadingsConverter.ToReadings(sheet.Readings)).Sheet;
        RotationSeriesResult? series = result.Series;
        bool[] explained = LeadingCandidates.Explained(result.Candidates, BenchDefaults.ExplainedCandidates);
        return new StoneReport
        {
            Reference = sheet.Reference,
            WeightCarats = sheet.WeightCarats,
            Description = DescriptionOf(sheet),
            Readings = sheet.Readings,
            ReadingFields = ReportReadings.Fields(sheet.Readings),
            Character = series?.Character is { } c ? TextUi.Results.ResultText.Character(c) : null,   // the bench's words, as the text UI says it
            CharacterOdds = result.SeriesCharacter,
            UndeterminedReason = series?.UndeterminedReason ?? "",
            Interpretations = [.. (series?.Interpretations ?? []).OrderByDescending(i => i.Weight).Select(Interpretation)],
            Misreadings = series?.Misreadings ?? [],
            SpecificGravity = bench.SpecificGravity,
            SpecificGravitySource = sheet.Readings.Sg is not null ? "given directly" : sheet.Readings.SgWeighing is not null ? "hydrostatic weighing" : "",
            // The candidates every answer lists (LeadingCandidates.Listed); the rest stay in the JSON's result document.
            // Reasons for the explained candidates only, whoever worked out more (the text UI does for its detail view).
            Candidates = [.. LeadingCandidates.Listed(result).Select(i => (c: result.Candidates[i], i)).Select(x => new ReportCandidate(x.i + 1, x.c.Material.Name,
                x.c.Material.Species, Word(x.c.Material.Origin.ToString()), x.c.Confidence, x.c.Fit, explained[x.i] ? x.c.Reasons : []))],
            NotInCatalogue = result.NotInCatalogue,
            NoGoodMatch = result.NoGoodMatch,
            NextTest = result.NextTest,
            Warnings = result.Warnings,
            Result = result,
            Header = header,
        };
    }

    /// <summary>Dimensions as typed, with "mm" (the form's unit) added to bare numbers such as "8.1 x 6.2 x 4.0".</summary>
    private static string? InMillimetres(string? dimensions) =>
        dimensions is { Length: > 0 } d && System.Text.RegularExpressions.Regex.IsMatch(d.Trim(), @"^[\d.,]+(\s*[x×*]\s*[\d.,]+)*$") ? d.Trim() + " mm" : dimensions;

    private static List<ReportField> DescriptionOf(StoneSheet sheet) =>
    [
        new("reference", "Reference", Shown(sheet.Reference)),
        new("weight", "Weight", sheet.WeightCarats is { } ct ? ReportNumbers.Carats(ct) : NotRecorded),
        new("dimensions", "Dimensions", Shown(InMillimetres(sheet.Dimensions))),
        new("shape", "Shape", Shown(sheet.Shape)),
        new("cutting_style", "Cutting style", Shown(sheet.CuttingStyle)),
        new("colour", "Colour", Shown(sheet.Readings.Colour)),
        // The description's words when typed (the text UI reads the transparency from their first word), else the reading's
        // word (a readings file has no description): one line, never "not recorded" above a reading that says it.
        new("transparency", "Transparency", Shown(string.IsNullOrWhiteSpace(sheet.Transparency) ? sheet.Readings.Transparency : sheet.Transparency)),
        new("notes", "Notes", Shown(sheet.Notes)),
    ];

    /// <summary>The sign of a reading whose γ lies above the liquid, where the readings leave it open.</summary>
    public const string SignOpenWords = "open (γ above the liquid)";

    private static ReportInterpretation Interpretation(SeriesInterpretation i) => new(
        i.Character is { } c ? TextUi.Results.ResultText.Character(c) : ReportInterpretation.Undetermined, i.SignOpen ? SignOpenWords : Word(i.Sign.ToString()), i.Weight,
        i.Lowest.Value, i.Highest.Value, i.Beta?.Value, i.Birefringence.Value, i.Birefringence.StandardUncertainty, i.Description, i.AboveLiquidLimit);

    /// <summary>
    /// A step's high edge as the step tables show it: the index read; "not seen" where other steps read two edges (hidden
    /// above the liquid, or met by the low edge), with the liquid's limit when the series' highest index lies above it;
    /// "—" when no step read a second edge.
    /// </summary>
    public string HighEdgeCell(double? high)
    {
        if (high is { } h) return ReportNumbers.Index(h);
        if (Readings.Refractometer?.Readings.Any(r => r.High is not null) != true) return "—";
        return Interpretations.FirstOrDefault()?.AboveLiquidLimit is { } limit ? $"not seen (liquid {ReportNumbers.Index(limit)})" : "not seen";
    }

    /// <summary>What the candidate tables say under them of their order: species first, so a rank may hold less than the next.</summary>
    public const string CandidateOrder = "Ranked by species first (each species' total over the whole catalogue in brackets), then by entry within it.";

    /// <summary>A candidate's species with its total over the whole catalogue: "vesuvianite (12.3 %)".</summary>
    public string SpeciesWithTotal(string species) =>
        Result.Species.FirstOrDefault(x => x.Species == species) is { } total ? $"{species} ({ReportNumbers.Percent(total.Confidence)})" : species;

    /// <summary>Shown for a description field left empty.</summary>
    public const string NotRecorded = "not recorded";

    private static string Shown(string? text) => string.IsNullOrWhiteSpace(text) ? NotRecorded : text.Trim();

    /// <summary>An enum name or batch word as plain lower-case words: SinglyRefractive / singly_refractive → "singly refractive".</summary>
    public static string Word(string name) => string.Concat(name.Replace('_', ' ').Select((ch, i) =>
        i > 0 && char.IsUpper(ch) && name[i - 1] != ' ' ? " " + char.ToLowerInvariant(ch) : char.ToLowerInvariant(ch).ToString()));
}
