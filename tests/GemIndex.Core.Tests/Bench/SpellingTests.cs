using GemIndex.Core.Bench;

namespace GemIndex.Core.Tests.Bench;

public class SpellingTests
{
    [Theory]
    [InlineData("color", "colour")]
    [InlineData("lines", "absorption_nm")]   // the command line's --lines
    [InlineData("edge", "refractometer")]    // the command line's --edge
    public void A_field_the_batch_format_does_not_know_is_matched_to_the_one_it_was_meant_to_be(string written, string meant)
    {
        IReadOnlyList<string> known = ["id", "colour", "absorption_nm", "refractometer", "sg", "magnification"];
        Assert.Equal([meant], Spelling.Near(written, known));
    }

    [Fact]
    public void A_command_line_word_is_offered_only_where_its_field_is_known()
    {
        Assert.Empty(Spelling.Near("lines", ["id", "colour"]));
    }
}
