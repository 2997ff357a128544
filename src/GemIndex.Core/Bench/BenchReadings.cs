using System.Collections.Immutable;

namespace GemIndex.Core.Bench;

/// <summary>
/// One stone's readings as given, before any check: every value is the text a person typed or a file held, keyed by
/// its <see cref="BenchField"/> name, and the rotation steps in order. Every front end (batch line, command-line
/// options, text UI form, workbook) fills this one type; <see cref="BenchReader"/> reads it. A field that is absent
/// was not observed; a field present with blank text is an error (an empty word is not "not given").
/// </summary>
public sealed record BenchReadings
{
    /// <summary>The values by field name.</summary>
    public ImmutableSortedDictionary<string, string> Values { get; init; } = ImmutableSortedDictionary.Create<string, string>(StringComparer.Ordinal);

    /// <summary>The rotation steps in the order read.</summary>
    public ImmutableList<EdgeStepText> Steps { get; init; } = [];

    /// <summary>The text of a field, or null when it was not given.</summary>
    public string? Text(string field) => Values.TryGetValue(field, out string? text) ? text : null;

    /// <summary>These readings with one more field (null leaves it out).</summary>
    public BenchReadings With(string field, string? text) => text is null ? this : this with { Values = Values.SetItem(field, text) };

    /// <summary>These readings with one more rotation step.</summary>
    public BenchReadings WithStep(EdgeStepText step) => this with { Steps = Steps.Add(step) };

    /// <summary>
    /// These readings without the fields and steps <paramref name="refused"/> names (<see cref="BenchReader"/>'s errors):
    /// what a ranking that goes on despite errors used, so that what is kept of a stone is what its answer was worked out on.
    /// </summary>
    public BenchReadings WithoutRefused(IEnumerable<BenchFieldError> refused)
    {
        var fields = refused.Select(e => e.Field).ToHashSet(StringComparer.Ordinal);
        if (fields.Count == 0) return this;
        bool StepRefused(int i) => fields.Contains(BenchField.Step(i)) || fields.Any(f => f.StartsWith(BenchField.Step(i) + ".", StringComparison.Ordinal));
        return this with
        {
            Values = Values.RemoveRange(fields),
            Steps = [.. Steps.Where((_, i) => !StepRefused(i))],
        };
    }

    /// <summary>Equal when every field and step is equal.</summary>
    public bool Equals(BenchReadings? other) =>
        other is not null && Values.Count == other.Values.Count && Values.All(p => other.Text(p.Key) == p.Value) && Steps.SequenceEqual(other.Steps);

    /// <inheritdoc />
    public override int GetHashCode() => HashCode.Combine(Values.Count, Steps.Count);
}
