namespace GemIndex.Data.Workbook;

/// <summary>One entry of a stone's edit history: which field changed, when, from what to what ("" = empty).</summary>
public sealed record StoneEdit(DateTimeOffset At, string Field, string Before, string After);
