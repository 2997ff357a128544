namespace GemIndex.Core.Catalogue;

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
