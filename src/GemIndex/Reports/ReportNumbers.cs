using System.Globalization;

namespace GemIndex.Cli.Reports;

/// <summary>Every number a report prints, in the invariant culture and with its unit, formatted in this one place.</summary>
internal static class ReportNumbers
{
    /// <summary>A refractive index to the refractometer's printed precision: 1.544.</summary>
    public static string Index(double value) => Fixed(value, "0.000");

    /// <summary>A spot reading as read, to the hundredth (a third decimal only when one was typed): 1.61.</summary>
    public static string SpotIndex(double value) => Fixed(value, "0.00#");

    /// <summary>A specific gravity (dimensionless): 3.99.</summary>
    public static string Gravity(double value) => Fixed(value, "0.00");

    /// <summary>A mass in carats: 1.27 ct.</summary>
    public static string Carats(double value) => Fixed(value, "0.00#") + " ct";

    /// <summary>A weighing on the hydrostatic balance, to its thousandth: 1.520 ct beside 1.258 ct.</summary>
    public static string WeighedCarats(double value) => Fixed(value, "0.000") + " ct";

    /// <summary>An angle of rotation: 45°.</summary>
    public static string Degrees(double value) => Fixed(value, "0.#") + "°";

    /// <summary>A wavelength: 589.3 nm.</summary>
    public static string Nanometres(double value) => Fixed(value, "0.#") + " nm";

    /// <summary>A temperature: 20 °C.</summary>
    public static string Celsius(double value) => Fixed(value, "0.#") + " °C";

    /// <summary>A density of a heavy liquid: 3.32 g/cm³.</summary>
    public static string Density(double value) => Fixed(value, "0.00") + " g/cm³";

    /// <summary>
    /// A probability as a number column writes it, as the result document does (<see cref="Identification.ResultDocument.Probability"/>):
    /// rounded down to four decimals, so that no share short of certain reads 1 (0.99996 is 0.9999, not 1.000).
    /// </summary>
    public static string Probability(double value) => Fixed(Identification.ResultDocument.Probability(value), "0.0000");

    /// <summary>A value with its standard uncertainty, both to the same format: 2.650 ± 0.010.</summary>
    public static string WithUncertainty(double value, double standardUncertainty, string format) =>
        $"{Fixed(value, format)} ± {Fixed(standardUncertainty, format)}";

    /// <summary>The smallest probability <see cref="Percent"/> writes as a number (0.1 %, rounded); below it, "&lt;0.1 %".</summary>
    public const double SmallestShown = GemIndex.Core.Identification.LeadingCandidates.ListedShare;

    /// <summary>
    /// A probability (0–1) as a percentage, the one percent format of text, Markdown and HTML: 87.3 %. Bench readings
    /// never make a material certain or impossible, so a probability above 0 that would round to 0.0 % is given as
    /// "&lt;0.1 %", and one that would round to 100.0 % as "&gt;99.9 %", even where the rest underflowed to nothing.
    /// </summary>
    public static string Percent(double probability) => probability switch
    {
        > 0 and < SmallestShown => "<0.1 %",
        >= 0.9995 => ">99.9 %",
        _ => Fixed(probability * 100, "0.0") + " %",
    };

    /// <summary>A probability in whole percent, for narrow screens: 93%.</summary>
    public static string WholePercent(double probability) => Fixed(probability * 100, "0") + "%";

    /// <summary>An information quantity: 1.25 bits.</summary>
    public static string Bits(double value) => Fixed(value, "+0.00;-0.00;0.00") + " bits";

    /// <summary>A plain number with the given format, invariant culture.</summary>
    public static string Fixed(double value, string format) => value.ToString(format, CultureInfo.InvariantCulture);
}
