using GemIndex.Core.Readings;

namespace GemIndex.Core.Identification;

/// <summary>A bench sheet with its material-independent analysis done once (the rotation series).</summary>
public sealed record AnalysedSheet
{
    /// <summary>Analyses the sheet.</summary>
    public AnalysedSheet(BenchSheet sheet)
    {
        Sheet = sheet;
        if (!string.IsNullOrWhiteSpace(sheet.Colour))
        {
            ColourHues = ColourWords.Hues(sheet.Colour).ToHashSet();
            IsColourless = ColourWords.IsColourless(sheet.Colour);
        }
        if (sheet.Refractometer is { Steps.Count: > 0 } r)
            Series = RotationSeriesAnalysis.Analyse(r.Steps, r.ReadingPrecision, r.CalibrationOffset);
    }

    /// <summary>The sheet as entered.</summary>
    public BenchSheet Sheet { get; }

    /// <summary>The colour seen, as normalised hue words; empty when no colour was given.</summary>
    public IReadOnlySet<string> ColourHues { get; } = new HashSet<string>();

    /// <summary>True when the colour given describes a colourless stone (which shows no pleochroism).</summary>
    public bool IsColourless { get; }

    /// <summary>The rotation series' analysis, when there are readings.</summary>
    public RotationSeriesResult? Series { get; }
}
