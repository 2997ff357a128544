using System.Globalization;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Optics;
using GemIndex.Core.Optics.Dispersion;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Core.Quantities;
using GemIndex.Core.Readings;

namespace GemIndex.Core.Identification;

/// <summary>
/// The refractometer's evidence for one material: the rotation series' interpretations (mixed by weight),
/// a spot reading, and "over the limit" as a censored reading. Readings in light other than 589.3 nm are
/// moved to 589.3 nm with the material's own dispersion (two-term Cauchy through n and nG − nB).
/// </summary>
internal static class RefractometerEvidence
{
    /// <summary>Dispersion assumed when the catalogue has none (a typical silicate), with half of the shift as extra σ.</summary>
    private const double AssumedDispersion = 0.015;

    /// <summary>Birefringence an aggregate can show as a faint second edge.</summary>
    private const double AggregateBirefringence = 0.006;

    // Uniaxial readings from a biaxial stone need a facet near a principal section; both edges moving cannot come from
    // a uniaxial stone except by misreading. Judgements (docs/ranking.md).
    private const double BiaxialLooksUniaxial = 0.1;
    private const double UniaxialLooksBiaxial = 0.02;
    private const double SignMisread = 0.05;

    // "Not in the catalogue": uniaxial and biaxial equally likely, either sign.
    private const double CharacterBroad = 0.25;

    public static void Add(MaterialProfile profile, AnalysedSheet sheet, EvidenceAccumulator acc)
    {
        if (sheet.Sheet.Refractometer is not { } r) return;
        var m = profile.Material;
        double shift = WavelengthShift(m, r.LightNanometres, out double shiftSigma);
        if (sheet.Series is { } series) Series(profile, series, r, shift, shiftSigma, acc);
        if (r.Spot is { } spot) Spot(m, spot, r.ReadingPrecision, shift, shiftSigma, acc);
        if (r.OverLimit) OverLimit(m, r, hasReadings: sheet.Series is not null || r.Spot is not null, acc);
    }

    /// <summary>n(589.3) − n(λ) for the material, by the two-term Cauchy model through its n and nG − nB.</summary>
    internal static double WavelengthShift(Material m, double lightNanometres, out double sigma)
    {
        sigma = 0;
        if (Math.Abs(lightNanometres - RefractometerObservation.SodiumLightNanometres) < 0.5) return 0;
        double dispersion = m.Dispersion ?? AssumedDispersion;
        var model = CauchyModel.FromIndexAndDispersion(new RefractiveIndex(m.Indices.Lowest.Centre), dispersion);
        double shift = model.IndexAt(ReferenceWavelengths.D) - model.IndexAt(Wavelength.FromNanometres(lightNanometres));
        if (m.Dispersion is null) sigma = Math.Abs(shift) / 2;
        return shift;
    }

    private static void Series(MaterialProfile profile, RotationSeriesResult series, RefractometerObservation r, double shift, double shiftSigma, EvidenceAccumulator acc)
    {
        var m = profile.Material;
        double f = 0, g = 0, bestWeighted = -1, bestTail = 1;
        PartSet best = default;
        SeriesInterpretation? bestInterpretation = null;
        var interpretations = series.Interpretations;
        for (int i = 0; i < interpretations.Count; i++)
        {
            var h = interpretations[i];
            var parts = Parts(m, profile.Birefringence, h, r.ReadingPrecision, shift, shiftSigma, acc.Explaining, out double factor, out double broadFactor);
            double fh = factor * parts.Likelihood, gh = broadFactor * parts.Broad;
            f += h.Weight * fh;
            g += h.Weight * gh;
            if (h.Weight * fh > bestWeighted)
            {
                bestWeighted = h.Weight * fh;
                best = parts;
                bestInterpretation = h;
                bestTail = factor >= 0.5 ? 1 : factor * 2;
            }
        }
        acc.Add("refractometer", f, g, bestTail * best.Tail, robust: true);
        if (acc.Explaining && bestInterpretation is not null)
            acc.Say($"{bestInterpretation.Description}; " + string.Join("; ", best.Texts) + Character(m, bestInterpretation));
    }

    private static string Character(Material m, SeriesInterpretation h)
    {
        if (h.Character is not { } c || c == OpticCharacter.Isotropic) return "";
        string expected = m.OpticCharacter.ToString().ToLowerInvariant();
        string sign = m.Sign is OpticSign.None ? "" : " " + m.Sign.ToString().ToLowerInvariant();
        return c == m.OpticCharacter && (h.Sign == OpticSign.None || m.Sign == OpticSign.Either || h.Sign == m.Sign)
            ? $"; {expected}{sign} as expected"
            : $"; {expected}{sign} expected";
    }

