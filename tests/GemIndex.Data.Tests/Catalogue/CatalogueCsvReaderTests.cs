using GemIndex.Data.Catalogue;

namespace GemIndex.Data.Tests.Catalogue;

public class CatalogueCsvReaderTests
{
    private const string Header = "name,species,variety,origin,crystal_system,optic_character,n_min,n_max,sg_min,sg_max,polariscope,colours,frequency,provenance";

    private static IReadOnlyList<string> Errors(string csv) =>
        [.. CatalogueCsvReader.Read(new StringReader(csv)).Errors.Select(e => e.ToString())];

    [Fact]
    public void A_header_without_a_required_column_is_refused_by_name()
    {
        Assert.Contains("line 1, field provenance: required column is missing from the header",
            Errors(Header.Replace(",provenance", "", StringComparison.Ordinal) + "\n"));
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
        Assert.Equal(["line 2, (line): 3 cells, but the header has 14 columns".Replace(", (line)", ", field (line)", StringComparison.Ordinal)],
            Errors(Header + "\na,b,c\n"));
    }

    [Fact]
    public void Half_a_range_is_refused()
    {
        IReadOnlyList<string> e = Errors(Header + "\nx,glass,glass,imitation,amorphous,amorphous,1.5,,2.4,2.6,singly_refractive,blue,common,own\n");
        Assert.Contains("line 2, field n_min/n_max: give both ends of the range (equal for a single value) or neither", e);
    }

    [Fact]
    public void Quoted_cells_keep_commas_and_doubled_quotes()
    {
        var (rows, errors) = CatalogueCsvReader.Read(new StringReader(
            Header + ",notes\nx,glass,glass,imitation,amorphous,amorphous,1.5,1.5,2.4,2.6,singly_refractive,blue,common,own,\"a, \"\"b\"\"\"\n"));
        Assert.Empty(errors);
        Assert.Equal("a, \"b\"", Assert.Single(rows).Material.Notes);
    }

    [Fact]
    public void An_unclosed_quote_is_refused_with_its_line()
    {
        Assert.Equal(["line 2, field (line): a quoted cell is not closed on this line"], Errors(Header + "\n\"x,glass\n"));
    }

    [Fact]
    public void An_empty_file_is_refused()
    {
        Assert.Equal(["line 1, field (header): the file is empty; the first line must name the columns"], Errors(""));
    }
}
