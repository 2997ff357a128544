using GemIndex.Cli.TextUi.Main;
using GemIndex.Core.Bench;
using GemIndex.Core.Magnification;

namespace GemIndex.Cli.TextUi.Bench;

/// <summary>
/// The loupe page's state: each feature of the magnification vocabulary seen, looked for and not seen, or not looked
/// for; the filter typed; the rows shown (grouped, with headings) and the words under the list. The two field texts it
/// gives back are exactly those of the bench sheet's "magnification.present" and "magnification.absent". No Terminal.Gui here.
/// </summary>
internal sealed class LoupeModel
{
    /// <summary>
    /// The list keeps at least this many rows; the feature's meaning is shown under it only when it still fits (at
    /// 120x40 it does, at 80x24 the list would be too short, so there only what to look for and the lighting show).
    /// </summary>
    public const int MinimumListRows = 12;

    /// <summary>Rows of the page besides the list and the description: the find line and the rule with the state.</summary>
    public const int FixedRows = 2;

    // Words, not signs: "[-]" already means "nothing chosen" on the other pages, and a blank says "not looked for" best.
    public const string PresentMark = "yes", AbsentMark = "no", NotLookedForMark = "";

    private readonly Dictionary<MagnificationFeature, FeatureState> _states = [];

    // Words in a stored field that are not in the vocabulary (typed elsewhere, or from an older version): kept and
    // written back, so that nothing stored is lost; the reader reports them at the field.
    private readonly List<string> _otherPresent = [], _otherAbsent = [];

    public LoupeModel() : this(MagnificationVocabulary.All)
    {
    }

    public LoupeModel(IReadOnlyList<MagnificationFeatureInfo> features)
    {
        Features = features;
        Rows = Build();
    }

    public IReadOnlyList<MagnificationFeatureInfo> Features { get; }

    /// <summary>The text typed to narrow the list ("" shows every feature).</summary>
    public string Filter { get; private set; } = "";

    /// <summary>The rows shown: each group that has a feature matching the filter, its heading then its features.</summary>
    public IReadOnlyList<LoupeRow> Rows { get; private set; }

    public FeatureState State(MagnificationFeature feature) => _states.GetValueOrDefault(feature);

    /// <summary>Records a feature's state; false when it already had that state (nothing to save).</summary>
    public bool Set(MagnificationFeature feature, FeatureState state)
    {
        FeatureState before = State(feature);
        if (!Put(feature, state)) return false;
        _marked.Push((feature, before));
        return true;
    }

    /// <summary>
    /// Puts back the mark changed last (Ctrl+Z; again: the one before), and returns its feature; null when nothing on
    /// this stone has been marked since it was opened.
    /// </summary>
    public MagnificationFeature? Undo()
    {
        if (!_marked.TryPop(out var last)) return null;
        Put(last.Feature, last.Before);
        return last.Feature;
    }

    private bool Put(MagnificationFeature feature, FeatureState state)
    {
        if (State(feature) == state) return false;
        if (state == FeatureState.NotLookedFor) _states.Remove(feature);
        else _states[feature] = state;
        return true;
    }

    /// <summary>The marks changed since the stone was opened, each with the state it had, last on top.</summary>
    private readonly Stack<(MagnificationFeature Feature, FeatureState Before)> _marked = new();

    /// <summary>The number of features in a state (not counting words outside the vocabulary).</summary>
    public int Count(FeatureState state) => Features.Count(f => State(f.Feature) == state);

    /// <summary>
    /// Takes the states from the two field texts. A feature named in both is shown as seen (the reader refuses the
    /// pair meanwhile); the next mark on this page writes both fields again from what is shown.
    /// </summary>
    public void Load(string presentText, string absentText)
    {
        _states.Clear();
        _marked.Clear();
        _otherPresent.Clear();
        _otherAbsent.Clear();
        Read(absentText, FeatureState.Absent, _otherAbsent);
        Read(presentText, FeatureState.Present, _otherPresent);
    }

    private void Read(string text, FeatureState state, List<string> other)
    {
        foreach (string word in BenchSyntax.Features(text))
            if (MagnificationVocabulary.Find(word) is { } feature) _states[feature] = state;
            else if (!other.Contains(word, StringComparer.Ordinal)) other.Add(word);
    }

    /// <summary>The field "magnification.present": the features seen, in the vocabulary's order ("" when none).</summary>
    public string PresentText => Text(FeatureState.Present, _otherPresent);

