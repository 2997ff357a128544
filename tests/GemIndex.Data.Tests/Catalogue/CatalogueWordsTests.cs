using GemIndex.Core.Catalogue;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Data.Catalogue;

namespace GemIndex.Data.Tests.Catalogue;

public class CatalogueWordsTests
{
    [Fact]
    public void Words_are_lower_case_with_underscores_and_read_back()
    {
        Assert.Equal("very_common", CatalogueWords.Of(BenchFrequency.VeryCommon));
        Assert.True(CatalogueWords.TryParse("very_common", out BenchFrequency f));
        Assert.Equal(BenchFrequency.VeryCommon, f);
    }

    [Theory]
    [InlineData("1")]
    [InlineData("Uniaxial")]
    [InlineData("VeryCommon")]
    [InlineData("")]
    public void Numbers_capitals_and_other_spellings_are_not_words(string word)
    {
        Assert.False(CatalogueWords.TryParse(word, out OpticCharacter _));
    }
}
