namespace GemIndex.Core.Identification;

/// <summary>What the stone did in the liquid.</summary>
public enum HeavyLiquidOutcome
{
    /// <summary>Rises: SG below the liquid's density.</summary>
    Floats,

    /// <summary>Sinks: SG above the liquid's density.</summary>
    Sinks,

    /// <summary>Stays where it is put: SG about equal to the liquid's density.</summary>
    Suspends,
}
