namespace GemIndex.Core.Observations;

/// <summary>What a stone does between crossed polarisers as it is turned.</summary>
public enum PolariscopeReaction
{
    /// <summary>Stays dark all the way round: isotropic or amorphous.</summary>
    SinglyRefractive,

    /// <summary>Light and dark four times a turn: a single crystal, doubly refractive.</summary>
    DoublyRefractive,

    /// <summary>Stays light all the way round: a polycrystalline aggregate.</summary>
    Aggregate,

    /// <summary>Anomalous double refraction: patchy, banded or tartan extinction from strain.</summary>
    Anomalous,
}
