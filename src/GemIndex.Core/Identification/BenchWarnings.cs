using System.Globalization;
using GemIndex.Core.Catalogue;

namespace GemIndex.Core.Identification;

/// <summary>The warnings a bench user needs with an answer: misreadings, over the limit, porous candidates,
/// natural versus synthetic, composites and treatments, poor SG precision, nothing fitting.</summary>
public static class BenchWarnings
{
    /// <summary>A candidate at or above this confidence is worth warning about.</summary>
    public const double Relevant = 0.05;

    /// <summary>Warnings for one answer, most important first.</summary>
    public static IReadOnlyList<string> For(AnalysedSheet sheet, IReadOnlyList<RankedCandidate> candidates, double notInCatalogue, bool noGoodMatch)
    {
        var warnings = new List<string>();
        if (noGoodMatch)
            warnings.Add($"Nothing in the catalogue fits these readings well (best fit {P(candidates[0].Fit)}, not in the catalogue {P(notInCatalogue)}): re-check the readings, or the stone may be a material the catalogue lacks.");
        if (sheet.Series is { } series)
        {
            warnings.AddRange(series.Misreadings.Select(m => "Likely misreading: " + m + "."));
            if (series.Character is null && series.UndeterminedReason.Length > 0)
                warnings.Add("Optic character undetermined: " + series.UndeterminedReason + ".");
        }
        if (sheet.Sheet.Refractometer is { OverLimit: true } r)
            warnings.Add($"Over the limit: no stone edge below {r.LiquidLimit.ToString("0.00", CultureInfo.InvariantCulture)}; the index is only known to be higher. SG, dispersion, the thermal probe or a reflectance or prism method can go further.");
        if (sheet.Sheet.SpecificGravity is { StandardUncertainty: > 0.03 } sg)
            warnings.Add($"SG uncertainty ±{sg.StandardUncertainty.ToString("0.00", CultureInfo.InvariantCulture)} is large (a small stone or a coarse balance): SG separates little here.");
        var relevant = candidates.Where(c => c.Confidence >= Relevant).ToList();
        foreach (var c in relevant.Where(c => c.Material.DoNotImmerse))
            warnings.Add($"Possible {c.Material.Name}: do not immerse (no water or heavy liquids){(c.Material.Notes.Length > 0 ? " — " + c.Material.Notes : "")}.");
        foreach (var species in relevant.GroupBy(c => c.Material.Species).Where(g => g.Select(c => c.Material.Origin).Distinct().Count() > 1))
            warnings.Add($"{Capital(species.Key)}: {string.Join(", ", species.Select(c => c.Material.Origin.ToString().ToLowerInvariant()).Distinct())} forms cannot be separated by these tests; for a valuable stone refer it to a qualified laboratory.");
        if (relevant.Any(c => c.Material.Origin == OriginClass.Composite))
            warnings.Add("Possible composite: the refractometer reads only the facet it touches, and the SG of a composite means little; look at the girdle and for a join under magnification.");
        if (relevant.Any(c => c.Material.Origin == OriginClass.Treated))
            warnings.Add("A treated material is among the candidates: treatments are mostly not detectable with these tests.");
        return warnings;
    }

    private static string P(double p) => p.ToString("0.00", CultureInfo.InvariantCulture);

    private static string Capital(string s) => s.Length == 0 ? s : char.ToUpperInvariant(s[0]) + s[1..];
}
