using GemIndex.Core.Catalogue;
using GemIndex.Core.Observations;
using GemIndex.Data.Catalogue;

namespace GemIndex.Data.Tests.Catalogue;

/// <summary>A variety written "like" a sibling variety of its species (reference-db/README.md, "Varieties like a sibling").</summary>
public class LikeVarietyTests
{
    // An invented family: "dark" states its own SG, UV, lines and colours; "dark, treated" is like it and states only its
    // colours and notes; "dark, treated twice" is like the treated one (a chain). "dark, treated" comes first in the file,
    // before the sibling it is like, so file order and reading order differ.
    private const string Family = """
        { "family": "fam",
          "references": [
            { "key": "book", "kind": "published", "citation": "An invented handbook (2000), p. 1" },
            { "key": "paper", "kind": "published", "citation": "An invented paper (2001), p. 2" } ],
          "species": [ {
            "species": "quartz", "crystal_system": "trigonal", "optic_character": "uniaxial", "optic_sign": "positive",
            "forms": ["crystal"], "omega": [1.544, 1.544], "epsilon": [1.553, 1.553], "birefringence": [0.009, 0.009],
            "sg": [2.6, 2.7], "polariscope": ["doubly_refractive"], "colours": ["colourless"], "frequency": "common",
            "sources": { "*": "memory", "sg": "book" },
            "varieties": [
              { "name": "dark, treated", "variety": "heated dark", "origin": "treated", "share": "common", "like": "dark",
                "colours": ["yellow"], "notes": "Heated.", "sources": { "colours": "practice", "notes": "practice" } },
              { "name": "dark", "variety": "dark", "origin": "natural", "share": "occasional",
                "sg": [2.64, 2.66], "uv_long": ["weak"], "absorption": [ { "nm": 550, "strength": "weak" } ],
                "colours": ["purple"], "notes": "Unheated.",
                "sources": { "sg": "paper", "uv_long": "practice", "absorption": "memory", "colours": "practice", "notes": "practice" } },
              { "name": "dark, treated twice", "variety": "reheated dark", "origin": "treated", "share": "rare",
                "like": "dark, treated", "pleochroism": "moderate", "sources": { "pleochroism": "practice" } }
            ] } ] }
        """;

    private static string With(string from, string to)
    {
        Assert.Contains(from, Family, StringComparison.Ordinal); // a replacement that misses would test the fixture unchanged
        return Family.Replace(from, to, StringComparison.Ordinal);
    }

    private static FamilyCatalogue Read(string json) => FamilyFileReader.ReadCatalogue([new FamilySource("fam.json", json)]);

    private static IReadOnlyList<string> ErrorsOf(params FamilySource[] files) =>
        Assert.Throws<CatalogueFormatException>(() => FamilyFileReader.ReadCatalogue(files)).Errors;

    private static Material Named(FamilyCatalogue c, string name) => c.Materials.Single(m => m.Name == name);

    [Fact]
    public void A_like_variety_takes_its_siblings_stated_fields_then_the_species_and_keeps_its_own()
    {
        FamilyCatalogue c = Read(Family);
        Material sibling = Named(c, "dark"), treated = Named(c, "dark, treated");
        Assert.Equal(sibling.SpecificGravity, treated.SpecificGravity);                  // the sibling's narrower SG, not the species'
        Assert.NotEqual(c.Species["quartz"].SpecificGravity, treated.SpecificGravity);
        Assert.Equal(sibling.AbsorptionLines, treated.AbsorptionLines);
        Assert.Equal(sibling.UvLong, treated.UvLong);
        Assert.Equal(c.Species["quartz"].Indices, treated.Indices);                      // neither states it: the species'
        Assert.Equal(["yellow"], treated.Colours);                                       // its own wins
        Assert.Equal("Heated.", treated.Notes);
        Assert.Equal((OriginClass.Treated, BenchFrequency.Common), (treated.Origin, treated.Frequency));
    }

