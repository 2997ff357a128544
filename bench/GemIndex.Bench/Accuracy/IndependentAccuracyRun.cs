using System.Diagnostics;
using System.Globalization;
using GemIndex.Bench.Independent;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Magnification;
using GemIndex.Core.Optics.Indicatrix;

namespace GemIndex.Bench.Accuracy;

/// <summary>
/// The independent accuracy benchmark (docs/benchmark.md): stones drawn from the independent property table, written as
/// batch lines, ranked by the engine through <see cref="BatchLineAdapter"/> and by the printed-table baseline, and scored
/// by species: top-1 and top-3 on the stones the evidence separates and on all stones, "nothing fits" on catalogue
/// stones, the not-in-catalogue case, the calibration of the leading species' confidence, and origin within species,
/// without magnification, with it, and with a feature seen that points at the stone's origin.
/// </summary>
internal static class IndependentAccuracyRun
{
    /// <summary>Stones run through the not-in-catalogue case (each needs its own reduced catalogue).</summary>
    private const int RemovedSpeciesStones = 1000;

    /// <summary>A confidence at or above this is a confident call (issue 14's target line).</summary>
    private const double Confident = 0.8;

    public static void Run(IReadOnlyList<Material> catalogue, int stones, int seed, TextWriter o, TextWriter? failures = null, TextWriter? lines = null,
        double lookShare = LoupeExaminer.DefaultLookShare, double beyondRangeShare = IndependentStoneSimulator.BeyondRangeShare)
    {
        var adapter = new BatchLineAdapter(catalogue);
        var table = PropertyTable.Species;
        var known = adapter.SpeciesNames;
        var usable = table.Where(s => CatalogueSpeciesNames.Of(s.Name).Any(known.Contains)).ToList();
        var missing = table.Except(usable).Select(s => s.Name).ToList();
        var covered = table.SelectMany(s => CatalogueSpeciesNames.Of(s.Name)).ToHashSet(StringComparer.Ordinal);
        var unsourced = known.Where(n => !covered.Contains(n)).Order(StringComparer.Ordinal).ToList();

        var random = new Random(seed);
        // Magnification draws from a stream of its own, so the other readings of a seed are those drawn without it.
        var simulator = new IndependentStoneSimulator(random, new LoupeExaminer(new Random(unchecked(seed * 7919 + 104729)), lookShare), beyondRangeShare,
            doubling: new Random(unchecked(seed * 6143 + 86969)));
        double[] weights = [.. usable.Select(s => s.BenchWeight)];
        var cases = new List<(SimulatedStone Stone, EngineAnswer Answer, IReadOnlyList<Material> Baseline, bool Separable, IReadOnlyList<string> Confusers)>();
        var stopwatch = Stopwatch.StartNew();
        double engineSeconds = 0;
        int refused = 0;
        for (int i = 0; i < stones; i++)
        {
            var stone = simulator.Simulate(usable[Draw(weights, random)], $"I-{i:D5}");
            lines?.WriteLine(stone.Line);
            var engineWatch = Stopwatch.StartNew();
            if (!adapter.TryIdentify(stone.Line, out var answer, out string error))
            {
                refused++;
                failures?.WriteLine($"REFUSED {error}: {stone.Line}");
            }
            engineSeconds += engineWatch.Elapsed.TotalSeconds;
            var confusers = SeparabilityOracle.Confusers(stone, usable);
            bool separable = SeparabilityOracle.Consistent(stone.Species, stone.Readings) && confusers.Count == 0;
            cases.Add((stone, answer, PrintedTableBaseline.Rank(catalogue, stone.Readings), separable, confusers));
        }

        var all = new Tally();
        var origins = new OriginTallies();
        var separableTally = new Tally();
        var withLook = new Tally();
        var withoutLook = new Tally();
        var bins = new (double Confidence, int Correct, int Count)[10];
        int nothingFits = 0, outsideCatalogue = 0, originStones = 0, originRight = 0, originConfidentWrong = 0;
        // Separable stones named as a catalogue species the table has no row for: the oracle cannot see those rivals.
        int separableMissedToUnsimulated = 0;
        var perSpecies = new SortedDictionary<string, Tally>(StringComparer.Ordinal);
        foreach (var (stone, answer, baseline, separable, confusers) in cases)
        {
            var truth = CatalogueSpeciesNames.Of(stone.Species.Name);
            bool first = truth.Contains(answer.Species);
            bool three = answer.TopSpecies.Any(truth.Contains);
            bool baseFirst = baseline.Count > 0 && truth.Contains(baseline[0].Species);
            bool baseThree = baseline.Select(m => m.Species).Distinct().Take(3).Any(truth.Contains);
            all.Add(first, three, baseFirst, baseThree);
            if (separable) separableTally.Add(first, three, baseFirst, baseThree);
            if (separable && !first && !answer.NothingFits && !covered.Contains(answer.Species)) separableMissedToUnsimulated++;
            if (!perSpecies.TryGetValue(stone.Species.Name, out var tally)) perSpecies[stone.Species.Name] = tally = new Tally();
            tally.Add(first, three, baseFirst, baseThree);
            nothingFits += answer.NothingFits ? 1 : 0;
            outsideCatalogue += OutsideCatalogue(stone, catalogue) ? 1 : 0;
            int bin = Math.Min(9, (int)(answer.Confidence * 10));
            bins[bin] = (bins[bin].Confidence + answer.Confidence, bins[bin].Correct + (first ? 1 : 0), bins[bin].Count + 1);
            if (first && stone.Species.Origins.Count > 1)
            {
                originStones++;
                bool right = answer.Origin == stone.Origin;
                originRight += right ? 1 : 0;
                originConfidentWrong += !right && answer.OriginShare >= Confident ? 1 : 0;
                var look = stone.Magnification;
                bool looked = look is { Looked: true };
                bool diagnostic = looked && look!.Present.Any(w => MagnificationHabits.IsDiagnostic(stone.Species, stone.Origin, stone.Hue, w));
                origins.Add(stone.Species.Name, stone.Origin, look?.Habit.Method ?? "?", looked, diagnostic, right, answer.OriginShare >= Confident);
                if (failures is not null && !right && (looked || answer.OriginShare >= Confident))
                    failures.WriteLine($"ORIGIN {stone.Species.Name} {stone.Origin} ({look?.Habit.Method}; holds {Words(look?.Held)}) -> {answer.Origin} {answer.OriginShare:0.00}" +
                        (looked ? $"; seen {Words(look!.Present)}; not seen {Words(look.Absent)}{(diagnostic ? "; a diagnostic feature seen" : "")}" : "; no magnification") + $": {stone.Line}");
            }
            (stone.Magnification is { Looked: true } ? withLook : withoutLook).Add(first, three, baseFirst, baseThree);
            if (answer.NothingFits && failures is not null)
                failures.WriteLine($"NOTHING-FITS {stone.Species.Name}{(stone.BeyondRange ? " (drawn beyond its range)" : "")} -> {answer.Species} {answer.Confidence:0.00}: {stone.Line}");
            if (!first && failures is not null)
                failures.WriteLine($"{(separable ? "SEPARABLE" : "confusable with " + string.Join("/", confusers))} {stone.Species.Name} -> {answer.Species} {answer.Confidence:0.00}: {stone.Line}");
        }
        double ece = bins.Where(b => b.Count > 0).Sum(b => Math.Abs(b.Correct - b.Confidence)) / stones;

        o.WriteLine($"stones: {stones} (seed {seed}); property table: {table.Count} species, {usable.Count} found in the catalogue; catalogue: {catalogue.Count} entries, {known.Count} species");
        if (missing.Count > 0) o.WriteLine($"table species whose catalogue name is unknown (not simulated): {string.Join(", ", missing)}");
        o.WriteLine($"catalogue species with no row in the property table (never simulated): {unsourced.Count}: {string.Join(", ", unsourced)}");
        o.WriteLine($"stones drawn beyond the published ranges on purpose: {P(cases.Count(c => c.Stone.BeyondRange), stones)}; " +
            $"with a true lowest index or SG outside every catalogue entry of their species: {P(outsideCatalogue, stones)}");
        o.WriteLine($"stones the evidence separates (oracle with the true property table): {separableTally.Count} of {stones}; " +
            $"of their misses, {separableMissedToUnsimulated} of {separableTally.Count - separableTally.First} name a catalogue species the table has no row for (a rival the oracle cannot see)");
        o.WriteLine($"batch lines the reader refused (scored as wrong): {refused}");
        ReportVocabulary(usable, o);
        o.WriteLine($"stones with a magnification look: {P(cases.Count(c => c.Stone.Magnification is { Looked: true }), stones)} (asked for {lookShare.ToString("0.00", CultureInfo.InvariantCulture)})");
        o.WriteLine();
        o.WriteLine("| measure (by species) | engine | printed-table baseline |");
        o.WriteLine("|---|---|---|");
        o.WriteLine($"| top-1, stones the evidence separates ({separableTally.Count}) | {P(separableTally.First, separableTally.Count)} | {P(separableTally.BaseFirst, separableTally.Count)} |");
        o.WriteLine($"| top-3, stones the evidence separates | {P(separableTally.Three, separableTally.Count)} | {P(separableTally.BaseThree, separableTally.Count)} |");
        o.WriteLine($"| top-1, all stones ({stones}) | {P(all.First, stones)} | {P(all.BaseFirst, stones)} |");
        o.WriteLine($"| top-3, all stones | {P(all.Three, stones)} | {P(all.BaseThree, stones)} |");
        o.WriteLine($"| \"nothing fits\" on catalogue stones | {nothingFits} of {stones} ({P(nothingFits, stones)}) | {cases.Count(c => c.Baseline.Count == 0)} of {stones} with no survivor |");
        o.WriteLine($"| expected calibration error, leading species' confidence (10 bins) | {ece.ToString("0.000", CultureInfo.InvariantCulture)} | – |");
        o.WriteLine($"| origin top-1 within the species, species right and more than one origin ({originStones}) | {P(originRight, originStones)} | – |");
        o.WriteLine($"| confident (≥ 80 %) wrong origin, same stones | {P(originConfidentWrong, originStones)} | – |");
        o.WriteLine($"| top-1, stones without magnification ({withoutLook.Count}) / with a look ({withLook.Count}) | {P(withoutLook.First, withoutLook.Count)} / {P(withLook.First, withLook.Count)} | {P(withoutLook.BaseFirst, withoutLook.Count)} / {P(withLook.BaseFirst, withLook.Count)} |");
        o.WriteLine($"| stones per second through the batch line (one core, ranking only) | {(stones / engineSeconds).ToString("0", CultureInfo.InvariantCulture)} | – |");
        origins.Report(o);
        o.WriteLine();
        o.WriteLine("Reliability of the leading species' confidence:");
        o.WriteLine("| confidence | stones | mean confidence | right |");
        o.WriteLine("|---|---|---|---|");
        for (int i = 0; i < 10; i++)
            if (bins[i].Count > 0)
                o.WriteLine($"| {i / 10.0:0.0}–{(i + 1) / 10.0:0.0} | {bins[i].Count} | {(bins[i].Confidence / bins[i].Count).ToString("0.000", CultureInfo.InvariantCulture)} | {P(bins[i].Correct, bins[i].Count)} |");
        o.WriteLine();
        o.WriteLine("By species (all stones):");
        o.WriteLine("| species | stones | engine top-1 | engine top-3 | baseline top-1 |");
        o.WriteLine("|---|---|---|---|---|");
        foreach (var (name, t) in perSpecies)
            o.WriteLine($"| {name} | {t.Count} | {P(t.First, t.Count)} | {P(t.Three, t.Count)} | {P(t.BaseFirst, t.Count)} |");
        NotInCatalogue(catalogue, [.. cases.Take(RemovedSpeciesStones).Select(c => (c.Stone, c.Confusers))], o, failures);
        o.WriteLine();
        o.WriteLine($"wall time {stopwatch.Elapsed.TotalSeconds.ToString("0.0", CultureInfo.InvariantCulture)} s");
    }

