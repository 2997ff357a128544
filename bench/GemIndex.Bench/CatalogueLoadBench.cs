using BenchmarkDotNet.Attributes;
using GemIndex.Data.Catalogue;

namespace GemIndex.Bench;

/// <summary>Opening a catalogue file read-only and loading every entry: the shipped one, and a generated 10,000-entry one.</summary>
[MemoryDiagnoser]
public class CatalogueLoadBench
{
    private string _folder = "";
    private string _shipped = "";
    private string _generated = "";

    [GlobalSetup]
    public void Setup()
    {
        _folder = Path.Combine(Path.GetTempPath(), "gemindex-bench-" + Guid.NewGuid().ToString("N"));
        _shipped = ShippedCatalogue.EnsureBuilt(Path.Combine(_folder, "cache"));
        _generated = Path.Combine(_folder, "generated.db");
        CatalogueBuilder.Write(SyntheticCatalogue.Generate(10_000, seed: 20261202), _generated, "shipped", "generated");
    }

    [GlobalCleanup]
    public void Cleanup() => Directory.Delete(_folder, recursive: true);

    [Benchmark(Baseline = true)]
    public int OpenAndLoadShipped()
    {
        using CatalogueStore store = CatalogueStore.Open(_shipped);
        return store.LoadAll().Count;
    }

    [Benchmark]
    public int OpenAndLoadGenerated10000()
    {
        using CatalogueStore store = CatalogueStore.Open(_generated);
        return store.LoadAll().Count;
    }
}
