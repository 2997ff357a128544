namespace GemIndex.Core.Bench;

/// <summary>
/// One field that cannot be used: the field's name, the value as given (at most <see cref="BenchText.MostShown"/>
/// characters, control characters made visible), the allowed values or range, and one plain sentence.
/// </summary>
public sealed record BenchFieldError(string Field, string Value, string Allowed, string Sentence)
{
    /// <summary>"field: sentence", the way every front end prints it.</summary>
    public override string ToString() => $"{Field}: {Sentence}";
}
