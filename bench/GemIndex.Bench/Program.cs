using BenchmarkDotNet.Running;
using GemIndex.Bench.Accuracy;
using GemIndex.Data.Catalogue;

// accuracy [STONES] [SEED] [--failures] [--lines FILE]: the independent accuracy benchmark (docs/benchmark.md);
// anything else goes to BenchmarkDotNet: dotnet run -c Release --project bench/GemIndex.Bench -- --filter '*' --job short
if (args.Length > 0 && args[0] == "accuracy")
{
    var numbers = args.Skip(1).TakeWhile(a => !a.StartsWith("--", StringComparison.Ordinal)).ToList();
    int stones = numbers.Count > 0 ? int.Parse(numbers[0], System.Globalization.CultureInfo.InvariantCulture) : 2000;
    int seed = numbers.Count > 1 ? int.Parse(numbers[1], System.Globalization.CultureInfo.InvariantCulture) : 1;
    int linesAt = Array.IndexOf(args, "--lines");
    using var lines = linesAt > 0 && linesAt + 1 < args.Length ? new StreamWriter(args[linesAt + 1]) : null;
    string cache = Path.Combine(Path.GetTempPath(), "gemindex-bench-cache");
    IndependentAccuracyRun.Run(ShippedCatalogue.Load(cache), stones, seed, Console.Out, args.Contains("--failures") ? Console.Error : null, lines);
    return 0;
}
BenchmarkSwitcher.FromAssembly(typeof(IndependentAccuracyRun).Assembly).Run(args);
return 0;
