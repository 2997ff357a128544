namespace GemIndex.Data.Workbook;

/// <summary>
/// A field changed elsewhere (another window or process) since this window last read it, and changed here too:
/// nothing of it was written. <see cref="LastRead"/> is what this window started from, <see cref="Stored"/> what is
/// in the workbook now, <see cref="Yours"/> what this window wanted to write ("" = empty or not given).
/// </summary>
public sealed record FieldConflict(string Field, string LastRead, string Stored, string Yours);
