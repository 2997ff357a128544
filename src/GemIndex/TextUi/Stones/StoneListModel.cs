using System.Globalization;
using GemIndex.Data.Workbook;

namespace GemIndex.Cli.TextUi.Stones;

/// <summary>
/// The workbook's stones as a searchable list of lines, each with its answer in a few words. The answers are worked
/// out away from the UI thread (<see cref="Compute"/>, thread-safe when the function given is) and kept once per stone
/// and change (<see cref="Store"/>, on the UI thread), so the list opens at once and a search does not rank again.
/// </summary>
internal sealed class StoneListModel
{
    private readonly Func<string, IReadOnlyList<StoneSummary>> list;
    private readonly Func<long, string?>? answer;

    /// <summary>The workbook's stones (<paramref name="list"/>: those a search's text matches, all for ""), every one shown at first.</summary>
    public StoneListModel(Func<string, IReadOnlyList<StoneSummary>> list, Func<long, string?>? answer = null)
    {
        this.list = list;
        this.answer = answer;
        Shown = _all = list("");
    }

    /// <summary>What a line shows where its answer is still being worked out.</summary>
    public const string Pending = "…";

    private readonly Dictionary<(long, DateTimeOffset), string?> _answers = [];   // null: none could be worked out (no catalogue yet)
    private IReadOnlyList<StoneSummary> _all;
    private HashSet<long> _textMatches = [];

    public IReadOnlyList<StoneSummary> Shown { get; private set; }

    public string Query { get; private set; } = "";

    /// <summary>
    /// The stones whose reference, colour or notes hold <paramref name="text"/> (the workbook's search), and those whose
    /// answer does once it is worked out ("spinel" finds the stones answered spinel). The workbook is asked for the
    /// text matches only; the stones themselves are read again by <see cref="Refresh"/>.
    /// </summary>
    public void Search(string text)
    {
        Query = text;
        _textMatches = Query.Trim().Length == 0 ? [] : [.. list(Query).Select(s => s.Id)];
        Shown = Filtered();
    }

    /// <summary>Reads the workbook's stones again (after a deletion or a copy) and searches them as before.</summary>
    public void Refresh()
    {
        _all = list("");
        Search(Query);
    }

    private IReadOnlyList<StoneSummary> Filtered()
    {
        string q = Query.Trim();
        IEnumerable<StoneSummary> found = q.Length == 0 ? _all : _all.Where(s => _textMatches.Contains(s.Id)
            || (AnswerOf(s) is { } a && a.Contains(q, StringComparison.OrdinalIgnoreCase)));
        return Order switch
        {
            StoneOrder.Reference => [.. found.OrderBy(s => s.Reference, ReferenceOrder)],
            // Stones whose answer is still being worked out go last, and move up as their answers come.
            StoneOrder.Answer => [.. found.OrderBy(s => AnswerOf(s) is { Length: > 0 } ? 0 : 1).ThenBy(s => AnswerOf(s), ReferenceOrder)],
            StoneOrder.Weight => [.. found.OrderBy(s => s.WeightCarats is null ? 1 : 0).ThenByDescending(s => s.WeightCarats)],
            _ => [.. found],   // the workbook's order: changed last first
        };
    }

    private string? AnswerOf(StoneSummary s) => _answers.GetValueOrDefault((s.Id, s.Modified));

    /// <summary>
    /// References as a lot numbers them: "lot 2" before "lot 10", case aside. Written out, since the culture's numeric
    /// ordering depends on the machine's language data (without it, "lot 10" came before "lot 2").
    /// </summary>
    private static readonly Comparer<string?> ReferenceOrder = Comparer<string?>.Create((x, y) =>
    {
        (string a, string b) = (x ?? "", y ?? "");
        int i = 0, j = 0;
        while (i < a.Length && j < b.Length)
        {
            if (char.IsAsciiDigit(a[i]) && char.IsAsciiDigit(b[j]))
            {
                int iEnd = i, jEnd = j;
                while (iEnd < a.Length && char.IsAsciiDigit(a[iEnd])) iEnd++;
                while (jEnd < b.Length && char.IsAsciiDigit(b[jEnd])) jEnd++;
                ReadOnlySpan<char> m = a.AsSpan(i, iEnd - i).TrimStart('0'), n = b.AsSpan(j, jEnd - j).TrimStart('0');
                int byNumber = m.Length != n.Length ? m.Length.CompareTo(n.Length) : m.SequenceCompareTo(n);
                if (byNumber != 0) return byNumber;
                (i, j) = (iEnd, jEnd);
                continue;
            }
            int byLetter = char.ToLowerInvariant(a[i]).CompareTo(char.ToLowerInvariant(b[j]));
            if (byLetter != 0) return byLetter;
            (i, j) = (i + 1, j + 1);
        }
        return (a.Length - i).CompareTo(b.Length - j);
    });

    /// <summary>The order the list is shown in (F4 on the list moves to the next).</summary>
    public StoneOrder Order { get; private set; }

    /// <summary>Shows the list in the next order: changed, reference, answer, weight, then changed again.</summary>
    public void NextOrder()
    {
        Order = (StoneOrder)(((int)Order + 1) % Enum.GetValues<StoneOrder>().Length);
        Shown = Filtered();
    }

