namespace GemIndex.Core.Catalogue;

/// <summary>
/// How often a material reaches a gem-testing bench: a judgement, used as the prior of the ranking.
/// The relative weights (<see cref="BenchFrequencyWeights"/>) double at each step.
/// </summary>
public enum BenchFrequency
{
    /// <summary>Seen every week or so at a general bench (quartz, glass, corundum).</summary>
    VeryCommon,

    /// <summary>Seen often.</summary>
    Common,

    /// <summary>Seen now and then.</summary>
    Occasional,

    /// <summary>Seldom seen.</summary>
    Rare,

    /// <summary>A collector's stone.</summary>
    VeryRare,
}

/// <summary>The prior weights of <see cref="BenchFrequency"/>: 16, 8, 4, 2, 1 (a judgement, documented in docs/ranking.md).</summary>
public static class BenchFrequencyWeights
{
    /// <summary>The relative prior weight of a frequency class.</summary>
    public static double Of(BenchFrequency frequency) => frequency switch
    {
        BenchFrequency.VeryCommon => 16,
        BenchFrequency.Common => 8,
        BenchFrequency.Occasional => 4,
        BenchFrequency.Rare => 2,
        _ => 1,
    };
}
