using System.Text.Json;
using GemIndex.Cli.Reports;
using GemIndex.Core.Magnification;

namespace GemIndex.Tests.Reports;

public class MagnificationReportTests
{
    // An invented glass: round bubbles seen, crystals looked for and not seen.
    private const string GlassLine =
        """{"id":"bead 3","refractometer":{"method":"spot","spot":1.52},"polariscope":"singly_refractive","magnification":{"present":["round_bubbles"],"absent":["crystals"]}}""";

    public static TheoryData<string> Formats => new() { "markdown", "html", "json" };

    [Theory]
    [MemberData(nameof(Formats))]
    public void Every_format_lists_the_features_seen_and_not_seen_with_their_meaning(string format)
    {
        var report = ReportFixtures.Report(GlassLine);
        string text = format switch { "html" => HtmlReport.Write(report), "json" => JsonReport.Write(report), _ => MarkdownReport.Write(report) };
        foreach (var feature in new[] { MagnificationFeature.RoundGasBubbles, MagnificationFeature.CrystalInclusions })
        {
            var info = MagnificationVocabulary.Of(feature);
            Assert.Contains(format == "html" ? HtmlReport.E(info.Name) : info.Name, text);
            Assert.Contains(format == "html" ? HtmlReport.E(info.Meaning) : format == "json" ? JsonEncodedText.Encode(info.Meaning).ToString() : info.Meaning, text);
        }
        Assert.Contains(format == "json" ? "feature_not_seen_crystals" : "Looked for, not seen: crystal inclusions", text);
    }

    [Fact]
    public void The_json_report_carries_the_words_in_its_readings()
    {
        using var doc = JsonDocument.Parse(JsonReport.Write(ReportFixtures.Report(GlassLine)));
        var magnification = doc.RootElement.GetProperty("readings").GetProperty("magnification");
        Assert.Equal("round_bubbles", magnification.GetProperty("present")[0].GetProperty("feature").GetString());
        Assert.Equal("crystals", magnification.GetProperty("absent")[0].GetProperty("feature").GetString());
    }
}
