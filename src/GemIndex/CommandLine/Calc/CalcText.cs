using System.Globalization;
using GemIndex.Core.Optics;
using GemIndex.Core.Quantities;

namespace GemIndex.Cli.CommandLine.Calc;

/// <summary>How the <c>calc</c> commands write numbers: invariant culture, a unit (or "(no unit)") on each.</summary>
internal static class CalcText
{
    public const string NoUnit = "(no unit)";

    public static string Fixed(double value, string format) => value.ToString(format, CultureInfo.InvariantCulture);

    public static string Index(double value) => Fixed(value, "0.0000");

    public static string Index(RefractiveIndex index) => index.StandardUncertainty == 0
        ? Index(index.Value)
        : $"{Index(index.Value)} ± {Index(index.StandardUncertainty)}";

    public static string Degrees(double degrees) => Fixed(degrees, "0.00") + "°";

    public static string Degrees(Angle angle) => angle.StandardUncertaintyRadians == 0
        ? Degrees(angle.Degrees)
        : $"{Degrees(angle.Degrees)} ± {Degrees(angle.StandardUncertaintyDegrees)}";

    public static string Percent(double fraction) => Fixed(fraction * 100, "0.000") + " %";

    public static string Nanometres(double nanometres) => Fixed(nanometres, "0.##") + " nm";

    public static string Carats(double carats) => Fixed(carats, "0.####") + " ct";

    public static string Grams(double grams) => Fixed(grams, "0.#####") + " g";
}
