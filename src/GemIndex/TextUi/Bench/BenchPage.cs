using GemIndex.Cli.TextUi.Main;
using Terminal.Gui.Drawing;
using Terminal.Gui.Configuration;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace GemIndex.Cli.TextUi.Bench;

/// <summary>One page of the bench form: rows of fields and choices, and at the bottom the full reasons of any refused entries.</summary>
internal class BenchPage : View
{
    public const int LabelWidth = 14;   // the longest label (13) and a space before the value
    private readonly Label _problems;
    private readonly int _problemRows;
    private int _row;

    /// <param name="title">The page's name in its frame.</param>
    /// <param name="keys">The page's own keys, for the key line.</param>
    /// <param name="problemRows">Rows at the bottom for the reasons of refused entries (0: the page shows them itself).</param>
    public BenchPage(string title, string keys, int problemRows = 4)
    {
        Title = title;
        Keys = keys;
        _problemRows = problemRows;
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;
        _problems = new PlainLabel { X = 0, Y = Pos.AnchorEnd(problemRows), Width = Dim.Fill(), Height = problemRows, Visible = problemRows > 0 };
        _problems.SchemeName = SchemeManager.SchemesToSchemeName(Schemes.Error);
        Add(_problems);
        ViewportChanged += (_, _) => WrapProblems();
    }

    /// <summary>The keys that matter on this page, for the key line.</summary>
    public string Keys { get; }

    /// <summary>The keys of a text field, whatever page it is on (a page's own keys speak of its choices or its steps).</summary>
    public const string FieldKeys = "Tab next field";

    /// <summary>The keys that matter where the cursor is: a text field's, else the page's.</summary>
    public virtual string KeysHere => Fields.Any(f => f.Edit.HasFocus) ? FieldKeys : Keys;

    public List<FormField> Fields { get; } = [];

    public List<ChoiceField> Choices { get; } = [];

    /// <summary>The fields and choices in the order they are shown (and tabbed through).</summary>
    private readonly List<View> _inOrder = [];

    /// <summary>Where the cursor goes when the page opens: its first reading.</summary>
    public virtual View FirstReading => _inOrder[0] is FormField f ? f.Edit : _inOrder[0];

    /// <summary>Opens the page at its first reading (never at the field used last: readings would go astray).</summary>
    public virtual void FocusFirst() => FirstReading.SetFocus();

    /// <summary>The rows the page's own views take, from its top (the foot's rows aside).</summary>
    protected int RowsUsed => _row;

    protected int NextRow(int rows = 1)
    {
        int row = _row;
        _row += rows;
        return row;
    }

    public FormField AddField(string field, string label, int editWidth, string hint = "")
    {
        var f = new FormField(field, label, LabelWidth, editWidth, hint) { Y = NextRow() };
        Fields.Add(f);
        _inOrder.Add(f);
        f.Edit.HasFocusChanged += (_, _) => WrapProblems();
        Add(f);
        return f;
    }

    public ChoiceField AddChoice(string field)
    {
        var c = new ChoiceField(BenchChoice.For(field), LabelWidth) { Y = NextRow() };
        Choices.Add(c);
        _inOrder.Add(c);
        c.TypedAhead = text => TypeIntoNextField(c, text);
        Add(c);
        return c;
    }

    /// <summary>Raised with a sentence for the key line when a key typed on the page is not taken.</summary>
    public event Action<string>? KeyNotTaken;

    /// <summary>Says on the key line why a key did nothing.</summary>
    protected void RaiseKeyNotTaken(string said) => KeyNotTaken?.Invoke(said);

    public Label AddNote(string text = "")
    {
        var l = new PlainLabel { Y = NextRow(), Width = Dim.Fill(), Text = text };
        Add(l);
        return l;
    }

    /// <summary>
    /// A digit typed on a choice goes on into the field right after it when that is an empty text field, which takes the
    /// cursor (a choice, then its number: "d" then the index). Anywhere else it is refused: it must never replace a value
    /// farther down the page.
    /// </summary>
    private bool TypeIntoNextField(ChoiceField from, string text)
    {
        var following = _inOrder.ElementAtOrDefault(_inOrder.IndexOf(from) + 1) as FormField;
        if (following is not { } next || next.Edit.Text.Length > 0)
        {
            // Said, never dropped silently: a reading typed here would otherwise be lost without a word.
            KeyNotTaken?.Invoke($"'{text}' not taken: {from.Choice.Label} takes one of {from.Choice.KeyHint}"
                + (following is { } held ? $"; {held.Label} already holds {held.Edit.Text} (Tab to it to change it)." : "."));
            return false;
        }
        next.Edit.SetFocus();
        next.Edit.Text = text;
        next.Edit.InsertionPoint = text.Length;
        return true;
    }

    /// <summary>Marks each field with its error and lists the reasons at the bottom, each after its field's caption.</summary>
    public virtual void ShowErrors(IReadOnlyDictionary<string, string> errors)
    {
        foreach (FormField f in Fields) f.ShowError(errors.GetValueOrDefault(f.Field));
        foreach (ChoiceField c in Choices) c.ShowError(errors.GetValueOrDefault(c.Choice.Field));
        _problemLines = [.. ReasonsInWords(errors).Select(m => (m.Key, "! " + m.Text))];
        WrapProblems();
    }

