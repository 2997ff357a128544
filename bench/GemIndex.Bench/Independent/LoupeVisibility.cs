namespace GemIndex.Bench.Independent;

/// <summary>
/// The benchmark's own model of what an examiner who looks actually writes down (docs/benchmark.md, "Magnification").
/// Unlike a fixed chance per feature, a sighting here depends on the instrument (a microscope with darkfield and
/// fibre-optic light, or a 10x loupe), on whether the stone is set (the mount hides the girdle and part of the
/// pavilion), on opacity (inside an opaque stone nothing is seen), and on how much of the feature this stone has
/// (a factor drawn per stone and feature). False sightings come from look-alikes the stone does hold (a two-phase
/// inclusion's bubble taken for a gas bubble, a fingerprint for flux residue) plus a small stray rate. Every number
/// is a judgement of the benchmark, guided by the pages cited beside it.
/// </summary>
internal static class LoupeVisibility
{
    /// <summary>Share of looks made with a microscope rather than a hand loupe (judgement).</summary>
    public const double MicroscopeShare = 0.55;

    /// <summary>Share of stones examined in their setting (judgement).</summary>
    public const double MountedShare = 0.35;

    /// <summary>Chance of writing a feature as seen with nothing in the stone to suggest it (a slip; judgement).</summary>
    public const double StraySighting = 0.004;

    /// <summary>The per-stone extent factor of a held feature is uniform in [0.6, 1.4]; sightings are capped here.</summary>
    public const double MostLikelySighting = 0.97;

    /// <summary>Where a feature lies, which decides what hides it.</summary>
    private enum Place
    {
        Inside,
        Surface,
        Girdle,
    }

    /// <summary>
    /// Chance of seeing a feature of typical extent: with a microscope, with a 10x loupe. Subtle growth features and
    /// small fluid inclusions need the microscope ("hard to distinguish", immersion and the c axis help: gemsociety.org
    /// curved striae; breadcrumbs and spicules "rare to find without high magnification": yourgemologist.com);
    /// bubbles, dye and joins are plain with a loupe.
    /// </summary>
    private static readonly Dictionary<string, (double Microscope, double Loupe, Place Place)> Conspicuity = new(StringComparer.Ordinal)
    {
        ["curved_striae"] = (0.6, 0.3, Place.Inside),
        ["angular_zoning"] = (0.65, 0.4, Place.Inside),
        ["chevron_growth"] = (0.7, 0.4, Place.Inside),
        ["colour_banding"] = (0.8, 0.6, Place.Inside),
        ["mosaic_patches"] = (0.9, 0.8, Place.Surface),
        ["round_bubbles"] = (0.9, 0.7, Place.Inside),
        ["elongated_bubbles"] = (0.85, 0.6, Place.Inside),
        ["flux_residue"] = (0.8, 0.5, Place.Inside),
        ["metal_platelets"] = (0.75, 0.5, Place.Inside),
        ["needles_silk"] = (0.8, 0.5, Place.Inside),
        ["crystals"] = (0.85, 0.65, Place.Inside),
        ["fluid_inclusions"] = (0.7, 0.35, Place.Inside),
        ["healed_fractures"] = (0.8, 0.55, Place.Inside),
        ["nail_head_spicules"] = (0.6, 0.25, Place.Inside),
        ["flash_effect"] = (0.9, 0.6, Place.Inside),
        ["flattened_bubbles"] = (0.8, 0.5, Place.Inside),
        ["surface_colour"] = (0.5, 0.3, Place.Surface),
        ["dye_in_fractures"] = (0.85, 0.7, Place.Surface),
        ["coating_wear"] = (0.7, 0.5, Place.Surface),
        ["join_plane"] = (0.9, 0.8, Place.Girdle),
        ["two_lustres"] = (0.6, 0.6, Place.Girdle),
        ["cement_bubbles"] = (0.7, 0.4, Place.Girdle),
        // Long straight channels, plain with a loupe when the stone holds them (gemsociety.org: "easy to distinguish").
        ["growth_tubes"] = (0.8, 0.6, Place.Inside),
    };

    /// <summary>
    /// Look-alikes: a held feature (From) written as another (To), with the chance per sighting of From. After
    /// langantiques.com 'Gas bubble' (natural cavities look bubble-like), actforlibraries.org (a small crystal taken
    /// for a bubble), the 2019 and 2021 Gems &amp; Gemology notes on flux that looks natural, gemsociety.org on curved
    /// striae that look straight off the c axis, gem-matrix.com on interference colours in unfilled emerald
    /// fractures, and Choudhary and Golecha (2007) on spicule look-alikes in natural stones; the chances are judgements.
    /// </summary>
    private static readonly (string From, string To, double Chance)[] LookAlikes =
    [
        ("fluid_inclusions", "round_bubbles", 0.04),
        ("crystals", "round_bubbles", 0.03),
        ("round_bubbles", "elongated_bubbles", 0.1),
        ("elongated_bubbles", "round_bubbles", 0.2),
        ("healed_fractures", "flux_residue", 0.05),
        ("flux_residue", "healed_fractures", 0.15),
        ("colour_banding", "angular_zoning", 0.2),
        ("angular_zoning", "colour_banding", 0.2),
        ("colour_banding", "curved_striae", 0.03),
        ("angular_zoning", "curved_striae", 0.03),
        ("curved_striae", "colour_banding", 0.15),
        ("healed_fractures", "flash_effect", 0.03),
        ("healed_fractures", "flattened_bubbles", 0.02),
        ("crystals", "metal_platelets", 0.04),
        ("fluid_inclusions", "nail_head_spicules", 0.02),
        ("crystals", "nail_head_spicules", 0.02),
        ("flattened_bubbles", "cement_bubbles", 0.1),
        ("cement_bubbles", "flattened_bubbles", 0.2),
        ("healed_fractures", "join_plane", 0.01),
        // Tubes and drawn-out bubbles or fine needles are told apart by their straight even sides: judgement.
        ("elongated_bubbles", "growth_tubes", 0.08),
        ("growth_tubes", "elongated_bubbles", 0.05),
        ("needles_silk", "growth_tubes", 0.05),
        ("growth_tubes", "needles_silk", 0.1),
    ];

    /// <summary>The magnification words the examiner may look for: the batch format's vocabulary as the benchmark knows it.</summary>
    public static IReadOnlyList<string> Words { get; } = [.. Conspicuity.Keys];

    /// <summary>
    /// The chance that an examiner who looks for a feature the stone holds sees it. The mount hides girdle features
    /// almost always (an opal doublet set with covered sides is "extremely difficult, even for an expert":
    /// balisilver925.com) and the rest now and then; inside an opaque stone only surface and girdle features show.
    /// </summary>
    public static double Sighting(string word, bool microscope, bool mounted, bool opaque, double extent)
    {
        var (withMicroscope, withLoupe, place) = Conspicuity[word];
        double p = microscope ? withMicroscope : withLoupe;
        if (mounted) p *= place == Place.Girdle ? 0.3 : 0.8;
        if (opaque && place == Place.Inside) p *= 0.1;
        return Math.Min(MostLikelySighting, p * extent);
    }

    /// <summary>The chance of writing a feature as seen though the stone does not hold it, given what it does hold (word → extent).</summary>
    public static double FalseSighting(string word, IReadOnlyDictionary<string, double> held, bool microscope, bool mounted, bool opaque)
    {
        double none = 1 - StraySighting;
        foreach (var (from, to, chance) in LookAlikes)
            if (to == word && held.TryGetValue(from, out double extent))
                none *= 1 - chance * Sighting(from, microscope, mounted, opaque, extent);
        return 1 - none;
    }
}
