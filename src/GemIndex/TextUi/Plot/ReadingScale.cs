using System.Globalization;
using System.Text;
using GemIndex.Core.Catalogue;
using GemIndex.Cli.TextUi.Results;

namespace GemIndex.Cli.TextUi.Plot;

/// <summary>
/// One measured quantity drawn as a horizontal character scale against the candidates' ranges: the reading's row shows
/// the value as '*' with its ± standard uncertainty as '&lt;---&gt;', each candidate's row shows its range as '=' on a '.'
/// track with the value's '*' on top ('#' where it falls on the bar), and a word says whether the reading falls in the range. Shapes only, no colour.
/// Where a candidate's range has a usual part (an SG range with <c>sg_usual</c>), the usual part is the '=' bar and the
/// rest of the range, its rare extremes, is drawn '-'; a reading there is "rare", as the ranking weighs it (docs/ranking.md §2).
/// </summary>
/// <param name="title">What is measured, e.g. "lowest index".</param>
/// <param name="format">Number format of the axis labels and the reading.</param>
/// <param name="widest">The widest window shown; wider ranges are cut at the edges and marked '&lt;' or '&gt;'.</param>
/// <param name="ranks">Each candidate's rank in the answer (null: 1, 2, 3 … in the order given).</param>
/// <param name="usual">Each candidate's usual part of its range, or null (null: none has one).</param>
internal sealed class ReadingScale(string title, string format, double value, double uncertainty, double widest,
    IReadOnlyList<(string Name, PropertyRange? Range)> candidates, IReadOnlyList<int>? ranks = null,
    IReadOnlyList<PropertyRange?>? usual = null)
{
    public const char Track = '.';
    public const char Bar = '=';
    /// <summary>The rare extremes of a range that has a usual part.</summary>
    public const char RareBar = '-';
    public const char Marker = '*';
    /// <summary>The marker where it falls on a candidate's bar (so a bar one cell wide does not vanish under it).</summary>
    public const char MarkerOnBar = '#';
    /// <summary>Room for a rank and a name; a longer name is cut so that no two rows read the same (<see cref="CandidateNames"/>).</summary>
    public const int NameWidth = 24;

    /// <summary>On a wide screen (100 columns or more) the names get a third of it, up to this, so that they are not cut while the tracks have room to spare.</summary>
    public const int WidestNameWidth = 40;

    /// <summary>The room for a rank and a name at this width.</summary>
    public static int NameWidthFor(int width) => width >= 100 ? Math.Clamp(width / 3, NameWidth, WidestNameWidth) : NameWidth;
    public const int VerdictWidth = 5;
    public const int NarrowestTrack = 12;

    /// <summary>Said when the range holds the value.</summary>
    public const string In = "in";
    /// <summary>Said when the range holds the value only among its rare extremes, outside its usual part.</summary>
    public const string Rare = "rare";
    /// <summary>Said when the range misses the value but comes within two standard uncertainties of it.</summary>
    public const string Near = "near";
    /// <summary>Said when the range is further away.</summary>
    public const string Out = "out";

    public string Title => title;
    public double Value => value;
    public IReadOnlyList<(string Name, PropertyRange? Range)> Candidates => candidates;

    /// <summary>The usual part of the candidate's range at this row, if it has one.</summary>
    public PropertyRange? UsualPart(int row) => usual is not null && row < usual.Count ? usual[row] : null;

    /// <summary>Whether any candidate's range has a usual part (the legend then explains the rare extremes).</summary>
    public bool HasUsualParts => usual is not null && usual.Any(u => u is not null);

    /// <summary>The answer's rank of the candidate at this row.</summary>
    public int Rank(int row) => ranks is not null && row < ranks.Count ? ranks[row] : row + 1;

    /// <summary>
    /// How far a value may lie outside a range and still count as in it: rounding noise of the arithmetic only (a
    /// birefringence 1.553 − 1.544 comes out as 0.009000000000000008), far below any reading's precision.
    /// </summary>
    public const double Noise = 1e-9;

    /// <summary>
    /// The value as the scale prints it (rounded to the format's decimals): the verdict is on the number the user reads,
    /// so a reading shown as 0.009 is "in" a range 0.009–0.009 (a fitted birefringence of 0.0092 was called "near").
    /// </summary>
    private double Shown => Math.Round(value, format.Contains('.') ? format.Length - format.IndexOf('.') - 1 : 0, MidpointRounding.AwayFromZero);

    /// <summary>In, rare, near or out (see the constants); "-" when the candidate has no range for this quantity.</summary>
    /// <remarks>"Rare" by the reasons' own rule (<see cref="GemIndex.Core.Identification.UsualPart.AmongRareExtremes"/>): a
    /// reading within its uncertainty of the usual part is no rare extreme.</remarks>
    public string Verdict(PropertyRange? range, PropertyRange? usualPart = null) => range is not { } r ? "-"
        : Shown >= r.Minimum - Noise && Shown <= r.Maximum + Noise
            ? GemIndex.Core.Identification.UsualPart.AmongRareExtremes(value, uncertainty, r, usualPart) ? Rare : In
        : value + 2 * uncertainty >= r.Minimum && value - 2 * uncertainty <= r.Maximum ? Near
        : Out;

    /// <summary>An uncertainty with a decimal more (two at most) where the value's format would round it to 0: "± 0.004", not "± 0.00".</summary>
    public static string Uncertainty(double u, string format)
    {
        string f = format;
        for (int more = 0; more < 2 && u > 0 && double.Parse(u.ToString(f, CultureInfo.InvariantCulture), CultureInfo.InvariantCulture) == 0; more++) f += "0";
        return u.ToString(f, CultureInfo.InvariantCulture);
    }

    /// <summary>The window shown: every range and the reading ± 2u, with a small margin, at most <c>widest</c> wide around the value.</summary>
    public (double Low, double High) Window()
    {
        double low = value - 2 * uncertainty, high = value + 2 * uncertainty;
        foreach ((_, PropertyRange? r) in candidates)
            if (r is { } range) { low = Math.Min(low, range.Minimum); high = Math.Max(high, range.Maximum); }
        double margin = Math.Max((high - low) * 0.05, widest / 200);
        (low, high) = (Math.Max(0, low - margin), high + margin);   // an index, a birefringence or an SG is never negative
        if (high - low > widest)
        {
            double left = Math.Clamp(value - widest / 2, low, high - widest);
            (low, high) = (left, left + widest);
        }
        return (low, high);
    }

    /// <summary>The lines of this scale for <paramref name="width"/> columns: title with the axis labels, the reading (value ± u), one row per candidate.</summary>
    public IReadOnlyList<string> Render(int width)
    {
        int nameWidth = NameWidthFor(width);
        int track = Math.Max(NarrowestTrack, width - nameWidth - VerdictWidth);
        (double low, double high) = Window();
        // Rounded to 9 places first, so that rounding noise cannot put a value and an equal range end in neighbouring columns.
        int Column(double x) => (int)Math.Round(Math.Round((x - low) / (high - low) * (track - 1), 9), MidpointRounding.AwayFromZero);
        string Number(double x) => x.ToString(format, CultureInfo.InvariantCulture);

        var lines = new List<string> { ResultText.Clip(title, nameWidth - 1).PadRight(nameWidth) + Axis(track, Number(low), Number((low + high) / 2), Number(high)) };
        var reading = new StringBuilder(new string(' ', track));
        int from = Math.Max(0, Column(value - uncertainty)), to = Math.Min(track - 1, Column(value + uncertainty));
        for (int c = from; c <= to; c++) reading[c] = '-';
        if (to > from) { reading[from] = '<'; reading[to] = '>'; }
        int at = Column(value);
        if (at >= 0 && at < track) reading[at] = Marker;
        lines.Add(ResultText.Clip($"{Number(value)} ± {Uncertainty(uncertainty, format)}", nameWidth - 1).PadRight(nameWidth) + reading);
        int rankWidth = candidates.Count == 0 ? 1 : Enumerable.Range(0, candidates.Count).Max(i => Rank(i).ToString(CultureInfo.InvariantCulture).Length);   // "10" aligns with " 8"
        IReadOnlyList<string> names = CandidateNames.Fit([.. candidates.Select(c => c.Name)], nameWidth - 2 - rankWidth);
        for (int i = 0; i < candidates.Count; i++)
        {
            (_, PropertyRange? range) = candidates[i];
            string name = names[i];
            var row = new StringBuilder(new string(Track, track));
            if (range is { } r)
            {
                int left = Column(r.Minimum), right = Column(r.Maximum);
                PropertyRange? part = UsualPart(i);
                int usualLeft = part is { } u ? Column(u.Minimum) : left, usualRight = part is { } v ? Column(v.Maximum) : right;
                for (int c = Math.Max(0, left); c <= Math.Min(track - 1, right); c++) row[c] = c >= usualLeft && c <= usualRight ? Bar : RareBar;
                if (left < 0) row[0] = '<';
                if (right >= track) row[track - 1] = '>';
                if (right < 0) row[0] = '<';
                if (left >= track) row[track - 1] = '>';
            }
            if (at >= 0 && at < track) row[at] = row[at] is Bar or RareBar ? MarkerOnBar : Marker;
            string label = $"{Rank(i).ToString(CultureInfo.InvariantCulture).PadLeft(rankWidth)} {name}";
            lines.Add(label.PadRight(nameWidth) + row + " " + Verdict(range, UsualPart(i)));
        }
        return lines;
    }

    /// <summary>Three labels: left-aligned at the start, centred in the middle, right-aligned at the end of the track.</summary>
    private static string Axis(int track, string left, string middle, string right)
    {
        var axis = new StringBuilder(new string(' ', track));
        void Put(int start, string text)
        {
            for (int i = 0; i < text.Length && start + i < track; i++) if (start + i >= 0) axis[start + i] = text[i];
        }
        Put(0, left);
        if (track >= left.Length + middle.Length + right.Length + 4) Put((track - middle.Length) / 2, middle);
        Put(track - right.Length, right);
        return axis.ToString();
    }
}
