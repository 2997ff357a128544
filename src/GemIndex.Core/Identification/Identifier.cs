using GemIndex.Core.Catalogue;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Identification;

/// <summary>
/// Ranks the catalogue's materials for a bench sheet by posterior probability (docs/ranking.md):
/// P(m | evidence) ∝ prior(m) · Π_tests P(reading | m), with "not in the catalogue" as one more outcome whose
/// likelihood is the broad density of each reading and whose prior is <see cref="BroadDensities.NotInCataloguePrior"/>.
/// Immutable and thread-safe once built.
/// </summary>
public sealed class Identifier
{
    /// <summary>Below this fit the best candidate is not offered as an answer.</summary>
    public const double MinimumFit = 0.02;

    /// <summary>
    /// When even the best candidate fits worse than this, the catalogue's share is scaled by fit/0.05 and the rest moves to
    /// "not in the catalogue": a poor best fit means the model itself is in doubt (a judgement; docs/ranking.md §3).
    /// </summary>
    public const double PoorFit = 0.05;

    /// <summary>
    /// A candidate with at least this share of the leader's posterior, or an entry of a species with at least this share of
    /// the leading species' total, is a serious one: "nothing fits" and the poor-fit discount look at the best fit among the
    /// serious candidates, not only the leader's, since a leader that wins on SG and colour while its refractometer reading
    /// is impossible must not hide a rival that fits every test, nor a variety of the leading species that fits (a
    /// judgement; docs/ranking.md §4).
    /// </summary>
    public const double SeriousCandidate = 0.1;

    /// <summary>
    /// "Not in the catalogue" outranking the leading species is "nothing fits" only when the readings favour an unlisted
    /// material over the catalogue as a whole by at least this factor (its posterior odds over its prior odds). Without it
    /// a sheet that says next to nothing, spread thin over many species, was called "nothing fits" (a judgement; docs/ranking.md §4).
    /// </summary>
    public const double NothingFitsOdds = 2;

    /// <summary>
    /// Every log-likelihood ratio is divided by this before the posterior (one temperature for the whole model): fitted on
    /// the independent benchmark by the calibration error of the leading species' confidence (docs/ranking.md §3, its
    /// table); never fitted on stones simulated from the catalogue.
    /// </summary>
    public const double Temperature = 0.9;

    /// <summary>Entries below this posterior are left out of the general next-test advice (judgement, docs/ranking.md §5).</summary>
    public const double NextTestEntryShare = 1e-3;

    private readonly Material[] _materials;
    private readonly MaterialProfile[] _profiles;
    private readonly double[] _logPriors;
    private readonly double _logPriorNotInCatalogue;
    // Each entry's species numbered in the order species first appear in the catalogue, and how many there are.
    private readonly int[] _speciesOf;
    private readonly int _speciesCount;
    private readonly int[][] _originGroups;

    /// <summary>Prepares the ranking over a catalogue (at least one material).</summary>
    /// <exception cref="ArgumentException">The catalogue is empty.</exception>
    public Identifier(IReadOnlyList<Material> catalogue)
    {
        if (catalogue.Count == 0) throw new ArgumentException("the catalogue has no materials", nameof(catalogue));
        _materials = [.. catalogue];
        _profiles = Profiles(_materials);
        _logPriors = LogPriors(_materials);
        _logPriorNotInCatalogue = Math.Log(BroadDensities.NotInCataloguePrior);
        var number = new Dictionary<string, int>();
        _speciesOf = [.. _materials.Select(m => number.TryGetValue(m.Species, out int k) ? k : number[m.Species] = number.Count)];
        _speciesCount = number.Count;
        // Each species' entries in catalogue order, and whether they differ in origin: made once, read by every stone.
        _originGroups = [.. Enumerable.Range(0, _materials.Length).GroupBy(i => _speciesOf[i]).Select(g => g.ToArray())
            .Where(g => g.Select(i => _materials[i].Origin).Distinct().Count() > 1)];
    }

    /// <summary>
    /// The prior sits on the species (its <see cref="Material.SpeciesFrequency"/> weight, the largest any of its entries
    /// states), and is split among the species' entries by their <see cref="Material.Frequency"/> weights, so a species with
    /// many varieties or origins gets no extra mass.
    /// </summary>
    private static double[] LogPriors(Material[] materials)
    {
        var species = materials.GroupBy(m => m.Species).ToDictionary(g => g.Key, g => (
            Weight: g.Max(m => BenchFrequencyWeights.Of(m.SpeciesFrequency)),
            Within: g.Sum(m => BenchFrequencyWeights.Of(m.Frequency))));
        double total = species.Values.Sum(v => v.Weight);
        double inCatalogue = 1 - BroadDensities.NotInCataloguePrior;
        return [.. materials.Select(m =>
        {
            var s = species[m.Species];
            return Math.Log(inCatalogue * s.Weight / total * BenchFrequencyWeights.Of(m.Frequency) / s.Within);
        })];
    }

