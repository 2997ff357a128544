using GemIndex.Core.Catalogue;
using GemIndex.Core.Observations;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Data.Catalogue;

namespace GemIndex.Data.Tests.Catalogue;

public class FamilyFileReaderTests
{
    // An invented family: one species, a variety that inherits everything and one that states its colours.
    private const string Valid = """
        { "family": "fam",
          "references": [ { "key": "book", "kind": "published", "citation": "An invented handbook (2000), p. 1" } ],
          "species": [ {
            "species": "quartz", "crystal_system": "trigonal", "optic_character": "uniaxial", "optic_sign": "positive",
            "forms": ["crystal"], "omega": [1.544, 1.544], "epsilon": [1.553, 1.553], "birefringence": [0.009, 0.009],
            "sg": [2.65, 2.66], "polariscope": ["doubly_refractive"], "colours": ["colourless"], "frequency": "common",
            "sources": { "*": "memory", "sg": "book" },
            "varieties": [
              { "name": "t", "variety": "rock crystal", "origin": "natural", "share": "common" },
              { "name": "t2", "variety": "amethyst", "origin": "natural", "share": "occasional", "colours": ["purple"],
                "sources": { "colours": "practice" } }
            ] } ] }
        """;

    private static string With(string from, string to) => Valid.Replace(from, to, StringComparison.Ordinal);

    private static IReadOnlyList<string> ErrorsOf(params FamilySource[] files) =>
        Assert.Throws<CatalogueFormatException>(() => FamilyFileReader.ReadCatalogue(files)).Errors;

    private static string ErrorOf(string json, string file = "fam.json") => Assert.Single(ErrorsOf(new FamilySource(file, json)));

    [Fact]
    public void The_fixture_families_read_into_one_material_per_variety_with_every_field()
    {
        IReadOnlyList<Material> all = FamilyFileReader.ReadAll(Fixtures.FamilySources);
        Assert.Equal(5, all.Count);
        Material crystal = all.Single(m => m.Name == "sample rock crystal");
        Assert.Equal("sample-quartz", crystal.Family);
        Assert.Equal(OpticCharacter.Uniaxial, crystal.OpticCharacter);
        Assert.Equal(1.553, crystal.Indices.Epsilon!.Value.Minimum);
        Assert.Equal(BenchFrequency.VeryCommon, crystal.Frequency);
        Assert.Equal(BenchFrequency.VeryCommon, crystal.SpeciesFrequency);
        Assert.Equal([FluorescenceStrength.Inert, FluorescenceStrength.Weak], crystal.UvShort);
        Assert.Equal(PleochroismStrength.Weak, crystal.Pleochroism);
        Assert.Equal(MaterialForm.Crystal, crystal.Forms);
        Material peridot = all.Single(m => m.Name == "sample peridot");
        Assert.Equal(1.665, peridot.Indices.Beta!.Value.Minimum);
        Assert.Equal([453.0, 477, 497], peridot.AbsorptionLinesNanometres);
        Assert.All(peridot.AbsorptionLines, l => Assert.Equal(LineStrength.Moderate, l.Strength));
        Material chalcedony = all.Single(m => m.Name == "sample chalcedony");
        Assert.Equal((OpticCharacter.Aggregate, MaterialForm.Aggregate), (chalcedony.OpticCharacter, chalcedony.Forms));
    }

    [Fact]
    public void A_usual_sg_part_is_read_and_inherited_only_by_varieties_that_keep_the_species_range()
    {
        string json = With("\"sg\": [2.65, 2.66],", "\"sg\": [2.55, 2.70], \"sg_usual\": [2.65, 2.66],")
            .Replace("\"sources\": { \"*\": \"memory\", \"sg\": \"book\" }", "\"sources\": { \"*\": \"memory\", \"sg\": \"book\", \"sg_usual\": \"book\" }", StringComparison.Ordinal)
            .Replace("\"colours\": [\"purple\"],", "\"colours\": [\"purple\"], \"sg\": [2.60, 2.62],", StringComparison.Ordinal)
            .Replace("\"sources\": { \"colours\": \"practice\" }", "\"sources\": { \"colours\": \"practice\", \"sg\": \"book\" }", StringComparison.Ordinal);
        var all = FamilyFileReader.ReadAll([new FamilySource("fam.json", json)]);
        Material rock = all.Single(m => m.Name == "t"), amethyst = all.Single(m => m.Name == "t2");
        Assert.Equal((new PropertyRange(2.55, 2.70), new PropertyRange(2.65, 2.66)), (rock.SpecificGravity, rock.SpecificGravityUsual));
        Assert.Equal("book", rock.Sources["sg_usual"].Key);
        // The variety's own range has no usual part of its own, and the species' belongs to the species' range.
        Assert.Equal((new PropertyRange(2.60, 2.62), (PropertyRange?)null), (amethyst.SpecificGravity, amethyst.SpecificGravityUsual));
    }