    /// <summary>The field "magnification.absent": the features looked for and not seen ("" when none).</summary>
    public string AbsentText => Text(FeatureState.Absent, _otherAbsent);

    private string Text(FeatureState state, List<string> other) =>
        BenchSyntax.Features([.. Features.Where(f => State(f.Feature) == state).Select(f => f.Word), .. other]);

    public void SetFilter(string text)
    {
        Filter = text;
        Rows = Build();
    }

    private List<LoupeRow> Build()
    {
        string[] words = Normal(Filter).Split(' ', StringSplitOptions.RemoveEmptyEntries);
        var rows = new List<LoupeRow>();
        foreach (var group in Features.GroupBy(f => f.Group))
        {
            var shown = group.Where(f => Matches(f, words)).ToList();
            if (shown.Count == 0) continue;
            rows.Add(new LoupeRow(group.Key, null));
            rows.AddRange(shown.Select(f => new LoupeRow(group.Key, f)));
        }
        return rows;
    }

    /// <summary>True when every word typed is in the feature's word, name, what to look for, lighting or meaning.</summary>
    public static bool Matches(MagnificationFeatureInfo feature, IReadOnlyList<string> words)
    {
        string text = Normal($"{feature.Word} {feature.Name} {feature.LookFor} {feature.Lighting} {feature.Meaning}");
        return words.All(w => text.Contains(w, StringComparison.Ordinal));
    }

    // Lower case, hyphens and underscores as spaces ("nail-head" finds "nail head"), and the British spellings of the
    // vocabulary found by their American ones.
    private static string Normal(string text) =>
        text.ToLowerInvariant().Replace('-', ' ').Replace('_', ' ')
            .Replace("colour", "color", StringComparison.Ordinal).Replace("fibre", "fiber", StringComparison.Ordinal)
            .Replace("lustre", "luster", StringComparison.Ordinal);

    /// <summary>The index of the first feature row, or -1 when nothing matches.</summary>
    public int FirstFeatureRow => IndexOf(r => !r.IsHeading);

    /// <summary>
    /// Where the cursor goes once the filter changed: it stays on its feature while the typed words name it; else to the
    /// first feature they name ("crystal" finds crystal inclusions before a zoning whose description mentions crystals);
    /// else it stays on its feature while the filter still shows it; else to the first match.
    /// </summary>
    public int RowAfterFilter(MagnificationFeature? current)
    {
        string[] words = Normal(Filter).Split(' ', StringSplitOptions.RemoveEmptyEntries);
        bool Named(LoupeRow r) => words.Length > 0 && r.Feature is { } f && Normal($"{f.Word} {f.Name}") is var name
            && words.All(w => name.Contains(w, StringComparison.Ordinal));
        int here = current is { } c ? RowOf(c) : -1;
        if (here >= 0 && Named(Rows[here])) return here;
        if (IndexOf(Named) is >= 0 and var named) return named;
        return here >= 0 ? here : FirstFeatureRow;
    }

    /// <summary>The row of a feature, or -1 when it is filtered out.</summary>
    public int RowOf(MagnificationFeature feature) => IndexOf(r => r.Feature?.Feature == feature);

    private int IndexOf(Func<LoupeRow, bool> match)
    {
        for (int i = 0; i < Rows.Count; i++)
            if (match(Rows[i])) return i;
        return -1;
    }

    /// <summary>
    /// The feature row to land on when the cursor reaches <paramref name="row"/> coming from <paramref name="from"/>: a
    /// heading is passed over in the direction of travel (or back, at either end of the list).
    /// </summary>
    public int Settle(int row, int from)
    {
        if (Rows.Count == 0) return -1;
        row = Math.Clamp(row, 0, Rows.Count - 1);
        if (!Rows[row].IsHeading) return row;
        int step = row >= from ? 1 : -1;
        for (int i = row + step; i >= 0 && i < Rows.Count; i += step)
            if (!Rows[i].IsHeading) return i;
        for (int i = row - step; i >= 0 && i < Rows.Count; i -= step)
            if (!Rows[i].IsHeading) return i;
        return -1;
    }

    /// <summary>A row as shown: a heading in capitals, or a feature under it after its mark ("yes", "no" or blank).</summary>
    public string Line(LoupeRow row) => row.Feature is { } f ? $" {Mark(State(f.Feature)),-3} {f.Name}" : Heading(row.Group);

