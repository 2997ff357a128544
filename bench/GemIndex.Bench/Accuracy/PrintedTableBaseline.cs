using GemIndex.Bench.Independent;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Observations;
using GemIndex.Core.Optics.Indicatrix;

namespace GemIndex.Bench.Accuracy;

/// <summary>
/// The printed-table method, for comparison: a person with the catalogue's ranges as a printed table reads the bench
/// sheet and keeps the materials whose ranges contain every reading within a fixed tolerance (index ±0.01,
/// birefringence ±0.005, SG ±0.05; over the limit: lowest index above the limit − 0.01; polariscope and heat probe must
/// match), then ranks the survivors by how common they are. It reads the sheet as written (the simulator's
/// <see cref="BenchReadings"/>, the same values as the batch line), not through the engine's reader.
/// </summary>
internal static class PrintedTableBaseline
{
    private const double IndexTolerance = 0.01, BirefringenceTolerance = 0.005, GravityTolerance = 0.05;

    public static IReadOnlyList<Material> Rank(IReadOnlyList<Material> catalogue, BenchReadings sheet) =>
        [.. catalogue.Where(m => Keeps(m, sheet)).OrderBy(m => m.SpeciesFrequency).ThenBy(m => m.Frequency)];

    private static bool Keeps(Material m, BenchReadings s)
    {
        var lowest = m.Indices.Lowest;
        var highest = m.Indices.Highest;
        if (s.Steps.Count > 0)
        {
            double low = s.Steps.Min(x => x.Low), high = s.Steps.Max(x => x.High ?? x.Low);
            bool highHidden = s.Steps.Any(x => x.High is null) && highest.Maximum >= s.LiquidLimit - IndexTolerance;
            if (!Near(low, lowest, IndexTolerance)) return false;
            if (!highHidden && !Near(high, highest, IndexTolerance)) return false;
            var range = m.Birefringence ?? new PropertyRange(0, m.OpticCharacter is OpticCharacter.Uniaxial or OpticCharacter.Biaxial ? 0.3 : 0);
            if (!highHidden && !Near(high - low, range, BirefringenceTolerance)) return false;
        }
        else if (s.Spot is { } spot)
        {
            if (!Near(spot, new PropertyRange(lowest.Minimum, highest.Maximum), IndexTolerance)) return false;
        }
        else if (s.OverLimit && lowest.Maximum < s.LiquidLimit - IndexTolerance) return false;
        if (Gravity(s) is { } g && !Near(g, m.SpecificGravity, GravityTolerance)) return false;
        foreach (var h in s.HeavyLiquids)
        {
            if (h.Result == "floats" && m.SpecificGravity.Minimum > h.Density + GravityTolerance) return false;
            if (h.Result == "sinks" && m.SpecificGravity.Maximum < h.Density - GravityTolerance) return false;
        }
        if (Polariscope(s.Polariscope) is { } p && m.Polariscope.Count > 0 && !m.Polariscope.Contains(p)) return false;
        if (s.ThermalProbe is { } t && (t == "positive") != (m.ThermalProbe == ThermalProbeResult.Positive)) return false;
        return true;
    }

    /// <summary>The SG the sheet gives, worked out from the weights as a person would (water at 20 °C unless written).</summary>
    private static double? Gravity(BenchReadings s) =>
        s.SpecificGravity ?? (s.Weighing is { } w
            ? w.AirCarats / (w.AirCarats - w.WaterCarats) * WaterDensity.RelativeToFourDegrees(w.WaterCelsius ?? 20)
            : null);

    private static PolariscopeReaction? Polariscope(string? word) => word switch
    {
        "singly_refractive" => PolariscopeReaction.SinglyRefractive,
        "doubly_refractive" => PolariscopeReaction.DoublyRefractive,
        "aggregate" => PolariscopeReaction.Aggregate,
        "anomalous" => PolariscopeReaction.Anomalous,
        _ => null,
    };

    private static bool Near(double x, PropertyRange range, double tolerance) =>
        x >= range.Minimum - tolerance && x <= range.Maximum + tolerance;
}
