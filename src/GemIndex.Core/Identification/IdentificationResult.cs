using GemIndex.Core.Readings;

namespace GemIndex.Core.Identification;

/// <summary>The answer for one stone: ranked candidates, the rest of the probability, the next test and warnings.</summary>
public sealed record IdentificationResult
{
    /// <summary>The stone's reference.</summary>
    public required string Id { get; init; }

    /// <summary>Species best first, each with its total over the whole catalogue and its split by origin.</summary>
    public IReadOnlyList<SpeciesResult> Species { get; init; } = [];

    /// <summary>A species' total over the whole catalogue, or null when the answer holds no total for it.</summary>
    public double? SpeciesConfidence(string species) => Species.FirstOrDefault(s => s.Species == species)?.Confidence;

    /// <summary>
    /// The leading species' mineral group, or a group whose species together outweigh the leading species (lazulite 33 %
    /// beside elbaite, uvite and dravite at 63 %: the stone is likelier a tourmaline), with its total over every species of
    /// the group and the group's species that hold at least <see cref="BenchWarnings.Relevant"/>, likeliest first, when two
    /// or more do; else null. The answer's headline names it beside the species.
    /// </summary>
    public GroupSpecies? LeadingGroup
    {
        get
        {
            if (Species.Count == 0) return null;
            GroupSpecies? Of(string group) =>
                Species.Where(s => s.MineralGroup == group && s.Confidence >= BenchWarnings.Relevant).Select(s => s.Species).ToList() is { Count: >= 2 } held
                    ? new GroupSpecies(group, Species.Where(s => s.MineralGroup == group).Sum(s => s.Confidence), held) : null;
            if (Species[0].MineralGroup is { } own) return Of(own);
            return Species.Select(s => s.MineralGroup).OfType<string>().Distinct().Select(Of).OfType<GroupSpecies>()
                .Where(g => g.Total > Species[0].Confidence).MaxBy(g => g.Total);
        }
    }

    /// <summary>Candidates, best first (at most the number asked for).</summary>
    public required IReadOnlyList<RankedCandidate> Candidates { get; init; }

    /// <summary>Posterior probability that the stone is something the catalogue does not hold.</summary>
    public required double NotInCatalogue { get; init; }

    /// <summary>True when no catalogue material fits the evidence: say "nothing fits" rather than name the least bad.</summary>
    public required bool NoGoodMatch { get; init; }

    /// <summary>The most informative test not yet done, or null when none would help.</summary>
    public NextTestAdvice? NextTest { get; init; }

    /// <summary>What a bench user must know (misreadings, porous candidates, natural versus synthetic, …).</summary>
    public required IReadOnlyList<string> Warnings { get; init; }

    /// <summary>
    /// The entries to keep out of water and heavy liquids: every entry of the catalogue that must not be immersed holding
    /// at least <see cref="BenchWarnings.Relevant"/>, or a tenth of it in the leading species, most probable first;
    /// the "do not immerse" warning names the same ones, so that every place that says it names the same stones.
    /// </summary>
    public IReadOnlyList<string> KeepDry { get; init; } = [];

    /// <summary>The tests the warnings advise (batch words, each once), so that their cautions go with the advice.</summary>
    public IReadOnlyList<string> WarningTests { get; init; } = [];

    /// <summary>The leading species' origins these tests cannot separate, and the test that best would; null when they can.</summary>
    public InseparableOrigins? InseparableOrigins { get; init; }

    /// <summary>
    /// The rotation series' readings as the front ends show them, when there were readings: each optic character's
    /// indices weighted by <see cref="SeriesCharacter"/> (<see cref="SeriesAsRead"/>); worked out on first use (a batch
    /// line never asks for it).
    /// </summary>
    public RotationSeriesResult? Series { get => _series?.Value; init => _series = value is null ? null : new Lazy<RotationSeriesResult>(() => value); }

    /// <summary>The lazily worked-out <see cref="Series"/>.</summary>
    internal Lazy<RotationSeriesResult>? SeriesSource { init => _series = value; }

    private readonly Lazy<RotationSeriesResult>? _series;

    /// <summary>
    /// What the rotation series alone says of the optic character (<see cref="OpticCharacterPosterior"/>), or null
    /// without a series; worked out on first use (a batch line never asks for it).
    /// </summary>
    public OpticCharacterPosterior? SeriesCharacter => _seriesCharacter?.Value;

    /// <summary>The lazily worked-out <see cref="SeriesCharacter"/>.</summary>
    internal Lazy<OpticCharacterPosterior>? SeriesCharacterSource { init => _seriesCharacter = value; }

    private readonly Lazy<OpticCharacterPosterior>? _seriesCharacter;
}
