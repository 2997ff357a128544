namespace GemIndex.Core.Catalogue;

/// <summary>
/// One problem the catalogue check found: which entry, which field (named as in the catalogue's source
/// files: <c>sg</c>, <c>omega</c>, <c>optic_sign</c>…) and what is wrong with it.
/// </summary>
/// <param name="Entry">The entry's name as written in the catalogue.</param>
/// <param name="Field">The source-file field at fault.</param>
/// <param name="Problem">One sentence saying what is wrong, with the values involved.</param>
/// <param name="File">The file the entry comes from ("corundum.json"), or "" when not known.</param>
public sealed record CatalogueFinding(string Entry, string Field, string Problem, string File = "")
{
    /// <summary>"corundum.json: entry 'ruby', field sg: …".</summary>
    public override string ToString() => (File.Length > 0 ? $"{File}: " : "") + $"entry '{Entry}', field {Field}: {Problem}";
}