    /// <summary>Profiles of every entry; entries with the same optical data share one indicatrix prior, so a stone's series is scored once for them.</summary>
    private static MaterialProfile[] Profiles(Material[] materials)
    {
        var shared = new Dictionary<(OpticalIndices, PropertyRange, OpticSign, MaterialForm), IndicatrixPrior>();
        var speciesHues = materials.GroupBy(m => m.Species).ToDictionary(g => g.Key, g => MaterialProfile.SpeciesHueList(g));
        return [.. materials.Select(m =>
        {
            var birefringence = RefractometerEvidence.BirefringenceRange(m);
            var key = (m.Indices, birefringence, m.Sign, m.Forms);
            if (!shared.TryGetValue(key, out var prior)) shared[key] = prior = IndicatrixPrior.For(m, birefringence);
            return new MaterialProfile(m, prior, speciesHues[m.Species]);
        })];
    }

    /// <summary>
    /// Material indices best first. Ties (materials the evidence cannot tell apart) keep the catalogue's order, so
    /// answers are reproducible: a fast sort on the keys, then each run of equal keys put back in index order.
    /// </summary>
    private static int[] Ranked(double[] posterior)
    {
        int n = posterior.Length;
        int[] order = new int[n];
        double[] keys = new double[n];
        for (int i = 0; i < n; i++) { order[i] = i; keys[i] = -posterior[i]; }
        Array.Sort(keys, order);
        for (int start = 0, end; start < n; start = end)
        {
            for (end = start + 1; end < n && keys[end] == keys[start]; end++) { }
            if (end - start > 1) Array.Sort(order, start, end - start);
        }
        return order;
    }

    /// <summary>How many leading species always have their best entry among the shown candidates (docs/ranking.md §3, species totals).</summary>
    public const int SpeciesAlwaysShown = 3;

    /// <summary>
    /// The shown candidates, then grouped species first: the most probable entries, with the best entry of each of the
    /// <see cref="SpeciesAlwaysShown"/> leading species that the answer lists (the leader, and each holding
    /// <see cref="LeadingCandidates.ListedShare"/>) put in, and the best entry of every further species whose total is
    /// larger than the least probable entry it would displace, most probable species first. A species with many
    /// varieties must not fill the list with entries the readings rule out while another species' likely entry is left
    /// off, and a species whose mass is spread over many small entries must not be left off while a species of one small
    /// entry is shown; but no species' best entry displaces an entry more probable than the whole species (an amber's
    /// pressed amber at 16 % was left off for the best entries of species at 0.1 %).
    /// Read off the species-first order (<see cref="SpeciesFirst"/>): its runs are the species by total, each run's
    /// first entry the species' best.
    /// </summary>
    private bool[] Shown(double[] posterior, int[] byEntry, int[] order, int count)
    {
        var shown = new bool[posterior.Length];
        if (count == 0) return shown;
        for (int k = 0; k < count; k++) shown[byEntry[k]] = true;
        // The shown entries a species' best entry may displace, least probable last (byEntry's order), and those put in.
        var kept = new bool[posterior.Length];
        int last = count - 1, taken = 0;
        for (int start = 0, end; start < order.Length; start = end)
        {
            int best = order[start];
            double total = 0;
            for (end = start; end < order.Length && _speciesOf[order[end]] == _speciesOf[best]; end++) total += posterior[order[end]];
            // Past the leader, a species the answer would not list (under LeadingCandidates.ListedShare) is never put in
            // before the leader's own likelier entries: a list of three for a corundum must not read ruby, staurolite 0 %.
            // The best entry's own share decides, since the answers list entries by it.
            bool always = taken == 0 || (taken < SpeciesAlwaysShown && posterior[best] >= LeadingCandidates.ListedShare);
            taken++;
            if (shown[best]) { kept[best] = true; continue; }
            // A best entry the answers would not list (under LeadingCandidates.ListedShare) would only leave a gap in their ranks.
            if (!always && posterior[best] < LeadingCandidates.ListedShare) continue;
            while (last >= 0 && (kept[byEntry[last]] || !shown[byEntry[last]])) last--;
            if (last < 0 || total <= 0 || (!always && total <= posterior[byEntry[last]])) break;
            shown[byEntry[last]] = false;
            shown[best] = kept[best] = true;
        }
        return shown;
    }

