using System.Collections.Immutable;

namespace GemIndex.Cli.TextUi.Bench;

/// <summary>An immutable copy of the bench form, taken on the UI thread and assessed or saved elsewhere.</summary>
internal sealed record BenchSnapshot(
    long StoneId,
    int Version,
    ImmutableDictionary<string, string> Texts,
    ImmutableDictionary<string, string> Choices,
    ImmutableList<StepText> Steps)
{
    public string Text(string field) => Texts.GetValueOrDefault(field, "");

    public string? Choice(string field) => Choices.GetValueOrDefault(field);
}
