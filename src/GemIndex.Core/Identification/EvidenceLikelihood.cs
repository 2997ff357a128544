using GemIndex.Core.Bench;
using System.Globalization;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Gravity;
using GemIndex.Core.Magnification;
using GemIndex.Core.Observations;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Core.Readings;

namespace GemIndex.Core.Identification;

/// <summary>
/// The likelihood of a bench sheet under one catalogue material, test by test (docs/ranking.md gives the
/// model): continuous readings by the range-convolved likelihood of <see cref="RangeLikelihood"/>, bounds by
/// its tails, reactions by small tables that admit misreadings.
/// </summary>
public static class EvidenceLikelihood
{
    /// <summary>Extra SG spread beyond the catalogue range and the weighing (inclusions, natural variation), σ.</summary>
    public const double SpecificGravityFloor = 0.005;

    /// <summary>Weighs every test on the sheet for <paramref name="material"/>.</summary>
    /// <param name="material">The candidate.</param>
    /// <param name="sheet">The analysed sheet.</param>
    /// <param name="explain">Also produce the contributions in words (slower).</param>
    public static CandidateEvaluation Evaluate(Material material, AnalysedSheet sheet, bool explain = false) =>
        Evaluate(new MaterialProfile(material), sheet, explain);

    /// <summary>Weighs every test on the sheet for a prepared material (the ranking's fast path).</summary>
    public static CandidateEvaluation Evaluate(MaterialProfile profile, AnalysedSheet sheet, bool explain = false)
    {
        var acc = new EvidenceAccumulator(explain);
        Weigh(profile, sheet, acc);
        return acc.Result();
    }

    /// <summary>Weighs every test on the sheet for a prepared material into <paramref name="acc"/>, emptied first.</summary>
    internal static void Weigh(MaterialProfile profile, AnalysedSheet sheet, EvidenceAccumulator acc)
    {
        var material = profile.Material;
        acc.Reset();
        RefractometerEvidence.Add(profile, sheet, acc);
        var s = sheet.Sheet;
        // An aggregate's spot index and SG both follow its mix of minerals: counted as correlated, not independent.
        int gravityGroup = (material.Forms & MaterialForm.Aggregate) != 0 && s.Refractometer?.Spot is not null ? EvidenceAccumulator.AggregateGroup : EvidenceAccumulator.Independent;
        if (s.SpecificGravity is { } sg) SpecificGravity(material, sg.Value, sg.StandardUncertainty, acc, gravityGroup, sheet.SingleIndex);
        // Heavy liquids beside a weighed SG bound the same property: given the SG reading, they say only what the reading
        // leaves open (docs/ranking.md §2, "heavy liquids beside a weighed SG"). Read against it, both are weighed as read.
        if (sheet.LiquidsBesideGravity is { } bounds && LiquidsGivenGravity(material, bounds) is { } given)
        {
            acc.Add(BenchField.HeavyLiquids, given, bounds.Broad, acc.Fitting ? s.HeavyLiquids.Min(h => HeavyLiquidTail(material, h)) : 1, robust: true);
            if (acc.Explaining)
                acc.Say($"{string.Join(", ", s.HeavyLiquids.Select(h => $"{Word(h.Outcome)} in {F2(h.Liquid.Value)}"))}, read with SG {F2(bounds.Value)}: "
                    + $"{(given * 2 < bounds.Broad ? "the liquids rule out part of what the SG allows; " : "")}SG {material.SpecificGravity.ToString("0.00")} expected");
        }
        else
            for (int i = 0; i < s.HeavyLiquids.Count; i++) HeavyLiquid(material, s.HeavyLiquids[i], acc);
        // A stone the bench calls opaque stays dark between crossed polarisers, shows one colour in the dichroscope and no
        // fire, whatever it is: those readings say nothing of the material and are not weighed (docs/ranking.md §2, "An
        // opaque stone"). A reaction that needs light through the stone is weighed as read, and warned of.
        var opaque = sheet.OpaqueStoneShows;
        PolariscopeReaction? polariscope = opaque.Polariscope ? null : s.Polariscope;
        if (polariscope is { } pol) Polariscope(profile, pol, acc);
        if (s.Pleochroism is { } pl && !opaque.Pleochroism) Pleochroism(profile, pl, sheet.IsColourless, lightCounted: polariscope is not null, acc);
        if (s.Dispersion is { } d && !opaque.Fire) Dispersion(material, d, acc);
        if (s.ThermalProbe is { } t) Thermal(material, t, acc);
        if (s.Electrical is { } e) Electrical(material, e, acc);
        if (s.Reflectance is { } reflectance) Reflectance(material, reflectance, acc);
        if (s.UvLong is { } ul) Fluorescence(BenchField.UvLong, "long-wave UV", material.UvLong, profile.UvLong, ul, acc);
        if (s.UvShort is { } us) Fluorescence(BenchField.UvShort, "short-wave UV", material.UvShort, profile.UvShort, us, acc);
        if (s.AbsorptionLinesNanometres is { } lines) Absorption(profile, lines, acc);
        if (sheet.ColourHues.Count > 0) Colour(profile, s.Colour!, sheet.ColourHueList, acc);
        if (s.Cut == StoneCut.Faceted) FacetedCut(material, acc);
        if (s.Magnification is { IsEmpty: false } look)
        {
            // docs/ranking.md, "Magnification": "not in the catalogue" is the natural/imitation average.
            var expected = profile.Magnification;
            // The cut's implied absences weigh in the likelihood; with no look taken by hand the test stays out of the fit,
            // where a tail of 1 would only raise every candidate's combined fit.
            acc.AddLog(BenchField.Magnification, MagnificationEvidence.LogLikelihood(look, expected), sheet.LogBroadLook,
                acc.Fitting ? MagnificationEvidence.Fit(look, expected) : 1, robust: false, inFit: look.AnyLooked);
            // A faceted stone's star and cat's-eye that the entry would not show anyway say nothing worth a line.
            if (acc.Explaining && !(look.OnlyWhatTheCutSays && Math.Abs(acc.LastBits) < EvidenceContribution.NeutralBits))
                acc.Say(MagnificationEvidence.Reason(look, expected));
        }
    }

