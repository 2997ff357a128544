using System.Globalization;

namespace GemIndex.Core.Catalogue;

/// <summary>
/// One field of a material (named as the family files name it) as canonical text, so that a variety's value can be
/// compared with its species' value field by field; and a field's numeric range where it has one.
/// </summary>
public static class MaterialFieldText
{
    /// <summary>The field's value as text ("[1.762, 1.77]", "doubly_refractive, anomalous", "-" when absent).</summary>
    /// <exception cref="ArgumentException">The field is not one of <see cref="CatalogueFields.Inheritable"/>.</exception>
    public static string Of(Material material, string field)
    {
        ArgumentNullException.ThrowIfNull(material);
        if (RangeOf(material, field) is { } r) return $"[{Number(r.Minimum)}, {Number(r.Maximum)}]";
        return field switch
        {
            "n" or "omega" or "epsilon" or "alpha" or "beta" or "gamma" or "birefringence" or "sg_usual" or "hardness" => "-",
            "optic_sign" => Word(material.Sign),
            "forms" => Word(material.Forms),
            "opaque" => material.IsOpaque ? "true" : "false",
            "dispersion" => material.Dispersion is { } d ? Number(d) : "-",
            "pleochroism" => Word(material.Pleochroism),
            "polariscope" => List(material.Polariscope.Select(Word)),
            "thermal_probe" => Word(material.ThermalProbe),
            "electrical" => Word(material.Electrical),
            "uv_long" => List(material.UvLong.Select(Word)),
            "uv_short" => List(material.UvShort.Select(Word)),
            "absorption" => List(material.AbsorptionLines.Select(l => $"{Number(l.Nanometres)} nm {Word(l.Strength)}")),
            "colours" => List(material.Colours),
            "do_not_immerse" => material.DoNotImmerse ? "true" : "false",
            "notes" => material.Notes,
            _ => throw new ArgumentException($"'{field}' is not a field a variety can state", nameof(field)),
        };
    }

    /// <summary>The field's range (an index, birefringence, sg, sg_usual or hardness), or null when it has none.</summary>
    public static PropertyRange? RangeOf(Material material, string field)
    {
        ArgumentNullException.ThrowIfNull(material);
        return field switch
        {
            "birefringence" => material.Birefringence,
            "sg" => material.SpecificGravity,
            "sg_usual" => material.SpecificGravityUsual,
            "hardness" => material.Hardness,
            _ => material.Indices.Named().Where(x => CatalogueFields.IndexField(x.Name) == field).Select(x => (PropertyRange?)x.Range).FirstOrDefault(),
        };
    }

    private static string Number(double v) => v.ToString("R", CultureInfo.InvariantCulture);

    private static string List(IEnumerable<string> items) => "[" + string.Join(", ", items) + "]";

    private static string Word<T>(T value) where T : struct, Enum => value.ToString().ToLowerInvariant();
}
