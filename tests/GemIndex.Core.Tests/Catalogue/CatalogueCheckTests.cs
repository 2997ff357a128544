using GemIndex.Core.Catalogue;
using GemIndex.Core.Observations;
using GemIndex.Core.Optics.Indicatrix;

namespace GemIndex.Core.Tests.Catalogue;

public class CatalogueCheckTests
{
    private static readonly ValueSource Memory = new("memory", SourceKind.FromMemory, "from memory of standard handbook values");

    // Every field a fixture may use, from memory: the fixtures are invented, and say so.
    private static readonly Dictionary<string, ValueSource> FromMemory =
        CatalogueFields.Inheritable.ToDictionary(f => f, _ => Memory);

    // Invented test entries shaped like real ones; the numbers only need to be self-consistent.
    private static Material Uniaxial(string name = "test quartz") => new()
    {
        Name = name,
        Species = "quartz",
        Variety = "rock crystal",
        Origin = OriginClass.Natural,
        CrystalSystem = CrystalSystem.Trigonal,
        Indices = OpticalIndices.Uniaxial(new(1.544, 1.544), new(1.553, 1.553)),
        Sign = OpticSign.Positive,
        Birefringence = new(0.009, 0.009),
        SpecificGravity = new(2.65, 2.66),
        Polariscope = [PolariscopeReaction.DoublyRefractive],
        Sources = FromMemory,
    };

    private static Material Biaxial() => new()
    {
        Name = "test peridot",
        Species = "olivine",
        Variety = "peridot",
        Origin = OriginClass.Natural,
        CrystalSystem = CrystalSystem.Orthorhombic,
        Indices = OpticalIndices.Biaxial(new(1.650, 1.654), new(1.665, 1.670), new(1.686, 1.690)),
        Sign = OpticSign.Positive,
        Birefringence = new(0.035, 0.038),
        SpecificGravity = new(3.32, 3.37),
        Polariscope = [PolariscopeReaction.DoublyRefractive],
        Sources = FromMemory,
    };

    private static Material Isotropic() => new()
    {
        Name = "test spinel",
        Species = "spinel",
        Variety = "spinel",
        Origin = OriginClass.Natural,
        CrystalSystem = CrystalSystem.Cubic,
        Indices = OpticalIndices.SingleIndex(new(1.712, 1.720)),
        SpecificGravity = new(3.58, 3.61),
        Polariscope = [PolariscopeReaction.SinglyRefractive, PolariscopeReaction.Anomalous],
        Sources = FromMemory,
    };

    private static void AssertOnlyFinding(Material m, string field)
    {
        IReadOnlyList<CatalogueFinding> findings = CatalogueCheck.CheckEntry(m);
        CatalogueFinding f = Assert.Single(findings);
        Assert.Equal(m.Name, f.Entry);
        Assert.Equal(field, f.Field);
    }

    [Fact]
    public void Consistent_entries_of_each_character_have_no_findings()
    {
        Assert.Empty(CatalogueCheck.Check([Uniaxial(), Biaxial(), Isotropic()]));
    }

    [Theory]
    [InlineData(1.0, 1.2)]
    [InlineData(3.4, 3.5)]
    public void An_index_outside_1_to_3_5_is_reported_on_its_field(double min, double max)
    {
        AssertOnlyFinding(Isotropic() with { Indices = OpticalIndices.SingleIndex(new(min, max)) }, "n");
    }

    [Theory]
    [InlineData(0.4, 0.6)]
    [InlineData(20, 25)]
    public void A_specific_gravity_outside_0_5_to_25_is_reported(double min, double max)
    {
        AssertOnlyFinding(Isotropic() with { SpecificGravity = new(min, max) }, "sg");
    }

    [Fact]
    public void A_range_written_backwards_never_becomes_a_material()
    {
        // PropertyRange refuses it at construction, so the check never sees an unordered range.
        Assert.Throws<GemIndex.Core.Quantities.QuantityOutOfRangeException>(() => new PropertyRange(2.7, 2.6, "sg"));
    }

