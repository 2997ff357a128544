namespace GemIndex.Data.Catalogue;

/// <summary>One reason an import was refused: the CSV line, the column (or field) and the problem.</summary>
/// <param name="Line">1-based line number in the CSV file.</param>
/// <param name="Field">The CSV column(s) at fault.</param>
/// <param name="Problem">One sentence with the value involved.</param>
public sealed record CatalogueImportError(int Line, string Field, string Problem)
{
    /// <summary>"line 3, field sg_min/sg_max: …".</summary>
    public override string ToString() => $"line {Line}, field {Field}: {Problem}";
}
