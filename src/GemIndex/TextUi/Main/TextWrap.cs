namespace GemIndex.Cli.TextUi.Main;

/// <summary>Word wrapping for the text screens; a continuation keeps the line's leading indent plus two spaces.</summary>
internal static class TextWrap
{
    public static IEnumerable<string> Lines(IEnumerable<string> lines, int width)
    {
        foreach (string raw in lines.SelectMany(l => l.Split('\n')))
        {
            string line = raw.TrimEnd();
            string indent = new(' ', Math.Min(line.Length - line.TrimStart().Length + 2, width / 2));
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
}
