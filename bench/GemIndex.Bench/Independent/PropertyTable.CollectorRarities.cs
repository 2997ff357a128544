namespace GemIndex.Bench.Independent;

internal static partial class PropertyTable
{
    /// <summary>Rows of the catalogue family of the same name, compiled like the first rows (each names the pages read).</summary>
    private static SpeciesProperties[] CollectorRaritiesRows() =>
    [
    ];
}