    /// <summary>Moves mass to "not in the catalogue" when even the best-fitting serious candidate fits poorly (<see cref="PoorFit"/>).</summary>
    private double DiscountPoorFit(double[] posterior, Func<int, double> fit, double other)
    {
        double keep = Math.Min(1, BestSeriousFit(posterior, fit) / PoorFit);
        if (keep >= 1) return other;
        double moved = 0;
        for (int i = 0; i < posterior.Length; i++) { moved += posterior[i] * (1 - keep); posterior[i] *= keep; }
        return other + moved;
    }

    private static double Odds(double p) => p / (1 - p);

    /// <summary>
    /// The best fit among the serious candidates, worked out only here and only as far as needed: an entry with at least
    /// <see cref="SeriousCandidate"/> of the leader's posterior, or any entry of a species with at least that share of the
    /// leading species' total (docs/ranking.md §4). The entries are tried most probable first and the search stops at a fit
    /// of <see cref="PoorFit"/> (and <see cref="MinimumFit"/>) or more, since neither the discount nor "nothing fits" looks beyond it.
    /// </summary>
    private double BestSeriousFit(double[] posterior, Func<int, double> fit)
    {
        double top = posterior.Max();
        var totals = new double[_speciesCount];
        for (int i = 0; i < posterior.Length; i++) totals[_speciesOf[i]] += posterior[i];
        double topSpecies = totals.Max();
        var serious = new List<int>();
        for (int i = 0; i < posterior.Length; i++)
            if (posterior[i] >= SeriousCandidate * top || totals[_speciesOf[i]] >= SeriousCandidate * topSpecies) serious.Add(i);
        serious.Sort((a, b) => posterior[b].CompareTo(posterior[a]) is var c && c != 0 ? c : a.CompareTo(b));
        double best = 0;
        foreach (int i in serious)
            if ((best = Math.Max(best, fit(i))) >= Math.Max(PoorFit, MinimumFit)) break;
        return best;
    }

    /// <summary>
    /// Entries ordered species first: species by their total, and within a species its entries by their own share, so a
    /// species' entries follow its total. Ties keep the catalogue's order.
    /// </summary>
    private int[] SpeciesFirst(double[] posterior, int[] byEntry)
    {
        // Species numbered in the order they first appear in byEntry; their totals summed in that same order.
        var number = new int[_speciesCount];
        Array.Fill(number, -1);
        var speciesOf = new int[byEntry.Length];
        var totals = new double[_speciesCount];
        int count = 0;
        for (int position = 0; position < byEntry.Length; position++)
        {
            int i = byEntry[position];
            int k = number[_speciesOf[i]];
            if (k < 0) number[_speciesOf[i]] = k = count++;
            totals[k] += posterior[i];
            speciesOf[position] = k;
        }
        var species = new int[count];
        for (int k = 0; k < species.Length; k++) species[k] = k;
        Array.Sort(species, (a, b) => totals[b].CompareTo(totals[a]) is var c && c != 0 ? c : a.CompareTo(b));
        // Each species' entries follow its total, in their own order.
        var rankOf = new int[species.Length];
        for (int rank = 0; rank < species.Length; rank++) rankOf[species[rank]] = rank;
        var counts = new int[species.Length];
        for (int position = 0; position < byEntry.Length; position++) counts[rankOf[speciesOf[position]]]++;
        var offset = new int[species.Length];
        for (int rank = 1; rank < species.Length; rank++) offset[rank] = offset[rank - 1] + counts[rank - 1];
        var order = new int[byEntry.Length];
        for (int position = 0; position < byEntry.Length; position++) order[offset[rankOf[speciesOf[position]]]++] = byEntry[position];
        return order;
    }

