using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;

namespace GemIndex.Cli.TextUi.Bench;

/// <summary>An answer picked with one letter (Space, Backspace or Delete clears); a mouse click moves to the next answer.</summary>
internal sealed class ChoiceField : View
{
    private readonly int _labelWidth;

    public ChoiceField(BenchChoice choice, int labelWidth)
    {
        Choice = choice;
        _labelWidth = labelWidth;
        Width = Dim.Fill();
        Height = 1;
        CanFocus = true;
        Show(null);
        MouseEvent += (_, m) =>
        {
            if (!m.IsSingleClicked) return;
            SetFocus();
            int at = choice.Options.Select(o => o.Word).ToList().IndexOf(Word ?? "");
            Pick(at + 1 < choice.Options.Count ? choice.Options[at + 1].Word : null);
            m.Handled = true;
        };
    }

    public BenchChoice Choice { get; }

    public string? Word { get; private set; }

    /// <summary>Raised when the user picks or clears the answer.</summary>
    public event Action<ChoiceField>? Picked;

    /// <summary>
    /// Asked with a digit, point or sign typed here that no answer takes: it belongs to the next field. Returns whether
    /// the page took it (it does not when that field already holds a value, which a stray key must not replace).
    /// </summary>
    public Func<string, bool>? TypedAhead { get; set; }

    /// <summary>Shows a word without raising <see cref="Picked"/> (when a stone is loaded).</summary>
    public void Show(string? word)
    {
        Word = word;
        // The keys while nothing is chosen; the key line lists them in words while the choice has the cursor. A refused
        // answer says where its reason is, as a field's mark does.
        Text = $"{Choice.Label.PadRight(_labelWidth)}[{Choice.Show(word)}]" + (Refused ? "  " + FormField.SeeBelow : word is null ? "  " + (Note ?? Choice.KeyHint) : "");
    }

    /// <summary>
    /// A note shown in place of the keys while nothing is chosen (an opaque stone's polariscope: it needs light through
    /// the stone); null: the keys. The key line still lists the keys while the choice has the cursor.
    /// </summary>
    public string? Note
    {
        get => _note;
        set { if (_note == value) return; _note = value; Show(Word); }
    }

    private string? _note;

    /// <summary>Whether the reader refused this answer (its reason is at the page's foot).</summary>
    public bool Refused { get; private set; }

    /// <summary>Marks the answer refused (a reason) or not (null).</summary>
    public void ShowError(string? reason)
    {
        Refused = reason is not null;
        Show(Word);
    }

    private void Pick(string? word)
    {
        Show(word);
        Picked?.Invoke(this);
    }

    protected override bool OnKeyDown(Key key)
    {
        if (key == Key.Space || key == Key.Backspace || key == Key.Delete) { Pick(null); return true; }
        if (key.IsCtrl || key.IsAlt || !key.TryGetPrintableRune(out var rune) || !rune.IsBmp) return false;
        if (Choice.WordFor((char)rune.Value) is not { } word)
        {
            if (!char.IsAsciiDigit((char)rune.Value) && rune.Value != '.' && rune.Value != '-' || TypedAhead is null) return false;
            return TypedAhead((char)rune.Value + "");
        }
        Pick(word);
        return true;
    }
}
