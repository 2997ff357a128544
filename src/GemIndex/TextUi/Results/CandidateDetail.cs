using GemIndex.Cli.TextUi.CatalogueBrowser;
using GemIndex.Core.Identification;

namespace GemIndex.Cli.TextUi.Results;

/// <summary>The text of the candidate detail screen: why the candidate ranks where it does, then its catalogue entry.</summary>
internal static class CandidateDetail
{
    public static string Render(RankedCandidate c, int rank) => string.Join('\n',
    [
        $"#{rank} {c.Material.Name}: confidence {ResultText.Percent(c.Confidence)} {ResultText.Bar(c.Confidence)}, fit {c.Fit.ToString("0.00", System.Globalization.CultureInfo.InvariantCulture)}",
        "",
        "WHY",
        .. c.Reasons.Count == 0 ? ["  (reasons are worked out for the top three candidates)"]
            : c.Reasons.Select(r => $"  {(r.Agrees ? "+" : "-")} {r.Text}"),
        "",
        "CATALOGUE ENTRY",
        CatalogueBrowserModel.Details(c.Material),
    ]);
}