    [Fact]
    public void Birefringence_beyond_what_the_index_ranges_allow_is_reported()
    {
        // ω 1.544, ε 1.553 allow exactly 0.009; 0.020 cannot be.
        AssertOnlyFinding(Uniaxial() with { Birefringence = new(0.020, 0.020) }, "birefringence");
    }

    [Fact]
    public void Birefringence_below_what_the_index_ranges_allow_is_reported()
    {
        AssertOnlyFinding(Biaxial() with { Birefringence = new(0.001, 0.002) }, "birefringence");
    }

    [Fact]
    public void Birefringence_overlapping_the_allowed_span_is_accepted()
    {
        // Allowed span: max(0, 1.686 − 1.654) = 0.032 to 1.690 − 1.650 = 0.040.
        Assert.Empty(CatalogueCheck.CheckEntry(Biaxial() with { Birefringence = new(0.039, 0.045) }));
    }

    [Fact]
    public void A_doubly_refractive_material_without_birefringence_is_reported()
    {
        AssertOnlyFinding(Uniaxial() with { Birefringence = null }, "birefringence");
    }

    [Fact]
    public void A_single_index_material_with_birefringence_is_reported()
    {
        AssertOnlyFinding(Isotropic() with { Birefringence = new(0.001, 0.002) }, "birefringence");
    }

    [Fact]
    public void A_single_index_material_with_a_sign_is_reported()
    {
        AssertOnlyFinding(Isotropic() with { Sign = OpticSign.Positive }, "optic_sign");
    }

    [Fact]
    public void A_uniaxial_material_without_a_sign_is_reported()
    {
        AssertOnlyFinding(Uniaxial() with { Sign = OpticSign.None }, "optic_sign");
    }

    [Fact]
    public void A_uniaxial_sign_that_contradicts_epsilon_and_omega_is_reported()
    {
        AssertOnlyFinding(Uniaxial() with { Sign = OpticSign.Negative }, "optic_sign");
    }

    [Fact]
    public void A_biaxial_sign_that_contradicts_the_indices_is_reported()
    {
        // Centres 1.652, 1.6675, 1.688: γ − β = 0.0205 > β − α = 0.0155, so positive.
        AssertOnlyFinding(Biaxial() with { Sign = OpticSign.Negative }, "optic_sign");
    }

    [Fact]
    public void A_usual_sg_part_outside_the_sg_range_is_reported()
    {
        AssertOnlyFinding(Biaxial() with { SpecificGravityUsual = new(3.30, 3.40) }, "sg_usual");   // the range is 3.32-3.37
        Assert.Empty(CatalogueCheck.CheckEntry(Biaxial() with { SpecificGravityUsual = new(3.33, 3.35) }));
    }

    [Fact]
    public void A_varietys_usual_sg_part_is_held_to_its_species_whole_range_not_to_the_species_usual_part()
    {
        var species = Biaxial() with { SpecificGravity = new(1.25, 2.25), SpecificGravityUsual = new(1.98, 2.25) };
        var variety = species with { Name = "test variety", SpecificGravityUsual = new(1.90, 2.00), StatedFields = ["sg_usual"] };
        Assert.Empty(CatalogueCheck.CheckAgainstSpecies(variety, species));
        // Beyond the species' whole range it is reported.
        var beyond = variety with { SpecificGravity = new(1.20, 2.25), SpecificGravityUsual = new(1.20, 2.00) };
        Assert.Contains(CatalogueCheck.CheckAgainstSpecies(beyond, species), f => f.Field == "sg_usual");
    }

