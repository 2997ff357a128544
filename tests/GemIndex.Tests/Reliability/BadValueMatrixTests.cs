using System.CommandLine;
using GemIndex.Cli.CommandLine;
using GemIndex.Tests.CommandLine;
using Xunit.Abstractions;

namespace GemIndex.Tests.Reliability;

/// <summary>
/// The bad-value matrix: every value-taking option of every command of <see cref="CommandTree"/> (found by walking
/// the tree, so a new option is tried without touching this file) is given bad values of its kind on top of a
/// command line that works, and each outcome is classed as a clear error (exit 1, 3 or 4, one message naming the
/// option or its file, no stack trace), an unclear error, a crash, or a silent accept (exit 0).
/// A value accepted on purpose is listed in <see cref="AcceptedOnPurpose"/> and printed; every other failure fails
/// the test.
/// </summary>
[System.Runtime.Versioning.UnsupportedOSPlatform("windows")]
public sealed class BadValueMatrixTests(ITestOutputHelper log) : IDisposable
{
    private readonly ReliabilityFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    /// <summary>
    /// Values accepted on purpose, listed rather than hidden: the test prints them and fails on anything else.
    /// </summary>
    private static readonly HashSet<string> AcceptedOnPurpose =
    [
        // An unknown colour word is read, warned about and given no weight (docs/ranking.md, colour): not an error.
        "identify --colour 'nonsense'",
    ];

    private enum Outcome { Clear, Unclear, Crash, SilentAccept }

