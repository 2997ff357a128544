namespace GemIndex.Bench.Independent;

internal static partial class MagnificationHabits
{
    /// <summary>Magnification rows for the species of PropertyTable.OrnamentalMinerals.cs.</summary>
    private static MagnificationHabit[] OrnamentalMineralsRows() =>
    [
    ];
}
