using GemIndex.Cli.Reports;
using GemIndex.Data.Workbook;

namespace GemIndex.Tests.Reports;

public class WorkbookCsvTests
{
    [Theory]
    [InlineData("plain", "plain")]
    [InlineData("a,b", "\"a,b\"")]
    [InlineData("say \"hi\"", "\"say \"\"hi\"\"\"")]
    [InlineData("two\nlines", "\"two\nlines\"")]
    [InlineData("cr\rhere", "\"cr\rhere\"")]
    public void Fields_are_quoted_as_RFC_4180_says(string field, string expected) =>
        Assert.Equal(expected, WorkbookCsv.Quote(field));

    [Fact]
    public void One_row_per_stone_after_the_header_with_CRLF_line_ends()
    {
        StoneSheet identified = ReportFixtures.Sheet(ReportFixtures.QuartzLine, "lot 7, \"A\"");
        StoneSheet notYet = ReportFixtures.Sheet("""{"id":"x","colour":"blue\ngreen"}""");
        var w = new StringWriter();
        WorkbookCsv.Write(w, [(identified, ReportFixtures.Identify(identified)), (notYet, null)]);
        string[] rows = w.ToString().Split("\r\n");
        Assert.Equal(string.Join(",", WorkbookCsv.Columns), rows[0]);
        Assert.StartsWith("\"lot 7, \"\"A\"\"\",2.65,colourless,1.544,1.553,", rows[1]);
        Assert.EndsWith(",quartz," + ReportFixtures.Identify(identified).Candidates[0].Confidence.ToString("0.000", System.Globalization.CultureInfo.InvariantCulture) + ",false", rows[1]);
        Assert.Equal("x,2.65,\"blue\ngreen\",,,,,,,,,", rows[2]);
        Assert.Equal("", rows[3]); // the file ends with a line break
        Assert.Equal(4, rows.Length);
    }
}
