using GemIndex.Core.Identification;
using GemIndex.Data.Batch;

namespace GemIndex.Cli.Identification;

/// <summary>
/// The batch interface: JSON Lines in, one JSON line out per stone, in order; a line that cannot be read gives
/// {"line": N, "error": "…"} and the rest go on. Blank lines are passed over.
/// </summary>
internal static class BatchIdentification
{
    /// <summary>Runs a batch; returns the number of lines that failed.</summary>
    public static int Run(TextReader input, TextWriter output, Identifier identifier, bool explain)
    {
        int lineNumber = 0, failed = 0;
        for (string? line; (line = input.ReadLine()) is not null;)
        {
            lineNumber++;
            if (string.IsNullOrWhiteSpace(line)) continue;
            string result;
            try
            {
                var sheet = StoneReadingsConverter.ToBenchSheet(StoneReadingsJson.Parse(line));
                result = BatchResultJson.Result(identifier.Identify(sheet, explainTop: explain ? 3 : 0), explain);
            }
            catch (BatchInputException e)
            {
                failed++;
                result = BatchResultJson.Error(lineNumber, e.Message);
            }
            output.Write(result);
            output.Write('\n');
        }
        output.Flush();
        return failed;
    }
}
