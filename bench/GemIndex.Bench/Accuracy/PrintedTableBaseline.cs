using GemIndex.Core.Catalogue;
using GemIndex.Core.Identification;
using GemIndex.Core.Optics.Indicatrix;

namespace GemIndex.Bench.Accuracy;

/// <summary>
/// The printed-table method, for comparison: keep the materials whose ranges contain every reading within a fixed
/// tolerance (index ±0.01, birefringence ±0.005, SG ±0.05; over the limit: lowest index above the limit − 0.01;
/// polariscope and thermal probe must match), then rank the survivors by how common they are.
/// </summary>
internal static class PrintedTableBaseline
{
    public static IReadOnlyList<Material> Rank(IReadOnlyList<Material> catalogue, BenchSheet sheet) =>
        [.. catalogue.Where(m => Keeps(m, sheet)).OrderBy(m => m.Frequency)];

    private static bool Keeps(Material m, BenchSheet s)
    {
        const double index = 0.01, bire = 0.005, sg = 0.05;
        var lowest = m.Indices.Lowest;
        var highest = m.Indices.Highest;
        if (s.Refractometer is { } r)
        {
            var readings = r.Steps;
            if (readings.Count > 0)
            {
                double low = readings.Min(x => x.Low), high = readings.Max(x => x.High ?? x.Low);
                if (!Near(low, lowest, index)) return false;
                if (!r.OverLimit && !Near(high, highest, index)) return false;
                double b = high - low;
                var range = m.Birefringence ?? new PropertyRange(0, m.OpticCharacter is OpticCharacter.Uniaxial or OpticCharacter.Biaxial ? 0.3 : 0);
                if (!r.OverLimit && !Near(b, range, bire)) return false;
            }
            else if (r.Spot is { } spot)
            {
                if (!Near(spot, new PropertyRange(lowest.Minimum, highest.Maximum), index)) return false;
            }
            else if (r.OverLimit && lowest.Maximum < r.LiquidLimit - index) return false;
        }
        if (s.SpecificGravity is { } g && !Near(g.Value, m.SpecificGravity, sg)) return false;
        if (s.Polariscope is { } p && m.Polariscope.Count > 0 && !m.Polariscope.Contains(p)) return false;
        if (s.ThermalProbe is { } t && t != m.ThermalProbe) return false;
        return true;
    }

    private static bool Near(double x, PropertyRange range, double tolerance) =>
        x >= range.Minimum - tolerance && x <= range.Maximum + tolerance;
}
