namespace GemIndex.Core.Bench;

/// <summary>
/// One rotation step as given: the rotation in degrees (empty: not given), the low edge and the high edge (empty
/// for a single edge). Texts, not numbers, so that what a person typed reaches <see cref="BenchReader"/> as is.
/// </summary>
public sealed record EdgeStepText(string Rotation, string Low, string High);
