using System.Diagnostics;
using System.Globalization;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Identification;
using GemIndex.Core.Optics.Indicatrix;

namespace GemIndex.Bench.Accuracy;

/// <summary>
/// The accuracy benchmark: simulated stones through the engine and through the printed-table baseline, side by side;
/// top-1 and top-3 accuracy, expected calibration error, "nothing fits" on stones whose species was removed from the
/// catalogue, and stones per second on one core.
/// </summary>
internal static class AccuracyRun
{
    public static void Run(IReadOnlyList<Material> catalogue, int stones, int seed, TextWriter o, TextWriter? failures = null)
    {
        var random = new Random(seed);
        var simulator = new StoneSimulator(random);
        var identifier = new Identifier(catalogue);
        double[] weights = [.. catalogue.Select(m => BenchFrequencyWeights.Of(m.Frequency))];
        var cases = Enumerable.Range(0, stones).Select(i =>
        {
            var truth = catalogue[Draw(weights, random)];
            return (Truth: truth, Sheet: simulator.Simulate(truth, $"S-{i:D5}"));
        }).ToList();

        int top1 = 0, top3 = 0, base1 = 0, base3 = 0, separableCount = 0, separableTop1 = 0, separableBase1 = 0, groupTop1 = 0, falseAlarms = 0;
        var bins = new (double Confidence, int Correct, int Count)[10];
        var stopwatch = Stopwatch.StartNew();
        var results = cases.Select(c => identifier.Identify(c.Sheet, maximumCandidates: 10, explainTop: 0)).ToList();
        double seconds = stopwatch.Elapsed.TotalSeconds;
        foreach (var ((truth, sheet), result) in cases.Zip(results))
        {
            var names = result.Candidates.Select(c => c.Material.Name).ToList();
            bool first = names[0] == truth.Name;
            top1 += first ? 1 : 0;
            top3 += names.Take(3).Contains(truth.Name) ? 1 : 0;
            var baseline = PrintedTableBaseline.Rank(catalogue, sheet);
            bool baseFirst = baseline.Count > 0 && baseline[0].Name == truth.Name;
            base1 += baseFirst ? 1 : 0;
            base3 += baseline.Take(3).Any(m => m.Name == truth.Name) ? 1 : 0;
            var partners = catalogue.Where(m => m.Name != truth.Name && Inseparable(m, truth)).Select(m => m.Name).ToHashSet();
            if (partners.Count == 0) { separableCount++; separableTop1 += first ? 1 : 0; separableBase1 += baseFirst ? 1 : 0; }
            if (!first && partners.Count == 0 && failures is not null)
                failures.WriteLine($"{truth.Name}: " + string.Join(" | ", result.Candidates.Take(3).Select(c => $"{c.Material.Name} {c.Confidence:0.00}")) + " <- " + Describe(sheet));
            groupTop1 += first || partners.Contains(names[0]) ? 1 : 0;
            falseAlarms += result.NoGoodMatch ? 1 : 0;
            int bin = Math.Min(9, (int)(result.Candidates[0].Confidence * 10));
            bins[bin] = (bins[bin].Confidence + result.Candidates[0].Confidence, bins[bin].Correct + (first ? 1 : 0), bins[bin].Count + 1);
        }
        double ece = bins.Where(b => b.Count > 0).Sum(b => Math.Abs(b.Correct - b.Confidence) / stones);

        o.WriteLine($"stones: {stones} (seed {seed}), catalogue: {catalogue.Count} entries");
        o.WriteLine();
        o.WriteLine("| measure | engine | printed-table baseline |");
        o.WriteLine("|---|---|---|");
        o.WriteLine($"| top-1, all stones | {P(top1, stones)} | {P(base1, stones)} |");
        o.WriteLine($"| top-3, all stones | {P(top3, stones)} | {P(base3, stones)} |");
        o.WriteLine($"| top-1, stones whose material the tests can separate ({separableCount}) | {P(separableTop1, separableCount)} | {P(separableBase1, separableCount)} |");
        o.WriteLine($"| top-1 within the inseparable group (e.g. natural vs synthetic) | {P(groupTop1, stones)} | – |");
        o.WriteLine($"| expected calibration error (10 bins, top-1) | {ece.ToString("0.000", CultureInfo.InvariantCulture)} | – |");
        o.WriteLine($"| \"nothing fits\" raised on catalogue stones (false alarms) | {P(falseAlarms, stones)} | – |");
        o.WriteLine($"| stones per second, one core, with next test | {(stones / seconds).ToString("0", CultureInfo.InvariantCulture)} | – |");
        o.WriteLine();
        o.WriteLine("Calibration (top-1 confidence bins):");
        o.WriteLine("| bin | stones | mean confidence | accuracy |");
        o.WriteLine("|---|---|---|---|");
        for (int i = 0; i < 10; i++)
            if (bins[i].Count > 0)
                o.WriteLine($"| {i / 10.0:0.0}–{(i + 1) / 10.0:0.0} | {bins[i].Count} | {(bins[i].Confidence / bins[i].Count).ToString("0.000", CultureInfo.InvariantCulture)} | {P(bins[i].Correct, bins[i].Count)} |");
        NotInCatalogue(catalogue, cases.Take(Math.Min(500, stones)).ToList(), o, failures);
        Speed(identifier, cases.Select(c => c.Sheet).ToList(), o);
    }