    /// <summary>
    /// Whether a reading (field and batch word) is what any opaque stone shows: the polariscope's "stays dark" (written
    /// singly refractive), the dichroscope's one colour, no fire by eye. The one statement of the rule; the front ends
    /// mark such readings as not weighed by it.
    /// </summary>
    public static bool ShownByAnyOpaqueStone(string field, string word) =>
        (field, word) is (BenchField.Polariscope, "singly_refractive") or (BenchField.Pleochroism, "none") or (BenchField.Dispersion, "none");

    /// <summary>
    /// Which of the sheet's transmitted-light readings are what any opaque stone shows (<see cref="ShownByAnyOpaqueStone"/>);
    /// all false unless the stone is read opaque.
    /// </summary>
    internal static (bool Polariscope, bool Pleochroism, bool Fire) SaysNothingOfAnOpaqueStone(BenchSheet s) =>
        s.Transparency != StoneTransparency.Opaque ? default
            : (s.Polariscope is { } p && ShownByAnyOpaqueStone(BenchField.Polariscope, BenchWords.Word(p)),
               s.Pleochroism is { } d && ShownByAnyOpaqueStone(BenchField.Pleochroism, BenchWords.Word(d)),
               s.Dispersion?.Seen is { } f && ShownByAnyOpaqueStone(BenchField.Dispersion, BenchWords.Word(f)));

    private static void SpecificGravity(Material m, double value, double sigma, EvidenceAccumulator acc, int group, double? index)
    {
        double s = double.Hypot(sigma, SpecificGravityFloor);
        var range = m.SpecificGravity;
        // A glass's SG follows its index (Gladstone–Dale): given the index read, only the densities its refractivity
        // allows at that index, within the entry's own range where the two overlap (docs/ranking.md §2, "Glass: index
        // and SG together"). An entry with a usual part, or whose range the bounds miss, keeps its own range.
        var given = m.SpecificRefractivity is { } k && index is > 1 && m.SpecificGravityUsual is null
            ? Overlap(range, Optics.GladstoneDale.Density(index.Value, k)) : null;
        range = given ?? range;
        double stray = RangeStrays.SpecificGravityShare * value;
        // A reading among the rare extremes of the range is no misfit: the fit's tail is the whole range's.
        acc.Add(BenchField.Sg, UsualPart.Mixed(range, m.SpecificGravityUsual, r => RangeStrays.Density(value, r, s, stray)), BroadDensities.SpecificGravity,
            acc.Fitting ? RangeStrays.Tail(value, range, s, stray) : 1, robust: true, group);
        if (acc.Explaining)
            acc.Say($"SG {Gravity.SpecificGravity.Text(value, sigma)} {Where(value, range, s, "0.00")}{Usually(value, sigma, range, m.SpecificGravityUsual)}"
                + (given is not null ? $" (at n {index!.Value.ToString("0.000", CultureInfo.InvariantCulture)}: a glass's SG rises with its index)" : ""));
    }

    /// <summary>
    /// The part of <paramref name="range"/> inside <paramref name="bounds"/>, or null when the two do not meet: the entry's
    /// index is then far from the reading, which its index test weighs, and its SG keeps its own range (the bounds alone
    /// had let a lead glass of SG 3.3–4.0 fit an SG of 1.57 read beside an index of 1.35).
    /// </summary>
    private static PropertyRange? Overlap(PropertyRange range, PropertyRange bounds) =>
        range.Maximum < bounds.Minimum || range.Minimum > bounds.Maximum ? null
            : new(Math.Max(range.Minimum, bounds.Minimum), Math.Min(range.Maximum, bounds.Maximum), "specific gravity");

