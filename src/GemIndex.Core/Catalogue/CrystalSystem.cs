namespace GemIndex.Core.Catalogue;

/// <summary>The crystal system, or none for amorphous materials.</summary>
public enum CrystalSystem
{
    /// <summary>Cubic (isometric).</summary>
    Cubic,

    /// <summary>Tetragonal.</summary>
    Tetragonal,

    /// <summary>Hexagonal.</summary>
    Hexagonal,

    /// <summary>Trigonal.</summary>
    Trigonal,

    /// <summary>Orthorhombic.</summary>
    Orthorhombic,

    /// <summary>Monoclinic.</summary>
    Monoclinic,

    /// <summary>Triclinic.</summary>
    Triclinic,

    /// <summary>No crystal structure (glass, opal, amber, plastic).</summary>
    Amorphous,
}
