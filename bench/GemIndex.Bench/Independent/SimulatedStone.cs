namespace GemIndex.Bench.Independent;

/// <summary>A simulated stone: the truth (species, origin, principal values, SG) and what the bench wrote down.</summary>
internal sealed record SimulatedStone
{
    public required SpeciesProperties Species { get; init; }

    /// <summary>"natural", "synthetic", "treated", "imitation", "composite" or "cultured".</summary>
    public required string Origin { get; init; }

    /// <summary>The hue drawn for the stone (the colour word written, when written).</summary>
    public required string Hue { get; init; }

    /// <summary>Its magnification: method, features held and, when looked at, what was written; null when not drawn.</summary>
    public MagnificationLook? Magnification { get; init; }

    /// <summary>True principal indices along x, y, z (isotropic: all equal; uniaxial: z is the optic axis).</summary>
    public required (double X, double Y, double Z) Principal { get; init; }

    public required double SpecificGravity { get; init; }

    /// <summary>Drawn outside the published ranges on purpose (index, SG or both).</summary>
    public required bool BeyondRange { get; init; }

    public required BenchReadings Readings { get; init; }

    /// <summary>The readings as one batch line.</summary>
    public required string Line { get; init; }

    public double LowestIndex => Math.Min(Principal.X, Math.Min(Principal.Y, Principal.Z));

    public double HighestIndex => Math.Max(Principal.X, Math.Max(Principal.Y, Principal.Z));
}
