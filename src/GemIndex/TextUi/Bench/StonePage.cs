namespace GemIndex.Cli.TextUi.Bench;

/// <summary>The stone sheet: what the stone is, before any instrument; under it the examiner, set once for the workbook.</summary>
internal sealed class StonePage : BenchPage
{
    /// <summary>Under the examiner's field: what it is for and that it is not the stone's.</summary>
    public const string ExaminerNote = "  on every report from this workbook";

    /// <summary>Under the stone's fields: which of them the answer weighs (the others describe the stone in its report).</summary>
    public const string WeighedNote = "  the answer uses cut and colour;";

    /// <summary>The second line of <see cref="WeighedNote"/>: what the transparency does.</summary>
    public const string TransparencyNote = "  'opaque' drops light-through tests";

    public StonePage() : base("Stone", FieldKeys)
    {
        AddField(BenchFields.Reference, "Reference", 24);
        AddField(BenchFields.Weight, "Weight", 8, "ct");
        AddField(BenchFields.Dimensions, "Dimensions", 20, "mm");
        AddField(BenchFields.Shape, "Shape", 20);
        AddField(BenchFields.CuttingStyle, "Cutting style", 20);
        AddChoice(BenchFields.Cut);
        AddField(BenchFields.Colour, "Colour", 24);
        AddField(BenchFields.Transparency, "Transparency", 20);
        AddField(BenchFields.Notes, "Notes", 24);
        AddNote(WeighedNote);
        AddNote(TransparencyNote);
        AddNote();
        AddField(BenchFields.Examiner, "Examiner", 24);
        AddNote(ExaminerNote);
    }
}
