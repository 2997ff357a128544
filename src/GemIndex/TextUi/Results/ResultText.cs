using System.Globalization;
using GemIndex.Cli.TextUi.Bench;
using GemIndex.Core.Gravity;
using GemIndex.Core.Identification;
using GemIndex.Core.Optics;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Core.Quantities;
using GemIndex.Core.Readings;

namespace GemIndex.Cli.TextUi.Results;

/// <summary>The identification panel's text: derived properties, ranked candidates, next test and warnings. Numbers are formatted here only.</summary>
internal static class ResultText
{
    public const int BarWidth = 8;

    public static string Index(double n) => n.ToString("0.000", CultureInfo.InvariantCulture);

    public static string Percent(double p) => (100 * p).ToString("0", CultureInfo.InvariantCulture) + "%";

    public static string Gravity(SpecificGravity? sg) => sg is { } g
        ? $"SG {g.Value.ToString("0.000", CultureInfo.InvariantCulture)} ± {g.StandardUncertainty.ToString("0.000", CultureInfo.InvariantCulture)}"
        : "SG -";

    /// <summary>A confidence bar of <see cref="BarWidth"/> cells, '#' filled and '.' empty (readable without colour).</summary>
    public static string Bar(double p)
    {
        int filled = (int)Math.Round(Math.Clamp(p, 0, 1) * BarWidth, MidpointRounding.AwayFromZero);
        return new string('#', filled) + new string('.', BarWidth - filled);
    }

    /// <summary>Optic character, indices, birefringence, sign, 2V (biaxial) and SG, as far as the readings go.</summary>
    public static IReadOnlyList<string> Derived(BenchAssessment a)
    {
        var lines = new List<string>();
        if (a.Result?.Series is { } series) lines.AddRange(Series(series));
        else if (a.Readings.Refractometer?.Spot is { } spot) lines.Add($"spot reading n ≈ {Index(spot)}");
        if (a.Readings.Refractometer is { OverLimit: true }) lines.Add("over the limit: index above the liquid");
        lines.Add(Gravity(a.SpecificGravity));
        return lines;
    }

    private static IEnumerable<string> Series(RotationSeriesResult s)
    {
        if (s.Interpretations.Count == 0) { yield return "optic character: " + (s.UndeterminedReason.Length > 0 ? s.UndeterminedReason : "undetermined"); yield break; }
        SeriesInterpretation best = s.Interpretations.MaxBy(i => i.Weight)!;
        string character = (best.Character ?? s.Character)?.ToString().ToLowerInvariant() ?? "character undetermined";
        string sign = best.Sign switch { OpticSign.Positive => " positive (+)", OpticSign.Negative => " negative (−)", OpticSign.Either => " sign either", _ => "" };
        yield return character + sign;
        yield return best.Lowest.Value == best.Highest.Value ? $"n {Index(best.Lowest.Value)}" : $"n {Index(best.Lowest.Value)} – {Index(best.Highest.Value)}";
        if (best.Beta is { } beta) yield return $"β {Index(beta.Value)}{TwoV(best)}";
        if (best.Birefringence.Value > 0) yield return $"birefringence {best.Birefringence.Value.ToString("0.000", CultureInfo.InvariantCulture)}";
        if (s.Interpretations.Count > 1) yield return $"({s.Interpretations.Count} readings of the series; best shown)";
    }

    private static string TwoV(SeriesInterpretation i)
    {
        try
        {
            Angle? v = Indicatrix.Biaxial(i.Lowest, i.Beta!.Value, i.Highest).OpticAxialAngle;
            return v is { } angle ? $"  2V {angle.Degrees.ToString("0", CultureInfo.InvariantCulture)}°" : "";
        }
        catch (ArgumentException) { return ""; }   // β not strictly between α and γ: no 2V to show
    }

    /// <summary>One line per candidate: rank, name, confidence as number and bar, fit.</summary>
    public static string Candidate(int rank, RankedCandidate c, int nameWidth) =>
        $"{rank,1} {Clip(c.Material.Name, nameWidth).PadRight(nameWidth)} {Percent(c.Confidence),4} {Bar(c.Confidence)} {c.Fit.ToString("0.00", CultureInfo.InvariantCulture)}";

    /// <summary>The column heads above <see cref="Candidate"/> lines.</summary>
    public static string CandidateHeader(int nameWidth) => $"  {"candidate".PadRight(nameWidth)} conf {"".PadRight(BarWidth)} fit";

    public static string Headline(IdentificationResult r) => r.NoGoodMatch
        ? $"!! NO GOOD MATCH: nothing fits well (not in catalogue {Percent(r.NotInCatalogue)})"
        : $"Best: {r.Candidates[0].Material.Name} {Percent(r.Candidates[0].Confidence)} (not in catalogue {Percent(r.NotInCatalogue)})";

    public static IReadOnlyList<string> NextTest(NextTestAdvice? advice) => advice is null ? [] :
    [
        $"Next: {advice.Description} ({advice.GainBits.ToString("0.0", CultureInfo.InvariantCulture)} bits)",
        .. advice.Separates.Count > 0 ? [$"  separates {string.Join(", ", advice.Separates)}"] : Array.Empty<string>(),
        .. advice.Expectations.Select(e => "  " + e),
    ];

    public static string Clip(string s, int width) => s.Length <= width ? s : s[..Math.Max(0, width - 1)] + "…";
}
