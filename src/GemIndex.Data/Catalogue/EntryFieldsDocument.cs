using System.Text.Json.Serialization;

namespace GemIndex.Data.Catalogue;

/// <summary>
/// The fields a species states and a variety may restate where it differs (reference-db/README.md, format 2). Every
/// field is optional here; what a species must have is checked when it is read.
/// </summary>
public record EntryFieldsDocument
{
    public string? OpticSign { get; init; }
    public string[]? Forms { get; init; }
    public bool? Opaque { get; init; }
    public double[]? N { get; init; }
    public double[]? Omega { get; init; }
    public double[]? Epsilon { get; init; }
    public double[]? Alpha { get; init; }
    public double[]? Beta { get; init; }
    public double[]? Gamma { get; init; }
    public double[]? Birefringence { get; init; }
    public double[]? Sg { get; init; }

    /// <summary>The part of <see cref="Sg"/> where most stones lie, where a source says so (reference-db/README.md).</summary>
    public double[]? SgUsual { get; init; }
    public double? Dispersion { get; init; }
    public double[]? Hardness { get; init; }
    public string? Pleochroism { get; init; }
    public string[]? Polariscope { get; init; }
    public string? ThermalProbe { get; init; }
    public string? Electrical { get; init; }
    public string[]? UvLong { get; init; }
    public string[]? UvShort { get; init; }
    public AbsorptionDocument[]? Absorption { get; init; }
    public string[]? Colours { get; init; }
    public bool? DoNotImmerse { get; init; }
    public string? Notes { get; init; }

    /// <summary>Field name → reference key; "*" is the default for every field not named.</summary>
    [JsonPropertyOrder(1)]
    public Dictionary<string, string>? Sources { get; init; }

    /// <summary>The field names (as the files spell them) this document gives a value for, in file order.</summary>
    internal IEnumerable<string> Stated()
    {
        (string Name, object? Value)[] all =
        [
            ("optic_sign", OpticSign), ("forms", Forms), ("opaque", Opaque), ("n", N), ("omega", Omega), ("epsilon", Epsilon),
            ("alpha", Alpha), ("beta", Beta), ("gamma", Gamma), ("birefringence", Birefringence), ("sg", Sg), ("sg_usual", SgUsual),
            ("dispersion", Dispersion), ("hardness", Hardness), ("pleochroism", Pleochroism), ("polariscope", Polariscope),
            ("thermal_probe", ThermalProbe), ("electrical", Electrical), ("uv_long", UvLong), ("uv_short", UvShort),
            ("absorption", Absorption), ("colours", Colours), ("do_not_immerse", DoNotImmerse), ("notes", Notes),
        ];
        return all.Where(f => f.Value is not null).Select(f => f.Name);
    }

    /// <summary>These fields where given, else <paramref name="inherited"/>'s (a variety over its species); no sources.</summary>
    internal EntryFieldsDocument Over(EntryFieldsDocument inherited) => new()
    {
        OpticSign = OpticSign ?? inherited.OpticSign, Forms = Forms ?? inherited.Forms, Opaque = Opaque ?? inherited.Opaque,
        N = N ?? inherited.N, Omega = Omega ?? inherited.Omega, Epsilon = Epsilon ?? inherited.Epsilon,
        Alpha = Alpha ?? inherited.Alpha, Beta = Beta ?? inherited.Beta, Gamma = Gamma ?? inherited.Gamma,
        Birefringence = Birefringence ?? inherited.Birefringence, Sg = Sg ?? inherited.Sg,
        // The usual part belongs to the range it qualifies: a variety with its own SG range keeps none of its species'.
        SgUsual = SgUsual ?? (Sg is null ? inherited.SgUsual : null),
        Dispersion = Dispersion ?? inherited.Dispersion, Hardness = Hardness ?? inherited.Hardness,
        Pleochroism = Pleochroism ?? inherited.Pleochroism, Polariscope = Polariscope ?? inherited.Polariscope,
        ThermalProbe = ThermalProbe ?? inherited.ThermalProbe, Electrical = Electrical ?? inherited.Electrical,
        UvLong = UvLong ?? inherited.UvLong, UvShort = UvShort ?? inherited.UvShort,
        Absorption = Absorption ?? inherited.Absorption, Colours = Colours ?? inherited.Colours,
        DoNotImmerse = DoNotImmerse ?? inherited.DoNotImmerse, Notes = Notes ?? inherited.Notes,
    };
}
