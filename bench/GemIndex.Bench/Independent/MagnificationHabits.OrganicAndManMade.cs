namespace GemIndex.Bench.Independent;

internal static partial class MagnificationHabits
{
    /// <summary>Magnification rows for the species of PropertyTable.OrganicAndManMade.cs.</summary>
    private static MagnificationHabit[] OrganicAndManMadeRows() => [];
}
