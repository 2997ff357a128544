using System.Text.Json;
using GemIndex.Tests.CommandLine;
using Xunit.Abstractions;

namespace GemIndex.Tests.PublishedCases;

/// <summary>
/// Runs every published case through the real batch interface (identify --batch) with the shipped catalogue and
/// scores it by species: a case with at least two bench tests must have its published species among the first three
/// (issue 14's target); top-1 and top-3 of every case are written to the test output.
/// </summary>
public class PublishedCaseTests(ITestOutputHelper output)
{
    /// <summary>
    /// Cases with two or more bench tests that the engine still misses: listed and printed, never dropped; any other miss
    /// fails the test. Two since 4 December, both decided by a test the tool does not take:
    /// wade-1918-red-spinel (no pleochroism, singly refractive, red) was told from garnet by a scratch test, and ranks
    /// spinel sixth (about 3 %) behind the three red garnet species the same readings fit;
    /// gg-ln-coated-cats-eye-gypsum read its spot RI 1.56 on a resin coating, well above gypsum's index, and was named by
    /// Raman spectroscopy.
    /// </summary>
    private static readonly HashSet<string> KnownMisses = ["wade-1918-red-spinel", "gg-ln-coated-cats-eye-gypsum"];

    [Fact]
    public void Every_published_case_with_two_bench_tests_has_its_species_in_the_top_three()
    {
        using var run = new CommandRun();
        var cases = PublishedCaseBook.Cases;
        string file = Path.Combine(run.Folder, "published.jsonl");
        File.WriteAllText(file, string.Join("\n", cases.Select(c => c.Line)) + "\n");
        var (exit, stdout, error) = CommandRun.Plain("identify", "--batch", file, "--catalogue-dir", run.Folder);
        Assert.True(exit == 0, error);
        var results = stdout.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(cases.Count, results.Length);

        var missed = new List<string>();
        int top1 = 0, top3 = 0;
        foreach (var (c, line) in cases.Zip(results))
        {
            var species = SpeciesOf(line);
            bool first = species.Count > 0 && CatalogueSpeciesSplits.Names(c.Species, species[0]);
            bool three = species.Take(3).Any(s => CatalogueSpeciesSplits.Names(c.Species, s));
            top1 += first ? 1 : 0;
            top3 += three ? 1 : 0;
            output.WriteLine($"{(first ? "top-1" : three ? "top-3" : "miss ")}  {c.BenchTests} test(s)  {Id(line)}: published {c.Published}, ranked {string.Join(" > ", species.Take(3))}");
            if (c.BenchTests >= 2 && !three && !KnownMisses.Contains(Id(line))) missed.Add($"{Id(line)} ({c.Published}): ranked {string.Join(", ", species.Take(3))}");
        }
        output.WriteLine($"published cases: {cases.Count}; top-1 {top1}, top-3 {top3}; with two or more bench tests: {cases.Count(c => c.BenchTests >= 2)}; known misses: {string.Join(", ", KnownMisses)}");
        Assert.True(missed.Count == 0, "published species not in the top three: " + string.Join("; ", missed));
    }

    /// <summary>
    /// The magnification cases (issue 15): each names the origin the source gave, and its batch line carries the features
    /// the source saw (or looked for and did not see) in the magnification vocabulary's words.
    /// </summary>
    [Fact]
    public void Every_magnification_case_names_an_origin_and_only_known_features()
    {
        var cases = PublishedCaseBook.Cases.Where(c => c.IsMagnificationCase).ToList();
        Assert.NotEmpty(cases);
        var problems = new List<string>();
        foreach (var c in cases)
        {
            string id = Id(c.Line);
            if (c.Origins.Count == 0) problems.Add($"{id}: no origin");
            if (c.FeaturesPresent.Count + c.FeaturesAbsent.Count == 0) problems.Add($"{id}: no feature in the batch line");
            problems.AddRange(c.FeaturesPresent.Concat(c.FeaturesAbsent).Where(w => GemIndex.Core.Magnification.MagnificationVocabulary.Find(w) is null).Select(w => $"{id}: unknown feature '{w}'"));
            problems.AddRange(c.FeaturesPresent.Intersect(c.FeaturesAbsent).Select(w => $"{id}: '{w}' both present and absent"));
            output.WriteLine($"{id}: {string.Join(" + ", c.Origins)}; present {string.Join(", ", c.FeaturesPresent)}; absent {string.Join(", ", c.FeaturesAbsent)}");
        }
        output.WriteLine($"magnification cases: {cases.Count}");
        Assert.True(problems.Count == 0, string.Join("; ", problems));
    }

    /// <summary>
    /// The least number of magnification cases whose published origin is among the two likeliest origins of the
    /// published species: all 17 since the catalogue holds chromium-diffused corundum and synthetic ruby overgrowth on
    /// natural corundum, whose chromium-rich skins read above corundum's range (15 of 17 before: the two sapphires with a
    /// synthetic ruby overgrowth were "nothing fits"). Issue 15's target is all of them; raise this as cases are added,
    /// never lower it.
    /// </summary>
    private const int MagnificationOriginTopTwoFloor = 17;

