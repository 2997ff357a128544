namespace GemIndex.Core.Identification;

/// <summary>
/// Sums the evidence of one sheet for one candidate: log-likelihoods under the candidate and under
/// "not in the catalogue", the per-test tail probabilities for the fit, and (when asked) the words. Tests that share a
/// cause are not multiplied as independent (docs/ranking.md §3): within a group, the strongest weight of evidence
/// (log likelihood ratio against "not in the catalogue") counts in full and the others by <see cref="CorrelatedShare"/>.
/// One accumulator is reused from candidate to candidate of a stone (<see cref="Reset"/>).
/// </summary>
/// <param name="explaining">Also collect the contributions in words.</param>
/// <param name="fitting">
/// Also combine the tail probabilities into the fit; without it the tails need not be worked out at all (the ranking
/// needs the fit of only the few candidates it shows).
/// </param>
internal sealed class EvidenceAccumulator(bool explaining, bool fitting = true)
{
    /// <summary>No group: an independent test.</summary>
    public const int Independent = 0;

    /// <summary>UV fluorescence and absorption lines: one chromophore causes both (the colour it gives counts in full, docs/ranking.md §3).</summary>
    public const int ChromophoreGroup = 1;

    /// <summary>An aggregate's spot index and SG: both follow its mix of minerals and its porosity.</summary>
    public const int AggregateGroup = 2;

    /// <summary>How much a correlated test adds beyond the strongest of its group (a judgement; docs/ranking.md §3).</summary>
    public const double CorrelatedShare = 0.5;

    /// <summary>A reading whose tail is below this is unusual for the candidate (outside its range by more than 2σ, an unexpected reaction).</summary>
    public const double AgreesTail = 0.05;

    private List<EvidenceContribution>? _contributions = explaining ? [] : null;
    private readonly List<double>[] _groups = [[], [], []];
    private double _independent, _colour, _logOther, _lastBits, _lastTail, _sumLogTails;
    private int _tests, _stronglyAgainst;
    private string _lastTest = "";

    public bool Explaining => _contributions is not null;

    /// <summary>Whether the tails are wanted (see the constructor).</summary>
    public bool Fitting { get; } = fitting || explaining;

    /// <summary>Empties the sums for the next candidate.</summary>
    public void Reset()
    {
        if (_contributions is not null) _contributions = [];
        foreach (var group in _groups) group.Clear();
        _independent = _colour = _logOther = _lastBits = _lastTail = _sumLogTails = 0;
        _tests = 0;
        _stronglyAgainst = 0;
        _lastTest = "";
    }

    /// <summary>
    /// Adds one test. Continuous readings are mixed with the broad density (a robust likelihood: misreadings
    /// and ranges narrower than nature); reactions carry their own error rates in <paramref name="likelihood"/>.
    /// </summary>
    public void Add(string test, double likelihood, double broad, double tail, bool robust, int group = Independent)
    {
        double mixed = robust
            ? (1 - BroadDensities.MisreadingShare) * likelihood + BroadDensities.MisreadingShare * broad
            : likelihood;
        AddLog(test, Math.Log(Math.Max(mixed, 1e-300)), Math.Log(broad), tail, robust: false, group);
    }

