using GemIndex.Core.Catalogue;
using GemIndex.Core.Observations;
using GemIndex.Core.Optics.Indicatrix;

namespace GemIndex.Bench;

/// <summary>A seeded, invented catalogue of any size whose entries pass the catalogue check: load-time figures only.</summary>
public static class SyntheticCatalogue
{
    public static IReadOnlyList<Material> Generate(int count, int seed)
    {
        var random = new Random(seed);
        var materials = new List<Material>(count);
        for (int i = 0; i < count; i++)
        {
            double n = 1.45 + random.NextDouble() * 1.0, width = random.NextDouble() * 0.01, birefringence = 0.005 + random.NextDouble() * 0.05;
            double sg = 2.0 + random.NextDouble() * 3.0;
            Material common = new()
            {
                Name = $"generated entry {i}", Species = "generated", Variety = "generated", Family = "generated",
                Origin = OriginClass.Synthetic, CrystalSystem = CrystalSystem.Cubic,
                Indices = OpticalIndices.SingleIndex(new(n, n + width)), SpecificGravity = new(sg, sg + 0.05),
                Polariscope = [PolariscopeReaction.SinglyRefractive], UvLong = [FluorescenceStrength.Inert],
                AbsorptionLines = [new(500 + random.Next(100))], Colours = ["colourless", "blue"],
            };
            materials.Add((i % 3) switch
            {
                0 => common,
                1 => common with
                {
                    CrystalSystem = CrystalSystem.Trigonal, Sign = OpticSign.Positive, Polariscope = [PolariscopeReaction.DoublyRefractive],
                    Indices = OpticalIndices.Uniaxial(new(n, n + width), new(n + birefringence, n + birefringence + width)),
                    Birefringence = new(birefringence, birefringence),
                },
                _ => common with
                {
                    CrystalSystem = CrystalSystem.Orthorhombic, Sign = OpticSign.Either, Polariscope = [PolariscopeReaction.DoublyRefractive],
                    Indices = OpticalIndices.Biaxial(new(n, n + width), new(n + birefringence / 2, n + birefringence / 2 + width),
                        new(n + birefringence, n + birefringence + width)),
                    Birefringence = new(birefringence, birefringence),
                },
            });
        }
        return materials;
    }
}
