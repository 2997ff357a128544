namespace GemIndex.Bench.Independent;

/// <summary>Weights in air and in water in carats, with the water temperature when the bench wrote it down.</summary>
internal readonly record struct HydrostaticWeights(double AirCarats, double WaterCarats, double? WaterCelsius);
