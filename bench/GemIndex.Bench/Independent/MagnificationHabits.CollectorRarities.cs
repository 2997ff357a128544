namespace GemIndex.Bench.Independent;

internal static partial class MagnificationHabits
{
    /// <summary>Magnification rows for the species of PropertyTable.CollectorRarities.cs.</summary>
    private static MagnificationHabit[] CollectorRaritiesRows() =>
    [
    ];
}
