namespace GemIndex.Core.Optics.Indicatrix;

/// <summary>How a material splits light, as the trade classes it.</summary>
public enum OpticCharacter
{
    /// <summary>Singly refractive, cubic crystal: one index.</summary>
    Isotropic,

    /// <summary>Tetragonal, hexagonal or trigonal crystal: ω and ε.</summary>
    Uniaxial,

    /// <summary>Orthorhombic, monoclinic or triclinic crystal: α, β and γ.</summary>
    Biaxial,

    /// <summary>A polycrystalline aggregate (jade, chalcedony, lapis): one vague reading, stays light between crossed polarisers.</summary>
    Aggregate,

    /// <summary>Non-crystalline (glass, opal, amber, plastic): one index, possibly with strain.</summary>
    Amorphous,
}
