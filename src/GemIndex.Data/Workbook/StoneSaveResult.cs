namespace GemIndex.Data.Workbook;

/// <summary>
/// What a <see cref="StoneWorkbook.Save"/> did. <see cref="Stored"/> is the stone as it is in the workbook now;
/// <see cref="Saved"/> the fields written; <see cref="Conflicts"/> the fields left unwritten because they were
/// changed elsewhere meanwhile. Pass <see cref="NextLastRead"/> as the next save's last-read stone: it is the stone
/// this window last read with its own edits applied, except that a conflicting field keeps the value last read, so
/// the conflict is reported again until the user settles it (keep theirs: load <see cref="Stored"/>; keep yours:
/// save with <see cref="Stored"/> as the last-read stone). Fields changed only elsewhere are in <see cref="Stored"/>
/// for the window to show; they are never written back.
/// </summary>
public sealed record StoneSaveResult(StoneSheet Stored, IReadOnlyList<string> Saved, IReadOnlyList<FieldConflict> Conflicts, StoneSheet NextLastRead)
{
    /// <summary>True when nothing was left unwritten.</summary>
    public bool IsClean => Conflicts.Count == 0;
}
