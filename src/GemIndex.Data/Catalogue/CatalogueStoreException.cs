namespace GemIndex.Data.Catalogue;

/// <summary>A catalogue database that cannot be opened, read or written: the message names the file and why.</summary>
public sealed class CatalogueStoreException : Exception
{
    /// <summary>Creates the exception with one sentence.</summary>
    public CatalogueStoreException(string message, Exception? inner = null) : base(message, inner) { }
}
