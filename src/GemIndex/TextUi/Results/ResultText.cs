using System.Globalization;
using GemIndex.Cli.TextUi.Bench;
using GemIndex.Core.Bench;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Gravity;
using GemIndex.Core.Identification;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Core.Quantities;
using GemIndex.Core.Readings;
using GemIndex.Data.Batch;

namespace GemIndex.Cli.TextUi.Results;

/// <summary>
/// The answer's words: the species and its total, its origins, the candidates, what the readings gave and the next
/// test. The trade's words on the main pane; the numbers behind them stay in the candidate detail. Numbers are
/// formatted here only, never cut short.
/// </summary>
internal static class ResultText
{
    public const int BarWidth = 8;

    public static string Index(double n) => n.ToString("0.000", CultureInfo.InvariantCulture);

    /// <summary>
    /// The answer in a few words for a list of stones: the leading species (with its mineral group) and its share, then its likeliest entry when
    /// that has a name of its own ("corundum >99%: flame-fusion synthetic sapphire"; the list's search finds both), or
    /// "nothing fits". When several origins share the species, the list names the likeliest natural variety and says
    /// the origin is open ("beryl >99%: emerald, origin open"), as the trade names an emerald whose enhancement is
    /// undetermined: the likeliest entry there is the market's most frequent one ("resin-filled emerald"), and the list
    /// must not read as if the bench had found a treatment or a synthetic it cannot tell.
    /// </summary>
    /// <summary>
    /// The share of the leading entry's confidence the likeliest natural entry needs to name a stone whose origin is open
    /// (a judgement of wording, weighing nothing).
    /// </summary>
    public const double NaturalNameShare = 0.25;

    public static string Short(IdentificationResult r)
    {
        if (r.NoGoodMatch) return "nothing fits";
        if (r.Species.Count == 0) return "";
        SpeciesResult lead = r.Species[0];
        // The species' mineral group beside it, as the trade names it ("pyrope (garnet)"); a search for the group finds it.
        string group = lead.MineralGroup is { } g && g != lead.Species ? $" ({g})" : "";
        string species = $"{lead.Species}{group} {Percent(lead.Confidence)}";
        bool originOpen = Origins(lead).Count > 1;
        // With the origin open the stone is named by its likeliest natural entry ("ruby, origin open", not "heated ruby"),
        // unless that entry is far less likely than the leader: a light blue topaz led by blue topaz at 67 % had been
        // named "imperial topaz" (13 %), an orange variety its colour rules out.
        RankedCandidate? leader = r.Candidates.FirstOrDefault(c => c.Material.Species == lead.Species);
        RankedCandidate? natural = r.Candidates.FirstOrDefault(c => c.Material.Species == lead.Species && c.Material.Origin == OriginClass.Natural);
        string? entry = (!originOpen ? leader
            : natural is { } n && leader is { } l && n.Confidence < NaturalNameShare * l.Confidence ? leader
            : natural)?.Material.Name;
        string named = entry is null || entry == lead.Species ? species : $"{species}: {entry}";
        return originOpen ? $"{named}, origin open" : named;
    }

    /// <summary>
    /// A probability in whole percent; what would print as 0 % or 100 % prints as "&lt;1%" or "&gt;99%", since bench readings
    /// never make a material impossible or certain (and a listed candidate at "0%" reads as ruled out).
    /// </summary>
    /// <summary>A share in whole percent rounded down ("<1%" below one percent), for parts shown side by side.</summary>
    public static string PercentDown(double p) => p is > 0 and < 0.01 ? "<1%" : p >= 0.995 ? ">99%" : GemIndex.Cli.Reports.ReportNumbers.WholePercent(Math.Floor(p * 100) / 100);

    public static string Percent(double p) => p is > 0 and < 0.005 ? "<1%" : p >= 0.995 ? ">99%" : GemIndex.Cli.Reports.ReportNumbers.WholePercent(p);

    public static string Gravity(SpecificGravity? sg) => sg is { } g
        ? $"SG {g}"
        : "SG -";