    [Fact]
    public void Every_bad_value_of_every_option_is_a_clear_error()
    {
        string catalogueDir = Directory.CreateDirectory(Path.Combine(_folder.Path, "catalogue")).FullName;   // it must exist
        string workbook = _folder.Workbook("wb.db");
        string batch = _folder.File("stones.jsonl");
        File.WriteAllText(batch, """{"id":"lot 3 / 1","sg":2.65,"refractometer":{"readings":[{"rotation_deg":0,"low":1.544,"high":1.553}]}}""" + "\n");
        string aFile = _folder.File("plain.txt");
        File.WriteAllText(aFile, "not a folder\n");
        string missing = _folder.File("no-such-file.db");
        string inMissingFolder = Path.Combine(_folder.Path, "no-such-folder", "out.db");
        string output = _folder.File("out.file");

        // A command line that works, per command; the option under test is replaced or added.
        var baselines = new Dictionary<string, string[]>
        {
            [""] = ["--workbook", workbook, "--demo"],
            ["catalogue list"] = ["catalogue", "list", "--catalogue-dir", catalogueDir],
            ["catalogue show"] = ["catalogue", "show", "smoky quartz", "--catalogue-dir", catalogueDir],
            ["catalogue check"] = ["catalogue", "check", "--catalogue-dir", catalogueDir],
            ["catalogue import"] = ["catalogue", "import", CommandRun.Fixture("user-good.csv"), "--catalogue-dir", catalogueDir],
            ["catalogue build"] = ["catalogue", "build", "--output", output, "--source", CommandRun.Fixture("families"), "--catalogue-dir", catalogueDir],
            ["identify"] = ["identify", "--sg", "2.65", "--catalogue-dir", catalogueDir],
            ["identify --batch"] = ["identify", "--batch", batch, "--catalogue-dir", catalogueDir],   // a batch takes no reading options
            ["report stone"] = ["report", "stone", "--readings", batch, "--catalogue-dir", catalogueDir],
            ["report stone/workbook"] = ["report", "stone", "--workbook", workbook, "--stone", "lot 3 / 1", "--catalogue-dir", catalogueDir],
            ["report workbook"] = ["report", "workbook", "--workbook", workbook, "--catalogue-dir", catalogueDir],
            ["calc snell"] = ["calc", "snell", "--n1", "1.0", "--n2", "1.544", "--incidence", "30"],
            ["calc critical-angle"] = ["calc", "critical-angle", "--denser", "1.544"],
            ["calc refractometer"] = ["calc", "refractometer", "--index", "1.544"],
            ["calc reflectance"] = ["calc", "reflectance", "--n2", "1.544"],
            ["calc brewster"] = ["calc", "brewster", "--index", "1.544"],
            ["calc prism"] = ["calc", "prism", "--apex", "60", "--deviation", "40"],
            ["calc dispersion"] = ["calc", "dispersion", "--reading", "1.548", "--wavelength", "486.1", "--g-minus-b", "0.008"],
            ["calc indicatrix"] = ["calc", "indicatrix", "--omega", "1.544", "--epsilon", "1.553"],
            ["calc sg"] = ["calc", "sg", "--in-air", "1.0", "--in-water", "0.62"],
            ["calc carats"] = ["calc", "carats", "--carats", "1"],
        };
        foreach ((string name, string[] args) in baselines)
        {
            var (exit, _, error) = CommandRun.Plain(args);
            Assert.True(exit == 0, $"baseline '{name}' must work: {error}");
        }

        string huge = new('9', 100_000);
        string[] numbers = ["", "abc", "NaN", "-1e308", "1e308", "1,5", huge];
        string[] wholeNumbers = ["", "abc", "0", "-1", "100000000000", "1.5"];
        string[] words = ["", "nonsense", new string('x', 100_000), "\u001b[2Jred"];
        var valuesByOption = new Dictionary<string, string[]>
        {
            ["--candidates"] = ["", "abc", "0", "-1", "100"],
            ["--line"] = ["", "abc", "0", "-1", "999999"],
            ["--edge"] = ["", "abc", "0:abc", "1001:1.544", "NaN:1.544", "0:1.544/1e308"],
            ["--heavy-liquid"] = ["", "abc", "2.6:bogus", "NaN:floats", "-1:floats"],
            ["--lines"] = ["", "abc", "-5", "1e308"],
            ["--standard"] = ["", "abc", "NaN:NaN", "1e308:1e308"],
            ["--point"] = ["", "abc", "NaN:NaN", "-1:1.5"],
            ["--facet"] = ["", "abc", "NaN,0,0"],
            ["--stone"] = ["", "no such stone"],
            ["--catalogue-dir"] = ["", aFile, Path.Combine(_folder.Path, "no-such-folder")],
            ["--source"] = ["", aFile, missing],
            ["--readings"] = ["", _folder.Path, missing],
            ["--batch"] = ["", _folder.Path, missing],
            ["--output"] = ["", _folder.Path, inMissingFolder],
            ["--workbook"] = ["", _folder.Path, missing, aFile],
            // Free text where any short printable name is right: only the empty, the endless and the control characters are wrong.
            ["--examiner"] = ["", new string('x', 100_000), "\u001b[2Jred"],
        };
        // Free text with no wrong value: the stone's label.
        string[] notTried = ["--id"];

        var counts = new Dictionary<Outcome, int>();
        int tried = 0, exitOneForAValue = 0, longEcho = 0;
        var failures = new List<(string Key, string What)>();
        foreach ((string path, Command command) in Leaves(CommandTree.Build(), ""))
            foreach (Option option in command.Options.Concat(Recursive(command)).Distinct())
            {
                if (option.Arity.MaximumNumberOfValues == 0 || option.ValueType == typeof(bool) || notTried.Contains(option.Name)) continue;
                string key = path == "report stone" && option.Name is "--workbook" or "--stone" ? "report stone/workbook"
                    : path == "identify" && option.Name == "--batch" ? "identify --batch" : path;
                string[] values = valuesByOption.TryGetValue(option.Name, out string[]? specific) ? specific
                    : option.ValueType == typeof(int) ? wholeNumbers
                    : option.ValueType == typeof(double) || option.ValueType == typeof(double?) ? numbers
                    : words;
                foreach (string value in values)
                {
                    tried++;
                    string[] args = WithValue(baselines[key], option.Name, value);
                    (Outcome outcome, int exit, string error) = Run(args, option.Name, value);
                    counts[outcome] = counts.GetValueOrDefault(outcome) + 1;
                    if (outcome == Outcome.Clear && exit == ExitCodes.Usage && value.Length > 0 && !error.Contains("Required", StringComparison.Ordinal))
                    {
                        exitOneForAValue++;
                        log.WriteLine($"exit 1 for a value: {path} {option.Name} {Label(value)}: {Shown(error.Trim())}");
                    }
                    if (error.Length > 2_000) longEcho++;
                    if (outcome != Outcome.Clear)
                        failures.Add(($"{(path.Length == 0 ? "(root)" : path)} {option.Name} {Label(value)}", $"{outcome} (exit {exit}) {Shown(error.Trim())}"));
                }
            }
        log.WriteLine($"tried {tried}, clear errors {counts.GetValueOrDefault(Outcome.Clear)}, unclear errors {counts.GetValueOrDefault(Outcome.Unclear)}, " +
            $"crashes {counts.GetValueOrDefault(Outcome.Crash)}, silent accepts {counts.GetValueOrDefault(Outcome.SilentAccept)}; " +
            $"clear but exit 1 where 3 is asked {exitOneForAValue}; messages over 2,000 characters {longEcho}");
        foreach ((string key, string what) in failures)
            log.WriteLine($"{(AcceptedOnPurpose.Contains(key) ? "accepted on purpose" : "NEW")}: {key}: {what}");
        string[] unexpected = [.. failures.Where(f => !AcceptedOnPurpose.Contains(f.Key)).Select(f => $"{f.Key}: {f.What}")];
        log.WriteLine($"{failures.Count - unexpected.Length} accepted on purpose; {unexpected.Length} others");
        Assert.True(unexpected.Length == 0, "failures not on the known list:\n" + string.Join("\n", unexpected));
    }