    /// <summary>The reasons of this page's refused entries as the page words them: "In water: …", "step 2: …".</summary>
    public IEnumerable<(string Key, string Text)> ReasonsInWords(IReadOnlyDictionary<string, string> errors) =>
        Fields.Where(f => errors.ContainsKey(f.Field)).Select(f => (f.Field, $"{f.Label}: {InCaptions(errors[f.Field])}"))
            .Concat(Choices.Where(c => errors.ContainsKey(c.Choice.Field)).Select(c => (c.Choice.Field, $"{c.Choice.Label}: {InCaptions(errors[c.Choice.Field])}")))
            .Concat(OwnErrors(errors));

    private IReadOnlyList<(string Key, string Line)> _problemLines = [];

    /// <summary>
    /// A safety caution shown in the rows kept for the reasons while no entry is refused (the contact liquid's, the UV
    /// lamp's): where the work is done, without taking rows from the form. The reports and F1 say it in full.
    /// </summary>
    protected IReadOnlyList<string> FootCaution { get; init; } = [];

    /// <summary>The same caution in one row (at most the form's width), kept on the foot's last row while entries are refused.</summary>
    protected string FootCautionLine { get; init; } = "";

    /// <summary>Said on the last row when the reasons need more rows than the page has for them.</summary>
    public const string MoreProblems = "! more: move to a '!' to read it";

    /// <summary>The error key of the field or step under the cursor (its reason is shown first), or null.</summary>
    protected virtual string? FocusedProblemKey => Fields.FirstOrDefault(f => f.Edit.HasFocus)?.Field ?? Choices.FirstOrDefault(c => c.HasFocus)?.Choice.Field;

    /// <summary>
    /// The reasons word-wrapped to the page's width, each continuation indented under its "!": the reason of the field or
    /// step under the cursor first, so that every marked entry's reason can be read by moving to it; then the others in
    /// order, only whole ones, and when they need more rows than the page has, as many as fit with a last row saying there
    /// are more.
    /// </summary>
    /// <summary>How many of the foot's rows the refused entries' reasons take now (0: none refused).</summary>
    protected int ReasonRows { get; private set; }

    /// <summary>The rows kept at the page's foot for the reasons (and, while none is refused, the safety caution).</summary>
    protected int FootRows => _problemRows;

    /// <summary>Called after the foot's reasons are laid out, for a page whose own rows must leave them room.</summary>
    protected virtual void ProblemsWrapped() { }

    protected void WrapProblems()
    {
        int width = Math.Max(20, Viewport.Width);
        if (_problemLines.Count == 0)
        {
            _problems.Text = string.Join('\n', Main.TextWrap.Lines(FootCaution, width).Take(_problemRows));
            ReasonRows = 0;
            ProblemsWrapped();
            return;
        }
        string? focused = FocusedProblemKey;
        var ordered = _problemLines.Where(p => p.Key == focused).Concat(_problemLines.Where(p => p.Key != focused));
        List<List<string>> reasons = [.. ordered.Select(p => Main.TextWrap.Lines([p.Line], width).ToList())];
        List<string> lines = [.. reasons.SelectMany(r => r)];
        // The safety caution keeps the last row, in a few words: refusing an entry must not take it off the page.
        int rows = FootCautionLine.Length > 0 ? Math.Max(1, _problemRows - 1) : _problemRows;
        if (lines.Count > rows)
        {
            lines = [];
            foreach (List<string> reason in reasons)
            {
                if (lines.Count + reason.Count > rows - 1) break;
                lines.AddRange(reason);
            }
            // The first reason is always given: whole when the page's rows hold it (the other entries keep their '!'),
            // else as much as they hold.
            if (lines.Count == 0 && reasons[0].Count <= rows) lines.AddRange(reasons[0]);
            else if (lines.Count == 0)
            {
                lines.AddRange(reasons[0].Take(rows - 1));
                lines[^1] = lines[^1].TrimEnd() + "…";
                lines.Add(MoreProblems);
            }
            else lines.Add(MoreProblems);
        }
        if (FootCautionLine.Length > 0) lines.Add(FootCautionLine);
        _problems.Text = string.Join('\n', lines);
        ReasonRows = lines.Count;
        ProblemsWrapped();
    }

    /// <summary>A reason as the page shows it: the fields it names by their wire names ("sg.air_ct") named by their captions ("In air").</summary>
    public string InCaptions(string reason)
    {
        foreach (FormField f in Fields.OrderByDescending(f => f.Field.Length)) reason = reason.Replace(f.Field, f.Label, StringComparison.Ordinal);
        return reason;
    }

    /// <summary>The page's own reasons beside its fields' (the refractometer's steps), each with its error key.</summary>
    protected virtual IEnumerable<(string Key, string Text)> OwnErrors(IReadOnlyDictionary<string, string> errors) => [];
}
