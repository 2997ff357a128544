using System.Text.Json;

namespace GemIndex.Tests.CommandLine;

public class IdentifyMagnificationTests
{
    [Fact]
    public void Features_seen_and_not_seen_reach_the_reasons()
    {
        // Corundum ω 1.768, ε 1.760, SG 4.00 (handbook values, from memory) with the curved striae of flame fusion.
        using var run = new CommandRun();
        var (exit, stdout, error) = CommandRun.Plain("identify", "--edge", "0:1.760/1.768", "--sg", "4.00", "--feature", "curved_striae",
            "--feature", "round_bubbles", "--no-feature", "needles_silk", "--json", "--catalogue-dir", run.Folder);
        Assert.True(exit == 0, error);
        using var doc = JsonDocument.Parse(stdout);
        Assert.Contains("curved striae seen", stdout);
        var corundum = doc.RootElement.GetProperty("species").EnumerateArray().First(s => s.GetProperty("species").GetString() == "corundum");
        Assert.True(corundum.GetProperty("origins").GetProperty("synthetic").GetDouble() > 0.5, corundum.ToString());
    }

    [Fact]
    public void The_text_answer_lists_the_features_with_their_meaning()
    {
        using var run = new CommandRun();
        var (exit, stdout, error) = CommandRun.Plain("identify", "--sg", "4.00", "--feature", "curved_striae", "--no-feature", "needles_silk", "--catalogue-dir", run.Folder);
        Assert.True(exit == 0, error);
        var striae = GemIndex.Core.Magnification.MagnificationVocabulary.Of(GemIndex.Core.Magnification.MagnificationFeature.CurvedStriae);
        Assert.Contains($"Seen under magnification: {striae.Name}: {striae.Meaning}", stdout);
        Assert.Contains("Looked for, not seen: needles and silk:", stdout);
    }

    [Fact]
    public void An_unknown_feature_exits_3_naming_the_option_and_the_allowed_words()
    {
        using var run = new CommandRun();
        var (exit, _, error) = CommandRun.Plain("identify", "--sg", "4.00", "--no-feature", "sparkles", "--catalogue-dir", run.Folder);
        Assert.Equal(3, exit);
        Assert.Contains("--no-feature: 'sparkles' is not a magnification feature; allowed: curved_striae", error);
    }

    [Fact]
    public void A_feature_both_seen_and_not_seen_exits_3()
    {
        using var run = new CommandRun();
        var (exit, _, error) = CommandRun.Plain("identify", "--sg", "4.00", "--feature", "flux_residue", "--no-feature", "flux_residue", "--catalogue-dir", run.Folder);
        Assert.Equal(3, exit);
        Assert.Contains("--no-feature:", error);
    }
}
