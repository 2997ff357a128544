namespace GemIndex.Core.Observations;

/// <summary>How much light passes through the stone, on the trade's five-grade scale of transparency.</summary>
public enum Diaphaneity
{
    /// <summary>Print can be read through it.</summary>
    Transparent,

    /// <summary>Clear but hazy: outlines seen through it, not print.</summary>
    SemiTransparent,

    /// <summary>Light passes, no image.</summary>
    Translucent,

    /// <summary>Light passes only at thin edges.</summary>
    SemiTranslucent,

    /// <summary>No light passes.</summary>
    Opaque,
}
