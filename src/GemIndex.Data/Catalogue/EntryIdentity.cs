namespace GemIndex.Data.Catalogue;

/// <summary>Who an entry is: the variety's own words and the species' fields a variety cannot restate.</summary>
internal sealed record EntryIdentity(
    string Name, string Species, string Variety, string Origin, string Share,
    string CrystalSystem, string OpticCharacter, string Frequency, string Family);
