using System.Globalization;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Optics.Indicatrix;

/// <summary>
/// The two shadow edges one rotation step of a facet gives: the semi-axes of the ellipse cut from the
/// indicatrix by the plane through the facet normal perpendicular to the direction of travel (see
/// <see cref="Indicatrix.Section"/>). <see cref="Low"/> ≤ <see cref="High"/>; they are equal for an
/// isotropic indicatrix and for a circular section. Both are model values for the principal indices
/// as given and carry no uncertainty. <c>default</c> is not a section and must not be used.
/// </summary>
public readonly record struct IndicatrixSection
{
    internal IndicatrixSection(Angle rotation, Direction travel, RefractiveIndex low, RefractiveIndex high)
    {
        Rotation = rotation;
        Travel = travel;
        Low = low;
        High = high;
    }

    /// <summary>The rotation of the direction of travel from the facet's reference direction.</summary>
    public Angle Rotation { get; }

    /// <summary>The direction of travel s along the facet (the wave normal of both edges).</summary>
    public Direction Travel { get; }

    /// <summary>The lower shadow edge: the minor semi-axis of the section ellipse.</summary>
    public RefractiveIndex Low { get; }

    /// <summary>The higher shadow edge: the major semi-axis of the section ellipse.</summary>
    public RefractiveIndex High { get; }

    /// <inheritdoc />
    public override string ToString() => string.Create(CultureInfo.InvariantCulture,
        $"{Rotation}: {Low.Value:0.0000} / {High.Value:0.0000}");
}
