using System.Globalization;

namespace GemIndex.Bench.Accuracy;

/// <summary>
/// Origin within the species, counted apart for stones without magnification, with a look, and with a look that saw a
/// feature pointing at the stone's origin (docs/benchmark.md, "Scoring"); overall and by species, origin and method.
/// Only stones whose species the engine got right and whose species has more than one origin in the table count.
/// </summary>
internal sealed class OriginTallies
{
    private readonly Counts _without = new(), _with = new(), _diagnostic = new(), _withoutDiagnostic = new();
    private readonly SortedDictionary<(string Species, string Origin, string Method), (Counts Without, Counts With, Counts Diagnostic)> _byMethod = new();

    public void Add(string species, string origin, string method, bool looked, bool diagnostic, bool right, bool confident)
    {
        if (!_byMethod.TryGetValue((species, origin, method), out var row))
            _byMethod[(species, origin, method)] = row = (new Counts(), new Counts(), new Counts());
        (looked ? _with : _without).Add(right, confident);
        (looked ? row.With : row.Without).Add(right, confident);
        if (diagnostic)
        {
            _diagnostic.Add(right, confident);
            row.Diagnostic.Add(right, confident);
        }
        else if (looked) _withoutDiagnostic.Add(right, confident);
    }

    public void Report(TextWriter o)
    {
        o.WriteLine();
        o.WriteLine("Origin within the species (species right, more than one origin in the table):");
        o.WriteLine("| stones | count | origin top-1 | confident (≥ 80 %) wrong origin | an origin given at ≥ 80 % |");
        o.WriteLine("|---|---|---|---|---|");
        Line(o, "without magnification", _without);
        Line(o, "with magnification", _with);
        Line(o, "with magnification, a feature pointing at the origin seen", _diagnostic);
        Line(o, "with magnification, no such feature seen", _withoutDiagnostic);
        o.WriteLine($"origins given at ≥ 80 % on stones without any magnification observation: {P(_without.Confident, _without.Count)} " +
            $"(right {P(_without.Confident - _without.ConfidentWrong, _without.Count)}, wrong {P(_without.ConfidentWrong, _without.Count)} of those stones)");
        o.WriteLine();
        o.WriteLine("Origin by species, origin and method (without magnification | with it | with a feature pointing at the origin):");
        o.WriteLine("| species | origin | method | stones | top-1 | confident wrong | stones | top-1 | confident wrong | stones | top-1 | confident wrong |");
        o.WriteLine("|---|---|---|---|---|---|---|---|---|---|---|---|");
        foreach (var ((species, origin, method), (without, with, diagnostic)) in _byMethod)
            o.WriteLine($"| {species} | {origin} | {method} | {Cells(without)} | {Cells(with)} | {Cells(diagnostic)} |");
    }

    private static void Line(TextWriter o, string name, Counts c) =>
        o.WriteLine($"| {name} | {c.Count} | {P(c.Right, c.Count)} | {P(c.ConfidentWrong, c.Count)} | {P(c.Confident, c.Count)} |");

    private static string Cells(Counts c) => $"{c.Count} | {P(c.Right, c.Count)} | {P(c.ConfidentWrong, c.Count)}";

    private static string P(int k, int n) => n == 0 ? "–" : (100.0 * k / n).ToString("0.0", CultureInfo.InvariantCulture) + " %";

    /// <summary>Stones, right origins, confident calls and confident wrong calls.</summary>
    private sealed class Counts
    {
        public int Count, Right, Confident, ConfidentWrong;

        public void Add(bool right, bool confident)
        {
            Count++;
            Right += right ? 1 : 0;
            Confident += confident ? 1 : 0;
            ConfidentWrong += confident && !right ? 1 : 0;
        }
    }
}
