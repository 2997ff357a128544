using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Observations;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Data.Catalogue;

namespace GemIndex.Data.Tests.Catalogue;

public class CatalogueRoundTripProperties
{
    private static readonly OpticCharacter[] SingleIndexCharacters = [OpticCharacter.Isotropic, OpticCharacter.Amorphous, OpticCharacter.Aggregate];

    private static readonly ValueSource[] References =
    [
        new("memory", SourceKind.FromMemory, "from memory of standard handbook values"),
        new("practice", SourceKind.CommonPractice, "common practice"),
        new("book-'quoted'", SourceKind.Published, "An invented handbook, \"quoted\", with, commas (2000), p. 12"),
    ];

    private static T Pick<T>(Random r) where T : struct, Enum => Enum.GetValues<T>()[r.Next(Enum.GetValues<T>().Length)];

    private static PropertyRange? Maybe(Random r, double low, double span) =>
        r.Next(3) == 0 ? null : new PropertyRange(low, low + r.NextDouble() * span);

    // Any field combination the model and the schema's checks allow, consistent or not: the store must keep whatever it is given.
    private static Material Random(Random r, int i)
    {
        double n = 1.3 + r.NextDouble();
        OpticalIndices indices = r.Next(3) switch
        {
            0 => OpticalIndices.SingleIndex(new(n, n + 0.01), SingleIndexCharacters[r.Next(SingleIndexCharacters.Length)]),
            1 => OpticalIndices.Uniaxial(new(n, n), new(n + 0.02, n + 0.03)),
            _ => OpticalIndices.Biaxial(new(n, n), new(n + 0.01, n + 0.01), new(n + 0.02, n + 0.05)),
        };
        PropertyRange sg = new(1 + r.NextDouble(), 3 + r.NextDouble());
        return new Material
        {
            Name = $"entry {i} with 'quotes', \"double\" and ω", Species = "s", Variety = "v", Family = "f" + r.Next(3),
            Origin = Pick<OriginClass>(r), CrystalSystem = Pick<CrystalSystem>(r), Indices = indices, Sign = Pick<OpticSign>(r),
            Birefringence = Maybe(r, 0, 0.1), SpecificGravity = sg,
            // The schema's one cross-field rule: a usual part lies inside the SG range.
            SpecificGravityUsual = r.Next(2) == 0 ? null : new(sg.Minimum + r.NextDouble() * 0.45 * (sg.Maximum - sg.Minimum), sg.Maximum - r.NextDouble() * 0.45 * (sg.Maximum - sg.Minimum)),
            Dispersion = r.Next(2) == 0 ? null : r.NextDouble() / 10, Hardness = Maybe(r, 1, 5),
            Pleochroism = Pick<PleochroismStrength>(r), Polariscope = [.. Enumerable.Range(0, r.Next(4)).Select(_ => Pick<PolariscopeReaction>(r))],
            ThermalProbe = Pick<ThermalProbeResult>(r), Electrical = Pick<ElectricalResult>(r),
            UvLong = [.. Enumerable.Range(0, r.Next(3)).Select(_ => Pick<FluorescenceStrength>(r))],
            UvShort = [.. Enumerable.Range(0, r.Next(3)).Select(_ => Pick<FluorescenceStrength>(r))],
            AbsorptionLines = [.. Enumerable.Range(0, r.Next(4)).Select(_ => new AbsorptionLine(400 + r.NextDouble() * 300, Pick<LineStrength>(r)))],
            Colours = [.. Enumerable.Range(0, r.Next(3)).Select(k => "colour" + k)], Frequency = Pick<BenchFrequency>(r),
            SpeciesFrequency = Pick<BenchFrequency>(r), Forms = (MaterialForm)r.Next(1, 8), IsOpaque = r.Next(2) == 0,
            DoNotImmerse = r.Next(2) == 0, Notes = r.Next(2) == 0 ? "" : "note; with, punctuation",
            // Sources from a small pool, so that entries share references as the catalogue's do (one row per key).
            Sources = CatalogueFields.Inheritable.Where(_ => r.Next(2) == 0).ToDictionary(f => f, _ => References[r.Next(References.Length)]),
            StatedFields = [.. CatalogueFields.Inheritable.Where(_ => r.Next(4) == 0)],
        };
    }

    [Property(MaxTest = 25)]
    public Property Any_materials_written_to_a_catalogue_file_load_back_unchanged(NonNegativeInt seed) =>
        Prop.ForAll(Gen.Choose(0, 20).ToArbitrary(), count =>
        {
            var r = new Random(seed.Get);
            Material[] written = [.. Enumerable.Range(0, count).Select(i => Random(r, i))];
            using var temp = new TempDirectory();
            CatalogueBuilder.Write(written, temp.File("c.db"), "shipped", "x");
            using CatalogueStore store = CatalogueStore.Open(temp.File("c.db"));
            return written.Select(MaterialSnapshot.Of).SequenceEqual(store.LoadAll().Select(MaterialSnapshot.Of)).Label($"seed {seed.Get}, {count} entries");
        });
}