    [Fact]
    public void An_inherited_field_keeps_the_siblings_source_and_a_stated_one_its_own()
    {
        FamilyCatalogue c = Read(Family);
        Material sibling = Named(c, "dark"), treated = Named(c, "dark, treated");
        foreach (string field in new[] { "sg", "uv_long", "absorption" })
            Assert.Equal(sibling.Sources[field], treated.Sources[field]);
        Assert.Equal("paper", treated.Sources["sg"].Key);                                // not the species' "book"
        Assert.Equal("memory", treated.Sources["omega"].Key);                            // the species'
        Assert.Equal(SourceKind.CommonPractice, treated.Sources["colours"].Kind);
        // Published sg from the sibling: the sourcing count sees it as published.
        Assert.Equal(SourceKind.Published, treated.Sources["sg"].Kind);
    }

    [Fact]
    public void Stated_fields_name_every_field_not_from_the_species_and_the_likeness_the_ones_it_writes()
    {
        FamilyCatalogue c = Read(Family);
        Assert.Equal(["sg", "uv_long", "absorption", "colours", "notes"], Named(c, "dark, treated").StatedFields);
        CatalogueCheck.Likeness like = c.Likes["dark, treated"];
        Assert.Equal("dark", like.Sibling.Name);
        Assert.Equal(["colours", "notes"], like.OwnFields);
        Assert.False(c.Likes.ContainsKey("dark"));
    }

    [Fact]
    public void A_chain_is_followed_to_its_end_and_the_materials_stay_in_file_order()
    {
        FamilyCatalogue c = Read(Family);
        Assert.Equal(["dark, treated", "dark", "dark, treated twice"], c.Materials.Select(m => m.Name));
        Material twice = Named(c, "dark, treated twice");
        Assert.Equal(["yellow"], twice.Colours);                                         // from "dark, treated"
        Assert.Equal(Named(c, "dark").AbsorptionLines, twice.AbsorptionLines);           // from "dark", through it
        Assert.Equal("paper", twice.Sources["sg"].Key);
        Assert.Equal(PleochroismStrength.Moderate, twice.Pleochroism);
        Assert.Equal("dark, treated", c.Likes["dark, treated twice"].Sibling.Name);
    }

    [Fact]
    public void The_fixture_passes_the_check()
    {
        IReadOnlyList<CatalogueFinding> findings = Read(Family).Check();
        Assert.True(findings.Count == 0, string.Join("\n", findings));
    }

    [Fact]
    public void An_unknown_name_is_refused_naming_the_file_species_variety_and_field()
    {
        string e = Assert.Single(ErrorsOf(new FamilySource("fam.json", With("\"like\": \"dark\",", "\"like\": \"darker\","))));
        Assert.StartsWith("fam.json: species 'quartz', variety 'dark, treated', field like: 'darker' is not the name of a variety of species 'quartz'",
            e, StringComparison.Ordinal);
    }

    [Fact]
    public void A_variety_of_another_species_is_refused_naming_that_species_and_its_file()
    {
        const string other = """
            { "family": "other", "species": [ {
                "species": "opal", "crystal_system": "amorphous", "optic_character": "amorphous", "forms": ["amorphous"],
                "n": [1.44, 1.46], "sg": [1.98, 2.2], "polariscope": ["singly_refractive"], "colours": ["white"],
                "frequency": "common", "sources": { "*": "memory" },
                "varieties": [ { "name": "white opal", "variety": "white opal", "origin": "natural", "share": "common" } ] } ] }
            """;
        string e = Assert.Single(ErrorsOf(new FamilySource("fam.json", With("\"like\": \"dark\",", "\"like\": \"white opal\",")),
            new FamilySource("other.json", other)));
        Assert.Equal("fam.json: species 'quartz', variety 'dark, treated', field like: 'white opal' is a variety of species 'opal' in other.json, " +
            "not of species 'quartz'; a variety can be like only a sibling of its own species", e);
    }

    [Fact]
    public void A_cycle_is_refused_on_every_variety_in_it_naming_the_file_species_and_variety()
    {
        IReadOnlyList<string> errors = ErrorsOf(new FamilySource("fam.json",
            With("\"share\": \"occasional\",", "\"share\": \"occasional\", \"like\": \"dark, treated twice\",")));
        Assert.True(errors.Count == 3, string.Join("\n", errors));
        Assert.Contains("fam.json: species 'quartz', variety 'dark', field like: 'dark, treated twice' leads back to this variety " +
            "(dark → dark, treated twice → dark, treated → dark); a chain of \"like\" must not form a cycle", errors);
        Assert.All(errors, e => Assert.Contains("field like:", e, StringComparison.Ordinal));
        Assert.All(errors, e => Assert.Contains("must not form a cycle", e, StringComparison.Ordinal));
        Assert.Equal(["dark", "dark, treated", "dark, treated twice"], errors.Select(e => e.Split('\'')[3]).Order(StringComparer.Ordinal));
    }

