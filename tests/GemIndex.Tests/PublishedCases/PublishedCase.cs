using GemIndex.Core.Catalogue;

namespace GemIndex.Tests.PublishedCases;

/// <summary>
/// One particular stone whose bench readings and identification were published: the readings as a batch line, copied
/// as published (units converted only where the batch format asks for carats), the species the source named (any of
/// <see cref="Species"/> counts: the catalogue splits tourmaline by end member, and an assembled stone may be named by
/// its parts), how many instrument tests the source reports that the line holds (colour is an observation, not
/// counted), and where it was read.
/// </summary>
/// <remarks>
/// Where magnification decided origin or treatment, <see cref="Origins"/> holds the origin the source gave and
/// batch line's "magnification" object the features seen (or looked for and not seen), in the words of the
/// magnification vocabulary; <see cref="FeaturesPresent"/> / <see cref="FeaturesAbsent"/> read them back from the line.
/// </remarks>
public sealed record PublishedCase(string Line, IReadOnlyList<string> Species, int BenchTests, string Source)
{
    /// <summary>The catalogue's tourmaline species: a source that says "tourmaline" is right with any of them.</summary>
    public static IReadOnlyList<string> TourmalineGroup { get; } = ["elbaite", "dravite", "schorl", "uvite", "liddicoatite"];

    /// <summary>Man-made glass is one species of the catalogue, its families (soda-lime, lead, barium…) varieties under it.</summary>
    public static IReadOnlyList<string> GlassGroup { get; } = ["glass"];

    /// <summary>The origin the source gave (more than one for, say, a glass-filled synthetic); empty when not recorded.</summary>
    public IReadOnlyList<OriginClass> Origins { get; init; } = [];

    /// <summary>Magnification features the source saw, as vocabulary words (from the batch line).</summary>
    public IReadOnlyList<string> FeaturesPresent => Magnification("present");

    /// <summary>Magnification features the source says it looked for and did not see, as vocabulary words (from the batch line).</summary>
    public IReadOnlyList<string> FeaturesAbsent => Magnification("absent");

    /// <summary>
    /// True when the source says which features under magnification decided origin or treatment: it records the origin.
    /// A case whose only look is a phenomenon the source names (a cat's-eye, a star) decides no origin and is not one.
    /// </summary>
    public bool IsMagnificationCase => Origins.Count > 0;

    private List<string> Magnification(string part)
    {
        using var doc = System.Text.Json.JsonDocument.Parse(Line);
        return doc.RootElement.TryGetProperty("magnification", out var m) && m.TryGetProperty(part, out var words)
            ? [.. words.EnumerateArray().Select(w => w.GetString()!)]
            : [];
    }

    /// <summary>The species as the source names it: the group name for tourmaline, else the names joined.</summary>
    public string Published => string.Join(" / ", Species.SequenceEqual(TourmalineGroup) ? ["tourmaline"]
        : Species);
}
