namespace GemIndex.Bench.Independent;

/// <summary>How the species reaches a bench: single crystals, fine-grained aggregates, or amorphous.</summary>
internal enum StoneForm
{
    Crystal,
    Aggregate,
    Amorphous,
}
