using GemIndex.Core.Catalogue;
using GemIndex.Core.Optics.Indicatrix;

namespace GemIndex.Core.Magnification;

/// <summary>
/// The doubling of facet edges and inclusions under a loupe, from the birefringence (docs/ranking.md, "Magnification",
/// doubling). Seen through a stone of depth t, a back facet edge's two images lie about t·B/n apart; a 10x loupe parts
/// them when that is a hundredth or two of a millimetre, so doubling is plain from a birefringence of about 0.02 in a
/// stone of a few millimetres (peridot, zircon, tourmaline), faint about 0.01 (quartz, corundum, topaz, which seldom show
/// it) and absent in singly refractive stones and fine aggregates (common practice). Along an optic axis there is
/// none, so the examiner turns the stone; a stone that holds it is then found doubling nearly always.
/// </summary>
public static class FacetDoubling
{
    /// <summary>Below this birefringence no doubling is seen with a loupe (a judgement from the image separation above).</summary>
    public const double Faintest = 0.004;

    /// <summary>From this birefringence doubling is plain in a stone of usual depth (common practice: about 0.02–0.025).</summary>
    public const double Plain = 0.02;

    /// <summary>The share of stones that show it once plain: a direction off the optic axis found by turning (a judgement).</summary>
    public const double HeldWhenPlain = 0.95;

    /// <summary>A crystal the catalogue lacks, in the broad model: about a third of such stones show doubling (a judgement).</summary>
    public const double UnknownCrystal = 0.3;

    /// <summary>The probability that a stone of this birefringence shows doubling: 0 to <see cref="Faintest"/>, rising linearly to <see cref="HeldWhenPlain"/> at <see cref="Plain"/>.</summary>
    public static double Held(double birefringence) =>
        HeldWhenPlain * Math.Clamp((birefringence - Faintest) / (Plain - Faintest), 0, 1);

    /// <summary>
    /// The probability for a catalogue entry, at the middle of its birefringence range; none for a singly refractive
    /// stone, an aggregate or an opaque material (no image through it).
    /// </summary>
    public static double Held(Material material) =>
        material.OpticCharacter is OpticCharacter.Uniaxial or OpticCharacter.Biaxial && !material.IsOpaque && material.Birefringence is { } b
            ? Held((b.Minimum + b.Maximum) / 2) * ((material.Forms & MaterialForm.Aggregate) != 0 ? AggregateShare : 1)
            : 0;

    /// <summary>
    /// A material met as crystals and as massive aggregates (rhodochrosite, most of it banded and massive) doubles only
    /// as a crystal: half of its stones, a judgement.
    /// </summary>
    public const double AggregateShare = 0.5;
}
