using GemIndex.Core.Bench;
using GemIndex.Core.Identification;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Core.Readings;

namespace GemIndex.Cli.Reports;

/// <summary>The derived-property and next-test lines shared by the text formats.</summary>
internal static class ReportDerived
{
    public static IEnumerable<ReportField> Fields(StoneReport report)
    {
        if (report.CharacterOdds is { } odds) yield return new("optic_character", $"Optic character (from {odds.From})", CharacterOdds(odds, series: report.Result.Series));
        else if (report.Character is { } c) yield return new("optic_character", "Optic character", c);
        else if (report.Interpretations.Count > 0)
            yield return new("optic_character", "Optic character", "not fixed by the series" + (report.UndeterminedReason.Length > 0 ? ": " + report.UndeterminedReason : ""));
        if (report.Interpretations.Count > 0 && report.Interpretations[0] is var best)
        {
            yield return new("indices", "Refractive indices (most likely reading)",
                Indices(best.Character == "uniaxial", SignText(report), best.Lowest, best.Highest, best.Beta, best.AboveLiquidLimit));   // ω and ε only under a settled sign
            // The difference of the indices shown on the line above, so the two lines add up; past the liquid, the least.
            double shown = Core.Optics.Birefringence.OfShownIndices(best.Highest, best.Lowest);
            yield return new("birefringence", "Birefringence", best.AboveLiquidLimit is { } limit
                ? AtLeast(best.Lowest, limit, best.Highest)
                // Steps that leave the character open leave the extremes unread too: the spread read is a least value.
                : best.IsUndetermined ? $"at least {ReportNumbers.Fixed(shown, "0.000")} (the steps leave part of the half turn unread)"
                : ReportNumbers.WithUncertainty(shown, best.BirefringenceUncertainty, "0.000"));
            yield return new("optic_sign", "Optic sign", SignText(report));
        }
        if (report.SpecificGravity is { } sg)
            yield return new("specific_gravity", "Specific gravity", $"{sg} (standard uncertainty; {report.SpecificGravitySource})");
        if (report.Readings.ReflectancePct is { } reflectance && ReportReadings.ReflectanceText(reflectance) is { } said)
            yield return new("index_from_reflectance", "Index from the reflectance", said);
        if (report.Interpretations.Count == 0 && report.SpecificGravity is null && report.Readings.ReflectancePct is null)
            yield return new("derived", "Derived", "none: no rotation series, no specific gravity and no reflectance");
    }

    /// <summary>
    /// The principal indices of one reading of a series by their names: α, β, γ; ω and ε for a uniaxial reading whose
    /// sign is settled ("positive" or "negative": ω the constant edge); else the lowest and highest, or the one index.
    /// </summary>
    public static string Indices(bool uniaxial, string sign, double lowest, double highest, double? beta, double? aboveLiquidLimit = null)
    {
        // A highest index fitted above the contact liquid was never read: it is said as lying above the liquid.
        string high = aboveLiquidLimit is { } limit ? AboveTheLiquid(limit, highest) : ReportNumbers.Index(highest);
        return beta is { } b ? $"α {ReportNumbers.Index(lowest)}, β {ReportNumbers.Index(b)}, γ {high}"
            : lowest == highest ? ReportNumbers.Index(lowest)
            : uniaxial && sign == "positive" ? $"ω {ReportNumbers.Index(lowest)}, ε {high}"
            : uniaxial && sign == "negative" ? $"ω {high}, ε {ReportNumbers.Index(lowest)}"
            : $"{ReportNumbers.Index(lowest)} to {high}";
    }

    /// <summary>The birefringence of a reading whose highest index lies above the liquid: at least the liquid less the lowest.</summary>
    public static string AtLeast(double lowest, double liquidLimit, double fittedHighest) =>
        $"at least {ReportNumbers.Index(Core.Optics.Birefringence.OfShownIndices(liquidLimit, lowest))}"
        + (fittedHighest > liquidLimit ? $" (about {ReportNumbers.Index(Core.Optics.Birefringence.OfShownIndices(fittedHighest, lowest))} by the fitted edge)" : "");

    /// <summary>
    /// A highest index past the liquid: "above the liquid 1.790", with the fitted edge's value when it lies above the
    /// liquid ("(about 1.796)"); a high edge unseen at some steps while the steps that show it fit below the liquid gives
    /// no such value.
    /// </summary>
    public static string AboveTheLiquid(double liquidLimit, double fittedHighest) =>
        $"above the liquid {ReportNumbers.Index(liquidLimit)}" + (fittedHighest > liquidLimit ? $" (about {ReportNumbers.Index(fittedHighest)})" : "");

    /// <summary>A reading is called settled when it carries at least this share of the weight (a judgement).</summary>
    private const double SettledShare = 0.9;

