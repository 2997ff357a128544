namespace GemIndex.Data.Catalogue;

/// <summary>The text of one family file and the file name it came from ("corundum.json").</summary>
public sealed record FamilySource(string FileName, string Json)
{
    /// <summary>Every <c>*.json</c> in a folder, in ordinal name order (none if the folder does not exist).</summary>
    public static IReadOnlyList<FamilySource> FromDirectory(string directory) =>
        Directory.Exists(directory)
            ? [.. Directory.GetFiles(directory, "*.json").Order(StringComparer.Ordinal)
                .Select(p => new FamilySource(Path.GetFileName(p), File.ReadAllText(p)))]
            : [];
}
