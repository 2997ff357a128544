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
        Assert.Same(ivory.Magnification, merged[0].Magnification);
        Assert.Equal(0.7, merged[0].MagnificationProfile.ProbabilityOf(MagnificationFeature.SchregerLines));
        Assert.Null(merged[1].Magnification);   // its origin's defaults
    }

    [Fact]
    public void Load_gives_a_user_entry_its_species_trade_rule_and_looks()
    {
        // A user's own tortoiseshell (invented test data, inside the shipped species' ranges) takes the marine-turtle
        // rule (CITES Appendix I, as reference-db/trade-rules.json cites it) and the shipped entry's pigment spots.
        using var temp = new TempDirectory();
        var locations = CatalogueLocations.Under(temp.Path);
        const string csv = "name,species,variety,origin,crystal_system,optic_character,n_min,n_max,sg_min,sg_max,forms,polariscope,colours,frequency,source,source_kind\n"
            + "my shell comb,tortoiseshell,comb,natural,amorphous,amorphous,1.54,1.56,1.26,1.35,amorphous,singly_refractive,brown;yellow,rare,own measurements (invented test data),from_memory\n";
        var imported = new UserCatalogue(locations.UserCataloguePath).Import(new StringReader(csv), ShippedCatalogue.Families);
        Assert.True(imported.Errors.Count == 0, string.Join("; ", imported.Errors.Select(e => e.ToString())));
        Material mine = MergedCatalogue.Load(locations).Single(m => m.Name == "my shell comb");
        Assert.True(mine.IsUserEntry);
        Assert.Equal("marine-turtle", mine.TradeRule?.Key);
        Assert.Equal(0.85, mine.MagnificationProfile.ProbabilityOf(MagnificationFeature.PigmentSpots));
    }
}
