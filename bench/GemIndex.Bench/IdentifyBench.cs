using BenchmarkDotNet.Attributes;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Gravity;
using GemIndex.Core.Identification;
using GemIndex.Core.Observations;
using GemIndex.Core.Optics;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Core.Quantities;
using GemIndex.Core.Readings;
using GemIndex.Data.Catalogue;

namespace GemIndex.Bench;

/// <summary>
/// Ranking stones against the full shipped catalogue: one stone with an 8-step rotation series and every other test
/// (the text UI re-ranks on every keystroke), with and without the next-test advice and reasons, and a batch of stones
/// through the thread-safe <see cref="Identifier.Identify"/> on every core. The stones are timing inputs only (one
/// entry's range centres, a seeded random facet, readings rounded to 0.001): accuracy is the accuracy benchmark's job.
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
        var random = new Random(8);
        var readable = catalogue.Where(m => m.Indices.Highest.Maximum < RefractometerObservation.DefaultLiquidLimit - 0.01).ToList();
        _sheets = [.. Enumerable.Range(0, 1000).Select(i => Sheet(readable[random.Next(readable.Count)], random, $"B-{i}"))];
    }

    [GlobalCleanup]
    public void Cleanup() => Directory.Delete(_folder, recursive: true);

    private BenchSheet NextSheet() => _sheets[_next++ % _sheets.Length];

    [Benchmark(Baseline = true)]
    public double RankOneStone() => _identifier.Identify(NextSheet(), explainTop: 0, adviseNextTest: false).NotInCatalogue;

    [Benchmark]
    public double RankOneStoneWithReasonsAndNextTest() => _identifier.Identify(NextSheet()).NotInCatalogue;

    [Benchmark(OperationsPerInvoke = 1000)]
    public double RankThousandStonesOnEveryCore()
    {
        var results = new double[_sheets.Length];
        Parallel.For(0, _sheets.Length, i => results[i] = _identifier.Identify(_sheets[i], explainTop: 0, adviseNextTest: false).NotInCatalogue);
        return results.Sum();
    }

    /// <summary>An 8-step series every 22.5° on a random facet of the entry at its range centres, with every other test.</summary>
    public static BenchSheet Sheet(Material m, Random random, string id)
    {
        var indices = m.Indices;
        Indicatrix indicatrix = m.OpticCharacter switch
        {
            OpticCharacter.Uniaxial => Indicatrix.Uniaxial(new RefractiveIndex(indices.Omega!.Value.Centre), new RefractiveIndex(indices.Epsilon!.Value.Centre)),
            OpticCharacter.Biaxial when indices.Alpha!.Value.Centre < indices.Beta!.Value.Centre && indices.Beta.Value.Centre < indices.Gamma!.Value.Centre =>
                Indicatrix.Biaxial(new RefractiveIndex(indices.Alpha.Value.Centre), new RefractiveIndex(indices.Beta.Value.Centre), new RefractiveIndex(indices.Gamma.Value.Centre)),
            _ => Indicatrix.Isotropic(new RefractiveIndex(indices.Lowest.Centre)),
        };
        var normal = Direction.RandomUniform(random);
        var steps = RotationSeries.Simulate(indicatrix, normal, Angle.FromDegrees(22.5)).Select(s =>
        {
            double low = Math.Round(s.Low.Value, 3), high = Math.Round(s.High.Value, 3);
            return new ShadowEdgeStep(s.Rotation.Degrees, low, high - low < 0.0015 ? null : high);
        }).ToList();
        return new BenchSheet
        {
            Id = id,
            Refractometer = new RefractometerObservation(RefractometerMethod.Facet, steps),
            SpecificGravity = new SpecificGravity(Math.Round(m.SpecificGravity.Centre, 2), 0.01),
            Polariscope = m.Polariscope.Count > 0 ? m.Polariscope[0] : PolariscopeReaction.DoublyRefractive,
            Pleochroism = PleochroismObservation.None,
            Dispersion = DispersionObservation.ByEye(DispersionStrength.Weak),
            ThermalProbe = ThermalProbeResult.Negative,
            Electrical = ElectricalResult.Insulating,
            UvLong = m.UvLong.Count > 0 ? m.UvLong[0] : FluorescenceStrength.Inert,
            UvShort = m.UvShort.Count > 0 ? m.UvShort[0] : FluorescenceStrength.Inert,
            AbsorptionLinesNanometres = [.. m.AbsorptionLines.Where(l => l.Strength != LineStrength.Weak).Select(l => l.Nanometres)],
            Colour = m.Colours.Count > 0 ? m.Colours[0] : null,
        };
    }
}
