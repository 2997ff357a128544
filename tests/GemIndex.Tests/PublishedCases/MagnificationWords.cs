namespace GemIndex.Tests.PublishedCases;

/// <summary>
/// The words of the magnification vocabulary that published cases may use. The vocabulary itself lives in
/// GemIndex.Core.Magnification on the main branch, which this branch does not yet have; when the two meet, replace
/// <see cref="Known"/> by MagnificationVocabulary.Find so there is one list.
/// </summary>
public static class MagnificationWords
{
    /// <summary>Growth, inclusion, treatment and composite features, by their batch words.</summary>
    public static IReadOnlySet<string> Known { get; } = new HashSet<string>(StringComparer.Ordinal)
    {
        "curved_striae", "angular_zoning", "chevron_growth", "colour_banding", "mosaic_patches",
        "round_bubbles", "elongated_bubbles", "flux_residue", "metal_platelets", "needles_silk", "crystals",
        "fluid_inclusions", "healed_fractures", "nail_head_spicules",
        "flash_effect", "flattened_bubbles", "surface_colour", "dye_in_fractures", "coating_wear",
        "join_plane", "two_lustres", "cement_bubbles",
    };
}
