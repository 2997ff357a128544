using GemIndex.Core.Bench;
using GemIndex.Core.Observations;

namespace GemIndex.Core.Tests.Bench;

public class BenchVocabularyTests
{
    [Fact]
    public void Every_bench_test_has_one_wire_word_and_one_display_phrase_and_the_wire_word_reads_back()
    {
        foreach (BenchTest test in Enum.GetValues<BenchTest>())
        {
            Assert.Equal(test, BenchTestWords.FromWire(BenchTestWords.Wire(test)));
            Assert.NotEmpty(BenchTestWords.Display(test));
        }
        Assert.Equal(Enum.GetValues<BenchTest>().Length, Enum.GetValues<BenchTest>().Select(BenchTestWords.Wire).Distinct().Count());
        Assert.Equal("hand spectroscope (absorption lines)", BenchTestWords.DisplayOfWire("absorption_nm"));
        Assert.Equal("sg", BenchTestWords.Wire(BenchTest.SpecificGravity));
        Assert.Null(BenchTestWords.FromWire("hardness"));
    }

    [Fact]
    public void Answer_words_are_snake_case_and_read_back_with_spaces_hyphens_or_any_case()
    {
        Assert.Equal("very_strong", BenchWords.Word(DispersionStrength.VeryStrong));
        Assert.Equal(PolariscopeReaction.SinglyRefractive, BenchWords.Parse<PolariscopeReaction>("Singly-Refractive"));
        Assert.Equal(PolariscopeReaction.SinglyRefractive, BenchWords.Parse<PolariscopeReaction>("singly refractive"));
        Assert.Null(BenchWords.Parse<PolariscopeReaction>(""));
        Assert.Null(BenchWords.Parse<PolariscopeReaction>("sparkly"));
        Assert.Equal("inert | weak | moderate | strong", BenchWords.Choices<FluorescenceStrength>());
    }

    [Fact]
    public void The_value_syntaxes_split_and_join_back()
    {
        Assert.Equal(new EdgeStepText("45", "1.544", "1.549"), BenchSyntax.Step("45:1.544/1.549"));
        Assert.Equal(new EdgeStepText("0", "1.718", ""), BenchSyntax.Step("0:1.718"));
        Assert.Null(BenchSyntax.Step("1.544/1.553"));
        Assert.Null(BenchSyntax.Step("0:1.5/1.6/1.7"));
        Assert.Equal(("1.544", "1.553"), BenchSyntax.EdgePair("1.544 1.553"));
        Assert.Equal(("1.544", "1.553"), BenchSyntax.EdgePair(" 1.544 / 1.553 "));
        Assert.Null(BenchSyntax.EdgePair("1.544"));
        Assert.Null(BenchSyntax.EdgePair("1.544 1.549 1.553"));
        Assert.Equal("45:1.544/1.549", BenchSyntax.Step(new EdgeStepText("45", "1.544", "1.549")));
        Assert.Equal(["3.32 floats", "2.89 sinks"], BenchSyntax.HeavyLiquidEntries("3.32 floats; 2.89 sinks;"));
        Assert.Equal(("3.32", "floats"), BenchSyntax.HeavyLiquid("3.32  floats"));
        Assert.Equal(["694", "668", "659"], BenchSyntax.Lines("694, 668;659"));
        Assert.Empty(BenchSyntax.Lines("None"));
        Assert.Equal("none", BenchSyntax.Lines(Array.Empty<string>()));
    }
}
