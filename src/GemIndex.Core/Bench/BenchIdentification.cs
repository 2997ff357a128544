using GemIndex.Core.Identification;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Bench;

/// <summary>
/// The one call from a stone's readings to its result: read every field (<see cref="BenchReader"/>), then rank the
/// catalogue (<see cref="Identifier"/>). Every front end goes through here.
/// </summary>
public static class BenchIdentification
{
    /// <summary>The readings that give something to rank by, as the refusal of an empty sheet names them.</summary>
    private const string ReadingKinds = "(refractometer, SG, polariscope, dichroscope, UV, spectroscope, probes, colour or magnification)";

    /// <summary>Reads and ranks one stone.</summary>
    /// <exception cref="QuantityOutOfRangeException">The request asks for candidates outside 1–<see cref="BenchDefaults.MostCandidates"/>.</exception>
    public static BenchOutcome Identify(Identifier identifier, BenchReadings readings, BenchRequest request)
    {
        QuantityOutOfRangeException.ThrowIfOutside("candidates", request.Candidates, 1, BenchDefaults.MostCandidates);
        BenchReading reading = BenchReader.Read(readings);
        // Nothing to rank by: the catalogue's frequencies alone are no answer to a single stone typed on the command line.
        if (request.RefuseEmpty && reading.Errors.Count == 0 && reading.IsEmpty)
            reading = reading with { Errors = [new BenchFieldError("$", "", "at least one reading",
                reading.Sheet.Cut is null
                    ? $"no readings were given: give at least one {ReadingKinds}."
                    : $"only the cut was given, which alone tells no material: give at least one reading besides {ReadingKinds}.")] };
        bool rank = reading.Errors.Count == 0 || request.RankDespiteErrors && reading.HasReadings;
        return new BenchOutcome(reading, rank
            ? identifier.Identify(reading.Sheet, request.Candidates, request.ExplainTop, request.AdviseNextTest)
            : null);
    }
}
