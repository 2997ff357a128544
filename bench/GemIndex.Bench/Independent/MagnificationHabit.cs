namespace GemIndex.Bench.Independent;

/// <summary>
/// One row of the benchmark's own magnification table: what a stone of one species, origin and method of making or
/// treating holds, with the pages the row was compiled from (<see cref="MagnificationHabits"/>). A stone of the row
/// is loupe-clean with the chance <see cref="Clean"/>; otherwise it holds each feature independently with its chance.
/// </summary>
internal sealed record MagnificationHabit
{
    /// <summary>The property table's species name.</summary>
    public required string Species { get; init; }

    /// <summary>The property table's origin word: natural, synthetic, treated, imitation, composite or cultured.</summary>
    public required string Origin { get; init; }

    /// <summary>How the stone was grown or treated ("flame fusion", "flux", "glass filled", "doublet"); "natural" for untouched stones.</summary>
    public required string Method { get; init; }

    /// <summary>The method's share among stones of this species and origin (relative weight, judgement).</summary>
    public double Share { get; init; } = 1;

    /// <summary>The row applies only to stones of this hue (emerald against the other beryls); null: any hue.</summary>
    public string? Hue { get; init; }

    /// <summary>Chance that the stone holds none of the features at all.</summary>
    public required double Clean { get; init; }

    public required IReadOnlyList<FeatureHabit> Features { get; init; }

    /// <summary>The pages read for the row, or "common practice" / "from memory" where none was read.</summary>
    public required string Source { get; init; }

    /// <summary>The chance that a stone of this row holds the feature.</summary>
    public double ChanceOf(string word) => (1 - Clean) * Features.Where(f => f.Word == word).Sum(f => f.Held);
}
