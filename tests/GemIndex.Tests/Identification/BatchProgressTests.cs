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

    [Fact]
    public void A_catalogue_build_counts_entries_against_their_total()
    {
        var error = new StringWriter();
        var now = TimeSpan.FromSeconds(2);
        var progress = BatchProgress.For(error, 400, errorIsTerminal: true, term: "xterm", () => now, unit: "entries")!;
        progress.Report(100, 100);
        progress.Finish(400);
        string text = error.ToString();
        Assert.StartsWith("\r100 entries, 50/s, about 6 s left", text);   // 100 in 2 s; 300 left at 50/s
        Assert.Contains("\r400 entries in 2 s", text);
    }

    [Fact]
    public void A_build_writing_to_a_pipe_prints_no_progress()
    {
        // The command's error writer is not the console's own standard error: no progress, only findings would show.
        using var run = new GemIndex.Tests.CommandLine.CommandRun();
        string output = Path.Combine(run.Folder, "built.db");
        var (code, _, err) = GemIndex.Tests.CommandLine.CommandRun.Plain("catalogue", "build", "--output", output);
        Assert.Equal(0, code);
        Assert.Equal("", err);
    }
}
