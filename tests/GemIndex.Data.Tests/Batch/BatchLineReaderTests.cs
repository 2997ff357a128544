using GemIndex.Data.Batch;

namespace GemIndex.Data.Tests.Batch;

public class BatchLineReaderTests
{
    private static List<(string? Line, bool TooLong)> All(string text)
    {
        var reader = new BatchLineReader(new StringReader(text));
        var lines = new List<(string?, bool)>();
        for (string? line; (line = reader.Next(out bool tooLong)) is not null || tooLong;) lines.Add((line, tooLong));
        return lines;
    }

    [Fact]
    public void Lines_are_read_with_or_without_carriage_returns_and_a_last_line_without_a_break()
    {
        Assert.Equal([("a", false), ("b", false), ("", false), ("c", false)], All("a\r\nb\n\nc"));
    }

    [Fact]
    public void A_byte_order_mark_at_the_start_is_passed_over()
    {
        Assert.Equal([("{}", false)], All("\uFEFF{}\n"));
    }

    [Fact]
    public void A_line_over_the_cap_is_reported_as_too_long_and_the_next_line_is_read()
    {
        string huge = new('x', BatchLineReader.MostCharacters + 1);
        Assert.Equal([("a", false), (null, true), ("b", false)], All("a\n" + huge + "\nb\n"));
    }

    [Fact]
    public void A_line_exactly_at_the_cap_is_read()
    {
        string full = new('x', BatchLineReader.MostCharacters);
        Assert.Equal(BatchLineReader.MostCharacters, All(full + "\n")[0].Line!.Length);
    }
}
