using GemIndex.Core.Bench;

namespace GemIndex.Data.Batch;

/// <summary>
/// One stone's readings as the workbook stores them (the batch format's JSON, README "Batch format"), typed but not
/// checked; <see cref="StoneReadingsConverter"/> turns them into Core's <c>BenchReadings</c> and back. Every field but
/// the id is optional.
/// Enumerated answers are kept as the batch format's words ("singly_refractive", "floats", …).
/// </summary>
public sealed record StoneReadings
{
    public string Id { get; init; } = "";
    public RefractometerReadings? Refractometer { get; init; }
    /// <summary>SG given directly.</summary>
    public double? Sg { get; init; }
    /// <summary>SG from hydrostatic weighing.</summary>
    public HydrostaticReadings? SgWeighing { get; init; }
    public IReadOnlyList<HeavyLiquidReading> HeavyLiquids { get; init; } = [];
    public string? Polariscope { get; init; }
    public string? Pleochroism { get; init; }
    /// <summary>Dispersion judged by eye (none | weak | moderate | strong | very_strong).</summary>
    public string? Dispersion { get; init; }
    /// <summary>Dispersion measured: nB and nG.</summary>
    public (double NB, double NG)? DispersionIndices { get; init; }
    public string? ThermalProbe { get; init; }
    public string? Electrical { get; init; }
    /// <summary>A reflectance meter's reading, percent.</summary>
    public double? ReflectancePct { get; init; }
    public string? UvLong { get; init; }
    public string? UvShort { get; init; }
    /// <summary>Null: not looked; empty: looked and saw none.</summary>
    public IReadOnlyList<double>? AbsorptionNm { get; init; }
    public string? Colour { get; init; }
    /// <summary>How the stone is cut (faceted | cabochon | other).</summary>
    public string? Cut { get; init; }
    /// <summary>How much light passes (transparent | translucent | opaque).</summary>
    public string? Transparency { get; init; }
    /// <summary>Magnification features seen (the vocabulary's words); empty: none given.</summary>
    public IReadOnlyList<string> FeaturesPresent { get; init; } = [];
    /// <summary>Magnification features looked for and not seen.</summary>
    public IReadOnlyList<string> FeaturesAbsent { get; init; } = [];

    /// <summary>The answers picked from a list of words, each with its field (Core's BenchField), in the order of the reading pages; null when not given.</summary>
    public IReadOnlyList<(string Field, string? Word)> ChoiceWords =>
    [
        (BenchField.Cut, Cut), (BenchField.Polariscope, Polariscope), (BenchField.Pleochroism, Pleochroism), (BenchField.Dispersion, Dispersion),
        (BenchField.ThermalProbe, ThermalProbe), (BenchField.Electrical, Electrical), (BenchField.UvLong, UvLong), (BenchField.UvShort, UvShort),
    ];
}

/// <summary>The refractometer part of <see cref="StoneReadings"/>.</summary>
public sealed record RefractometerReadings
{
    /// <summary>"facet" or "spot".</summary>
    public string Method { get; init; } = "facet";
    public double? LightNm { get; init; }
    public double? LiquidLimit { get; init; }
    public IReadOnlyList<EdgeReadingEntry> Readings { get; init; } = [];
    public double? Spot { get; init; }
    public bool OverLimit { get; init; }
    /// <summary>Standard uncertainty of one reading (default: <see cref="GemIndex.Core.Bench.BenchDefaults"/>).</summary>
    public double? Precision { get; init; }
    /// <summary>Added to every reading, from a calibration on a standard.</summary>
    public double? CalibrationOffset { get; init; }
}

/// <summary>One rotation step as entered.</summary>
public sealed record EdgeReadingEntry(double RotationDeg, double Low, double? High);

/// <summary>Hydrostatic weights in carats and the water temperature (a weight may be missing while being typed).</summary>
public sealed record HydrostaticReadings(double? AirCt, double? WaterCt, double? WaterC);

/// <summary>One heavy-liquid result: the liquid's density and "floats", "sinks" or "suspends".</summary>
public sealed record HeavyLiquidReading(double Density, string Result);
