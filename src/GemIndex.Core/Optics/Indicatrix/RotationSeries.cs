using GemIndex.Core.Quantities;

namespace GemIndex.Core.Optics.Indicatrix;

/// <summary>
/// A simulated refractometer rotation series: the two shadow edges of one facet at successive rotations
/// of the direction of travel (see <see cref="Indicatrix.Section"/> for the model and the reference direction).
/// </summary>
public static class RotationSeries
{
    /// <summary>Smallest rotation step accepted, degrees.</summary>
    public const double MinimumStepDegrees = 0.01;

    /// <summary>Largest rotation step accepted, degrees.</summary>
    public const double MaximumStepDegrees = 90;

    /// <summary>
    /// The sections at rotations 0°, step, 2·step, … below 180° (180° repeats 0°: a section depends only
    /// on the line of travel, not its sense).
    /// </summary>
    /// <exception cref="ArgumentNullException"><paramref name="indicatrix"/> is null.</exception>
    /// <exception cref="QuantityOutOfRangeException">
    /// The step is outside 0.01°–90°, or <paramref name="facetNormal"/> is <c>default</c>.
    /// </exception>
    public static IReadOnlyList<IndicatrixSection> Simulate(Indicatrix indicatrix, Direction facetNormal, Angle step)
    {
        ArgumentNullException.ThrowIfNull(indicatrix);
        QuantityOutOfRangeException.ThrowIfOutside("rotation step", step.Degrees, MinimumStepDegrees, MaximumStepDegrees, "°");
        // Counting steps (not adding the step repeatedly) keeps the rotations free of accumulated rounding.
        int count = (int)Math.Ceiling(180 / step.Degrees - 1e-9);
        var rotations = new Angle[count];
        for (int i = 0; i < count; i++) rotations[i] = Angle.FromDegrees(i * step.Degrees);
        return Simulate(indicatrix, facetNormal, rotations);
    }

    /// <summary>The sections at the given rotations, in the order given.</summary>
    /// <exception cref="ArgumentNullException"><paramref name="indicatrix"/> or <paramref name="rotations"/> is null.</exception>
    /// <exception cref="QuantityOutOfRangeException"><paramref name="facetNormal"/> is <c>default</c>.</exception>
    public static IReadOnlyList<IndicatrixSection> Simulate(Indicatrix indicatrix, Direction facetNormal, IEnumerable<Angle> rotations)
    {
        ArgumentNullException.ThrowIfNull(indicatrix);
        ArgumentNullException.ThrowIfNull(rotations);
        return rotations.Select(rotation => indicatrix.Section(facetNormal, rotation)).ToArray();
    }
}
