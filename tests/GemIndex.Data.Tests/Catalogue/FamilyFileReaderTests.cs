using GemIndex.Core.Catalogue;
using GemIndex.Core.Observations;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Data.Catalogue;

namespace GemIndex.Data.Tests.Catalogue;

public class FamilyFileReaderTests
{
    private const string Valid = """
        { "name": "t", "species": "quartz", "variety": "v", "origin": "natural", "crystal_system": "trigonal",
          "optic_character": "uniaxial", "optic_sign": "positive", "omega": [1.544, 1.544], "epsilon": [1.553, 1.553],
          "birefringence": [0.009, 0.009], "sg": [2.65, 2.66], "polariscope": ["doubly_refractive"],
          "colours": ["colourless"], "frequency": "common", "provenance": "test" }
        """;

    private static string Family(string entry, string family = "fam") => $$"""{ "family": "{{family}}", "materials": [ {{Valid}}, {{entry}} ] }""";

    private static string ErrorOf(string json, string file = "fam.json") =>
        Assert.Single(Assert.Throws<CatalogueFormatException>(() => FamilyFileReader.Read(new FamilySource(file, json))).Errors);

    private static string Second(string from, string to) => Family(Valid.Replace("\"t\"", "\"t2\"", StringComparison.Ordinal).Replace(from, to, StringComparison.Ordinal));

    [Fact]
    public void The_fixture_families_read_into_materials_with_every_field()
    {
        IReadOnlyList<Material> all = FamilyFileReader.ReadAll(Fixtures.FamilySources);
        Assert.Equal(4, all.Count);
        Material crystal = all.Single(m => m.Name == "sample rock crystal");
        Assert.Equal("sample-quartz", crystal.Family);
        Assert.Equal(OpticCharacter.Uniaxial, crystal.OpticCharacter);
        Assert.Equal(1.553, crystal.Indices.Epsilon!.Value.Minimum);
        Assert.Equal(BenchFrequency.VeryCommon, crystal.Frequency);
        Assert.Equal([FluorescenceStrength.Inert, FluorescenceStrength.Weak], crystal.UvShort);
        Assert.Equal(PleochroismStrength.Weak, crystal.Pleochroism);
        Material peridot = all.Single(m => m.Name == "sample peridot");
        Assert.Equal(1.665, peridot.Indices.Beta!.Value.Minimum);
        Assert.Equal([453.0, 477, 497], peridot.AbsorptionLinesNanometres);
        Assert.Equal(OpticCharacter.Aggregate, all.Single(m => m.Name == "sample chalcedony").OpticCharacter);
    }

    [Fact]
    public void The_fixture_families_pass_the_catalogue_check()
    {
        Assert.Empty(CatalogueCheck.Check(FamilyFileReader.ReadAll(Fixtures.FamilySources)));
    }

    [Fact]
    public void NaN_is_refused_naming_file_line_entry_and_field()
    {
        string e = ErrorOf(Second("[2.65, 2.66]", "[NaN, 2.66]"));
        // The second entry's "sg" sits on the sixth line of the generated text.
        Assert.StartsWith("fam.json: line 6, entry 1, field sg: 'N' is an invalid start of a value.", e, StringComparison.Ordinal);
    }

    [Fact]
    public void A_number_too_large_for_a_double_is_refused_not_read_as_infinity()
    {
        string e = ErrorOf(Second("[2.65, 2.66]", "[2.65, 1e400]"));
        Assert.Contains("entry 1, field sg", e, StringComparison.Ordinal);
        Assert.Contains("number out of range: 1e400", e, StringComparison.Ordinal);
    }

    [Fact]
    public void A_number_written_as_a_string_is_refused()
    {
        Assert.Contains("expected a number, found String", ErrorOf(Second("[2.65, 2.66]", "[\"2.65\", 2.66]")), StringComparison.Ordinal);
    }

