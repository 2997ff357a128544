using GemIndex.Core.Quantities;

namespace GemIndex.Core.Gravity;

/// <summary>
/// A heavy-liquid test: a stone floats, stays suspended or sinks in a liquid whose density is given as a
/// specific gravity (DOMAIN.md §5). The result bounds the stone's SG (censored evidence), given as the
/// interval [<see cref="LowestSpecificGravity"/>, <see cref="HighestSpecificGravity"/>]; open ends are
/// the limits <see cref="SpecificGravity"/> accepts. <c>default</c> is not a result and must not be used.
/// </summary>
public readonly record struct HeavyLiquidResult
{
    /// <summary>
    /// Half-width of the SG interval of a suspended stone when the liquid's density has no larger
    /// uncertainty: 0.01 (common practice: a suspension matches the liquid to about the second decimal,
    /// the precision to which heavy liquids are usually known and kept).
    /// </summary>
    public const double SuspendedTolerance = 0.01;

    /// <summary>
    /// The densities a heavy liquid for gem testing can have: from water (1.00) to the densest, Clerici solution, about
    /// 4.2 at room temperature (common practice; 4.3 leaves room for a warm one). A "liquid" outside is a typing slip.
    /// </summary>
    public const double LightestLiquid = 1.0, DensestLiquid = 4.3;

    /// <summary>A result from the liquid's density as typed and what the stone did (the density checked first, as a liquid's).</summary>
    /// <exception cref="QuantityOutOfRangeException">The density lies outside <see cref="LightestLiquid"/>–<see cref="DensestLiquid"/>.</exception>
    public static HeavyLiquidResult Of(double density, HeavyLiquidOutcome outcome)
    {
        QuantityOutOfRangeException.ThrowIfOutside("heavy liquid density", density, LightestLiquid, DensestLiquid);
        return new HeavyLiquidResult(new SpecificGravity(density), outcome);
    }

    /// <summary>A result from the liquid's density and what the stone did.</summary>
    /// <exception cref="QuantityOutOfRangeException"><paramref name="liquid"/> lies outside <see cref="LightestLiquid"/>–<see cref="DensestLiquid"/> (or is <c>default</c>, SG 0).</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="outcome"/> is not a defined outcome.</exception>
    public HeavyLiquidResult(SpecificGravity liquid, HeavyLiquidOutcome outcome)
    {
        QuantityOutOfRangeException.ThrowIfOutside("heavy liquid density", liquid.Value, LightestLiquid, DensestLiquid);
        if (!Enum.IsDefined(outcome))
            throw new ArgumentOutOfRangeException(nameof(outcome), outcome, "heavy liquid outcome must be floats, suspends or sinks.");
        Liquid = liquid;
        Outcome = outcome;
    }

    /// <summary>The liquid's density, as a specific gravity (relative to water at 4 °C).</summary>
    public SpecificGravity Liquid { get; }

    /// <summary>What the stone did.</summary>
    public HeavyLiquidOutcome Outcome { get; }

    /// <summary>
    /// Half-width of the interval for a suspended stone: the larger of <see cref="SuspendedTolerance"/>
    /// and the liquid's standard uncertainty.
    /// </summary>
    public double Tolerance => Math.Max(SuspendedTolerance, Liquid.StandardUncertainty);

    /// <summary>
    /// The lowest SG the result allows: <see cref="SpecificGravity.Minimum"/> when it floats, the liquid's
    /// SG when it sinks, liquid − <see cref="Tolerance"/> when suspended (not below the minimum).
    /// </summary>
    public double LowestSpecificGravity => Outcome switch
    {
        HeavyLiquidOutcome.Floats => SpecificGravity.Minimum,
        HeavyLiquidOutcome.Sinks => Liquid.Value,
        _ => Math.Max(SpecificGravity.Minimum, Liquid.Value - Tolerance),
    };

    /// <summary>
    /// The highest SG the result allows: the liquid's SG when it floats, <see cref="SpecificGravity.Maximum"/>
    /// when it sinks, liquid + <see cref="Tolerance"/> when suspended (not above the maximum).
    /// </summary>
    public double HighestSpecificGravity => Outcome switch
    {
        HeavyLiquidOutcome.Floats => Liquid.Value,
        HeavyLiquidOutcome.Sinks => SpecificGravity.Maximum,
        _ => Math.Min(SpecificGravity.Maximum, Liquid.Value + Tolerance),
    };

    /// <summary>
    /// Whether a stone of <paramref name="specificGravity"/> would behave this way: floats needs SG below
    /// the liquid, sinks SG above it (strict), suspends SG within ± <see cref="Tolerance"/> (inclusive).
    /// </summary>
    public bool Allows(SpecificGravity specificGravity) => Outcome switch
    {
        HeavyLiquidOutcome.Floats => specificGravity.Value < Liquid.Value,
        HeavyLiquidOutcome.Sinks => specificGravity.Value > Liquid.Value,
        _ => Math.Abs(specificGravity.Value - Liquid.Value) <= Tolerance,
    };

    /// <summary>
    /// What several results say of the SG together, in words: "above 3.32", "below 2.89", "between 2.89 and 3.05",
    /// "about 3.32" (suspends), or null when they contradict each other (no SG meets them all) or there are none.
    /// </summary>
    public static string? Together(IReadOnlyList<HeavyLiquidResult> results)
    {
        if (results.Count == 0) return null;
        double low = results.Max(r => r.LowestSpecificGravity), high = results.Min(r => r.HighestSpecificGravity);
        if (low > high) return null;
        static string F(double x) => x.ToString("0.00", System.Globalization.CultureInfo.InvariantCulture);
        foreach (var r in results)
            if (r.Outcome == HeavyLiquidOutcome.Suspends) return $"about {F(r.Liquid.Value)}";
        bool bottom = low <= SpecificGravity.Minimum, top = high >= SpecificGravity.Maximum;
        return bottom && top ? null : bottom ? $"below {F(high)}" : top ? $"above {F(low)}" : $"between {F(low)} and {F(high)}";
    }
}