    /// <summary>A confidence bar of <see cref="BarWidth"/> cells, '#' filled and '.' empty (readable without colour).</summary>
    public static string Bar(double p)
    {
        int filled = (int)Math.Round(Math.Clamp(p, 0, 1) * BarWidth, MidpointRounding.AwayFromZero);
        return new string('#', filled) + new string('.', BarWidth - filled);
    }

    public static string Capital(string s) => s.Length == 0 ? s : char.ToUpperInvariant(s[0]) + s[1..];

    public static string Origin(OriginClass o) => o.ToString().ToLowerInvariant();

    /// <summary>"a, b and c" (<see cref="BenchWarnings.Listed"/>, the one list-in-words).</summary>
    public static string Listed(IReadOnlyList<string> words) => BenchWarnings.Listed(words);

    /// <summary>
    /// The lead: the species best supported and its total over the whole catalogue, how the total splits by origin,
    /// and (when several origins share it) that these tests cannot separate them, with the test that would.
    /// </summary>
    public static IReadOnlyList<string> Lead(IdentificationResult r)
    {
        var lines = new List<string>();
        if (r.NoGoodMatch)
        {
            lines.Add("!! NO GOOD MATCH: nothing in the catalogue fits well");
            lines.Add($"re-check the readings; the stone may be a material the catalogue lacks (not in the catalogue {Percent(r.NotInCatalogue)})");
            if (r.Species.Count > 0) lines.Add($"closest: {r.Species[0].Species} {Percent(r.Species[0].Confidence)}");
            return lines;
        }
        if (r.Species.Count == 0)
        {
            if (r.Candidates.Count > 0) lines.Add($"{Capital(r.Candidates[0].Material.Name)} {Percent(r.Candidates[0].Confidence)}");
            return lines;
        }
        SpeciesResult lead = r.Species[0];
        lines.Add($"{Capital(lead.Species)} {Percent(lead.Confidence)}");
        List<KeyValuePair<OriginClass, double>> origins = Origins(lead);
        // The split in whole percent rounded down, so its parts never add up to more than the species (53.6, 35.6 and
        // 10.8 % had read 54 %, 36 % and 11 %, 101 % in all).
        if (origins.Count > 1) lines.Add("  " + string.Join(", ", origins.Select(o => $"{Origin(o.Key)} {PercentDown(o.Value)}")));
        if (origins.Count > 1) lines.Add(Inseparable(r, lead, origins));
        else if (r.Candidates.Where(c => c.Material.Species == lead.Species && c.Confidence >= BenchWarnings.Relevant).ToList() is [var only]
                 && only.Material.Name != lead.Species)
            // The variety beneath its species ("Forsterite" / "peridot, natural"); a name that says its origin says it once.
            lines.Add(only.Material.Name.Contains(Origin(only.Material.Origin), StringComparison.OrdinalIgnoreCase)
                ? $"  {only.Material.Name}" : $"  {only.Material.Name}, {Origin(only.Material.Origin)}");
        else if (origins is [var one])
            lines.Add($"  {Origin(one.Key)} {Percent(one.Value)}");   // several entries, one origin left (melt-growth signs seen: "synthetic 96%")
        foreach (SpeciesResult other in r.Species.Skip(1).Where(s => s.Confidence >= BenchWarnings.Relevant).Take(2))
            lines.Add($"or {other.Species} {Percent(other.Confidence)}");
        // Two species of one group share the answer: the group's total says what the stone is ("tourmaline group 99%").
        if (r.LeadingGroup is { } group) lines.Add($"{group.Group} group {Percent(group.Total)} in all");
        return lines;
    }

    /// <summary>The origins that hold a relevant share of a species (the same threshold as the engine's warnings), largest first.</summary>
    public static List<KeyValuePair<OriginClass, double>> Origins(SpeciesResult s) =>
        [.. s.Origins.Where(o => o.Value >= BenchWarnings.OriginShare * s.Confidence).OrderByDescending(o => o.Value)];

