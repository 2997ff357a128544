using System.Diagnostics;
using System.Globalization;

namespace GemIndex.Cli.Identification;

/// <summary>
/// Progress of a long run on standard error (a batch's stones, a catalogue build's entries): the count done, rate and
/// time left, rewritten in place at most <see cref="MostUpdatesPerSecond"/> times a second. Made only for a terminal (see
/// <see cref="For"/>): nothing is written when standard error is piped or TERM is dumb. No colour is used, so NO_COLOR
/// is honoured by construction. The total is in whatever unit the caller reports as consumed (a batch file's
/// characters, a build's entries).
/// </summary>
internal sealed class BatchProgress(TextWriter error, long? total, Func<TimeSpan> elapsed, string unit = "stones")
{
    public const int MostUpdatesPerSecond = 10;

    private TimeSpan? _last;
    private int _width; // the longest line written, so the next one covers it without an escape sequence

    /// <summary>A progress line for a terminal, or null when standard error is not one (or TERM=dumb).</summary>
    public static BatchProgress? For(TextWriter error, long? total, bool errorIsTerminal, string? term, Func<TimeSpan>? elapsed = null, string unit = "stones")
    {
        if (!errorIsTerminal || string.Equals(term, "dumb", StringComparison.Ordinal)) return null;
        var clock = Stopwatch.StartNew();
        return new BatchProgress(error, total, elapsed ?? (() => clock.Elapsed), unit);
    }

    /// <summary>For a command writing to <paramref name="error"/>: shown when that is the console's own standard error on a terminal.</summary>
    public static BatchProgress? ForConsole(TextWriter error, long? total, string unit) =>
        For(error, total, !Console.IsErrorRedirected && ReferenceEquals(error, Console.Error), Environment.GetEnvironmentVariable("TERM"), unit: unit);

    public void Report(int stones, long consumed)
    {
        TimeSpan now = elapsed();
        if (_last is { } last && now - last < TimeSpan.FromSeconds(1.0 / MostUpdatesPerSecond)) return;
        _last = now;
        double seconds = Math.Max(now.TotalSeconds, 1e-3);
        string rate = (stones / seconds).ToString("0", CultureInfo.InvariantCulture);
        string left = total is { } all && consumed > 0 && consumed < all
            ? $", about {Duration(seconds * (all - consumed) / consumed)} left" : "";
        Rewrite($"{stones.ToString("N0", CultureInfo.InvariantCulture)} {unit}, {rate}/s{left}");
    }

    public void Finish(int stones)
    {
        Rewrite($"{stones.ToString("N0", CultureInfo.InvariantCulture)} {unit} in {Duration(elapsed().TotalSeconds)}");
        error.Write('\n');
        error.Flush();
    }

    private void Rewrite(string line)
    {
        error.Write('\r' + line.PadRight(_width));
        _width = Math.Max(_width, line.Length);
        error.Flush();
    }

    private static string Duration(double seconds) => seconds < 60
        ? seconds.ToString("0", CultureInfo.InvariantCulture) + " s"
        : TimeSpan.FromSeconds(seconds).ToString(@"h\:mm\:ss", CultureInfo.InvariantCulture);
}
