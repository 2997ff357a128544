namespace GemIndex.Core.Catalogue;

/// <summary>Where a catalogue value comes from: a reference key of the catalogue, its kind and its citation.</summary>
/// <param name="Key">The reference's key, unique across the catalogue ("hom-corundum", "memory").</param>
/// <param name="Kind">Published, from memory, or common practice.</param>
/// <param name="Citation">The full citation (author, year, title, page read) or the plain words for memory and practice.</param>
public sealed record ValueSource(string Key, SourceKind Kind, string Citation);
