namespace GemIndex.Bench.Independent;

/// <summary>One rotation step as written on the bench sheet: the low edge and, when a second edge was seen, the high one.</summary>
internal readonly record struct EdgeStep(double RotationDegrees, double Low, double? High);