    [Fact]
    public void A_biaxial_sign_the_ranges_cannot_decide_is_taken_from_the_source()
    {
        // Andalusite, biaxial negative with 2Vx 71-88° (MinTS, University of the Western Cape): nx 1.629-1.640,
        // ny 1.634-1.644, nz 1.638-1.650. The centres' γ − β and β − α differ by 0.0005, less than β's half-width.
        var andalusite = Biaxial() with
        {
            Indices = OpticalIndices.Biaxial(new(1.629, 1.640), new(1.634, 1.644), new(1.638, 1.650)), Sign = OpticSign.Negative,
            Birefringence = new(0.009, 0.012),
        };
        Assert.DoesNotContain(CatalogueCheck.CheckEntry(andalusite), f => f.Field == "optic_sign");
    }

    [Fact]
    public void Either_sign_is_accepted_whatever_the_indices()
    {
        Assert.Empty(CatalogueCheck.CheckEntry(Uniaxial() with { Sign = OpticSign.Either }));
        Assert.Empty(CatalogueCheck.CheckEntry(Biaxial() with { Sign = OpticSign.Either }));
    }

    [Fact]
    public void A_biaxial_beta_outside_alpha_and_gamma_is_reported()
    {
        Material m = Biaxial() with
        {
            Indices = OpticalIndices.Biaxial(new(1.650, 1.654), new(1.660, 1.695), new(1.686, 1.690)),
            Sign = OpticSign.Either,
        };
        AssertOnlyFinding(m, "beta");
    }

    [Fact]
    public void A_cubic_material_must_be_isotropic()
    {
        AssertOnlyFinding(Uniaxial() with { CrystalSystem = CrystalSystem.Cubic, Polariscope = [PolariscopeReaction.SinglyRefractive] }, "optic_character");
    }

    [Fact]
    public void A_cubic_material_cannot_be_doubly_refractive_in_the_polariscope()
    {
        AssertOnlyFinding(Isotropic() with { Polariscope = [PolariscopeReaction.DoublyRefractive] }, "polariscope");
    }

    [Fact]
    public void An_amorphous_material_must_have_the_amorphous_character()
    {
        AssertOnlyFinding(Isotropic() with { CrystalSystem = CrystalSystem.Amorphous }, "optic_character");
    }

    [Fact]
    public void A_biaxial_material_in_a_uniaxial_crystal_system_is_reported()
    {
        AssertOnlyFinding(Biaxial() with { CrystalSystem = CrystalSystem.Hexagonal }, "optic_character");
    }

    [Fact]
    public void An_aggregate_is_allowed_in_any_crystal_system()
    {
        Material m = Isotropic() with
        {
            CrystalSystem = CrystalSystem.Trigonal,
            Indices = OpticalIndices.SingleIndex(new(1.53, 1.54), OpticCharacter.Aggregate),
            Polariscope = [PolariscopeReaction.Aggregate],
        };
        Assert.Empty(CatalogueCheck.CheckEntry(m));
    }

    [Fact]
    public void Names_differing_only_in_case_are_duplicates()
    {
        CatalogueFinding f = Assert.Single(CatalogueCheck.Check([Uniaxial("Test Quartz"), Uniaxial("test quartz")]));
        Assert.Equal("name", f.Field);
        Assert.Contains("Test Quartz", f.Problem, StringComparison.Ordinal);
    }

    [Fact]
    public void A_number_without_a_source_is_reported_on_its_field()
    {
        var sources = new Dictionary<string, ValueSource>(FromMemory);
        sources.Remove("sg");
        AssertOnlyFinding(Uniaxial() with { Sources = sources }, "sg");
    }

    [Fact]
    public void An_opaque_entry_with_a_polariscope_reaction_is_reported()
    {
        AssertOnlyFinding(Isotropic() with { IsOpaque = true }, "polariscope");
    }

    [Fact]
    public void An_opaque_entry_with_pleochroism_is_reported()
    {
        AssertOnlyFinding(Isotropic() with { IsOpaque = true, Polariscope = [], Pleochroism = PleochroismStrength.Weak }, "pleochroism");
    }

    [Fact]
    public void An_opaque_entry_needs_no_polariscope_reaction()
    {
        Assert.Empty(CatalogueCheck.CheckEntry(Isotropic() with { IsOpaque = true, Polariscope = [] }));
    }

