namespace GemIndex.Data.Workbook;

/// <summary>A workbook file that cannot be used (not SQLite, another application's database, a newer schema, damaged); the message names the file and the reason in plain words.</summary>
public class WorkbookException : Exception
{
    /// <summary>Creates the exception.</summary>
    public WorkbookException(string message, Exception? inner = null) : base(message, inner) { }
}
