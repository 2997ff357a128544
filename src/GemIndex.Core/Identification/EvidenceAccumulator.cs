namespace GemIndex.Core.Identification;

/// <summary>
/// Sums the evidence of one sheet for one candidate: log-likelihoods under the candidate and under
/// "not in the catalogue", the per-test tail probabilities for the fit, and (when asked) the words.
/// </summary>
internal sealed class EvidenceAccumulator(bool explaining)
{
    private readonly List<EvidenceContribution>? _contributions = explaining ? [] : null;
    private double _logLikelihood, _logOther, _lastBits, _lastTail, _sumLogTails;
    private int _tests;
    private string _lastTest = "";

    public bool Explaining => _contributions is not null;

    /// <summary>
    /// Adds one test. Continuous readings are mixed with the broad density (a robust likelihood: misreadings
    /// and ranges narrower than nature); reactions carry their own error rates in <paramref name="likelihood"/>.
    /// </summary>
    public void Add(string test, double likelihood, double broad, double tail, bool robust)
    {
        double mixed = robust
            ? (1 - BroadDensities.MisreadingShare) * likelihood + BroadDensities.MisreadingShare * broad
            : likelihood;
        mixed = Math.Max(mixed, 1e-300);
        _logLikelihood += Math.Log(mixed);
        _logOther += Math.Log(broad);
        _sumLogTails += Math.Log(Math.Clamp(tail, 1e-300, 1));
        _tests++;
        _lastTest = test;
        if (_contributions is not null) { _lastBits = Math.Log2(mixed / broad); _lastTail = tail; }
    }

    /// <summary>
    /// Adds one test given as natural logs (densities of many readings overflow a double): the robust mixture is
    /// ln((1 − ρ) e^f + ρ e^g).
    /// </summary>
    public void AddLog(string test, double logLikelihood, double logBroad, double tail, bool robust)
    {
        double mixed = robust
            ? Identification.SectionLikelihood.LogSum.Add(Math.Log(1 - BroadDensities.MisreadingShare) + logLikelihood, Math.Log(BroadDensities.MisreadingShare) + logBroad)
            : logLikelihood;
        mixed = Math.Max(mixed, -690);
        _logLikelihood += mixed;
        _logOther += logBroad;
        _sumLogTails += Math.Log(Math.Clamp(tail, 1e-300, 1));
        _tests++;
        _lastTest = test;
        if (_contributions is not null) { _lastBits = (mixed - logBroad) / Math.Log(2); _lastTail = tail; }
    }

    /// <summary>Words for the test added last.</summary>
    public void Say(string text)
    {
        _contributions?.Add(new EvidenceContribution(_lastTest, text, _lastBits, _lastTail >= 0.05));
    }

    public CandidateEvaluation Result() => new()
    {
        LogLikelihood = _logLikelihood,
        LogLikelihoodNotInCatalogue = _logOther,
        Fit = FisherCombination(-_sumLogTails, _tests),
        Contributions = _contributions ?? (IReadOnlyList<EvidenceContribution>)[],
    };

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