    /// <summary>
    /// The stone's species and every species the oracle finds consistent with its readings are taken out of the
    /// catalogue, so that nothing left should fit; counts "nothing fits" and a wrong material named at ≥ 80 %. The
    /// oracle knows only the property table's ranges; the stones whose true values still lie inside a remaining catalogue
    /// entry's ranges (<see cref="InsideRemaining"/>) are counted apart, since no fit test against this catalogue can
    /// flag them: a description of the case, never used by the engine.
    /// </summary>
    private static void NotInCatalogue(IReadOnlyList<Material> catalogue, List<(SimulatedStone Stone, IReadOnlyList<string> Confusers)> cases, TextWriter o, TextWriter? failures)
    {
        int everything = 0, flagged = 0, confidentWrong = 0, inside = 0, insideFlagged = 0, insideConfidentWrong = 0;
        foreach (var (stone, confusers) in cases)
        {
            var removed = CatalogueSpeciesNames.Of(stone.Species.Name)
                .Concat(confusers.SelectMany(c => PropertyTable.Species.Where(s => CatalogueSpeciesNames.GroupOf(s.Name) == c).SelectMany(s => CatalogueSpeciesNames.Of(s.Name))))
                .ToHashSet(StringComparer.Ordinal);
            var remaining = catalogue.Where(m => !removed.Contains(m.Species)).ToList();
            // A sheet that says almost nothing is consistent with every species: nothing is left to rank.
            if (remaining.Count == 0) { everything++; continue; }
            new BatchLineAdapter(remaining).TryIdentify(stone.Line, out var answer, out _);
            bool named = !answer.NothingFits && answer.Confidence >= Confident;
            bool admitted = InsideRemaining(stone, remaining);
            flagged += answer.NothingFits ? 1 : 0;
            confidentWrong += named ? 1 : 0;
            inside += admitted ? 1 : 0;
            insideFlagged += admitted && answer.NothingFits ? 1 : 0;
            insideConfidentWrong += admitted && named ? 1 : 0;
            if (named && failures is not null)
                failures.WriteLine($"REMOVED {stone.Species.Name} -> {answer.Species} {answer.Confidence:0.00}{(admitted ? " (inside its ranges)" : "")}: {stone.Line}");
        }
        int ranked = cases.Count - everything, outside = ranked - inside;
        o.WriteLine();
        o.WriteLine($"Species and its look-alikes removed from the catalogue ({ranked} stones; {everything} left out, every species a look-alike): " +
            $"\"nothing fits\" for {P(flagged, ranked)}; a wrong species named at ≥ 80 % for {P(confidentWrong, ranked)}.");
        o.WriteLine($"  of them, true values inside a remaining catalogue entry's ranges (lowest and highest index ± {InsideIndexTolerance}, SG ± {InsideGravityShare:0%}): {inside}; " +
            $"\"nothing fits\" {P(insideFlagged, inside)}, wrong at ≥ 80 % {P(insideConfidentWrong, inside)}; " +
            $"the other {outside}: \"nothing fits\" {P(flagged - insideFlagged, outside)}, wrong at ≥ 80 % {P(confidentWrong - insideConfidentWrong, outside)}.");
    }

