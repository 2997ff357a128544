namespace GemIndex.Core.Observations;

/// <summary>The reading of a heat-conduction probe.</summary>
public enum ThermalProbeResult
{
    /// <summary>Diamond-like heat conduction (diamond, and moissanite).</summary>
    Positive,

    /// <summary>Ordinary heat conduction.</summary>
    Negative,
}
