using System.Globalization;

namespace GemIndex.Core.Quantities;

/// <summary>
/// A mass with its standard uncertainty, stored in grams; 0 to 100 kg. The metric carat is exactly 0.2 g
/// (adopted by the CGPM in 1907). <c>default</c> is 0 g.
/// </summary>
public readonly record struct Mass
{
    /// <summary>Grams in one metric carat (CGPM 1907).</summary>
    public const double GramsPerCarat = 0.2;

    private Mass(double grams, double uncertaintyGrams)
    {
        QuantityOutOfRangeException.ThrowIfOutside("mass", grams, 0, 100_000, "g");
        QuantityOutOfRangeException.ThrowIfOutside("mass uncertainty", uncertaintyGrams, 0, 1000, "g");
        Grams = grams;
        StandardUncertaintyGrams = uncertaintyGrams;
    }

    /// <summary>The mass in grams.</summary>
    public double Grams { get; }

    /// <summary>Standard uncertainty (k = 1) in grams.</summary>
    public double StandardUncertaintyGrams { get; }

    /// <summary>The mass in metric carats.</summary>
    public double Carats => Grams / GramsPerCarat;

    /// <summary>Standard uncertainty (k = 1) in carats.</summary>
    public double StandardUncertaintyCarats => StandardUncertaintyGrams / GramsPerCarat;

    /// <summary>A mass from grams.</summary>
    public static Mass FromGrams(double grams, double standardUncertaintyGrams = 0) => new(grams, standardUncertaintyGrams);

    /// <summary>The most a mass in carats may be (a judgement: beyond any stone weighed on a gem balance).</summary>
    public const double MaximumCarats = 500_000;

    /// <summary>A mass from metric carats.</summary>
    public static Mass FromCarats(double carats, double standardUncertaintyCarats = 0)
    {
        QuantityOutOfRangeException.ThrowIfOutside("mass", carats, 0, MaximumCarats, "ct");
        QuantityOutOfRangeException.ThrowIfOutside("mass uncertainty", standardUncertaintyCarats, 0, 5000, "ct");
        return new(carats * GramsPerCarat, standardUncertaintyCarats * GramsPerCarat);
    }

    /// <inheritdoc />
    public override string ToString() => Carats.ToString("0.####", CultureInfo.InvariantCulture) + " ct";
}
