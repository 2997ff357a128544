using System.Text;

namespace GemIndex.Data.Catalogue;

/// <summary>
/// The lower-case words the catalogue files and database use for enumerations: VeryCommon ⇔ "very_common".
/// </summary>
public static class CatalogueWords
{
    /// <summary>The word for a value: VeryCommon → "very_common".</summary>
    public static string Of<T>(T value) where T : struct, Enum
    {
        string name = value.ToString();
        var b = new StringBuilder(name.Length + 4);
        for (int i = 0; i < name.Length; i++)
        {
            if (i > 0 && char.IsUpper(name[i])) b.Append('_');
            b.Append(char.ToLowerInvariant(name[i]));
        }
        return b.ToString();
    }

    /// <summary>Every word of an enumeration, in declaration order.</summary>
    public static IEnumerable<string> All<T>() where T : struct, Enum => Enum.GetValues<T>().Select(Of);

    /// <summary>The value for a word (exact, lower-case); false for anything else, numbers included.</summary>
    public static bool TryParse<T>(string? word, out T value) where T : struct, Enum
    {
        foreach (T candidate in Enum.GetValues<T>())
        {
            if (string.Equals(Of(candidate), word, StringComparison.Ordinal)) { value = candidate; return true; }
        }
        value = default;
        return false;
    }

    /// <summary>Parses a word read from our own database, which the schema and the writer keep valid.</summary>
    internal static T Stored<T>(string word) where T : struct, Enum =>
        TryParse(word, out T value) ? value
            : throw new CatalogueStoreException($"unknown {typeof(T).Name} '{word}' in the catalogue file; rebuild it");

    /// <summary>The allowed words, comma-separated, for error messages.</summary>
    public static string Expected<T>() where T : struct, Enum => string.Join(", ", All<T>());
}
