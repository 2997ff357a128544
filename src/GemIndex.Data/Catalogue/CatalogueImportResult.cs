namespace GemIndex.Data.Catalogue;

/// <summary>What an import did: how many entries it added, or (when any row was bad) every error and nothing added.</summary>
public sealed record CatalogueImportResult(int Imported, IReadOnlyList<CatalogueImportError> Errors)
{
    /// <summary>The file was of the previous schema and was brought up to the current one (an older GemIndex no longer reads it).</summary>
    public bool Upgraded { get; init; }

    /// <summary>True when every row was good and all were added.</summary>
    public bool Succeeded => Errors.Count == 0;
}
