namespace GemIndex.Bench.Independent;

/// <summary>
/// One magnification feature a stone of a <see cref="MagnificationHabit"/> may hold, in the batch format's word
/// (README "Batch format"), and the chance that a stone which is not loupe-clean holds it.
/// </summary>
internal readonly record struct FeatureHabit(string Word, double Held);
