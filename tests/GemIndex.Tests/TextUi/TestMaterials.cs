using GemIndex.Core.Catalogue;
using GemIndex.Core.Observations;
using GemIndex.Core.Optics.Indicatrix;

namespace GemIndex.Tests.TextUi;

/// <summary>A small catalogue for the text UI tests (values from memory, common practice; they only need to be distinct).</summary>
internal static class TestMaterials
{
    public static IReadOnlyList<Material> All { get; } =
    [
        new Material
        {
            Name = "quartz", Species = "quartz", Variety = "rock crystal", Origin = OriginClass.Natural, CrystalSystem = CrystalSystem.Trigonal,
            Indices = OpticalIndices.Uniaxial(new PropertyRange(1.544, 1.545), new PropertyRange(1.553, 1.554)), Sign = OpticSign.Positive,
            Birefringence = new PropertyRange(0.009, 0.009), SpecificGravity = new PropertyRange(2.65, 2.66), Polariscope = [PolariscopeReaction.DoublyRefractive],
            Frequency = BenchFrequency.VeryCommon,
        },
        new Material
        {
            Name = "spinel", Species = "spinel", Variety = "red spinel", Origin = OriginClass.Natural, CrystalSystem = CrystalSystem.Cubic,
            Indices = OpticalIndices.SingleIndex(new PropertyRange(1.712, 1.736)), SpecificGravity = new PropertyRange(3.58, 3.61),
            Polariscope = [PolariscopeReaction.SinglyRefractive], Frequency = BenchFrequency.Common,
        },
        new Material
        {
            Name = "opal", Species = "opal", Variety = "white opal", Origin = OriginClass.Natural, CrystalSystem = CrystalSystem.Amorphous,
            Indices = OpticalIndices.SingleIndex(new PropertyRange(1.43, 1.47), OpticCharacter.Amorphous), SpecificGravity = new PropertyRange(1.98, 2.20),
            Polariscope = [PolariscopeReaction.SinglyRefractive, PolariscopeReaction.Anomalous], DoNotImmerse = true,
            Notes = "porous", Frequency = BenchFrequency.Common,
        },
        new Material
        {
            Name = "glass", Species = "glass", Variety = "crown glass", Origin = OriginClass.Imitation, CrystalSystem = CrystalSystem.Amorphous,
            Indices = OpticalIndices.SingleIndex(new PropertyRange(1.50, 1.70), OpticCharacter.Amorphous), SpecificGravity = new PropertyRange(2.3, 4.5),
            Polariscope = [PolariscopeReaction.SinglyRefractive, PolariscopeReaction.Anomalous], Frequency = BenchFrequency.Common,
        },
    ];
}
