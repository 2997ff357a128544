using System.CommandLine;
using GemIndex.Data.Catalogue;

namespace GemIndex.Cli.CommandLine;

/// <summary>
/// Runs a catalogue action and turns domain errors into one clear line each on stderr and an exit code, never
/// a stack trace: unreadable source text exits <see cref="ExitCodes.BadInput"/>, an unusable file <see cref="ExitCodes.BadFile"/>.
/// </summary>
internal static class CatalogueFailure
{
    public static int Guard(ParseResult parseResult, Func<TextWriter, TextWriter, int> action)
    {
        TextWriter output = parseResult.InvocationConfiguration.Output, error = parseResult.InvocationConfiguration.Error;
        try
        {
            return action(output, error);
        }
        catch (CatalogueFormatException e)
        {
            foreach (string line in e.Errors) error.WriteLine($"gemindex: {line}");
            return ExitCodes.BadInput;
        }
        catch (Exception e) when (e is CatalogueStoreException or CatalogueSchemaVersionException or IOException or UnauthorizedAccessException)
        {
            error.WriteLine($"gemindex: {e.Message}");
            return ExitCodes.BadFile;
        }
    }
}
