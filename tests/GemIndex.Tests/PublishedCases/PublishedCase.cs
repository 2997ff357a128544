namespace GemIndex.Tests.PublishedCases;

/// <summary>
/// One particular stone whose bench readings and identification were published: the readings as a batch line, copied
/// as published (units converted only where the batch format asks for carats), the species the source named (any of
/// <see cref="Species"/> counts: the catalogue splits tourmaline by end member), how many instrument tests the
/// source reports (colour is an observation, not counted), and where it was read.
/// </summary>
public sealed record PublishedCase(string Line, IReadOnlyList<string> Species, int BenchTests, string Source)
{
    /// <summary>The species as the source names it: the group name when several catalogue species stand for it.</summary>
    public string Published => Species.Count > 1 ? "tourmaline" : Species[0];
}