    /// <summary>
    /// For the leading species when its entries differ in origin or variety: the test not yet done that best tells its
    /// origins apart (by the advisor, over the species' own entries grouped by origin), or null when none would.
    /// </summary>
    private NextTestAdvice? Separation(BenchSheet sheet, double[] posterior, IReadOnlyList<SpeciesResult> species)
    {
        // The leading species by its total, not the species of the single likeliest entry: one lone entry of another
        // species can outweigh each of a species' many varieties while the species as a whole leads.
        if (species.Count == 0) return null;
        // A test whose catalogue outcomes differ between a cultured and a natural pearl (a glow listed for one kind only)
        // would be advice the trade does not take.
        if (BenchWarnings.Inseparable(species[0]) is { } held && BenchWarnings.OnlyLaboratoryTells(held)) return null;
        string leading = species[0].Species;
        var entries = new List<(Material, double)>();
        for (int i = 0; i < posterior.Length; i++)
            if (_materials[i].Species == leading && posterior[i] > BenchWarnings.AdvisedEntryShare) entries.Add((_materials[i], posterior[i]));
        // The test that tells the species' origins apart, not merely its varieties.
        return entries.Count < 2 ? null : NextTestAdvisor.Advise(sheet, entries, m => (int)m.Origin);
    }

    /// <summary>Posterior totals per species over the whole catalogue, best first; ties keep the catalogue's order.</summary>
    private List<SpeciesResult> SpeciesTotals(double[] posterior)
    {
        // Species are numbered by their first entry in the catalogue, so the number breaks ties as the first entry does.
        var totals = new double[_speciesCount];
        var origins = new Dictionary<OriginClass, double>[_speciesCount];
        var names = new string[_speciesCount];
        var groups = new string?[_speciesCount];
        for (int i = 0; i < posterior.Length; i++)
        {
            var m = _materials[i];
            int k = _speciesOf[i];
            if (origins[k] is not { } o) { origins[k] = o = []; names[k] = m.Species; groups[k] = m.MineralGroup; }
            o[m.Origin] = o.GetValueOrDefault(m.Origin) + posterior[i];
            totals[k] += posterior[i];
        }
        var order = new int[_speciesCount];
        for (int k = 0; k < order.Length; k++) order[k] = k;
        Array.Sort(order, (a, b) => totals[b].CompareTo(totals[a]) is var c && c != 0 ? c : a.CompareTo(b));
        var result = new List<SpeciesResult>(order.Length);
        foreach (int k in order) result.Add(new SpeciesResult { Species = names[k], Confidence = totals[k], Origins = origins[k], MineralGroup = groups[k] });
        return result;
    }

    /// <summary>
    /// Whether <see cref="Identify"/> works out the rotation series' section model for the catalogue's distinct priors on
    /// every core before weighing the entries, and weighs the entries on every core (docs/ranking.md §6): the same values,
    /// in less wall time for one stone.
    /// </summary>
    public bool SeriesOnEveryCore { get; private init; } = true;

    /// <summary>
    /// The same ranking with <see cref="SeriesOnEveryCore"/> set: a batch that already ranks its stones on every core
    /// turns it off, since there the extra threads only cost (a copy that shares everything else).
    /// </summary>
    public Identifier WithSeriesOnEveryCore(bool value) => value == SeriesOnEveryCore ? this : new Identifier(this, value);

    private Identifier(Identifier other, bool seriesOnEveryCore)
    {
        (_materials, _profiles, _logPriors, _logPriorNotInCatalogue) = (other._materials, other._profiles, other._logPriors, other._logPriorNotInCatalogue);
        (_speciesOf, _speciesCount, _originGroups) = (other._speciesOf, other._speciesCount, other._originGroups);
        SeriesOnEveryCore = seriesOnEveryCore;
    }

    /// <summary>
    /// The section model of every distinct prior the screen keeps, and the broad one, on every core; the weighing then
    /// finds them worked out (<see cref="AnalysedSheet.SeriesOutcome"/>). Each value is computed exactly as it would be in
    /// turn, so the results are the same bit for bit.
    /// </summary>
    private void SeriesInParallel(AnalysedSheet analysed)
    {
        if (analysed.Observation is not { } series) return;
        var seen = new HashSet<(IndicatrixPrior, double, double)>();
        var work = new List<(IndicatrixPrior Prior, double Shift, double ShiftSigma)>();
        foreach (var profile in _profiles)
            if (RefractometerEvidence.SeriesWork(profile, analysed, out var key) && !key.Prior.IsIsotropic && seen.Add(key)) work.Add(key);
        if (work.Count == 0) return;
        _ = series.CoarseGeometry; // shared by every prior: made once, before the threads start
        // One item at a time, the dearest first so that the cores finish together: the broad prior (four kinds of crystal),
        // then by the shapes each coarse orientation weighs, a biaxial family's climbs (three angles and up to two shape
        // coordinates) counted double.
        work.Sort((a, b) => Cost(b.Prior).CompareTo(Cost(a.Prior)));
        var items = new int[work.Count + 1];
        for (int k = 0; k < items.Length; k++) items[k] = k - 1;
        Parallel.ForEach(System.Collections.Concurrent.Partitioner.Create(items, loadBalance: true), k =>
        {
            if (k < 0) _ = analysed.BroadSeriesLogLikelihood;
            else analysed.SeriesOutcome(work[k].Prior, work[k].Shift, work[k].ShiftSigma);
        });

        static int Cost(IndicatrixPrior prior) => prior.Shapes.Length * (prior.Families.Any(f => f.Biaxial) ? 2 : 1);
    }

