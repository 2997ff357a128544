namespace GemIndex.Core.Observations;

/// <summary>How strongly a stone glows under a UV lamp.</summary>
public enum FluorescenceStrength
{
    /// <summary>No glow.</summary>
    Inert,

    /// <summary>A faint glow.</summary>
    Weak,

    /// <summary>A clear glow.</summary>
    Moderate,

    /// <summary>A bright glow.</summary>
    Strong,
}
