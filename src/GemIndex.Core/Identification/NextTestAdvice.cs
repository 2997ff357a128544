namespace GemIndex.Core.Identification;

/// <summary>The test that would most reduce the uncertainty among the candidates.</summary>
public sealed record NextTestAdvice
{
    /// <summary>The test, as named in the batch format ("sg", "polariscope", "refractometer", …).</summary>
    public required string Test { get; init; }

    /// <summary>
    /// The test in plain words ("hand spectroscope (absorption lines)"); for magnification, what to look for and the
    /// lighting ("loupe or microscope (magnification): look for curved striae (diffused light) and round gas bubbles (brightfield or darkfield)").
    /// </summary>
    public string Description => (ByEye ? ByEyeWords : GemIndex.Core.Bench.BenchTestWords.DisplayOfWire(Test))
        + (LookFor.Count > 0 ? ": look for " + string.Join(" and ", LookFor.Select((f, i) => i < Lighting.Count ? $"{f} ({Lighting[i]})" : f)) : "");

    /// <summary>
    /// For magnification: every feature to look for is a phenomenon seen by eye (play of colour, a star, a cat's-eye),
    /// so the advice is to look at the stone, not to reach for a microscope.
    /// </summary>
    public bool ByEye { get; init; }

    /// <summary>The test's words when <see cref="ByEye"/>.</summary>
    public const string ByEyeWords = "eye or loupe (phenomena)";

    /// <summary>For magnification: the features to look for (their plain names), most telling first; empty otherwise.</summary>
    public IReadOnlyList<string> LookFor { get; init; } = [];

    /// <summary>For magnification: the lighting that shows each feature of <see cref="LookFor"/>.</summary>
    public IReadOnlyList<string> Lighting { get; init; } = [];

    /// <summary>Expected information gain over the current candidates, bits.</summary>
    public required double GainBits { get; init; }

    /// <summary>The leading candidates this test tells apart, best first.</summary>
    public required IReadOnlyList<string> Separates { get; init; }

    /// <summary><see cref="Separates"/> grouped by what they would show (one group per line of <see cref="Expectations"/>).</summary>
    public IReadOnlyList<IReadOnlyList<string>> Groups { get; init; } = [];

    /// <summary>
    /// Whom the test tells apart, in words: "A and B from C" when the candidates fall into two groups that would show
    /// different things, else the candidates listed.
    /// </summary>
    public string SeparatesInWords => Groups.Count == 2 && Groups.Any(g => g.Count > 1)
        ? $"{BenchWarnings.Listed(Groups[0])} from {BenchWarnings.Listed(Groups[1])}"
        : BenchWarnings.Listed(Separates);

    /// <summary>What each of them would show ("ruby: SG 3.97–4.05").</summary>
    public required IReadOnlyList<string> Expectations { get; init; }
}
