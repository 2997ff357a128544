using System.Text.Json.Serialization;

namespace GemIndex.Data.Catalogue;

/// <summary>One absorption line in a family file: <c>{ "nm": 694.2, "strength": "strong" }</c>.</summary>
public sealed record AbsorptionDocument
{
    /// <summary>The line's or band centre's wavelength, nm.</summary>
    [JsonRequired] public double Nm { get; init; }

    /// <summary>weak, moderate or strong.</summary>
    [JsonRequired] public string Strength { get; init; } = "";
}
