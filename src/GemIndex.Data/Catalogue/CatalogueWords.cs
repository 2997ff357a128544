using System.Collections.Frozen;
using GemIndex.Core.Bench;

namespace GemIndex.Data.Catalogue;

/// <summary>
/// The lower-case words the catalogue files and database use for enumerations: VeryCommon ⇔ "very_common", spelled by
/// the bench's one rule (<see cref="BenchWords"/>) and looked up here from frozen tables, strictly (no other spelling).
/// </summary>
public static class CatalogueWords
{
    /// <summary>The word for a value: VeryCommon → "very_common".</summary>
    public static string Of<T>(T value) where T : struct, Enum =>
        Table<T>.ByValue.TryGetValue(value, out string? word) ? word : BenchWords.Word(value);

    /// <summary>The words of a set of forms, in declaration order: Crystal | Aggregate → crystal, aggregate.</summary>
    public static IEnumerable<string> OfForms(GemIndex.Core.Catalogue.MaterialForm forms) =>
        Enum.GetValues<GemIndex.Core.Catalogue.MaterialForm>().Where(f => f != GemIndex.Core.Catalogue.MaterialForm.None && forms.HasFlag(f)).Select(Of);

    /// <summary>Every word of an enumeration, in declaration order.</summary>
    public static IEnumerable<string> All<T>() where T : struct, Enum => Enum.GetValues<T>().Select(Of);

    /// <summary>The value for a word (exact, lower-case); false for anything else, numbers included.</summary>
    public static bool TryParse<T>(string? word, out T value) where T : struct, Enum
    {
        if (word is not null && Table<T>.ByWord.TryGetValue(word, out value)) return true;
        value = default;
        return false;
    }

    /// <summary>Parses a word read from our own database, which the schema and the writer keep valid.</summary>
    internal static T Stored<T>(string word) where T : struct, Enum =>
        TryParse(word, out T value) ? value
            : throw new CatalogueStoreException($"unknown {typeof(T).Name} '{word}' in the catalogue file; rebuild it");

    /// <summary>The allowed words, comma-separated, for error messages.</summary>
    public static string Expected<T>() where T : struct, Enum => string.Join(", ", All<T>());

    // Immutable lookup tables, built once per enumeration (loading 10,000 entries parses ~100,000 words).
    private static class Table<T> where T : struct, Enum
    {
        public static readonly FrozenDictionary<T, string> ByValue =
            Enum.GetValues<T>().ToFrozenDictionary(v => v, v => BenchWords.Word(v));

        public static readonly FrozenDictionary<string, T> ByWord =
            ByValue.ToFrozenDictionary(p => p.Value, p => p.Key, StringComparer.Ordinal);
    }
}
