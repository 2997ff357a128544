using GemIndex.Core.Optics;
using GemIndex.Cli.TextUi.Bench;
using GemIndex.Cli.TextUi.Results;
using GemIndex.Core.Bench;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Identification;
using GemIndex.Core.Readings;

namespace GemIndex.Cli.TextUi.Plot;

/// <summary>
/// The scales screen: the lowest index, the birefringence (the series' likeliest reading: the edges' fitted extremes), or a
/// spot reading, and the SG, each against the ranges of the top
/// candidates (<see cref="ReadingScale"/>), as many candidates as the height allows (between one and five): the best
/// entry of each species first, each labelled with its rank in the answer.
/// </summary>
internal sealed class ScaleModel
{
    public const int MostCandidates = 5;

    /// <summary>Widest windows shown: a refractometer's useful span, a typical birefringence span, and SG 1.5 either side.</summary>
    public const double WidestIndex = 0.12, WidestBirefringence = 0.06, WidestGravity = 1.5;

    public const string Legend = "* reading (# on a range)  <-> uncertainty  === range  near: just outside";

    /// <summary>The legend's second line, when a scale draws a range's rare extremes.</summary>
    public const string RareLegend = "--- the range's rare extremes (most stones lie on ===)  rare: reading there";

    private readonly IReadOnlyList<Func<int, ReadingScale>> _scales;

    public ScaleModel(BenchAssessment? assessment)
    {
        var scales = new List<Func<int, ReadingScale>>();
        // The best entry of each species first, then the next entries (as the answer's leaders): four varieties of one
        // species share its ranges and say nothing against a rival species'. Each keeps its rank in the answer.
        IdentificationResult? result = assessment?.Result;
        int[] listed = result is null ? [] : LeadingCandidates.Listed(result);   // only the candidates the answer lists
        IReadOnlyList<RankedCandidate> ranked = [.. listed.Select(i => result!.Candidates[i])];
        IReadOnlyList<int> order = [.. LeadingCandidates.Order(ranked).Take(MostCandidates)];
        IReadOnlyList<Material> top = [.. order.Select(i => ranked[i].Material)];
        IReadOnlyList<int> ranks = [.. order.Select(i => listed[i] + 1)];
        if (top.Count > 0 && assessment is { } a)
        {
            if (a.Result?.Series?.Interpretations.MaxBy(i => i.Weight) is SeriesInterpretation best)
            {
                scales.Add(n => new ReadingScale("lowest index", "0.000", best.Lowest.Value, best.Lowest.StandardUncertainty, WidestIndex,
                    [.. top.Take(n).Select(m => (m.Name, (PropertyRange?)m.Indices.Lowest))], ranks));
                // A highest index fitted above the liquid is no reading, and steps that leave the character open leave the
                // extremes unread: either birefringence is only a lower bound, not drawn (a candidate was marked "out" on it).
                // The birefringence as the answer and the reports give it: the difference of the indices as shown.
                if (best.Birefringence.Value > 0 && best.AboveLiquidLimit is null && best.Character is not null)
                    scales.Add(n => new ReadingScale("birefringence", "0.000", Birefringence.OfShownIndices(best.Highest.Value, best.Lowest.Value), best.Birefringence.StandardUncertainty, WidestBirefringence,
                        [.. top.Take(n).Select(m => (m.Name, m.Birefringence ?? new PropertyRange(0, 0)))], ranks));
            }
            else if (a.Readings.Refractometer?.Spot is { } spot && a.Result is not null)
                // A spot reading lies anywhere between a material's lowest and highest index (the shadow blinks between
                // them on a birefringent stone), read to about ±0.01 (σ 0.006 unless the bench's precision says otherwise).
                scales.Add(n => new ReadingScale("spot reading", "0.00", spot, a.Readings.Refractometer.Precision ?? BenchDefaults.SpotPrecision, WidestIndex,
                    [.. top.Take(n).Select(m => (m.Name, (PropertyRange?)new PropertyRange(m.Indices.Lowest.Minimum, m.Indices.Highest.Maximum)))], ranks));
            if (a.SpecificGravity is { } sg)
                scales.Add(n => new ReadingScale("SG", "0.00", sg.Value, sg.StandardUncertainty, WidestGravity,
                    [.. top.Take(n).Select(m => (m.Name, (PropertyRange?)m.SpecificGravity))], ranks,
                    [.. top.Take(n).Select(m => m.SpecificGravityUsual)]));
        }
        _scales = scales;
    }

    public bool IsEmpty => _scales.Count == 0;

    /// <summary>How many candidates per scale fit in <paramref name="height"/> rows (two rows, the candidates and a blank line per scale, then the legend: one line, two when a scale draws rare extremes).</summary>
    public int CandidatesFor(int height)
    {
        for (int n = MostCandidates; n > 1; n--)
            if (_scales.Count * (3 + n) + LegendLines(Scales(n)) <= height) return n;
        return 1;
    }

    public IReadOnlyList<ReadingScale> Scales(int candidates) => [.. _scales.Select(s => s(candidates))];

    /// <summary>Every line of the screen for the given size.</summary>
    public IReadOnlyList<string> Lines(int width, int height)
    {
        if (IsEmpty) return ["No reading to scale yet: the scales need a rotation series (F3) or an SG (F4), and a ranked candidate."];
        var lines = new List<string>();
        IReadOnlyList<ReadingScale> scales = Scales(CandidatesFor(height));
        foreach (ReadingScale scale in scales)
        {
            lines.AddRange(scale.Render(width));
            lines.Add("");
        }
        lines.Add(Legend);
        if (LegendLines(scales) == 2) lines.Add(RareLegend);
        return lines;
    }

    private static int LegendLines(IReadOnlyList<ReadingScale> scales) => scales.Any(s => s.HasUsualParts) ? 2 : 1;
}
