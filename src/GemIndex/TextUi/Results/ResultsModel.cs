using GemIndex.Cli.TextUi.Bench;
using GemIndex.Core.Identification;

namespace GemIndex.Cli.TextUi.Results;

/// <summary>The live identification panel: the lines to show for an assessment, and which candidate is selected for detail.</summary>
internal sealed class ResultsModel
{
    public const int NameWidth = 13;

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

    /// <summary>Shown instead of the headline while there is nothing to rank against ("loading catalogue…", or why it failed).</summary>
    public string? Waiting { get; set; }

    /// <summary>Why <see cref="Waiting"/> lasts (a catalogue that failed to load), shown in full above the details.</summary>
    public string? WaitingReason { get; set; }

    public string Headline => Waiting is { } w ? w
        : Latest?.Result is { } r ? ResultText.Headline(r)
        : Latest is null ? "working…" : "Enter readings: the candidates appear here.";

    public string CandidateHeader => ResultText.CandidateHeader(NameWidth);

    public IReadOnlyList<string> CandidateLines => [.. Candidates.Take(8).Select((c, i) => ResultText.Candidate(i + 1, c, NameWidth))];

    public IReadOnlyList<string> DetailLines => Latest is not { } a ? (WaitingReason is { } w ? [w] : []) :
    [
        .. WaitingReason is { } reason ? [reason] : Array.Empty<string>(),
        .. ResultText.Derived(a),
        .. a.Result is { } r ? ResultText.NextTest(r.NextTest) : [],
        .. (a.Result?.Warnings ?? []).Select(w => "! " + w),
    ];

    /// <summary>The caution to show before a weight in water is typed, or null when no top candidate forbids immersion.</summary>
    public string? ImmersionCaution => Latest?.DoNotImmerse is { Count: > 0 } names
        ? $"Do not immerse: {string.Join(", ", names)} {(names.Count == 1 ? "is" : "are")} among the top candidates. Water or heavy liquids can damage porous or soluble stones: skip the weighing in water and the heavy liquids, and rely on the other tests."
        : null;
}
