using GemIndex.Core.Gravity;
using GemIndex.Core.Magnification;
using GemIndex.Core.Observations;

namespace GemIndex.Core.Identification;

/// <summary>
/// Everything observed on one stone. Every test is optional: a null field is a test not done (and so a
/// candidate for the next test to suggest).
/// </summary>
public sealed record BenchSheet
{
    /// <summary>The stone's reference.</summary>
    public string Id { get; init; } = "";

    /// <summary>Refractometer readings.</summary>
    public RefractometerObservation? Refractometer { get; init; }

    /// <summary>Specific gravity with its standard uncertainty (direct or from hydrostatic weighing).</summary>
    public SpecificGravity? SpecificGravity { get; init; }

    /// <summary>Heavy-liquid results (bounds on SG).</summary>
    public IReadOnlyList<HeavyLiquidResult> HeavyLiquids { get; init; } = [];

    /// <summary>Reaction between crossed polarisers.</summary>
    public PolariscopeReaction? Polariscope { get; init; }

    /// <summary>Colours seen in the dichroscope.</summary>
    public PleochroismObservation? Pleochroism { get; init; }

    /// <summary>Dispersion, by eye or measured.</summary>
    public DispersionObservation? Dispersion { get; init; }

    /// <summary>Heat-conduction probe.</summary>
    public ThermalProbeResult? ThermalProbe { get; init; }

    /// <summary>Electrical conductivity tester.</summary>
    public ElectricalResult? Electrical { get; init; }

    /// <summary>A reflectance meter's reading, with the index it gives.</summary>
    public ReflectanceReading? Reflectance { get; init; }

    /// <summary>Long-wave UV (365 nm) fluorescence.</summary>
    public FluorescenceStrength? UvLong { get; init; }

    /// <summary>Short-wave UV (254 nm) fluorescence.</summary>
    public FluorescenceStrength? UvShort { get; init; }

    /// <summary>Lines or band centres seen in a hand spectroscope, nm; empty = looked and saw none; null = not looked.</summary>
    public IReadOnlyList<double>? AbsorptionLinesNanometres { get; init; }

    /// <summary>The body colour in a plain word or two ("blue", "greenish yellow").</summary>
    public string? Colour { get; init; }

    /// <summary>What was looked for under magnification; null when nothing was.</summary>
    public MagnificationObservation? Magnification { get; init; }

    /// <summary>How the stone is cut; a faceted cut puts the star and the cat's-eye among the features not seen (<see cref="Magnification"/>).</summary>
    public StoneCut? Cut { get; init; }

    /// <summary>How much light passes through the stone; an opaque stone is advised no test in transmitted light.</summary>
    public StoneTransparency? Transparency { get; init; }

    /// <summary>True when the sheet holds at least one test's reading (colour and magnification aside).</summary>
    public bool HasTestReadings => Refractometer is not null || SpecificGravity is not null || HeavyLiquids.Count > 0 || Polariscope is not null
        || Pleochroism is not null || Dispersion is not null || ThermalProbe is not null || Electrical is not null || Reflectance is not null || UvLong is not null
        || UvShort is not null || AbsorptionLinesNanometres is not null;

    /// <summary>
    /// True when the sheet holds nothing at all to rank by: no test's reading, no colour, no look under magnification (a
    /// cut alone, faceted or not, is none: it only rules out the star and cat's-eye varieties).
    /// </summary>
    public bool IsEmpty => !HasTestReadings && Colour is null && Magnification is not { AnyLooked: true };
}
