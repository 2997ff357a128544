namespace GemIndex.Cli.TextUi.Bench;

/// <summary>One rotation step exactly as typed (rotation in degrees, low and high edge).</summary>
internal sealed record StepText(string Rotation, string Low, string High);
