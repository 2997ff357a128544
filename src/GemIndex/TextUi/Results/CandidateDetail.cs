using System.Globalization;
using GemIndex.Cli.TextUi.CatalogueBrowser;
using GemIndex.Core.Identification;

namespace GemIndex.Cli.TextUi.Results;

/// <summary>
/// The candidate detail screen: why the candidate ranks where it does, in words with the numbers behind them (which
/// the answer pane leaves out), then its catalogue entry.
/// </summary>
internal static class CandidateDetail
{
    public static string Render(RankedCandidate c, int rank, IdentificationResult? result = null) => string.Join('\n',
    [
        $"{rank}. {c.Material.Name} ({c.Material.Species}, {ResultText.Origin(c.Material.Origin)})",
        $"  probability {ResultText.Percent(c.Confidence)} {ResultText.Bar(c.Confidence)}",
        $"  fit with the catalogue entry {Fixed(c.Fit, "0.00")} ({GemIndex.Cli.Reports.StoneReport.FitMeaning})",
        "",
        "WHY (weight of evidence in bits: + for this material, − against, 1 bit = twice as likely)",
        .. c.Reasons.Count == 0 ? ["  (reasons are worked out for the leading candidates only)"]
            : c.Reasons.Select(r => $"  {GemIndex.Cli.Reports.ReportDerived.Verdict(r)}: {r.Text} [{Signed(r.WeightBits)} bits]"),
        .. c.Reasons.Any(r => r.Text.Contains('σ')) ? ["  (8σ: eight standard uncertainties of the reading outside the range)"] : Array.Empty<string>(),
        .. result?.NextTest is { } n ? ["", $"NEXT TEST: {n.Description}: expected gain {Fixed(n.GainBits, "0.00")} bits (how strongly it would separate the leading candidates)"] : Array.Empty<string>(),
        "",
        "CATALOGUE ENTRY",
        CatalogueBrowserModel.Details(c.Material),
    ]);

    private static string Fixed(double v, string format) => v.ToString(format, CultureInfo.InvariantCulture);

    private static string Signed(double bits) => (bits >= 0 ? "+" : "−") + Math.Abs(bits).ToString("0.00", CultureInfo.InvariantCulture);
}