    [Fact]
    public void The_G_to_B_over_C_to_F_ratio_agrees_with_Malitsons_fused_silica()
    {
        // Malitson (1965), J. Opt. Soc. Am. 55, 1205, fused silica Sellmeier (DOMAIN.md §7), evaluated by the core's own
        // Sellmeier model: (nG − nB)/(nF − nC) = 1.703 by an independent calculation; the constant is quoted to 0.01.
        var silica = new GemIndex.Core.Optics.Dispersion.SellmeierModel(
            new(0.6961663, 0.0684043 * 0.0684043), new(0.4079426, 0.1162414 * 0.1162414), new(0.8974794, 9.896161 * 9.896161));
        double gb = GemIndex.Core.Optics.Dispersion.TradeDispersion.Of(silica);
        double cf = silica.IndexAt(GemIndex.Core.Optics.Dispersion.ReferenceWavelengths.F) - silica.IndexAt(GemIndex.Core.Optics.Dispersion.ReferenceWavelengths.C);
        Assert.Equal(CatalogueCheck.GeeBeeToCeeEffRatio, gb / cf, 0.01);
        // and fused silica's own nG − nB (0.0115 at n 1.458) lies inside the band
        Assert.Empty(CatalogueCheck.CheckEntry(Isotropic() with
        {
            CrystalSystem = CrystalSystem.Amorphous, Indices = OpticalIndices.SingleIndex(new(1.458, 1.459), OpticCharacter.Amorphous),
            Dispersion = Math.Round(gb, 4), Polariscope = [PolariscopeReaction.SinglyRefractive],
        }));
    }

    [Fact]
    public void A_C_to_F_value_for_a_weakly_dispersive_material_is_reported()
    {
        // Fluorite n 1.434 (DOMAIN.md §7); its C–F value is about 0.0045 (from memory; nG − nB about 0.007).
        Material fluorite = Isotropic() with { Indices = OpticalIndices.SingleIndex(new(1.433, 1.435)), Dispersion = 0.0045 };
        AssertOnlyFinding(fluorite, "dispersion");
        Assert.Empty(CatalogueCheck.CheckEntry(fluorite with { Dispersion = 0.007 }));
    }

    [Fact]
    public void A_dispersion_far_above_any_material_of_its_index_is_reported()
    {
        // 0.2 at n 1.716 would need an Abbe number near 6: no spinel-like material disperses so.
        AssertOnlyFinding(Isotropic() with { Dispersion = 0.2 }, "dispersion");
    }

    [Fact]
    public void Two_dispersions_of_one_species_a_C_to_F_ratio_apart_are_reported_on_the_lower()
    {
        // Issue 12: synthetic scheelite 0.026 (the C–F value) against scheelite 0.038 (nG − nB).
        Material natural = Uniaxial("scheelite") with { Species = "scheelite", Dispersion = 0.038 };
        Material synthetic = Uniaxial("synthetic scheelite") with { Species = "scheelite", Dispersion = 0.026 };
        CatalogueFinding f = Assert.Single(CatalogueCheck.Check([natural, synthetic]));
        Assert.Equal(("synthetic scheelite", "dispersion"), (f.Entry, f.Field));
    }

    [Fact]
    public void Dispersions_of_one_species_that_differ_as_real_varieties_do_are_accepted()
    {
        // Issue 12: synthetic rutile about 0.33 against natural rutile 0.28 (a ratio of 1.18); checked on the spread
        // rule alone (quartz's indices would put 0.3 outside the band).
        Material natural = Uniaxial("rutile") with { Species = "rutile", Dispersion = 0.28 };
        Material synthetic = Uniaxial("synthetic rutile") with { Species = "rutile", Dispersion = 0.33 };
        Assert.DoesNotContain(CatalogueCheck.Check([natural, synthetic]), f => f.Problem.Contains("same species", StringComparison.Ordinal));
    }

