using System.CommandLine;
using GemIndex.Core.Quantities;

namespace GemIndex.Cli.CommandLine.Calc;

/// <summary>
/// Turns the domain errors of a <c>calc</c> action (a value out of range, a fit that cannot run or does not
/// converge) into one line on stderr naming the option, and exit <see cref="ExitCodes.BadInput"/>; never a stack trace.
/// </summary>
internal static class CalcFailure
{
    public static int Guard(ParseResult parseResult, Func<TextWriter, int> action)
    {
        TextWriter output = parseResult.InvocationConfiguration.Output, error = parseResult.InvocationConfiguration.Error;
        try
        {
            return action(output);
        }
        catch (CalcInputException e)
        {
            error.WriteLine($"gemindex calc: {e.Message}");
            return ExitCodes.BadInput;
        }
        catch (Exception e) when (e is ArgumentException or InvalidOperationException)
        {
            // A Core call not wrapped in Named: still one line, without an option name.
            error.WriteLine($"gemindex calc: {e.Message}");
            return ExitCodes.BadInput;
        }
    }

    /// <summary>Runs a Core call whose inputs came from <paramref name="options"/>, naming them in any domain error.</summary>
    public static T Named<T>(string options, Func<T> call)
    {
        try
        {
            return call();
        }
        catch (Exception e) when (e is ArgumentException or InvalidOperationException)
        {
            // QuantityOutOfRangeException is an ArgumentException; its Message is already one sentence.
            string message = e switch
            {
                QuantityOutOfRangeException => e.Message,
                ArgumentException { ParamName: { } name } => FirstLine(e.Message).Replace($" (Parameter '{name}')", "", StringComparison.Ordinal),
                _ => FirstLine(e.Message),
            };
            throw new CalcInputException($"{options}: {message}", e);
        }
    }

    /// <summary>Stops with a message about a combination of options.</summary>
    public static CalcInputException Input(string message) => new(message);

    private static string FirstLine(string message) => message.Split('\n')[0].TrimEnd();
}