    private static (Outcome, int Exit, string Error) Run(string[] args, string option, string value)
    {
        int exit;
        string error;
        try { (exit, _, error) = CommandRun.Plain(args); }
        catch (Exception e) { return (Outcome.Crash, -1, e.GetType().Name + ": " + e.Message); }
        if (error.Contains("Unhandled exception", StringComparison.Ordinal) || error.Contains("   at ", StringComparison.Ordinal) || exit is < 0 or > 4 or 2)
            return (Outcome.Crash, exit, error);
        if (exit == 0) return (Outcome.SilentAccept, exit, error);
        string bare = option.TrimStart('-');
        bool named = error.Contains(option, StringComparison.Ordinal) || error.Contains(bare, StringComparison.Ordinal)
            || (value.Length is > 0 and < 200 && error.Contains(Path.GetFileName(value.TrimEnd('/')), StringComparison.Ordinal));
        return (named ? Outcome.Clear : Outcome.Unclear, exit, error);
    }

    private static string[] WithValue(string[] baseline, string option, string value)
    {
        int at = Array.IndexOf(baseline, option);
        if (at < 0) return [.. baseline, option, value];
        string[] copy = [.. baseline];
        copy[at + 1] = value;
        return copy;
    }

    private static IEnumerable<(string Path, Command Command)> Leaves(Command command, string path)
    {
        if (command.Action is not null) yield return (path, command);
        foreach (Command sub in command.Subcommands)
            foreach (var leaf in Leaves(sub, path.Length == 0 ? sub.Name : path + " " + sub.Name)) yield return leaf;
    }

    // Recursive options declared on a parent (--catalogue-dir on the catalogue group) apply to its commands too.
    private static IEnumerable<Option> Recursive(Command command) =>
        command.Parents.OfType<Command>().SelectMany(p => p.Options.Where(o => o.Recursive).Concat(Recursive(p)));

    /// <summary>A bad value as a short, printable key ("<100000 × '9'>", "\\x1b[2Jred").</summary>
    private static string Label(string value) =>
        value.Length > 40 ? $"<{value.Length} × '{value[0]}'>" : "'" + value.Replace("\u001b", "\\x1b", StringComparison.Ordinal) + "'";

    private static string Shown(string text) => text.Length > 160 ? text[..160] + "…" : text.ReplaceLineEndings(" | ");
}
