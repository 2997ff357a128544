using GemIndex.Core.Catalogue;
using GemIndex.Core.Observations;

namespace GemIndex.Core.Tests.Catalogue;

public class SourcingSummaryTests
{
    private static readonly ValueSource Book = new("book", SourceKind.Published, "an invented handbook, 2001, p. 1");
    private static readonly ValueSource Memory = new("memory", SourceKind.FromMemory, "from memory");

    private static Material Entry(string name, Dictionary<string, ValueSource> sources) => new()
    {
        Name = name, Species = "s", Variety = "v", Origin = OriginClass.Natural, CrystalSystem = CrystalSystem.Cubic,
        Indices = OpticalIndices.SingleIndex(new(1.71, 1.72)), SpecificGravity = new(3.5, 3.6), Hardness = new(8, 8),
        Polariscope = [PolariscopeReaction.SinglyRefractive], Sources = sources,
    };

    [Fact]
    public void An_entry_is_sourced_when_its_index_and_SG_are_published_whatever_its_hardness_source()
    {
        // Entry a: n, sg published, hardness from memory → sourced. Entry b: sg from memory → not. Entry c: no hardness source.
        SourcingSummary s = SourcingSummary.Of(
        [
            Entry("a", new() { ["n"] = Book, ["sg"] = Book, ["hardness"] = Memory }),
            Entry("b", new() { ["n"] = Book, ["sg"] = Memory, ["hardness"] = Memory }),
            Entry("c", new() { ["n"] = Book, ["sg"] = Book }),
        ]);
        Assert.Equal((3, 2), (s.Entries, s.SourcedEntries));
        Assert.Equal((5, 3, 0, 1), (s.PublishedValues, s.MemoryValues, s.PracticeValues, s.UnsourcedValues));
        Assert.Equal(9, s.Values);
        Assert.Equal(2.0 / 3, s.SourcedEntryShare, 12);
    }

    [Fact]
    public void An_empty_catalogue_has_a_share_of_zero() => Assert.Equal(0, SourcingSummary.Of([]).SourcedEntryShare);
}
