namespace GemIndex.Cli.TextUi.Main;

/// <summary>
/// Word wrapping for the text screens. A continuation keeps the line's leading indent plus two spaces, or, for a
/// two-column line ("  F1      this help", "species   quartz"), lines up under the second column.
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
                int cut = line.LastIndexOf(' ', width);
                if (cut <= indent.Length) cut = width;
                yield return line[..cut].TrimEnd();
                line = indent + line[cut..].TrimStart();
            }
            yield return line;
        }
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
