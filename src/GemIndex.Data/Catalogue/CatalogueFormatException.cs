namespace GemIndex.Data.Catalogue;

/// <summary>Catalogue source text that cannot be read: each error names the file (or line), the entry and the field.</summary>
public sealed class CatalogueFormatException : Exception
{
    /// <summary>Creates the exception from its errors, one sentence each.</summary>
    public CatalogueFormatException(IReadOnlyList<string> errors)
        : base(errors.Count == 1 ? errors[0] : $"{errors.Count} errors, the first: {errors[0]}") => Errors = errors;

    /// <summary>Every error found, one sentence each.</summary>
    public IReadOnlyList<string> Errors { get; }
}
