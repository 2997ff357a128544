using System.Globalization;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Observations;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Core.Readings;

namespace GemIndex.Core.Identification;

/// <summary>The warnings a bench user needs with an answer: misreadings, over the limit, porous candidates,
/// natural versus synthetic, composites and treatments, poor SG precision, nothing fitting.</summary>
public static class BenchWarnings
{
    /// <summary>A candidate at or above this confidence is worth warning about.</summary>
    public const double Relevant = 0.05;

    /// <summary>
    /// A test weighing this much or more against the leading candidate, with its reading outside what the candidate shows,
    /// is named in a warning (ten to one against: log₂ 10 bits; a judgement, docs/ranking.md §5, a reading against the leader).
    /// </summary>
    public const double ContradictionBits = 3.32;

    /// <summary>
    /// Whether a test's reading speaks strongly against a candidate: weighing <see cref="ContradictionBits"/> or more
    /// against it, its reading outside what the candidate shows. Colour aside: a colour outside a variety's usual ones
    /// names another variety, not a misreading.
    /// </summary>
    internal static bool SpeaksAgainst(string test, double weightBits, bool agrees) =>
        !agrees && weightBits <= -ContradictionBits && test != Bench.BenchField.Colour;

    /// <summary>An SG standard uncertainty above this is named as large: SG then separates little (a judgement, docs/ranking.md §5).</summary>
    public const double LargeGravityUncertainty = 0.03;

    /// <summary>An origin holding at least this share of its species' total is one the tests have not ruled out.</summary>
    public const double OriginShare = 0.05;

    /// <summary>
    /// Entries of the leading species' leading origin that each hold at least this share of that origin are varieties the
    /// answer has not settled (a fifth: a judgement, docs/ranking.md §5, "Varieties").
    /// </summary>
    public const double VarietyShare = 0.2;

    /// <summary>
    /// Varieties are named only once the species is settled this far (half: a judgement, docs/ranking.md §5,
    /// "Varieties"); while the species is open the next test is about the species.
    /// </summary>
    public const double SettledSpecies = 0.5;

    /// <summary>
    /// Entries below this posterior are left out when a test is sought to tell a species' origins or a group's species
    /// apart (a ten-thousandth: a judgement, docs/ranking.md §5, other named values); they could not move the answer.
    /// </summary>
    public const double AdvisedEntryShare = 1e-4;