    /// <summary>
    /// A reflectance meter's reading: the index it gives (with its uncertainty) against the entry's indices, lowest to
    /// highest (the meter reads whatever direction the facet shows); not in the catalogue: the broad index density
    /// (docs/ranking.md §2). A reading taken beside the refractometer's is a second, independent look at the index.
    /// </summary>
    private static void Reflectance(Material m, ReflectanceReading reading, EvidenceAccumulator acc)
    {
        // An opaque material absorbs: its reflectance follows its absorption too, not its index alone (pyrite and hematite
        // read far above what their indices give), so the reading says nothing of it here.
        if (m.IsOpaque)
        {
            acc.Add(BenchField.Reflectance, BroadDensities.Index, BroadDensities.Index, 1, robust: false);
            if (acc.Explaining)
                acc.Say($"reflectance {reading.Percent.ToString("0.0", CultureInfo.InvariantCulture)} %; an opaque, absorbing material's reflectance does not follow its index: not weighed");
            return;
        }
        var range = new PropertyRange(m.Indices.Lowest.Minimum, m.Indices.Highest.Maximum);
        double n = reading.Index.Value, sigma = reading.Index.StandardUncertainty;
        acc.Add(BenchField.Reflectance, RangeLikelihood.Density(n, range, sigma), BroadDensities.Index,
            acc.Fitting ? RangeLikelihood.TwoSidedTail(RangeLikelihood.StandardDeviationsOutside(n, range, sigma)) : 1, robust: true);
        if (acc.Explaining)
            acc.Say($"reflectance {reading.Percent.ToString("0.0", CultureInfo.InvariantCulture)} % (n about {n.ToString("0.00", CultureInfo.InvariantCulture)} ± {sigma.ToString("0.00", CultureInfo.InvariantCulture)}) {Where(n, range, sigma, "0.000")}");
    }

    /// <summary>σ of a heavy liquid's density, doubled for a suspended stone (a judgement, docs/ranking.md §5, other named values).</summary>
    private const double HeavyLiquidSigma = 0.01;

    /// <summary>"Not in the catalogue": the chance a stone floats, and that it sinks (judgement, docs/ranking.md §2).</summary>
    internal const double BroadFloatsOrSinks = 0.5;

    /// <summary>A suspended stone's SG is taken within a window this many σ wide (judgement, docs/ranking.md §2).</summary>
    internal const double SuspensionWindowSigmas = 4;

    /// <summary>
    /// P(the liquids' outcomes | the SG reading, the material): the share of the reading's spread (the SG's σ with the
    /// catalogue floor) within the liquids' bounds and the material's range, over the share within its range; for a
    /// material the catalogue lacks, <see cref="GravityWithLiquids.Broad"/>. Null when the reading lies so far outside the
    /// range that the shares underflow (the liquids are then weighed one by one).
    /// </summary>
    internal static double? LiquidsGivenGravity(Material m, GravityWithLiquids g)
    {
        var range = m.SpecificGravity;
        double inRange = g.Within(range.Minimum, range.Maximum);
        return inRange > 1e-12 ? g.Within(Math.Max(g.Low, range.Minimum), Math.Min(g.High, range.Maximum)) / inRange : null;
    }

    /// <summary>
    /// A weighed SG (its value and spread with the catalogue floor) and the bounds of the heavy liquids beside it, with the
    /// share of the reading's spread inside them (<see cref="Broad"/>, "not in the catalogue").
    /// </summary>
    internal sealed record GravityWithLiquids(double Value, double Spread, double Low, double High)
    {
        /// <summary>The share of N(Value, Spread) between two SGs.</summary>
        public double Within(double from, double to) => to <= from ? 0 : RangeLikelihood.Phi((to - Value) / Spread) - RangeLikelihood.Phi((from - Value) / Spread);

        /// <summary>The share inside the liquids' bounds: P(their outcomes | the reading) for a stone the catalogue lacks.</summary>
        public double Broad { get; private init; }

        /// <summary>The record with <see cref="Broad"/> worked out, once.</summary>
        public GravityWithLiquids Bounded() => this with { Broad = Within(Low, High) };
    }

    /// <summary>The weighed SG and the liquids' bounds when both were read and no liquid contradicts the SG, else null.</summary>
    internal static GravityWithLiquids? LiquidBounds(BenchSheet s)
    {
        if (s.SpecificGravity is not { } sg || s.HeavyLiquids.Count == 0 || s.HeavyLiquids.Any(h => BenchWarnings.Contradicts(sg, h))) return null;
        var bounds = new GravityWithLiquids(sg.Value, double.Hypot(sg.StandardUncertainty, SpecificGravityFloor),
            s.HeavyLiquids.Max(h => h.LowestSpecificGravity), s.HeavyLiquids.Min(h => h.HighestSpecificGravity)).Bounded();
        return bounds.Broad > 0 ? bounds : null;
    }

    /// <summary>A liquid's outcome against the range, for the fit: the two-sided tail of how far the range lies on the wrong side.</summary>
    private static double HeavyLiquidTail(Material m, HeavyLiquidResult liquid)
    {
        var range = m.SpecificGravity;
        double density = liquid.Liquid.Value;
        return liquid.Outcome switch
        {
            HeavyLiquidOutcome.Floats => RangeLikelihood.TwoSidedTail(Math.Max(0, range.Minimum - density) / HeavyLiquidSigma),
            HeavyLiquidOutcome.Sinks => RangeLikelihood.TwoSidedTail(Math.Max(0, density - range.Maximum) / HeavyLiquidSigma),
            _ => RangeLikelihood.TwoSidedTail(RangeLikelihood.StandardDeviationsOutside(density, range, 2 * HeavyLiquidSigma)),
        };
    }

