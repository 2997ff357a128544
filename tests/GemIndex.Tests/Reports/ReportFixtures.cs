using GemIndex.Cli.Reports;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Identification;
using GemIndex.Core.Observations;
using GemIndex.Data.Batch;
using GemIndex.Data.Workbook;

namespace GemIndex.Tests.Reports;

/// <summary>A small catalogue built in code and invented stones for the report tests.</summary>
internal static class ReportFixtures
{
    // Ranges from memory of standard handbook values; only their order matters to these tests.
    public static readonly IReadOnlyList<Material> Catalogue =
    [
        new()
        {
            Name = "quartz", Species = "quartz", Variety = "rock crystal", Origin = OriginClass.Natural, CrystalSystem = CrystalSystem.Trigonal,
            Indices = OpticalIndices.Uniaxial(new(1.543, 1.545), new(1.552, 1.554)), Sign = Core.Optics.Indicatrix.OpticSign.Positive,
            Birefringence = new(0.009, 0.009), SpecificGravity = new(2.64, 2.66), Polariscope = [PolariscopeReaction.DoublyRefractive],
            Frequency = BenchFrequency.VeryCommon,
        },
        new()
        {
            Name = "corundum", Species = "corundum", Variety = "sapphire", Origin = OriginClass.Natural, CrystalSystem = CrystalSystem.Trigonal,
            Indices = OpticalIndices.Uniaxial(new(1.768, 1.772), new(1.760, 1.764)), Sign = Core.Optics.Indicatrix.OpticSign.Negative,
            Birefringence = new(0.008, 0.009), SpecificGravity = new(3.98, 4.02), Polariscope = [PolariscopeReaction.DoublyRefractive],
            Frequency = BenchFrequency.VeryCommon,
        },
        new()
        {
            Name = "glass", Species = "glass", Variety = "glass", Origin = OriginClass.Imitation, CrystalSystem = CrystalSystem.Amorphous,
            Indices = OpticalIndices.SingleIndex(new(1.48, 1.70), Core.Optics.Indicatrix.OpticCharacter.Amorphous),
            SpecificGravity = new(2.3, 4.5), Polariscope = [PolariscopeReaction.SinglyRefractive, PolariscopeReaction.Anomalous],
            Frequency = BenchFrequency.VeryCommon,
        },
    ];

    /// <summary>An invented quartz: a full rotation series, SG by weighing, doubly refractive.</summary>
    public const string QuartzLine =
        """{"id":"lot 7 / 2","refractometer":{"method":"facet","readings":[{"rotation_deg":0,"low":1.544,"high":1.553},{"rotation_deg":45,"low":1.544,"high":1.551},{"rotation_deg":90,"low":1.544,"high":1.548},{"rotation_deg":135,"low":1.544,"high":1.551}]},"sg":{"air_ct":2.650,"water_ct":1.650,"water_c":20},"polariscope":"doubly_refractive","uv_long":"inert","colour":"colourless"}""";

    public static StoneSheet Sheet(string line, string? reference = null)
    {
        var readings = StoneReadingsJson.Parse(line);
        return new StoneSheet
        {
            Reference = reference ?? readings.Id, WeightCarats = 2.65, Dimensions = "10.1 x 8.0 x 5.2 mm", Shape = "oval",
            CuttingStyle = "mixed cut", Transparency = "transparent", Notes = "invented test stone", Readings = readings,
        };
    }

    public static IdentificationResult Identify(StoneSheet sheet) =>
        GemIndex.Core.Bench.BenchIdentification.Identify(new Identifier(Catalogue), StoneReadingsConverter.ToReadings(sheet.Readings), new()).Result!;

    public static StoneReport Report(string line, string? reference = null)
    {
        var sheet = Sheet(line, reference);
        return StoneReport.Build(sheet, Identify(sheet));
    }
}
