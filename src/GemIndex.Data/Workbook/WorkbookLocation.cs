namespace GemIndex.Data.Workbook;

/// <summary>Where the workbook lives when no <c>--workbook</c> is given: the user's data folder.</summary>
public static class WorkbookLocation
{
    /// <summary>File name inside the data folder.</summary>
    public const string FileName = "workbook.db";

    /// <summary>$XDG_DATA_HOME/gemindex/workbook.db (an absolute XDG_DATA_HOME only), else ~/.local/share/gemindex/workbook.db; on Windows the local application data folder.</summary>
    public static string Default()
    {
        if (OperatingSystem.IsWindows())
            return Path.Combine(Environment.GetFolderPath(Environment.SpecialFolder.LocalApplicationData), "gemindex", FileName);
        string home = Environment.GetFolderPath(Environment.SpecialFolder.UserProfile);
        // The XDG base-directory specification ignores relative paths.
        string data = Environment.GetEnvironmentVariable("XDG_DATA_HOME") is { Length: > 0 } v && Path.IsPathRooted(v)
            ? v : Path.Combine(home, ".local", "share");
        return Path.Combine(data, "gemindex", FileName);
    }
}
