using GemIndex.Core.Catalogue;
using GemIndex.Core.Magnification;
using GemIndex.Data.Catalogue;

namespace GemIndex.Data.Tests.Catalogue;

public class MergedCatalogueTests
{
    [Fact]
    public void A_user_entry_takes_the_looks_of_its_species_most_common_shipped_entry_of_its_origin()
    {
        // The shipped elephant ivory expects Schreger lines (0.7, after Espinoza and Mann's ivory guide, as
        // reference-db/magnification.json cites it); a user's own natural ivory takes that profile, a user entry of a
        // species or origin the catalogue lacks keeps its origin's defaults.
        using var temp = new TempDirectory();
        IReadOnlyList<Material> shipped = ShippedCatalogue.Load(temp.Path);
        Material ivory = shipped.Single(m => m.Name == "elephant ivory");
        Material mine = ivory with { Name = "my ivory", IsUserEntry = true, Magnification = null, Frequency = BenchFrequency.Rare };
        Material odd = mine with { Name = "my odd", Species = "no such species" };
        var merged = MergedCatalogue.WithSpeciesLooks([mine, odd], shipped);
        Assert.Same(ivory.MagnificationProfile, merged[0].MagnificationProfile);
        Assert.Equal(0.7, merged[0].MagnificationProfile.ProbabilityOf(MagnificationFeature.SchregerLines));
        Assert.Same(MagnificationProfile.ForOrigin(odd.Origin), merged[1].MagnificationProfile);
    }
}
