using GemIndex.Core.Catalogue;
using GemIndex.Data.Catalogue;

namespace GemIndex.Cli.CommandLine;

/// <summary>One entry for <c>--json</c>: the family-file fields (reference-db/README.md) plus is_user_entry.</summary>
internal sealed record MaterialJson
{
    public required string Name { get; init; }
    public required string Species { get; init; }
    public required string Variety { get; init; }
    public required string Family { get; init; }
    public required string Origin { get; init; }
    public required string CrystalSystem { get; init; }
    public required string OpticCharacter { get; init; }
    public required string OpticSign { get; init; }
    public double[]? N { get; init; }
    public double[]? Omega { get; init; }
    public double[]? Epsilon { get; init; }
    public double[]? Alpha { get; init; }
    public double[]? Beta { get; init; }
    public double[]? Gamma { get; init; }
    public double[]? Birefringence { get; init; }
    public required double[] Sg { get; init; }
    public double? Dispersion { get; init; }
    public double[]? Hardness { get; init; }
    public required string Pleochroism { get; init; }
    public required string[] Polariscope { get; init; }
    public required string ThermalProbe { get; init; }
    public required string Electrical { get; init; }
    public required string[] UvLong { get; init; }
    public required string[] UvShort { get; init; }
    public required double[] AbsorptionNm { get; init; }
    public required string[] Colours { get; init; }
    public required string Frequency { get; init; }
    public required bool DoNotImmerse { get; init; }
    public required string Notes { get; init; }
    public required string Provenance { get; init; }
    public required bool IsUserEntry { get; init; }

    public static MaterialJson From(Material m) => new()
    {
        Name = m.Name, Species = m.Species, Variety = m.Variety, Family = m.Family,
        Origin = CatalogueWords.Of(m.Origin), CrystalSystem = CatalogueWords.Of(m.CrystalSystem),
        OpticCharacter = CatalogueWords.Of(m.OpticCharacter), OpticSign = CatalogueWords.Of(m.Sign),
        N = Pair(m.Indices.Single), Omega = Pair(m.Indices.Omega), Epsilon = Pair(m.Indices.Epsilon),
        Alpha = Pair(m.Indices.Alpha), Beta = Pair(m.Indices.Beta), Gamma = Pair(m.Indices.Gamma),
        Birefringence = Pair(m.Birefringence), Sg = Pair(m.SpecificGravity)!, Dispersion = m.Dispersion, Hardness = Pair(m.Hardness),
        Pleochroism = CatalogueWords.Of(m.Pleochroism), Polariscope = [.. m.Polariscope.Select(CatalogueWords.Of)],
        ThermalProbe = CatalogueWords.Of(m.ThermalProbe), Electrical = CatalogueWords.Of(m.Electrical),
        UvLong = [.. m.UvLong.Select(CatalogueWords.Of)], UvShort = [.. m.UvShort.Select(CatalogueWords.Of)],
        AbsorptionNm = [.. m.AbsorptionLinesNanometres], Colours = [.. m.Colours], Frequency = CatalogueWords.Of(m.Frequency),
        DoNotImmerse = m.DoNotImmerse, Notes = m.Notes, Provenance = m.Provenance, IsUserEntry = m.IsUserEntry,
    };

    private static double[]? Pair(PropertyRange? r) => r is { } v ? [v.Minimum, v.Maximum] : null;
}
