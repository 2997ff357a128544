using GemIndex.Core.Identification;

namespace GemIndex.Core.Bench;

/// <summary>
/// What <see cref="BenchReader"/> made of a stone's readings: the bench sheet of every field that could be used,
/// every field's error, and warnings about what was read.
/// </summary>
public sealed record BenchReading
{
    /// <summary>The sheet, without the fields in <see cref="Errors"/>.</summary>
    public required BenchSheet Sheet { get; init; }

    /// <summary>Every field that could not be used, in field order.</summary>
    public required IReadOnlyList<BenchFieldError> Errors { get; init; }

    /// <summary>True when the sheet holds nothing at all to rank by: no test's reading, no colour, no magnification.</summary>
    public bool IsEmpty => Sheet.IsEmpty;

    /// <summary>True when the sheet holds at least one test's reading.</summary>
    public bool HasReadings => Sheet.HasTestReadings;
}
