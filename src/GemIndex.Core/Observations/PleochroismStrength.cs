namespace GemIndex.Core.Observations;

/// <summary>How strong a coloured material's pleochroism usually is (a catalogue property).</summary>
public enum PleochroismStrength
{
    /// <summary>None: isotropic, or colourless.</summary>
    None,

    /// <summary>Weak: easily missed.</summary>
    Weak,

    /// <summary>Moderate: seen with a dichroscope.</summary>
    Moderate,

    /// <summary>Strong: often seen with the unaided eye.</summary>
    Strong,
}
