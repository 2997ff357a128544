using System.Globalization;
using GemIndex.Core.Catalogue;

namespace GemIndex.Data.Tests.Catalogue;

/// <summary>Every field of a material as one line of text, so round trips compare lists by content (records compare them by reference).</summary>
public static class MaterialSnapshot
{
    public static string Of(Material m) => string.Join(" | ",
        m.Name, m.Species, m.Variety, m.Family, m.Origin, m.CrystalSystem, m.OpticCharacter, m.Sign,
        string.Join(" ", m.Indices.Named().Select(x => $"{x.Name}={R(x.Range)}")),
        R(m.Birefringence), R(m.SpecificGravity), R(m.SpecificGravityUsual), m.Dispersion?.ToString("R", CultureInfo.InvariantCulture) ?? "-", R(m.Hardness),
        m.Pleochroism, string.Join(";", m.Polariscope), m.ThermalProbe, m.Electrical,
        string.Join(";", m.UvLong), string.Join(";", m.UvShort),
        string.Join(";", m.AbsorptionLines.Select(x => $"{x.Nanometres.ToString("R", CultureInfo.InvariantCulture)} {x.Strength}")),
        string.Join(";", m.Colours), m.Frequency, m.SpeciesFrequency, m.Forms, m.IsOpaque, m.DoNotImmerse, m.Notes,
        string.Join(";", m.Sources.OrderBy(s => s.Key, StringComparer.Ordinal).Select(s => $"{s.Key}={s.Value.Key}/{s.Value.Kind}/{s.Value.Citation}")),
        string.Join(";", m.StatedFields), m.IsUserEntry);

    private static string R(PropertyRange? r) =>
        r is { } v ? $"[{v.Minimum.ToString("R", CultureInfo.InvariantCulture)},{v.Maximum.ToString("R", CultureInfo.InvariantCulture)}]" : "-";
}
