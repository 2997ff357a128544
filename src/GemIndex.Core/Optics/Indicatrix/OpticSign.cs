namespace GemIndex.Core.Optics.Indicatrix;

/// <summary>Optic sign of a doubly refractive material.</summary>
public enum OpticSign
{
    /// <summary>No sign: isotropic, amorphous or aggregate.</summary>
    None,

    /// <summary>Uniaxial ε &gt; ω; biaxial γ − β &gt; β − α (2Vz &lt; 90°).</summary>
    Positive,

    /// <summary>Uniaxial ε &lt; ω; biaxial γ − β &lt; β − α (2Vz &gt; 90°).</summary>
    Negative,

    /// <summary>A material whose sign varies with composition (2V near 90°).</summary>
    Either,
}
