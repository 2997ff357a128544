using GemIndex.Core.Optics;
using GemIndex.Core.Optics.Indicatrix;

namespace GemIndex.Core.Readings;

/// <summary>
/// One reading of a rotation series: an optic character (or none, when the series cannot tell) with the
/// principal indices it implies, and its weight among the other interpretations of the same series.
/// Indices are at the reading's wavelength with the calibration offset applied.
/// </summary>
public sealed record SeriesInterpretation
{
    /// <summary>Isotropic, uniaxial or biaxial; null when the series is too short to tell (only the partial bounds apply).</summary>
    public OpticCharacter? Character { get; init; }

    /// <summary>Weight of this interpretation among those of the series (they sum to 1).</summary>
    public double Weight { get; init; } = 1;

    /// <summary>Optic sign this interpretation implies (None when it does not tell).</summary>
    public OpticSign Sign { get; init; } = OpticSign.None;

    /// <summary>The single index (isotropic), or ω (uniaxial).</summary>
    public RefractiveIndex? Constant { get; init; }

    /// <summary>Lowest principal index: n, min(ω, ε) or α.</summary>
    public required RefractiveIndex Lowest { get; init; }

    /// <summary>Highest principal index: n, max(ω, ε) or γ.</summary>
    public required RefractiveIndex Highest { get; init; }

    /// <summary>β, for a biaxial interpretation.</summary>
    public RefractiveIndex? Beta { get; init; }

    /// <summary>
    /// A biaxial reading whose β lies within the edges' resolution (<see cref="SeriesObservation.EdgeResolution"/>) of α or
    /// γ: a 2V near 0°, which the same readings show as a uniaxial crystal's, so they cannot tell the two apart.
    /// </summary>
    public bool LooksUniaxial => Character == OpticCharacter.Biaxial && Beta is { } b
        && (b.Value - Lowest.Value <= SeriesObservation.EdgeResolution || Highest.Value - b.Value <= SeriesObservation.EdgeResolution);

    /// <summary>Birefringence read from the series (γ − α, |ε − ω|; the largest edge separation for a partial series).</summary>
    public required Birefringence Birefringence { get; init; }

    /// <summary>
    /// How far the series' sampling may fall short of the true extreme, as a fraction of the birefringence:
    /// sin²(g/2) for the largest gap g between rotation steps (0 for a dense series, 1 for a single step).
    /// </summary>
    public double SamplingShortfall { get; init; }

    /// <summary>
    /// The contact liquid's limit when <see cref="Highest"/> is a fitted estimate above it: no edge can be read there, so
    /// the series shows only that the index lies above the liquid (null: the highest index lies within the scale).
    /// </summary>
    public double? AboveLiquidLimit { get; init; }

    /// <summary>
    /// The sign rests on an index the readings do not show: a biaxial reading whose γ lies above the liquid, where
    /// γ − β against β − α is open (<see cref="Sign"/> is then the fitted edge's, not a reading's).
    /// </summary>
    public bool SignOpen { get; init; }

    /// <summary>The interpretation in plain words, with numbers.</summary>
    public required string Description { get; init; }
}
