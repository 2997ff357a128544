namespace GemIndex.Cli.Reports;

/// <summary>The derived-property and next-test lines shared by the text formats.</summary>
internal static class ReportDerived
{
    public static IEnumerable<ReportField> Fields(StoneReport report)
    {
        if (report.Character is { } c) yield return new("optic_character", "Optic character", c);
        else if (report.Interpretations.Count > 0)
            yield return new("optic_character", "Optic character", "not fixed by the series" + (report.UndeterminedReason.Length > 0 ? ": " + report.UndeterminedReason : ""));
        if (report.Interpretations.Count > 0 && report.Interpretations[0] is var best)
        {
            yield return new("indices", "Refractive indices (most likely reading)", best.Beta is { } beta
                ? $"α {ReportNumbers.Index(best.Lowest)}, β {ReportNumbers.Index(beta)}, γ {ReportNumbers.Index(best.Highest)}"
                : best.Lowest == best.Highest ? ReportNumbers.Index(best.Lowest) : $"{ReportNumbers.Index(best.Lowest)} to {ReportNumbers.Index(best.Highest)}");
            yield return new("birefringence", "Birefringence", ReportNumbers.WithUncertainty(best.Birefringence, best.BirefringenceUncertainty, "0.000"));
            yield return new("optic_sign", "Optic sign", best.Sign);
        }
        if (report.SpecificGravity is { } sg)
            yield return new("specific_gravity", "Specific gravity", $"{ReportNumbers.WithUncertainty(sg.Value, sg.StandardUncertainty, "0.00")} (standard uncertainty; {report.SpecificGravitySource})");
        if (report.Interpretations.Count == 0 && report.SpecificGravity is null)
            yield return new("derived", "Derived", "none: no rotation series and no specific gravity");
    }

    /// <summary>One interpretation in a line: "uniaxial, positive (weight 92.0 %): …".</summary>
    public static string Line(ReportInterpretation i) =>
        $"{i.Character}, sign {i.Sign} (weight {ReportNumbers.Percent(i.Weight)}): {i.Description}";

    public static string NextTestLine(StoneReport report) => report.NextTest is { } n
        ? $"{n.Description}: expected gain {ReportNumbers.Fixed(n.GainBits, "0.00")} bits; separates {string.Join(", ", n.Separates)}."
        : "None suggested: no remaining test would separate the candidates.";
}