    /// <summary>
    /// "These tests cannot separate natural and synthetic quartz: …", with what may help. The engine's own warning comes
    /// first (IdentificationResult.InseparableOrigins), since it picks its test among the species' own entries: when
    /// that test is the next test, it is named here
    /// (without the lighting, which the next test below gives); when it is another, the line points to the warnings;
    /// when the engine finds none, a laboratory. Without that warning, the next test is named only when it is expected
    /// to show something different for entries of different origins.
    /// </summary>
    private static string Inseparable(IdentificationResult r, SpeciesResult lead, List<KeyValuePair<OriginClass, double>> origins)
    {
        string which = Listed([.. origins.Select(o => Origin(o.Key))]);
        InseparableOrigins? engine = r.InseparableOrigins is { } held && held.Species == lead.Species ? held : null;
        NextTestAdvice? named = engine is null ? NextTestSeparatesOrigins(r, lead.Species)
            : r.NextTest is { } next && engine.Test?.Description == next.Description ? next : null;
        string remedy = named is not null
            ? $"the {BenchTestWords.DisplayOfWire(named.Test)} may tell some of them apart{(named.LookFor.Count > 0 ? $" (look for {Listed(named.LookFor)})" : "")}"
            : engine?.Test is not null ? "the Warnings below name a test that may"
            : "refer a valuable stone to a qualified laboratory";
        return $"  These tests cannot separate {which} {lead.Species}: {remedy}.";
    }

    /// <summary>
    /// The next test when it is expected to show something different for two entries of the species that differ in
    /// origin (by the advice's own expectations: "sapphire: lines at 450 nm" against "flame-fusion synthetic sapphire:
    /// no diagnostic lines"), else null: a test that tells colours or varieties apart but not origins is not offered as
    /// the way to tell natural from synthetic.
    /// </summary>
    public static NextTestAdvice? NextTestSeparatesOrigins(IdentificationResult r, string species)
    {
        if (r.NextTest is not { } next) return null;
        Dictionary<string, string> expected = [];
        foreach (string e in next.Expectations)
            if (e.IndexOf(": ", StringComparison.Ordinal) is > 0 and var colon) expected.TryAdd(e[..colon], e[(colon + 2)..]);
        List<RankedCandidate> separated = [.. r.Candidates.Where(c => c.Material.Species == species && next.Separates.Contains(c.Material.Name))];
        bool differs = separated.Any(a => separated.Any(b => a.Material.Origin != b.Material.Origin
            && (!expected.TryGetValue(a.Material.Name, out string? ea) || !expected.TryGetValue(b.Material.Name, out string? eb) || ea != eb)));
        return differs ? next : null;
    }

    private static readonly string[] GravityFields = [BenchFields.Sg, BenchFields.AirCt, BenchFields.WaterCt, BenchFields.WaterC];

    /// <summary>What the engine used from the readings, in the reports' words (refused entries are not shown; a refused SG is said to be unused).</summary>
    public static IReadOnlyList<string> Derived(BenchAssessment a)
    {
        var lines = new List<string>();
        if (a.Result?.Series is { } series) lines.AddRange(Series(series, a.Result.SeriesCharacter));
        else if (a.Readings.Refractometer?.Spot is { } spot && !a.Errors.ContainsKey(BenchFields.Spot) && a.Result is not null)
            lines.Add($"Spot reading: {GemIndex.Cli.Reports.ReportNumbers.SpotIndex(spot)}");   // read to 0.01, as typed
        if (a.Readings.Refractometer is { OverLimit: true } && !a.Errors.ContainsKey(BenchFields.OverLimit)) lines.Add("Over the limit: index above the contact liquid");
        if (a.SpecificGravity is { } sg) lines.Add("Specific gravity: " + Gravity(sg)[3..]);
        else if (GravityFields.Any(a.Errors.ContainsKey)) lines.Add("Specific gravity: none used (the SG page, F4, says why)");
        if (a.Result is not null) lines.AddRange(OtherTests(a.Readings, a.Errors));
        return lines;
    }

