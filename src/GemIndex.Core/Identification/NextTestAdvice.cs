namespace GemIndex.Core.Identification;

/// <summary>The test that would most reduce the uncertainty among the candidates.</summary>
public sealed record NextTestAdvice
{
    /// <summary>The test, as named in the batch format ("sg", "polariscope", "refractometer", …).</summary>
    public required string Test { get; init; }

    /// <summary>The test in plain words ("hand spectroscope (absorption lines)").</summary>
    public string Description => GemIndex.Core.Bench.BenchTestWords.DisplayOfWire(Test);

    /// <summary>Expected information gain over the current candidates, bits.</summary>
    public required double GainBits { get; init; }

    /// <summary>The leading candidates this test tells apart, best first.</summary>
    public required IReadOnlyList<string> Separates { get; init; }

    /// <summary>What each of them would show ("ruby: SG 3.97–4.05").</summary>
    public required IReadOnlyList<string> Expectations { get; init; }
}
