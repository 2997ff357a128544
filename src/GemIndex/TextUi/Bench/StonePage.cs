namespace GemIndex.Cli.TextUi.Bench;

/// <summary>The stone sheet: what the stone is, before any instrument.</summary>
internal sealed class StonePage : BenchPage
{
    public StonePage() : base("Stone", "Tab next field")
    {
        AddField(BenchFields.Reference, "Reference", 24);
        AddField(BenchFields.Weight, "Weight ct", 8);
        AddField(BenchFields.Dimensions, "Dimensions", 24, "mm");
        AddField(BenchFields.Shape, "Shape", 16);
        AddField(BenchFields.CuttingStyle, "Cutting style", 16);
        AddField(BenchFields.Colour, "Colour", 24);
        AddField(BenchFields.Transparency, "Transparency", 16);
        AddField(BenchFields.Notes, "Notes", 26);
    }
}