    /// <summary>The sign as the series gives it: "not fixed" while its readings weigh positive and negative alike.</summary>
    public static string SignText(StoneReport report)
    {
        // A reading whose character the series leaves open has no sign to give ("none" is a singly refractive stone's).
        var signs = report.Interpretations.Where(i => !i.IsUndetermined)
            .GroupBy(i => i.Sign).Select(g => (Sign: g.Key, Weight: g.Sum(i => i.Weight))).OrderByDescending(g => g.Weight).ToList();
        if (signs.Count == 0) return "not fixed";
        if (signs.Count == 1 || signs[0].Weight >= SettledShare) return signs[0].Sign;
        return $"not fixed by the series: {string.Join(" or ", signs.Select(g => $"{g.Sign} ({ReportNumbers.WholePercent(g.Weight)})"))}";
    }

    /// <summary>One reading of the series in a line: "uniaxial, sign positive (chance 50%): …".</summary>
    public static string Line(ReportInterpretation i) => i.IsUndetermined
        ? $"the edges as read, character left open by the steps: {i.Description}"   // no chance: the odds above give the character
        : $"{i.Character}, sign {i.Sign} (chance {ReportNumbers.WholePercent(i.Weight)}): {i.Description}";

    /// <summary>
    /// How strongly a test speaks for or against a candidate, in words (a likelihood ratio of 10 is "strongly", of 2
    /// plain); "neither for nor against" when the candidate and an unknown material explain the reading alike (a feature
    /// seen that neither holds).
    /// </summary>
    public static string Strength(EvidenceContribution reason)
    {
        double ratio = Math.Abs(reason.WeightBits);
        if (ratio < EvidenceContribution.NeutralBits) return "neither for nor against";
        string how = ratio >= StrongBits ? "strongly " : ratio >= ClearBits ? "" : "slightly ";
        return how + (reason.WeightBits >= 0 ? "for" : "against");
    }

    /// <summary>
    /// The one verdict on a reason that every front end gives: how strongly it speaks for or against the candidate, and
    /// "unusual" when the reading lies well outside the candidate's range or is a reaction it rarely shows. An unusual
    /// reading is never said to speak "for" the candidate, though it may weigh more for it than for an unknown material
    /// (its weight in bits says so): "unusual for it", or "… against, unusual" when it weighs against.
    /// </summary>
    public static string Verdict(EvidenceContribution reason) =>
        reason.Agrees ? Strength(reason) : reason.WeightBits <= -EvidenceContribution.NeutralBits ? Strength(reason) + ", unusual" : "unusual for it";

    /// <summary>Ten to one in favour or against (log2 10): "strongly".</summary>
    private const double StrongBits = 3.32;

    /// <summary>Two to one: below it, "slightly".</summary>
    private const double ClearBits = 1;

    /// <summary>A reason in a line: "strongly for (refractometer): …".</summary>
    public static string ReasonLine(EvidenceContribution reason) =>
        $"{Verdict(reason)} ({BenchTestWords.DisplayOfWire(reason.Test)}): {reason.Text}";

    /// <summary>
    /// The answer by species, best first: "Corundum 93.0 % — natural 41.0 %, synthetic 48.0 %"; then, when two or more
    /// species of the leading species' mineral group share it, the group's total: "Tourmaline group 99.9 % in all (elbaite, uvite)".
    /// </summary>
    public static IReadOnlyList<string> SpeciesLines(StoneReport report) =>
        [.. report.Result.Species.Where(s => s.Confidence >= ShownSpeciesShare).Take(ShownSpecies).Select(s =>
            $"{char.ToUpperInvariant(s.Species[0])}{s.Species[1..]} {ReportNumbers.Percent(s.Confidence)}" +
            (s.Origins.Count > 1 ? " — " + string.Join(", ", s.Origins.OrderByDescending(o => o.Value)
                .Select(o => $"{BenchWords.Word(o.Key)} {ReportNumbers.Percent(o.Value)}")) : $" ({BenchWords.Word(s.Origins.Keys.First())})")),
         .. !report.Result.NoGoodMatch && report.Result.LeadingGroup is { } g
            ? [$"{char.ToUpperInvariant(g.Group[0])}{g.Group[1..]} group {ReportNumbers.Percent(g.Total)} in all ({string.Join(", ", g.Species)})"]
            : Array.Empty<string>()];

