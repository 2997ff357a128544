namespace GemIndex.Cli.TextUi.Bench;

/// <summary>The stone sheet: what the stone is, before any instrument.</summary>
internal sealed class StonePage : BenchPage
{
    public StonePage() : base("Stone", "Tab next field")
    {
        AddField(BenchFields.Reference, "Reference", 24);
        AddField(BenchFields.Weight, "Weight", 8, "ct");
        AddField(BenchFields.Dimensions, "Dimensions", 20, "mm");
        AddField(BenchFields.Shape, "Shape", 20);
        AddField(BenchFields.CuttingStyle, "Cutting style", 20);
        AddField(BenchFields.Colour, "Colour", 24);
        AddField(BenchFields.Transparency, "Transparency", 20);
        AddField(BenchFields.Notes, "Notes", 24);
    }
}