    private static void HeavyLiquid(Material m, HeavyLiquidResult liquid, EvidenceAccumulator acc)
    {
        const double sigma = HeavyLiquidSigma;
        var range = m.SpecificGravity;
        double density = liquid.Liquid.Value;
        bool fitting = acc.Fitting;
        var usual = m.SpecificGravityUsual;
        double tail = fitting ? HeavyLiquidTail(m, liquid) : 1;
        (double f, double g) = liquid.Outcome switch
        {
            HeavyLiquidOutcome.Floats => (UsualPart.Mixed(range, usual, r => RangeLikelihood.ProbabilityBelow(density, r, sigma)), BroadFloatsOrSinks),
            HeavyLiquidOutcome.Sinks => (UsualPart.Mixed(range, usual, r => RangeLikelihood.ProbabilityAbove(density, r, sigma)), BroadFloatsOrSinks),
            _ => (UsualPart.Mixed(range, usual, r => RangeLikelihood.Density(density, r, 2 * sigma)) * SuspensionWindowSigmas * sigma,
                SuspensionWindowSigmas * sigma * BroadDensities.SpecificGravity),
        };
        acc.Add(BenchField.HeavyLiquids, f, g, tail, robust: true);
        if (acc.Explaining)
            acc.Say($"{Word(liquid.Outcome)} in liquid of density {F2(density)}: SG {range.ToString("0.00")} expected"
                + (usual is { } u ? $", usually {u.ToString("0.00")}" : ""));
    }

    /// <summary>
    /// A polariscope reaction or a pleochroism reading needs light through the stone. On a material the catalogue calls
    /// opaque one is written only at thin edges or translucent patches, or by mistake: this share of the chance on a stone
    /// that transmits light, counted once per stone (a judgement; docs/ranking.md §2). The reaction written says nothing more.
    /// </summary>
    public const double OpaqueReadingShare = 0.2;

    private static void Polariscope(MaterialProfile profile, PolariscopeReaction seen, EvidenceAccumulator acc)
    {
        var m = profile.Material;
        if (m.IsOpaque)
        {
            // The reaction itself says nothing of an opaque material, but that one was written says light passed.
            acc.Add(BenchField.Polariscope, OpaqueReadingShare * 0.25, 0.25, OpaqueReadingShare, robust: false);
            if (acc.Explaining) acc.Say("polariscope: a reaction was written, but this material is opaque (light passes at thin edges at most)");
            return;
        }
        double f = profile.Polariscope[(int)seen];
        acc.Add(BenchField.Polariscope, f, 0.25, f / profile.PolariscopeUsual, robust: false);
        var usual = UsualReactions(m);
        if (acc.Explaining)
            acc.Say($"polariscope {Word(seen)}{(usual.Contains(seen) ? ", as expected" : $", where {string.Join(" or ", usual.Select(Word))} is usual")}");
    }

    /// <summary>The reactions the catalogue lists for the material, or those of its optic character when it lists none.</summary>
    internal static IReadOnlyList<PolariscopeReaction> UsualReactions(Material m) =>
        m.Polariscope.Count > 0 ? m.Polariscope : DefaultReactions(m.OpticCharacter);

    /// <summary>P(each polariscope reaction) from misreading: a skilled person still misreads now and then (judgement, docs/ranking.md §2).</summary>
    internal const double PolariscopeMisreading = 0.015;

    /// <summary>P(reaction seen | usual reactions): 0.94 shared among the usual ones, 0.015 for each reaction (misreadings).</summary>
    internal static double PolariscopeProbability(IReadOnlyList<PolariscopeReaction> usual, PolariscopeReaction seen)
    {
        const double error = PolariscopeMisreading;
        return (usual.Contains(seen) ? (1 - 4 * error) / usual.Count : 0) + error;
    }

    private static readonly PolariscopeReaction[] DoublyRefractiveOnly = [PolariscopeReaction.DoublyRefractive];
    private static readonly PolariscopeReaction[] AggregateOnly = [PolariscopeReaction.Aggregate];
    private static readonly PolariscopeReaction[] SinglyRefractiveOrAnomalous = [PolariscopeReaction.SinglyRefractive, PolariscopeReaction.Anomalous];

    /// <summary>The reactions a material of this character shows when the catalogue lists none.</summary>
    internal static IReadOnlyList<PolariscopeReaction> DefaultReactions(OpticCharacter c) => c switch
    {
        OpticCharacter.Uniaxial or OpticCharacter.Biaxial => DoublyRefractiveOnly,
        OpticCharacter.Aggregate => AggregateOnly,
        _ => SinglyRefractiveOrAnomalous,
    };