    [Fact]
    public void A_variety_repeating_its_species_value_is_reported()
    {
        Material species = Uniaxial("quartz");
        Material variety = Uniaxial("amethyst") with { Colours = ["purple"], StatedFields = ["sg", "colours"] };
        CatalogueFinding f = Assert.Single(CatalogueCheck.CheckAgainstSpecies(variety, species));
        Assert.Equal(("amethyst", "sg"), (f.Entry, f.Field));
        Assert.Contains("repeats", f.Problem, StringComparison.Ordinal);
    }

    [Fact]
    public void A_variety_range_outside_its_species_range_is_reported_and_a_narrower_one_accepted()
    {
        Material species = Uniaxial("quartz") with { SpecificGravity = new(2.60, 2.70) };
        Material wider = Uniaxial("citrine") with { SpecificGravity = new(2.65, 2.75), StatedFields = ["sg"] };
        Material narrower = Uniaxial("amethyst") with { SpecificGravity = new(2.65, 2.66), StatedFields = ["sg"] };
        Assert.Equal("sg", Assert.Single(CatalogueCheck.CheckAgainstSpecies(wider, species)).Field);
        Assert.Empty(CatalogueCheck.CheckAgainstSpecies(narrower, species));
    }

    [Fact]
    public void A_treated_or_synthetic_range_outside_its_species_is_accepted_only_with_a_published_source()
    {
        // A chromium-diffused skin reads above corundum (reference-db/README.md, the check's list): a published reading
        // may put a treated or synthetic variety outside the mineral's range; memory may not, nor may a natural variety.
        Material species = Uniaxial("corundum") with { SpecificGravity = new(3.97, 4.05) };
        var published = new Dictionary<string, ValueSource> { ["sg"] = new("paper", SourceKind.Published, "a paper read") };
        var memory = new Dictionary<string, ValueSource> { ["sg"] = new("memory", SourceKind.FromMemory, "from memory") };
        Material treated = Uniaxial("diffused corundum") with { Origin = OriginClass.Treated, SpecificGravity = new(3.97, 4.10), StatedFields = ["sg"] };
        Assert.Empty(CatalogueCheck.CheckAgainstSpecies(treated with { Sources = published }, species));
        Assert.Empty(CatalogueCheck.CheckAgainstSpecies(treated with { Origin = OriginClass.Synthetic, Sources = published }, species));
        Assert.Equal("sg", Assert.Single(CatalogueCheck.CheckAgainstSpecies(treated with { Sources = memory }, species)).Field);
        Assert.Equal("sg", Assert.Single(CatalogueCheck.CheckAgainstSpecies(treated with { Origin = OriginClass.Natural, Sources = published }, species)).Field);
    }

    [Fact]
    public void The_whole_catalogue_check_compares_each_variety_with_its_species()
    {
        Material species = Uniaxial("quartz species");
        Material variety = Uniaxial("amethyst") with { StatedFields = ["sg"], Family = "quartz" };
        CatalogueFinding f = Assert.Single(CatalogueCheck.Check([variety], new Dictionary<string, Material> { ["quartz"] = species }));
        Assert.Equal("quartz.json", f.File);
    }

    [Fact]
    public void A_like_variety_is_held_against_its_sibling_not_its_species()
    {
        Material species = Uniaxial("quartz species") with { SpecificGravity = new(2.60, 2.70) };
        Material sibling = Uniaxial("amethyst") with { SpecificGravity = new(2.64, 2.66), Colours = ["purple"], StatedFields = ["sg", "colours"] };
        // Heated: the sibling's SG (inherited, not its own), its own colours; pleochroism stated back to the species' value.
        Material heated = sibling with { Name = "heated amethyst", Origin = OriginClass.Treated, Colours = ["yellow"], StatedFields = ["sg", "pleochroism", "colours"] };
        sibling = sibling with { Pleochroism = PleochroismStrength.Moderate, StatedFields = ["sg", "pleochroism", "colours"] };
        var like = new CatalogueCheck.Likeness(sibling, ["pleochroism", "colours"]);
        Assert.Empty(CatalogueCheck.CheckAgainstSibling(heated, like, species));
        // Without the likeness the same entry would be refused for the pleochroism it shares with the species.
        Assert.Equal("pleochroism", Assert.Single(CatalogueCheck.CheckAgainstSpecies(heated, species)).Field);
        var checkedWithLike = CatalogueCheck.Check([sibling, heated], new Dictionary<string, Material> { ["quartz"] = species },
            new Dictionary<string, CatalogueCheck.Likeness> { ["heated amethyst"] = like });
        Assert.True(checkedWithLike.Count == 0, string.Join("\n", checkedWithLike));
    }

