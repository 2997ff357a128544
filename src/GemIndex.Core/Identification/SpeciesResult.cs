using GemIndex.Core.Catalogue;

namespace GemIndex.Core.Identification;

/// <summary>
/// One species' share of the answer: its total probability over every catalogue entry of the species (not only
/// the candidates shown), and how that total splits among its origins (natural, synthetic, treated, …).
/// </summary>
public sealed record SpeciesResult
{
    /// <summary>The species (or, for a man-made material, the trade's plain name).</summary>
    public required string Species { get; init; }

    /// <summary>Posterior probability that the stone is of this species (0–1).</summary>
    public required double Confidence { get; init; }

    /// <summary>The species' total split by origin; the shares add up to <see cref="Confidence"/>.</summary>
    public required IReadOnlyDictionary<OriginClass, double> Origins { get; init; }

    /// <summary>The mineral group the species belongs to (<see cref="Material.MineralGroup"/>), or null.</summary>
    public string? MineralGroup { get; init; }
}
