namespace GemIndex.Data.Workbook;

/// <summary>How <see cref="StoneWorkbook.Open"/> may treat the path it is given.</summary>
public enum WorkbookOpening
{
    /// <summary>An existing workbook only: a missing or empty file is refused (<see cref="WorkbookMissingException"/>), so a mistyped path creates nothing. Read-only when the file or its folder is.</summary>
    Existing,

    /// <summary>The user asked for a new workbook: a missing or 0-byte file (and its folder) is set up as one; an existing workbook opens as usual.</summary>
    CreateIfMissing,

    /// <summary>Reading and reporting only: nothing is ever written, whatever the permissions.</summary>
    ReadOnly,
}
