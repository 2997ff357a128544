namespace GemIndex.Core.Magnification;

/// <summary>One feature of the magnification vocabulary, in the words shown to a bench user.</summary>
/// <param name="Feature">The feature.</param>
/// <param name="Group">Growth, inclusion, treatment, composite, organic structure or phenomenon.</param>
/// <param name="Word">The word on the command line and in the batch format ("curved_striae").</param>
/// <param name="Name">The display name ("curved striae").</param>
/// <param name="LookFor">One plain line: what to look for.</param>
/// <param name="Lighting">The lighting that shows it best.</param>
/// <param name="Meaning">What it says about origin or treatment.</param>
/// <param name="Source">Where that meaning comes from: a published work, or "common practice".</param>
/// <param name="Visibility">
/// The chance that an examiner who looks for the feature with a loupe or microscope sees it when the stone has it:
/// a judgement (docs/ranking.md, "Magnification").
/// </param>
public sealed record MagnificationFeatureInfo(
    MagnificationFeature Feature, FeatureGroup Group, string Word, string Name, string LookFor, string Lighting,
    string Meaning, string Source, double Visibility)
{
    /// <summary>
    /// What a loupe can find on an opaque stone, by reflected light (common practice): colour banding, a made opal's mosaic
    /// of colour patches (seen from above in reflected light), the treatments that
    /// reach the surface (dye in fractures, a worn coating), a composite's join and its two lustres, the organic
    /// structures and the phenomena; not the inclusions, the growth features seen through the stone, the doubling, nor
    /// what lies in its fractures or its cement (flash effect, flattened bubbles, cement bubbles, colour at facet
    /// junctions in immersion).
    /// </summary>
    public bool SeenOnTheSurface => Feature switch
    {
        MagnificationFeature.ColourBanding or MagnificationFeature.MosaicColourPatches or MagnificationFeature.DyeInFractures or MagnificationFeature.CoatingWear
            or MagnificationFeature.JoinPlane or MagnificationFeature.LustreChangeAtGirdle => true,
        _ => Group is FeatureGroup.OrganicStructure or FeatureGroup.Phenomenon,
    };

    /// <summary>How a sighting is named: a phenomenon is seen by eye, the rest under magnification.</summary>
    public string SeenHow => Group == FeatureGroup.Phenomenon ? "Seen by eye" : "Seen under magnification";

    /// <summary>What a sighting suggests, worded as an indication beside the observation, never as a finding: "points to: natural stone".</summary>
    public string WhenSeen => "points to: " + Meaning;

    /// <summary>The same for a feature looked for and not seen: what it would have suggested; its absence alone decides nothing.</summary>
    public string WhenNotSeen => "had it been seen, it would point to: " + Meaning;
}
