namespace GemIndex.Bench.Independent;

internal static partial class PropertyTable
{
    /// <summary>Rows of this family, compiled like the first rows (each names the pages read).</summary>
    private static SpeciesProperties[] OrnamentalRows() => [];
}
