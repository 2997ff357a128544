using GemIndex.Cli.TextUi.Main;
using GemIndex.Cli.TextUi.Bench;
using GemIndex.Core.Identification;

namespace GemIndex.Cli.TextUi.Results;

/// <summary>
/// The live answer: the rows of the answer pane for an assessment at a given width, most important first (the
/// species, then the warning that matters most, then the candidates), so that the lead stays in view at 80x24.
/// </summary>
internal sealed class ResultsModel
{
    /// <summary>The heading over the candidates: the list is grouped by species (the species' order of the lead), best entry first within each.</summary>
    public const string CandidatesHeading = "Candidates by species (Enter: detail)";

    /// <summary>Below this width the confidence bar is left out so that the names keep their room.</summary>
    public const int WidthForBars = 50;

    public BenchAssessment? Latest { get; private set; }

    /// <summary>Takes a newer assessment; an older one (a slow background run overtaken by typing) is ignored.</summary>
    public bool Accept(BenchAssessment a)
    {
        if (Latest is not null && a.Version < Latest.Version) return false;
        Latest = a;
        return true;
    }

    public IReadOnlyList<RankedCandidate> Candidates => Latest?.Result?.Candidates ?? [];

    public bool NoGoodMatch => Latest?.Result?.NoGoodMatch ?? false;

    /// <summary>Shown instead of the answer while there is nothing to rank against ("loading catalogue…", or why it failed).</summary>
    public string? Waiting { get; set; }

    /// <summary>Why <see cref="Waiting"/> lasts (a catalogue that failed to load), shown in full.</summary>
    public string? WaitingReason { get; set; }

    /// <summary>Positions of the candidates the pane lists: those every front end lists (<see cref="LeadingCandidates.Listed(IdentificationResult)"/>).</summary>
    public IReadOnlyList<int> Listed => Latest?.Result is { } r ? LeadingCandidates.Listed(r) : [];

    /// <summary>The first row of the answer, unwrapped (the species and its total, or why there is none).</summary>
    public string Headline => Rows(int.MaxValue / 2)[0].Text;

    /// <summary>Every row of the answer pane, word-wrapped to <paramref name="width"/>.</summary>
    public IReadOnlyList<AnswerRow> Rows(int width)
    {
        width = Math.Max(20, width);
        var rows = new List<AnswerRow>();
        void Text(IEnumerable<string> lines)
        {
            foreach (string l in TextWrap.Lines(lines, width)) rows.Add(new AnswerRow(l));
        }
        if (Waiting is { } w)
        {
            Text([w, .. WaitingReason is { } reason ? [reason] : Array.Empty<string>()]);
            return rows;
        }
        if (Latest is not { } a) { Text(["working…"]); return rows; }
        if (a.Result is not { } r)
        {
            bool typed = a.Errors.Count > 0 || a.Readings.Refractometer is not null || a.Readings.Sg is not null || a.Readings.SgWeighing is not null
                || a.Readings.Polariscope is not null || a.Readings.Pleochroism is not null || a.Readings.Dispersion is not null;
            Text([typed ? "No usable reading yet: see the entries marked '!'." : "Type readings on F3 RI, F4 SG or F5 Tests: the answer appears here."]);
            return rows;
        }
        Text(ResultText.Lead(r));
        // A refused entry is left out of the answer: said at its top, so an answer is never read as using it.
        if (a.Errors.Count > 0) Text([RefusedLine([.. a.Errors.Keys])]);
        if (TopWarning(r) is { } top) Text(["! " + Short(top)]);
        rows.Add(new AnswerRow(""));
        rows.Add(new AnswerRow(CandidatesHeading));
        bool bars = width >= WidthForBars;
        IReadOnlyList<int> listed = Listed;   // each keeps its rank in the answer
        IReadOnlyList<RankedCandidate> shown = [.. listed.Select(i => Candidates[i])];
        // When the species-first order puts a larger share after a smaller one (a rival species after the leader's many
        // varieties), each species' entries go under its name and total, indented, so that the order reads as meant;
        // a list already in order of share needs no headings and keeps its rows for the readings below.
        bool grouped = LeadingCandidates.NeedsSpeciesHeadings(shown);
        string indent = grouped ? SpeciesIndent : "";
        int rankWidth = (listed.Count > 0 ? listed[^1] + 1 : 1).ToString(System.Globalization.CultureInfo.InvariantCulture).Length;   // "10" aligns with " 9"
        int nameWidth = width - 6 - rankWidth - indent.Length - (bars ? ResultText.BarWidth + 1 : 0);
        // A name too long for its column goes on under itself, whole (every row of it opens the candidate's detail).
        List<string>[] names = [.. shown.Select(c => TextWrap.Lines([c.Material.Name], nameWidth).ToList())];
        int used = Math.Min(nameWidth, names.Max(n => n[0].Length));
        for (int i = 0; i < shown.Count; i++)
        {
            if (grouped && (i == 0 || shown[i].Material.Species != shown[i - 1].Material.Species))
                foreach (string l in TextWrap.Lines([SpeciesHeading(r, shown[i].Material.Species)], width)) rows.Add(new AnswerRow(l, PassedOver: true));
            rows.Add(new AnswerRow(indent + ResultText.Candidate(listed[i] + 1, names[i][0], used, shown[i].Confidence, bars, rankWidth), listed[i]));
            foreach (string more in names[i].Skip(1)) rows.Add(new AnswerRow(indent + new string(' ', rankWidth + 1) + more, listed[i], PassedOver: true));
        }
        if (LeadingCandidates.UnlistedNote([.. listed.Select(i => i + 1)]) is { } unlisted) Text(["  " + unlisted]);
        Text([$"  not in the catalogue {ResultText.Percent(r.NotInCatalogue)}"]);
        IReadOnlyList<string> derived = ResultText.Derived(a);
        if (derived.Count > 0) { rows.Add(new AnswerRow("")); Text(["Readings used", .. derived.Select(d => "  " + d)]); }
        if (r.NextTest is not null) { rows.Add(new AnswerRow("")); Text(ResultText.NextTest(r.NextTest)); }
        if (r.Warnings.Count > 0)
        {
            rows.Add(new AnswerRow(""));
            Text(["Warnings", .. r.Warnings.Select(x => "! " + Sentence(x)), .. Reports.ReportCautions.ForWarnings(r.WarningTests, r.NextTest?.Test)]);
        }
        // The answer ends as every answer does: what it is and is not.
        rows.Add(new AnswerRow(""));
        Text([ScopeLine]);
        return rows;
    }

