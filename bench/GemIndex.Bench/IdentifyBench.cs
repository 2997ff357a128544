using BenchmarkDotNet.Attributes;
using GemIndex.Bench.Accuracy;
using GemIndex.Bench.Independent;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Identification;
using GemIndex.Data.Catalogue;

namespace GemIndex.Bench;

/// <summary>
/// Ranking stones against the full shipped catalogue on one core: one stone (the text UI re-ranks on every keystroke),
/// with and without the next-test advice and reasons, and a batch of 10,000 simulated stones (ranking only).
/// </summary>
[MemoryDiagnoser]
public class IdentifyBench
{
    private string _folder = "";
    private Identifier _identifier = null!;
    private BenchSheet[] _sheets = [];
    private int _next;

    [GlobalSetup]
    public void Setup()
    {
        _folder = Path.Combine(Path.GetTempPath(), "gemindex-bench-" + Guid.NewGuid().ToString("N"));
        IReadOnlyList<Material> catalogue = ShippedCatalogue.Load(Path.Combine(_folder, "cache"));
        _identifier = new Identifier(catalogue);
        var simulator = new IndependentStoneSimulator(new Random(7));
        var random = new Random(8);
        var table = PropertyTable.Species;
        var adapter = new BatchLineAdapter(catalogue);
        _sheets = [.. Enumerable.Range(0, 10_000).Select(i => adapter.Read(simulator.Simulate(table[random.Next(table.Count)], $"B-{i}").Line))];
    }

    [GlobalCleanup]
    public void Cleanup() => Directory.Delete(_folder, recursive: true);

    private BenchSheet NextSheet() => _sheets[_next++ % _sheets.Length];

    [Benchmark(Baseline = true)]
    public double RankOneStone() => _identifier.Identify(NextSheet(), explainTop: 0, adviseNextTest: false).NotInCatalogue;

    [Benchmark]
    public double RankOneStoneWithReasonsAndNextTest() => _identifier.Identify(NextSheet()).NotInCatalogue;

    [Benchmark(OperationsPerInvoke = 10_000)]
    public double RankTenThousandStones()
    {
        double sum = 0;
        foreach (var sheet in _sheets) sum += _identifier.Identify(sheet, explainTop: 0, adviseNextTest: false).NotInCatalogue;
        return sum;
    }
}
