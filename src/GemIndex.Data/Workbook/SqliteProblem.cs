using Microsoft.Data.Sqlite;

namespace GemIndex.Data.Workbook;

/// <summary>SQLite's result codes in plain words for the user ("the workbook is damaged", "the folder is read-only"), never "SQLite Error 11".</summary>
public static class SqliteProblem
{
    /// <summary>One phrase for what went wrong (primary result codes of the SQLite C interface).</summary>
    public static string Describe(SqliteException e) => e.SqliteErrorCode switch
    {
        3 or 23 => "no permission to use the file",
        5 or 6 => "another program is using the workbook (locked); close it and try again",
        8 => "the workbook or its folder is read-only",
        10 => "the disk could not be read or written",
        11 => "the workbook is damaged",
        13 => "the disk is full",
        14 => "the file cannot be opened (its folder is missing or not readable, or the folder is read-only)",
        26 => "not a database file (not a workbook, or damaged beyond reading)",
        _ => "the database engine refused it (" + Trimmed(e.Message) + ")",
    };

    // "SQLite Error 1: 'no such table: stone'." → "no such table: stone"
    private static string Trimmed(string message)
    {
        int colon = message.IndexOf(": ", StringComparison.Ordinal);
        string text = message.StartsWith("SQLite Error", StringComparison.Ordinal) && colon > 0 ? message[(colon + 2)..] : message;
        return text.Trim().TrimEnd('.').Trim('\'');
    }
}
