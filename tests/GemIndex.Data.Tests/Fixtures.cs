using GemIndex.Data.Catalogue;

namespace GemIndex.Data.Tests;

/// <summary>The invented test files in Fixtures/ (copied next to the test assembly).</summary>
public static class Fixtures
{
    public static string Directory => Path.Combine(AppContext.BaseDirectory, "Fixtures");

    public static string Families => Path.Combine(Directory, "families");

    public static IReadOnlyList<FamilySource> FamilySources => FamilySource.FromDirectory(Families);

    public static string File(string name) => Path.Combine(Directory, name);

    /// <summary>The repository's reference-db/materials, found by walking up to GemIndex.sln.</summary>
    public static string RepositoryMaterials
    {
        get
        {
            for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
                if (System.IO.File.Exists(Path.Combine(dir.FullName, "GemIndex.sln"))) return Path.Combine(dir.FullName, "reference-db", "materials");
            throw new InvalidOperationException("GemIndex.sln not found above " + AppContext.BaseDirectory);
        }
    }
}
