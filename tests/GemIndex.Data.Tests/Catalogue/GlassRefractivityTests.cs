using GemIndex.Core.Catalogue;
using GemIndex.Core.Optics;
using GemIndex.Data.Catalogue;

namespace GemIndex.Data.Tests.Catalogue;

/// <summary>The specific refractivity given to man-made glass against the catalogue's own published glass families.</summary>
public sealed class GlassRefractivityTests : IDisposable
{
    private readonly TempDirectory _cache = new();
    private readonly IReadOnlyList<Material> _catalogue;

    public GlassRefractivityTests() => _catalogue = ShippedCatalogue.Load(_cache.Path);

    public void Dispose() => _cache.Dispose();

    [Fact]
    public void Every_glass_family_lies_within_the_band_so_no_family_reading_is_held_against_its_own_entry()
    {
        // Each family's indices and SG are published optical-glass data (glass.json's sources): every corner of its
        // rectangle, (n - 1)/SG, must lie inside GladstoneDale.ManMadeGlass, or the relation would weigh against the
        // family's own stones. The catch-all (the species' whole span) is left out: it is what the band narrows.
        var families = _catalogue.Where(m => m.Species == ShippedCatalogue.ManMadeGlassSpecies && m.Name != "glass of another composition").ToList();
        Assert.True(families.Count >= 20, $"{families.Count} glass families");
        foreach (Material m in families)
        {
            PropertyRange n = m.Indices.Single!.Value, sg = m.SpecificGravity;
            double lowest = GladstoneDale.SpecificRefractivity(n.Minimum, sg.Maximum), highest = GladstoneDale.SpecificRefractivity(n.Maximum, sg.Minimum);
            Assert.True(GladstoneDale.ManMadeGlass.Contains(lowest) && GladstoneDale.ManMadeGlass.Contains(highest),
                $"{m.Name}: K {lowest:0.000}-{highest:0.000}");
        }
        // And the band is no wider than the families need (within 0.01 at each end).
        double least = families.Min(m => GladstoneDale.SpecificRefractivity(m.Indices.Single!.Value.Minimum, m.SpecificGravity.Maximum));
        double most = families.Max(m => GladstoneDale.SpecificRefractivity(m.Indices.Single!.Value.Maximum, m.SpecificGravity.Minimum));
        Assert.InRange(GladstoneDale.ManMadeGlass.Minimum, least - 0.01, least);
        Assert.InRange(GladstoneDale.ManMadeGlass.Maximum, most, most + 0.01);
    }

    [Fact]
    public void Only_the_man_made_glass_species_keeps_the_relation()
    {
        Assert.All(_catalogue, m => Assert.Equal(m.Species == ShippedCatalogue.ManMadeGlassSpecies, m.SpecificRefractivity is not null));
    }
}
