namespace GemIndex.Core.Bench;

/// <summary>
/// The one table of the bench tests' words: the wire word (the batch format's field, the next test's "test") and
/// the phrase shown to people.
/// </summary>
public static class BenchTestWords
{
    private static readonly (BenchTest Test, string Wire, string Display)[] Table =
    [
        (BenchTest.Refractometer, BenchField.Refractometer, "refractometer"),
        (BenchTest.SpecificGravity, BenchField.Sg, "specific gravity"),   // typed or weighed in air and water alike
        (BenchTest.HeavyLiquids, BenchField.HeavyLiquids, "heavy liquids"),
        (BenchTest.Polariscope, BenchField.Polariscope, "polariscope"),
        (BenchTest.Pleochroism, BenchField.Pleochroism, "dichroscope (pleochroism)"),
        (BenchTest.Dispersion, BenchField.Dispersion, "dispersion (fire)"),
        (BenchTest.ThermalProbe, BenchField.ThermalProbe, "thermal probe"),
        (BenchTest.Electrical, BenchField.Electrical, "electrical conductivity tester"),
        (BenchTest.Reflectance, BenchField.Reflectance, "reflectance meter"),
        (BenchTest.UvLong, BenchField.UvLong, "long-wave UV lamp (365 nm)"),
        (BenchTest.UvShort, BenchField.UvShort, "short-wave UV lamp (254 nm)"),
        (BenchTest.Absorption, BenchField.Absorption, "hand spectroscope (absorption lines)"),
        (BenchTest.Colour, BenchField.Colour, "colour"),
        (BenchTest.Magnification, BenchField.Magnification, "loupe or microscope (magnification)"),
    ];

    /// <summary>The wire word: SpecificGravity → "sg".</summary>
    public static string Wire(BenchTest test) => Table.First(r => r.Test == test).Wire;

    /// <summary>The phrase for people: Absorption → "hand spectroscope (absorption lines)".</summary>
    public static string Display(BenchTest test) => Table.First(r => r.Test == test).Display;

    /// <summary>The test a wire word names, or null.</summary>
    public static BenchTest? FromWire(string wire) => Table.FirstOrDefault(r => r.Wire == wire) is { Wire: not null } row ? row.Test : null;

    /// <summary>The phrase for a wire word (the word itself when it names no test).</summary>
    public static string DisplayOfWire(string wire) => FromWire(wire) is { } test ? Display(test) : wire;
}
