using GemIndex.Cli.Identification;

namespace GemIndex.Tests.Identification;

public class BatchProgressTests
{
    [Fact]
    public void Progress_is_shown_only_on_a_terminal_that_is_not_dumb()
    {
        var error = new StringWriter();
        Assert.Null(BatchProgress.For(error, 100, errorIsTerminal: false, term: "xterm"));
        Assert.Null(BatchProgress.For(error, 100, errorIsTerminal: true, term: "dumb"));
        Assert.NotNull(BatchProgress.For(error, 100, errorIsTerminal: true, term: null));
    }

    [Fact]
    public void The_progress_line_gives_the_count_and_is_rewritten_in_place()
    {
        var error = new StringWriter();
        var now = TimeSpan.FromSeconds(1);
        var progress = BatchProgress.For(error, 1000, errorIsTerminal: true, term: "xterm", () => now)!;
        progress.Report(5, 100);
        now += TimeSpan.FromMilliseconds(50);
        progress.Report(6, 120);   // within a tenth of a second of the first: not written
        now += TimeSpan.FromMilliseconds(100);
        progress.Report(7, 140);
        progress.Finish(7);
        string text = error.ToString();
        Assert.StartsWith("\r5 stones, ", text);
        Assert.DoesNotContain("\r6 stones, ", text);
        Assert.Contains("\r7 stones, 6/s, about 7 s left", text);   // 7 stones in 1.15 s = 6/s; 860 characters left at 140 per 1.15 s = 7 s
        Assert.Contains("\r7 stones in 1 s", text);
        Assert.DoesNotContain("\u001b", text);   // no colour, no escape sequence (NO_COLOR holds by construction)
    }
}
