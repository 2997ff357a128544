namespace GemIndex.Data.Catalogue;

/// <summary>A catalogue file written with another schema version than <see cref="CatalogueSchema.Version"/>.</summary>
public sealed class CatalogueSchemaVersionException : Exception
{
    /// <summary>Creates the exception for a file and the version found in it.</summary>
    public CatalogueSchemaVersionException(string path, long found)
        : base($"{path}: catalogue schema version {found}, but this GemIndex reads versions {CatalogueSchema.PreviousVersion} " +
               $"and {CatalogueSchema.Version}; use a matching GemIndex (a newer one made this file), or, for a catalogue " +
               "built from family files, rebuild it ('gemindex catalogue build --output FILE')")
    {
        Path = path;
        Found = found;
    }

    /// <summary>The file.</summary>
    public string Path { get; }

    /// <summary>The version found in it.</summary>
    public long Found { get; }
}
