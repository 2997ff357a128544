namespace GemIndex.Bench.Independent;

/// <summary>
/// What a bench wrote down for one stone, in the words of the batch format (README "Batch format"); null means the
/// test was not done. The simulator fills it, <see cref="BatchLineWriter"/> writes it as a batch line, and the
/// separability oracle and the printed-table baseline read it as a person reading the sheet would.
/// </summary>
internal sealed record BenchReadings
{
    public required string Id { get; init; }

    /// <summary>"facet" or "spot"; null when the refractometer was not used.</summary>
    public string? RefractometerMethod { get; init; }

    /// <summary>The contact liquid's index as the bench knows it (two decimals).</summary>
    public double LiquidLimit { get; init; }

    public IReadOnlyList<EdgeStep> Steps { get; init; } = [];

    public double? Spot { get; init; }

    /// <summary>No stone edge seen at all: only the liquid's edge.</summary>
    public bool OverLimit { get; init; }

    public double? SpecificGravity { get; init; }

    public HydrostaticWeights? Weighing { get; init; }

    public IReadOnlyList<HeavyLiquidTest> HeavyLiquids { get; init; } = [];

    public string? Polariscope { get; init; }

    public string? Pleochroism { get; init; }

    public string? Dispersion { get; init; }

    public string? ThermalProbe { get; init; }

    public string? Electrical { get; init; }

    public string? UvLong { get; init; }

    public string? UvShort { get; init; }

    /// <summary>Lines seen in a hand spectroscope; empty when it was used and showed nothing.</summary>
    public IReadOnlyList<double>? AbsorptionNanometres { get; init; }

    public string? Colour { get; init; }

    /// <summary>Magnification features seen; null when nobody looked (then <see cref="FeaturesAbsent"/> is null too).</summary>
    public IReadOnlyList<string>? FeaturesPresent { get; init; }

    /// <summary>Magnification features looked for and not seen.</summary>
    public IReadOnlyList<string>? FeaturesAbsent { get; init; }
}