    private readonly record struct Part(double Likelihood, double Broad, double Tail, string Text);

    /// <summary>Two or three parts of one interpretation's evidence, without a heap allocation per material.</summary>
    private readonly struct PartSet
    {
        private readonly Part _a, _b, _c;
        private readonly bool _three;

        public PartSet(Part a, Part b) => (_a, _b) = (a, b);

        public PartSet(Part a, Part b, Part c) => (_a, _b, _c, _three) = (a, b, c, true);

        public double Likelihood => _a.Likelihood * _b.Likelihood * (_three ? _c.Likelihood : 1);

        public double Broad => _a.Broad * _b.Broad * (_three ? _c.Broad : 1);

        public double Tail => _a.Tail * _b.Tail * (_three ? _c.Tail : 1);

        public IEnumerable<string> Texts => _three ? [_a.Text, _b.Text, _c.Text] : [_a.Text, _b.Text];
    }

    private static PartSet Parts(Material m, PropertyRange birefringence, SeriesInterpretation h, double sigma, double shift, double shiftSigma, bool words, out double factor, out double broadFactor)
    {
        var indices = m.Indices;
        factor = 1;
        broadFactor = 1;
        if (h.Character is null)
        {
            // Too few steps: each edge lies between the lowest and highest index, and the edges' separation is at most the birefringence.
            var span = new PropertyRange(indices.Lowest.Minimum, indices.Highest.Maximum);
            return new(Index("low edge", h.Lowest.Value, h.Lowest.StandardUncertainty, span, shift, shiftSigma, words),
                    Index("high edge", h.Highest.Value, h.Highest.StandardUncertainty, span, shift, shiftSigma, words),
                    Birefringence(h.Birefringence.Value, h.Birefringence.StandardUncertainty, new PropertyRange(0, birefringence.Maximum), "at most", words));
        }
        if (h.Character == OpticCharacter.Isotropic)
        {
            var span = new PropertyRange(indices.Lowest.Minimum, indices.Highest.Maximum);
            double band = RotationSeriesAnalysis.ConstantBandSigmas * sigma;
            double noSecondEdge = RangeLikelihood.ProbabilityBelow(band, birefringence, h.Birefringence.StandardUncertainty);
            double tail = birefringence.Minimum <= band ? 1 : RangeLikelihood.TwoSidedTail((birefringence.Minimum - band) / h.Birefringence.StandardUncertainty);
            return new(Index("n", h.Lowest.Value, h.Lowest.StandardUncertainty, span, shift, shiftSigma, words),
                    new Part(noSecondEdge, BroadDensities.SingleEdge, tail, !words ? "" :
                        birefringence.Maximum <= band ? "no second edge, as expected" : $"no second edge where birefringence {birefringence.ToString("0.000")} is expected"));
        }
        broadFactor = CharacterBroad;
        var bire = Birefringence(h.Birefringence.Value, h.Birefringence.StandardUncertainty,
            new PropertyRange(birefringence.Minimum * (1 - h.SamplingShortfall), birefringence.Maximum), "expected", words);
        if (h.Character == OpticCharacter.Uniaxial)
        {
            if (m.OpticCharacter == OpticCharacter.Uniaxial)
            {
                factor = m.Sign == OpticSign.Either ? 0.5 : h.Sign == m.Sign ? 1 - SignMisread : SignMisread;
                return new(Index("ω", h.Constant!.Value.Value, h.Constant.Value.StandardUncertainty, indices.Omega!.Value, shift, shiftSigma, words), bire);
            }
            if (m.OpticCharacter == OpticCharacter.Biaxial)
            {
                // A biaxial stone whose β lies within the constant band of α (or of γ) shows that edge constant on every
                // facet: it looks uniaxial by nature, not by a rare orientation.
                double band = RotationSeriesAnalysis.ConstantBandSigmas * sigma;
                double gap = h.Sign == OpticSign.Negative
                    ? indices.Gamma!.Value.Centre - indices.Beta!.Value.Centre
                    : indices.Beta!.Value.Centre - indices.Alpha!.Value.Centre;
                factor = gap <= band ? 1 : BiaxialLooksUniaxial;
            }
            var constantRange = h.Sign == OpticSign.Negative ? indices.Highest : indices.Lowest;
            return new(Index(h.Sign == OpticSign.Negative ? "highest index" : "lowest index", h.Constant!.Value.Value, h.Constant.Value.StandardUncertainty, constantRange, shift, shiftSigma, words), bire);
        }
        // Biaxial readings.
        if (m.OpticCharacter == OpticCharacter.Biaxial)
            return new(Index("α", h.Lowest.Value, h.Lowest.StandardUncertainty, indices.Alpha!.Value, shift, shiftSigma, words),
                    Index("β", h.Beta!.Value.Value, h.Beta.Value.StandardUncertainty, indices.Beta!.Value, shift, shiftSigma, words), bire);
        if (m.OpticCharacter == OpticCharacter.Uniaxial) factor = UniaxialLooksBiaxial;
        return new(Index("lowest index", h.Lowest.Value, h.Lowest.StandardUncertainty, indices.Lowest, shift, shiftSigma, words), bire);
    }

