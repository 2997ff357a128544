namespace GemIndex.Core.Catalogue;

/// <summary>How plainly an absorption line shows in a hand spectroscope.</summary>
public enum LineStrength
{
    /// <summary>Faint: often missed.</summary>
    Weak,

    /// <summary>Plain in good light.</summary>
    Moderate,

    /// <summary>Unmistakable: rarely missed.</summary>
    Strong,
}