    [Fact]
    public void A_variety_inherits_its_species_fields_with_their_sources_and_its_own_with_its_own()
    {
        Material amethyst = FamilyFileReader.ReadAll(Fixtures.FamilySources).Single(m => m.Name == "sample amethyst");
        Assert.Equal(("quartz", "amethyst", BenchFrequency.Common, BenchFrequency.VeryCommon),
            (amethyst.Species, amethyst.Variety, amethyst.Frequency, amethyst.SpeciesFrequency));
        Assert.Equal(1.544, amethyst.Indices.Omega!.Value.Minimum);                  // inherited
        Assert.Equal(new PropertyRange(2.65, 2.65), amethyst.SpecificGravity);       // its own, narrower
        Assert.Equal(["purple", "violet"], amethyst.Colours);
        Assert.Equal(["sg", "pleochroism", "colours"], amethyst.StatedFields);
        Assert.Equal(("sample-handbook", SourceKind.Published), (amethyst.Sources["sg"].Key, amethyst.Sources["sg"].Kind));
        Assert.Equal(SourceKind.CommonPractice, amethyst.Sources["colours"].Kind);
        Assert.Equal(("memory", "from memory of standard handbook values"), (amethyst.Sources["omega"].Key, amethyst.Sources["omega"].Citation));
    }

    [Fact]
    public void The_fixture_families_pass_the_catalogue_check_varieties_against_species_included()
    {
        FamilyCatalogue families = FamilyFileReader.ReadCatalogue(Fixtures.FamilySources);
        Assert.Equal(["chalcedony", "olivine", "quartz", "spinel"], families.Species.Keys.Order());
        Assert.Empty(families.Check());
    }

    [Fact]
    public void A_reference_of_the_file_and_the_shared_ones_resolve_by_key()
    {
        Material t = FamilyFileReader.Read(new FamilySource("fam.json", Valid)).Single(m => m.Name == "t");
        Assert.Equal(new ValueSource("book", SourceKind.Published, "An invented handbook (2000), p. 1"), t.Sources["sg"]);
        Assert.Equal(SourceKind.FromMemory, t.Sources["omega"].Kind);
        Assert.Empty(t.StatedFields);
    }

    [Fact]
    public void NaN_is_refused_naming_file_line_species_and_field()
    {
        string e = ErrorOf(With("\"sg\": [2.65, 2.66]", "\"sg\": [NaN, 2.66]"));
        Assert.StartsWith("fam.json: line 6, species 0, field sg: 'N' is an invalid start of a value.", e, StringComparison.Ordinal);
    }

    [Fact]
    public void A_number_too_large_for_a_double_is_refused_not_read_as_infinity()
    {
        string e = ErrorOf(With("\"sg\": [2.65, 2.66]", "\"sg\": [2.65, 1e400]"));
        Assert.Contains("species 0 'quartz', field sg", e, StringComparison.Ordinal);
        Assert.Contains("number out of range: 1e400", e, StringComparison.Ordinal);
    }

    [Fact]
    public void A_number_written_as_a_string_is_refused()
    {
        Assert.Contains("expected a number, found String", ErrorOf(With("[2.65, 2.66]", "[\"2.65\", 2.66]")), StringComparison.Ordinal);
    }

    [Fact]
    public void An_unknown_field_of_a_variety_is_refused_naming_species_and_variety()
    {
        string e = ErrorOf(With("\"share\": \"occasional\"", "\"share\": \"occasional\", \"colour\": \"red\""));
        Assert.Contains("species 0 'quartz', variety 1 't2'", e, StringComparison.Ordinal);
        Assert.Contains("'colour'", e, StringComparison.Ordinal);
    }

