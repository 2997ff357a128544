using GemIndex.Core.Magnification;

namespace GemIndex.Cli.TextUi.Bench;

/// <summary>One row of the loupe page's list: a group's heading (no feature) or a feature of that group.</summary>
internal sealed record LoupeRow(FeatureGroup Group, MagnificationFeatureInfo? Feature)
{
    public bool IsHeading => Feature is null;
}