    /// <summary>
    /// What the series alone says of the optic character, likeliest first: "uniaxial 97.0 % (negative 96.0 %, positive
    /// 1.0 %), biaxial 3.0 %, singly refractive &lt;0.1 %" (isotropic or amorphous, in the bench's word); a uniaxial
    /// sign is named when uniaxial holds 1 % or more.
    /// </summary>
    public static string CharacterOdds(OpticCharacterPosterior p, Func<double, string>? percent = null, RotationSeriesResult? series = null)
    {
        percent ??= ReportNumbers.Percent;
        // Biaxial with 2V near 0° is what a uniaxial crystal shows to these readings: said together, with the signs both show.
        if (series is { BiaxialLooksUniaxial: true })
        {
            var biaxial = series.Interpretations.Where(i => i.Character == OpticCharacter.Biaxial).ToList();
            double share = biaxial.Sum(i => i.Weight) is var s && s > 0 ? p.Biaxial / s : 0;
            double positive = p.UniaxialPositive + share * biaxial.Where(i => i.Sign == OpticSign.Positive).Sum(i => i.Weight);
            double negative = p.UniaxialNegative + share * biaxial.Where(i => i.Sign == OpticSign.Negative).Sum(i => i.Weight);
            // Short of certain while the readings leave any chance of an isotropic stone (the sum can round to 1).
            double alike = p.Isotropic > 0 ? Math.Min(p.Uniaxial + p.Biaxial, Math.BitDecrement(1.0)) : p.Uniaxial + p.Biaxial;
            string signs = Signs(positive, negative, 0.01, percent);
            string both = $"uniaxial (or biaxial, 2V near 0°: not told apart) {percent(alike)}" + (signs.Length > 0 ? $" ({signs})" : "");
            return string.Join(", ", new[] { (both, alike), ("singly refractive " + percent(p.Isotropic), p.Isotropic) }
                .Where(x => x.Item2 > 0).OrderByDescending(x => x.Item2).Select(x => x.Item1));
        }
        // Biaxial readings with 2V near 0° shown with the uniaxial reading of their sign (SeriesAsRead) are counted with it.
        var (nearPositive, nearNegative) = series?.NearZeroBiaxialShown ?? (0, 0);
        if (nearPositive + nearNegative > 0)
            p = p with { UniaxialPositive = p.UniaxialPositive + nearPositive, UniaxialNegative = p.UniaxialNegative + nearNegative, Biaxial = Math.Max(0, p.Biaxial - nearPositive - nearNegative) };
        string uniaxial = (nearPositive + nearNegative > 0 ? "uniaxial (or biaxial, 2V near 0°) " : "uniaxial ") + percent(p.Uniaxial)
            + (p.Uniaxial >= 0.01 ? $" ({Signs(p.UniaxialPositive, p.UniaxialNegative, double.Epsilon, percent)})" : "");
        // A character the readings rule out (two edges apart rule out one index) is left out, not shown as "0%".
        return string.Join(", ", new[] { (uniaxial, p.Uniaxial), ("biaxial " + percent(p.Biaxial), p.Biaxial), ("singly refractive " + percent(p.Isotropic), p.Isotropic) }
            .Where(x => x.Item2 > 0).OrderByDescending(x => x.Item2).Select(x => x.Item1));
    }

    /// <summary>"negative 96.0 %, positive 1.0 %": each sign holding at least <paramref name="least"/>, likeliest first.</summary>
    private static string Signs(double positive, double negative, double least, Func<double, string> percent) =>
        string.Join(", ", new[] { ("positive", positive), ("negative", negative) }.Where(x => x.Item2 >= least)
            .OrderByDescending(x => x.Item2).Select(x => $"{x.Item1} {percent(x.Item2)}"));

    /// <summary>Species below this share are not listed in the answer (a judgement: 1 %).</summary>
    private const double ShownSpeciesShare = 0.01;

    /// <summary>At most this many species in the answer.</summary>
    private const int ShownSpecies = 5;

    public static string NextTestLine(StoneReport report) => report.NextTest is { } n
        ? $"{n.Description}: it would {Separation(n.GainBits)} {n.SeparatesInWords}."
        : report.NoGoodMatch ? NoMatchNextStep(report.Readings.ReflectancePct is not null)
        : "None suggested: no remaining test would separate the candidates.";

    /// <summary>
    /// What to do next when nothing in the catalogue fits: the readings first (the reflectance meter among them when it was
    /// read: a poor polish or a meter off its standard reads wrong), then an assembled stone (common practice).
    /// </summary>
    public static string NoMatchNextStep(bool reflectanceRead) =>
        "Re-take the readings first: nothing in the catalogue fits them (the refractometer on a clean facet with fresh contact liquid, the SG"
        + (reflectanceRead ? ", the reflectance meter checked on its standard and read on a well-polished facet" : "")
        + "); then look for an assembled stone (a join or two lustres under the loupe).";

    /// <summary>How well the next test separates the leading candidates, in words (1 bit halves the doubt).</summary>
    public static string Separation(double gainBits) => gainBits >= 1 ? "clearly separate" : gainBits >= 0.3 ? "partly separate" : "slightly separate";
}
