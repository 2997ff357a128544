namespace GemIndex.Core.Catalogue;

/// <summary>What kind of source stands behind a catalogue value.</summary>
public enum SourceKind
{
    /// <summary>A published work that was read: author(s) or editor(s), year, title, page.</summary>
    Published,

    /// <summary>Recalled from standard handbook values, not checked against a text.</summary>
    FromMemory,

    /// <summary>A fact of the trade (a polariscope reaction, a do-not-immerse habit), not a numeric range.</summary>
    CommonPractice,

    /// <summary>
    /// A value inferred from published works, the reasoning stated in the reference (a chromium-rich overgrowth read like
    /// a chromium-diffused skin): counted apart from published values, never as a published entry.
    /// </summary>
    Judgement,
}
