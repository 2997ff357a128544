namespace GemIndex.Bench.Independent;

/// <summary>
/// A simulated stone's magnification: the method it was made or treated by, the features it truly holds, and, when
/// an examiner looked (<see cref="Looked"/>), what was written: features seen and features looked for and not seen.
/// </summary>
internal sealed record MagnificationLook
{
    public required MagnificationHabit Habit { get; init; }

    /// <summary>The features the stone holds (what a perfect examiner could find).</summary>
    public required IReadOnlyList<string> Held { get; init; }

    public bool Looked { get; init; }

    public bool Microscope { get; init; }

    public bool Mounted { get; init; }

    public IReadOnlyList<string> Present { get; init; } = [];

    public IReadOnlyList<string> Absent { get; init; } = [];
}
