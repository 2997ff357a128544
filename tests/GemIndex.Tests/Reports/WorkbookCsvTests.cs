using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using GemIndex.Cli.Reports;
using GemIndex.Data.Workbook;
using nietras.SeparatedValues;

namespace GemIndex.Tests.Reports;

public class WorkbookCsvTests
{
    private static string Csv(params string[] cells)
    {
        var w = new StringWriter();
        WorkbookCsv.Table(w, [.. cells.Select((_, i) => "c" + i)], [cells]);
        return w.ToString();
    }

    [Theory]
    [InlineData("plain", "plain")]
    [InlineData("a,b", "\"a,b\"")]
    [InlineData("say \"hi\"", "\"say \"\"hi\"\"\"")]
    [InlineData("two\nlines", "\"two\nlines\"")]
    [InlineData("cr\rhere", "\"cr\rhere\"")]
    public void Fields_are_quoted_as_RFC_4180_says(string field, string expected) =>
        Assert.Equal("c0" + Environment.NewLine + expected + Environment.NewLine, Csv(field));

    // The triggers of OWASP ASVS 5.0 requirement 1.2.10 and CWE-1236 (read for this check): a leading =, +, -, @, tab,
    // CR or NUL makes a spreadsheet evaluate the cell; a leading apostrophe makes it text.
    [Theory]
    [InlineData("=HYPERLINK(\"http://example.invalid\",\"lot 7\")", "'=HYPERLINK(\"http://example.invalid\",\"lot 7\")")]
    [InlineData("+1+2", "'+1+2")]
    [InlineData("-2+3", "'-2+3")]
    [InlineData("@SUM(A1:A2)", "'@SUM(A1:A2)")]
    [InlineData("\tlot 7", "'\tlot 7")]
    [InlineData("\rlot 7", "'\rlot 7")]
    [InlineData("lot =7", "lot =7")]
    [InlineData("'already quoted", "'already quoted")]
    [InlineData("", "")]
    public void Cells_a_spreadsheet_would_run_as_formulas_get_a_leading_apostrophe(string cell, string expected) =>
        Assert.Equal(expected, WorkbookCsv.Neutralised(cell));

    [Fact]
    public void A_reference_written_as_a_formula_reaches_the_file_neutralised()
    {
        StoneSheet hostile = ReportFixtures.Sheet("""{"id":"=cmd|' /C calc'!A0","colour":"@red"}""");
        var w = new StringWriter();
        WorkbookCsv.Write(w, [(hostile, null)]);
        string row = w.ToString().Split(Environment.NewLine)[1];
        Assert.StartsWith("'=cmd|' /C calc'!A0,2.65,'@red,", row);
    }

    [Fact]
    public void One_row_per_stone_after_the_header()
    {
        StoneSheet identified = ReportFixtures.Sheet(ReportFixtures.QuartzLine, "lot 7, \"A\"");
        StoneSheet notYet = ReportFixtures.Sheet("""{"id":"x","colour":"blue\ngreen"}""");
        var w = new StringWriter();
        WorkbookCsv.Write(w, [(identified, ReportFixtures.Identify(identified)), (notYet, null)]);
        string text = w.ToString();
        string[] rows = text.Split(Environment.NewLine);
        Assert.Equal(string.Join(",", WorkbookCsv.Columns), rows[0]);
        Assert.StartsWith("\"lot 7, \"\"A\"\"\",2.65,colourless,1.544,1.553,", rows[1]);
        var result = ReportFixtures.Identify(identified);
        // Rounded down to four decimals as the result document writes it: a species at 0.99996 is 0.9999, never 1.000.
        string Share(double p) => (Math.Floor(p * 10000) / 10000).ToString("0.0000", System.Globalization.CultureInfo.InvariantCulture);
        Assert.True(result.Species[0].Confidence < 1);
        Assert.DoesNotContain(",1.0000,", rows[1]);
        Assert.EndsWith($",{result.Species[0].Species},{Share(result.Species[0].Confidence)},{result.Candidates[0].Material.Name},{Share(result.Candidates[0].Confidence)},false,,facet,", rows[1]);
        Assert.Equal("quartz", result.Species[0].Species);
        // The line break inside the quoted colour is the stone's, the last one ends the file (Sep writes the platform's line end).
        Assert.EndsWith(Environment.NewLine + "x,2.65,\"blue\ngreen\"" + new string(',', WorkbookCsv.Columns.Count - 3) + Environment.NewLine, text);
    }

