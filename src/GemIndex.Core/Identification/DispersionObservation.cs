using GemIndex.Core.Observations;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Identification;

/// <summary>Dispersion as judged by eye, or measured as the indices at the Fraunhofer B and G lines.</summary>
public sealed record DispersionObservation
{
    private DispersionObservation(DispersionStrength? seen, double? indexAtB, double? indexAtG)
    {
        Seen = seen;
        IndexAtB = indexAtB;
        IndexAtG = indexAtG;
    }

    /// <summary>The strength seen, when judged by eye.</summary>
    public DispersionStrength? Seen { get; }

    /// <summary>nB (686.7 nm), when measured.</summary>
    public double? IndexAtB { get; }

    /// <summary>nG (430.8 nm), when measured.</summary>
    public double? IndexAtG { get; }

    /// <summary>nG − nB, when measured.</summary>
    public double? Measured => IndexAtG - IndexAtB;

    /// <summary>Dispersion judged by eye.</summary>
    public static DispersionObservation ByEye(DispersionStrength strength) => new(strength, null, null);

    /// <summary>Dispersion from the indices at B and G; nG must not be below nB (normal dispersion) by more than 0.002.</summary>
    public static DispersionObservation FromIndices(double indexAtB, double indexAtG)
    {
        QuantityOutOfRangeException.ThrowIfOutside("nB", indexAtB, 1, 4);
        QuantityOutOfRangeException.ThrowIfOutside("nG", indexAtG, indexAtB - 0.002, Math.Min(4, indexAtB + 0.5));
        return new(null, indexAtB, indexAtG);
    }
}
