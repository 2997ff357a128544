namespace GemIndex.Core.Gravity;

/// <summary>What a stone does in a heavy liquid of known density.</summary>
public enum HeavyLiquidOutcome
{
    /// <summary>It rises to the surface: its SG is below the liquid's.</summary>
    Floats,

    /// <summary>It stays where it is put: its SG matches the liquid's.</summary>
    Suspends,

    /// <summary>It sinks to the bottom: its SG is above the liquid's.</summary>
    Sinks,
}
