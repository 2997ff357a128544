namespace GemIndex.Cli.TextUi.Bench;

/// <summary>
/// The names of the bench form's fields. Reading fields use the batch format's own paths, so an error from
/// <c>StoneReadingsConverter</c> lands on the field it names.
/// </summary>
internal static class BenchFields
{
    public const string Reference = "reference";
    public const string Weight = "weight_ct";
    public const string Dimensions = "dimensions";
    public const string Shape = "shape";
    public const string CuttingStyle = "cutting_style";
    public const string Colour = "colour";
    public const string Transparency = "transparency";
    public const string Notes = "notes";

    public const string Spot = "refractometer.spot";
    public const string OverLimit = "refractometer.over_limit";
    public const string LiquidLimit = "refractometer.liquid_limit";
    public const string LightNm = "refractometer.light_nm";
    public const string Precision = "refractometer.precision";
    public const string CalibrationOffset = "refractometer.calibration_offset";

    public const string Sg = "sg";
    public const string AirCt = "sg.air_ct";
    public const string WaterCt = "sg.water_ct";
    public const string WaterC = "sg.water_c";
    public const string HeavyLiquids = "heavy_liquids";

    public const string Polariscope = "polariscope";
    public const string Pleochroism = "pleochroism";
    public const string Dispersion = "dispersion";
    public const string IndexAtB = "dispersion.nB";
    public const string IndexAtG = "dispersion.nG";
    public const string ThermalProbe = "thermal_probe";
    public const string Electrical = "electrical";
    public const string UvLong = "uv_long";
    public const string UvShort = "uv_short";
    public const string Absorption = "absorption_nm";

    /// <summary>The key of one rotation step's row.</summary>
    public static string Step(int index) => $"refractometer.readings[{index}]";
}