    /// <summary>
    /// Adds one test given as natural logs (densities of many readings overflow a double): the robust mixture is
    /// ln((1 − ρ) e^f + ρ e^g).
    /// </summary>
    /// <remarks>With <c>inFit</c> false (a test that is no test of typicality: the cut's implied absences alone) the test
    /// weighs in the likelihood but stays out of the fit.</remarks>
    public void AddLog(string test, double logLikelihood, double logBroad, double tail, bool robust, int group = Independent, bool inFit = true)
    {
        double mixed = robust
            ? SectionLikelihood.LogSum.Add(Math.Log(1 - BroadDensities.MisreadingShare) + logLikelihood, Math.Log(BroadDensities.MisreadingShare) + logBroad)
            : logLikelihood;
        mixed = Math.Max(mixed, logBroad - 690);
        double ratio = mixed - logBroad, bits = ratio / Math.Log(2);
        // Colour is kept apart so that the origin balance can leave it out (LogLikelihoodWithoutColour); it counts in full
        // (docs/ranking.md §3): between entries that share a chromophore the hue tells their varieties apart.
        if (test == Bench.BenchField.Colour) _colour += ratio;
        else if (group == Independent) _independent += ratio;
        else _groups[group].Add(ratio);
        _logOther += logBroad;
        if (Fitting && inFit)
        {
            _sumLogTails += Math.Log(Math.Clamp(tail, 1e-300, 1));
            // Counted without words, so that the warning on a reading against the leader needs the reasons only when one is there.
            if (BenchWarnings.SpeaksAgainst(test, bits, tail >= AgreesTail)) _stronglyAgainst++;
        }
        if (inFit) _tests++;
        _lastTest = test;
        if (_contributions is not null) { _lastBits = bits; _lastTail = tail; }
    }

    /// <summary>The weight of the test added last, bits (while explaining).</summary>
    public double LastBits => _lastBits;

    /// <summary>Words for the test added last.</summary>
    public void Say(string text)
    {
        _contributions?.Add(new EvidenceContribution(_lastTest, text, _lastBits, _lastTail >= AgreesTail));
    }

    /// <summary>ln p(sheet | candidate), the correlated groups counted as in <see cref="Result"/>.</summary>
    public double LogLikelihood => _logOther + Ratio(withColour: true);

    /// <summary>
    /// The same without the colour test: what the other tests say (the origin balance asks whether a test other than
    /// colour decides an origin; docs/ranking.md §3).
    /// </summary>
    public double LogLikelihoodWithoutColour => _logOther + Ratio(withColour: false);

    /// <summary>The summed log-likelihood ratio, the correlated groups counted by their rule and colour in full (or left out).</summary>
    private double Ratio(bool withColour)
    {
        double ratio = _independent + (withColour ? _colour : 0);
        for (int g = 0; g < _groups.Length; g++)
        {
            var group = _groups[g];
            // The strongest by size (the first of equal sizes), and the group's sum in the order the tests came.
            double strongest = 0, sum = 0;
            bool any = false;
            for (int i = 0; i < group.Count; i++)
            {
                if (!any || Math.Abs(group[i]).CompareTo(Math.Abs(strongest)) > 0) strongest = group[i];
                sum += group[i];
                any = true;
            }
            if (any) ratio += strongest + CorrelatedShare * (sum - strongest);
        }
        return ratio;
    }

    /// <summary>ln p(sheet | not in the catalogue).</summary>
    public double LogLikelihoodNotInCatalogue => _logOther;

    public CandidateEvaluation Result()
    {
        if (!Fitting) throw new InvalidOperationException("the fit needs the tails: this accumulator was made without them");
        return new()
        {
            LogLikelihood = LogLikelihood,
            LogLikelihoodNotInCatalogue = _logOther,
            Fit = FisherCombination(-_sumLogTails, _tests),
            StronglyAgainst = _stronglyAgainst,
            Contributions = _contributions ?? (IReadOnlyList<EvidenceContribution>)[],
        };
    }

    /// <summary>
    /// Fisher's method: X = −2 Σ ln pᵢ follows χ² with 2k degrees of freedom when every pᵢ is uniform;
    /// the combined tail is P(χ²₂ₖ ≥ X) = e^(−X/2) Σ_{j&lt;k} (X/2)^j / j! (closed form for even degrees of freedom).
    /// </summary>
    /// <param name="minusSumLogTails">−Σ ln pᵢ (= X/2).</param>
    /// <param name="count">k, the number of tail probabilities.</param>
    internal static double FisherCombination(double minusSumLogTails, int count)
    {
        if (count == 0) return 1;
        double half = minusSumLogTails;
        double term = 1, sum = 1;
        for (int j = 1; j < count; j++) { term *= half / j; sum += term; }
        return Math.Clamp(Math.Exp(-half) * sum, 0, 1);
    }
}
