namespace GemIndex.Bench.Independent;

/// <summary>A stone dropped into a heavy liquid of known density: "floats", "suspends" or "sinks".</summary>
internal readonly record struct HeavyLiquidTest(double Density, string Result);
