using GemIndex.Cli.TextUi.Bench;
using GemIndex.Core.Bench;

namespace GemIndex.Tests.TextUi.Bench;

public class FormReaderTests
{
    [Theory]
    [InlineData("opaque", "opaque")]
    [InlineData("Opaque, waxy lustre", "opaque")]
    [InlineData("Opaque.", "opaque")]
    [InlineData("opaque/waxy", "opaque")]
    [InlineData("  translucent at the edges", "translucent")]
    [InlineData("transparent", "transparent")]
    [InlineData("semi-translucent", null)]
    [InlineData("cloudy", null)]
    [InlineData("", null)]
    public void The_stones_transparency_description_gives_a_reading_only_when_it_starts_with_one_of_the_three_words(string description, string? reading)
    {
        Assert.Equal(reading, GemIndex.Data.Workbook.StoneSheet.TransparencyWord(description));
        var form = new BenchModel();
        form.SetText(BenchFields.Transparency, description);
        form.SetText(BenchFields.Sg, "2.70");
        Assert.Equal(reading, FormReader.Read(form.Snapshot()).Text(BenchField.Transparency));
    }
}

public class BenchFieldsPageTests
{
    [Theory]
    [InlineData(GemIndex.Cli.TextUi.Bench.BenchFields.WaterCt, "F4 SG")]
    [InlineData("refractometer.readings[3]", "F3 RI")]
    [InlineData(GemIndex.Cli.TextUi.Bench.BenchFields.LiquidLimit, "F3 RI")]
    [InlineData(GemIndex.Cli.TextUi.Bench.BenchFields.Absorption, "F5 Tests")]
    [InlineData(GemIndex.Cli.TextUi.Bench.BenchFields.Weight, "F2 Stone")]
    [InlineData(GemIndex.Cli.TextUi.Bench.BenchFields.FeaturesAbsent, "^L Loupe")]
    public void A_refused_entry_is_sent_to_the_page_that_holds_it(string field, string page)
    {
        Assert.Equal(page, GemIndex.Cli.TextUi.Bench.BenchFields.PageOf(field));
        Assert.EndsWith($"on {page}.", GemIndex.Cli.TextUi.Results.ResultsModel.RefusedLine([field]));
        Assert.Equal("! 2 entries refused and not used: see the entries marked '!' on F3 RI, F4 SG.",
            GemIndex.Cli.TextUi.Results.ResultsModel.RefusedLine([GemIndex.Cli.TextUi.Bench.BenchFields.Sg, "refractometer.readings[0]"]));
    }
}
