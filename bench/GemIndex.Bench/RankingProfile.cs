using System.Diagnostics;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Identification;
using GemIndex.Data.Catalogue;

namespace GemIndex.Bench;

/// <summary>
/// A Stopwatch harness for the ranking's speed work (`profile [PASSES]`): the IdentifyBench stones ranked on one thread,
/// (with `one-core`, each stone's series on one thread), a warm-up pass, then the mean CPU time per stone of each pass (the process's CPU time, less disturbed than wall time on
/// a shared machine). For comparing code changes quickly and under a sampling profiler; the README's figures come from
/// BenchmarkDotNet.
/// </summary>
public static class RankingProfile
{
    public static void Run(int passes, bool oneCore, TextWriter output)
    {
        string cache = Path.Combine(Path.GetTempPath(), "gemindex-bench-cache");
        IReadOnlyList<Material> catalogue = ShippedCatalogue.Load(cache);
        var identifier = new Identifier(catalogue).WithSeriesOnEveryCore(!oneCore);
        var random = new Random(8);
        var readable = catalogue.Where(m => m.Indices.Highest.Maximum < GemIndex.Core.Identification.RefractometerObservation.DefaultLiquidLimit - 0.01).ToList();
        var sheets = Enumerable.Range(0, 1000).Select(i => IdentifyBench.Sheet(readable[random.Next(readable.Count)], random, $"B-{i}")).ToArray();
        double checksum = 0;
        foreach (var sheet in sheets) checksum += identifier.Identify(sheet, explainTop: 0, adviseNextTest: false).NotInCatalogue;
        var process = Process.GetCurrentProcess();
        for (int pass = 0; pass < passes; pass++)
        {
            process.Refresh();
            var cpu = process.TotalProcessorTime;
            var wall = Stopwatch.StartNew();
            foreach (var sheet in sheets) checksum += identifier.Identify(sheet, explainTop: 0, adviseNextTest: false).NotInCatalogue;
            process.Refresh();
            output.WriteLine($"pass {pass + 1}: {(process.TotalProcessorTime - cpu).TotalMilliseconds / sheets.Length:0.000} ms CPU per stone, {wall.Elapsed.TotalMilliseconds / sheets.Length:0.000} ms wall");
        }
        output.WriteLine($"checksum {checksum:R}");
    }
}
