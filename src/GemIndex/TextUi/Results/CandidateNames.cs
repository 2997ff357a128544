namespace GemIndex.Cli.TextUi.Results;

/// <summary>
/// Candidate names fitted to a column: whole when they fit; otherwise cut at the end, or in the middle when cutting
/// the end would make two rows read the same ("flame-fusion…ruby", "flame-fusion…sapphire").
/// </summary>
internal static class CandidateNames
{
    public static IReadOnlyList<string> Fit(IReadOnlyList<string> names, int width)
    {
        List<string> ends = [.. names.Select(n => ResultText.Clip(n, width))];
        if (ends.Distinct(StringComparer.Ordinal).Count() == ends.Count) return ends;
        // The cut moves along the name until the rows differ (the longest start that keeps them apart wins).
        for (int head = width - 2; head >= 1; head--)
        {
            List<string> middles = [.. names.Select(n => Middle(n, width, head))];
            if (middles.Distinct(StringComparer.Ordinal).Count() == middles.Count) return middles;
        }
        return ends;   // too narrow to tell them apart: the ranks still do
    }

    /// <summary>The first <paramref name="head"/> characters and the end of a name with "…" between, <paramref name="width"/> in all.</summary>
    public static string Middle(string name, int width, int head)
    {
        if (name.Length <= width) return name;
        int tail = width - 1 - head;
        return name[..head] + "…" + name[^tail..];
    }
}