    private static Part Index(string symbol, double observed, double sigma, PropertyRange range, double shift, double shiftSigma, bool words)
    {
        double x = observed + shift;
        double s = double.Hypot(sigma, shiftSigma);
        double z = RangeLikelihood.StandardDeviationsOutside(x, range, s);
        return new Part(RangeLikelihood.Density(x, range, s), BroadDensities.Index, RangeLikelihood.TwoSidedTail(z), !words ? "" :
            $"{symbol} {x.ToString("0.000", CultureInfo.InvariantCulture)} {EvidenceLikelihood.Where(x, range, s, "0.000")}");
    }

    private static Part Birefringence(double observed, double sigma, PropertyRange range, string how, bool words)
    {
        double z = RangeLikelihood.StandardDeviationsOutside(observed, range, sigma);
        string text = !words ? "" : range.Contains(observed) || z < 2
            ? $"birefringence {observed.ToString("0.000", CultureInfo.InvariantCulture)}, {how} {range.ToString("0.000")}"
            : $"birefringence {observed.ToString("0.000", CultureInfo.InvariantCulture)} where {range.ToString("0.000")} is expected";
        return new Part(RangeLikelihood.Density(observed, range, sigma), BroadDensities.Birefringence, RangeLikelihood.TwoSidedTail(z), text);
    }

    /// <summary>The material's birefringence range; derived from its index ranges where the catalogue gives none.</summary>
    internal static PropertyRange BirefringenceRange(Material m)
    {
        if (m.Birefringence is { } b) return b;
        return m.OpticCharacter switch
        {
            OpticCharacter.Aggregate => new PropertyRange(0, AggregateBirefringence),
            OpticCharacter.Uniaxial or OpticCharacter.Biaxial => new PropertyRange(
                Math.Max(0, m.Indices.Highest.Minimum - m.Indices.Lowest.Maximum), m.Indices.Highest.Maximum - m.Indices.Lowest.Minimum),
            _ => new PropertyRange(0, 0),
        };
    }

    private static void Spot(Material m, double spot, double sigma, double shift, double shiftSigma, EvidenceAccumulator acc)
    {
        // A spot reading on a doubly refractive stone averages its edges: anywhere from the lowest to the highest index.
        var span = new PropertyRange(m.Indices.Lowest.Minimum, m.Indices.Highest.Maximum);
        var part = Index("spot reading", spot, sigma, span, shift, shiftSigma, acc.Explaining);
        acc.Add("refractometer", part.Likelihood, part.Broad, part.Tail, robust: true);
        if (acc.Explaining) acc.Say(part.Text);
    }

    private static void OverLimit(Material m, RefractometerObservation r, bool hasReadings, EvidenceAccumulator acc)
    {
        // Censored: with no edge at all the lowest index is above the liquid; with edges read, the highest one is.
        var range = hasReadings ? m.Indices.Highest : m.Indices.Lowest;
        double limit = r.LiquidLimit;
        const double sigma = 0.003; // where exactly the liquid's own edge hides a stone edge
        double p = RangeLikelihood.ProbabilityAbove(limit, range, sigma);
        double tail = RangeLikelihood.TwoSidedTail(Math.Max(0, limit - range.Maximum) / sigma);
        acc.Add("refractometer", p, hasReadings ? 0.3 : BroadDensities.OverLimit, tail, robust: true);
        if (acc.Explaining)
            acc.Say($"over the limit (n > {limit.ToString("0.000", CultureInfo.InvariantCulture)}): {(hasReadings ? "highest" : "lowest")} index {range.ToString("0.000")} expected");
    }
}
