using GemIndex.Core.Catalogue;
using GemIndex.Core.Identification;
using GemIndex.Data.Batch;

namespace GemIndex.Bench.Accuracy;

/// <summary>
/// The one place where the benchmark meets the program: a batch line (README "Batch format") in, the program's
/// answer out, through the same reading path the batch command uses (today StoneReadingsJson.Parse →
/// StoneReadingsConverter.ToBenchSheet → Identifier.Identify). When the reading path or the result changes, this class
/// is re-pointed and nothing else in the benchmark moves.
/// </summary>
internal sealed class BatchLineAdapter(IReadOnlyList<Material> catalogue)
{
    // One stone on one core, as a batch ranks it (docs/ranking.md §6): the figure of stones per second is one core's.
    private readonly Identifier _identifier = new Identifier(catalogue).WithSeriesOnEveryCore(false);

    /// <summary>The catalogue's species names, for the species-name map's report.</summary>
    public IReadOnlySet<string> SpeciesNames { get; } = catalogue.Select(m => m.Species).ToHashSet(StringComparer.Ordinal);

    /// <summary>Reads a line as the batch command does.</summary>
    /// <exception cref="BatchInputException">The line cannot be read (the message names the field).</exception>
    public BenchSheet Read(string line) => StoneReadingsConverter.ToBenchSheet(StoneReadingsJson.Parse(line));

    /// <summary>Ranks a sheet already read (ranking only: no reasons, no next-test advice).</summary>
    public IdentificationResult Rank(BenchSheet sheet) => _identifier.Identify(sheet, maximumCandidates: 10, explainTop: 0, adviseNextTest: false);

    /// <summary>Reads and ranks one line and reduces the result to what is scored; false with the reader's message when the line is refused.</summary>
    public bool TryIdentify(string line, out EngineAnswer answer, out string error)
    {
        try
        {
            answer = Answer(Rank(Read(line)));
            error = "";
            return true;
        }
        catch (BatchInputException e)
        {
            answer = new EngineAnswer("", 0, [], null, 0, NothingFits: false);
            error = e.Message;
            return false;
        }
    }

    /// <summary>
    /// Species of a result: the species list when the result carries one, else the top candidate's species; the origin
    /// is the largest share within the leading species.
    /// </summary>
    private static EngineAnswer Answer(IdentificationResult r)
    {
        if (r.Species.Count > 0)
        {
            var first = r.Species[0];
            var origin = first.Origins.Count > 0 ? first.Origins.MaxBy(o => o.Value) : default;
            return new EngineAnswer(first.Species, first.Confidence, [.. r.Species.Take(3).Select(s => s.Species)],
                first.Origins.Count > 0 ? origin.Key.ToString().ToLowerInvariant() : null,
                first.Confidence > 0 ? origin.Value / first.Confidence : 0, r.NoGoodMatch);
        }
        var top = r.Candidates[0];
        var species = r.Candidates.Select(c => c.Material.Species).Distinct().Take(3).ToList();
        return new EngineAnswer(top.Material.Species, top.Confidence, species, top.Material.Origin.ToString().ToLowerInvariant(), 1, r.NoGoodMatch);
    }
}
