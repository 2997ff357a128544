using GemIndex.Core.Catalogue;

namespace GemIndex.Core.Identification;

/// <summary>
/// The leading species' origins that these tests cannot tell apart, as the warnings say it in words: for a front end that
/// words the answer itself and must not read it back out of the warning's text.
/// </summary>
public sealed record InseparableOrigins
{
    /// <summary>The leading species.</summary>
    public required string Species { get; init; }

    /// <summary>Its origins that each hold a relevant share of it (<see cref="BenchWarnings.OriginShare"/>).</summary>
    public required IReadOnlyList<OriginClass> Origins { get; init; }

    /// <summary>The test not yet done that best tells the species' entries apart, or null when no bench test left would.</summary>
    public NextTestAdvice? Test { get; init; }
}
