namespace GemIndex.Cli.CommandLine.Calc;

/// <summary>A value a <c>calc</c> command cannot use, its message already naming the option(s) concerned.</summary>
internal sealed class CalcInputException(string message, Exception? inner = null) : Exception(message, inner);
