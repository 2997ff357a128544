namespace GemIndex.Data.Catalogue;

/// <summary>
/// Where the catalogue files live: the cache folder holding the built shipped catalogue, and the data folder
/// holding the user's catalogue. Passed in, so tests and <c>--catalogue-dir</c> never touch the user's real folders.
/// </summary>
/// <param name="CacheDirectory">Folder of the built shipped catalogue (rebuildable at any time).</param>
/// <param name="UserDirectory">Folder of user-catalogue.db (the user's own data).</param>
public sealed record CatalogueLocations(string CacheDirectory, string UserDirectory)
{
    /// <summary>The user catalogue's file name.</summary>
    public const string UserCatalogueFileName = "user-catalogue.db";

    /// <summary>The user's catalogue file.</summary>
    public string UserCataloguePath => Path.Combine(UserDirectory, UserCatalogueFileName);

    /// <summary>Everything under one folder: user-catalogue.db in it, the built shipped catalogue in its cache/ sub-folder.</summary>
    public static CatalogueLocations Under(string directory) =>
        new(Path.Combine(Path.GetFullPath(directory), "cache"), Path.GetFullPath(directory));

    /// <summary>
    /// The platform's folders: on Linux and other Unix $XDG_CACHE_HOME (or ~/.cache) and $XDG_DATA_HOME
    /// (or ~/.local/share); on macOS ~/Library/Caches and ~/Library/Application Support; on Windows
    /// %LOCALAPPDATA% for both (cache in a cache sub-folder). Each with a gemindex sub-folder.
    /// </summary>
    public static CatalogueLocations FromEnvironment()
    {
        string home = Environment.GetFolderPath(Environment.SpecialFolder.UserProfile);
        if (OperatingSystem.IsWindows())
        {
            string local = Path.Combine(Environment.GetFolderPath(Environment.SpecialFolder.LocalApplicationData), "gemindex");
            return new(Path.Combine(local, "cache"), local);
        }
        if (OperatingSystem.IsMacOS())
            return new(Path.Combine(home, "Library", "Caches", "gemindex"), Path.Combine(home, "Library", "Application Support", "gemindex"));
        return new(Path.Combine(Xdg("XDG_CACHE_HOME", Path.Combine(home, ".cache")), "gemindex"),
                   Path.Combine(Xdg("XDG_DATA_HOME", Path.Combine(home, ".local", "share")), "gemindex"));
    }

    // The XDG base-directory specification ignores relative paths.
    private static string Xdg(string variable, string fallback) =>
        Environment.GetEnvironmentVariable(variable) is { Length: > 0 } v && Path.IsPathRooted(v) ? v : fallback;
}
