using System.CommandLine;

namespace GemIndex.Cli.CommandLine.Calc;

/// <summary>
/// The one skeleton of a <c>calc</c> command: its options plus <c>--json</c>, a compute step that reads the options
/// and calls Core, and the answer written as text or JSON; Core's domain errors become one line naming the option
/// (<see cref="CalcFailure"/>), exit 3.
/// </summary>
internal static class CalcBuilder
{
    public static Command Command(string name, string description, Option[] options, Func<ParseResult, CalcAnswer> compute)
    {
        var json = CalcOptions.Json();
        var command = new Command(name, description);
        foreach (Option option in options) command.Options.Add(option);
        command.Options.Add(json);
        command.SetAction(pr => CalcFailure.Guard(pr, output =>
        {
            CalcAnswer answer = compute(pr);
            if (pr.GetValue(json)) answer.Json(output);
            else answer.Text(output);
            return ExitCodes.Ok;
        }));
        return command;
    }
}
