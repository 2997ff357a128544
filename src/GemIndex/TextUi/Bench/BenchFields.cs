using GemIndex.Core.Bench;

namespace GemIndex.Cli.TextUi.Bench;

/// <summary>
/// The names of the bench form's fields. Reading fields are Core's <see cref="BenchField"/> names, so an error from
/// <see cref="BenchReader"/> lands on the field it names; the description fields are the form's own.
/// </summary>
internal static class BenchFields
{
    public const string Reference = "reference";
    public const string Weight = "weight_ct";
    public const string Dimensions = "dimensions";
    public const string Shape = "shape";
    public const string CuttingStyle = "cutting_style";
    public const string Colour = BenchField.Colour;
    public const string Cut = BenchField.Cut;
    public const string Transparency = "transparency";
    public const string Notes = "notes";

    /// <summary>Who examines the stones of this workbook: a bench setting (kept across stones, stored in the workbook), printed in every exported report.</summary>
    public const string Examiner = Reports.ReportHeader.ExaminerSetting;

    public const string Spot = BenchField.Spot;
    public const string OverLimit = BenchField.OverLimit;
    public const string LiquidLimit = BenchField.LiquidLimit;
    public const string LightNm = BenchField.LightNm;
    public const string Precision = BenchField.Precision;
    public const string CalibrationOffset = BenchField.CalibrationOffset;

    public const string Sg = BenchField.Sg;
    public const string AirCt = BenchField.AirCt;
    public const string WaterCt = BenchField.WaterCt;
    public const string WaterC = BenchField.WaterC;
    public const string HeavyLiquids = BenchField.HeavyLiquids;

    public const string Polariscope = BenchField.Polariscope;
    public const string Pleochroism = BenchField.Pleochroism;
    public const string Dispersion = BenchField.Dispersion;
    public const string IndexAtB = BenchField.IndexAtB;
    public const string IndexAtG = BenchField.IndexAtG;
    public const string ThermalProbe = BenchField.ThermalProbe;
    public const string Electrical = BenchField.Electrical;
    public const string Reflectance = BenchField.Reflectance;
    public const string UvLong = BenchField.UvLong;
    public const string UvShort = BenchField.UvShort;
    public const string Absorption = BenchField.Absorption;

    public const string FeaturesPresent = BenchField.FeaturesPresent;
    public const string FeaturesAbsent = BenchField.FeaturesAbsent;

    /// <summary>The key of one rotation step's row.</summary>
    public static string Step(int index) => BenchField.Step(index);

    /// <summary>The pages as the page bar names them, in its order: stone, refractometer, SG, tests, loupe.</summary>
    public static IReadOnlyList<string> PageNames { get; } = ["F2 Stone", "F3 RI", "F4 SG", "F5 Tests", "^L Loupe"];

    /// <summary>The page key and name that holds a field, as the page bar shows it ("F4 SG"), for words that send the user there.</summary>
    public static string PageOf(string field) => PageNames[field switch
    {
        _ when field.StartsWith(BenchField.Readings, StringComparison.Ordinal) => 1,
        Reference or Weight or Dimensions or Shape or CuttingStyle or Colour or Cut or Transparency or Notes or Examiner => 0,
        Spot or OverLimit or LiquidLimit or LightNm or Precision or CalibrationOffset or BenchField.Method or TextUi.Bench.RefractometerPage.RotationStepField => 1,
        Sg or AirCt or WaterCt or WaterC or HeavyLiquids => 2,
        FeaturesPresent or FeaturesAbsent => 4,
        _ => 3,
    }];
}
