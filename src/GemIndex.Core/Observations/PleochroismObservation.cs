namespace GemIndex.Core.Observations;

/// <summary>What a dichroscope shows: how many body colours are seen.</summary>
public enum PleochroismObservation
{
    /// <summary>One colour in every direction.</summary>
    None,

    /// <summary>Two colours.</summary>
    Dichroic,

    /// <summary>Three colours (biaxial materials only).</summary>
    Trichroic,
}
