using GemIndex.Core.Bench;
using GemIndex.Core.Identification;
using GemIndex.Data.Batch;

namespace GemIndex.Cli.Identification;

/// <summary>
/// The batch interface: JSON Lines in, one JSON line out per stone, in input order, stones ranked on every core.
/// Every non-blank line is answered: a line that cannot be read, is over the size cap, or fails inside the ranking
/// gives its error document ({"line": N, "error": …, "errors": […]}) and the rest go on. Blank lines are passed over.
/// </summary>
internal static class BatchIdentification
{
    /// <summary>Lines read and ranked together; output is written after each chunk, in order.</summary>
    private const int ChunkLines = 512;

    /// <summary>What a batch run met: lines answered with an error, lines holding fields the format does not know (the first named).</summary>
    public sealed record Summary(int Failed, int LinesWithUnread, string? FirstUnread);

    /// <summary>Runs a batch; returns the number of lines answered with an error and of lines with fields not read.</summary>
    public static Summary Run(TextReader input, TextWriter output, Identifier identifier, BenchRequest request, BatchProgress? progress = null)
    {
        // The stones are ranked on every core already: one stone's series on one thread (measured: the inner threads
        // only added CPU time, docs/ranking.md §6).
        identifier = identifier.WithSeriesOnEveryCore(false);
        var reader = new BatchLineReader(input);
        int lineNumber = 0, failed = 0, done = 0, unread = 0;
        string? firstUnread = null;
        var chunk = new List<(int Number, string? Line)>(ChunkLines);
        bool end = false;
        while (!end)
        {
            chunk.Clear();
            while (chunk.Count < ChunkLines)
            {
                string? line = reader.Next(out bool tooLong);
                if (line is null && !tooLong) { end = true; break; }
                lineNumber++;
                if (line is not null && string.IsNullOrWhiteSpace(line)) continue;
                chunk.Add((lineNumber, line));
            }
            var answers = new string[chunk.Count];
            var failedHere = new bool[chunk.Count];
            var unreadHere = new string?[chunk.Count];
            Parallel.For(0, chunk.Count, new ParallelOptions { MaxDegreeOfParallelism = Environment.ProcessorCount }, i =>
                (answers[i], failedHere[i], unreadHere[i]) = Answer(chunk[i].Number, chunk[i].Line, identifier, request));
            foreach (string answer in answers) { output.Write(answer); output.Write('\n'); }
            failed += failedHere.Count(f => f);
            for (int i = 0; i < chunk.Count; i++)
                if (unreadHere[i] is { } path) { unread++; firstUnread ??= $"line {chunk[i].Number}: \"{path}\""; }
            done += chunk.Count;
            progress?.Report(done, reader.Consumed);
        }
        output.Flush();
        progress?.Finish(done);
        return new Summary(failed, unread, firstUnread);
    }

    /// <summary>The answer with a warning first for each field the line holds that the format does not know (it was not read).</summary>
    public static IdentificationResult WithUnread(IdentificationResult result, BatchLine read) =>
        read.Unread.Count == 0 ? result : result with { Warnings = [.. read.Unread.Select(u => u.Message), .. result.Warnings] };

    /// <summary>One line's answer: its result document, or its error document; and the first field it holds that was not read.</summary>
    public static (string Answer, bool Failed, string? Unread) Answer(int lineNumber, string? line, Identifier identifier, BenchRequest request)
    {
        if (line is null)
            return (ResultDocument.Error(lineNumber, null, [new BenchFieldError("$", "", $"at most {BatchLineReader.MostCharacters:N0} characters",
                $"the line is longer than {BatchLineReader.MostCharacters:N0} characters (1 MiB) and was not read.")]), true, null);
        BatchLine read = StoneReadingsJson.Read(line);
        string? id = read.Readings.Text(BenchField.Id);
        string? unread = read.Unread.Count > 0 ? read.Unread[0].Path : null;
        try
        {
            if (read.Errors.Count > 0) return (ResultDocument.Error(lineNumber, id, read.AllErrors()), true, unread);
            // A batch line's id is how its answer is found again: a blank one is refused (a workbook stone's may be blank).
            if (string.IsNullOrWhiteSpace(id))
                return (ResultDocument.Error(lineNumber, id, [new BenchFieldError(BenchField.Id, id ?? "", "a string with the stone's reference", "must name the stone (it is blank).")]), true, unread);
            BenchOutcome outcome = BenchIdentification.Identify(identifier, read.Readings, request);
            return outcome.Result is { } result
                ? (ResultDocument.Line(WithUnread(result, read), request.ExplainTop > 0), false, unread)
                : (ResultDocument.Error(lineNumber, id, outcome.Reading.Errors), true, unread);
        }
        catch (Exception e) when (e is not OutOfMemoryException)
        {
            // Any failure inside one stone is that line's answer; the batch goes on.
            return (ResultDocument.Error(lineNumber, id, [new BenchFieldError("$", "", "", $"this stone could not be ranked: {e.Message}")]), true, unread);
        }
    }
}