    public static string Heading(FeatureGroup group) => group switch
    {
        FeatureGroup.Growth => "GROWTH",
        FeatureGroup.Inclusion => "INCLUSIONS",
        FeatureGroup.Treatment => "SIGNS OF TREATMENT",
        FeatureGroup.Composite => "SIGNS OF A COMPOSITE STONE",
        FeatureGroup.OrganicStructure => "ORGANIC STRUCTURE",
        FeatureGroup.Optics => "OPTICS (through the stone)",
        FeatureGroup.Phenomenon => "PHENOMENA (by eye)",
        _ => group.ToString().ToUpperInvariant(),
    };

    public static string Mark(FeatureState state) => state switch
    {
        FeatureState.Present => PresentMark,
        FeatureState.Absent => AbsentMark,
        _ => NotLookedForMark,
    };

    public static string Words(FeatureState state) => state switch
    {
        FeatureState.Present => "seen",
        FeatureState.Absent => "looked for, not seen",
        _ => "not looked for",
    };

    /// <summary>The line above the list: what to type, or the filter typed, and the counts.</summary>
    public string FindLine(int width)
    {
        int shown = Rows.Count(r => !r.IsHeading);
        string right = Filter.Length > 0 ? $"{shown} of {Features.Count}"
            : string.Join(", ", new[] { (FeatureState.Present, "seen"), (FeatureState.Absent, "not seen") }
                .Where(s => Count(s.Item1) > 0).Select(s => $"{Count(s.Item1)} {s.Item2}"));
        string left = Filter.Length > 0 ? "Find: " + Filter + "_" : "Type to find a feature";
        int room = width - right.Length - (right.Length > 0 ? 2 : 0);
        if (left.Length > room && Filter.Length > 0) left = "Find: …" + (Filter + "_")[^Math.Max(1, room - 7)..];   // the end of a long filter, where typing goes
        else if (left.Length > room) left = "Type to find";
        return right.Length == 0 ? left : left.PadRight(Math.Max(left.Length + 2, width - right.Length)) + right;
    }

    /// <summary>The rule under the list, naming the state of the feature under the cursor.</summary>
    public string Rule(LoupeRow? row, int width)
    {
        // Not yet looked for on an opaque stone, a feature seen only through a stone says it is not advised there (the
        // room is the 80-column page's left half); once marked, the mark is said as usual.
        string text = row?.Feature is { } f
            ? (Opaque && !f.SeenOnTheSurface && State(f.Feature) == FeatureState.NotLookedFor ? $"── {NotOnAnOpaqueStone} " : $"── {Words(State(f.Feature))} ")
            : Rows.Count == 0 ? $"── nothing matches '{Filter}' " : "";
        return text.Length >= width ? text[..width] : text + new string('─', width - text.Length);
    }

    /// <summary>
    /// The stone is typed opaque: a feature seen only through the stone says so on its rule (the command line says
    /// "under the loupe only what shows on a surface"; the next test never advises such a look on an opaque stone).
    /// </summary>
    public bool Opaque { get; set; }

    /// <summary>The rule of a feature seen only through a stone, not yet looked for on an opaque one.</summary>
    public const string NotOnAnOpaqueStone = "opaque stone: not advised";

    /// <summary>What to look for and the lighting (and, when <paramref name="meaning"/>, what it means), wrapped to the width.</summary>
    public static IReadOnlyList<string> Description(MagnificationFeatureInfo feature, int width, bool meaning) =>
        [.. TextWrap.Lines(meaning
            ? [$"Look for: {feature.LookFor}", $"Lighting: {feature.Lighting}", $"Meaning: {feature.Meaning}"]
            : [$"Look for: {feature.LookFor}", $"Lighting: {feature.Lighting}"], width)];

    /// <summary>
    /// How a page of <paramref name="width"/> by <paramref name="height"/> is shared: the description gets the rows
    /// its longest entry needs (with the meaning when the list keeps <see cref="MinimumListRows"/>), the list the rest,
    /// up to the rows of the whole list.
    /// </summary>
    public (int ListRows, int DescriptionRows, bool Meaning) Layout(int width, int height)
    {
        int free = Math.Max(2, height - FixedRows);
        int every = Features.Count + Features.Select(f => f.Group).Distinct().Count();   // a taller list would only add blank rows
        int withMeaning = Features.Max(f => Description(f, width, meaning: true).Count);
        if (free - withMeaning >= MinimumListRows) return (Math.Min(every, free - withMeaning), withMeaning, true);
        int without = Math.Min(Features.Max(f => Description(f, width, meaning: false).Count), free - 1);
        return (Math.Min(every, free - without), without, false);
    }
}