    private static void Pleochroism(MaterialProfile profile, PleochroismObservation seen, bool colourless, bool lightCounted, EvidenceAccumulator acc)
    {
        var m = profile.Material;
        if (m.IsOpaque)
        {
            // Light through the stone is counted once: by the polariscope's reading when there is one.
            double share = lightCounted ? 1 : OpaqueReadingShare;
            acc.Add(BenchField.Pleochroism, share / 3, 1 / 3.0, share, robust: false);
            if (acc.Explaining)
                acc.Say(lightCounted ? "pleochroism: opaque material, the dichroscope says nothing about it"
                    : "pleochroism: a reading was written, but this material is opaque (light passes at thin edges at most)");
            return;
        }
        double[] row = PleochroismRow(m.OpticCharacter, colourless ? PleochroismStrength.None : m.Pleochroism);
        double f = row[(int)seen];
        acc.Add(BenchField.Pleochroism, f, 1 / 3.0, f / (colourless ? profile.PleochroismLargestColourless : profile.PleochroismLargest), robust: false);
        if (acc.Explaining)
        {
            string expected = m.OpticCharacter is OpticCharacter.Uniaxial or OpticCharacter.Biaxial
                ? (m.Pleochroism == PleochroismStrength.None ? "no pleochroism expected"
                    : $"{m.Pleochroism.ToString().ToLowerInvariant()} pleochroism ({(m.OpticCharacter == OpticCharacter.Biaxial ? "up to three colours" : "two colours at most")}"
                      + (m.Pleochroism == PleochroismStrength.Weak ? ", often too faint to see" : "") + ") expected")
                : m.OpticCharacter switch
                {
                    OpticCharacter.Aggregate => "none expected (an aggregate: its many crystals' colours mix)",
                    OpticCharacter.Amorphous => "none expected (amorphous: singly refractive)",
                    _ => "none expected (singly refractive)",
                };
            acc.Say($"pleochroism {seen.ToString().ToLowerInvariant()}; {expected}");
        }
    }

    // Rows: P(none, dichroic, trichroic | character, strength). Weak pleochroism is often missed; a uniaxial stone cannot
    // show three colours, so "trichroic" there is a misreading. Judgements (docs/ranking.md).
    private static readonly double[][] UniaxialPleochroism = [[0.90, 0.09, 0.01], [0.50, 0.48, 0.02], [0.20, 0.77, 0.03], [0.08, 0.89, 0.03]];
    private static readonly double[][] BiaxialPleochroism = [[0.90, 0.07, 0.03], [0.50, 0.30, 0.20], [0.20, 0.40, 0.40], [0.08, 0.37, 0.55]];
    private static readonly double[] SingleIndexPleochroism = [0.95, 0.04, 0.01];

    /// <summary>P(none, dichroic, trichroic) for a material of this character and pleochroism strength.</summary>
    internal static double[] PleochroismRow(OpticCharacter c, PleochroismStrength s) => c switch
    {
        OpticCharacter.Uniaxial => UniaxialPleochroism[(int)s],
        OpticCharacter.Biaxial => BiaxialPleochroism[(int)s],
        _ => SingleIndexPleochroism,
    };

    // P(band seen | expected band) by distance between the bands: 0, 1, 2, 3 or more.
    private static readonly double[] DispersionSlip = [0.6, 0.15, 0.04, 0.01];

    /// <summary>P(each of the five dispersion words) when the material's nG − nB is in <paramref name="expected"/>.</summary>
    internal static double[] DispersionRow(DispersionStrength expected) => DispersionRows[(int)expected];

    private static readonly double[][] DispersionRows = [.. Enumerable.Range(0, 5).Select(b => NewDispersionRow((DispersionStrength)b))];

    private static double[] NewDispersionRow(DispersionStrength expected)
    {
        var row = new double[5];
        for (int i = 0; i < 5; i++) row[i] = DispersionSlip[Math.Min(3, Math.Abs(i - (int)expected))];
        // A weak fire is as often written "none" as "weak" by eye: body colour and a small stone mask it (common practice;
        // a ruby or a quartz written "none" had been held slightly against). The two share what they hold together.
        if (expected == DispersionStrength.Weak)
            row[(int)DispersionStrength.None] = row[(int)DispersionStrength.Weak] = (row[(int)DispersionStrength.None] + row[(int)DispersionStrength.Weak]) / 2;
        double sum = row.Sum();
        for (int i = 0; i < 5; i++) row[i] /= sum;
        return row;
    }

