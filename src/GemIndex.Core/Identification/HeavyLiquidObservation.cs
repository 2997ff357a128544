using GemIndex.Core.Quantities;

namespace GemIndex.Core.Identification;

/// <summary>What a stone did in a heavy liquid of known density: a bound on its SG.</summary>
public sealed record HeavyLiquidObservation
{
    /// <summary>Creates the observation; density 0.5–10 g/cm³.</summary>
    public HeavyLiquidObservation(double density, HeavyLiquidOutcome outcome)
    {
        QuantityOutOfRangeException.ThrowIfOutside("heavy liquid density", density, 0.5, 10, "g/cm³");
        Density = density;
        Outcome = outcome;
    }

    /// <summary>The liquid's density (≈ SG), g/cm³.</summary>
    public double Density { get; }

    /// <summary>Floats, sinks or stays suspended.</summary>
    public HeavyLiquidOutcome Outcome { get; }
}
