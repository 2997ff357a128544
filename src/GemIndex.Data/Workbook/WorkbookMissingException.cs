namespace GemIndex.Data.Workbook;

/// <summary>
/// There is no workbook at the path (no file, or a 0-byte one) and no new one was asked for: the caller asks the user
/// (or tells them about <c>--new</c>) instead of creating a file at a path that may be mistyped.
/// </summary>
public sealed class WorkbookMissingException(string path, string message) : WorkbookException(message)
{
    /// <summary>The full path that holds no workbook.</summary>
    public string Path { get; } = path;
}