    private static void Dispersion(Material m, DispersionObservation d, EvidenceAccumulator acc)
    {
        if (d.Measured is { } measured)
        {
            if (m.Dispersion is not { } known) { acc.Add(BenchField.Dispersion, BroadDensities.Dispersion, BroadDensities.Dispersion, 1, false); return; }
            var range = new PropertyRange(MeasuredDispersionLow * known, MeasuredDispersionHigh * known);
            double sigma = MeasuredDispersionSigma;
            double z = RangeLikelihood.StandardDeviationsOutside(measured, range, sigma);
            acc.Add(BenchField.Dispersion, RangeLikelihood.Density(measured, range, sigma), BroadDensities.Dispersion, acc.Fitting ? RangeLikelihood.TwoSidedTail(z) : 1, robust: true);
            if (acc.Explaining) acc.Say($"dispersion nG − nB {F3(measured)} {Where(measured, range, sigma, "0.000")}");
            return;
        }
        var seen = d.Seen!.Value;
        if (FireToJudge(m) is not { } value)
        {
            acc.Add(BenchField.Dispersion, 0.2, 0.2, 1, robust: false);
            if (acc.Explaining) acc.Say($"dispersion {Word(seen)}; {(m.IsOpaque ? "no fire to judge in an opaque stone" : "not known for this material")}");
            return;
        }
        var expected = DispersionBand(value);
        double[] row = DispersionRow(expected);
        double f = row[(int)seen];
        acc.Add(BenchField.Dispersion, f, 0.2, f / row[(int)expected], robust: false);
        if (acc.Explaining) acc.Say($"dispersion {Word(seen)}; nG − nB {F3(value)} ({Word(DispersionBand(value))}) expected");
    }

    /// <summary>A measured dispersion's range runs from this times the catalogue value (judgement, docs/ranking.md §2).</summary>
    internal const double MeasuredDispersionLow = 0.9;

    /// <summary>A measured dispersion's range runs to this times the catalogue value (judgement, docs/ranking.md §2).</summary>
    internal const double MeasuredDispersionHigh = 1.1;

    /// <summary>σ of a measured dispersion nG − nB (judgement, docs/ranking.md §2).</summary>
    internal const double MeasuredDispersionSigma = 0.0015;

    /// <summary>
    /// The dispersion a fire judged by eye is weighed against, or null when the word says nothing of the entry: none
    /// given, or an opaque entry (fire is judged in light that has passed through the stone, as the polariscope and
    /// dichroscope need). The likelihood and the next-test advice both ask here.
    /// </summary>
    internal static double? FireToJudge(Material m) => m.IsOpaque ? null : m.Dispersion;

    /// <summary>nG − nB from which a fire is called weak (judgement, docs/ranking.md §2).</summary>
    internal const double DispersionWeakFrom = 0.010;

    /// <summary>nG − nB from which a fire is called moderate (judgement, docs/ranking.md §2).</summary>
    internal const double DispersionModerateFrom = 0.020;

    /// <summary>nG − nB from which a fire is called strong (judgement, docs/ranking.md §2).</summary>
    internal const double DispersionStrongFrom = 0.035;

    /// <summary>nG − nB from which a fire is called very strong (judgement, docs/ranking.md §2).</summary>
    internal const double DispersionVeryStrongFrom = 0.070;

    /// <summary>The words a bench user gives the dispersion nG − nB (bands of <see cref="DispersionStrength"/>).</summary>
    public static DispersionStrength DispersionBand(double nGminusB) => nGminusB switch
    {
        < DispersionWeakFrom => DispersionStrength.None,
        < DispersionModerateFrom => DispersionStrength.Weak,
        < DispersionStrongFrom => DispersionStrength.Moderate,
        < DispersionVeryStrongFrom => DispersionStrength.Strong,
        _ => DispersionStrength.VeryStrong,
    };

    /// <summary>P(a heat-conduction probe reads positive | the material's usual reading): 0.97 for a diamond-like conductor (a probe can miss on a small or dirty stone), 0.02 otherwise (a judgement; docs/ranking.md §2).</summary>
    internal static double ThermalPositive(Material m) => m.ThermalProbe == ThermalProbeResult.Positive ? ThermalPositiveWhenListed : ThermalPositiveOtherwise;

    /// <summary>P(probe positive) for a material listed as a heat conductor (judgement, docs/ranking.md §2).</summary>
    internal const double ThermalPositiveWhenListed = 0.97;

    /// <summary>P(probe positive) for any other material (judgement, docs/ranking.md §2).</summary>
    internal const double ThermalPositiveOtherwise = 0.02;

    /// <summary>P(the conductivity tester reads conductive | the material's usual reading): 0.9 for a conductor (poor contact fails), 0.03 otherwise (a judgement; docs/ranking.md §2).</summary>
    internal static double ElectricalConductive(Material m) => m.Electrical == ElectricalResult.Conductive ? ConductiveWhenListed : ConductiveOtherwise;

    /// <summary>P(conductive) for a material listed as an electrical conductor (judgement, docs/ranking.md §2).</summary>
    internal const double ConductiveWhenListed = 0.9;

    /// <summary>P(conductive) for any other material (judgement, docs/ranking.md §2).</summary>
    internal const double ConductiveOtherwise = 0.03;

    /// <summary>"Not in the catalogue": P(probe positive) 0.05, P(conductive) 0.1 (few bench stones conduct heat or electricity).</summary>
    private const double BroadThermalPositive = 0.05, BroadConductive = 0.1;

    /// <summary>
    /// P(faceted | a material met only as an aggregate), against 1 for a crystal, a glass and "not in the catalogue":
    /// massive and granular materials are cut as cabochons, beads and carvings, and a faceted one is occasional
    /// (judgement, docs/ranking.md §1, "Form term"). Before, a faceted red stone with one edge at 1.718 read massive
    /// rhodonite first.
    /// </summary>
    internal const double AggregateFaceted = 0.1;

