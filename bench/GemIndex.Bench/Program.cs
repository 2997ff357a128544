using BenchmarkDotNet.Running;
using GemIndex.Bench.Accuracy;
using GemIndex.Data.Catalogue;

// accuracy [STONES] [SEED]: the accuracy benchmark (README "Accuracy benchmark");
// anything else goes to BenchmarkDotNet: dotnet run -c Release --project bench/GemIndex.Bench -- --filter '*' --job short
if (args.Length > 0 && args[0] == "accuracy")
{
    int stones = args.Length > 1 && args[1] != "--failures" ? int.Parse(args[1], System.Globalization.CultureInfo.InvariantCulture) : 3000;
    int seed = args.Length > 2 && args[2] != "--failures" ? int.Parse(args[2], System.Globalization.CultureInfo.InvariantCulture) : 1;
    string cache = Path.Combine(Path.GetTempPath(), "gemindex-bench-cache");
    AccuracyRun.Run(ShippedCatalogue.Load(cache), stones, seed, Console.Out, args.Contains("--failures") ? Console.Error : null);
    return 0;
}
BenchmarkSwitcher.FromAssembly(typeof(AccuracyRun).Assembly).Run(args);
return 0;
