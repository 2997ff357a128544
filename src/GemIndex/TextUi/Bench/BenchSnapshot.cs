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
    /// <summary>The precision and calibration offset as the stone was opened with (<see cref="BenchModel.InstrumentFields"/>): a change to them is the user's.</summary>
    public ImmutableDictionary<string, string> InstrumentAsLoaded { get; init; } = ImmutableDictionary<string, string>.Empty;

    /// <summary>True when the user changed this instrument field since the stone was opened.</summary>
    public bool InstrumentChanged(string field) => Text(field) != InstrumentAsLoaded.GetValueOrDefault(field, "");

    public string Text(string field) => Texts.GetValueOrDefault(field, "");

    public string? Choice(string field) => Choices.GetValueOrDefault(field);
}
