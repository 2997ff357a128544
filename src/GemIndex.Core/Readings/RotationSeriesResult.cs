using GemIndex.Core.Optics.Indicatrix;

namespace GemIndex.Core.Readings;

/// <summary>What a rotation series says: its interpretations (weights sum to 1) and any likely misreadings.</summary>
public sealed record RotationSeriesResult
{
    /// <summary>The optic character when the series fixes it; null when undetermined (see <see cref="UndeterminedReason"/>).</summary>
    public OpticCharacter? Character { get; init; }

    /// <summary>
    /// Every biaxial reading of the series has β within the edges' resolution of α or γ (<see cref="SeriesInterpretation.LooksUniaxial"/>):
    /// the series cannot tell a biaxial crystal from a uniaxial one, and the bench calls it uniaxial.
    /// </summary>
    public bool BiaxialLooksUniaxial { get; init; }

    /// <summary>
    /// The posterior share of biaxial readings with 2V near 0° shown with the uniaxial reading of their sign (β at α: positive;
    /// β at γ: negative), when other biaxial readings remain apart; zero otherwise. A display's choice: the numbers are the
    /// section model's.
    /// </summary>
    public (double Positive, double Negative) NearZeroBiaxialShown { get; init; }

    /// <summary>Why the character could not be fixed, or empty.</summary>
    public string UndeterminedReason { get; init; } = "";

    /// <summary>Every interpretation the readings allow, weighted.</summary>
    public required IReadOnlyList<SeriesInterpretation> Interpretations { get; init; }

    /// <summary>Likely misreadings, each naming its step ("step at 90°: low edge 1.560 …").</summary>
    public IReadOnlyList<string> Misreadings { get; init; } = [];

    /// <summary>The largest gap between rotation steps over a half turn, degrees (180 for a single step).</summary>
    public double LargestGapDegrees { get; init; }
}
