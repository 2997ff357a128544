using GemIndex.Cli.TextUi.Main;
using GemIndex.Cli.TextUi.Results;
using GemIndex.Core.Identification;

namespace GemIndex.Tests.TextUi.Results;

public class ResultTextTests
{
    [Theory]
    [InlineData(0.0, "........")]
    [InlineData(0.5, "####....")]
    [InlineData(1.0, "########")]
    [InlineData(0.0625, "#.......")]   // 0.5 cell rounds up
    public void The_confidence_bar_fills_in_proportion(double p, string bar) => Assert.Equal(bar, ResultText.Bar(p));

    [Fact]
    public void A_candidate_line_fits_the_identification_panel_at_80_columns()
    {
        var c = new RankedCandidate { Material = TestMaterials.All[0] with { Name = "a very long material name indeed" }, Confidence = 0.873, Fit = 0.62 };
        string line = ResultText.Candidate(1, c, ResultsModel.NameWidth);
        Assert.Equal("1 a very long …  87% #######. 0.62", line);
        Assert.True(line.Length <= 80 - MainWindow.FormWidth - 2, line);
        Assert.Contains("87%", line);
    }

    [Fact]
    public void An_older_assessment_does_not_replace_a_newer_one()
    {
        var model = new ResultsModel();
        var assessor = new GemIndex.Cli.TextUi.Bench.BenchAssessor(null);
        var form = new GemIndex.Cli.TextUi.Bench.BenchModel();
        var old = assessor.Assess(form.Snapshot());
        form.SetText(GemIndex.Cli.TextUi.Bench.BenchFields.Sg, "2.65");
        var newer = assessor.Assess(form.Snapshot());
        Assert.True(model.Accept(newer));
        Assert.False(model.Accept(old));
        Assert.Same(newer, model.Latest);
    }

    [Fact]
    public void Long_lines_wrap_at_word_boundaries_with_an_indent()
    {
        string[] rows = [.. TextWrap.Lines(["  * one two three four five six"], 14)];
        Assert.Equal(["  * one two", "    three four", "    five six"], rows);
        Assert.All(rows, r => Assert.True(r.Length <= 14));
    }
}
