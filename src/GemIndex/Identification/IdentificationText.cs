using System.Globalization;
using GemIndex.Core.Identification;

namespace GemIndex.Cli.Identification;

/// <summary>The answer for one stone as text for a bench user: derived properties, candidates with reasons, next test, warnings.</summary>
internal static class IdentificationText
{
    public static void Write(IdentificationResult result, TextWriter o)
    {
        if (result.Series is { } series)
        {
            o.WriteLine(series.Character is { } c ? $"Optic character: {c.ToString().ToLowerInvariant()}" : "Optic character: undetermined");
            foreach (var h in series.Interpretations) o.WriteLine($"  {h.Description}");
        }
        o.WriteLine(result.NoGoodMatch
            ? "NO GOOD MATCH: nothing in the catalogue fits these readings; the list below is only the least bad."
            : "Candidates:");
        foreach (var (c, i) in result.Candidates.Select((c, i) => (c, i)))
        {
            string bar = new('#', (int)Math.Round(c.Confidence * 20));
            o.WriteLine($"{i + 1,2}. {c.Material.Name,-36} {Percent(c.Confidence),6} {bar,-20} fit {c.Fit.ToString("0.00", CultureInfo.InvariantCulture)}  ({c.Material.Species}, {c.Material.Origin.ToString().ToLowerInvariant()})");
            foreach (var r in c.Reasons) o.WriteLine($"      {(r.Agrees ? "+" : "-")} {r.Text}");
        }
        o.WriteLine($"Not in the catalogue: {Percent(result.NotInCatalogue)}");
        if (result.NextTest is { } next)
        {
            o.WriteLine($"Next test: {next.Description} (expected gain {next.GainBits.ToString("0.00", CultureInfo.InvariantCulture)} bits)");
            foreach (string e in next.Expectations) o.WriteLine($"  {e}");
        }
        foreach (string w in result.Warnings) o.WriteLine($"Warning: {w}");
        o.WriteLine("An identification from bench tests is an aid, not a certificate.");
    }

    private static string Percent(double p) => (p * 100).ToString("0.0", CultureInfo.InvariantCulture) + "%";
}
