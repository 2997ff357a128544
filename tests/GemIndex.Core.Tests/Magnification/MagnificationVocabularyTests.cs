using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using GemIndex.Core.Magnification;

namespace GemIndex.Core.Tests.Magnification;

public class MagnificationVocabularyTests
{
    [Fact]
    public void Every_feature_has_one_entry_with_a_word_a_description_a_lighting_and_a_source()
    {
        var features = Enum.GetValues<MagnificationFeature>();
        Assert.Equal(features.Length, MagnificationVocabulary.All.Count);
        Assert.Equal(features.Length, MagnificationVocabulary.Words.Distinct().Count());
        Assert.All(MagnificationVocabulary.All, info =>
        {
            Assert.Matches("^[a-z_]+$", info.Word);
            Assert.False(string.IsNullOrWhiteSpace(info.LookFor));
            Assert.False(string.IsNullOrWhiteSpace(info.Lighting));
            Assert.False(string.IsNullOrWhiteSpace(info.Meaning));
            Assert.InRange(info.Visibility, 0.05, 0.99);
        });
    }

    [Fact]
    public void Every_meaning_cites_a_named_published_work_or_says_common_practice()
    {
        var cited = typeof(MagnificationSources).GetFields().Select(f => (string)f.GetValue(null)!).ToHashSet();
        Assert.All(MagnificationVocabulary.All, info => Assert.Contains(info.Source, cited));
        Assert.Contains(MagnificationVocabulary.All, info => info.Source != MagnificationSources.CommonPractice);
    }

    [Fact]
    public void Groups_come_in_the_order_a_bench_user_looks_growth_inclusions_treatment_composite()
    {
        var groups = MagnificationVocabulary.All.Select(i => i.Group).ToList();
        Assert.Equal(groups.OrderBy(g => g), groups);
    }

    [Property]
    public Property A_features_word_finds_the_feature_in_any_case_with_spaces_or_hyphens() =>
        Prop.ForAll(Gen.Elements(Enum.GetValues<MagnificationFeature>()).ToArbitrary(), feature =>
        {
            string word = MagnificationVocabulary.Of(feature).Word;
            return MagnificationVocabulary.Find(word) == feature
                && MagnificationVocabulary.Find(word.ToUpperInvariant().Replace('_', ' ')) == feature
                && MagnificationVocabulary.Find(word.Replace('_', '-')) == feature;
        });

    [Fact]
    public void An_unknown_word_finds_nothing() => Assert.Null(MagnificationVocabulary.Find("sparkles"));

    [Fact]
    public void A_feature_cannot_be_both_seen_and_not_seen()
    {
        var e = Assert.Throws<ArgumentException>(() => new MagnificationObservation(
            [MagnificationFeature.CurvedStriae], [MagnificationFeature.CurvedStriae, MagnificationFeature.FluxResidue]));
        Assert.Contains("'curved_striae' is given both as seen and as looked for but not seen", e.Message);
    }
}
