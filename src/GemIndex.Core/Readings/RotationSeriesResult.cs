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

    /// <summary>
    /// The rotation angles of the steps that showed only a low edge, well below the high edges of the other steps: the
    /// high edge lay past the liquid there (or went unread); their low edges count, and the highest index is read as
    /// above the liquid (<see cref="RotationSeriesAnalysis.ReadAgainst(RotationSeriesResult, double)"/>).
    /// </summary>
    public IReadOnlyList<double> HighHiddenAtDegrees { get; init; } = [];

    /// <summary>The highest high edge read at any step (calibrated), or null when none was read.</summary>
    public double? HighestHighRead { get; init; }

    /// <summary>
    /// How far below the liquid the highest high edge read may lie for the unseen ones to be taken as past the liquid:
    /// 0.02, about what a high edge moves between steps 30° apart in a stone of birefringence 0.04 (a judgement,
    /// docs/ranking.md §1, "A high edge past the liquid at some steps"). Farther below, an unseen high edge was
    /// missed, not hidden by the liquid.
    /// </summary>
    public const double HiddenHighReach = 0.02;

    /// <summary>True when the high edge went unseen at some steps and the liquid is what hid it (<see cref="HiddenHighReach"/>).</summary>
    public bool HighHiddenBy(double liquidLimit) => HighHiddenAtDegrees.Count > 0 && HighestHighRead is { } high && high >= liquidLimit - HiddenHighReach;
}
