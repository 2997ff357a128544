using GemIndex.Core.Catalogue;
using GemIndex.Core.Optics.Dispersion;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Data.Catalogue;

namespace GemIndex.Data.Tests.Catalogue;

/// <summary>The shipped catalogue's entries against values from outside the project, each source named.</summary>
public sealed class ShippedCatalogueReferenceTests : IDisposable
{
    private readonly TempDirectory _cache = new();
    private readonly IReadOnlyList<Material> _catalogue;

    public ShippedCatalogueReferenceTests() => _catalogue = ShippedCatalogue.Load(_cache.Path);

    public void Dispose() => _cache.Dispose();

    private Material Entry(string name) => _catalogue.Single(m => m.Name == name);

    [Fact]
    public void Quartz_holds_omega_1_544_and_epsilon_1_553_uniaxial_positive()
    {
        // Handbook of Mineralogy, quartz: ω 1.544, ε 1.553, uniaxial + (from memory; DOMAIN.md §7).
        var m = Entry("rock crystal");
        Assert.True(m.Indices.Omega!.Value.Contains(1.544));
        Assert.True(m.Indices.Epsilon!.Value.Contains(1.553));
        Assert.Equal(OpticSign.Positive, m.Sign);
    }

    [Fact]
    public void Calcite_holds_omega_1_658_and_epsilon_1_486_uniaxial_negative()
    {
        // Handbook of Mineralogy, calcite: ω 1.658, ε 1.486, uniaxial − (from memory; DOMAIN.md §7).
        var m = Entry("calcite");
        Assert.True(m.Indices.Omega!.Value.Contains(1.658));
        Assert.True(m.Indices.Epsilon!.Value.Contains(1.486));
        Assert.Equal(OpticSign.Negative, m.Sign);
    }

    [Fact]
    public void Fluorite_holds_n_1_434() =>
        // Handbook of Mineralogy, fluorite: n 1.434 (from memory; DOMAIN.md §7).
        Assert.True(Entry("fluorite").Indices.Single!.Value.Contains(1.434));

    [Theory]
    [InlineData("sapphire")]
    [InlineData("ruby")]
    public void Corundum_agrees_with_the_Malitson_and_Dodge_ordinary_ray(string name)
    {
        // Malitson & Dodge (1972), J. Opt. Soc. Am. 62, 1405: sapphire ordinary ray Sellmeier (coefficients from memory,
        // DOMAIN.md §7), evaluated by the core. n(589.3) ≈ 1.768 must lie in the catalogue's ω range; the catalogue's
        // nG − nB is quoted to 3 decimals, so it must agree within 0.0015 (half a unit in the last place plus the
        // difference between the ordinary ray and the trade's unpolarised figure, well under 0.001).
        var model = new SellmeierModel(new SellmeierTerm(1.4313493, 0.0726631 * 0.0726631),
            new SellmeierTerm(0.65054713, 0.1193242 * 0.1193242), new SellmeierTerm(5.3414021, 18.028251 * 18.028251));
        var m = Entry(name);
        Assert.True(m.Indices.Omega!.Value.Contains(model.IndexAt(ReferenceWavelengths.D)));
        Assert.Equal(TradeDispersion.Of(model), m.Dispersion!.Value, 0.0015);
    }

    [Fact]
    public void Diamond_agrees_with_Peters_Sellmeier_fit()
    {
        // Peter (1923), Z. Phys. 15, 358: diamond Sellmeier B 0.3306, 4.3356; C 0.1750², 0.1060² µm² (from memory,
        // DOMAIN.md §7). n(589.3) ≈ 2.417 must lie in the catalogue's range; nG − nB ≈ 0.044 within 0.002 (the fit's
        // two terms reproduce the visible indices to about ±0.001 each, so their difference to about ±0.002).
        var model = new SellmeierModel(new SellmeierTerm(0.3306, 0.1750 * 0.1750), new SellmeierTerm(4.3356, 0.1060 * 0.1060));
        var m = Entry("diamond");
        Assert.True(m.Indices.Single!.Value.Contains(model.IndexAt(ReferenceWavelengths.D)));
        Assert.Equal(TradeDispersion.Of(model), m.Dispersion!.Value, 0.002);
    }

    [Fact]
    public void Every_number_of_every_entry_names_its_source() =>
        Assert.All(_catalogue, m => Assert.All(CatalogueFields.NumericOf(m), field => Assert.True(m.Sources.ContainsKey(field), $"{m.Name}: {field}")));
}
