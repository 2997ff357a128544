using GemIndex.Core.Catalogue;
using GemIndex.Core.Optics.Indicatrix;

namespace GemIndex.Cli.CommandLine;

/// <summary>
/// The filters of <c>catalogue list</c>: an index matches when it lies within tolerance of any principal-index
/// range (n, ω, ε, α, β or γ), an SG when within tolerance of the SG range; absent filters match everything.
/// </summary>
internal sealed record CatalogueFilter(double? Index, double IndexTolerance, double? SpecificGravity, double SpecificGravityTolerance, OpticCharacter? Character)
{
    public bool Matches(Material m) =>
        (Index is not { } n || m.Indices.Named().Any(x => Near(x.Range, n, IndexTolerance)))
        && (SpecificGravity is not { } sg || Near(m.SpecificGravity, sg, SpecificGravityTolerance))
        && (Character is not { } c || m.OpticCharacter == c);

    private static bool Near(PropertyRange range, double value, double tolerance) =>
        value >= range.Minimum - tolerance && value <= range.Maximum + tolerance;
}
