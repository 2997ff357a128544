using GemIndex.Core.Catalogue;

namespace GemIndex.Core.Identification;

/// <summary>
/// What the likelihood needs of a material that costs time to work out (its colours as hue words, its birefringence
/// range), computed once per catalogue rather than once per stone.
/// </summary>
public sealed class MaterialProfile
{
    /// <summary>Prepares the profile of one material.</summary>
    public MaterialProfile(Material material) : this(material, null) { }

    /// <summary>Prepares the profile, sharing <paramref name="prior"/> with entries of the same optical data.</summary>
    internal MaterialProfile(Material material, IndicatrixPrior? prior)
    {
        Material = material;
        ColourHues = [.. material.Colours.SelectMany(ColourWords.Hues).Where(ColourWords.KnownHues.Contains).Distinct()];
        Hues = ColourHues.ToHashSet();
        Birefringence = RefractometerEvidence.BirefringenceRange(material);
        Prior = prior ?? IndicatrixPrior.For(material, Birefringence);
    }

    /// <summary>Where its principal indices may lie, for the section model (shared among entries with the same optical data).</summary>
    internal IndicatrixPrior Prior { get; }

    /// <summary>The material.</summary>
    public Material Material { get; }

    /// <summary>Its usual colours as known hue words, most usual first.</summary>
    public IReadOnlyList<string> ColourHues { get; }

    /// <summary>Its usual colours as normalised hue words.</summary>
    public IReadOnlySet<string> Hues { get; }

    /// <summary>Its birefringence range (derived from the index ranges where the catalogue gives none).</summary>
    public PropertyRange Birefringence { get; }
}
