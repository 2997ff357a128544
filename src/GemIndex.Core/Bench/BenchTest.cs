namespace GemIndex.Core.Bench;

/// <summary>The bench tests, each with one wire word and one display phrase in <see cref="BenchTestWords"/>.</summary>
public enum BenchTest
{
    /// <summary>Refractometer readings.</summary>
    Refractometer,
    /// <summary>Specific gravity (hydrostatic weighing or typed).</summary>
    SpecificGravity,
    /// <summary>Heavy liquids.</summary>
    HeavyLiquids,
    /// <summary>Crossed polarisers.</summary>
    Polariscope,
    /// <summary>Dichroscope.</summary>
    Pleochroism,
    /// <summary>Dispersion (fire).</summary>
    Dispersion,
    /// <summary>Heat-conduction probe.</summary>
    ThermalProbe,
    /// <summary>Electrical conductivity tester.</summary>
    Electrical,
    /// <summary>Reflectance meter.</summary>
    Reflectance,
    /// <summary>Long-wave UV lamp.</summary>
    UvLong,
    /// <summary>Short-wave UV lamp.</summary>
    UvShort,
    /// <summary>Hand spectroscope.</summary>
    Absorption,
    /// <summary>Body colour.</summary>
    Colour,
    /// <summary>Loupe or microscope.</summary>
    Magnification,
}