    [Fact]
    public void A_variety_cannot_restate_a_species_only_field()
    {
        string e = ErrorOf(With("\"share\": \"occasional\"", "\"share\": \"occasional\", \"optic_character\": \"biaxial\""));
        Assert.Contains("species 0 'quartz', variety 1 't2', field optic_character", e, StringComparison.Ordinal);
        Assert.Contains("'optic_character'", e, StringComparison.Ordinal);
    }

    [Fact]
    public void A_duplicate_key_is_refused_in_a_species_and_in_a_sources_map()
    {
        Assert.Contains("Duplicate property 'frequency'", ErrorOf(With("\"frequency\"", "\"frequency\": \"rare\", \"frequency\"")), StringComparison.Ordinal);
        Assert.Contains("Duplicate", ErrorOf(With("{ \"*\": \"memory\",", "{ \"*\": \"memory\", \"*\": \"book\",")), StringComparison.Ordinal);
    }

    [Fact]
    public void A_missing_required_field_is_refused_by_name()
    {
        Assert.Contains("'frequency'", ErrorOf(With(", \"frequency\": \"common\"", "")), StringComparison.Ordinal);
    }

    [Fact]
    public void An_unknown_word_names_the_file_the_species_the_variety_the_field_and_the_allowed_words()
    {
        Assert.Equal("fam.json: species 'quartz', variety 't2', field origin: 'naturel' is not one of natural, synthetic, imitation, treated, composite, cultured",
            ErrorOf(With("\"variety\": \"amethyst\", \"origin\": \"natural\"", "\"variety\": \"amethyst\", \"origin\": \"naturel\"")));
    }

    [Fact]
    public void A_range_of_three_numbers_is_refused_once_on_the_species_not_on_each_variety_that_inherits_it()
    {
        Assert.Equal("fam.json: species 'quartz', field sg: expected [min, max] (two numbers), got 3",
            ErrorOf(With("[2.65, 2.66]", "[2.65, 2.66, 2.67]")));
    }

    [Fact]
    public void A_field_the_species_must_have_is_refused_on_the_species_even_when_every_variety_states_it()
    {
        Assert.Equal("fam.json: species 'quartz', field colours: required: one or more plain lower-case colour words",
            ErrorOf(With("\"colours\": [\"colourless\"], ", "").Replace("\"share\": \"common\" }", "\"share\": \"common\", \"colours\": [\"grey\"], \"sources\": { \"*\": \"memory\" } }", StringComparison.Ordinal)));
    }

    [Fact]
    public void A_bad_range_a_variety_states_is_refused_on_that_variety()
    {
        Assert.Equal("fam.json: species 'quartz', variety 't2', field sg: expected [min, max] (two numbers), got 1",
            ErrorOf(With("\"colours\": [\"purple\"]", "\"colours\": [\"purple\"], \"sg\": [2.65]").Replace("{ \"colours\": \"practice\" }", "{ \"*\": \"practice\" }", StringComparison.Ordinal)));
    }

    [Fact]
    public void A_range_written_backwards_is_refused()
    {
        Assert.StartsWith("fam.json: species 'quartz', field sg: sg upper end is 2.65", ErrorOf(With("[2.65, 2.66]", "[2.66, 2.65]")), StringComparison.Ordinal);
    }

    [Fact]
    public void An_index_the_optic_character_does_not_use_is_refused()
    {
        Assert.Equal("fam.json: species 'quartz', field n: not allowed for a uniaxial material, which uses omega, epsilon",
            ErrorOf(With("\"omega\"", "\"n\": [1.5, 1.5], \"omega\"")));
    }

    [Fact]
    public void A_family_name_that_differs_from_the_file_name_is_refused()
    {
        Assert.Equal("other.json: field family: 'fam' must match the file name 'other'", ErrorOf(Valid, "other.json"));
    }

    [Fact]
    public void An_unknown_reference_key_is_refused()
    {
        Assert.Equal("fam.json: species 'quartz', variety 't2', field sources: 'handbook' (for colours) is not a reference key of this file or of sources.json",
            ErrorOf(With("{ \"colours\": \"practice\" }", "{ \"colours\": \"handbook\" }")));
    }