    /// <summary>Warnings for one answer, most important first.</summary>
    /// <param name="sheet">The analysed sheet.</param>
    /// <param name="candidates">The candidates shown.</param>
    /// <param name="notInCatalogue">P(not in the catalogue).</param>
    /// <param name="noGoodMatch">Whether nothing fits.</param>
    /// <param name="species">Species totals over the whole catalogue, best first.</param>
    /// <param name="separation">The test that would best tell the leading species' entries apart, if any.</param>
    /// <param name="leaderReasons">The leading candidate's reasons, each test weighed (empty: none worked out).</param>
    /// <param name="varieties">The leading species' unsettled varieties (<see cref="InseparableVarieties"/>) and the test that best tells them apart.</param>
    /// <param name="group">The species of the leading species' mineral group that the answer leaves open (<see cref="InseparableGroup"/>) and the test that best tells them apart.</param>
    /// <param name="advisedTests">Filled with the tests the warnings advise (batch words), whose cautions go with them.</param>
    /// <param name="keepDry">The entries to keep dry (<see cref="IdentificationResult.KeepDry"/>); without it, those among <paramref name="serious"/>.</param>
    /// <param name="serious">
    /// Every entry of the whole catalogue holding at least <see cref="Relevant"/>, in the answer's order: the cautions (do not
    /// immerse, trade rules, composites, treatments) come from these, so none is lost when fewer candidates are shown;
    /// without it, the candidates shown.
    /// </param>
    public static IReadOnlyList<string> For(AnalysedSheet sheet, IReadOnlyList<RankedCandidate> candidates, double notInCatalogue, bool noGoodMatch,
        IReadOnlyList<SpeciesResult>? species = null, NextTestAdvice? separation = null, IReadOnlyList<EvidenceContribution>? leaderReasons = null,
        (IReadOnlyList<Material> Entries, NextTestAdvice? Test)? varieties = null, (GroupSpecies Open, NextTestAdvice? Test)? group = null,
        IReadOnlyList<(Material Material, double Confidence)>? serious = null, IReadOnlyList<string>? keepDry = null,
        ICollection<string>? advisedTests = null)
    {
        var warnings = new List<string>();
        if (sheet.Sheet.IsEmpty)
            warnings.Add("No readings were given: this ranking is the catalogue's frequencies alone, not an identification.");
        if (noGoodMatch)
            warnings.Add($"Nothing in the catalogue fits these readings well (best fit {P(candidates[0].Fit)}, not in the catalogue {P(notInCatalogue)}): re-check the readings, or the stone may be a material the catalogue lacks.");
        if (sheet.Series is { } series)
        {
            warnings.AddRange(series.Misreadings.Select(m => "Likely misreading: " + m + "."));
            // Steps with a low edge only, well below the other steps' high edges: the high edge passed the liquid there.
            if (sheet.Sheet.Refractometer is { } liquid && series.HighHiddenBy(liquid.LiquidLimit))
                warnings.Add($"High edge not seen at {series.HighHiddenAtDegrees.Count} of {liquid.Steps.Count} steps "
                    + $"({string.Join(", ", series.HighHiddenAtDegrees.Select(d => d.ToString("0.#", CultureInfo.InvariantCulture) + "°"))}): it lay above the liquid's "
                    + $"{liquid.LiquidLimit.ToString("0.000", CultureInfo.InvariantCulture)} there, so the highest index is only known to be higher and the birefringence "
                    + "is a least value; the low edges of those steps are weighed.");
            // Three colours in the dichroscope already say biaxial (common practice): the series then leaves open only
            // what the edges alone give, β and the sign.
            if (series.Character is null && series.UndeterminedReason.Length > 0)
                warnings.Add(sheet.Sheet.Pleochroism == PleochroismObservation.Trichroic
                    ? "Biaxial by the dichroscope's three colours; the rotation series leaves β and the optic sign open: " + series.UndeterminedReason.Replace("to fix the optic character", "to fix them", StringComparison.Ordinal) + "."
                    : "Optic character undetermined: " + series.UndeterminedReason + Decided(sheet) + ".");
        }
        if (sheet.Sheet.Refractometer is { OverLimit: true } r)
            warnings.Add(r.Steps.Count > 0
                ? $"Over the limit: the high edge lies above the liquid's {r.LiquidLimit.ToString("0.00", CultureInfo.InvariantCulture)}; only the low edge was read, so the highest index is only known to be higher. {OverLimitHelp(sheet.Sheet)} can go further."
                : $"Over the limit: no stone edge below {r.LiquidLimit.ToString("0.00", CultureInfo.InvariantCulture)}; the index is only known to be higher. {OverLimitHelp(sheet.Sheet)} can go further.");
        // A spot reading is the method for curved surfaces; a faceted stone's table gives the sharp edges of a rotation series
        // (common practice), which tell far more (the optic character, the birefringence).
        if (sheet.Sheet.Refractometer is { Spot: not null, Steps.Count: 0 } && sheet.Sheet.Cut == StoneCut.Faceted)
            warnings.Add("A spot reading on a faceted stone: a facet (the table) gives sharp shadow edges; read them as the stone turns, which the answer weighs far more than a spot.");
        // The same rotation read twice (not a half turn apart, which confirms a reading): both are weighed as two looks
        // at one orientation; a second reading meant to correct the first should replace it.
        if (sheet.Sheet.Refractometer is { Steps.Count: > 1 } read && RepeatedRotations(read.Steps) is { Count: > 0 } repeated)
            warnings.Add($"Rotation {Listed([.. repeated.Select(a => a.ToString("0.#", CultureInfo.InvariantCulture) + "°")])} read more than once: the answer weighs every reading as another look at that orientation; if a later one corrects an earlier, replace it.");
        if (sheet.Sheet.SpecificGravity is { } measured)
            foreach (var h in sheet.Sheet.HeavyLiquids.Where(h => Contradicts(measured, h)))
                warnings.Add($"SG {measured.Value.ToString("0.00", CultureInfo.InvariantCulture)} and the heavy liquid {h.Liquid.Value.ToString("0.00", CultureInfo.InvariantCulture)} ({EvidenceLikelihood.Word(h.Outcome)}) disagree: a stone of that SG would {Expected(measured, h)} in it. Check both; the answer weighs both as read.");
        // Heavy liquids no SG satisfies together (sinks in the lighter, floats in the denser): one of them is misread.
        if (sheet.Sheet.HeavyLiquids.Count > 1 && Gravity.HeavyLiquidResult.Together(sheet.Sheet.HeavyLiquids) is null)
            warnings.Add($"The heavy liquids contradict each other ({string.Join("; ", sheet.Sheet.HeavyLiquids.Select(h => $"{h.Liquid.Value.ToString("0.00", CultureInfo.InvariantCulture)} {EvidenceLikelihood.Word(h.Outcome)}"))}): no SG does all of that. Check them; the answer weighs them as read.");
        // A series whose pattern shows one uniaxial sign while the leader has the other: the likelihood may still favour the
        // leader (no entry of the other sign has its indices), but the bench should look again at which edge stays still.
        if (!noGoodMatch && candidates.Count > 0 && SignClash(sheet.Series, candidates) is { } clash) warnings.Add(clash);
        // A reading that speaks strongly against the answer's own leader: most often a misreading, so it is named.
        if (!noGoodMatch && candidates.Count > 0)
            foreach (var reason in (leaderReasons ?? []).Where(r => SpeaksAgainst(r.Test, r.WeightBits, r.Agrees)))
                warnings.Add($"Unusual for {candidates[0].Material.Name}, {Bench.BenchTestWords.DisplayOfWire(reason.Test)}: {reason.Text}. Re-check it; the answer weighs it as read.");
        if (sheet.Sheet.SpecificGravity is { StandardUncertainty: > LargeGravityUncertainty } sg)
            warnings.Add($"SG uncertainty ±{sg.StandardUncertainty.ToString("0.00", CultureInfo.InvariantCulture)} is large (a small stone or a coarse balance): SG separates little here.");
        var (dark, oneColour, noFire) = sheet.OpaqueStoneShows;
        if (new[] { (dark, "the polariscope's 'stays dark'"), (oneColour, "the dichroscope's one colour"), (noFire, "no fire") }
                .Where(x => x.Item1).Select(x => x.Item2).ToList() is { Count: > 0 } nothing)
            warnings.Add($"Opaque stone: {Listed(nothing)} {(nothing.Count > 1 ? "are" : "is")} what any opaque stone shows, so {(nothing.Count > 1 ? "they are" : "it is")} not weighed.");
        if (ReadThroughAnOpaqueStone(sheet.Sheet) is { Count: > 0 } through)
            warnings.Add($"Opaque stone, yet {Listed(through)} {(through.Count > 1 ? "were" : "was")} read: {(through.Count > 1 ? "these need" : "it needs")} light through the stone. "
                + $"If light passes at a thin edge, call it translucent; else leave {(through.Count > 1 ? "them" : "it")} out. The answer weighs {(through.Count > 1 ? "them" : "it")} as read.");
        var relevant = serious?.ToList() ?? [.. candidates.Where(c => c.Confidence >= Relevant).Select(c => (c.Material, c.Confidence))];
        // The reason, not the entry's notes (an emerald's chromium lines say nothing of why it must stay dry); one line
        // for all such entries, as for the trade rules.
        if ((keepDry ?? [.. relevant.Where(c => c.Material.DoNotImmerse).Select(c => c.Material.Name)]) is { Count: > 0 } dry)
            warnings.Add($"Possible {KeepDryListed(dry)}: do not immerse (no heavy liquids, and no water unless the stone is known to take it) — a porous, soft, filled or organic stone can take in liquid or be harmed, and its SG in a liquid misleads; amber and copal take the saturated brine test, a doublet's join is looked for in water, a porous stone takes neither.");
        // Entries that share a rule (black and golden coral) are named together, the rule said once.
        foreach (var rule in relevant.Where(c => c.Material.TradeRule is not null).GroupBy(c => c.Material.TradeRule!))
            warnings.Add($"Possible {Listed([.. rule.Select(c => c.Material.Name)])}: {rule.Key.Text}. Check the rules where you buy, sell or ship {(rule.Count() > 1 ? "them" : "it")} (a summary, not legal advice).");
        if (sheet.UnknownColourWords.Count > 0)
            warnings.Add($"Colour word{(sheet.UnknownColourWords.Count > 1 ? "s" : "")} '{string.Join("', '", sheet.UnknownColourWords)}' not known: no colour evidence taken from {(sheet.UnknownColourWords.Count > 1 ? "them" : "it")} (known hues: {ColourWords.KnownHuesInWords}).");
        var leading = species ?? [.. relevant.GroupBy(c => c.Material.Species).Select(g => new SpeciesResult
        {
            Species = g.Key, Confidence = g.Sum(c => c.Confidence),
            Origins = g.GroupBy(c => c.Material.Origin).ToDictionary(o => o.Key, o => o.Sum(c => c.Confidence)),
        })];
        for (int i = 0; i < leading.Count && leading[i].Confidence >= Relevant; i++)
        {
            if (Inseparable(leading[i]) is not { } held) continue;
            var origins = held.Select(o => o.ToString().ToLowerInvariant()).ToList();
            string test = i == 0 && separation is { } next
                ? $"the {next.Description} would help"
                : i == 0 ? "no bench test left here separates them" : "";
            if (i == 0 && separation is { } advised) advisedTests?.Add(advised.Test);
            string laboratory = OnlyLaboratoryTells(held) ? " (its X-radiography tells cultured from natural)" : "";
            warnings.Add($"{Capital(leading[i].Species)}: {Listed(origins)} cannot be separated by these tests{(test.Length > 0 ? "; " + test : "")}; for a valuable stone refer it to a qualified laboratory{laboratory}.");
        }
        // Species of one mineral group the tests leave open (elbaite, uvite and dravite of the tourmalines), and what would tell them.
        if (!noGoodMatch && group is { } g)
        {
            // A group's species differ in chemistry: a bench test can only hint (through the entries' listed lines or
            // glow), and a laboratory's analysis settles them.
            if (g.Test is { } hinting) advisedTests?.Add(hinting.Test);
            warnings.Add($"{Capital(g.Open.Group)} group: {Listed(g.Open.Species)} are not told apart by these tests; "
                + (g.Test is { } tells ? $"the {tells.Description} may hint, and a laboratory's analysis settles it." : "a laboratory's analysis settles it."));
        }
        // Varieties of one origin the tests leave open (cat's-eye or plain chrysoberyl, CVD or HPHT growth), and what would tell them.
        // The test the origin warning names already tells these varieties apart too: one line says it.
        if (!noGoodMatch && varieties is { Entries.Count: > 1 } open && leading.Count > 0
            && !(open.Test is { } same && separation is { } origin && Inseparable(leading[0]) is not null && same.Test == origin.Test && same.LookFor.SequenceEqual(origin.LookFor)))
        {
            // Colour is no test the advisor weighs (it is always seen): when none was written and the varieties' usual
            // colours begin with different hues, writing it down is the advice.
            bool colourWouldHelp = string.IsNullOrWhiteSpace(sheet.Sheet.Colour)
                && open.Entries.Select(m => string.Join('|', m.Colours.Take(1).SelectMany(ColourWords.PrincipalHues).Order())).Distinct().Count() > 1;
            // Varieties named by their colours are told apart by the colour first (rock crystal from amethyst, not by the SG).
            if (!colourWouldHelp && open.Test is { } helping) advisedTests?.Add(helping.Test);
            warnings.Add($"{Capital(leading[0].Species)}: {Listed([.. open.Entries.Select(m => m.Name)])} are not told apart by these tests; "
                + (colourWouldHelp ? "its colour, written down, would help." : open.Test is { } tells ? $"the {tells.Description} would help." : "no bench test left here separates them."));
        }
        if (leading.Count > 0 && LaboratoryCaution(leading[0], sheet) is { } caution) warnings.Add(caution);
        if (relevant.Any(c => c.Material.Origin == OriginClass.Composite))
            warnings.Add(sheet.Sheet.Magnification?.Present.Contains(Magnification.MagnificationFeature.JoinPlane) == true
                ? "Assembled stone: a join plane was seen; the refractometer reads only the part it touches, and the SG of a composite means little."
                : "Possible composite: the refractometer reads only the facet it touches, and the SG of a composite means little; look at the girdle and for a join under magnification.");
        if (relevant.Any(c => c.Material.Origin == OriginClass.Treated))
            warnings.Add("A treated material is among the likely materials (5 % or more): treatments are mostly not detectable with these tests.");
        return warnings;
    }

    /// <summary>
    /// The readings of an opaque stone that only light through a stone shows: a polariscope reaction but "stays dark",
    /// two or three colours in the dichroscope, fire seen by eye. Measured nB and nG are refractometer readings, taken
    /// by reflection, and stay out.
    /// </summary>
    internal static List<string> ReadThroughAnOpaqueStone(BenchSheet s)
    {
        var read = new List<string>();
        if (s.Transparency != StoneTransparency.Opaque) return read;
        if (s.Polariscope is { } p and not PolariscopeReaction.SinglyRefractive) read.Add($"the polariscope ({EvidenceLikelihood.Word(p)})");
        if (s.Pleochroism is { } d and not PleochroismObservation.None) read.Add($"the dichroscope ({EvidenceLikelihood.Word(d)})");
        if (s.Dispersion?.Seen is { } fire and not DispersionStrength.None) read.Add($"fire by eye ({EvidenceLikelihood.Word(fire)})");
        return read;
    }

    /// <summary>
    /// "The readings show a uniaxial positive pattern (the low edge stays still), but corundum is uniaxial negative", when
    /// every reading of the series that has a sign gives the one the leader lacks; else null. A summary of the readings
    /// for the bench to re-check, never evidence: the ranking weighs the raw readings.
    /// </summary>
    /// <summary>The rotation angles read at more than one step (within a hundredth of a degree), in the order first read.</summary>
    internal static List<double> RepeatedRotations(IReadOnlyList<ShadowEdgeStep> steps) =>
        [.. steps.Select(x => x.RotationDegrees).Where((a, i) => steps.Take(i).Count(x => Math.Abs(x.RotationDegrees - a) < 0.01) == 1)];

    private static string? SignClash(RotationSeriesResult? series, IReadOnlyList<RankedCandidate> candidates)
    {
        Material leader = candidates[0].Material;
        if (series is not { Character: OpticCharacter.Uniaxial } || leader.OpticCharacter != OpticCharacter.Uniaxial
            || leader.Sign is not (OpticSign.Positive or OpticSign.Negative)) return null;
        // Only when the leading species has one sign among the candidates (a user's own entry may give it the other).
        if (candidates.Any(c => c.Material.Species == leader.Species && c.Material.Sign != leader.Sign)) return null;
        var signs = series.Interpretations.Where(i => i.Character == OpticCharacter.Uniaxial).Select(i => i.Sign).Distinct().ToList();
        if (signs is not [var shown] || shown == leader.Sign) return null;
        string Word(OpticSign s) => s == OpticSign.Positive ? "positive" : "negative";
        string still = shown == OpticSign.Positive ? "low" : "high";
        return $"The readings show a uniaxial {Word(shown)} pattern (the {still} edge stays still as the stone turns), but {leader.Species} is uniaxial {Word(leader.Sign)}: re-check which edge stays still, or the stone is not {leader.Species}. The answer weighs the readings as read.";
    }

    /// <summary>
    /// Whether these inseparable origins include a cultured and a natural kind: they differ in their core, which only a
    /// laboratory's X-radiography shows (common practice), so no bench test is offered for them.
    /// </summary>
    internal static bool OnlyLaboratoryTells(IReadOnlyList<OriginClass> held) => held.Contains(OriginClass.Cultured) && held.Contains(OriginClass.Natural);

    /// <summary>The species' origins that each hold at least <see cref="OriginShare"/> of it, likeliest first, when there are two or more and the species is relevant; else null.</summary>
    internal static IReadOnlyList<OriginClass>? Inseparable(SpeciesResult species)
    {
        if (species.Confidence < Relevant) return null;
        // Likeliest first, as the species line lists them.
        var held = species.Origins.Where(o => o.Value >= OriginShare * species.Confidence).OrderByDescending(o => o.Value).Select(o => o.Key).ToList();
        return held.Count < 2 ? null : held;
    }

    /// <summary>
    /// The entries of the leading species' leading origin (the first on a tie) that each hold at least
    /// <see cref="VarietyShare"/> of that origin, with their posteriors over the whole catalogue, when the species is
    /// settled (<see cref="SettledSpecies"/>) and there are two or more; else null.
    /// </summary>
    internal static IReadOnlyList<(Material Material, double Probability)>? InseparableVarieties(IReadOnlyList<SpeciesResult> species,
        IReadOnlyList<Material> materials, IReadOnlyList<double> posterior)
    {
        if (species.Count == 0 || species[0].Confidence < SettledSpecies || species[0].Origins.Count == 0) return null;
        var lead = species[0];
        var (origin, total) = lead.Origins.MaxBy(o => o.Value);
        var held = new List<(Material, double)>();
        for (int i = 0; i < materials.Count; i++)
            if (materials[i].Species == lead.Species && materials[i].Origin == origin && posterior[i] >= VarietyShare * total) held.Add((materials[i], posterior[i]));
        return held.Count < 2 ? null : [.. held.OrderByDescending(h => h.Item2)];   // likeliest first; a tie keeps the catalogue's order
    }

    /// <summary>
    /// The species of the leading species' mineral group that each hold at least <see cref="Relevant"/>, with the group's
    /// entries of those species and their posteriors, when the group is settled (<see cref="SettledSpecies"/>) and there
    /// are two or more such species; else null. The same species as the answer's group line
    /// (<see cref="IdentificationResult.LeadingGroup"/>).
    /// </summary>
    internal static (GroupSpecies Open, IReadOnlyList<(Material Material, double Probability)> Entries)? InseparableGroup(
        IReadOnlyList<SpeciesResult> species, IReadOnlyList<Material> materials, IReadOnlyList<double> posterior)
    {
        if (species.Count == 0 || species[0].MineralGroup is not { } group) return null;
        var members = species.Where(s => s.MineralGroup == group).ToList();
        double total = members.Sum(s => s.Confidence);
        // The species the answer's group line names (IdentificationResult.LeadingGroup): the warning names the same.
        var held = members.Where(s => s.Confidence >= Relevant).Select(s => s.Species).ToList();
        if (total < SettledSpecies || held.Count < 2) return null;
        var entries = new List<(Material, double)>();
        for (int i = 0; i < materials.Count; i++)
            if (held.Contains(materials[i].Species) && posterior[i] > AdvisedEntryShare) entries.Add((materials[i], posterior[i]));
        return (new GroupSpecies(group, total, held), entries);
    }

    /// <summary>
    /// When one origin leads its species but the species is also met treated or laboratory-grown, the answer is only as
    /// good as the tests done: many treatments and some growth methods (HPHT and CVD diamond among them) leave no
    /// sign a loupe can find, so the laboratory caution stays even after magnification.
    /// </summary>
    private static string? LaboratoryCaution(SpeciesResult leading, AnalysedSheet sheet)
    {
        if (leading.Confidence < Relevant) return null;
        var held = leading.Origins.Where(o => o.Value >= OriginShare * leading.Confidence).Select(o => o.Key).ToList();
        if (held.Count != 1) return null; // several origins held: the warning above already says they cannot be separated
        var hidden = leading.Origins.Keys.Where(o => o != held[0] && o is OriginClass.Treated or OriginClass.Synthetic or OriginClass.Cultured)
            .Select(o => o switch { OriginClass.Treated => "treated", OriginClass.Synthetic => "laboratory-grown", _ => "cultured" }).ToList();
        if (hidden.Count == 0) return null;
        string looked = sheet.Sheet.Magnification is { AnyLooked: true } ? "even with the magnification recorded, " : "";
        // Only what the hidden origins can hide: a spinel met laboratory-grown is not told of fillers.
        bool treated = hidden.Contains("treated"), grown = hidden.Contains("laboratory-grown"), cultured = hidden.Contains("cultured");
        string unseen;
        if (leading.Species == "diamond")
            unseen = treated && grown ? "HPHT and CVD growth and HPHT colour treatment leave no sign these tests find"
                : grown ? "HPHT and CVD growth leave no sign these tests find" : "HPHT colour treatment leaves no sign these tests find";
        else
        {
            var hiders = new List<string>();
            if (treated) hiders.Add(hidden.Count == 1 ? "many treatments (heating, filling, dyeing, irradiation, coating)" : "many treatments");
            if (grown) hiders.Add("some laboratory growth");
            // A pearl's nucleus or its lack shows on X-radiographs, not at the bench.
            if (cultured) hiders.Add("culturing");
            unseen = $"{Listed(hiders, "and")} {(treated || hiders.Count > 1 ? "leave" : "leaves")} no sign these tests find";
        }
        return $"{Capital(leading.Species)} is also found {string.Join(" and ", hidden)}: {looked}{unseen}; for a valuable stone refer it to a qualified laboratory.";
    }

    /// <summary>
    /// What the section model makes of the edges when the steps alone leave the character open, if it settles it (one
    /// character at <see cref="CharacterSettled"/> or more): "; the edges as read still point to biaxial (96 %)" (the
    /// answer had said "biaxial 96 %" beside "undetermined" without a word on how the two agree).
    /// </summary>
    private static string Decided(AnalysedSheet sheet)
    {
        if (sheet.Character?.Value is not { } c) return "";
        (string Name, double P)[] parts = [("singly refractive", c.Isotropic), ("uniaxial", c.Uniaxial), ("biaxial", c.Biaxial)];
        var best = parts.MaxBy(p => p.P);
        return best.P >= CharacterSettled
            ? $"; weighed by the section model, the edges as read still point to {best.Name} ({(best.P >= 0.995 ? ">99" : (best.P * 100).ToString("0", CultureInfo.InvariantCulture))} %)"
            : "";
    }

    /// <summary>The share of one character that the undetermined warning reports as where the edges point (a judgement of wording).</summary>
    public const double CharacterSettled = 0.9;

    /// <summary>"SG, dispersion, the thermal probe or a reflectance meter (or a prism method)": the tests that go beyond a refractometer's limit, leaving out those already done.</summary>
    private static string OverLimitHelp(BenchSheet s)
    {
        List<string> help = [];
        if (s.SpecificGravity is null) help.Add("SG");   // heavy liquids bound it; a measured SG still parts diamond, YAG and CZ
        if (s.Dispersion is null) help.Add("dispersion");
        if (s.ThermalProbe is null) help.Add("the thermal probe");
        // The reflectance meter, once read, is done; the prism method is not a reading the tool takes (calc prism works it out).
        help.Add(s.Reflectance is null ? "a reflectance meter (or a prism method)" : "a prism method");
        return Capital(Listed(help, "or"));
    }

    /// <summary>The stones to keep dry named in a caution, at most this many before "and N more" (judgement: the caution must be read).</summary>
    public const int KeepDryNamed = 3;

    /// <summary>
    /// The stones to keep dry, most probable first, the first <see cref="KeepDryNamed"/> by name and the rest counted
    /// ("amber, copal, pressed amber and 3 more candidates"): six names had made the caution a paragraph.
    /// </summary>
    public static string KeepDryListed(IReadOnlyList<string> names) =>
        names.Count <= KeepDryNamed + 1 ? Listed(names) : string.Join(", ", names.Take(KeepDryNamed)) + $" and {names.Count - KeepDryNamed} more candidates";

    /// <summary>Words joined as a list is read: "natural and synthetic", "natural, treated and synthetic".</summary>
    public static string Listed(IReadOnlyList<string> words, string conjunction = "and") =>
        words.Count < 2 ? string.Join("", words) : string.Join(", ", words.Take(words.Count - 1)) + $" {conjunction} " + words[^1];

    private static string P(double p) => p.ToString("0.00", CultureInfo.InvariantCulture);

    private static string Capital(string s) => s.Length == 0 ? s : char.ToUpperInvariant(s[0]) + s[1..];

    /// <summary>
    /// A measured SG and a heavy-liquid result disagree when the SG lies beyond what the result allows by more than
    /// <see cref="HeavyLiquidClashCoverage"/> standard uncertainties of the SG (and the suspension's own tolerance).
    /// </summary>
    internal static bool Contradicts(Gravity.SpecificGravity sg, Gravity.HeavyLiquidResult h)
    {
        double margin = HeavyLiquidClashCoverage * sg.StandardUncertainty;
        return sg.Value + margin < h.LowestSpecificGravity || sg.Value - margin > h.HighestSpecificGravity;
    }

    /// <summary>Two standard uncertainties (about 95 %; common practice in measurement) before a clash is said.</summary>
    public const double HeavyLiquidClashCoverage = 2;

    private static string Expected(Gravity.SpecificGravity sg, Gravity.HeavyLiquidResult h) =>
        Math.Abs(sg.Value - h.Liquid.Value) <= h.Tolerance ? "stay suspended" : sg.Value > h.Liquid.Value ? "sink" : "float";
}
