namespace GemIndex.Data.Catalogue;

/// <summary>What an import did: how many entries it added, or (when any row was bad) every error and nothing added.</summary>
public sealed record CatalogueImportResult(int Imported, IReadOnlyList<CatalogueImportError> Errors)
{
    /// <summary>True when every row was good and all were added.</summary>
    public bool Succeeded => Errors.Count == 0;
}