    [Fact]
    public void The_birefringence_is_the_difference_of_the_two_indices_in_the_row()
    {
        // Invented readings near peridot's handbook indices (from memory), twelve steps: the fitted birefringence 0.0355
        // was written 0.035 beside α 1.654 and γ 1.690, where the answer and the reports say 0.036.
        StoneSheet peridot = ReportFixtures.Sheet("""{"id":"p","refractometer":{"method":"facet","readings":[{"rotation_deg":0,"low":1.654,"high":1.686},{"rotation_deg":15,"low":1.656,"high":1.688},{"rotation_deg":30,"low":1.66,"high":1.69},{"rotation_deg":45,"low":1.664,"high":1.69},{"rotation_deg":60,"low":1.668,"high":1.689},{"rotation_deg":75,"low":1.67,"high":1.686},{"rotation_deg":90,"low":1.671,"high":1.682},{"rotation_deg":105,"low":1.669,"high":1.679},{"rotation_deg":120,"low":1.666,"high":1.68},{"rotation_deg":135,"low":1.662,"high":1.682},{"rotation_deg":150,"low":1.658,"high":1.684},{"rotation_deg":165,"low":1.655,"high":1.685}]},"sg":3.34}""");
        var w = new StringWriter();
        WorkbookCsv.Write(w, [(peridot, ReportFixtures.Identify(peridot))]);
        Assert.StartsWith("p,2.65,,1.654,1.690,0.036,", w.ToString().Split(Environment.NewLine)[1]);
    }

    [Fact]
    public void A_spot_reading_and_a_stone_over_the_limit_say_how_they_were_read()
    {
        // A jadeite-like cabochon read by spot at 1.66 and a diamond over the limit (common practice): the spot is written
        // as read, to the hundredth, and marked spot; over the limit leaves the indices empty and gives the liquid's limit.
        StoneSheet spot = ReportFixtures.Sheet("""{"id":"s","refractometer":{"method":"spot","spot":1.66},"sg":3.33}""");
        StoneSheet over = ReportFixtures.Sheet("""{"id":"o","refractometer":{"method":"facet","liquid_limit":1.79,"over_limit":true},"sg":3.52}""");
        var w = new StringWriter();
        WorkbookCsv.Write(w, [(spot, ReportFixtures.Identify(spot)), (over, ReportFixtures.Identify(over))]);
        string[] rows = w.ToString().Split(Environment.NewLine);
        Assert.StartsWith("s,2.65,,1.66,,", rows[1]);
        Assert.EndsWith(",spot,", rows[1]);
        Assert.StartsWith("o,2.65,,,,,", rows[2]);
        Assert.EndsWith(",1.790,over limit,", rows[2]);
    }

    [Fact]
    public void A_highest_index_fitted_above_the_liquid_is_no_number_in_the_sheet_and_its_limit_is_given()
    {
        // Invented readings of a strongly birefringent stone whose high edge rises above a 1.79 liquid at three steps.
        StoneSheet hidden = ReportFixtures.Sheet("""{"id":"h","refractometer":{"method":"facet","liquid_limit":1.79,"readings":[{"rotation_deg":0,"low":1.757,"high":1.762},{"rotation_deg":22.5,"low":1.757,"high":1.77},{"rotation_deg":45,"low":1.757,"high":1.782},{"rotation_deg":67.5,"low":1.757},{"rotation_deg":90,"low":1.757},{"rotation_deg":112.5,"low":1.757},{"rotation_deg":135,"low":1.757,"high":1.785},{"rotation_deg":157.5,"low":1.757,"high":1.768}]}}""");
        var result = ReportFixtures.Identify(hidden);
        Assert.NotNull(result.Series!.Interpretations[0].AboveLiquidLimit);
        var w = new StringWriter();
        WorkbookCsv.Write(w, [(hidden, result)]);
        string[] cells = w.ToString().Split(Environment.NewLine)[1].Split(',');
        int Column(string name) => WorkbookCsv.Columns.ToList().IndexOf(name);
        Assert.Equal("1.757", cells[Column("refractive_index_low")]);
        Assert.Equal("", cells[Column("refractive_index_high")]);
        Assert.Equal("", cells[Column("birefringence")]);
        Assert.Equal("1.790", cells[Column("high_above_liquid_limit")]);
    }

