using GemIndex.Cli.Reports;
using GemIndex.Core.Bench;
using GemIndex.Core.Identification;
using GemIndex.Core.Magnification;
using GemIndex.Core.Observations;

namespace GemIndex.Cli.Identification;

/// <summary>
/// The answer for one stone as text for a bench user: species first, then derived properties, candidates with
/// reasons, next test, warnings. Control characters are stripped (a catalogue name or a typed word could carry a
/// terminal escape sequence).
/// </summary>
internal static class IdentificationText
{
    /// <summary>The least width of the candidates' name column.</summary>
    public const int NameColumn = 36;

    /// <summary>The line of a faceted stone: what its cut rules out.</summary>
    public const string FacetedLine = "Cut: faceted: no star or cat's-eye can show on facets, so star and cat's-eye varieties are weighed as not seen";

    /// <summary>The line of an opaque stone: what its transparency leaves out of the advice.</summary>
    public const string OpaqueLine = "Transparency: opaque: no polariscope, dichroscope or fire is advised, and under the loupe only what shows on a surface";

    /// <summary>
    /// Writes the answer; the features looked for under magnification, when given, are listed with their meaning;
    /// <paramref name="reflectanceRead"/>: a reflectance meter was read (then named among the readings to re-take when nothing fits).
    /// </summary>
    public static void Write(IdentificationResult result, TextWriter output, MagnificationObservation? magnification = null, StoneCut? cut = null,
        StoneTransparency? transparency = null, bool reflectanceRead = false)
    {
        var o = new StringWriter { NewLine = "\n" };
        if (transparency == StoneTransparency.Opaque) o.WriteLine(OpaqueLine);
        // A faceted cut stands for the star and the cat's-eye not seen (the reader counts them so): said once, as the cut.
        bool faceted = cut == StoneCut.Faceted;
        if (faceted) o.WriteLine(FacetedLine);
        if (magnification is { IsEmpty: false } look)
        {
            foreach (var info in look.Present.Order().Select(MagnificationVocabulary.Of)) o.WriteLine($"{info.SeenHow}: {info.Name}: {info.WhenSeen}");
            foreach (var f in look.Absent.Order().Where(f => !faceted || !MagnificationVocabulary.DomedPhenomena.Contains(f)))
                o.WriteLine($"Looked for, not seen: {MagnificationVocabulary.Of(f).Name}: {MagnificationVocabulary.Of(f).WhenNotSeen}");
        }
        // A species under 0.1 % says nothing more by its origins ("natural <0.1 %, synthetic <0.1 %, …" is clutter).
        foreach (SpeciesResult s in ResultDocument.SpeciesShown(result).Where((s, i) => LeadingCandidates.SpeciesListed(i, s.Confidence, result.NoGoodMatch)))
            o.WriteLine($"Species: {s.Species} {ReportNumbers.Percent(s.Confidence)}"
                + (s.Origins.Count > 0 && s.Confidence >= ReportNumbers.SmallestShown ? " (" + string.Join(", ", s.Origins.OrderByDescending(x => x.Value).Select(x => $"{BenchWords.Word(x.Key)} {ReportNumbers.Percent(x.Value)}")) + ")" : ""));
        if (!result.NoGoodMatch && result.LeadingGroup is { } group)
            o.WriteLine($"Mineral group: {group.Group} {ReportNumbers.Percent(group.Total)} in all ({string.Join(", ", group.Species)})");
        if (result.Series is { } series)
        {
            o.WriteLine(result.SeriesCharacter is { } character
                ? $"Optic character, from {character.From}: {ReportDerived.CharacterOdds(character, series: series)}"
                : series.Character is { } c ? $"Optic character: {c.ToString().ToLowerInvariant()}" : "Optic character: undetermined");
            // Beneath the posterior, each pattern's indices are a reading of the edges, not a verdict ("read as …"),
            // after its share of the posterior.
            foreach (var h in series.Interpretations)
                o.WriteLine(result.SeriesCharacter is null || h.Character is null ? $"  {h.Description}" : $"  {ReportNumbers.Percent(h.Weight),7} read as {h.Description}");
        }
        o.WriteLine(result.NoGoodMatch
            ? "NO GOOD MATCH: nothing in the catalogue fits these readings; the list below is only the least bad."
            : "Candidates:");
        // Headings when the species-first order puts a larger share after a smaller one, as in the text UI.
        // Only the candidates the readings leave in play (LeadingCandidates.Listed); each keeps its rank in the answer.
        int[] listed = LeadingCandidates.Listed(result);
        bool grouped = LeadingCandidates.NeedsSpeciesHeadings([.. listed.Select(i => result.Candidates[i])]);
        // The name column as wide as the longest listed name (at least NameColumn), so the percentages stay in line.
        int nameWidth = Math.Max(NameColumn, listed.Select(i => result.Candidates[i].Material.Name.Length).DefaultIfEmpty(0).Max());
        foreach (var (i, k) in listed.Select((i, k) => (i, k)))
        {
            RankedCandidate c = result.Candidates[i];
            // Each species' entries under its name and total, so that a rank after another species' varieties reads as its own species'.
            if (grouped && (k == 0 || c.Material.Species != result.Candidates[listed[k - 1]].Material.Species))
                o.WriteLine($"  {c.Material.Species}{(result.SpeciesConfidence(c.Material.Species) is { } total ? " " + ReportNumbers.Percent(total) : "")}:");
            string bar = new('#', (int)Math.Round(c.Confidence * 20));
            o.WriteLine($"{i + 1,2}. {c.Material.Name.PadRight(nameWidth)} {ReportNumbers.Percent(c.Confidence),7} {bar,-20} fit {ReportNumbers.Fixed(c.Fit, "0.00")}  ({c.Material.Species}, {BenchWords.Word(c.Material.Origin)})");
            foreach (var r in c.Reasons) o.WriteLine($"      {GemIndex.Cli.Reports.ReportDerived.Verdict(r)}: {r.Text}");
        }
        if (LeadingCandidates.UnlistedNote([.. listed.Select(i => i + 1)]) is { } unlisted) o.WriteLine(unlisted);
        o.WriteLine($"Not in the catalogue: {ReportNumbers.Percent(result.NotInCatalogue)}");
        if (result.NextTest is null && result.NoGoodMatch) o.WriteLine($"Next step: {ReportDerived.NoMatchNextStep(reflectanceRead)}");
        if (result.NextTest is { } next)
        {
            // In words first, as the reports and the text UI say it; the gain in bits for those who weigh it.
            o.WriteLine($"Next test: {next.Description} — it would {ReportDerived.Separation(next.GainBits)} the leading candidates (expected gain {ReportNumbers.Fixed(next.GainBits, "0.00")} bits)");
            foreach (string e in next.Expectations) o.WriteLine($"  {e}");
            if (ReportCautions.ForTest(next.Test) is { } caution) o.WriteLine($"  {caution}");
        }
        foreach (string w in result.Warnings) o.WriteLine($"Warning: {w}");
        foreach (string c in ReportCautions.ForWarnings(result.WarningTests, result.NextTest?.Test)) o.WriteLine(c);
        o.WriteLine("An identification from bench tests is an aid, not a certificate.");
        output.Write(BenchText.ForTerminal(o.ToString()).Replace("\n", output.NewLine, StringComparison.Ordinal));
    }
}