    /// <summary>The other tests the answer used, in the words of the pages they were typed on (every reading that parsed is weighed).</summary>
    private static IEnumerable<string> OtherTests(StoneReadings r, IReadOnlyDictionary<string, string> refused)
    {
        if (r.HeavyLiquids.Count > 0)
            yield return "Heavy liquids: " + string.Join("; ", r.HeavyLiquids.Select(h => $"{h.Density.ToString("0.00", System.Globalization.CultureInfo.InvariantCulture)} {h.Result.Replace('_', ' ')}"));
        // A refused answer was left out of the answer: not listed as used.
        foreach (var (field, word) in r.ChoiceWords)
            if (word is not null && !refused.ContainsKey(field) && BenchChoice.For(field) is var choice)
                yield return $"{choice.Label}: {choice.Show(word)}"
                    + (r.Transparency == "opaque" && EvidenceLikelihood.ShownByAnyOpaqueStone(field, word) ? " (not weighed: the stone is opaque)" : "");
        if (r.DispersionIndices is { } nb) yield return $"Dispersion: RI at B {Index(nb.NB)}, at G {Index(nb.NG)}";
        if (r.ReflectancePct is { } reflectance && !refused.ContainsKey(BenchFields.Reflectance) && GemIndex.Cli.Reports.ReportReadings.ReflectanceText(reflectance) is { } said)
            yield return "Reflectance: " + said;
        if (r.AbsorptionNm is { } lines)
            yield return lines.Count == 0 ? "Absorption: no lines" : "Absorption: " + string.Join(", ", lines.Select(n => n.ToString("0.#", CultureInfo.InvariantCulture))) + " nm";
        if (r.Colour is { } c) yield return $"Colour: {c}";
        if (r.Transparency is { } light) yield return $"Transparency: {light}";
        if (r.FeaturesPresent.Count + r.FeaturesAbsent.Count > 0)
            yield return $"Loupe: {r.FeaturesPresent.Count} seen, {r.FeaturesAbsent.Count} looked for and not seen";
    }

    private static IEnumerable<string> Series(RotationSeriesResult s, OpticCharacterPosterior? odds)
    {
        // What the readings say of the character, by the section model (and the dichroscope, when it entered: said so);
        // the interpretations below give the indices.
        if (odds is not null)
            yield return "Optic character" + (odds.TakesDichroscope ? " (with the dichroscope)" : "") + ": " + GemIndex.Cli.Reports.ReportDerived.CharacterOdds(odds, Percent, s);
        if (s.Interpretations.Count == 0)
        {
            yield return "Optic character: not fixed by the series" + (s.UndeterminedReason.Length > 0 ? ": " + s.UndeterminedReason : "");
            yield break;
        }
        SeriesInterpretation best = s.Interpretations.MaxBy(i => i.Weight)!;
        if (odds is null)
            yield return "Optic character: " + (s.Character is { } c ? Character(c)
                : "not fixed by the series" + (s.UndeterminedReason.Length > 0 ? ": " + s.UndeterminedReason : ""));
        bool single = best.Beta is null && best.Lowest.Value == best.Highest.Value;
        // A biaxial reading whose β the series leaves at one of two values (the highest low edge or the lowest high edge)
        // says both, and no 2V: picking one would give a 2V and a sign the readings do not fix.
        var betas = s.Interpretations.Where(i => i.Character == OpticCharacter.Biaxial && i.Beta is not null && i.Weight >= BenchWarnings.Relevant)
            .Select(i => i.Beta!.Value.Value).Distinct().Order().ToList();
        if (best.Beta is not null && betas.Count > 1)
        {
            string high = best.AboveLiquidLimit is { } above ? GemIndex.Cli.Reports.ReportDerived.AboveTheLiquid(above, best.Highest.Value) : Index(best.Highest.Value);
            yield return $"Refractive indices: α {Index(best.Lowest.Value)}, β {string.Join(" or ", betas.Select(Index))}, γ {high}";
        }
        else
            // ω and ε only under a settled sign: which edge is ω is the sign.
            yield return (single ? "Refractive index: " : "Refractive indices: ") + GemIndex.Cli.Reports.ReportDerived.Indices(best.Character == OpticCharacter.Uniaxial,
                Sign(s) ?? "", best.Lowest.Value, best.Highest.Value, best.Beta?.Value, best.AboveLiquidLimit) + (best.Beta is not null && best.AboveLiquidLimit is null ? TwoV(best) : "");
        if (best.AboveLiquidLimit is { } limit) yield return "Birefringence: " + GemIndex.Cli.Reports.ReportDerived.AtLeast(best.Lowest.Value, limit, best.Highest.Value);
        else if (best.Birefringence.Value > 0) yield return $"Birefringence: {Index(GemIndex.Core.Optics.Birefringence.OfShownIndices(best.Highest.Value, best.Lowest.Value))}";
        if (Sign(s) is { } sign) yield return "Optic sign: " + sign;
    }

