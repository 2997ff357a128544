using GemIndex.Core.Catalogue;
using GemIndex.Data.Catalogue;

namespace GemIndex.Data.Tests.Catalogue;

public class CatalogueCsvReaderTests
{
    private const string Header = "name,species,variety,origin,crystal_system,optic_character,n_min,n_max,sg_min,sg_max,forms,polariscope,colours,frequency,source,source_kind";

    private const string Glass = "x,glass,glass,imitation,amorphous,amorphous,1.5,1.5,2.4,2.6,amorphous,singly_refractive,blue,common,own,from_memory";

    private static readonly FamilyCatalogue Shipped = FamilyFileReader.ReadCatalogue(Fixtures.FamilySources);

    private static (IReadOnlyList<CatalogueCsvRow> Rows, IReadOnlyList<CatalogueImportError> Errors) Read(string csv) =>
        CatalogueCsvReader.Read(new StringReader(csv), Shipped);

    private static IReadOnlyList<string> Errors(string csv) => [.. Read(csv).Errors.Select(e => e.ToString())];

    [Fact]
    public void A_header_without_a_required_column_is_refused_by_name()
    {
        Assert.Contains("line 1, field origin: required column is missing from the header",
            Errors(Header.Replace(",origin", "", StringComparison.Ordinal) + "\n"));
    }

    [Fact]
    public void An_unknown_column_is_refused()
    {
        Assert.Equal(["line 1, field colour: unknown column 'colour'; the columns are listed in reference-db/README.md"],
            Errors(Header + ",colour\n"));
    }

    [Fact]
    public void A_row_with_the_wrong_number_of_cells_is_refused()
    {
        Assert.Equal(["line 2, field (line): 3 cells, but the header has 16 columns"], Errors(Header + "\na,b,c\n"));
    }

    [Fact]
    public void Half_a_range_is_refused()
    {
        Assert.Contains("line 2, field n_min/n_max: give both ends of the range (equal for a single value) or neither",
            Errors(Header + "\n" + Glass.Replace("1.5,1.5", "1.5,", StringComparison.Ordinal) + "\n"));
    }

    [Fact]
    public void Quoted_cells_keep_commas_doubled_quotes_and_line_breaks_and_later_rows_keep_their_line_numbers()
    {
        var (rows, errors) = Read(Header + ",notes\n" + Glass + ",\"a, \"\"b\"\"\nc\"\n" + Glass.Replace("x,", "y,", StringComparison.Ordinal) + ",\n");
        Assert.Empty(errors);
        Assert.Equal("a, \"b\"\nc", rows[0].Material.Notes);
        Assert.Equal([2, 4], rows.Select(r => r.Line));
    }

    [Fact]
    public void A_byte_order_mark_is_skipped()
    {
        var (rows, errors) = Read("\uFEFF" + Header + "\n" + Glass + "\n");
        Assert.Empty(errors);
        Assert.Equal("x", Assert.Single(rows).Material.Name);
    }

    [Fact]
    public void An_unclosed_quote_is_refused_with_its_line()
    {
        Assert.Equal(["line 2, field (line): a quoted cell is not closed before the end of the file"], Errors(Header + "\n\"x,glass\n"));
    }

    [Fact]
    public void An_empty_file_is_refused()
    {
        Assert.Equal(["line 1, field (header): the file is empty; the first line must name the columns"], Errors(""));
    }

    [Fact]
    public void A_row_that_inherits_a_shipped_species_states_only_what_differs()
    {
        var (rows, errors) = Read("name,variety,origin,share,inherits,colours,sg_min,sg_max,source,source_kind\n" +
            "my amethyst,amethyst,natural,rare,quartz,purple,2.65,2.655,own measurements,from_memory\n");
        Assert.Empty(errors);
        Material m = Assert.Single(rows).Material;
        Assert.Equal(("quartz", BenchFrequency.Rare, BenchFrequency.VeryCommon), (m.Species, m.Frequency, m.SpeciesFrequency));
        Assert.Equal(1.544, m.Indices.Omega!.Value.Minimum); // from the species
        Assert.Equal(["sg", "colours"], m.StatedFields);
        Assert.Equal(("user: my amethyst", "own measurements"), (m.Sources["sg"].Key, m.Sources["sg"].Citation));
        Assert.Equal("memory", m.Sources["omega"].Key);
    }

    [Fact]
    public void A_row_that_inherits_an_unknown_species_or_restates_its_species_fields_is_refused()
    {
        IReadOnlyList<string> e = Errors("name,variety,origin,share,inherits,species\n" + "a,b,natural,rare,quartzz,\n" + "c,d,natural,rare,quartz,quartz\n");
        Assert.Contains(e, x => x.StartsWith("line 2, field inherits: 'quartzz' is not a species of the shipped catalogue", StringComparison.Ordinal));
        Assert.Contains("line 3, field species: leave it empty: it comes from the inherited species 'quartz'", e);
    }

    [Fact]
    public void A_row_that_does_not_inherit_must_name_its_species_and_a_source()
    {
        IReadOnlyList<string> e = Errors(Header + "\n" + Glass.Replace("x,glass,", "x,,", StringComparison.Ordinal).Replace(",own,from_memory", ",,", StringComparison.Ordinal) + "\n");
        Assert.Contains("line 2, field species: required unless the row inherits a shipped species", e);
        Assert.Contains(e, x => x.StartsWith("line 2, field source: required for the numbers this row states", StringComparison.Ordinal));
    }

    [Fact]
    public void Absorption_lines_carry_their_strength()
    {
        var (rows, errors) = Read(Header + ",absorption\n" + Glass + ",\"694.2 strong; 668\"\n");
        Assert.Empty(errors);
        Assert.Equal([new AbsorptionLine(694.2, LineStrength.Strong), new AbsorptionLine(668, LineStrength.Moderate)], rows[0].Material.AbsorptionLines);
    }
}
