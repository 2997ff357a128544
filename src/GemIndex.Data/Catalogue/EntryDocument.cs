using System.Text.Json.Serialization;

namespace GemIndex.Data.Catalogue;

/// <summary>One catalogue entry as written in a family file or a CSV row, before it is checked (field names: reference-db/README.md).</summary>
internal sealed record EntryDocument
{
    [JsonRequired] public string Name { get; init; } = "";
    [JsonRequired] public string Species { get; init; } = "";
    [JsonRequired] public string Variety { get; init; } = "";
    [JsonRequired] public string Origin { get; init; } = "";
    [JsonRequired] public string CrystalSystem { get; init; } = "";
    [JsonRequired] public string OpticCharacter { get; init; } = "";
    public string? OpticSign { get; init; }
    public double[]? N { get; init; }
    public double[]? Omega { get; init; }
    public double[]? Epsilon { get; init; }
    public double[]? Alpha { get; init; }
    public double[]? Beta { get; init; }
    public double[]? Gamma { get; init; }
    public double[]? Birefringence { get; init; }
    [JsonRequired] public double[] Sg { get; init; } = [];
    public double? Dispersion { get; init; }
    public double[]? Hardness { get; init; }
    public string? Pleochroism { get; init; }
    [JsonRequired] public string[] Polariscope { get; init; } = [];
    public string? ThermalProbe { get; init; }
    public string? Electrical { get; init; }
    public string[]? UvLong { get; init; }
    public string[]? UvShort { get; init; }
    public double[]? AbsorptionNm { get; init; }
    [JsonRequired] public string[] Colours { get; init; } = [];
    [JsonRequired] public string Frequency { get; init; } = "";
    public bool? DoNotImmerse { get; init; }
    public string? Notes { get; init; }
    [JsonRequired] public string Provenance { get; init; } = "";
}