    [Fact]
    public void A_like_variety_repeating_its_siblings_value_or_leaving_the_species_range_is_reported()
    {
        Material species = Uniaxial("quartz species") with { SpecificGravity = new(2.60, 2.70) };
        Material sibling = Uniaxial("amethyst") with { Colours = ["purple"], StatedFields = ["colours"] };
        Material heated = sibling with { Name = "heated amethyst", Origin = OriginClass.Treated, SpecificGravity = new(2.65, 2.75) };
        CatalogueFinding[] f = [.. CatalogueCheck.CheckAgainstSibling(heated, new(sibling, ["colours", "sg"]), species)];
        Assert.Equal(["colours", "sg"], f.Select(x => x.Field));
        Assert.StartsWith("repeats the value [purple] of 'amethyst', which it is like", f[0].Problem, StringComparison.Ordinal);
        Assert.Contains("lies outside its species' range", f[1].Problem, StringComparison.Ordinal);
    }

    [Fact]
    public void A_like_variety_of_the_siblings_origin_must_differ_in_a_field_other_than_its_notes()
    {
        Material sibling = Uniaxial("amethyst") with { Colours = ["purple"], Notes = "Natural." };
        Material copy = sibling with { Name = "amethyst again", Notes = "The same." };
        CatalogueFinding f = Assert.Single(CatalogueCheck.CheckAgainstSibling(copy, new(sibling, ["notes"]), null));
        Assert.Equal(("amethyst again", "like"), (f.Entry, f.Field));
        Assert.Empty(CatalogueCheck.CheckAgainstSibling(copy with { Origin = OriginClass.Treated }, new(sibling, ["notes"]), null));
        Assert.Empty(CatalogueCheck.CheckAgainstSibling(copy with { Colours = ["violet"] }, new(sibling, ["notes", "colours"]), null));
    }

    [Fact]
    public void A_species_with_capitals_is_reported()
    {
        AssertOnlyFinding(Uniaxial() with { Species = "Quartz" }, "species");
    }

    [Fact]
    public void An_entry_without_polariscope_reactions_is_reported()
    {
        AssertOnlyFinding(Uniaxial() with { Polariscope = [] }, "polariscope");
    }

    [Fact]
    public void A_finding_reads_as_file_entry_field_and_problem()
    {
        Assert.Equal("entry 'x', field sg: too low", new CatalogueFinding("x", "sg", "too low").ToString());
        Assert.Equal("corundum.json: entry 'x', field sg: too low", new CatalogueFinding("x", "sg", "too low", "corundum.json").ToString());
    }

    [Fact]
    public void A_hardness_outside_the_Mohs_scale_is_reported()
    {
        AssertOnlyFinding(Uniaxial() with { Hardness = new(7, 11) }, "hardness");
    }

    [Fact]
    public void A_negative_dispersion_is_reported()
    {
        AssertOnlyFinding(Uniaxial() with { Dispersion = -0.01 }, "dispersion");
    }

    [Fact]
    public void An_absorption_line_outside_the_visible_spectroscope_range_is_reported()
    {
        AssertOnlyFinding(Isotropic() with { AbsorptionLines = [new(685), new(1200)] }, "absorption");
    }

    [Fact]
    public void An_empty_name_is_reported()
    {
        AssertOnlyFinding(Uniaxial() with { Name = "" }, "name");
    }
}
