using GemIndex.Core.Catalogue;
using GemIndex.Core.Gravity;
using GemIndex.Core.Observations;
using GemIndex.Core.Identification;
using GemIndex.Core.Optics;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Core.Quantities;
using GemIndex.Core.Readings;

namespace GemIndex.Core.Tests.Identification;

/// <summary>
/// The ranking works out the rotation series' section model of the distinct priors on every core before it weighs the
/// entries (docs/ranking.md §6, "Speed"). That is a matter of speed only: the answer must be the same, bit for bit, as
/// with every series worked out in turn on one thread.
/// </summary>
public class SeriesOnEveryCoreTests
{
    private static Material Crystal(string name, string species, OpticalIndices indices, PropertyRange? birefringence, OpticSign sign, double sg,
        OriginClass origin = OriginClass.Natural) => new()
    {
        Name = name, Species = species, Variety = name, Origin = origin, CrystalSystem = CrystalSystem.Trigonal,
        Indices = indices, Birefringence = birefringence, Sign = sign, SpecificGravity = new(sg - 0.03, sg + 0.03),
        Polariscope = indices.Character is OpticCharacter.Uniaxial or OpticCharacter.Biaxial ? [PolariscopeReaction.DoublyRefractive] : [PolariscopeReaction.SinglyRefractive],
    };

    // Handbook values from memory (the section model's own tests cite theirs); several overlap on purpose, so that many
    // priors pass the screen for one stone and are worked out side by side.
    private static readonly Material[] Catalogue =
    [
        Crystal("rock crystal", "quartz", OpticalIndices.Uniaxial(new(1.543, 1.545), new(1.552, 1.554)), new(0.009, 0.009), OpticSign.Positive, 2.65),
        Crystal("scapolite", "scapolite", OpticalIndices.Uniaxial(new(1.550, 1.580), new(1.540, 1.560)), new(0.004, 0.037), OpticSign.Negative, 2.68),
        Crystal("cordierite", "cordierite", OpticalIndices.Biaxial(new(1.527, 1.560), new(1.532, 1.574), new(1.537, 1.578)), new(0.007, 0.018), OpticSign.Either, 2.61),
        Crystal("peridot", "olivine", OpticalIndices.Biaxial(new(1.652, 1.656), new(1.670, 1.674), new(1.688, 1.692)), new(0.035, 0.037), OpticSign.Either, 3.34),
        Crystal("tourmaline", "tourmaline", OpticalIndices.Uniaxial(new(1.635, 1.675), new(1.610, 1.650)), new(0.018, 0.040), OpticSign.Negative, 3.06),
        Crystal("synthetic quartz", "quartz", OpticalIndices.Uniaxial(new(1.543, 1.545), new(1.552, 1.554)), new(0.009, 0.009), OpticSign.Positive, 2.65, OriginClass.Synthetic),
        Crystal("beryl", "beryl", OpticalIndices.Uniaxial(new(1.565, 1.602), new(1.560, 1.595)), new(0.004, 0.009), OpticSign.Negative, 2.72),
        Crystal("glass", "glass", OpticalIndices.SingleIndex(new(1.50, 1.70), OpticCharacter.Amorphous), null, OpticSign.None, 2.6),
    ];

    /// <summary>A series simulated from the entry's range centres on a seeded random facet, read every 22.5° and rounded to 0.001.</summary>
    private static BenchSheet Sheet(Material m, Random random, int steps)
    {
        var i = m.Indices;
        Indicatrix indicatrix = m.OpticCharacter switch
        {
            OpticCharacter.Uniaxial => Indicatrix.Uniaxial(new RefractiveIndex(i.Omega!.Value.Centre), new RefractiveIndex(i.Epsilon!.Value.Centre)),
            OpticCharacter.Biaxial => Indicatrix.Biaxial(new RefractiveIndex(i.Alpha!.Value.Centre), new RefractiveIndex(i.Beta!.Value.Centre), new RefractiveIndex(i.Gamma!.Value.Centre)),
            _ => Indicatrix.Isotropic(new RefractiveIndex(i.Lowest.Centre)),
        };
        var normal = Direction.RandomUniform(random);
        var read = RotationSeries.Simulate(indicatrix, normal, Angle.FromDegrees(180.0 / steps)).Take(steps).Select(s =>
        {
            double low = Math.Round(s.Low.Value, 3), high = Math.Round(s.High.Value, 3);
            return new ShadowEdgeStep(s.Rotation.Degrees, low, high - low < 0.0015 ? null : high);
        }).ToList();
        return new BenchSheet
        {
            Refractometer = new RefractometerObservation(RefractometerMethod.Facet, read),
            SpecificGravity = new SpecificGravity(Math.Round(m.SpecificGravity.Centre + 0.02 * (random.NextDouble() - 0.5), 2), 0.01),
        };
    }

    [Fact]
    public void Working_the_series_out_on_every_core_gives_the_same_answer_bit_for_bit()
    {
        var everyCore = new Identifier(Catalogue);
        var oneCore = everyCore.WithSeriesOnEveryCore(false);
        Assert.True(everyCore.SeriesOnEveryCore);
        Assert.False(oneCore.SeriesOnEveryCore);
        var random = new Random(14);
        int compared = 0;
        for (int n = 0; n < 60; n++)
        {
            var sheet = Sheet(Catalogue[random.Next(Catalogue.Length)], random, random.Next(2) == 0 ? 4 : 8);
            var a = everyCore.Identify(sheet, maximumCandidates: Catalogue.Length);
            var b = oneCore.Identify(sheet, maximumCandidates: Catalogue.Length);
            Assert.Equal(b.NotInCatalogue, a.NotInCatalogue);
            Assert.Equal(b.NoGoodMatch, a.NoGoodMatch);
            Assert.Equal(b.Candidates.Select(c => c.Material.Name), a.Candidates.Select(c => c.Material.Name));
            Assert.Equal(b.Candidates.Select(c => c.Confidence), a.Candidates.Select(c => c.Confidence));
            Assert.Equal(b.Candidates.Select(c => c.Fit), a.Candidates.Select(c => c.Fit));
            Assert.Equal(b.Species.Select(s => (s.Species, s.Confidence)), a.Species.Select(s => (s.Species, s.Confidence)));
            compared++;
        }
        Assert.Equal(60, compared);
    }
}
