using BenchmarkDotNet.Running;
using GemIndex.Bench;

// dotnet run -c Release --project bench/GemIndex.Bench -- --filter '*' --job short
BenchmarkSwitcher.FromAssembly(typeof(CatalogueLoadBench).Assembly).Run(args);
