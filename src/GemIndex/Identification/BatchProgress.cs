using System.Diagnostics;
using System.Globalization;

namespace GemIndex.Cli.Identification;

/// <summary>
/// Progress of a batch on standard error: stones done, rate and time left, rewritten in place at most
/// <see cref="MostUpdatesPerSecond"/> times a second. Made only for a terminal (see <see cref="For"/>): nothing is
/// written when standard error is piped or TERM is dumb. No colour is used, so NO_COLOR is honoured by construction.
/// </summary>
internal sealed class BatchProgress(TextWriter error, long? totalCharacters, Func<TimeSpan> elapsed)
{
    public const int MostUpdatesPerSecond = 10;

    private TimeSpan? _last;

    /// <summary>A progress line for a terminal, or null when standard error is not one (or TERM=dumb).</summary>
    public static BatchProgress? For(TextWriter error, long? totalCharacters, bool errorIsTerminal, string? term, Func<TimeSpan>? elapsed = null)
    {
        if (!errorIsTerminal || string.Equals(term, "dumb", StringComparison.Ordinal)) return null;
        var clock = Stopwatch.StartNew();
        return new BatchProgress(error, totalCharacters, elapsed ?? (() => clock.Elapsed));
    }

    public void Report(int stones, long consumed)
    {
        TimeSpan now = elapsed();
        if (_last is { } last && now - last < TimeSpan.FromSeconds(1.0 / MostUpdatesPerSecond)) return;
        _last = now;
        double seconds = Math.Max(now.TotalSeconds, 1e-3);
        string rate = (stones / seconds).ToString("0", CultureInfo.InvariantCulture);
        string left = totalCharacters is { } total && consumed > 0 && consumed < total
            ? $", about {Duration(seconds * (total - consumed) / consumed)} left" : "";
        error.Write($"\r{stones.ToString("N0", CultureInfo.InvariantCulture)} stones, {rate}/s{left}   ");
        error.Flush();
    }

    public void Finish(int stones)
    {
        error.Write($"\r{stones.ToString("N0", CultureInfo.InvariantCulture)} stones in {Duration(elapsed().TotalSeconds)}          \n");
        error.Flush();
    }

    private static string Duration(double seconds) => seconds < 60
        ? seconds.ToString("0", CultureInfo.InvariantCulture) + " s"
        : TimeSpan.FromSeconds(seconds).ToString(@"h\:mm\:ss", CultureInfo.InvariantCulture);
}
