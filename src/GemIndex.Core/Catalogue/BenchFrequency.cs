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