    /// <summary>The order in words, for the line over the list.</summary>
    public string OrderWords => Order switch
    {
        StoneOrder.Reference => "reference",
        StoneOrder.Answer => "answer",
        StoneOrder.Weight => "weight, heaviest first",
        _ => "changed, latest first",
    };

    /// <summary>True while a search may still find stones by answers not yet tried (one that could not be worked out counts as tried).</summary>
    public bool AnswersPending => Query.Trim().Length > 0 && _all.Any(s => !_answers.ContainsKey((s.Id, s.Modified)));

    /// <summary>The answer column's narrowest width, and the columns around it with their spaces (the list's frame aside).</summary>
    public const int NarrowestAnswer = 18, OtherColumns = 18 + 1 + 14 + 1 + 9 + 1 + 1 + 13;

    /// <summary>The answer column's width: what the list's width leaves (at 120 columns a long species name and its share fit).</summary>
    public int AnswerWidth { get; private set; } = NarrowestAnswer;

    /// <summary>The colour column's narrowest width, and how much wider it grows once the answer has 40 columns (judgement).</summary>
    public const int NarrowestColour = 14, ColourGrowth = 10;

    /// <summary>The colour column's width: 14, and up to 24 on a wide screen ("yellowish green" was cut even at 120 columns).</summary>
    public int ColourWidth { get; private set; } = NarrowestColour;

    /// <summary>The reference column's narrowest width, and how much wider it grows once the answer and the colour have theirs (judgement).</summary>
    public const int NarrowestReference = 18, ReferenceGrowth = 12;

    /// <summary>The reference column's width: 18, and up to 30 on a wide screen (a copy's "… (copy)" and long lot references were cut at any width).</summary>
    public int ReferenceWidth { get; private set; } = NarrowestReference;

    /// <summary>The width of the list's rows; the answer column takes what the other columns leave, the colour and reference columns a little of a wide screen's.</summary>
    public int Width
    {
        set
        {
            int free = value - OtherColumns;
            ColourWidth = NarrowestColour + Math.Clamp(free - 40, 0, ColourGrowth);
            ReferenceWidth = NarrowestReference + Math.Clamp(free - 40 - ColourGrowth, 0, ReferenceGrowth);
            AnswerWidth = Math.Max(NarrowestAnswer, free - (ColourWidth - NarrowestColour) - (ReferenceWidth - NarrowestReference));
        }
    }

    /// <summary>The columns' names over the list, in the columns of <see cref="Line"/>.</summary>
    public string Heading => $"{"Reference".PadRight(ReferenceWidth)} {"Colour".PadRight(ColourWidth)} {"Weight",9} {"Answer".PadRight(AnswerWidth)} Changed (UTC)";

    /// <summary>
    /// The stones whose answers are not known yet (none without an answer function): the shown ones first, in the order
    /// shown, then, while searching, the others, since a search looks in the answers too.
    /// </summary>
    public IReadOnlyList<StoneSummary> Missing() => answer is null ? []
        : [.. Shown.Concat(Query.Trim().Length > 0 ? _all.Except(Shown) : []).Where(s => _answers.GetValueOrDefault((s.Id, s.Modified)) is null)];

    /// <summary>Works out one stone's answer (any thread); null when none can be worked out yet (no catalogue loaded).</summary>
    public string? Compute(long id) => answer?.Invoke(id);

    /// <summary>
    /// Keeps a stone's answer for this version of it (null: none could be worked out yet, asked again at the next fill of
    /// the list); true when that changes which stones a search shows.
    /// </summary>
    public bool Store(StoneSummary s, string? text)
    {
        _answers[(s.Id, s.Modified)] = text;
        var now = Filtered();
        if (now.Select(x => x.Id).SequenceEqual(Shown.Select(x => x.Id))) return false;
        Shown = now;
        return true;
    }

    /// <summary>One stone's line, with its answer, or <see cref="Pending"/> while it is worked out.</summary>
    public string LineOf(StoneSummary s) =>
        Line(s, answer is null ? "" : _answers.TryGetValue((s.Id, s.Modified), out string? text) ? text ?? "" : Pending, AnswerWidth, ColourWidth, ReferenceWidth);

    /// <summary>One stone: reference, colour, weight, answer, day of the last change (UTC, as the workbook stores it; F3 shows the times).</summary>
    public static string Line(StoneSummary s, string answer, int answerWidth = NarrowestAnswer, int colourWidth = NarrowestColour, int referenceWidth = NarrowestReference) =>
        $"{Results.ResultText.Clip(s.Reference.Length == 0 ? "(no reference)" : s.Reference, referenceWidth).PadRight(referenceWidth)} {Results.ResultText.Clip(s.Colour, colourWidth).PadRight(colourWidth)} "
        + $"{(s.WeightCarats is { } w ? w.ToString("0.00", CultureInfo.InvariantCulture) + " ct" : ""),9} {Results.ResultText.Clip(answer, answerWidth).PadRight(answerWidth)} "
        + s.Modified.ToUniversalTime().ToString("yyyy-MM-dd", CultureInfo.InvariantCulture);
}

/// <summary>The orders of the stone list.</summary>
internal enum StoneOrder
{
    Changed,
    Reference,
    Answer,
    Weight,
}