    /// <summary>
    /// Issue 15's target: for every magnification case, a published origin is among the two likeliest origins of the
    /// published species (the species' confidence split by origin, from the result document's species list). Every case
    /// and its figures are written to the test output, with and without the magnification object; a miss stays in and
    /// is listed by name.
    /// </summary>
    [Fact]
    public void The_magnification_cases_have_their_published_origin_in_the_top_two_origins_of_their_species()
    {
        var cases = PublishedCaseBook.Cases.Where(c => c.IsMagnificationCase).ToList();
        var (top1, top2, missed) = OriginScores(cases, c => c.Line);
        var (plainTop1, plainTop2, _) = OriginScores(cases, c => WithoutMagnification(c.Line));
        output.WriteLine($"magnification cases: {cases.Count}; origin top-1 {top1}, top-2 {top2}; without the magnification object: top-1 {plainTop1}, top-2 {plainTop2}");
        output.WriteLine("misses: " + (missed.Count == 0 ? "none" : string.Join("; ", missed)));
        Assert.True(top2 >= MagnificationOriginTopTwoFloor,
            $"{top2} of {cases.Count} in the top two (floor {MagnificationOriginTopTwoFloor}); misses: {string.Join("; ", missed)}");
    }

    /// <summary>The published species must hold at least this share of the answer for its origins to count as ranked.</summary>
    private const double RankedSpeciesShare = 0.01;

    private (int Top1, int Top2, List<string> Missed) OriginScores(IReadOnlyList<PublishedCase> cases, Func<PublishedCase, string> line)
    {
        using var run = new CommandRun();
        string file = Path.Combine(run.Folder, "magnification.jsonl");
        File.WriteAllText(file, string.Join("\n", cases.Select(line)) + "\n");
        var (exit, stdout, error) = CommandRun.Plain("identify", "--batch", file, "--catalogue-dir", run.Folder);
        Assert.True(exit == 0, error);
        var results = stdout.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(cases.Count, results.Length);
        var missed = new List<string>();
        int top1 = 0, top2 = 0;
        foreach (var (c, result) in cases.Zip(results))
        {
            var origins = OriginsOf(result, c.Species);
            // A species holding next to nothing of the answer has no meaningful order of origins (all near zero).
            var ranked = origins.Values.Sum() < RankedSpeciesShare ? []
                : origins.OrderByDescending(o => o.Value).Select(o => o.Key).ToList();
            bool Published(string origin) => c.Origins.Any(o => o.ToString().Equals(origin, StringComparison.OrdinalIgnoreCase));
            bool first = ranked.Count > 0 && Published(ranked[0]);
            bool two = ranked.Take(2).Any(Published);
            top1 += first ? 1 : 0;
            top2 += two ? 1 : 0;
            string published = string.Join(" + ", c.Origins.Select(o => o.ToString().ToLowerInvariant()));
            string shown = ranked.Count > 0 ? string.Join(", ", ranked.Select(r => $"{r} {origins[r]:0.000}")) : "species not ranked";
            output.WriteLine($"{(first ? "top-1" : two ? "top-2" : "miss ")}  {Id(result)}: published {published}; {c.Published} by origin: {shown}");
            if (!two) missed.Add($"{Id(result)} (published {published}): {shown}");
        }
        return (top1, top2, missed);
    }

    private static string WithoutMagnification(string line)
    {
        var node = System.Text.Json.Nodes.JsonNode.Parse(line)!.AsObject();
        node.Remove("magnification");
        return node.ToJsonString();
    }

    /// <summary>The published species' confidence by origin (summed over its species names, as tourmaline is several).</summary>
    private static Dictionary<string, double> OriginsOf(string line, IReadOnlyList<string> species)
    {
        using var doc = JsonDocument.Parse(line);
        var totals = new Dictionary<string, double>(StringComparer.OrdinalIgnoreCase);
        if (!doc.RootElement.TryGetProperty("species", out var list)) return totals;
        foreach (var s in list.EnumerateArray().Where(s => species.Contains(s.GetProperty("species").GetString()!)))
            foreach (var o in s.GetProperty("origins").EnumerateObject())
                totals[o.Name] = totals.GetValueOrDefault(o.Name) + o.Value.GetDouble();
        return totals;
    }

    [Fact]
    public void The_species_groups_a_source_may_name_are_species_of_the_shipped_catalogue()
    {
        var species = GemIndex.Data.Catalogue.ShippedCatalogue.Families.Materials.Select(m => m.Species).ToHashSet(StringComparer.Ordinal);
        var unknown = PublishedCase.GlassGroup.Concat(PublishedCase.TourmalineGroup.Where(t => t != "liddicoatite")).Where(s => !species.Contains(s)).ToList();
        Assert.True(unknown.Count == 0, "not species of the catalogue: " + string.Join(", ", unknown));
    }

    /// <summary>Species best first: the result's species list when the batch line carries one, else its candidates' species in order.</summary>
    private static List<string> SpeciesOf(string line)
    {
        using var doc = JsonDocument.Parse(line);
        var root = doc.RootElement;
        if (root.TryGetProperty("species", out var list) && list.ValueKind == JsonValueKind.Array)
            return [.. list.EnumerateArray().Select(s => s.GetProperty("species").GetString()!)];
        return [.. root.GetProperty("candidates").EnumerateArray().Select(c => c.GetProperty("species").GetString()!).Distinct()];
    }

    private static string Id(string line)
    {
        using var doc = JsonDocument.Parse(line);
        return doc.RootElement.GetProperty("id").GetString()!;
    }
}