    /// <summary>Index tolerance of <see cref="InsideRemaining"/>: a bench reading's rounding and noise (0.001–0.002) and a catalogue bound's rounding.</summary>
    private const double InsideIndexTolerance = 0.003;

    /// <summary>SG tolerance of <see cref="InsideRemaining"/>, relative: a hydrostatic reading's usual spread on a small stone.</summary>
    private const double InsideGravityShare = 0.01;

    /// <summary>
    /// True when some remaining catalogue entry's ranges hold the stone's true lowest and highest principal index and its
    /// SG (within the tolerances above), with the same kind of indicatrix (isotropic or not; an aggregate entry either).
    /// </summary>
    private static bool InsideRemaining(SimulatedStone stone, IReadOnlyList<Material> remaining)
    {
        double lowest = stone.LowestIndex, highest = stone.HighestIndex;
        bool isotropic = highest - lowest < 1e-9;
        static bool Holds(PropertyRange range, double value, double tolerance) => range.Minimum - tolerance <= value && value <= range.Maximum + tolerance;
        return remaining.Any(m =>
            (m.Indices.Character == OpticCharacter.Aggregate || (m.Indices.Character is OpticCharacter.Uniaxial or OpticCharacter.Biaxial) != isotropic)
            && Holds(m.Indices.Lowest, lowest, InsideIndexTolerance) && Holds(m.Indices.Highest, highest, InsideIndexTolerance)
            && Holds(m.SpecificGravity, stone.SpecificGravity, InsideGravityShare * stone.SpecificGravity));
    }