    /// <summary>Entry <paramref name="i"/>'s log posterior and its tempered log-likelihood ratio without colour, without its fit.</summary>
    private void Weigh(int i, AnalysedSheet analysed, EvidenceAccumulator acc, double[] logLikelihoodWithoutColour, double[] logPosterior)
    {
        EvidenceLikelihood.Weigh(_profiles[i], analysed, acc);
        double logOther = acc.LogLikelihoodNotInCatalogue;
        // Tempered: the ratio to "not in the catalogue" is divided by the temperature.
        logLikelihoodWithoutColour[i] = (acc.LogLikelihoodWithoutColour - logOther) / Temperature;
        logPosterior[i] = _logPriors[i] + (acc.LogLikelihood - logOther) / Temperature;
    }

    /// <summary>The catalogue ranked over.</summary>
    public IReadOnlyList<Material> Materials => _materials;

    /// <summary>Ranks the catalogue for one sheet.</summary>
    /// <param name="sheet">The readings.</param>
    /// <param name="maximumCandidates">How many candidates to return (1–1000).</param>
    /// <param name="explainTop">For how many candidates to write the reasons in words (<see cref="LeadingCandidates"/>: the best entry of each leading species first).</param>
    /// <param name="adviseNextTest">Whether to work out the next test (costs a little time).</param>
    public IdentificationResult Identify(BenchSheet sheet, int maximumCandidates = 10, int explainTop = 3, bool adviseNextTest = true)
    {
        QuantityOutOfRangeException.ThrowIfOutside("number of candidates", maximumCandidates, 1, 1000);
        var analysed = new AnalysedSheet(sheet);
        if (SeriesOnEveryCore) SeriesInParallel(analysed);
        int n = _materials.Length;
        var logPosterior = new double[n];
        // The same without colour: the origin balance's "tests alone" (colour lists by origin are the market's usual
        // colours, never a physical separation of origins).
        var logLikelihoodWithoutColour = new double[n];
        double logOther, max = double.NegativeInfinity;
        // The likelihoods of every entry, without their fits: only the best entry's fit and the shown candidates' are
        // read, and a fit costs the tails of every test. Those few are weighed again in full (the same sums). Each entry
        // is weighed on its own (an accumulator per thread, emptied for every entry), so on every core too.
        if (SeriesOnEveryCore)
            Parallel.For(0, n, () => new EvidenceAccumulator(explaining: false, fitting: false),
                (i, _, acc) => { Weigh(i, analysed, acc, logLikelihoodWithoutColour, logPosterior); return acc; }, _ => { });
        else
        {
            var acc = new EvidenceAccumulator(explaining: false, fitting: false);
            for (int i = 0; i < n; i++) Weigh(i, analysed, acc, logLikelihoodWithoutColour, logPosterior);
        }
        for (int i = 0; i < n; i++) max = Math.Max(max, logPosterior[i]);
        var evaluations = new CandidateEvaluation?[n];
        var explained = new bool[n];
        CandidateEvaluation Evaluated(int i, bool explain)
        {
            if (evaluations[i] is { } known && (explained[i] || !explain)) return known;
            explained[i] = explain;
            return evaluations[i] = EvidenceLikelihood.Evaluate(_profiles[i], analysed, explain);
        }
        logOther = _logPriorNotInCatalogue;
        max = Math.Max(max, logOther);
        double sum = Math.Exp(logOther - max);
        var posterior = new double[n];
        for (int i = 0; i < n; i++) sum += posterior[i] = Math.Exp(logPosterior[i] - max);
        for (int i = 0; i < n; i++) posterior[i] /= sum;
        double other = Math.Exp(logOther - max) / sum;
        other = DiscountPoorFit(posterior, i => Evaluated(i, explain: false).Fit, other);
        OriginBalance.Apply(_materials, _originGroups, posterior, logLikelihoodWithoutColour, _logPriors);

        int[] byEntry = Ranked(posterior);
        int[] order = SpeciesFirst(posterior, byEntry);
        var shown = Shown(posterior, byEntry, order, Math.Min(maximumCandidates, n));
        int[] shownInOrder = [.. order.Where(i => shown[i])];
        var candidates = new List<RankedCandidate>(shownInOrder.Length);
        bool[] explainAt = LeadingCandidates.Explained([.. shownInOrder.Select(i => _materials[i].Species)], explainTop,
            [.. shownInOrder.Select((i, k) => LeadingCandidates.IsListed(k, posterior[i]))]);
        foreach (int i in shownInOrder)
        {
            bool explain = explainAt[candidates.Count];
            var e = Evaluated(i, explain);
            candidates.Add(new RankedCandidate
            {
                Material = _materials[i],
                Confidence = posterior[i],
                Fit = e.Fit,
                Reasons = explain ? e.Contributions : [],
            });
        }
        var species = SpeciesTotals(posterior);
        // Species first: "not in the catalogue" is set against the leading species, not against one of its many entries.
        bool noGoodMatch = BestSeriousFit(posterior, i => Evaluated(i, explain: false).Fit) < MinimumFit
            || (other > species[0].Confidence && Odds(other) >= NothingFitsOdds * Odds(BroadDensities.NotInCataloguePrior));
        var weighted = order.Where(i => posterior[i] >= NextTestEntryShare).Select(i => (_materials[i], posterior[i])).ToList();
        var separation = Separation(sheet, posterior, species);
        var varieties = BenchWarnings.InseparableVarieties(species, _materials, posterior);
        var group = noGoodMatch ? null : BenchWarnings.InseparableGroup(species, _materials, posterior);
        // Stones to keep dry: every such entry at the warnings' share, and those of the leading species at a tenth of that
        // (natural turquoise at 4 % beside its treated kin, when turquoise leads), most probable first; the latter only
        // when the leading species' stones to keep dry hold the warnings' share together (a blue sapphire's 1 % of
        // glass-filled ruby and doublet had banned water for the routine weighing of a sapphire).
        string? leadingSpecies = species.Count > 0 && species[0].Confidence >= BenchWarnings.Relevant
            && order.Where(i => _materials[i].DoNotImmerse && _materials[i].Species == species[0].Species).Sum(i => posterior[i]) >= BenchWarnings.Relevant
            ? species[0].Species : null;
        List<string> keepDry = [.. order.Where(i => _materials[i].DoNotImmerse && (posterior[i] >= BenchWarnings.Relevant
            || (posterior[i] >= BenchWarnings.Relevant / 10 && _materials[i].Species == leadingSpecies)))
            .OrderByDescending(i => posterior[i]).Select(i => _materials[i].Name)];
        var advised = new List<string>();
        return new IdentificationResult
        {
            Id = sheet.Id,
            Species = species,
            Candidates = candidates,
            NotInCatalogue = other,
            NoGoodMatch = noGoodMatch,
            NextTest = adviseNextTest ? NextTestAdvisor.Advise(sheet, weighted) : null,
            Warnings = BenchWarnings.For(analysed, candidates, other, noGoodMatch, species, separation,
                // The leader's reasons in words only when a reading speaks strongly against it (its fit's evaluation counts them).
                shownInOrder.Length > 0 && Evaluated(shownInOrder[0], explain: false).StronglyAgainst > 0
                    ? Evaluated(shownInOrder[0], explain: true).Contributions : [],
                // The varieties' test only where their warning can be given (never when nothing fits).
                varieties is null || noGoodMatch ? null : ([.. varieties.Select(v => v.Material)], NextTestAdvisor.Advise(sheet, varieties)),
                // The group's test tells its species apart, not merely one species' varieties.
                group is { } open ? (open.Open, NextTestAdvisor.Advise(sheet, open.Entries, m => open.Open.IndexOf(m.Species))) : null,
                // Cautions from every serious entry, shown or not.
                [.. order.Where(i => posterior[i] >= BenchWarnings.Relevant).Select(i => (_materials[i], posterior[i]))], keepDry, advised),
            KeepDry = keepDry,
            WarningTests = [.. advised.Distinct()],
            InseparableOrigins = species.Count > 0 && BenchWarnings.Inseparable(species[0]) is { } held
                ? new InseparableOrigins { Species = species[0].Species, Origins = held, Test = separation } : null,
            SeriesSource = analysed.SeriesShown,
            SeriesCharacterSource = analysed.Character,
        };
    }
}
