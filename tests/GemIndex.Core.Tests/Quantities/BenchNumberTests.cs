using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Quantities;

public class BenchNumberTests
{
    [Theory]
    [InlineData("1.544", 1.544)]
    [InlineData(" 2.65 ", 2.65)]
    [InlineData("-0.5", -0.5)]
    [InlineData("1e3", 1000)]
    [InlineData("5.12E-1", 0.512)]
    public void A_number_with_a_dot_is_read(string text, double expected)
    {
        Assert.True(BenchNumber.TryParse(text, out double value, out string error));
        Assert.Equal(expected, value);
        Assert.Equal("", error);
    }

    [Theory]
    [InlineData("1,544", "'1,544' has a comma: use a dot as the decimal mark (1.544)")]
    [InlineData("1,544.5", "'1,544.5' has a comma: use a dot as the decimal mark (1.544)")]
    [InlineData("", "empty: type a number")]
    [InlineData("   ", "empty: type a number")]
    [InlineData(null, "empty: type a number")]
    [InlineData("abc", "'abc' is not a number")]
    [InlineData("1.5.4", "'1.5.4' is not a number")]
    [InlineData("NaN", "'NaN' is not a finite number")]
    [InlineData("Infinity", "'Infinity' is not a finite number")]
    [InlineData("1e999", "'1e999' is not a finite number")]
    public void Anything_else_is_refused_with_its_reason(string? text, string expected)
    {
        Assert.False(BenchNumber.TryParse(text, out double value, out string error));
        Assert.Equal(expected, error);
        Assert.Equal(0, value);
    }
}
