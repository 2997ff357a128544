namespace GemIndex.Cli.CommandLine.Calc;

/// <summary>A calculation's answer, ready to be written as JSON (its result record, <see cref="CalcJson"/>) or as text.</summary>
internal sealed record CalcAnswer(Action<TextWriter> Json, Action<TextWriter> Text)
{
    public static CalcAnswer Of<T>(T result, Action<TextWriter, T> text) => new(o => CalcJson.Write(o, result), o => text(o, result));
}
