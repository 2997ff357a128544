namespace GemIndex.Core.Observations;

/// <summary>
/// How much light passes through the stone, as the examiner sees it: what decides which tests can be taken at all
/// (common practice). It weighs no material (docs/ranking.md §5: the catalogue's own transparency is set unevenly);
/// the next-test advice leaves out the tests an opaque stone cannot take.
/// </summary>
public enum StoneTransparency
{
    /// <summary>Light passes clearly: every test can be taken.</summary>
    Transparent,

    /// <summary>Light passes diffusely: the tests in transmitted light can be taken, less clearly.</summary>
    Translucent,

    /// <summary>No light passes: the polariscope, the dichroscope and fire show nothing (a spectroscope can still read reflected light).</summary>
    Opaque,
}