    private static void FacetedCut(Material m, EvidenceAccumulator acc)
    {
        bool aggregateOnly = (m.Forms & MaterialForm.Aggregate) != 0 && (m.Forms & MaterialForm.Crystal) == 0;
        // How common a cut is for a material, not how typical a reading: it stays out of the fit.
        // Unusual for an aggregate (said as against it), yet no misfit: it stays out of the fit.
        acc.AddLog(BenchField.Cut, aggregateOnly ? Math.Log(AggregateFaceted) : 0, 0, aggregateOnly ? 0 : 1, robust: false, inFit: false);
        if (acc.Explaining && aggregateOnly) acc.Say("cut faceted: a massive or granular material is seldom faceted (mostly cabochons, beads and carvings)");
    }

    /// <summary>How many of an entry's colours a reason names: a glass of any colour lists twenty-two (the rest are counted).</summary>
    internal const int ColoursNamed = 6;

    private static string UsualColours(IReadOnlyList<string> colours, string seen)
    {
        if (colours.Count <= ColoursNamed) return string.Join(", ", colours);
        // A colour of the reading's among the ones not named is named after the count, so the reason still shows it.
        var hues = ColourWords.PrincipalHues(seen).ToHashSet();
        var hidden = colours.Skip(ColoursNamed).Where(c => ColourWords.PrincipalHues(c).Any(hues.Contains)).ToList();
        return string.Join(", ", colours.Take(ColoursNamed)) + $" and {colours.Count - ColoursNamed} more"
            + (hidden.Count > 0 ? $" ({string.Join(", ", hidden)} among them)" : "");
    }

    private static void Thermal(Material m, ThermalProbeResult seen, EvidenceAccumulator acc)
    {
        double pPositive = ThermalPositive(m);
        double f = seen == ThermalProbeResult.Positive ? pPositive : 1 - pPositive;
        double g = seen == ThermalProbeResult.Positive ? BroadThermalPositive : 1 - BroadThermalPositive;
        acc.Add(BenchField.ThermalProbe, f, g, f / Math.Max(pPositive, 1 - pPositive), robust: false);
        if (acc.Explaining) acc.Say($"thermal probe {Word(seen)}, {(seen == m.ThermalProbe ? "as expected" : $"where {Word(m.ThermalProbe)} is expected")}");
    }

    private static void Electrical(Material m, ElectricalResult seen, EvidenceAccumulator acc)
    {
        double pConductive = ElectricalConductive(m);
        double f = seen == ElectricalResult.Conductive ? pConductive : 1 - pConductive;
        double g = seen == ElectricalResult.Conductive ? BroadConductive : 1 - BroadConductive;
        acc.Add(BenchField.Electrical, f, g, f / Math.Max(pConductive, 1 - pConductive), robust: false);
        if (acc.Explaining) acc.Say($"electrically {Word(seen)}, {(seen == m.Electrical ? "as expected" : $"where {Word(m.Electrical)} is expected")}");
    }

    private static void Fluorescence(string test, string lamp, IReadOnlyList<FluorescenceStrength> usual, MaterialProfile.FluorescenceTable table,
        FluorescenceStrength seen, EvidenceAccumulator acc)
    {
        if (usual.Count == 0)
        {
            acc.Add(test, 0.25, 0.25, 1, robust: false, EvidenceAccumulator.ChromophoreGroup);
            if (acc.Explaining) acc.Say($"{lamp} {Word(seen)}; not recorded for this material");
            return;
        }
        double f = table.Probabilities[(int)seen];
        acc.Add(test, f, 0.25, f / table.Usual, robust: false, EvidenceAccumulator.ChromophoreGroup);
        if (acc.Explaining) acc.Say($"{lamp} {Word(seen)}; {string.Join(" or ", usual.Select(Word))} usual");
    }

    /// <summary>UV: the weight the listed strengths share (judgement, docs/ranking.md §2).</summary>
    internal const double FluorescenceListedShare = 0.8;

    /// <summary>UV: the weight of a strength next to a listed one, a common judgement slip (judgement, docs/ranking.md §2).</summary>
    internal const double FluorescenceNeighbourWeight = 0.06;

    /// <summary>UV: the weight every strength has, listed or not (judgement, docs/ranking.md §2).</summary>
    internal const double FluorescenceFloor = 0.02;

    /// <summary>
    /// P(strength seen | usual strengths): a listed strength takes most of the mass (0.8 shared), a neighbouring strength
    /// is a common judgement slip (0.06), anything else 0.02; normalised over the four strengths.
    /// </summary>
    internal static double FluorescenceProbability(IReadOnlyList<FluorescenceStrength> usual, FluorescenceStrength seen)
    {
        double total = 0, mine = 0;
        for (var s = FluorescenceStrength.Inert; s <= FluorescenceStrength.Strong; s++)
        {
            bool listed = false, neighbour = false;
            foreach (var u in usual)
            {
                listed |= u == s;
                neighbour |= Math.Abs((int)u - (int)s) == 1;
            }
            double w = (listed ? FluorescenceListedShare / usual.Count : 0) + (neighbour ? FluorescenceNeighbourWeight : 0) + FluorescenceFloor;
            total += w;
            if (s == seen) mine = w;
        }
        return mine / total;
    }