    [Fact]
    public void A_row_holds_every_reading_the_heavy_liquids_the_instruments_the_lines_and_the_loupe()
    {
        // Invented readings of a peridot-like stone (its SG between the two liquids and its iron lines near 453, 473 and
        // 493 nm, handbook values from memory): two heavy liquids (an SG bound, no SG number), the dichroscope, UV, the
        // spectroscope and the loupe, each in its column as written at the bench.
        StoneSheet stone = ReportFixtures.Sheet("""{"id":"p","heavy_liquids":[{"density":2.89,"result":"sinks"},{"density":3.32,"result":"floats"}],"pleochroism":"dichroic","dispersion":"weak","thermal_probe":"negative","uv_long":"inert","uv_short":"inert","absorption_nm":[453,473,493],"magnification":{"present":["fluid_inclusions"],"absent":["round_bubbles"]}}""");
        var w = new StringWriter();
        WorkbookCsv.Write(w, [(stone, ReportFixtures.Identify(stone))]);
        string[] cells = w.ToString().Split(Environment.NewLine)[1].Split(',');
        string Cell(string name) => cells[WorkbookCsv.Columns.ToList().IndexOf(name)];
        Assert.Equal("", Cell("specific_gravity"));
        Assert.Equal("2.89 sinks; 3.32 floats", Cell("heavy_liquids"));
        Assert.Equal(("dichroic", "weak", "negative", "inert", "inert"), (Cell("pleochroism"), Cell("dispersion_by_eye"), Cell("thermal_probe"), Cell("uv_long"), Cell("uv_short")));
        Assert.Equal("453 473 493", Cell("absorption_lines_nm"));
        Assert.Equal(("fluid_inclusions", "round_bubbles"), (Cell("magnification_seen"), Cell("magnification_not_seen")));
    }

    [Fact]
    public void The_sheet_and_the_reports_name_the_optic_character_and_the_conductivity_in_the_text_UIs_words()
    {
        // One index read at two steps (invented, near spinel's handbook 1.718 from memory): singly refractive, as the
        // polariscope and the text UI say it, not "isotropic" alone.
        StoneSheet one = ReportFixtures.Sheet("""{"id":"s","refractometer":{"method":"facet","readings":[{"rotation_deg":0,"low":1.718},{"rotation_deg":90,"low":1.718}]},"electrical":"insulating"}""");
        var w = new StringWriter();
        WorkbookCsv.Write(w, [(one, ReportFixtures.Identify(one))]);
        string[] cells = w.ToString().Split(Environment.NewLine)[1].Split(',');
        Assert.Equal(GemIndex.Cli.TextUi.Results.ResultText.Character(GemIndex.Core.Optics.Indicatrix.OpticCharacter.Isotropic),
            cells[WorkbookCsv.Columns.ToList().IndexOf("optic_character")]);
        Assert.Equal("singly refractive (isotropic)", cells[WorkbookCsv.Columns.ToList().IndexOf("optic_character")]);
        string markdown = MarkdownReport.Write(StoneReport.Build(one, ReportFixtures.Identify(one)));
        Assert.Contains("Electrical conductivity:** insulating", markdown);
        Assert.Equal("insulating", GemIndex.Cli.TextUi.Bench.BenchChoice.For(GemIndex.Core.Bench.BenchField.Electrical).Show("insulating"));
    }

    private static readonly Gen<string> Cell =
        Gen.Elements("a", "b", ",", "\"", "\r", "\n", "\r\n", " ", "=", "+", "-", "@", "\t", "'", ";", "é", "1.544")
            .ListOf().Select(parts => string.Concat(parts));

    /// <summary>Any cells, with commas, quotes and line breaks anywhere, read back by the library as written (after neutralising).</summary>
    [Property(MaxTest = 300)]
    public Property Cells_with_quoted_commas_and_line_breaks_round_trip() =>
        Prop.ForAll(Cell.ArrayOf(3).ListOf().Select(rows => rows.Select(r => (IReadOnlyList<string>)r).ToList()).ToArbitrary(), rows =>
        {
            var w = new StringWriter();
            WorkbookCsv.Table(w, ["reference", "colour", "notes"], rows);
            using SepReader reader = Sep.New(',').Reader(o => o with { Unescape = true, HasHeader = true }).FromText(w.ToString());
            var back = new List<string[]>();
            foreach (SepReader.Row row in reader) back.Add([row["reference"].ToString(), row["colour"].ToString(), row["notes"].ToString()]);
            return back.Count == rows.Count
                && back.Zip(rows).All(p => p.First.SequenceEqual(p.Second.Select(WorkbookCsv.Neutralised)));
        });
}
