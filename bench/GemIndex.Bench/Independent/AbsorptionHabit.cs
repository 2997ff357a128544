namespace GemIndex.Bench.Independent;

/// <summary>
/// One line or band centre a hand spectroscope shows in the species, as published; strong lines are rarely missed,
/// faint ones often (the detection model is in <see cref="IndependentStoneSimulator"/>). Hue: the colour of stone
/// that shows it (null: any colour). NaturalOnly: a line of the natural stone that its synthetic counterpart lacks.
/// </summary>
internal readonly record struct AbsorptionHabit(double Nanometres, bool Strong, string? Hue = null, bool NaturalOnly = false);
