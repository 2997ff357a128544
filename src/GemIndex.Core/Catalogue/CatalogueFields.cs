namespace GemIndex.Core.Catalogue;

/// <summary>
/// The catalogue's field names (as the family files spell them) that carry a value with a source, and which of
/// them are numeric ranges. <see cref="Material.Sources"/> and <see cref="Material.StatedFields"/> use these names.
/// </summary>
public static class CatalogueFields
{
    /// <summary>The principal-index fields, in the order n | omega, epsilon | alpha, beta, gamma.</summary>
    public static IReadOnlyList<string> Indices { get; } = ["n", "omega", "epsilon", "alpha", "beta", "gamma"];

    /// <summary>The numbers an entry counts as sourced by: indices, birefringence, SG and dispersion where given.</summary>
    public static IReadOnlyList<string> Sourced { get; } = [.. Indices, "birefringence", "sg", "dispersion"];

    /// <summary>Every numeric field: each must name a source.</summary>
    public static IReadOnlyList<string> Numeric { get; } = [.. Sourced, "sg_usual", "hardness"];

    /// <summary>Every field a variety may state instead of inheriting from its species, in file order.</summary>
    public static IReadOnlyList<string> Inheritable { get; } =
    [
        "optic_sign", "forms", "opaque", .. Indices, "birefringence", "sg", "sg_usual", "dispersion", "hardness", "pleochroism",
        "polariscope", "thermal_probe", "electrical", "uv_long", "uv_short", "absorption", "colours", "do_not_immerse", "notes",
    ];

    /// <summary>The numeric fields this material has a value for.</summary>
    public static IEnumerable<string> NumericOf(Material material)
    {
        ArgumentNullException.ThrowIfNull(material);
        foreach ((string symbol, _) in material.Indices.Named()) yield return IndexField(symbol);
        if (material.Birefringence is not null) yield return "birefringence";
        yield return "sg";
        if (material.SpecificGravityUsual is not null) yield return "sg_usual";
        if (material.Dispersion is not null) yield return "dispersion";
        if (material.Hardness is not null) yield return "hardness";
    }

    /// <summary>The field name of an index symbol: "ω" → "omega".</summary>
    public static string IndexField(string symbol) => symbol switch
    {
        "ω" => "omega", "ε" => "epsilon", "α" => "alpha", "β" => "beta", "γ" => "gamma", _ => "n",
    };
}