    /// <summary>True when the stone's lowest index or SG lies outside every catalogue entry of its species (measured, not used to draw).</summary>
    private static bool OutsideCatalogue(SimulatedStone stone, IReadOnlyList<Material> catalogue)
    {
        var names = CatalogueSpeciesNames.Of(stone.Species.Name);
        var entries = catalogue.Where(m => names.Contains(m.Species)).ToList();
        bool indexInside = entries.Any(m => m.Indices.Lowest.Minimum <= stone.LowestIndex && stone.LowestIndex <= m.Indices.Lowest.Maximum);
        bool gravityInside = entries.Any(m => m.SpecificGravity.Minimum <= stone.SpecificGravity && stone.SpecificGravity <= m.SpecificGravity.Maximum);
        return !indexInside || !gravityInside;
    }

    private static int Draw(double[] weights, Random random)
    {
        double x = random.NextDouble() * weights.Sum();
        for (int i = 0; i < weights.Length; i++)
            if ((x -= weights[i]) <= 0) return i;
        return weights.Length - 1;
    }

    private static string Words(IReadOnlyList<string>? words) => words is null || words.Count == 0 ? "nothing" : string.Join(",", words);

    /// <summary>Words the benchmark writes that the program's vocabulary does not know, and table pairs with no magnification row.</summary>
    private static void ReportVocabulary(IReadOnlyList<SpeciesProperties> usable, TextWriter o)
    {
        var unknown = LoupeVisibility.Words.Where(w => MagnificationVocabulary.Find(w) is null).ToList();
        var unmodelled = MagnificationHabits.All.SelectMany(r => r.Features).Select(f => f.Word).Distinct().Where(w => !LoupeVisibility.Words.Contains(w)).ToList();
        var missing = usable.SelectMany(s => s.Origins.SelectMany(origin => s.Hues.Where(h => MagnificationHabits.For(s.Name, origin.Word, h.Word).Count == 0)
            .Select(h => $"{s.Name}/{origin.Word}/{h.Word}"))).ToList();
        if (unknown.Count > 0) o.WriteLine($"magnification words the program does not know (lines with them are refused): {string.Join(", ", unknown)}");
        if (unmodelled.Count > 0) o.WriteLine($"magnification words in the habit table with no visibility (never looked for): {string.Join(", ", unmodelled)}");
        if (missing.Count > 0) o.WriteLine($"species/origin/hue with no magnification row (no look): {string.Join(", ", missing)}");
        var pointing = usable.Where(s => s.Origins.Count > 1).SelectMany(s => s.Origins.Select(origin =>
        {
            var words = LoupeVisibility.Words.Where(w => s.Hues.Any(h => MagnificationHabits.IsDiagnostic(s, origin.Word, h.Word, w))).ToList();
            return words.Count == 0 ? null : $"{s.Name} {origin.Word}: {string.Join(",", words)}";
        })).OfType<string>().ToList();
        o.WriteLine($"features that point at an origin (≥ {MagnificationHabits.DiagnosticShare:0%} of the species' origins for some hue, from the tables): {string.Join("; ", pointing)}");
    }

    private static string P(int k, int n) => n == 0 ? "–" : (100.0 * k / n).ToString("0.0", CultureInfo.InvariantCulture) + " %";

    /// <summary>Counts of right answers, engine and baseline, top-1 and top-3.</summary>
    private sealed class Tally
    {
        public int Count, First, Three, BaseFirst, BaseThree;

        public void Add(bool first, bool three, bool baseFirst, bool baseThree)
        {
            Count++;
            First += first ? 1 : 0;
            Three += three ? 1 : 0;
            BaseFirst += baseFirst ? 1 : 0;
            BaseThree += baseThree ? 1 : 0;
        }
    }
}
