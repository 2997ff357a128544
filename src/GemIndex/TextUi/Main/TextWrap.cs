namespace GemIndex.Cli.TextUi.Main;

/// <summary>
/// Word wrapping for the text screens. A continuation keeps the line's leading indent plus two spaces, or, for a
/// two-column line ("  F1      this help", "species   quartz"), lines up under the second column. A percentage stays
/// on the line of the word before it ("treated 14%") and an uncertainty with its value ("2.650 ± 0.010"), as long
/// as the line has another place to break.
/// </summary>
internal static class TextWrap
{
    public static IEnumerable<string> Lines(IEnumerable<string> lines, int width)
    {
        foreach (string raw in lines.SelectMany(l => l.Split('\n')))
        {
            string line = raw.TrimEnd();
            int lead = line.Length - line.TrimStart().Length;
            int column = SecondColumn(line, lead);
            string indent = new(' ', column > 0 && column <= width / 2 ? column : Math.Min(lead + 2, width / 2));
            while (line.Length > width)
            {
                int cut = Cut(line, width, indent.Length);
                yield return line[..cut].TrimEnd();
                line = indent + line[cut..].TrimStart();
            }
            yield return line;
        }
    }

    /// <summary>Where to break a line longer than <paramref name="width"/>: the last space that keeps the pairs above together, else the last space, else the width.</summary>
    private static int Cut(string line, int width, int indent)
    {
        int last = line.LastIndexOf(' ', width);
        for (int at = last; at > indent; at = line.LastIndexOf(' ', at - 1))
            if (Breakable(line, at)) return at;
        return last > indent ? last : width;
    }

    private static bool Breakable(string line, int space)
    {
        int end = line.IndexOf(' ', space + 1);
        string next = line[(space + 1)..(end < 0 ? line.Length : end)];
        string before = line[..space].TrimEnd();
        string previous = before[(before.LastIndexOf(' ') + 1)..];
        return !(IsPercentage(next) || next.StartsWith('±') || previous == "±");
    }

    private static bool IsPercentage(string token)
    {
        string t = token.TrimEnd(',', '.', ';', ':', ')').TrimStart('<', '>');
        return t.Length > 1 && t[^1] == '%' && t[..^1].All(c => char.IsAsciiDigit(c) || c == '.');
    }

    /// <summary>Where the text after the first gap of two or more spaces starts (past the indent), or 0 when there is none.</summary>
    private static int SecondColumn(string line, int lead)
    {
        int gap = line.IndexOf("  ", lead, StringComparison.Ordinal);
        if (gap < 0) return 0;
        int next = gap;
        while (next < line.Length && line[next] == ' ') next++;
        return next < line.Length ? next : 0;
    }
}