    [Fact]
    public void An_unknown_field_is_refused()
    {
        string e = ErrorOf(Second("\"frequency\"", "\"colour\": \"red\", \"frequency\""));
        Assert.Contains("entry 1", e, StringComparison.Ordinal);
        Assert.Contains("'colour'", e, StringComparison.Ordinal);
    }

    [Fact]
    public void A_duplicate_key_is_refused()
    {
        Assert.Contains("Duplicate property 'frequency'", ErrorOf(Second("\"frequency\"", "\"frequency\": \"rare\", \"frequency\"")), StringComparison.Ordinal);
    }

    [Fact]
    public void A_missing_required_field_is_refused_by_name()
    {
        Assert.Contains("'provenance'", ErrorOf(Second(", \"provenance\": \"test\"", "")), StringComparison.Ordinal);
    }

    [Fact]
    public void An_unknown_word_names_the_entry_the_field_and_the_allowed_words()
    {
        string e = ErrorOf(Second("\"natural\"", "\"naturel\""));
        Assert.Equal("fam.json: entry 1 't2', field origin: 'naturel' is not one of natural, synthetic, imitation, treated, composite", e);
    }

    [Fact]
    public void A_range_of_three_numbers_is_refused()
    {
        Assert.Equal("fam.json: entry 1 't2', field sg: expected [min, max] (two numbers), got 3",
            ErrorOf(Second("[2.65, 2.66]", "[2.65, 2.66, 2.67]")));
    }

    [Fact]
    public void A_range_written_backwards_is_refused()
    {
        string e = ErrorOf(Second("[2.65, 2.66]", "[2.66, 2.65]"));
        Assert.StartsWith("fam.json: entry 1 't2', field sg: sg upper end is 2.65", e, StringComparison.Ordinal);
    }

    [Fact]
    public void An_index_the_optic_character_does_not_use_is_refused()
    {
        string e = ErrorOf(Second("\"omega\"", "\"n\": [1.5, 1.5], \"omega\""));
        Assert.Equal("fam.json: entry 1 't2', field n: not allowed for a uniaxial material, which uses omega, epsilon", e);
    }

    [Fact]
    public void A_family_name_that_differs_from_the_file_name_is_refused()
    {
        Assert.Equal("other.json: field family: 'fam' must match the file name 'other'", ErrorOf(Family(Valid.Replace("\"t\"", "\"t2\"", StringComparison.Ordinal)), "other.json"));
    }

    [Fact]
    public void Errors_from_several_files_are_all_reported()
    {
        var bad1 = new FamilySource("a.json", Second("\"natural\"", "\"x\"").Replace("\"fam\"", "\"a\"", StringComparison.Ordinal));
        var bad2 = new FamilySource("b.json", "{ \"family\": \"b\", \"materials\": [ ");
        var e = Assert.Throws<CatalogueFormatException>(() => FamilyFileReader.ReadAll([bad1, bad2]));
        Assert.Equal(2, e.Errors.Count);
        Assert.StartsWith("a.json", e.Errors[0], StringComparison.Ordinal);
        Assert.StartsWith("b.json", e.Errors[1], StringComparison.Ordinal);
    }

    [Fact]
    public void Every_bad_field_of_every_entry_is_reported_not_just_the_first()
    {
        var e = Assert.Throws<CatalogueFormatException>(() => FamilyFileReader.Read(new FamilySource("fam.json",
            Second("\"omega\": [1.544, 1.544], ", "").Replace("\"common\"", "\"often\"", StringComparison.Ordinal))));
        Assert.Equal(
        [
            "fam.json: entry 0 't', field frequency: 'often' is not one of very_common, common, occasional, rare, very_rare",
            "fam.json: entry 1 't2', field omega: required for a uniaxial material",
            "fam.json: entry 1 't2', field frequency: 'often' is not one of very_common, common, occasional, rare, very_rare",
        ], e.Errors);
    }
}
