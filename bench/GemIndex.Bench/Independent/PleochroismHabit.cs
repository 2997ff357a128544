namespace GemIndex.Bench.Independent;

/// <summary>How plainly a coloured stone of the species shows pleochroism, as published.</summary>
internal enum PleochroismHabit
{
    None,
    Weak,
    Moderate,
    Strong,
}
