namespace GemIndex.Data.Tests.Workbook;

/// <summary>A clock for tests: starts at a fixed instant and moves one minute each time it is read.</summary>
public sealed class SteppingClock : TimeProvider
{
    private DateTimeOffset _now = new(2026, 3, 1, 9, 0, 0, TimeSpan.Zero);

    public override DateTimeOffset GetUtcNow()
    {
        DateTimeOffset t = _now;
        _now = _now.AddMinutes(1);
        return t;
    }
}
