using System.Text;

namespace GemIndex.Core.Bench;

/// <summary>
/// The words of the bench's categorical answers, one rule for every enum: the value's name in snake case
/// (SinglyRefractive ↔ "singly_refractive"). Reading also accepts spaces, hyphens and any letter case.
/// </summary>
public static class BenchWords
{
    /// <summary>The word for a value: VeryStrong → "very_strong".</summary>
    public static string Word<T>(T value) where T : struct, Enum => Snake(value.ToString());

    /// <summary>The words an enum allows, in declaration order.</summary>
    public static IReadOnlyList<string> Words<T>() where T : struct, Enum => [.. Enum.GetNames<T>().Select(Snake)];

    /// <summary>The allowed words written for a message: "none | weak | strong".</summary>
    public static string Choices<T>() where T : struct, Enum => string.Join(" | ", Words<T>());

    /// <summary>The value a word names, or null.</summary>
    public static T? Parse<T>(string word) where T : struct, Enum
    {
        string key = word.Trim().Replace("_", "", StringComparison.Ordinal).Replace("-", "", StringComparison.Ordinal).Replace(" ", "", StringComparison.Ordinal);
        foreach (T value in Enum.GetValues<T>())
            if (key.Length > 0 && string.Equals(value.ToString(), key, StringComparison.OrdinalIgnoreCase)) return value;
        return null;
    }

    private static string Snake(string name)
    {
        var word = new StringBuilder();
        for (int i = 0; i < name.Length; i++)
        {
            if (i > 0 && char.IsUpper(name[i])) word.Append('_');
            word.Append(char.ToLowerInvariant(name[i]));
        }
        return word.ToString();
    }
}