    /// <summary>The optic character in the bench's words: one index is "singly refractive", as the polariscope says it.</summary>
    public static string Character(OpticCharacter c) => c switch
    {
        OpticCharacter.Isotropic => "singly refractive (isotropic)",
        OpticCharacter.Amorphous => "singly refractive (amorphous)",
        _ => c.ToString().ToLowerInvariant(),
    };

    /// <summary>The sign in words, or "not fixed" when the series' interpretations that count disagree on it.</summary>
    private static string? Sign(RotationSeriesResult s)
    {
        var counted = s.Interpretations.Where(i => i.Weight >= BenchWarnings.Relevant).ToList();
        // A reading whose sign rests on an index above the liquid leaves the sign open.
        if (counted.Any(i => i.SignOpen)) return "not fixed (γ lies above the liquid)";
        List<OpticSign> signs = [.. counted.Where(i => i.Sign is OpticSign.Positive or OpticSign.Negative).Select(i => i.Sign).Distinct()];
        return signs.Count switch
        {
            0 => null,
            1 => signs[0] == OpticSign.Positive ? "positive" : "negative",
            _ => "not fixed (positive and negative both fit the series)",
        };
    }

    private static string TwoV(SeriesInterpretation i)
    {
        try
        {
            Angle? v = Indicatrix.Biaxial(i.Lowest, i.Beta!.Value, i.Highest).OpticAxialAngle;
            return v is { } angle ? $"; 2V {angle.Degrees.ToString("0", CultureInfo.InvariantCulture)}°" : "";
        }
        catch (ArgumentException) { return ""; }   // β not strictly between α and γ: no 2V to show
    }

    /// <summary>One candidate row: rank, name (already fitted), confidence and, when there is room, a bar.</summary>
    public static string Candidate(int rank, string name, int nameWidth, double confidence, bool bar, int rankWidth = 1) =>
        $"{rank.ToString(CultureInfo.InvariantCulture).PadLeft(rankWidth)} {name.PadRight(nameWidth)} {Percent(confidence),4}{(bar ? " " + Bar(confidence) : "")}";

    /// <summary>The next test in words: what it separates and what each would show (its strength in numbers is in the detail view).</summary>
    public static IReadOnlyList<string> NextTest(NextTestAdvice? advice) => advice is null ? [] :
    [
        $"Next test: {advice.Description}",
        // How well, in the same words as the reports ("it would partly separate"): a colour call is not settled by a loupe.
        .. advice.Separates.Count > 1 ? [$"  it would {GemIndex.Cli.Reports.ReportDerived.Separation(advice.GainBits)} {advice.SeparatesInWords}"] : Array.Empty<string>(),
        .. advice.Expectations.Select(e => "  " + e),
        .. GemIndex.Cli.Reports.ReportCautions.ForTest(advice.Test) is { } caution ? ["  " + caution] : Array.Empty<string>(),
    ];

    public static string Clip(string s, int width) => s.Length <= width ? s : s[..Math.Max(0, width - 1)] + "…";
}