    [Fact]
    public void One_key_with_two_citations_in_two_files_is_refused_and_with_the_same_citation_accepted()
    {
        string other(string citation) => $$"""
            { "family": "other", "references": [ { "key": "book", "kind": "published", "citation": "{{citation}}" } ], "species": [] }
            """;
        string e = Assert.Single(ErrorsOf(new FamilySource("fam.json", Valid), new FamilySource("other.json", other("Another book (1999)"))));
        Assert.StartsWith("other.json: reference 0 'book', field citation: the key is also declared in fam.json", e, StringComparison.Ordinal);
        Assert.Equal(2, FamilyFileReader.ReadAll([new FamilySource("fam.json", Valid), new FamilySource("other.json", other("An invented handbook (2000), p. 1"))]).Count);
    }

    [Fact]
    public void A_shared_reference_key_redeclared_with_another_citation_is_refused()
    {
        string e = ErrorOf(With("\"references\": [", "\"references\": [ { \"key\": \"memory\", \"kind\": \"from_memory\", \"citation\": \"my memory\" },"));
        Assert.StartsWith("fam.json: reference 0 'memory', field citation: the key is also declared in sources.json", e, StringComparison.Ordinal);
    }

    [Fact]
    public void A_variety_naming_a_source_for_a_field_it_does_not_state_is_refused()
    {
        Assert.Equal("fam.json: species 'quartz', variety 't2', field sources: names 'sg', which this variety does not state (it inherits it with its species' source)",
            ErrorOf(With("{ \"colours\": \"practice\" }", "{ \"colours\": \"practice\", \"sg\": \"book\" }")));
    }

    [Fact]
    public void A_source_for_an_unknown_field_is_refused()
    {
        Assert.StartsWith("fam.json: species 'quartz', field sources: 'colour' is not a field that takes a source",
            ErrorOf(With("\"sg\": \"book\" }", "\"colour\": \"book\" }")), StringComparison.Ordinal);
    }

    [Fact]
    public void A_species_without_sources_or_varieties_is_refused()
    {
        Assert.StartsWith("fam.json: species 'quartz', field sources: required",
            ErrorOf(With("\"sources\": { \"*\": \"memory\", \"sg\": \"book\" },", "")), StringComparison.Ordinal);
        string empty = Valid[..Valid.IndexOf("\"varieties\"", StringComparison.Ordinal)] + "\"varieties\": [] } ] }";
        Assert.StartsWith("fam.json: species 'quartz', field varieties: at least one variety", ErrorOf(empty), StringComparison.Ordinal);
    }

    [Fact]
    public void A_species_declared_in_two_files_is_refused()
    {
        const string other = """
            { "family": "other", "species": [ {
              "species": "quartz", "crystal_system": "cubic", "optic_character": "isotropic", "forms": ["crystal"], "n": [1.5, 1.5],
              "sg": [2.6, 2.6], "polariscope": ["singly_refractive"], "colours": ["blue"], "frequency": "rare", "sources": { "*": "memory" },
              "varieties": [ { "name": "u", "variety": "u", "origin": "imitation", "share": "rare" } ] } ] }
            """;
        string e = Assert.Single(ErrorsOf(new FamilySource("fam.json", Valid), new FamilySource("other.json", other)));
        Assert.Equal("other.json: species 'quartz', field species: already declared in fam.json; a species lives in exactly one file", e);
    }

    [Fact]
    public void Errors_from_several_files_are_all_reported()
    {
        var bad1 = new FamilySource("a.json", With("\"fam\"", "\"a\"").Replace("\"share\": \"common\"", "\"share\": \"x\"", StringComparison.Ordinal));
        var bad2 = new FamilySource("b.json", "{ \"family\": \"b\", \"species\": [ ");
        IReadOnlyList<string> e = ErrorsOf(bad1, bad2);
        Assert.Equal(2, e.Count);
        Assert.StartsWith("b.json", e[0], StringComparison.Ordinal); // unreadable files first, then the entries of readable ones
        Assert.StartsWith("a.json: species 'quartz', variety 't', field share", e[1], StringComparison.Ordinal);
    }

    [Fact]
    public void Every_bad_field_of_every_variety_is_reported_not_just_the_first()
    {
        IReadOnlyList<string> e = ErrorsOf(new FamilySource("fam.json", With("\"omega\": [1.544, 1.544], ", "").Replace("\"occasional\"", "\"often\"", StringComparison.Ordinal)));
        Assert.Equal(
        [
            "fam.json: species 'quartz', field omega: required for a uniaxial material",
            "fam.json: species 'quartz', variety 't2', field share: 'often' is not one of very_common, common, occasional, rare, very_rare",
        ], e);
    }
}
