namespace GemIndex.Core.Bench;

/// <summary>
/// The names of a stone's reading fields, shared by every front end: the batch format's paths
/// ("sg.air_ct", "refractometer.readings[2]"), the command line's options and the text UI's fields all map onto
/// these, so an error found by <see cref="BenchReader"/> names the same field everywhere.
/// </summary>
public static class BenchField
{
    /// <summary>The stone's reference.</summary>
    public const string Id = "id";

    /// <summary>The refractometer as a test (its fields are "refractometer.…").</summary>
    public const string Refractometer = "refractometer";

    /// <summary>Magnification as a test (its fields are "magnification.…").</summary>
    public const string Magnification = "magnification";
    /// <summary>"facet" or "spot"; by default spot when only a spot reading is given.</summary>
    public const string Method = "refractometer.method";
    /// <summary>A spot reading.</summary>
    public const string Spot = "refractometer.spot";
    /// <summary>No stone edge below the liquid's edge: yes or no.</summary>
    public const string OverLimit = "refractometer.over_limit";
    /// <summary>The contact liquid's index.</summary>
    public const string LiquidLimit = "refractometer.liquid_limit";
    /// <summary>The light's wavelength, nm.</summary>
    public const string LightNm = "refractometer.light_nm";
    /// <summary>Standard uncertainty of one refractometer reading.</summary>
    public const string Precision = "refractometer.precision";
    /// <summary>Added to every reading, from a calibration on a standard.</summary>
    public const string CalibrationOffset = "refractometer.calibration_offset";
    /// <summary>The rotation series as a whole (for errors about all steps, such as their number).</summary>
    public const string Readings = "refractometer.readings";
    /// <summary>SG typed directly.</summary>
    public const string Sg = "sg";
    /// <summary>Hydrostatic weighing: weight in air, carats.</summary>
    public const string AirCt = "sg.air_ct";
    /// <summary>Hydrostatic weighing: weight in water, carats.</summary>
    public const string WaterCt = "sg.water_ct";
    /// <summary>Hydrostatic weighing: water temperature, °C.</summary>
    public const string WaterC = "sg.water_c";
    /// <summary>Heavy-liquid results, "DENSITY RESULT" entries separated by semicolons (<see cref="BenchSyntax"/>).</summary>
    public const string HeavyLiquids = "heavy_liquids";
    /// <summary>Reaction between crossed polarisers.</summary>
    public const string Polariscope = "polariscope";
    /// <summary>Colours seen in the dichroscope.</summary>
    public const string Pleochroism = "pleochroism";
    /// <summary>Dispersion judged by eye.</summary>
    public const string Dispersion = "dispersion";
    /// <summary>Dispersion measured: index at the B line.</summary>
    public const string IndexAtB = "dispersion.nB";
    /// <summary>Dispersion measured: index at the G line.</summary>
    public const string IndexAtG = "dispersion.nG";
    /// <summary>Heat-conduction probe.</summary>
    public const string ThermalProbe = "thermal_probe";
    /// <summary>Electrical conductivity tester.</summary>
    public const string Electrical = "electrical";
    /// <summary>A reflectance meter's reading, percent of the light reflected at normal incidence (<see cref="Observations.ReflectanceReading"/>).</summary>
    public const string Reflectance = "reflectance_pct";
    /// <summary>Long-wave UV fluorescence.</summary>
    public const string UvLong = "uv_long";
    /// <summary>Short-wave UV fluorescence.</summary>
    public const string UvShort = "uv_short";
    /// <summary>Absorption lines, nm, or "none" (<see cref="BenchSyntax"/>).</summary>
    public const string Absorption = "absorption_nm";
    /// <summary>The body colour in plain words.</summary>
    public const string Colour = "colour";
    /// <summary>How the stone is cut (faceted, cabochon, other): a faceted stone shows no star and no cat's-eye.</summary>
    public const string Cut = "cut";
    /// <summary>How much light passes (transparent, translucent, opaque): an opaque stone cannot take the tests in transmitted light.</summary>
    public const string Transparency = "transparency";
    /// <summary>Magnification features seen: vocabulary words separated like absorption lines (<see cref="BenchSyntax"/>).</summary>
    public const string FeaturesPresent = "magnification.present";
    /// <summary>Magnification features looked for and not seen, written the same way.</summary>
    public const string FeaturesAbsent = "magnification.absent";

    /// <summary>Every single-valued field, in the order the reader reports them.</summary>
    public static IReadOnlyList<string> All { get; } =
    [
        Id, Method, Spot, OverLimit, LiquidLimit, LightNm, Precision, CalibrationOffset, Sg, AirCt, WaterCt, WaterC, HeavyLiquids,
        Polariscope, Pleochroism, Dispersion, IndexAtB, IndexAtG, ThermalProbe, Electrical, Reflectance, UvLong, UvShort, Absorption, Colour,
        Cut, Transparency, FeaturesPresent, FeaturesAbsent,
    ];

    /// <summary>The field of one rotation step (0 = the first).</summary>
    public static string Step(int index) => $"refractometer.readings[{index}]";
}
