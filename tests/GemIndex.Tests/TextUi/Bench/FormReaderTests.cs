using GemIndex.Cli.TextUi.Bench;
using GemIndex.Core.Bench;

namespace GemIndex.Tests.TextUi.Bench;

public class FormReaderTests
{
    [Theory]
    [InlineData("opaque", "opaque")]
    [InlineData("Opaque, waxy lustre", "opaque")]
    [InlineData("  translucent at the edges", "translucent")]
    [InlineData("transparent", "transparent")]
    [InlineData("semi-translucent", null)]
    [InlineData("cloudy", null)]
    [InlineData("", null)]
    public void The_stones_transparency_description_gives_a_reading_only_when_it_starts_with_one_of_the_three_words(string description, string? reading)
    {
        Assert.Equal(reading, FormReader.TransparencyWord(description));
        var form = new BenchModel();
        form.SetText(BenchFields.Transparency, description);
        form.SetText(BenchFields.Sg, "2.70");
        Assert.Equal(reading, FormReader.Read(form.Snapshot()).Text(BenchField.Transparency));
    }
}
