using GemIndex.Core.Catalogue;

namespace GemIndex.Data.Catalogue;

/// <summary>
/// One catalogue entry in the family files' own shape, flattened: the variety's identity, its species' fields with
/// what the variety states over them, each field's reference key in <c>sources</c> and the references themselves.
/// What <c>catalogue show/list --json</c> write (snake_case, as the family files).
/// </summary>
public sealed record CatalogueEntryDocument : EntryFieldsDocument
{
    public required string Name { get; init; }
    public required string Species { get; init; }
    public required string Variety { get; init; }
    public required string Family { get; init; }
    public required string Origin { get; init; }
    public required string Share { get; init; }
    public required string CrystalSystem { get; init; }
    public required string OpticCharacter { get; init; }
    public required string Frequency { get; init; }
    public required string[] StatedFields { get; init; }
    public required ReferenceDocument[] References { get; init; }
    public required bool IsUserEntry { get; init; }

    /// <summary>The rule that restricts trade in the material (trade-rules.json), or null.</summary>
    public TradeRuleDocument? TradeRule { get; init; }

    /// <summary>The mineral group of the entry's species (mineral-groups.json), or null.</summary>
    public string? MineralGroup { get; init; }

    /// <summary>The document of a material: every field it has, its sources by key, and the references they name.</summary>
    public static CatalogueEntryDocument From(Material m)
    {
        ArgumentNullException.ThrowIfNull(m);
        return new()
        {
            Name = m.Name, Species = m.Species, Variety = m.Variety, Family = m.Family, Origin = CatalogueWords.Of(m.Origin),
            Share = CatalogueWords.Of(m.Frequency), CrystalSystem = CatalogueWords.Of(m.CrystalSystem),
            OpticCharacter = CatalogueWords.Of(m.OpticCharacter), Frequency = CatalogueWords.Of(m.SpeciesFrequency),
            OpticSign = m.Sign == Core.Optics.Indicatrix.OpticSign.None ? null : CatalogueWords.Of(m.Sign),
            Forms = [.. CatalogueWords.OfForms(m.Forms)], Opaque = m.IsOpaque,
            N = Pair(m.Indices.Single), Omega = Pair(m.Indices.Omega), Epsilon = Pair(m.Indices.Epsilon),
            Alpha = Pair(m.Indices.Alpha), Beta = Pair(m.Indices.Beta), Gamma = Pair(m.Indices.Gamma),
            Birefringence = Pair(m.Birefringence), Sg = Pair(m.SpecificGravity), SgUsual = Pair(m.SpecificGravityUsual), Dispersion = m.Dispersion, Hardness = Pair(m.Hardness),
            Pleochroism = CatalogueWords.Of(m.Pleochroism), Polariscope = [.. m.Polariscope.Select(CatalogueWords.Of)],
            ThermalProbe = CatalogueWords.Of(m.ThermalProbe), Electrical = CatalogueWords.Of(m.Electrical),
            UvLong = [.. m.UvLong.Select(CatalogueWords.Of)], UvShort = [.. m.UvShort.Select(CatalogueWords.Of)],
            Absorption = [.. m.AbsorptionLines.Select(l => new AbsorptionDocument { Nm = l.Nanometres, Strength = CatalogueWords.Of(l.Strength) })],
            Colours = [.. m.Colours], DoNotImmerse = m.DoNotImmerse, Notes = m.Notes,
            Sources = m.Sources.ToDictionary(s => s.Key, s => s.Value.Key, StringComparer.Ordinal),
            StatedFields = [.. m.StatedFields],
            References = [.. m.Sources.Values.Distinct().OrderBy(s => s.Key, StringComparer.Ordinal)
                .Select(s => new ReferenceDocument { Key = s.Key, Kind = CatalogueWords.Of(s.Kind), Citation = s.Citation })],
            IsUserEntry = m.IsUserEntry,
            TradeRule = m.TradeRule is { } rule ? new TradeRuleDocument(rule.Text, rule.Citation) : null,
            MineralGroup = m.MineralGroup,
        };
    }

    private static double[]? Pair(PropertyRange? r) => r is { } v ? [v.Minimum, v.Maximum] : null;
}

/// <summary>A trade rule as <c>catalogue show/list --json</c> write it: what restricts the trade, and the work it summarises.</summary>
public sealed record TradeRuleDocument(string Text, string Citation);