    private static void NotInCatalogue(IReadOnlyList<Material> catalogue, List<(Material Truth, BenchSheet Sheet)> cases, TextWriter o, TextWriter? failures)
    {
        int flagged = 0, named = 0;
        foreach (var (truth, sheet) in cases)
        {
            // Not in the catalogue: take away the stone's species and every entry the tests cannot tell from it
            // (a corundum doublet reads as corundum), so that nothing left should fit.
            var without = new Identifier([.. catalogue.Where(m => m.Species != truth.Species && !Inseparable(m, truth))]);
            var r = without.Identify(sheet, explainTop: 0, adviseNextTest: false);
            flagged += r.NoGoodMatch ? 1 : 0;
            named += !r.NoGoodMatch && r.Candidates[0].Confidence >= 0.8 ? 1 : 0;
            if (!r.NoGoodMatch && r.Candidates[0].Confidence >= 0.8 && failures is not null)
                failures.WriteLine($"REMOVED {truth.Name} ({truth.Species}) -> {r.Candidates[0].Material.Name} {r.Candidates[0].Confidence:0.00} fit {r.Candidates[0].Fit:0.000} other {r.NotInCatalogue:0.000} <- {Describe(sheet)}");
        }
        o.WriteLine();
        o.WriteLine($"Species and look-alikes removed from the catalogue ({cases.Count} stones): \"nothing fits\" raised for {P(flagged, cases.Count)}; " +
            $"a wrong material named at ≥ 80 % for {P(named, cases.Count)}.");
    }

    private static void Speed(Identifier identifier, List<BenchSheet> sheets, TextWriter o)
    {
        foreach (var s in sheets.Take(200)) identifier.Identify(s, explainTop: 0, adviseNextTest: false); // warm up (JIT)
        var stopwatch = Stopwatch.StartNew();
        foreach (var s in sheets) identifier.Identify(s, explainTop: 0, adviseNextTest: false);
        double rankOnly = stopwatch.Elapsed.TotalSeconds;
        o.WriteLine($"Ranking only (no next test, no reasons): {(rankOnly / sheets.Count * 1e6).ToString("0", CultureInfo.InvariantCulture)} µs a stone; " +
            $"10,000 stones would take {(rankOnly / sheets.Count * 10000).ToString("0.00", CultureInfo.InvariantCulture)} s on one core.");
    }

    private static string Describe(BenchSheet s) => string.Join("; ", new[]
    {
        s.Refractometer is { } r ? (r.Spot is { } spot ? $"spot {spot}" : string.Join(" ", r.Steps.Select(x => $"{x.RotationDegrees:0}:{x.Low:0.000}/{x.High:0.000}"))) + (r.OverLimit ? " OTL" : "") : null,
        s.SpecificGravity is { } g ? $"SG {g.Value}" : null, s.Polariscope?.ToString(), s.Pleochroism?.ToString(), s.Colour,
        s.UvLong is { } u ? $"LW {u}" : null, s.AbsorptionLinesNanometres is { } l ? "lines " + string.Join(",", l) : null,
    }.Where(x => x is not null));

    /// <summary>Two materials the bench tests cannot tell apart: same optic character, overlapping index and SG ranges.</summary>
    internal static bool Inseparable(Material a, Material b) =>
        a.OpticCharacter == b.OpticCharacter
        && Overlap(a.Indices.Lowest, b.Indices.Lowest, 0.003) && Overlap(a.Indices.Highest, b.Indices.Highest, 0.003)
        && Overlap(a.SpecificGravity, b.SpecificGravity, 0.02)
        && (a.OpticCharacter is not (OpticCharacter.Uniaxial or OpticCharacter.Biaxial) || a.Sign == b.Sign || a.Sign == OpticSign.Either || b.Sign == OpticSign.Either);

    private static bool Overlap(PropertyRange a, PropertyRange b, double margin) => a.Minimum <= b.Maximum + margin && b.Minimum <= a.Maximum + margin;

    private static int Draw(double[] weights, Random random)
    {
        double x = random.NextDouble() * weights.Sum();
        for (int i = 0; i < weights.Length; i++) if ((x -= weights[i]) <= 0) return i;
        return weights.Length - 1;
    }

    private static string P(int k, int n) => n == 0 ? "–" : (100.0 * k / n).ToString("0.0", CultureInfo.InvariantCulture) + " %";
}
