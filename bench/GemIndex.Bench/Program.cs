using BenchmarkDotNet.Running;
using GemIndex.Bench.Accuracy;
using GemIndex.Data.Catalogue;

// accuracy [STONES] [SEED] [--failures] [--lines FILE] [--loupe SHARE] [--beyond SHARE]: the independent accuracy
// benchmark (docs/benchmark.md); --loupe: SHARE of stones get a magnification look (default 0.5; 0 gives the sheets
// without it); --beyond: SHARE of stones drawn beyond the table's ranges (default 0.07; a stress check);
// anything else goes to BenchmarkDotNet: dotnet run -c Release --project bench/GemIndex.Bench -- --filter '*' --job short
if (args.Length > 0 && args[0] == "accuracy")
{
    var numbers = args.Skip(1).TakeWhile(a => !a.StartsWith("--", StringComparison.Ordinal)).ToList();
    int stones = numbers.Count > 0 ? int.Parse(numbers[0], System.Globalization.CultureInfo.InvariantCulture) : 2000;
    int seed = numbers.Count > 1 ? int.Parse(numbers[1], System.Globalization.CultureInfo.InvariantCulture) : 1;
    int linesAt = Array.IndexOf(args, "--lines");
    using var lines = linesAt > 0 && linesAt + 1 < args.Length ? new StreamWriter(args[linesAt + 1]) : null;
    int loupeAt = Array.IndexOf(args, "--loupe");
    double lookShare = loupeAt > 0 && loupeAt + 1 < args.Length
        ? double.Parse(args[loupeAt + 1], System.Globalization.CultureInfo.InvariantCulture)
        : GemIndex.Bench.Independent.LoupeExaminer.DefaultLookShare;
    int beyondAt = Array.IndexOf(args, "--beyond");
    double beyondShare = beyondAt > 0 && beyondAt + 1 < args.Length
        ? double.Parse(args[beyondAt + 1], System.Globalization.CultureInfo.InvariantCulture)
        : GemIndex.Bench.Independent.IndependentStoneSimulator.BeyondRangeShare;
    string cache = Path.Combine(Path.GetTempPath(), "gemindex-bench-cache");
    IndependentAccuracyRun.Run(ShippedCatalogue.Load(cache), stones, seed, Console.Out, args.Contains("--failures") ? Console.Error : null, lines, lookShare, beyondShare);
    return 0;
}
// profile [PASSES] [one-core]: CPU and wall time per stone of the IdentifyBench stones, one stone at a time (RankingProfile)
if (args.Length > 0 && args[0] == "profile")
{
    GemIndex.Bench.RankingProfile.Run(args.Length > 1 ? int.Parse(args[1], System.Globalization.CultureInfo.InvariantCulture) : 5, args.Contains("one-core"), Console.Out);
    return 0;
}
BenchmarkSwitcher.FromAssembly(typeof(IndependentAccuracyRun).Assembly).Run(args);
return 0;