    [Fact]
    public void A_variety_like_itself_is_a_cycle()
    {
        string e = Assert.Single(ErrorsOf(new FamilySource("fam.json", With("\"like\": \"dark, treated\",", "\"like\": \"dark, treated twice\","))));
        Assert.StartsWith("fam.json: species 'quartz', variety 'dark, treated twice', field like: 'dark, treated twice' leads back to this variety",
            e, StringComparison.Ordinal);
    }

    [Fact]
    public void A_source_for_a_field_the_like_variety_does_not_state_is_refused()
    {
        string e = Assert.Single(ErrorsOf(new FamilySource("fam.json",
            With("{ \"colours\": \"practice\", \"notes\": \"practice\" }", "{ \"colours\": \"practice\", \"notes\": \"practice\", \"sg\": \"book\" }"))));
        Assert.Equal("fam.json: species 'quartz', variety 'dark, treated', field sources: names 'sg', which this variety does not state " +
            "(it inherits it with the source it has in 'dark')", e);
    }

    [Fact]
    public void Like_is_a_variety_field_only()
    {
        string e = Assert.Single(ErrorsOf(new FamilySource("fam.json", With("\"frequency\": \"common\",", "\"frequency\": \"common\", \"like\": \"dark\","))));
        Assert.Contains("'like'", e, StringComparison.Ordinal);
    }

    [Fact]
    public void The_check_refuses_a_like_variety_that_repeats_a_value_of_its_sibling()
    {
        FamilyCatalogue c = Read(With("\"colours\": [\"yellow\"], \"notes\": \"Heated.\", \"sources\": { \"colours\": \"practice\", \"notes\": \"practice\" }",
            "\"colours\": [\"yellow\"], \"uv_long\": [\"weak\"], \"notes\": \"Heated.\", \"sources\": { \"*\": \"practice\" }"));
        CatalogueFinding f = Assert.Single(c.Check());
        Assert.Equal(("dark, treated", "uv_long", "fam.json"), (f.Entry, f.Field, f.File));
        Assert.Contains("repeats the value [weak] of 'dark'", f.Problem, StringComparison.Ordinal);
    }

    [Fact]
    public void The_check_refuses_a_like_variety_of_the_same_origin_that_differs_only_in_its_notes()
    {
        // The treated entry without its own colours: as treated it is an entry of its own; made natural, only its name,
        // share and notes differ from its sibling's.
        string onlyNotes = With("\"colours\": [\"yellow\"], \"notes\": \"Heated.\", \"sources\": { \"colours\": \"practice\", \"notes\": \"practice\" }",
            "\"notes\": \"Heated.\", \"sources\": { \"notes\": \"practice\" }");
        Assert.Empty(Read(onlyNotes).Check());
        string natural = onlyNotes.Replace("\"origin\": \"treated\", \"share\": \"common\"", "\"origin\": \"natural\", \"share\": \"common\"", StringComparison.Ordinal);
        Assert.NotEqual(onlyNotes, natural);
        CatalogueFinding f = Assert.Single(Read(natural).Check());
        Assert.Equal(("dark, treated", "like"), (f.Entry, f.Field));
        Assert.Contains("neither in origin (natural) nor in any stated field but its notes", f.Problem, StringComparison.Ordinal);
    }

    [Fact]
    public void The_check_refuses_a_like_variety_whose_range_leaves_its_species()
    {
        // The SG is cited to memory on purpose: a treated variety may leave its species' range only on a published source
        // or a stated judgement (CatalogueCheck.OutsideSpecies), so this one is still refused.
        FamilyCatalogue c = Read(With("\"pleochroism\": \"moderate\", \"sources\": { \"pleochroism\": \"practice\" }",
            "\"pleochroism\": \"moderate\", \"sg\": [2.65, 2.75], \"sources\": { \"pleochroism\": \"practice\", \"sg\": \"memory\" }"));
        CatalogueFinding f = Assert.Single(c.Check());
        Assert.Equal(("dark, treated twice", "sg"), (f.Entry, f.Field));
        Assert.Contains("outside its species' range", f.Problem, StringComparison.Ordinal);
    }
}