    /// <summary>
    /// The fit's factor for each line seen that the entry does not list (a judgement, docs/ranking.md §4): about a
    /// spurious line's chance against a listed line's, so two unexplained lines make the fit poor.
    /// </summary>
    private const double UnexplainedLineFit = 0.07;

    private static void Absorption(MaterialProfile profile, IReadOnlyList<double> seen, EvidenceAccumulator acc)
    {
        Material m = profile.Material;
        double logF = AbsorptionLines.LogLikelihood(m.AbsorptionLines, profile.LineGroups, seen, profile.UnexplainedLineRate, out int unexplained, out int missedStrong);
        double logG = AbsorptionLines.LogBroad(seen);
        double tail = acc.Fitting ? Math.Pow(UnexplainedLineFit, unexplained) * Math.Pow(1 - AbsorptionLines.Detection(LineStrength.Strong), missedStrong) : 1;
        acc.AddLog(BenchField.Absorption, logF, logG, tail, robust: false, EvidenceAccumulator.ChromophoreGroup);
        if (acc.Explaining)
        {
            var listed = m.AbsorptionLines;
            string expected = listed.Count == 0 ? "no diagnostic lines listed"
                : "lines at " + string.Join(", ", listed.Select(l => l.Nanometres.ToString("0.#", CultureInfo.InvariantCulture) + " nm" + (l.Strength == LineStrength.Moderate ? "" : $" ({l.Strength.ToString().ToLowerInvariant()})"))) + " listed";
            string observed = seen.Count == 0 ? "no lines seen" : "lines seen at " + string.Join(", ", seen.Select(l => l.ToString("0.#", CultureInfo.InvariantCulture))) + " nm";
            acc.Say($"{observed}; {expected}");
        }
    }

    private static void Colour(MaterialProfile profile, string colour, IReadOnlyList<string> seen, EvidenceAccumulator acc)
    {
        var m = profile.Material;
        double f = ColourWords.EntryProbability(seen, profile.ColourHues, profile.SpeciesHues, m.NamedByColour);
        double best = profile.ColourHues.Count == 0 ? f : profile.ColourFirstHue;
        acc.Add(BenchField.Colour, f, ColourWords.BroadProbability, Math.Min(1, f / best), robust: false);
        if (acc.Explaining)
            acc.Say($"colour {colour.Trim()}; {(m.Colours.Count == 0 ? "no colours listed"
                : UsualColours(m.Colours, colour) + (m.NamedByColour ? ", the only colours its name allows" : " usual, most usual first"))}");
    }

    /// <summary>Up to this many standard uncertainties outside a range, a reading is said to lie within its uncertainty of it (two: the usual reading of a normal error).</summary>
    private const double WithinUncertaintySigmas = 2;

    /// <summary>Beyond this many standard uncertainties a reading is said to lie "over 10σ" outside a range (a display choice).</summary>
    private const double FarSigmas = 10;

    /// <summary>Where a value lies against a range: "lies in 3.95–4.05" or "lies 0.12 below 3.95–4.05 (8σ)".</summary>
    internal static string Where(double value, PropertyRange range, double sigma, string format)
    {
        if (range.Contains(value)) return $"lies in {range.ToString(format)}";
        double below = range.Minimum - value, above = value - range.Maximum;
        double distance = Math.Max(below, above);
        string side = below > 0 ? "below" : "above";
        double sigmas = distance / sigma;
        // Just outside a range, within the reading's own uncertainty, still counts for the material: said, so that "for"
        // beside "lies below" does not read as a contradiction.
        string within = sigmas <= WithinUncertaintySigmas ? ", within the reading's uncertainty" : "";
        // Beyond ten standard uncertainties the count says nothing more ("206σ" reads as false precision).
        string how = sigmas > FarSigmas ? $"over {FarSigmas.ToString(CultureInfo.InvariantCulture)}σ" : $"{sigmas.ToString("0.#", CultureInfo.InvariantCulture)}σ{within}";
        return $"lies {distance.ToString(format, CultureInfo.InvariantCulture)} {side} {range.ToString(format)} ({how})";
    }

    /// <summary>", among its rare extremes (usually 1.98–2.25)" for a reading in the range but clear of its usual part; else "".</summary>
    private static string Usually(double value, double sigma, PropertyRange range, PropertyRange? usual) =>
        UsualPart.AmongRareExtremes(value, sigma, range, usual) ? $", among its rare extremes (usually {usual!.Value.ToString("0.00")})" : "";

    internal static string Word<T>(T value) where T : struct, Enum => value.ToString() switch
    {
        "SinglyRefractive" => "singly refractive",
        "DoublyRefractive" => "doubly refractive",
        "VeryStrong" => "very strong",
        var s => s.ToLowerInvariant(),
    };

    private static string F2(double v) => v.ToString("0.00", CultureInfo.InvariantCulture);

    private static string F3(double v) => v.ToString("0.000", CultureInfo.InvariantCulture);
}