    /// <summary>The answer pane's last line, as the command line's and the reports' answers end.</summary>
    public const string ScopeLine = "An identification from bench tests is an aid, not a certificate.";

    /// <summary>The indent of a species' entries under its heading.</summary>
    public const string SpeciesIndent = "  ";

    /// <summary>A species' heading over its entries: its name and its total over the whole catalogue.</summary>
    public static string SpeciesHeading(IdentificationResult r, string species) =>
        r.SpeciesConfidence(species) is { } total ? $"{species} {ResultText.Percent(total)}" : species;

    /// <summary>The answer's line for entries refused and left out of it.</summary>
    public static string RefusedLine(IReadOnlyCollection<string> fields)
    {
        // Where to look: the pages that hold them, in the page bar's order.
        string pages = string.Join(", ", fields.Select(BenchFields.PageOf).Distinct().OrderBy(p => BenchFields.PageNames.ToList().IndexOf(p)));
        return fields.Count == 1 ? $"! 1 entry refused and not used: see the entry marked '!' on {pages}."
            : $"! {fields.Count} entries refused and not used: see the entries marked '!' on {pages}.";
    }

    /// <summary>The words of the engine's warning that a species' origins cannot be told apart (the lead says it in its own words).</summary>
    public const string CannotBeSeparated = "cannot be separated by these tests";

    /// <summary>
    /// The warning shown under the lead: a do-not-immerse caution first (it protects the stone), else the engine's
    /// first warning, leaving out what the lead already says (nothing fits; origins inseparable).
    /// </summary>
    public static string? TopWarning(IdentificationResult r)
    {
        IEnumerable<string> open = r.Warnings.Skip(r.NoGoodMatch ? 1 : 0).Where(w => !w.Contains(CannotBeSeparated, StringComparison.Ordinal));
        return open.FirstOrDefault(w => w.Contains("do not immerse", StringComparison.Ordinal)) ?? open.FirstOrDefault();
    }

    /// <summary>A warning's first part, before the catalogue's notes (" — "), which the Warnings list below gives in full.</summary>
    public static string Short(string warning) => warning.IndexOf(" — ", StringComparison.Ordinal) is var at and > 0
        ? warning[..at] + (warning.Length > at ? "; more under Warnings." : "")
        : Sentence(warning);

    /// <summary>One full stop at the end (a note that ends in one and the sentence's own make "..").</summary>
    public static string Sentence(string text) => text.EndsWith("..", StringComparison.Ordinal) && !text.EndsWith("...", StringComparison.Ordinal) ? text[..^1] : text;

    /// <summary>The caution shown on the SG page, or null when no top candidate forbids immersion.</summary>
    public string? ImmersionCaution => Latest?.DoNotImmerse is { Count: > 0 } names
        ? $"Do not immerse: {BenchWarnings.KeepDryListed(names)} {(names.Count == 1 ? "is" : "are")} possible here. No heavy liquids, and no water unless the stone is known to take it (amber and copal take the brine test; a porous or soluble stone is harmed): rely on the other tests."
        : null;
}
