namespace GemIndex.Core.Catalogue;

/// <summary>
/// How a material is met at the bench: as single crystals (faceted or cabochon), as aggregates or massive
/// material (many small crystals: quartzite, chalcedony, jade), or amorphous (glass, opal, amber). A material may be
/// met in more than one form (rose quartz: usually massive, rarely a single crystal).
/// </summary>
[Flags]
public enum MaterialForm
{
    /// <summary>Not stated.</summary>
    None = 0,

    /// <summary>A single crystal: a sharp rotation series is possible.</summary>
    Crystal = 1,

    /// <summary>An aggregate or massive material: a vague spot reading, "stays light" in the polariscope.</summary>
    Aggregate = 2,

    /// <summary>Amorphous: no crystal structure at all.</summary>
    Amorphous = 4,
}
